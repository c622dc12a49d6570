"use client";
// The Listen control's sound: one AudioContext, the graph of the transition being played, and the controls applied live.
import { useCallback, useEffect, useRef, useState } from "react";
import { audibleParts, type SoloMute } from "@/lib/listen/audible";
import type { ListenSchedule } from "@/lib/listen/schedule";
import { buildListenGraph, type AB, type ListenGraph } from "./listen-graph";

export interface LiveControls {
  ab: AB;
  soloMute: SoloMute;
  background: boolean;
}

/** Starts a schedule from a count, applies control changes while it plays, and tells when it has ended. */
export function useListenSound(controls: LiveControls) {
  const ctxRef = useRef<AudioContext | null>(null);
  const graph = useRef<{ g: ListenGraph; schedule: ListenSchedule; timer: ReturnType<typeof setTimeout> } | null>(null);
  const [playing, setPlaying] = useState(false);

  const stop = useCallback(() => {
    const current = graph.current;
    graph.current = null;
    if (current) {
      clearTimeout(current.timer);
      current.g.stop();
    }
    setPlaying(false);
  }, []);

  /** Must run in a click: browsers let a page start sound only after a gesture. */
  const prepare = useCallback(() => {
    if (typeof window === "undefined" || !("AudioContext" in window)) return false;
    ctxRef.current ??= new AudioContext();
    void ctxRef.current.resume();
    return true;
  }, []);

  const start = useCallback(
    (schedule: ListenSchedule, fromCount: number) => {
      stop();
      const ctx = ctxRef.current;
      if (!ctx) return;
      const at = ctx.currentTime + 0.05;
      const audible = audibleParts(schedule.parts.map((p) => p.curve), controls.soloMute);
      const g = buildListenGraph(ctx, schedule, { ab: controls.ab, audible, background: controls.background }, at, fromCount);
      const timer = setTimeout(() => stop(), (g.endTime - ctx.currentTime) * 1000);
      graph.current = { g, schedule, timer };
      setPlaying(true);
    },
    [controls, stop],
  );

  // Control changes apply to the sound playing now.
  useEffect(() => {
    const current = graph.current;
    if (!current) return;
    current.g.set({ ab: controls.ab, audible: audibleParts(current.schedule.parts.map((p) => p.curve), controls.soloMute), background: controls.background });
  }, [controls]);

  useEffect(
    () => () => {
      stop();
      void ctxRef.current?.close();
      ctxRef.current = null;
    },
    [stop],
  );

  return { playing, prepare, start, stop };
}
