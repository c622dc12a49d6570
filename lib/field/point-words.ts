// A listening point in words, and back: "on the 50, 27.3 yards behind the front sideline, 18 m up" or
// "side 1: 2 steps outside the 35, 21.9 yards in from the front sideline, 1.7 m up". One convention
// everywhere: along the field in steps from a yard line, across it in yards from a sideline ("behind"
// a sideline is off the field, the stands; "in from" it is on the field), height in metres. Metres
// across are still read ("25 m behind"). Pure; the settings page and the overview use it.
import { FIELD_WIDTH_M, YARD_M, type FieldRules } from "./geometry";
import { describePosition, parseSideToSide, sideAndRest } from "./words";

/** Ear height of a standing listener when no height is given (common practice, no source). */
export const DEFAULT_EAR_HEIGHT_M = 1.7;

export type PointWordsResult = { ok: true; x: number; y: number; z: number } | { ok: false; error: string };

const METRES = String.raw`(\d+(?:\.\d+)?)\s*(?:m|metres?|meters?)`;
const DISTANCE = String.raw`(\d+(?:\.\d+)?)\s*(m|metres?|meters?|yd|yds|yards?)`;
const DEPTH = new RegExp(String.raw`^${DISTANCE}\s+(behind|in\s+from|inside|in\s+front\s+of)\s+(?:the\s+)?(front|back|home|visitors?)\s*(?:sideline|side\s*line)$`);
const ON_SIDELINE = /^on\s+(?:the\s+)?(front|back|home|visitors?)\s*(?:sideline|side\s*line)$/;
const HEIGHT = new RegExp(String.raw`^(?:at\s+)?${METRES}\s*(?:up|high|above(?:\s+the\s+field)?)$`);

const round1 = (v: number) => Math.round(v * 10) / 10;

function depthY(part: string): number | null {
  const on = ON_SIDELINE.exec(part);
  if (on) return /^(front|home)$/.test(on[1]) ? 0 : FIELD_WIDTH_M;
  const m = DEPTH.exec(part);
  if (!m) return null;
  const metres = Number(m[1]) * (m[2].startsWith("y") ? YARD_M : 1);
  const front = /^(front|home)$/.test(m[4]);
  const away = m[3] === "behind";
  // Behind the front sideline is toward the home stands (y < 0); behind the back sideline, beyond it.
  return front ? (away ? -metres : metres) : away ? FIELD_WIDTH_M + metres : FIELD_WIDTH_M - metres;
}

/** Reads a listening point's place written as describeListeningPoint writes it. */
export function listeningPointFromWords(text: string): PointWordsResult {
  const { side, rest } = sideAndRest(text);
  const parts = rest.split(/[;,]/).map((p) => p.trim()).filter(Boolean);
  let x: number | null = null;
  let y: number | null = null;
  let z: number | null = null;
  for (const part of parts) {
    const h = HEIGHT.exec(part);
    if (h) {
      z = Number(h[1]);
      continue;
    }
    const d = depthY(part);
    if (d !== null) {
      y = d;
      continue;
    }
    const own = sideAndRest(part);
    const across = parseSideToSide(own.rest, own.side ?? side);
    if (typeof across === "string") return { ok: false, error: `${across}; write e.g. "on the 50, 27 yards behind the front sideline, 18 m up".` };
    x = across;
  }
  if (x === null) return { ok: false, error: 'Say where along the field, e.g. "on the 50" or "side 1: on the 35".' };
  if (y === null) return { ok: false, error: 'Say how far from a sideline, e.g. "27 yards behind the front sideline" or "20 yards in from the front sideline".' };
  return { ok: true, x, y, z: z ?? DEFAULT_EAR_HEIGHT_M };
}

/** "27.3 yards" (a tenth of a yard, about 9 cm), "1 yard". */
export function formatYards(m: number): string {
  const yd = Math.round((m / YARD_M) * 10) / 10;
  return `${yd} ${yd === 1 ? "yard" : "yards"}`;
}

/** A listening point in words: its yard line (in steps), yards from the nearer sideline, height in metres. */
export function describeListeningPoint(x: number, y: number, z: number, rules: FieldRules): string {
  const d = describePosition(x, Math.min(Math.max(y, 0), FIELD_WIDTH_M), rules);
  const across = d.side ? `side ${d.side}: ${d.sideToSide}` : d.sideToSide;
  const front = y <= FIELD_WIDTH_M / 2;
  const from = front ? y : FIELD_WIDTH_M - y;
  const depth =
    Math.abs(from) < 0.05 * YARD_M
      ? `on the ${front ? "front" : "back"} sideline`
      : `${formatYards(Math.abs(from))} ${from < 0 ? "behind" : "in from"} the ${front ? "front" : "back"} sideline`;
  return `${across}, ${depth}, ${round1(z)} m up`;
}
