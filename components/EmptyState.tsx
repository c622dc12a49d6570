// What a list says when it has nothing in it.
import type { ReactNode } from "react";

export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="rounded-lg border border-dashed border-ink/25 bg-paper px-5 py-6 text-center">
      <p className="font-semibold text-ink">{title}</p>
      {children ? <div className="mt-1 text-ink-soft">{children}</div> : null}
    </div>
  );
}
