// The Listen sound: one synthesized voice per part, shaped by an octave equaliser to the part's band
// levels at the listening point, delayed by its arrival, switched by A/B, solo and mute, then normalised
// and limited. It builds on any BaseAudioContext, so the browser tests render the very same graph offline.
import { OCTAVE_BANDS } from "@/lib/acoustics/bands";
import { midiHz } from "@/lib/listen/chords";
import { secondsAt } from "@/lib/listen/count-times";
import type { ListenSchedule, PartPlan } from "@/lib/listen/schedule";
import { fitEqualiser, sawtoothTones, sourcePoints, type Equaliser, type SourceSpectrum } from "@/lib/listen/equaliser";
import { burstMeanSquare, OCTAVE_Q } from "@/lib/listen/source-power";

export type AB = "written" | "plan";

export interface GraphControls {
  ab: AB;
  /** Keys of the parts that sound (audibleParts). */
  audible: ReadonlySet<string>;
  background: boolean;
}

export interface ListenGraph {
  /** Context time at which the last sound ends. */
  endTime: number;
  set(controls: GraphControls): void;
  stop(): void;
}

/** Variance of the breath noise under a wind part's tones (−15 dB under one tone's 1/3; common practice, no source). */
const BREATH_VARIANCE = 0.01;
/** Decay (s) of a struck part's noise burst (from memory of a snare's ring). */
const STRIKE_DECAY_S = 0.12;
const ATTACK_S = 0.02;
const RELEASE_S = 0.06;
/** A switch (mute, A/B, background) glides this long (time constant, s), so it never clicks. */
const SWITCH_S = 0.015;
/** Longest arrival difference the delay lines hold (s): far beyond any field. */
const MAX_DELAY_S = 2;
/** Limiter: threshold (dBFS) and ratio of the compressor; the hard ceiling (amplitude) after it. */
const LIMIT_THRESHOLD_DB = -12;
const LIMIT_RATIO = 20;
export const CEILING = 0.3;

/** White noise from a fixed seed: renders repeat exactly (a linear congruential generator). */
function noiseBuffer(ctx: BaseAudioContext, seconds: number, seed: number): AudioBuffer {
  const buffer = ctx.createBuffer(1, Math.ceil(ctx.sampleRate * seconds), ctx.sampleRate);
  const data = buffer.getChannelData(0);
  let s = seed >>> 0 || 1;
  for (let i = 0; i < data.length; i++) {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    data[i] = (s / 4294967296) * 2 * Math.sqrt(3) - Math.sqrt(3); // uniform, variance 1
  }
  return buffer;
}

function hardClip(ctx: BaseAudioContext, ceiling: number): WaveShaperNode {
  const n = 4097;
  const curve = new Float32Array(n);
  for (let i = 0; i < n; i++) {
    const x = (i / (n - 1)) * 2 - 1;
    curve[i] = Math.max(-ceiling, Math.min(ceiling, x));
  }
  const shaper = ctx.createWaveShaper();
  shaper.curve = curve;
  return shaper;
}

/** A flat gain and eight octave peaking filters in cascade, from `input`; `out` is the last filter. */
function equaliser(ctx: BaseAudioContext, input: AudioNode) {
  const flat = ctx.createGain();
  flat.gain.value = 0;
  let node: AudioNode = input.connect(flat);
  const bands = OCTAVE_BANDS.map(({ exactHz }) => {
    const f = ctx.createBiquadFilter();
    f.type = "peaking";
    f.frequency.value = exactHz;
    f.Q.value = OCTAVE_Q;
    f.gain.value = 0;
    node = node.connect(f);
    return f;
  });
  return { flat, bands, out: node };
}

const amplitude = (db: number) => (db > -Infinity ? 10 ** (db / 20) : 0);

/** The equaliser a fraction t of the way from a to b, in dB (the fit is close to linear in the levels, which move in dB). */
function between(a: Equaliser, b: Equaliser, t: number): Equaliser {
  const mix = (x: number, y: number) => (x === y ? x : x + (y - x) * t);
  return { flatDb: mix(a.flatDb, b.flatDb), bandDb: a.bandDb.map((g, k) => mix(g, b.bandDb[k]!)) };
}

/** Context time at which a graph started at `at` from `fromCount` has fallen silent. */
export function graphEndTime(schedule: ListenSchedule, at: number, fromCount = 0): number {
  const maxDelayS = Math.min(MAX_DELAY_S, Math.max(0, ...schedule.parts.flatMap((p) => p.curve.delayMs)) / 1000);
  return at + secondsAt(schedule.times, schedule.counts) - secondsAt(schedule.times, fromCount) + RELEASE_S + 5 * STRIKE_DECAY_S + maxDelayS + 0.2;
}

/**
 * Builds and starts the graph at context time `at`, playing counts `fromCount` … the end of the schedule.
 * Stop it with stop(); an OfflineAudioContext renders it with startRendering().
 */
export function buildListenGraph(ctx: BaseAudioContext, schedule: ListenSchedule, controls: GraphControls, at: number, fromCount = 0): ListenGraph {
  const sr = ctx.sampleRate;
  const t0 = at - secondsAt(schedule.times, fromCount);
  const timeOf = (count: number) => t0 + secondsAt(schedule.times, count);
  const endTime = graphEndTime(schedule, at, fromCount);
  const noise = noiseBuffer(ctx, 2, 12345);
  const sources: AudioScheduledSourceNode[] = [];
  const startAt = (node: AudioScheduledSourceNode, start: number, stop: number) => {
    node.start(Math.max(at, start));
    node.stop(Math.max(at, stop));
    sources.push(node);
  };
  const looped = () => {
    const n = ctx.createBufferSource();
    n.buffer = noise;
    n.loop = true;
    return n;
  };

  // Master: the normalised mix into a limiter, a fixed trim and a hard ceiling.
  const mixBus = ctx.createGain();
  const limiter = ctx.createDynamicsCompressor();
  limiter.threshold.value = LIMIT_THRESHOLD_DB;
  limiter.knee.value = 0;
  limiter.ratio.value = LIMIT_RATIO;
  limiter.attack.value = 0.003;
  limiter.release.value = 0.25;
  const ceiling = hardClip(ctx, CEILING);
  mixBus.connect(limiter).connect(ceiling).connect(ctx.destination);

  const countSeconds = schedule.times.length > 1 ? schedule.times[1]! - schedule.times[0]! : 0.5;
  const parts = schedule.parts.map((part) => buildPart(part));

  function buildPart(part: PartPlan) {
    const input = ctx.createGain();
    const { curve } = part;
    let source: SourceSpectrum;
    if (part.struck) {
      source = { tones: [], noiseVariance: burstMeanSquare(STRIKE_DECAY_S, countSeconds) };
      const env = ctx.createGain();
      env.gain.value = 0;
      for (const n of part.notes) {
        if (n.atCount + n.lengthCounts <= fromCount) continue;
        const t = timeOf(n.atCount);
        if (t < at) continue;
        env.gain.setValueAtTime(1, t);
        env.gain.setTargetAtTime(0, t, STRIKE_DECAY_S);
      }
      const src = looped();
      src.connect(env).connect(input);
      startAt(src, at, timeOf(schedule.counts) + 5 * STRIKE_DECAY_S);
    } else {
      const breath = curve.family === "woodwind" || curve.family === "brass";
      source = { tones: sawtoothTones(part.calibrationHz, sr), noiseVariance: breath ? BREATH_VARIANCE : 0 };
      const breathEnv = ctx.createGain();
      breathEnv.gain.value = 0;
      for (const n of part.notes) {
        const end = n.atCount + n.lengthCounts;
        if (end <= fromCount) continue;
        const start = Math.max(timeOf(n.atCount), at);
        const stop = timeOf(end);
        const osc = ctx.createOscillator();
        osc.type = "sawtooth";
        osc.frequency.value = midiHz(n.midi);
        const env = ctx.createGain();
        env.gain.setValueAtTime(0, start);
        env.gain.linearRampToValueAtTime(1, start + ATTACK_S);
        env.gain.setValueAtTime(1, Math.max(start + ATTACK_S, stop - RELEASE_S));
        env.gain.linearRampToValueAtTime(0, Math.max(start + ATTACK_S, stop));
        osc.connect(env).connect(input);
        startAt(osc, start, stop + 0.01);
        if (breath) {
          breathEnv.gain.setTargetAtTime(Math.sqrt(BREATH_VARIANCE), start, ATTACK_S);
          breathEnv.gain.setTargetAtTime(0, Math.max(start + ATTACK_S, stop - RELEASE_S), RELEASE_S / 3);
        }
      }
      if (breath) {
        const src = looped();
        src.connect(breathEnv).connect(input);
        startAt(src, at, timeOf(schedule.counts) + RELEASE_S);
      }
    }
    // The equaliser is fitted to the from-set's and the to-set's levels and moves between them count by count.
    const eq = equaliser(ctx, input);
    const points = sourcePoints(source, sr);
    const fit = (c: number) => fitEqualiser(curve.bandsDb[c]!.map((l) => l + schedule.offsetDb), points, sr);
    const startEq = fit(0);
    const endEq = curve.bandsDb[0]!.every((l, k) => l === curve.bandsDb[schedule.counts]![k]) ? startEq : fit(schedule.counts);
    const first = Math.max(0, Math.floor(fromCount));
    for (let c = first; c <= schedule.counts; c++) {
      const e = between(startEq, endEq, c / schedule.counts);
      const set = (param: AudioParam, v: number) => (c === first ? param.setValueAtTime(v, at) : param.linearRampToValueAtTime(v, timeOf(c)));
      set(eq.flat.gain, amplitude(e.flatDb));
      eq.bands.forEach((f, b) => set(f.gain, e.bandDb[b]!));
    }
    const delay = ctx.createDelay(MAX_DELAY_S);
    for (let c = first; c <= schedule.counts; c++) {
      const d = Math.min(MAX_DELAY_S, curve.delayMs[c]! / 1000);
      if (c === first) delay.delayTime.setValueAtTime(d, at);
      else delay.delayTime.linearRampToValueAtTime(d, timeOf(c));
    }
    const plan = ctx.createGain();
    const mute = ctx.createGain();
    eq.out.connect(delay).connect(plan).connect(mute).connect(mixBus);
    return { part, plan, mute };
  }

  // The background: noise shaped to the point's octave levels, at its level under the band.
  const bgGain = ctx.createGain();
  if (schedule.backgroundOctaveDb) {
    const src = looped();
    startAt(src, at, endTime);
    const bg = equaliser(ctx, src);
    const e = fitEqualiser(schedule.backgroundOctaveDb.map((l) => l + schedule.offsetDb), sourcePoints({ tones: [], noiseVariance: 1 }, sr), sr);
    bg.flat.gain.setValueAtTime(amplitude(e.flatDb), at);
    bg.bands.forEach((f, b) => f.gain.setValueAtTime(e.bandDb[b]!, at));
    bg.out.connect(bgGain).connect(mixBus);
  }

  /** The plan's gain from `when` on: its change count by count with the plan, none as written. */
  function schedulePlan(ab: AB, when: number, first: boolean) {
    for (const { part, plan } of parts) {
      const p = plan.gain;
      const gainAt = (c: number) => (ab === "plan" ? 10 ** (part.curve.planChangeDb[c]! / 20) : 1);
      const c0 = Math.min(schedule.counts, Math.max(Math.floor(fromCount), countAt(when)));
      if (first) p.setValueAtTime(gainAt(c0), when);
      else {
        // From the value now, a short glide to the other side's value, then on count by count.
        p.cancelScheduledValues(when);
        p.setValueAtTime(p.value, when);
        p.linearRampToValueAtTime(gainAt(c0), when + 3 * SWITCH_S);
      }
      for (let c = c0 + 1; c <= schedule.counts; c++) if (timeOf(c) > when + 3 * SWITCH_S) p.linearRampToValueAtTime(gainAt(c), timeOf(c));
    }
  }
  function countAt(time: number) {
    let c = 0;
    while (c < schedule.counts && timeOf(c + 1) <= time) c++;
    return c;
  }
  function apply(c: GraphControls, first: boolean) {
    const when = first ? at : Math.max(at, ctx.currentTime);
    for (const { part, mute } of parts) {
      const v = c.audible.has(part.curve.key) ? 1 : 0;
      if (first) mute.gain.setValueAtTime(v, when);
      else mute.gain.setTargetAtTime(v, when, SWITCH_S);
    }
    if (first) bgGain.gain.setValueAtTime(c.background ? 1 : 0, when);
    else bgGain.gain.setTargetAtTime(c.background ? 1 : 0, when, SWITCH_S);
    schedulePlan(c.ab, when, first);
  }
  apply(controls, true);

  return {
    endTime,
    set: (c) => apply(c, false),
    stop() {
      for (const s of sources) {
        try {
          s.stop();
        } catch {
          // Already stopped.
        }
      }
      mixBus.disconnect();
    },
  };
}
