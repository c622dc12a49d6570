"use client";
// Shows deleted in the last days, each with the date it goes for good and a button that undoes the deletion.
import { useState } from "react";
import { Button } from "@/components/Button";
import { sendJson } from "@/components/fetcher";
import { useLocalTimes } from "@/components/local-time";

export function DeletedShows({ shows, onRestored }: { shows: { id: string; name: string; purgeAt: string }[]; onRestored(): void }) {
  const [error, setError] = useState<string | null>(null);
  const format = useLocalTimes();
  return (
    <div className="mt-4 rounded-lg border border-ink/15 bg-paper p-3">
      <h3 className="font-semibold">Recently deleted</h3>
      <ul className="mt-1 space-y-1">
        {shows.map((s) => (
          <li key={s.id} className="flex flex-wrap items-center justify-between gap-2">
            <span>
              {s.name} <span className="text-sm text-ink-soft">(gone for good on {format(s.purgeAt, { dateStyle: "medium" })})</span>
            </span>
            <Button
              variant="secondary"
              onClick={async () => {
                setError(null);
                try {
                  await sendJson(`/api/shows/${s.id}/restore`, "POST");
                  onRestored();
                } catch (err) {
                  setError(err instanceof Error ? err.message : "That did not work.");
                }
              }}
            >
              Restore {s.name}
            </Button>
          </li>
        ))}
      </ul>
      {error ? <p className="text-sm text-signal-bad" role="alert">{error}</p> : null}
    </div>
  );
}
