// The calm single-card frame of the sign-in and sign-up pages.
import type { ReactNode } from "react";
import { BrandMark } from "./BrandMark";

export function AuthFrame({ title, intro, children, footer }: { title: string; intro: ReactNode; children: ReactNode; footer: ReactNode }) {
  return (
    <main id="main" className="flex min-h-dvh items-start justify-center px-4 py-10 sm:items-center">
      <div className="w-full max-w-md">
        <p className="mb-6 flex items-center gap-2 text-2xl font-bold tracking-tight text-ink">
          <BrandMark className="h-10 w-10" />
          Farfield
        </p>
        <div className="rounded-xl border border-ink/10 bg-paper-raised p-6 shadow-sm sm:p-8">
          <h1 className="text-2xl font-bold text-ink">{title}</h1>
          <div className="mt-1 text-ink-soft">{intro}</div>
          <div className="mt-6">{children}</div>
        </div>
        <div className="mt-5 text-center text-ink-soft">{footer}</div>
      </div>
    </main>
  );
}
