// Suggested set numbers and labels (the trade's naming: 12, 12A; T1…T10; common practice, no source).
import { describe, expect, it } from "vitest";
import { insertedSetNumber, labelPrefix, nextLabels, nextSetNumber } from "@/lib/editor/naming";

describe("set numbers", () => {
  it("continues after the highest whole number", () => {
    expect(nextSetNumber(["1", "2", "12A", "3"])).toBe("13");
    expect(nextSetNumber([])).toBe("1");
  });
  it("names an inserted set with the next free letter", () => {
    expect(insertedSetNumber("12", ["12", "13"])).toBe("12A");
    expect(insertedSetNumber("12", ["12", "12A"])).toBe("12B");
    expect(insertedSetNumber("12A", ["12", "12A"])).toBe("12B");
  });
});

describe("labels", () => {
  const roster = [
    { label: "T1", instrument: "trumpet" },
    { label: "T2", instrument: "trumpet" },
    { label: "T10", instrument: "trumpet" },
    { label: "TB1", instrument: "trombone" },
  ];
  it("reuses the roster's prefix, else a default", () => {
    expect(labelPrefix("trumpet", roster)).toBe("T");
    expect(labelPrefix("tuba", roster)).toBe("TU");
    expect(labelPrefix("kazoo", roster)).toBe("KA");
  });
  it("continues after the highest number and skips labels in use", () => {
    expect(nextLabels("T", roster.map((r) => r.label), 2)).toEqual(["T11", "T12"]);
    expect(nextLabels("TU", ["TU2"], 2)).toEqual(["TU3", "TU4"]);
  });
});
