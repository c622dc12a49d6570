"use client";
// A page that failed on the server: a database outage says so; anything else offers a retry.
import { Button, ButtonLink } from "@/components/Button";
import { isDatabaseDownDigest } from "@/components/page-errors";

export default function PageError({ error, retry }: { error: unknown; retry: () => void }) {
  const dbDown = isDatabaseDownDigest(error);
  return (
    <main id="main" className="flex min-h-dvh items-center justify-center px-4">
      <div role="alert" className="max-w-md rounded-xl border border-signal-bad/40 bg-paper-raised p-6 shadow-sm">
        <h1 className="text-2xl font-bold text-ink">{dbDown ? "Database unavailable" : "Something went wrong"}</h1>
        <p className="mt-2 text-ink">
          {dbDown
            ? "The database cannot be reached right now. Nothing is lost; try again in a moment."
            : "This page could not be shown. Try again; if it keeps happening, tell whoever runs Farfield for your program."}
        </p>
        <div className="mt-5 flex flex-wrap gap-3">
          <Button onClick={() => retry()}>Try again</Button>
          <ButtonLink href="/programs">Your programs</ButtonLink>
        </div>
      </div>
    </main>
  );
}
