// Where the show is judged: each listening point in the trade's words (steps along the field,
// yards from a sideline, metres up).
import type { FieldRules, ListeningPoint } from "@/components/api-types";
import { EmptyState } from "@/components/EmptyState";
import { describeListeningPoint } from "@/lib/field/point-words";

export function ListeningPoints({ points, rules }: { points: ListeningPoint[]; rules: FieldRules }) {
  if (points.length === 0) return <EmptyState title="No listening points">Add one (the press box, a judge, the front row) to hear the drill from there.</EmptyState>;
  return (
    <ul className="divide-y divide-ink/10">
      {points.map((p) => (
        <li key={p.id} className="py-3">
          <span className="font-semibold text-ink">{p.name}</span>
          <span className="block text-sm text-ink-soft">{describeListeningPoint(p.x, p.y, p.z, rules)}</span>
        </li>
      ))}
    </ul>
  );
}
