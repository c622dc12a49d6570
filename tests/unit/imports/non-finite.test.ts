// Numbers that are no numbers (0/0 steps, 1/0 steps) and headers naming a column twice are refused
// by the CSV readers with the line they are on, instead of reaching the database as NaN or letting
// one column silently overwrite the other.
import { describe, expect, it } from "vitest";
import { positionFromWords } from "@/lib/field/words";
import { planDrill } from "@/lib/imports/drill";
import { readCsvTable } from "@/lib/imports/csv-table";
import { planRoster } from "@/lib/imports/roster";
import { parseReadingsCsv } from "@/lib/readings/csv";

const HS = "high-school" as const;
const drillContext = { rules: HS, performers: [{ id: "p1", label: "T1" }], sets: [] };

describe("steps that are no number", () => {
  it.each(["0/0", "1/0", "2 0/0"])("positionFromWords refuses %s steps, side to side and front to back", (steps) => {
    const across = positionFromWords(`side 1: ${steps} steps outside the 35 yard line; on the front hash`, HS);
    expect(across).toEqual({ ok: false, error: expect.stringContaining(`"${steps}" is not a number of steps`) });
    const deep = positionFromWords(`side 1: on the 35 yard line; ${steps} steps in front of the front hash`, HS);
    expect(deep).toEqual({ ok: false, error: expect.stringContaining(`"${steps}" is not a number of steps`) });
  });

  it("a drill row with 0/0 steps in its position is a bad row on its own line, and no dot", () => {
    const csv = [
      "set,counts,label,position",
      '1,0,T1,"side 1: on the 35 yard line; on the front hash"',
      '2,8,T1,"side 1: 0/0 steps outside the 35 yard line; on the front hash"',
      '3,8,T1,"side 1: on the 35 yard line; 1/0 steps behind the front hash"',
    ].join("\n");
    const plan = planDrill(csv, drillContext);
    expect(plan.errors).toEqual([
      { line: 3, reason: expect.stringMatching(/"0\/0" is not a number of steps/) },
      { line: 4, reason: expect.stringMatching(/"1\/0" is not a number of steps/) },
    ]);
    expect(plan.dots.map((d) => d.set)).toEqual(["1"]);
    for (const d of plan.dots) expect([d.x, d.y, d.facingDeg].every(Number.isFinite)).toBe(true);
  });

  it("metres that overflow to Infinity are a bad row", () => {
    const plan = planDrill("set,counts,label,x_m,y_m\n1,0,T1,1e400,3\n", drillContext);
    expect(plan.errors).toEqual([{ line: 2, reason: expect.stringMatching(/x_m and y_m must both be numbers/) }]);
  });
});

describe("a header naming a column twice", () => {
  it("readCsvTable refuses it on the header's line, naming the column (after normalising)", () => {
    const t = readCsvTable("\nlabel,Yard Line,yard_line\nT1,35,40\n");
    expect(t.records).toEqual([]);
    expect(t.errors).toEqual([{ line: 2, reason: expect.stringContaining('"yard_line" twice') }]);
  });

  it("the roster and drill plans refuse it and plan nothing", () => {
    const roster = planRoster("label,instrument,section,strength,strength\nT1,trumpet,Trumpets,1,-3\n", {
      existing: [],
      instruments: [{ key: "trumpet", name: "Trumpet" }],
    });
    expect(roster.errors).toEqual([{ line: 1, reason: expect.stringContaining('"strength" twice') }]);
    expect(roster.creates).toEqual([]);
    const drill = planDrill("set,counts,label,x_m,y_m,x_m\n1,0,T1,1,2,3\n", drillContext);
    expect(drill.errors).toEqual([{ line: 1, reason: expect.stringContaining('"x_m" twice') }]);
    expect(drill.dots).toEqual([]);
  });

  it("the readings CSV refuses it, naming the column", () => {
    const csv = "set,point,takenAt,temperatureC,humidityPct,sections,measuredDb,measuredDb\n1,Press box,2026-09-12T19:30:00-05:00,24,55,Trumpets: f,92,80\n";
    const parsed = parseReadingsCsv(csv, { sets: [{ id: "00000000-0000-4000-8000-000000000001", number: "1" }], listeningPoints: [{ id: "00000000-0000-4000-8000-000000000002", name: "Press box" }], sections: ["Trumpets"] });
    expect(parsed.rows).toEqual([]);
    expect(parsed.headerErrors).toEqual([expect.stringContaining('"measuredDb" twice')]);
  });
});
