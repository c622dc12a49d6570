// Listen: the graph the control plays, rendered offline in Chromium (OfflineAudioContext through the page's own
// code, window.__farfieldListen), and a director's walk through the control in the field editor.
// Band energies are measured in Node (tests/support/octave-energies.ts: an FFT summed between IEC 61260-1 octave edges).
import { mkdirSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { CEILING } from "@/components/listen/listen-graph";
import type { OfflineRequest } from "@/components/listen/offline-render";
import { NO_SOLO_MUTE } from "@/lib/listen/audible";
import type { ListenAnswer, ListenPart } from "@/lib/listen/types";
import { APP_URL, DEMO, demoIds } from "../support/api";
import { launchBrowser, signIn, type BrowserSession } from "../support/browser";
import { octaveEnergies } from "../support/octave-energies";
import { openSet } from "./editor-support";

const SHOTS = path.resolve(__dirname, "../../.tmp/shots");
const SR = 48_000;
let ids: Awaited<ReturnType<typeof demoIds>>;
let session: BrowserSession;

beforeAll(async () => {
  ids = await demoIds();
  mkdirSync(SHOTS, { recursive: true });
  session = await launchBrowser();
  await signIn(session.page, DEMO.director);
}, 120_000);
afterAll(async () => session?.close());

const part = (key: string, voice: ListenPart["voice"], register: ListenPart["register"], bandsDb: number[], planChangeDb: number, arrivalMs: number): ListenPart => ({
  key: `${key}|${voice}`,
  section: key,
  voice,
  family: "brass",
  register,
  bandsDb,
  planChangeDb,
  arrivalMs,
});
const MELODY = part("Trumpets", "melody", "soprano", [40, 50, 65, 75, 80, 78, 70, 60], 3, 300);
const BASS = part("Tubas", "bass", "bass", [80, 82, 78, 70, 60, 50, 40, 30], -4, 340);
const answer = (parts: ListenPart[]): ListenAnswer => ({ listeningPointId: "lp", parts, backgroundOctaveDb: null });
// The opening set held 8 counts at 240 counts a minute: 2 s of steady sound.
const input = (parts: ListenPart[]): OfflineRequest["input"] => ({ from: null, to: answer(parts), counts: 0, spanStartOnLine: 0, score: null, fallbackBpm: 240 });

async function render(req: Partial<OfflineRequest> & { input: OfflineRequest["input"] }): Promise<Float64Array> {
  const full: OfflineRequest = { ab: "written", soloMute: NO_SOLO_MUTE, background: false, sampleRate: SR, ...req };
  return Float64Array.from(await session.page.evaluate((r) => window.__farfieldListen!.render(r), full));
}

/** Octave energies of 65 536 samples from `fromS` seconds. */
const octaves = (x: Float64Array, fromS: number) => octaveEnergies(x, Math.round(fromS * SR), SR);
const meanSquare = (x: Float64Array, fromS: number, toS: number) => {
  let s = 0;
  const a = Math.round(fromS * SR), b = Math.round(toS * SR);
  for (let i = a; i < b; i++) s += x[i]! * x[i]!;
  return s / (b - a);
};
const db = (r: number) => 10 * Math.log10(r);
/** First sample above a thousandth of the peak: where the sound begins (both parts share one envelope, so the same fraction marks the same moment). */
const onsetS = (x: Float64Array) => {
  const peak = x.reduce((m, v) => Math.max(m, Math.abs(v)), 0);
  return x.findIndex((v) => Math.abs(v) > peak * 1e-3) / SR;
};

describe("listen: the graph rendered offline", () => {
  beforeAll(async () => {
    await openSet(session.page, ids.showId, ids.setIds[1]!);
    await session.page.waitForFunction(() => Boolean(window.__farfieldListen), undefined, { timeout: 30_000 });
  }, 120_000);

  it("muting the melody lowers the rendered energy in its octave bands (1–4 kHz) and leaves the bass's (63–125 Hz)", async () => {
    const both = input([MELODY, BASS]);
    const all = octaves(await render({ input: both }), 0.4);
    const muted = octaves(await render({ input: both, soloMute: { ...NO_SOLO_MUTE, mutedVoices: ["melody"] } }), 0.4);
    // The melody is 20–38 dB above the bass in 1–4 kHz: muting it takes nearly all of those bands away.
    for (const k of [4, 5, 6]) expect(db(muted[k]! / all[k]!)).toBeLessThan(-10);
    for (const k of [0, 1]) expect(Math.abs(db(muted[k]! / all[k]!))).toBeLessThan(1);
  }, 120_000);

  it("A/B changes the two sections' relative level by the plan's dB (+3 and −4: 7 dB) within 0.5 dB", async () => {
    const both = input([MELODY, BASS]);
    const level = async (section: string, ab: OfflineRequest["ab"]) => meanSquare(await render({ input: both, ab, soloMute: { ...NO_SOLO_MUTE, soloSections: [section] } }), 0.4, 1.8);
    const [mw, mp, bw, bp] = [await level("Trumpets", "written"), await level("Trumpets", "plan"), await level("Tubas", "written"), await level("Tubas", "plan")];
    const relative = db(mp / bp) - db(mw / bw);
    expect(Math.abs(relative - (MELODY.planChangeDb - BASS.planChangeDb))).toBeLessThan(0.5);
  }, 120_000);

  it("the delay between two sections matches their arrival difference (12.5 ms) within 1 ms", async () => {
    const near = part("Trumpets", "melody", "soprano", MELODY.bandsDb, 0, 300);
    const far = part("Mellophones", "countermelody", "soprano", MELODY.bandsDb, 0, 312.5);
    const both = input([near, far]);
    const a = onsetS(await render({ input: both, soloMute: { ...NO_SOLO_MUTE, soloSections: ["Trumpets"] } }));
    const b = onsetS(await render({ input: both, soloMute: { ...NO_SOLO_MUTE, soloSections: ["Mellophones"] } }));
    expect(Math.abs(b - a - 0.0125)).toBeLessThan(0.001);
  }, 120_000);
});

describe("listen: the sound follows the levels, and is never loud", () => {
  it("a part's rendered octave levels follow its predicted band levels (relative to 1 kHz) within 0.5 dB in the bands its tones reach", async () => {
    const x = await render({ input: input([MELODY]) });
    const e = octaves(x, 0.4);
    const deviations = [3, 4, 5, 6, 7].map((k) => db(e[k]! / e[4]!) - (MELODY.bandsDb[k]! - MELODY.bandsDb[4]!));
    for (const d of deviations) expect(Math.abs(d)).toBeLessThan(0.5);
  }, 120_000);

  it("a loud set plays at the same level as a quiet one, and nothing passes the hard ceiling, even with the plan 30 dB up and a 120 dB background", async () => {
    const rms = async (shift: number) => meanSquare(await render({ input: input([{ ...MELODY, bandsDb: MELODY.bandsDb.map((l) => l + shift) }, BASS]) }), 0.4, 1.8);
    // Both parts moved alike keep the mix's balance: only the predicted SPL differs.
    const quiet = await render({ input: input([MELODY, BASS]) });
    const loud = await render({ input: input([{ ...MELODY, bandsDb: MELODY.bandsDb.map((l) => l + 40) }, { ...BASS, bandsDb: BASS.bandsDb.map((l) => l + 40) }]) });
    expect(Math.abs(db(meanSquare(loud, 0.4, 1.8) / meanSquare(quiet, 0.4, 1.8)))).toBeLessThan(0.1);
    expect(await rms(0)).toBeGreaterThan(0);
    const extreme: OfflineRequest["input"] = { ...input([{ ...MELODY, planChangeDb: 30 }, { ...BASS, planChangeDb: 30 }]), to: { ...answer([{ ...MELODY, planChangeDb: 30 }, { ...BASS, planChangeDb: 30 }]), backgroundOctaveDb: new Array(8).fill(120) } };
    const y = await render({ input: extreme, ab: "plan", background: true });
    const peak = y.reduce((m, v) => Math.max(m, Math.abs(v)), 0);
    expect(peak).toBeGreaterThan(0.1);
    expect(peak).toBeLessThanOrEqual(CEILING + 1e-6);
  }, 120_000);
});

describe("listen: the score's notes", () => {
  it("a section sounds where the score gives it notes and is silent where it rests, at the score's tempo", async () => {
    // 60 counts a minute: count c starts at c seconds. The trumpets rest until count 2 of the span, play to count 4, then rest.
    const score = { tempo: [{ atCount: 0, bpm: 60 }], sections: { Trumpets: { notes: [{ atCount: 18, lengthCounts: 2, midi: 72 }] } } };
    const x = await render({ input: { from: answer([MELODY]), to: answer([MELODY]), counts: 6, spanStartOnLine: 16, score, fallbackBpm: 240 } });
    const rest = meanSquare(x, 0.2, 1.8);
    const playing = meanSquare(x, 2.3, 3.7);
    expect(rest).toBe(0);
    expect(db(playing)).toBeGreaterThan(-60);
    expect(db(meanSquare(x, 4.5, 5.5) / playing)).toBeLessThan(-60);
  }, 120_000);
});

describe("listen: a director listens in the field editor", () => {
  it("opens the demo's set 8, presses Listen, solos the melody, switches to the plan, and nothing goes wrong", async () => {
    const { page, problems } = session;
    const before = problems.length;
    const k = Math.min(7, ids.setIds.length - 1);
    await openSet(page, ids.showId, ids.setIds[k]!);
    const listen = page.getByTestId("listen");
    await expect.poll(() => listen.textContent()).toContain("An audible sketch of the prediction, not a recording.");
    await page.getByTestId("tempo").fill("240");
    await page.getByTestId("listen-toggle").click();
    await expect.poll(() => page.getByTestId("listen-toggle").textContent(), { timeout: 30_000 }).toBe("Stop");
    // The field plays along.
    await expect.poll(() => page.evaluate(() => window.__farfieldEditor!.shownCount()), { timeout: 10_000 }).not.toBeNull();
    await listen.scrollIntoViewIfNeeded();
    await page.screenshot({ path: path.join(SHOTS, "listen-playing.png") });
    await page.getByTestId("listen-solo-voice-melody").click();
    expect(await page.getByTestId("listen-solo-voice-melody").getAttribute("aria-pressed")).toBe("true");
    await page.getByTestId("listen-ab-plan").click();
    expect(await page.getByTestId("listen-ab-plan").getAttribute("aria-pressed")).toBe("true");
    await page.screenshot({ path: path.join(SHOTS, "listen-solo-plan.png") });
    await page.getByTestId("listen-toggle").click();
    await expect.poll(() => page.getByTestId("listen-toggle").textContent()).toBe("Listen");
    expect(await listen.getByRole("alert").count()).toBe(0);
    expect(problems.slice(before)).toEqual([]);
  }, 180_000);

  it("on the music page, Listen plays the transition into the phrase's first set and stops", async () => {
    const { page, problems } = session;
    const before = problems.length;
    await page.goto(`${APP_URL}/shows/${ids.showId}/music`);
    const listen = page.getByTestId("listen");
    await listen.waitFor({ timeout: 60_000 });
    await page.getByTestId("listen-toggle").click();
    await expect.poll(() => page.getByTestId("listen-toggle").textContent(), { timeout: 30_000 }).toBe("Stop");
    await listen.scrollIntoViewIfNeeded();
    await page.screenshot({ path: path.join(SHOTS, "listen-music-page.png") });
    await page.getByTestId("listen-toggle").click();
    await expect.poll(() => page.getByTestId("listen-toggle").textContent()).toBe("Listen");
    expect(await listen.getByRole("alert").count()).toBe(0);
    expect(problems.slice(before)).toEqual([]);
  }, 180_000);
});
