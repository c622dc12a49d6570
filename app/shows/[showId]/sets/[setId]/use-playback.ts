"use client";
// The transition player's state: the count shown (null: the set itself), playing or paused, and the tempo.
import { useEffect, useState } from "react";
import { clampCount, DEFAULT_TEMPO_BPM, msPerCount } from "@/lib/editor/playback";

export function usePlayback(counts: number, initialCount: number | null) {
  const [count, setCount] = useState<number | null>(initialCount);
  const [playing, setPlaying] = useState(false);
  const [bpm, setBpm] = useState(DEFAULT_TEMPO_BPM);

  // One count a beat; at the last count it stays a moment on the set, then shows the set itself.
  useEffect(() => {
    if (count === null || !playing) return;
    if (count >= counts) {
      const t = setTimeout(() => {
        setCount(null);
        setPlaying(false);
      }, msPerCount(bpm) * 2);
      return () => clearTimeout(t);
    }
    const t = setTimeout(() => setCount((c) => (c === null ? null : c + 1)), msPerCount(bpm));
    return () => clearTimeout(t);
  }, [count, counts, playing, bpm]);

  return {
    count,
    playing,
    bpm,
    setBpm,
    /** Plays on from the count shown (from the previous set when the set itself is shown, or at the end). */
    play() {
      setCount((c) => (c === null || c >= counts ? 0 : c));
      setPlaying(true);
    },
    pause: () => setPlaying(false),
    /** One count forward or back, paused. */
    step(delta: number) {
      setPlaying(false);
      setCount((c) => clampCount((c ?? counts) + delta, counts));
    },
    seek(n: number) {
      setPlaying(false);
      setCount(clampCount(n, counts));
    },
    /** Back to the set itself. */
    close() {
      setPlaying(false);
      setCount(null);
    },
  };
}

export type Playback = ReturnType<typeof usePlayback>;
