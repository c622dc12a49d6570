// Coordinate sheets: the PDF opens (pdftoppm renders its first page), the words read back to the
// stored metres, and the CSV exports read back by the imports unchanged, formulas neutralised.
import { execFileSync } from "node:child_process";
import { mkdirSync, readFileSync, statSync, writeFileSync } from "node:fs";
import path from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { positionFromWords } from "@/lib/field/words";
import { labelCollisions } from "@/lib/sheets/label-layout";
import { renderSheetsPdfWithLayout } from "@/lib/sheets/pdf";
import { APP_URL, DEMO, signedIn, type Client } from "../support/api";
import { privateShowCopy, uploadFile } from "../support/upload";

let copy: Awaited<ReturnType<typeof privateShowCopy>>;
beforeAll(async () => {
  copy = await privateShowCopy();
});

async function download(client: Client, p: string) {
  const res = await fetch(APP_URL + p, { headers: { cookie: client.cookie! } });
  return { status: res.status, type: res.headers.get("content-type"), bytes: Buffer.from(await res.arrayBuffer()) };
}

const outDir = path.resolve(".tmp/sheets-test");

describe("the PDF", () => {
  it("opens: pdftoppm renders its first page, one page per performer and per set", async () => {
    const pdf = await download(copy.director, `/api/shows/${copy.showId}/sheets/pdf`);
    expect(pdf.status).toBe(200);
    expect(pdf.type).toBe("application/pdf");
    expect(pdf.bytes.subarray(0, 5).toString()).toBe("%PDF-");
    mkdirSync(outDir, { recursive: true });
    const file = path.join(outDir, "all.pdf");
    writeFileSync(file, pdf.bytes);
    execFileSync("pdftoppm", ["-f", "1", "-l", "1", "-r", "50", "-png", "-singlefile", file, path.join(outDir, "all-page1")]);
    const png = readFileSync(path.join(outDir, "all-page1.png"));
    expect(png.subarray(1, 4).toString()).toBe("PNG");
    expect(statSync(path.join(outDir, "all-page1.png")).size).toBeGreaterThan(2000);
    const info = execFileSync("pdfinfo", [file]).toString();
    const pages = Number(/Pages:\s+(\d+)/.exec(info)![1]);
    expect(pages).toBe(copy.original.performers.length + copy.original.sets.length);
  });

  it("one set alone is one page; an unknown set is 404", async () => {
    const number = copy.original.sets[3].number;
    const pdf = await download(copy.director, `/api/shows/${copy.showId}/sheets/pdf?by=sets&set=${number}`);
    const file = path.join(outDir, "set.pdf");
    writeFileSync(file, pdf.bytes);
    expect(execFileSync("pdfinfo", [file]).toString()).toMatch(/Pages:\s+1\b/);
    execFileSync("pdftoppm", ["-f", "1", "-l", "1", "-r", "50", "-png", "-singlefile", file, path.join(outDir, "set-page1")]);
    expect((await download(copy.director, `/api/shows/${copy.showId}/sheets/pdf?set=999Z`)).status).toBe(404);
  });
});

describe("the pictures and words of the sheets", () => {
  it("places every set's labels apart (no label over another or over a dot), and pdftoppm renders a set page and a performer page", async () => {
    const { body } = await copy.director.get(`/api/shows/${copy.showId}/sheets`);
    const input = { programName: body.programName, showName: body.show.name, rules: body.show.fieldRules, performers: body.performers.slice(0, 2), sets: body.sets };
    const { pdf, layout } = await renderSheetsPdfWithLayout(input);
    expect(layout.setLabels).toHaveLength(body.sets.length);
    for (const s of layout.setLabels) {
      expect(s.labels).toHaveLength(body.sets.find((x: any) => x.number === s.set).dots.length);
      // The dot radius the per-set picture draws (width / 240 of a 532 pt picture).
      expect(labelCollisions(s.labels, 532 / 240), `set ${s.set}`).toEqual([]);
    }
    // The demo's blocks are denser than their labels: some stand away from their dot on a leader line.
    expect(layout.setLabels.some((s) => s.labels.some((l) => l.leader))).toBe(true);
    mkdirSync(outDir, { recursive: true });
    const file = path.join(outDir, "layout.pdf");
    writeFileSync(file, pdf);
    // Page 1 is a performer's (a table and a picture per set), page 3 the first set's.
    for (const page of ["1", "3"]) {
      execFileSync("pdftoppm", ["-f", page, "-l", page, "-r", "60", "-png", "-singlefile", file, path.join(outDir, `layout-page${page}`)]);
      expect(statSync(path.join(outDir, `layout-page${page}.png`)).size).toBeGreaterThan(4000);
    }
  });

  it("writes positions in full words and facing in words, no shorthand, and names the instrument as people say it", async () => {
    const { body } = await copy.director.get(`/api/shows/${copy.showId}/sheets`);
    const dots = body.sets.flatMap((s: any) => s.dots);
    for (const d of dots) {
      expect(d.sideToSide).toMatch(/^(Side [12]: (on the|\d+(\.\d+)? steps? (inside|outside) the) (\d+ yard line|goal line)|On the 50 yard line)$/);
      expect(d.frontToBack).toMatch(/^(on the|\d+(\.\d+)? steps? (in front of|behind) the) (front|back) (hash|sideline)$/);
      expect(d.facingWords).toMatch(/^toward (the press box|side [12]|the back sideline)/);
    }
    const sax = body.performers.find((p: any) => p.instrument === "alto-sax");
    expect(sax.instrumentName).toBe("Alto saxophone");
    // The PDF's text holds the words, not the shorthand.
    const pdf = await download(copy.director, `/api/shows/${copy.showId}/sheets/pdf?by=sets&set=${body.sets[0].number}`);
    const file = path.join(outDir, "words.pdf");
    writeFileSync(file, pdf.bytes);
    const text = execFileSync("pdftotext", ["-layout", file, "-"]).toString();
    expect(text).toMatch(/Side [12]: \d/);
    expect(text).toMatch(/steps? (in front of|behind) the (front|back) hash/);
    expect(text).not.toMatch(/\b(FH|BH|FSL|BSL)\b|\bS[12] \d+(\.\d+)? (in|out)\b/);
  });
});

describe("sheet data", () => {
  it("gives every performer every set, in words that read back to the stored metres", async () => {
    const res = await copy.director.get(`/api/shows/${copy.showId}/sheets`);
    expect(res.status).toBe(200);
    const { performers, sets, show } = res.body;
    expect(performers).toHaveLength(copy.original.performers.length);
    expect(sets).toHaveLength(copy.original.sets.length);
    const t1 = performers.find((p: any) => p.label === "T1");
    expect(t1.rows.map((r: any) => r.set)).toEqual(copy.original.sets.map((s: any) => s.number));
    // Words are rounded to a quarter step: reading them back lands within 1/8 step (0.0714 m).
    for (const r of t1.rows) {
      const back = positionFromWords(`${r.sideToSide}; ${r.frontToBack}`, show.fieldRules);
      expect(back.ok).toBe(true);
      if (back.ok) {
        expect(Math.abs(back.x - r.x)).toBeLessThanOrEqual(0.5715 / 8 + 1e-9);
        expect(Math.abs(back.y - r.y)).toBeLessThanOrEqual(0.5715 / 8 + 1e-9);
      }
    }
  });

  it("staff may read and print; another program gets 404", async () => {
    const staff = await signedIn(DEMO.staff);
    expect((await staff.get(`/api/shows/${copy.demo.showId}/sheets`)).status).toBe(200);
    expect((await copy.director.get(`/api/shows/${copy.demo.showId}/sheets`)).status).toBe(404);
  });
});

describe("CSV exports", () => {
  it("the drill CSV imports back with nothing to change", async () => {
    const csv = (await download(copy.director, `/api/shows/${copy.showId}/sheets/drill.csv`)).bytes.toString("utf8");
    const res = await uploadFile(copy.director, `/api/shows/${copy.showId}/imports`, { name: "drill.csv", content: csv }, { kind: "drill" });
    expect(res.body.preview.errors).toEqual([]);
    for (const s of res.body.preview.drill.sets) expect(s, s.number).toMatchObject({ creates: 0, changes: 0, countsBefore: null });
  });

  it("text cells that a spreadsheet would run are neutralised, and read back as they were", async () => {
    const evil = '=HYPERLINK("http://attacker.example","x")';
    const setName = await uploadFile(
      copy.director,
      `/api/shows/${copy.showId}/imports`,
      { name: "r.csv", content: `label,instrument,section,part,strength,name\nT1,trumpet,Trumpets,@lead,3,"${evil.replace(/"/g, '""')}"\n` },
      { kind: "roster" },
    );
    expect((await copy.director.post(`/api/shows/${copy.showId}/imports/${setName.body.upload.id}/confirm`)).status).toBe(200);
    const csv = (await download(copy.director, `/api/shows/${copy.showId}/sheets/roster.csv`)).bytes.toString("utf8");
    const t1 = csv.split("\r\n").find((l) => l.startsWith("T1,"))!;
    // OWASP "CSV Injection": the cell starts with ' so it is text, not a formula; numbers stay numbers.
    expect(t1).toContain(`"'=HYPERLINK(`);
    expect(t1).toContain(`,"'@lead",`);
    expect(csv).not.toMatch(/(^|,)"?[=+@]/m);
    const back = await uploadFile(copy.director, `/api/shows/${copy.showId}/imports`, { name: "r2.csv", content: csv }, { kind: "roster" });
    expect(back.body.preview.errors).toEqual([]);
    expect(back.body.preview.roster.changes).toEqual([]);
    expect(back.body.preview.roster.unchanged).toBe(copy.original.performers.length);
  });
});
