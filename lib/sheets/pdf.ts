// Coordinate sheets as a PDF (pdfkit, US Letter), our own layout: a page per performer (every set's
// position in full words with its counts and facing, and a small picture per set of where they
// stand) and a page per set (the field with every dot, labels placed apart with leader lines, and
// every dot's position in full words). The pictures are the geometry of field-picture.ts, which the
// screen draws too.
import PDFDocument from "pdfkit";
import type { FieldRules } from "@/lib/field/geometry";
import { FIELD_RULES_WORDS } from "@/lib/field/rules-words";
import type { PerformerSheet, SetSheet } from "./coordinates";
import { fieldPicture, type FieldPicture, type PictureDot } from "./field-picture";
import { wedgePoints } from "@/lib/field/marks";
import { MARK_KEY } from "./mark-key";
import type { PlacedLabel } from "./label-layout";

export interface SheetsPdfInput {
  programName: string;
  showName: string;
  rules: FieldRules;
  performers: PerformerSheet[];
  sets: SetSheet[];
  /** Every set of the show, for the performers' small pictures (default: `sets`). */
  allSets?: SetSheet[];
}

/** What a rendering placed, so tests can check the pictures' labels (page index → labels). */
export interface SheetsLayout {
  setLabels: { set: string; labels: PlacedLabel[] }[];
}

const MARGIN = 40;
const INK = "#1f2933";
const SOFT = "#5b6470";
const TURF = "#eef6ee";
const LINE = "#8aa68a";
const HIGHLIGHT = "#c2410c";

function header(doc: PDFKit.PDFDocument, input: SheetsPdfInput, title: string, sub?: string) {
  doc.fillColor(SOFT).font("Helvetica").fontSize(9).text(`${input.programName} · ${input.showName} · coordinate sheet`, MARGIN, MARGIN, { lineBreak: false });
  doc.fillColor(INK).font("Helvetica-Bold").fontSize(18).text(title, MARGIN, MARGIN + 13, { lineBreak: false });
  let y = MARGIN + 36;
  if (sub) {
    doc.fillColor(SOFT).font("Helvetica").fontSize(10).text(sub, MARGIN, y, { lineBreak: false });
    y += 15;
  }
  doc.moveTo(MARGIN, y).lineTo(doc.page.width - MARGIN, y).lineWidth(1.2).strokeColor(INK).stroke();
  return y + 6;
}

function footer(doc: PDFKit.PDFDocument, input: SheetsPdfInput) {
  const y = doc.page.height - MARGIN + 8;
  doc.fillColor(SOFT).font("Helvetica").fontSize(7.5).text(`A step is 8 to 5 (22.5 in). ${FIELD_RULES_WORDS[input.rules].sheet}. Side 1 is on the left seen from the press box; inside means toward the 50.`, MARGIN, y, {
    width: doc.page.width - 2 * MARGIN,
    lineBreak: false,
  });
}

/** Draws a picture at (left, top); `mine` marks one performer's dot. */
function drawPicture(doc: PDFKit.PDFDocument, pic: FieldPicture, left: number, top: number, mine?: string) {
  const X = (x: number) => left + x;
  const Y = (y: number) => top + y;
  doc.rect(X(pic.field.x), Y(pic.field.y), pic.field.w, pic.field.h).fillAndStroke(TURF, INK);
  for (const l of pic.yardLines) {
    doc.moveTo(X(l.x), Y(pic.field.y)).lineTo(X(l.x), Y(pic.field.y + pic.field.h)).lineWidth(l.goal ? 1.1 : 0.4).strokeColor(l.goal ? INK : LINE).stroke();
    if (l.number !== null && pic.width > 300) doc.fillColor("#7a937a").font("Helvetica-Bold").fontSize(pic.fontSize * 1.4).text(String(l.number), X(l.x) - 10, Y(pic.numberY) - pic.fontSize * 1.4, { width: 20, align: "center", lineBreak: false });
  }
  const tick = pic.width / 400;
  for (const t of pic.hashTicks) doc.moveTo(X(t.x), Y(t.y) - tick).lineTo(X(t.x), Y(t.y) + tick).lineWidth(0.3).strokeColor(LINE).stroke();
  for (const l of pic.labels) {
    if (!l.leader) continue;
    const cx = Math.min(Math.max(l.dotX, l.box.x), l.box.x + l.box.w);
    const cy = Math.min(Math.max(l.dotY, l.box.y), l.box.y + l.box.h);
    doc.moveTo(X(l.dotX), Y(l.dotY)).lineTo(X(cx), Y(cy)).lineWidth(0.3).strokeColor(SOFT).stroke();
  }
  for (const d of pic.dots) {
    if (d.label === mine) continue;
    if (!mine && d.facingDeg !== undefined && d.spreadDeg !== undefined) {
      // The performer's mark: the sound wedge toward the facing, light, under the dot.
      const pts = wedgePoints(d.facingDeg, d.spreadDeg, pic.dotRadius * 2.6);
      doc.polygon(...pts.map(([x, y]) => [X(d.x + x), Y(d.y + y)] as [number, number])).lineWidth(0.3).fillOpacity(0.25).fillAndStroke("#4a5566", "#4a5566");
      doc.fillOpacity(1);
    }
    doc.circle(X(d.x), Y(d.y), pic.dotRadius).fill(mine ? "#9aa1ab" : INK);
  }
  if (mine) {
    const me = pic.dots.find((d) => d.label === mine);
    if (me) {
      doc.circle(X(me.x), Y(me.y), pic.dotRadius * 2.4).fill(HIGHLIGHT);
      doc.circle(X(me.x), Y(me.y), pic.dotRadius * 3.4).lineWidth(0.6).strokeColor(INK).stroke();
    }
  }
  for (const l of pic.labels) doc.fillColor(INK).font("Helvetica").fontSize(pic.fontSize).text(l.label, X(l.box.x), Y(l.box.y), { lineBreak: false });
}

function dotsOf(s: SetSheet): PictureDot[] {
  return s.dots.map((d) => ({ label: d.label, x: d.x, y: d.y, facingDeg: d.facingDeg, spreadDeg: d.spreadDeg }));
}

function performerPage(doc: PDFKit.PDFDocument, input: SheetsPdfInput, p: PerformerSheet, setsByNumber: Map<string, SetSheet>) {
  let y = header(doc, input, `${p.label}${p.name ? ` — ${p.name}` : ""}`, `${p.section}${p.part ? `, ${p.part}` : ""} · ${p.instrumentName}`);
  const width = doc.page.width - 2 * MARGIN;
  const cols = [
    { title: "Set", width: 30 },
    { title: "Counts", width: 38 },
    { title: "Side to side", width: 160 },
    { title: "Front to back", width: 150 },
    { title: "Facing", width: width - 378 },
  ];
  const size = 7.5;
  const rowH = size + 5;
  const row = (cells: string[], bold: boolean, shade: boolean) => {
    if (shade) doc.rect(MARGIN, y, width, rowH).fill("#f1f3f5");
    let x = MARGIN;
    doc.font(bold ? "Helvetica-Bold" : "Helvetica").fontSize(size).fillColor(INK);
    cells.forEach((c, i) => {
      doc.text(c, x + 2, y + 2.5, { width: cols[i]!.width - 4, lineBreak: false, ellipsis: true });
      x += cols[i]!.width;
    });
    y += rowH;
  };
  row(cols.map((c) => c.title), true, false);
  if (!p.rows.length) row(["—", "", "Not in any set", "", ""], false, false);
  p.rows.forEach((r, i) => row([r.set, String(r.counts), r.sideToSide, r.frontToBack, r.facingWords], false, i % 2 === 1));
  y += 10;
  // A small picture per set: where this performer stands among the band.
  const perRow = 4;
  const gap = 8;
  const cellW = (width - (perRow - 1) * gap) / perRow;
  const bottom = doc.page.height - MARGIN - 4;
  p.rows.forEach((r, i) => {
    const set = setsByNumber.get(r.set);
    if (!set) return;
    const pic = fieldPicture(input.rules, dotsOf(set), { width: cellW, labels: false, dotRadius: cellW / 150 });
    const col = i % perRow;
    if (col === 0 && i > 0) y += pic.height + 14;
    if (y + pic.height + 12 > bottom) {
      footer(doc, input);
      doc.addPage();
      y = header(doc, input, `${p.label} (continued)`);
    }
    const left = MARGIN + col * (cellW + gap);
    doc.fillColor(INK).font("Helvetica-Bold").fontSize(7.5).text(`Set ${r.set}`, left, y, { lineBreak: false });
    drawPicture(doc, pic, left, y + 10, p.label);
  });
  footer(doc, input);
}

function setPage(doc: PDFKit.PDFDocument, input: SheetsPdfInput, s: SetSheet): PlacedLabel[] {
  let y = header(doc, input, `Set ${s.number}`, `${s.counts} ${s.counts === 1 ? "count" : "counts"} from the set before · ${s.dots.length} ${s.dots.length === 1 ? "performer" : "performers"}`);
  const width = doc.page.width - 2 * MARGIN;
  const pic = fieldPicture(input.rules, dotsOf(s), { width });
  drawPicture(doc, pic, MARGIN, y);
  doc.fillColor(SOFT).font("Helvetica").fontSize(7).text("Front sideline, press box side", MARGIN, y + pic.height - 9, { width, align: "center", lineBreak: false });
  y += pic.height + 18;
  // Every dot in full words, two columns; the type shrinks to keep one line a dot.
  const colW = width / 2 - 6;
  const bottom = doc.page.height - MARGIN - 2;
  const half = Math.ceil(s.dots.length / 2);
  const rows = Math.max(1, half);
  const size = Math.max(5.2, Math.min(7, (bottom - y) / rows - 1.6));
  const rowH = size + 1.6;
  const labelW = size * 4;
  s.dots.forEach((d, i) => {
    const col = i < half ? 0 : 1;
    const r = i < half ? i : i - half;
    const x = MARGIN + col * (colW + 12);
    const text = `${d.sideToSide}; ${d.frontToBack}`;
    doc.font("Helvetica").fontSize(size);
    const fits = doc.widthOfString(text) <= colW - labelW;
    doc.fillColor(INK).font("Helvetica-Bold").fontSize(size).text(d.label, x, y + r * rowH, { width: labelW, lineBreak: false });
    doc.font("Helvetica").fontSize(fits ? size : size * ((colW - labelW) / doc.widthOfString(text))).text(text, x + labelW, y + r * rowH, { width: colW - labelW, lineBreak: false });
  });
  doc.fillColor(SOFT).font("Helvetica").fontSize(7).text(MARK_KEY, MARGIN, y - 10, { lineBreak: false });
  footer(doc, input);
  return pic.labels;
}

/** Renders the sheets; resolves with the PDF bytes and what the pictures placed. */
export function renderSheetsPdfWithLayout(input: SheetsPdfInput): Promise<{ pdf: Buffer; layout: SheetsLayout }> {
  const doc = new PDFDocument({ size: "LETTER", margins: { top: MARGIN, left: MARGIN, right: MARGIN, bottom: 16 }, autoFirstPage: false, info: { Title: `${input.showName} — coordinate sheets`, Creator: "Farfield" } });
  const chunks: Buffer[] = [];
  doc.on("data", (c: Buffer) => chunks.push(c));
  const layout: SheetsLayout = { setLabels: [] };
  const done = new Promise<{ pdf: Buffer; layout: SheetsLayout }>((resolve, reject) => {
    doc.on("end", () => resolve({ pdf: Buffer.concat(chunks), layout }));
    doc.on("error", reject);
  });
  const setsByNumber = new Map((input.allSets ?? input.sets).map((s) => [s.number, s]));
  for (const p of input.performers) {
    doc.addPage();
    performerPage(doc, input, p, setsByNumber);
  }
  for (const s of input.sets) {
    doc.addPage();
    layout.setLabels.push({ set: s.number, labels: setPage(doc, input, s) });
  }
  if (!input.performers.length && !input.sets.length) {
    doc.addPage();
    header(doc, input, "Coordinate sheets");
    doc.font("Helvetica").fontSize(11).text("This show has no sets yet.", MARGIN, MARGIN + 60);
  }
  doc.end();
  return done;
}

/** Renders the sheets; resolves with the PDF bytes. */
export async function renderSheetsPdf(input: SheetsPdfInput): Promise<Buffer> {
  return (await renderSheetsPdfWithLayout(input)).pdf;
}
