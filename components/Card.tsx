// A titled panel of a page.
import type { ReactNode } from "react";

export function Card({ title, titleId, action, children, className = "" }: { title: string; titleId?: string; action?: ReactNode; children: ReactNode; className?: string }) {
  return (
    <section aria-labelledby={titleId} className={`rounded-xl border border-ink/10 bg-paper-raised shadow-sm ${className}`}>
      <header className="flex flex-wrap items-center justify-between gap-3 border-b border-ink/10 px-5 py-4">
        <h2 id={titleId} className="text-lg font-semibold text-ink">
          {title}
        </h2>
        {action}
      </header>
      <div className="px-5 py-4">{children}</div>
    </section>
  );
}
