// Coordinate sheets as a PDF (pdfkit, US Letter): one page per performer, one per set with the
// whole field drawn to scale. Our own layout.
import PDFDocument from "pdfkit";
import { END_LINE_X_M, FIELD_WIDTH_M, GOAL_LINE_X_M, hashesY, YARD_M, type FieldRules } from "@/lib/field/geometry";
import type { PerformerSheet, SetSheet } from "./coordinates";

export interface SheetsPdfInput {
  programName: string;
  showName: string;
  rules: FieldRules;
  performers: PerformerSheet[];
  sets: SetSheet[];
}

const MARGIN = 40;
const INK = "#1f2933";
const SOFT = "#6b7280";
const RULES_WORDS: Record<FieldRules, string> = { "high-school": "high-school hashes (53 ft 4 in from each sideline)", college: "college hashes (60 ft from each sideline)" };

function header(doc: PDFKit.PDFDocument, input: SheetsPdfInput, title: string) {
  doc.fillColor(SOFT).font("Helvetica").fontSize(9).text(`${input.programName} · ${input.showName}`, MARGIN, MARGIN);
  doc.fillColor(INK).font("Helvetica-Bold").fontSize(18).text(title, MARGIN, MARGIN + 14);
  doc.moveDown(0.3);
}

function footer(doc: PDFKit.PDFDocument, input: SheetsPdfInput, legend = "") {
  const y = doc.page.height - MARGIN - 10;
  doc.fillColor(SOFT).font("Helvetica").fontSize(legend ? 6.5 : 8).text(`${legend}Steps are 8 to 5 (22.5 in). ${RULES_WORDS[input.rules]}. Side 1 is on the left seen from the press box.`, MARGIN, y, {
    width: doc.page.width - 2 * MARGIN,
    lineBreak: false,
  });
}

function table(doc: PDFKit.PDFDocument, top: number, columns: { title: string; width: number }[], rows: string[][], fontSize = 9.5) {
  let y = top;
  const rowH = fontSize + 6;
  const draw = (cells: string[], bold: boolean) => {
    let x = MARGIN;
    doc.font(bold ? "Helvetica-Bold" : "Helvetica").fontSize(fontSize).fillColor(INK);
    cells.forEach((c, i) => {
      doc.text(c, x + 3, y + 3, { width: columns[i]!.width - 6, lineBreak: false, ellipsis: true });
      x += columns[i]!.width;
    });
    y += rowH;
  };
  draw(columns.map((c) => c.title), true);
  doc.moveTo(MARGIN, y).lineTo(MARGIN + columns.reduce((s, c) => s + c.width, 0), y).strokeColor(INK).lineWidth(0.8).stroke();
  rows.forEach((r, i) => {
    if (i % 2 === 1) doc.rect(MARGIN, y, columns.reduce((s, c) => s + c.width, 0), rowH).fill("#f1f3f5");
    draw(r, false);
  });
  return y;
}

function performerPage(doc: PDFKit.PDFDocument, input: SheetsPdfInput, p: PerformerSheet) {
  header(doc, input, `${p.label}${p.name ? ` — ${p.name}` : ""}`);
  doc.fillColor(SOFT).font("Helvetica").fontSize(10).text(`${p.section}${p.part ? `, ${p.part}` : ""} · ${p.instrument}`);
  const rows = p.rows.map((r) => [r.set, String(r.counts), r.sideToSide, r.frontToBack, r.facing]);
  table(doc, doc.y + 10, [
    { title: "Set", width: 40 },
    { title: "Counts", width: 48 },
    { title: "Side to side", width: 190 },
    { title: "Front to back", width: 190 },
    { title: "Facing", width: 64 },
  ], rows.length ? rows : [["—", "", "Not in any set", "", ""]]);
  footer(doc, input);
}

/** Short words for the dense list under a set's field ("S1 2.75 out 35", "5.25 behind FH"); the legend is in the footer. */
export function compactWords(d: { sideToSide: string; frontToBack: string }): string {
  const across = d.sideToSide
    .replace(/^side ([12]): /, "S$1 ")
    .replace(/ steps? /, " ")
    .replace("outside the ", "out ")
    .replace("inside the ", "in ")
    .replace("on the ", "on ")
    .replace(" yard line", "")
    .replace("goal line", "G");
  const deep = d.frontToBack
    .replace(/ steps? /, " ")
    .replace("in front of the ", "in front ")
    .replace("behind the ", "behind ")
    .replace("on the ", "on ")
    .replace("front hash", "FH")
    .replace("back hash", "BH")
    .replace("front sideline", "FSL")
    .replace("back sideline", "BSL");
  return `${across} · ${deep}`;
}

// The drawing shows room in front of the front sideline, where a front ensemble stands.
const FRONT_ROOM_M = 7;
const BACK_ROOM_M = 2;

function field(doc: PDFKit.PDFDocument, rules: FieldRules, top: number, width: number, dots: SetSheet["dots"]) {
  const scale = width / (2 * END_LINE_X_M);
  const height = FIELD_WIDTH_M * scale;
  const fieldTop = top + BACK_ROOM_M * scale;
  const left = MARGIN;
  const px = (x: number) => left + (x + END_LINE_X_M) * scale;
  const py = (y: number) => fieldTop + height - y * scale; // front sideline at the bottom, as seen from the press box
  doc.rect(left, fieldTop, width, height).fillAndStroke("#eef6ee", INK);
  for (let k = -10; k <= 10; k++) {
    const x = px(k * 5 * YARD_M);
    doc.moveTo(x, fieldTop).lineTo(x, fieldTop + height).lineWidth(k % 2 === 0 ? 0.8 : 0.4).strokeColor("#8aa68a").stroke();
    const yard = 50 - Math.abs(k) * 5;
    if (yard % 10 === 0 && yard > 0) doc.fillColor("#7a937a").font("Helvetica-Bold").fontSize(8).text(String(yard), x - 10, fieldTop + height - 14, { width: 20, align: "center" });
  }
  for (const g of [-GOAL_LINE_X_M, GOAL_LINE_X_M]) doc.moveTo(px(g), fieldTop).lineTo(px(g), fieldTop + height).lineWidth(1.4).strokeColor(INK).stroke();
  const h = hashesY(rules);
  for (let k = -50; k <= 50; k++) {
    const x = px(k * YARD_M);
    for (const y of [h.front, h.back]) doc.moveTo(x, py(y) - 1.5).lineTo(x, py(y) + 1.5).lineWidth(0.5).strokeColor("#8aa68a").stroke();
  }
  doc.fillColor(SOFT).font("Helvetica").fontSize(7).text("Side 1", left + 2, fieldTop - 9, { lineBreak: false });
  doc.text("Side 2", left + width - 26, fieldTop - 9, { lineBreak: false });
  doc.text("Front sideline, press box side", left, fieldTop + height + FRONT_ROOM_M * scale - 8, { width, align: "center" });
  for (const d of dots) {
    doc.circle(px(d.x), py(d.y), 2.2).fill(INK);
    doc.fillColor(INK).font("Helvetica").fontSize(5.5).text(d.label, px(d.x) + 2.5, py(d.y) - 7, { lineBreak: false });
  }
  return fieldTop + height + FRONT_ROOM_M * scale + 6;
}

function setPage(doc: PDFKit.PDFDocument, input: SheetsPdfInput, s: SetSheet) {
  header(doc, input, `Set ${s.number} — ${s.counts} counts`);
  const width = doc.page.width - 2 * MARGIN;
  const y = field(doc, input.rules, doc.y + 6, width, s.dots);
  // Every dot in two columns of small type under the field.
  const half = Math.ceil(s.dots.length / 2);
  const colW = width / 2;
  // Sized so 72 dots and the field fit one Letter page; bigger bands get smaller type.
  const fontSize = s.dots.length > 80 ? 5.5 : 6.5;
  const rowH = fontSize + 2;
  s.dots.forEach((d, i) => {
    const col = i < half ? 0 : 1;
    const row = i < half ? i : i - half;
    const x = MARGIN + col * colW;
    doc.fillColor(INK).font("Helvetica-Bold").fontSize(fontSize).text(d.label, x, y + row * rowH, { width: 26, lineBreak: false });
    doc.font("Helvetica").text(compactWords(d), x + 26, y + row * rowH, { width: colW - 30, lineBreak: false });
  });
  footer(doc, input, "S1/S2 side 1/2 · in/out inside/outside · FH/BH front/back hash · FSL/BSL front/back sideline · numbers are steps. ");
}

/** Renders the sheets; resolves with the PDF bytes. */
export function renderSheetsPdf(input: SheetsPdfInput): Promise<Buffer> {
  const doc = new PDFDocument({ size: "LETTER", margins: { top: MARGIN, left: MARGIN, right: MARGIN, bottom: 16 }, autoFirstPage: false, info: { Title: `${input.showName} — coordinate sheets`, Creator: "Farfield" } });
  const chunks: Buffer[] = [];
  doc.on("data", (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
  });
  for (const p of input.performers) {
    doc.addPage();
    performerPage(doc, input, p);
  }
  for (const s of input.sets) {
    doc.addPage();
    setPage(doc, input, s);
  }
  if (!input.performers.length && !input.sets.length) {
    doc.addPage();
    header(doc, input, "Coordinate sheets");
    doc.font("Helvetica").fontSize(11).text("This show has no sets yet.");
  }
  doc.end();
  return done;
}
