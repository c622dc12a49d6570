// The frame of every signed-in page: product name, who is signed in, sign-out, then the page.
import Link from "next/link";
import type { ReactNode } from "react";
import { BrandMark } from "./BrandMark";
import { SignOutButton } from "./SignOutButton";

export function PageShell({ userName, children }: { userName: string; children: ReactNode }) {
  return (
    <div className="flex min-h-dvh flex-col">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-3 focus:top-3 focus:z-50 focus:rounded focus:bg-paper-raised focus:px-3 focus:py-2">
        Skip to content
      </a>
      <header className="no-print border-b border-ink/10 bg-paper-raised">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center justify-between gap-3 px-4 py-2 sm:px-6">
          <Link href="/programs" className="flex min-h-11 items-center gap-2 rounded text-xl font-bold tracking-tight text-ink">
            <BrandMark />
            Farfield
          </Link>
          <div className="flex items-center gap-3">
            <span className="hidden text-ink-soft sm:inline">
              Signed in as <span className="font-semibold text-ink">{userName}</span>
            </span>
            <span className="font-semibold text-ink sm:hidden">{userName}</span>
            <SignOutButton />
          </div>
        </div>
      </header>
      <main id="main" className="mx-auto w-full max-w-6xl flex-1 px-4 py-6 sm:px-6 sm:py-8">
        {children}
      </main>
    </div>
  );
}
