"use client";
// The show as a whole: download its backup (everyone); duplicate, archive and delete it (directors).
import { useRouter } from "next/navigation";
import { useState } from "react";
import { mutate } from "swr";
import type { ShowResponse } from "@/components/api-types";
import { Button, buttonClass } from "@/components/Button";
import { sendJson } from "@/components/fetcher";
import { FormMessage } from "@/components/FormMessage";
import { apiKeys } from "@/components/use-api";
import { can } from "@/lib/auth/permissions";
import { SHOW_UNDO_DAYS } from "@/lib/limits";

export function ShowActions({ data }: { data: ShowResponse }) {
  const router = useRouter();
  const s = data.show;
  const director = can(data.role, "retire-show");
  const [typed, setTyped] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const [message, setMessage] = useState<{ tone: "info" | "bad"; text: string } | null>(null);
  const act = async (fn: () => Promise<void>) => {
    setBusy(true);
    setMessage(null);
    try {
      await fn();
    } catch (err) {
      setMessage({ tone: "bad", text: err instanceof Error ? err.message : "That did not work." });
    } finally {
      setBusy(false);
    }
  };
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-center gap-2">
        <a className={buttonClass("secondary")} href={`${apiKeys.show(s.id)}/export`} download>
          Download the backup (JSON)
        </a>
        <span className="text-sm text-ink-soft">The whole show in one file; restore it from the program page.</span>
      </div>
      {director ? (
        <>
          <div className="flex flex-wrap gap-2">
            <Button
              variant="secondary"
              disabled={busy}
              onClick={() =>
                act(async () => {
                  const r = await sendJson<{ show: { id: string; name: string } }>(`${apiKeys.show(s.id)}/duplicate`, "POST", {});
                  await mutate(apiKeys.programShows(s.programId));
                  router.push(`/shows/${r!.show.id}/settings`);
                })
              }
            >
              Duplicate the show
            </Button>
            <Button
              variant="secondary"
              disabled={busy}
              onClick={() =>
                act(async () => {
                  await sendJson(`${apiKeys.show(s.id)}/archive`, "POST", { archived: !s.archivedAt });
                  await mutate(apiKeys.show(s.id));
                  setMessage({ tone: "info", text: s.archivedAt ? "Back among the season's shows." : "Archived: listed apart on the program page, still readable." });
                })
              }
            >
              {s.archivedAt ? "Bring back from the archive" : "Archive the show"}
            </Button>
            {typed === null ? (
              <Button variant="secondary" className="text-signal-bad" onClick={() => setTyped("")}>
                Delete the show…
              </Button>
            ) : null}
          </div>
          {typed !== null ? (
            <form
              role="alertdialog"
              aria-label="Delete the show"
              className="space-y-2 rounded-lg border border-signal-bad/40 bg-[#fbe9ea] p-3"
              onSubmit={(e) => {
                e.preventDefault();
                void act(async () => {
                  await sendJson(apiKeys.show(s.id), "DELETE", { name: typed });
                  await mutate(apiKeys.programShows(s.programId));
                  router.push(`/programs/${s.programId}`);
                });
              }}
            >
              <p>
                Deleting hides <strong>{s.name}</strong> from everyone at once. A director can restore it from the program page for {SHOW_UNDO_DAYS} days; after that it is gone for good. Type the show&apos;s name to confirm.
              </p>
              <input aria-label="The show's name" className="min-h-11 w-full rounded-md border border-ink/30 px-2" value={typed} onChange={(e) => setTyped(e.target.value)} autoFocus />
              <div className="flex gap-2">
                <Button type="submit" className="border-signal-bad bg-signal-bad" disabled={busy || typed.trim() !== s.name}>
                  Delete {s.name}
                </Button>
                <Button variant="secondary" onClick={() => setTyped(null)}>
                  Keep it
                </Button>
              </div>
            </form>
          ) : null}
        </>
      ) : (
        <p className="text-sm text-ink-soft">A director can duplicate, archive or delete the show.</p>
      )}
      <FormMessage id="show-actions-message" tone={message?.tone ?? "info"}>
        {message?.text}
      </FormMessage>
    </div>
  );
}
