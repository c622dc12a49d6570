// Renders the Listen graph offline: the browser tests hear exactly what the control plays.
import { audibleParts, type SoloMute } from "@/lib/listen/audible";
import { scheduleListen, type ListenInput } from "@/lib/listen/schedule";
import { buildListenGraph, graphEndTime, type AB } from "./listen-graph";

export interface OfflineRequest {
  input: ListenInput;
  ab: AB;
  soloMute: SoloMute;
  background: boolean;
  sampleRate?: number;
  fromCount?: number;
}

/** The mono samples of the whole transition, rendered in an OfflineAudioContext. */
export async function renderListenOffline(req: OfflineRequest): Promise<Float32Array> {
  const schedule = scheduleListen(req.input);
  const sampleRate = req.sampleRate ?? 48_000;
  const end = graphEndTime(schedule, 0, req.fromCount ?? 0);
  const ctx = new OfflineAudioContext(1, Math.ceil(end * sampleRate), sampleRate);
  const audible = audibleParts(schedule.parts.map((p) => p.curve), req.soloMute);
  buildListenGraph(ctx, schedule, { ab: req.ab, audible, background: req.background }, 0, req.fromCount ?? 0);
  const buffer = await ctx.startRendering();
  return buffer.getChannelData(0);
}

declare global {
  interface Window {
    /** Test hook: render the Listen graph offline (tests/browser/listen-render.test.ts). */
    __farfieldListen?: { render(req: OfflineRequest): Promise<number[]> };
  }
}

/** Puts the test hook on the page. */
export function exposeOfflineRender() {
  window.__farfieldListen = { render: async (req) => Array.from(await renderListenOffline(req)) };
}
