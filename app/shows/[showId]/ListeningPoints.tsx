// Where the show is judged: each listening point's place in the field frame (metres).
import type { ListeningPoint } from "@/components/api-types";
import { EmptyState } from "@/components/EmptyState";
import { metres } from "@/components/format";
import { depthWords } from "./show-words";

export function ListeningPoints({ points }: { points: ListeningPoint[] }) {
  if (points.length === 0) return <EmptyState title="No listening points">Add one (the press box, a judge, the front row) to hear the drill from there.</EmptyState>;
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">Listening points</caption>
        <thead>
          <tr className="border-b border-ink/15 text-ink-soft">
            <th scope="col" className="py-2 pr-3 font-semibold">Name</th>
            <th scope="col" className="whitespace-nowrap px-2 py-2 text-right font-semibold">x</th>
            <th scope="col" className="whitespace-nowrap px-2 py-2 text-right font-semibold">y</th>
            <th scope="col" className="whitespace-nowrap py-2 pl-2 text-right font-semibold">Height z</th>
          </tr>
        </thead>
        <tbody>
          {points.map((p) => (
            <tr key={p.id} className="border-b border-ink/10 last:border-0">
              <th scope="row" className="py-3 pr-3 text-left font-semibold text-ink">
                {p.name}
                <span className="block text-sm font-normal text-ink-soft">{depthWords(p.y)}</span>
              </th>
              <td className="whitespace-nowrap px-2 py-3 text-right tabular-nums">{metres(p.x)}</td>
              <td className="whitespace-nowrap px-2 py-3 text-right tabular-nums">{metres(p.y)}</td>
              <td className="whitespace-nowrap py-3 pl-2 text-right tabular-nums">{metres(p.z)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mt-3 text-sm text-ink-soft">x from the 50-yard line toward side 2, y from the front sideline toward the back, z above the field.</p>
    </div>
  );
}
