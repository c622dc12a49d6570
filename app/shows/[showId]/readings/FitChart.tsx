"use client";
// Predicted against measured, one dot per reading: with the catalog in force and after the fit.
// Dots on the diagonal are readings the model predicts exactly; the dashed lines are ±3 dB.
import { CartesianGrid, Legend, ReferenceLine, ResponsiveContainer, Scatter, ScatterChart, Tooltip, XAxis, YAxis } from "recharts";
import type { FitReading } from "./readings-types";

export function FitChart({ readings, height = 300 }: { readings: FitReading[]; height?: number }) {
  if (readings.length === 0) return null;
  const now = readings.map((r) => ({ measured: r.measuredDb, predicted: r.predictedBeforeDb }));
  const after = readings.map((r) => ({ measured: r.measuredDb, predicted: r.predictedAfterDb }));
  const all = readings.flatMap((r) => [r.measuredDb, r.predictedBeforeDb, r.predictedAfterDb]);
  const lo = Math.floor(Math.min(...all) - 3);
  const hi = Math.ceil(Math.max(...all) + 3);
  const diagonal = (offset: number): [{ x: number; y: number }, { x: number; y: number }] => [
    { x: lo, y: lo + offset },
    { x: hi, y: hi + offset },
  ];
  return (
    <figure data-testid="fit-chart">
      <div style={{ height }} aria-hidden="true">
        <ResponsiveContainer width="100%" height="100%">
          <ScatterChart margin={{ top: 12, right: 16, bottom: 24, left: 0 }}>
            <CartesianGrid strokeDasharray="3 3" stroke="#d9d7cf" />
            <XAxis dataKey="measured" type="number" domain={[lo, hi]} unit=" dB" name="Measured" label={{ value: "Measured", position: "insideBottom", offset: -12 }} />
            <YAxis dataKey="predicted" type="number" domain={[lo, hi]} unit=" dB" name="Predicted" width={72} />
            <ReferenceLine segment={diagonal(0)} stroke="#4a5566" />
            <ReferenceLine segment={diagonal(3)} stroke="#8a94a3" strokeDasharray="4 4" />
            <ReferenceLine segment={diagonal(-3)} stroke="#8a94a3" strokeDasharray="4 4" />
            <Tooltip formatter={(v) => (typeof v === "number" ? `${v.toFixed(1)} dB` : "—")} />
            <Legend verticalAlign="top" />
            <Scatter name="Predicted now" data={now} fill="#a3242b" shape="triangle" />
            <Scatter name="After the fit" data={after} fill="#1f6f43" />
          </ScatterChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="text-sm text-ink-soft">
        Each reading as a dot: measured level across, predicted level up; on the solid line the prediction matches, between the dashed lines it is within 3 dB. With no more readings than
        carry changes the fitted dots sit on the line whatever the model&apos;s error.
      </figcaption>
    </figure>
  );
}
