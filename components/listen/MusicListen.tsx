"use client";
// Listen on the music page: the transition into a chosen set at a chosen listening point, at a tempo (no field animation here).
import { useState } from "react";
import type { ShowResponse } from "@/components/api-types";
import { DEFAULT_TEMPO_BPM, TEMPO_RANGE_BPM } from "@/lib/editor/playback";
import { firstListeningPointId } from "@/lib/show/first-choices";
import { ListeningPointSelect } from "@/components/ListeningPointSelect";
import { ListenControl } from "./ListenControl";

const field = "min-h-9 rounded-md border border-ink/20 bg-paper-raised px-2";

/** `firstSetId`: the set chosen at first (the start of the phrase shown). */
export function MusicListen({ showId, show, firstSetId }: { showId: string; show: ShowResponse; firstSetId: string | null }) {
  const sets = [...show.sets].sort((a, b) => a.order - b.order);
  const [setId, setSetId] = useState<string | null>(null);
  const [pointId, setPointId] = useState<string | null>(null);
  const [bpm, setBpm] = useState(DEFAULT_TEMPO_BPM);
  const chosen = setId ?? firstSetId ?? sets[1]?.id ?? sets[0]?.id ?? null;
  const index = Math.max(0, sets.findIndex((s) => s.id === chosen));
  const lpId = pointId ?? firstListeningPointId(show.listeningPoints);
  const point = show.listeningPoints.find((l) => l.id === lpId);
  if (sets.length === 0) return null;
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-center gap-3 text-sm">
        <label>
          Transition into set{" "}
          <select className={field} value={sets[index]!.id} onChange={(e) => setSetId(e.target.value)} data-testid="listen-set">
            {sets.map((s, i) => (
              <option key={s.id} value={s.id}>
                {i === 0 ? `${s.number} (the opening set, held)` : `${s.number} (from set ${sets[i - 1]!.number}, ${s.counts} counts)`}
              </option>
            ))}
          </select>
        </label>
        <ListeningPointSelect points={show.listeningPoints} value={lpId} onChange={setPointId} />
        <label>
          Tempo without a score{" "}
          <input type="number" min={TEMPO_RANGE_BPM[0]} max={TEMPO_RANGE_BPM[1]} step={1} className={`${field} w-20 tabular-nums`} value={bpm} onChange={(e) => setBpm(Number(e.target.value))} /> counts a minute
        </label>
      </div>
      <ListenControl key={`${sets[index]!.id}/${lpId}`} showId={showId} listeningPointId={lpId} pointName={point?.name ?? "the listening point"} sets={sets} index={index} bpm={bpm} />
    </div>
  );
}
