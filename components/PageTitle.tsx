// A page's heading with an optional line under it.
import type { ReactNode } from "react";

export function PageTitle({ children, sub, aside }: { children: ReactNode; sub?: ReactNode; aside?: ReactNode }) {
  return (
    <div className="mb-6 flex flex-wrap items-end justify-between gap-3">
      <div>
        <h1 className="text-3xl font-bold tracking-tight text-ink">{children}</h1>
        {sub ? <div className="mt-1 text-lg text-ink-soft">{sub}</div> : null}
      </div>
      {aside}
    </div>
  );
}
