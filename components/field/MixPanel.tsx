// The box mix at the chosen listening point: each voice as a bar with its level, the sections,
// the total and the arrival spread. Says whether the figures are the browser's live preview or the
// server's stored analysis, and that they are predictions. With the stored analysis it also shows
// loudness (ISO 532-1 sones) and whether each voice is heard over the rest and the background.
// Levels are shown to whole dB unless their uncertainty is under 1 dB (most catalog values are
// from memory, lib/acoustics/provenance.ts), with the total's ± from the stored analysis.
import Link from "next/link";
import type { LevelUncertainty } from "@/lib/acoustics/confidence";
import type { PointLoudness } from "@/lib/acoustics/point-loudness";
import { VOICES, type Voice } from "@/lib/acoustics/types";
import { VOICE_STYLES } from "./palette";
import { MarkIcon } from "./MarkIcon";
import { useLocalTimes } from "../local-time";

export interface MixFigures {
  totalDbA: number;
  voices: Partial<Record<Voice, { dbA: number }>>;
  sections: Record<string, { dbA: number }>;
  arrivalSpreadMs: number;
  /** From the stored analysis only; a live preview has none. */
  loudness?: PointLoudness;
  /** From the stored analysis only (model version 4): how sure the levels are. */
  uncertainty?: LevelUncertainty;
}

/** A level to the precision it deserves: tenths only when known to better than 1 dB. */
const fmtAt = (precision: 0.1 | 1) => (db: number | undefined) => (db === undefined || !Number.isFinite(db) ? "—" : db.toFixed(precision === 0.1 ? 1 : 0));
/** Bars span the 30 dB below the total (common practice for level meters, no source). */
const RANGE_DB = 30;

function Bar({ value, top, colour }: { value: number | undefined; top: number; colour: string }) {
  const share = value === undefined || !Number.isFinite(value) ? 0 : Math.max(0, Math.min(1, (value - (top - RANGE_DB)) / RANGE_DB));
  return (
    <div className="h-3 w-full rounded-sm bg-paper-sunk" aria-hidden="true">
      <div className="h-3 rounded-sm" style={{ width: `${(share * 100).toFixed(1)}%`, background: colour }} />
    </div>
  );
}

export function MixPanel({ mix, source, pointName, computedAt }: { mix: MixFigures | null; source: "preview" | "stored" | "loading"; pointName: string; computedAt?: string }) {
  const fmt = fmtAt(mix?.uncertainty?.precisionDb ?? 1);
  const format = useLocalTimes();
  const sections = mix ? Object.entries(mix.sections).filter(([, s]) => Number.isFinite(s.dbA)).sort((a, b) => b[1].dbA - a[1].dbA) : [];
  return (
    <section aria-labelledby="mix-title" className="rounded-xl border border-ink/10 bg-paper-raised p-4 shadow-sm" data-testid="mix-panel" data-source={source}>
      <div className="flex items-baseline justify-between gap-2">
        <h2 id="mix-title" className="text-lg font-semibold">
          Box mix <span className="font-normal text-ink-soft">at {pointName}</span>
        </h2>
        <span className={`rounded-full px-2 py-0.5 text-xs font-semibold ${source === "preview" ? "bg-[#fff3d6] text-signal-warn" : "bg-turf-light text-turf-dark"}`} aria-live="polite">
          {source === "preview" ? "Live preview" : source === "stored" ? "Stored analysis" : "Loading…"}
        </span>
      </div>
      {mix ? (
        <>
          <p className="mt-2 text-3xl font-bold tabular-nums" data-testid="mix-total" data-db={mix.totalDbA}>
            {fmt(mix.totalDbA)} <span className="text-base font-semibold text-ink-soft">dBA total</span>
            {mix.uncertainty ? (
              <span className="ml-2 text-base font-semibold text-ink-soft" data-testid="mix-uncertainty">
                ±{Math.max(1, Math.round(mix.uncertainty.totalDb))} dB
              </span>
            ) : null}
          </p>
          {mix.uncertainty ? (
            <p className="text-xs text-ink-soft">± is about one standard deviation from the instrument catalog&apos;s uncertainty (readings at the box narrow it; see <Link className="underline" href="/sources#instruments">Where the numbers come from</Link>).</p>
          ) : null}
          {mix.loudness ? (
            <p className="text-sm text-ink-soft" data-testid="mix-loudness">
              Perceived <span className="font-semibold tabular-nums text-ink">{mix.loudness.totalSone.toFixed(1)} sone</span> (
              {mix.loudness.totalPhon.toFixed(0)} phon){mix.loudness.backgroundSone > 0 ? `, background ${mix.loudness.backgroundSone.toFixed(1)} sone` : ""}
            </p>
          ) : null}
          <p className="text-sm text-ink-soft">
            Arrival spread <span className="font-semibold tabular-nums text-ink">{mix.arrivalSpreadMs.toFixed(0)} ms</span> between the nearest and the farthest player
          </p>
          <ul className="mt-3 space-y-1.5" aria-label="Voices">
            {VOICES.map((v) => {
              const loud = mix.loudness?.voices[v];
              return (
                <li key={v} className="text-sm" data-testid={`voice-${v}`} data-db={mix.voices[v]?.dbA ?? ""} data-heard={loud ? String(loud.heard) : ""}>
                  <div className="grid grid-cols-[8.5rem_1fr_3.2rem] items-center gap-2">
                    <span className="inline-flex items-center gap-1.5">
                      <MarkIcon style={VOICE_STYLES[v]} size={14} />
                      {VOICE_STYLES[v].name}
                    </span>
                    <Bar value={mix.voices[v]?.dbA} top={mix.totalDbA} colour={VOICE_STYLES[v].colour} />
                    <span className="text-right font-semibold tabular-nums">{fmt(mix.voices[v]?.dbA)}</span>
                  </div>
                  {loud ? (
                    <p className="pl-[1.4rem] text-xs text-ink-soft">
                      <span className="tabular-nums">{loud.sone.toFixed(1)} sone</span>, adds <span className="tabular-nums">{loud.shareSone.toFixed(1)}</span> to the whole ·{" "}
                      {loud.heard ? <span className="font-semibold text-turf-dark">heard</span> : <span className="font-semibold text-signal-warn">masked</span>}
                    </p>
                  ) : null}
                </li>
              );
            })}
          </ul>
          <details className="mt-3" open>
            <summary className="cursor-pointer text-sm font-semibold">Sections</summary>
            <ul className="mt-1 max-h-48 space-y-1 overflow-y-auto pr-1" aria-label="Sections">
              {sections.map(([name, s]) => (
                <li key={name} className="grid grid-cols-[8.5rem_1fr_3.2rem] items-center gap-2 text-sm">
                  <span className="truncate">{name}</span>
                  <Bar value={s.dbA} top={mix.totalDbA} colour="#4a5566" />
                  <span className="text-right tabular-nums">{fmt(s.dbA)}</span>
                </li>
              ))}
            </ul>
          </details>
        </>
      ) : (
        <p className="mt-3 text-ink-soft">Computing the mix…</p>
      )}
      <p className="mt-3 text-xs text-ink-soft">
        Predicted levels (dBA) and loudness (sones, ISO 532-1) from the acoustic model, not measurements; “heard” judges masking by the rest of the band and the background only. {source === "stored" && computedAt ? `Stored ${format(computedAt, { hour: "numeric", minute: "2-digit", second: "2-digit" })}.` : null}{" "}
        Levels among the players are far higher than at the box: protect hearing and follow local rules.
      </p>
    </section>
  );
}
