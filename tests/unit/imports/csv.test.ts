// CSV reading (line numbers as an editor shows them) and writing (formula cells neutralised).
import { describe, expect, it } from "vitest";
import { readCsvTable } from "@/lib/imports/csv-table";
import { writeCsv } from "@/lib/imports/csv-write";
import { parseFacing } from "@/lib/imports/facing";

describe("readCsvTable", () => {
  it("numbers lines from the header as 1, counting blank lines and quoted line breaks", () => {
    const text = 'Label,Name\r\nT1,"Ann"\r\n\r\nT2,"Two\nlines"\nT3,Cy\n';
    const t = readCsvTable(text);
    expect(t.columns).toEqual(["label", "name"]);
    expect(t.records.map((r) => [r.line, r.cells.label])).toEqual([
      [2, "T1"],
      [4, "T2"],
      [6, "T3"],
    ]);
    expect(t.records[1]!.cells.name).toBe("Two\nlines");
  });

  it("normalises headers and drops a byte-order mark", () => {
    const t = readCsvTable("\uFEFFYard Line, X (m) ,steps-side\n35,1.5,2\n");
    expect(t.columns).toEqual(["yard_line", "x_m", "steps_side"]);
  });

  it("reports an empty file", () => {
    expect(readCsvTable("\n\n").errors[0]!.reason).toMatch(/empty/);
  });
});

describe("writeCsv", () => {
  // OWASP, "CSV Injection": cells starting with =, +, -, @, tab or CR are prefixed with '.
  it.each(["=1+2", "+SUM(A1)", "-2+3", "@cmd", "\tx", "\rx"])("neutralises a text cell %j", (cell) => {
    const out = writeCsv(["name"], [[cell]]);
    expect(out.split("\r\n")[1]).toMatch(/^"?'/);
  });

  it("leaves numbers (also negative ones) and ordinary text alone", () => {
    expect(writeCsv(["a", "b", "c"], [[-3, "T1", null]])).toBe("a,b,c\r\n-3,T1,\r\n");
  });

  it("reads back what it wrote, the ' taken off again", () => {
    const text = writeCsv(["label", "name"], [["T1", '=HYPERLINK("http://x.example")'], ["T2", "Ann, \"Jr\""]]);
    const t = readCsvTable(text);
    expect(t.records.map((r) => r.cells.name)).toEqual(['=HYPERLINK("http://x.example")', 'Ann, "Jr"']);
  });
});

describe("parseFacing", () => {
  it.each([
    ["", 0],
    ["front", 0],
    ["side 2", 90],
    ["back", 180],
    ["Side 1", 270],
    ["45", 45],
    ["-90", 270],
    ["450°", 90],
  ])("%j → %d", (cell, deg) => {
    expect(parseFacing(cell)).toBe(deg);
  });
  it("explains a facing it cannot read", () => {
    expect(parseFacing("north")).toMatch(/not a number of degrees/);
  });
});
