// Drill CSV: preview, then one all-or-nothing write; bad rows named by line; limits (413); the
// trade's notation read into metres and described back.
import { readFileSync } from "node:fs";
import { beforeAll, describe, expect, it } from "vitest";
import { DEMO, signedIn } from "../support/api";
import { privateShowCopy, uploadFile } from "../support/upload";

// Field geometry (shared/REFERENCES.md): 8 steps to 5 yards, a step 22.5 in = 0.5715 m (common
// practice); field 160 ft = 48.768 m wide; hashes 53 ft 4 in = 16.256 m (high school) and 60 ft =
// 18.288 m (college) from each sideline (field rules as reported by public encyclopedia copies).
const YARD = 0.9144;
const STEP = 0.5715;
const WIDTH = 48.768;
const HS_HASH = 16.256;
const COLLEGE_HASH = 18.288;

const HEADER = "set,counts,label,side,yard_line,steps_side,in_out,reference,steps_fb,front_back,facing";

let copy: Awaited<ReturnType<typeof privateShowCopy>>;
beforeAll(async () => {
  copy = await privateShowCopy();
});

const upload = (content: string, name = "drill.csv", showId = copy.showId, client = copy.director) =>
  uploadFile(client, `/api/shows/${showId}/imports`, { name, content }, { kind: "drill" });

async function dots(showId: string, setNumber: string) {
  const show = (await copy.director.get(`/api/shows/${showId}`)).body;
  const set = show.sets.find((s: any) => s.number === setNumber);
  if (!set) return null;
  const labelOf = new Map(show.performers.map((p: any) => [p.id, p.label]));
  const res = await copy.director.get(`/api/shows/${showId}/sets/${set.id}`);
  return { set: res.body.set, byLabel: Object.fromEntries(res.body.positions.map((p: any) => [labelOf.get(p.performerId), p])) };
}

describe("the trade's notation, into metres and back", () => {
  const rows = [
    // label, side, yard, steps, in/out, reference, steps, front/back → x, y
    ["T1", "1", "45", "0", "", "front hash", "0", "", -5 * YARD, HS_HASH],
    ["T2", "2", "45", "8", "outside", "back sideline", "0", "", 10 * YARD, WIDTH], // 8 steps outside the 45 = the 40
    ["T3", "", "50", "0", "", "front hash", "4", "in front", 0, HS_HASH - 4 * STEP],
    ["T4", "1", "35", "2", "inside", "back hash", "2", "behind", -15 * YARD + 2 * STEP, WIDTH - HS_HASH + 2 * STEP],
    ["M1", "2", "0", "4", "inside", "front sideline", "6", "behind", 50 * YARD - 4 * STEP, 6 * STEP],
  ] as const;

  it("reads each position to the metre values of the field's geometry", async () => {
    const csv = [HEADER, ...rows.map((r) => ["91", "16", ...r.slice(0, 8), "front"].join(","))].join("\n");
    const res = await upload(csv);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.preview.errors).toEqual([]);
    const byLabel = Object.fromEntries(res.body.preview.drill.dots.map((d: any) => [d.label, d]));
    for (const r of rows) {
      expect(byLabel[r[0]].x, r[0]).toBeCloseTo(r[8], 9);
      expect(byLabel[r[0]].y, r[0]).toBeCloseTo(r[9], 9);
    }
    // 8 steps = 5 yards: T2's "8 steps outside the 45" is exactly the 40 yard line.
    expect(byLabel.T2.words).toBe("side 2: on the 40 yard line; on the back sideline");
    expect(byLabel.T3.words).toBe("on the 50 yard line; 4 steps in front of the front hash");
    expect(byLabel.T4.words).toBe("side 1: 2 steps inside the 35 yard line; 2 steps behind the back hash");
    expect(byLabel.M1.words).toBe("side 2: 4 steps inside the goal line; 6 steps behind the front sideline");
  });

  it("puts hashes where the show's field rules say (college: 60 ft)", async () => {
    const doc = structuredClone(copy.original);
    doc.show.fieldRules = "college";
    const imported = await uploadFile(copy.director, `/api/programs/${copy.programId}/shows/import`, { name: "college.json", content: JSON.stringify(doc) }, { name: "College copy" });
    expect(imported.status).toBe(201);
    const csv = `${HEADER}\n92,8,T1,1,30,0,,front hash,0,,front\n92,8,T2,2,30,0,,back hash,0,,back\n`;
    const res = await upload(csv, "college.csv", imported.body.show.id);
    const [a, b] = res.body.preview.drill.dots;
    expect(a.y).toBeCloseTo(COLLEGE_HASH, 9);
    expect(b.y).toBeCloseTo(WIDTH - COLLEGE_HASH, 9);
    expect(b.facingDeg).toBe(180);
  });
});

describe("preview, then confirm", () => {
  it("writes nothing until confirmed, then everything in one go", async () => {
    const before = await dots(copy.showId, "1");
    const csv = [
      HEADER,
      "1,0,T1,1,40,0,,front hash,0,,side 2",
      "1,0,T2,1,40,2,outside,front hash,0,,side 2",
      "93,24,T1,2,20,0,,back hash,3,in front,back",
      "93,24,T2,2,20,2,inside,back hash,3,in front,back",
    ].join("\n");
    const res = await upload(csv);
    expect(res.status).toBe(201);
    const p = res.body.preview;
    expect(p.writable).toBe(true);
    expect(p.drill.sets).toEqual([
      expect.objectContaining({ number: "1", setId: before!.set.id, creates: 0, changes: 2, countsBefore: null }),
      expect.objectContaining({ number: "93", setId: null, counts: 24, creates: 2 }),
    ]);
    expect(await dots(copy.showId, "93")).toBeNull();
    expect((await dots(copy.showId, "1"))!.byLabel.T1).toEqual(before!.byLabel.T1);

    const confirm = await copy.director.post(`/api/shows/${copy.showId}/imports/${res.body.upload.id}/confirm`);
    expect(confirm.status, JSON.stringify(confirm.body)).toBe(200);
    expect(confirm.body.summary).toEqual({ setsCreated: 1, setsChanged: 1, positions: 4 });
    const after = await dots(copy.showId, "1");
    expect(after!.set.version).toBe(before!.set.version + 1);
    expect(after!.byLabel.T1).toMatchObject({ x: expect.closeTo(-10 * YARD, 9), y: expect.closeTo(HS_HASH, 9), facingDeg: 90 });
    expect(after!.byLabel.T3).toEqual(before!.byLabel.T3); // not in the file: stays
    const created = await dots(copy.showId, "93");
    expect(created!.set.counts).toBe(24);
    expect(created!.byLabel.T2).toMatchObject({ x: expect.closeTo(30 * YARD - 2 * STEP, 9), y: expect.closeTo(WIDTH - HS_HASH - 3 * STEP, 9) });

    const again = await copy.director.post(`/api/shows/${copy.showId}/imports/${res.body.upload.id}/confirm`);
    expect(again.status).toBe(409);
  });

  it("the example file of public/examples reads without errors", async () => {
    const res = await upload(readFileSync("public/examples/drill.csv", "utf8"));
    expect(res.body.preview.errors).toEqual([]);
    expect(res.body.preview.drill.dotCount).toBe(36);
  });

  it("takes positions in metres too", async () => {
    const res = await upload("set,counts,label,x_m,y_m,facing\n94,8,T1,-3.5,12.25,45\n");
    expect(res.body.preview.errors).toEqual([]);
    expect(res.body.preview.drill.dots[0]).toMatchObject({ x: -3.5, y: 12.25, facingDeg: 45 });
  });

  it("keeps the original file with who sent it and when", async () => {
    const csv = `${HEADER}\n95,8,T1,1,30,0,,front hash,0,,front\n`;
    const res = await upload(csv, "kept.csv");
    const file = await fetch(`${process.env.APP_URL ?? "http://127.0.0.1:3000"}/api/shows/${copy.showId}/imports/${res.body.upload.id}/file`, { headers: { cookie: copy.director.cookie! } });
    expect(await file.text()).toBe(csv);
    const list = await copy.director.get(`/api/shows/${copy.showId}/imports`);
    expect(list.body.uploads[0]).toMatchObject({ id: res.body.upload.id, fileName: "kept.csv", uploadedBy: "Copy Director", kind: "drill-csv" });
    expect(Date.now() - new Date(list.body.uploads[0].uploadedAt).getTime()).toBeLessThan(5 * 60_000);
  });
});

describe("bad rows", () => {
  it("lists every bad row with its line and reason, and confirm writes nothing", async () => {
    const csv = [
      HEADER,
      "96,16,T1,1,40,0,,front hash,0,,front",
      "96,16,NOPE,1,40,0,,front hash,0,,front",
      "",
      "96,16,T2,1,37,0,,front hash,0,,front",
      "96,12,T3,1,40,0,,front hash,0,,front",
      "96,16,T1,1,45,0,,front hash,0,,front",
      "96,16,T4,1,40,2,sideways,middle,0,,front",
      "96,16,T5,2,40,0,,front hash,0,,north",
    ].join("\n");
    const res = await upload(csv);
    expect(res.status).toBe(201);
    const errors: { line: number; reason: string }[] = res.body.preview.errors;
    expect(errors.map((e) => e.line)).toEqual([3, 5, 6, 7, 8, 9]);
    expect(errors[0]!.reason).toMatch(/no performer labelled NOPE/);
    expect(errors[1]!.reason).toMatch(/"37" is not a yard line/);
    expect(errors[2]!.reason).toMatch(/set 96 has 16 counts on line 2, not 12/);
    expect(errors[3]!.reason).toMatch(/T1 already has a position in set 96 on line 2/);
    expect(errors[4]!.reason).toMatch(/in_out "sideways".*reference "middle"/);
    expect(errors[5]!.reason).toMatch(/facing "north"/);
    expect(res.body.preview.writable).toBe(false);
    const confirm = await copy.director.post(`/api/shows/${copy.showId}/imports/${res.body.upload.id}/confirm`);
    expect(confirm.status).toBe(400);
    expect(confirm.body.issues["line 3"]).toBeDefined();
    expect(await dots(copy.showId, "96")).toBeNull();
  });

  it("a file without the needed columns says which", async () => {
    const res = await upload("set,label\n1,T1\n");
    expect(res.body.preview.errors[0]).toMatchObject({ line: 1, reason: expect.stringMatching(/Missing column: counts/) });
  });
});

describe("limits and roles", () => {
  it("a file over 1 MB is refused with 413", async () => {
    const row = "97,8,T1,1,40,0,,front hash,0,,front\n";
    const res = await upload(HEADER + "\n" + row.repeat(Math.ceil(1_100_000 / row.length)));
    expect(res.status).toBe(413);
    expect(res.body.error).toMatch(/larger than 1000 kB/);
  });

  it("more than 20 000 rows is refused with 413", async () => {
    const res = await upload("set,counts,label,x_m,y_m\n" + "1,0,T1,0,0\n".repeat(20_001));
    expect(res.status).toBe(413);
    expect(res.body.error).toMatch(/at most 20000 rows/);
  });

  it("staff may not upload; the kind must be given", async () => {
    const staff = await signedIn(DEMO.staff);
    const res = await uploadFile(staff, `/api/shows/${copy.demo.showId}/imports`, { name: "d.csv", content: HEADER }, { kind: "drill" });
    expect(res.status).toBe(403);
    const noKind = await uploadFile(copy.director, `/api/shows/${copy.showId}/imports`, { name: "d.csv", content: HEADER });
    expect(noKind.status).toBe(400);
  });
});
