// An item's build-up, step by step (the soloist or the melody alone first), as the plan and the kept plan show it.
import type { BuildUpStep } from "@/lib/rehearsal/plan";

export function BuildUpList({ steps, className = "mt-1" }: { steps: BuildUpStep[]; className?: string }) {
  return (
    <ol className={`${className} list-decimal space-y-1 pl-5`}>
      {steps.map((s) => (
        <li key={s.step}>
          <span className="font-semibold">{s.title}:</span> {s.sections.join(", ")}
        </li>
      ))}
    </ol>
  );
}
