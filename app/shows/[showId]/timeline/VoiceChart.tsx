"use client";
// Voice levels (dBA) or loudness (sones) at the listening point against counts, with the sets marked; a click picks the nearest count.
import { CartesianGrid, Legend, Line, LineChart, ReferenceArea, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { VOICE_COLORS, VOICE_LABELS } from "../music/voices";
import type { Measure, TimelineSample, TimelineSet } from "./timeline-types";

const VOICES = ["melody", "countermelody", "accompaniment", "bass", "percussion"];

export function VoiceChart({ samples, sets, failingCheck, onPick, height = 360, measure = "dba" }: { samples: TimelineSample[]; sets: TimelineSet[]; failingCheck: string | null; onPick?: (s: TimelineSample) => void; height?: number; measure?: Measure }) {
  const valuesOf = (s: TimelineSample) => (measure === "sone" ? (s.voicesSone ?? {}) : s.voices);
  const unit = measure === "sone" ? " sone" : " dBA";
  const data = samples.map((s) => ({ x: s.showCount, ...valuesOf(s), sample: s }));
  const present = VOICES.filter((v) => samples.some((s) => valuesOf(s)[v] != null));
  // Runs of counts where the chosen check fails, shaded.
  const runs: { x1: number; x2: number }[] = [];
  if (failingCheck) {
    for (let i = 0; i < samples.length; i++) {
      if (!samples[i]!.failing.includes(failingCheck)) continue;
      const x1 = i > 0 ? samples[i - 1]!.showCount : samples[i]!.showCount;
      const last = runs[runs.length - 1];
      if (last && last.x2 === x1) last.x2 = samples[i]!.showCount;
      else runs.push({ x1, x2: samples[i]!.showCount });
    }
  }
  return (
    <div style={{ height }} aria-hidden="true">
      <ResponsiveContainer width="100%" height="100%">
        <LineChart
          data={data}
          margin={{ top: 16, right: 16, bottom: 8, left: 0 }}
          onClick={(e: { activeTooltipIndex?: number | string | null } | null) => {
            const i = typeof e?.activeTooltipIndex === "number" ? e.activeTooltipIndex : Number(e?.activeTooltipIndex);
            if (onPick && Number.isFinite(i) && data[i]) onPick(data[i]!.sample);
          }}
        >
          <CartesianGrid strokeDasharray="3 3" stroke="#d9d7cf" />
          <XAxis dataKey="x" type="number" domain={["dataMin", "dataMax"]} tickCount={12} label={{ value: "Count", position: "insideBottomRight", offset: -4 }} />
          <YAxis unit={unit} width={76} domain={measure === "sone" ? [0, "auto"] : ["auto", "auto"]} />
          {runs.map((r) => <ReferenceArea key={`${r.x1}-${r.x2}`} x1={r.x1} x2={r.x2} fill="#a3242b" fillOpacity={0.12} />)}
          {sets.map((s) => <ReferenceLine key={s.setId} x={s.showCount} stroke="#8a94a3" strokeDasharray="2 4" label={{ value: s.number, position: "top", fontSize: 11, fill: "#4a5566" }} />)}
          <Tooltip formatter={(v, name) => [typeof v === "number" ? `${v.toFixed(1)}${unit}` : "—", VOICE_LABELS[String(name)] ?? name]} labelFormatter={(x) => `Count ${x}`} />
          <Legend formatter={(v) => VOICE_LABELS[String(v)] ?? v} />
          {present.map((v) => <Line key={v} type="monotone" dataKey={v} stroke={VOICE_COLORS[v]} strokeWidth={v === "melody" ? 3 : 2} dot={false} connectNulls={false} isAnimationActive={false} />)}
        </LineChart>
      </ResponsiveContainer>
    </div>
  );
}
