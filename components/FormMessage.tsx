// A form's status line, read out by screen readers as it changes.
import type { ReactNode } from "react";

export function FormMessage({ id, tone, children }: { id: string; tone: "info" | "bad"; children: ReactNode }) {
  return (
    <p id={id} aria-live="polite" role="status" className={`min-h-6 font-medium ${tone === "bad" ? "text-signal-bad" : "text-ink-soft"}`}>
      {children}
    </p>
  );
}
