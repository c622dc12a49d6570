"use client";
// Loudness (sones) of each voice or section in the two compared sets, as pairs of bars, with the same figures in a table for screen readers.
import dynamic from "next/dynamic";
import { ChartLoading } from "@/components/ChartLoading";
import { formatSone } from "../music/voices";

export type LoudnessRow = { key: string; name: string; a: number | null; b: number | null; heardA: boolean | null; heardB: boolean | null };

const LoudnessChart = dynamic(() => import("./LoudnessChart").then((m) => m.LoudnessChart), { ssr: false, loading: () => <ChartLoading height="100%" /> });

const heardWords = (heard: boolean | null) => (heard === null ? "" : heard ? "" : " (masked)");

export function LoudnessBars({ rows, setA, setB, caption }: { rows: LoudnessRow[]; setA: string; setB: string; caption: string }) {
  const data = rows.map((r) => ({ name: r.name, a: r.a ?? 0, b: r.b ?? 0 }));
  const height = Math.max(180, 56 + rows.length * 44);
  const masked = rows.flatMap((r) => [...(r.heardA === false ? [`${r.name} in set ${setA}`] : []), ...(r.heardB === false ? [`${r.name} in set ${setB}`] : [])]);
  return (
    <figure>
      <div style={{ height }} aria-hidden="true">
        <LoudnessChart data={data} setA={setA} setB={setB} />
      </div>
      {masked.length ? <p className="mt-2 text-sm text-signal-warn">Masked by the rest and the background: {masked.join(", ")}.</p> : null}
      <table className="sr-only">
        <caption>{caption}</caption>
        <thead>
          <tr><th scope="col">Name</th><th scope="col">Set {setA}</th><th scope="col">Set {setB}</th></tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.key}>
              <th scope="row">{r.name}</th>
              <td>{r.a === null ? "not playing" : `${formatSone(r.a)} sones${heardWords(r.heardA)}`}</td>
              <td>{r.b === null ? "not playing" : `${formatSone(r.b)} sones${heardWords(r.heardB)}`}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </figure>
  );
}
