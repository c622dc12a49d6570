"use client";
// Plays the transition into the set: play or pause at a tempo, one count forward or back, a scrubber.
import { TEMPO_RANGE_BPM } from "@/lib/editor/playback";
import type { Playback } from "./use-playback";

const btn = "min-h-9 rounded-md border border-ink/20 bg-paper-raised px-3 font-semibold hover:bg-paper-sunk disabled:opacity-50";

export function TransitionPlayer({ playback: p, counts, from, to }: { playback: Playback; counts: number; from: string; to: string }) {
  const shown = p.count === null ? null : Math.min(p.count, counts);
  return (
    <div className="flex flex-col gap-2 text-sm" role="group" aria-label={`Transition from set ${from}`}>
      <div className="flex flex-wrap items-center gap-2">
        <span className="text-ink-soft">Set {from} shown faintly, with each performer&apos;s path.</span>
        <button type="button" className={btn} onClick={() => (p.playing ? p.pause() : p.play())} data-testid="play-transition">
          {p.playing ? "Pause" : shown !== null && shown < counts ? `Play on from count ${shown}` : `Play the ${counts} counts from set ${from}`}
        </button>
        <label className="flex items-center gap-1">
          Tempo
          <input
            type="number"
            min={TEMPO_RANGE_BPM[0]}
            max={TEMPO_RANGE_BPM[1]}
            step={1}
            className="min-h-9 w-20 rounded-md border border-ink/20 px-2 tabular-nums"
            value={p.bpm}
            onChange={(e) => p.setBpm(Number(e.target.value))}
            data-testid="tempo"
          />
          beats a minute
        </label>
      </div>
      <div className="flex flex-wrap items-center gap-2">
        <button type="button" className={btn} onClick={() => p.step(-1)} disabled={shown === 0} aria-label="One count back" data-testid="count-back">
          ◀ Count
        </button>
        <input
          type="range"
          min={0}
          max={counts}
          step={1}
          value={shown ?? counts}
          onChange={(e) => p.seek(Number(e.target.value))}
          aria-label={`Count of the transition (0 is set ${from}, ${counts} is set ${to})`}
          className="min-w-40 flex-1 accent-turf"
          data-testid="count-scrubber"
        />
        <button type="button" className={btn} onClick={() => p.step(1)} disabled={shown === null || shown === counts} aria-label="One count forward" data-testid="count-forward">
          Count ▶
        </button>
        {shown !== null ? (
          <span className="font-semibold tabular-nums" aria-live="polite" data-testid="shown-count">
            Count {shown} of {counts}
          </span>
        ) : null}
        {shown !== null && !p.playing ? (
          <button type="button" className={btn} onClick={p.close}>
            Show set {to}
          </button>
        ) : null}
      </div>
    </div>
  );
}
