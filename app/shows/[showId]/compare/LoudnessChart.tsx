"use client";
// The pairs of bars of LoudnessBars (loaded after the page: see components/ChartLoading.tsx).
import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { formatSone } from "../music/voices";

const SET_COLORS = ["#0072B2", "#D55E00"]; // Okabe–Ito blue and vermilion: apart for the common colour-vision deficiencies

export function LoudnessChart({ data, setA, setB }: { data: { name: string; a: number; b: number }[]; setA: string; setB: string }) {
  return (
    <ResponsiveContainer width="100%" height="100%">
      <BarChart data={data} layout="vertical" margin={{ top: 8, right: 24, bottom: 8, left: 8 }}>
        <CartesianGrid strokeDasharray="3 3" stroke="#d9d7cf" />
        <XAxis type="number" unit=" sone" domain={[0, "auto"]} />
        <YAxis type="category" dataKey="name" width={136} />
        <Tooltip formatter={(v) => `${formatSone(typeof v === "number" ? v : null)} sone`} />
        <Legend />
        <Bar dataKey="a" name={`Set ${setA}`} fill={SET_COLORS[0]} isAnimationActive={false} />
        <Bar dataKey="b" name={`Set ${setB}`} fill={SET_COLORS[1]} isAnimationActive={false} />
      </BarChart>
    </ResponsiveContainer>
  );
}
