"use client";
// Sends each change of the layout with PUT …/positions (and …/positions/remove) and the set's
// version, one save at a time. A stale version (409) fetches the other person's set and keeps our
// change aside to re-apply: nothing is lost silently.
import { useCallback, useEffect, useRef, useState } from "react";
import { ApiError, fetcher, sendJson } from "@/components/fetcher";
import { diffLayouts, layoutOf, type Layout } from "@/lib/editor/layout";
import { editorKeys, type SetResponse } from "./editor-api";

export interface Conflict {
  theirs: Layout;
  theirVersion: number;
  /** Our unsaved change: what we changed since the version we last read. */
  mine: ReturnType<typeof diffLayouts>;
}

export type SaveStatus = "saved" | "saving" | "error";

export function useSetSaver(args: { showId: string; setId: string; present: Layout; enabled: boolean; onSaved(version: number): void; onTheirs(theirs: Layout): void }) {
  const { showId, setId, present, enabled } = args;
  const [server, setServer] = useState<{ layout: Layout; version: number } | null>(null);
  const [status, setStatus] = useState<SaveStatus>("saved");
  const [error, setError] = useState<string | null>(null);
  const [conflict, setConflict] = useState<Conflict | null>(null);
  const inFlight = useRef(false);
  const callbacks = useRef(args);
  // The latest callbacks, for a save that ends after a later render.
  useEffect(() => {
    callbacks.current = args;
  });

  const send = useCallback(
    async (base: { layout: Layout; version: number }, target: Layout) => {
      const d = diffLayouts(base.layout, target);
      inFlight.current = true;
      setStatus("saving");
      let version = base.version;
      try {
        if (d.upserts.length) {
          version = (await sendJson<{ version: number }>(editorKeys.positions(showId, setId), "PUT", { version, positions: d.upserts }))!.version;
        }
        if (d.removals.length) {
          version = (await sendJson<{ version: number }>(editorKeys.removeFromSet(showId, setId), "POST", { version, performerIds: d.removals }))!.version;
        }
        setServer({ layout: target, version });
        setStatus("saved");
        callbacks.current.onSaved(version);
      } catch (err) {
        if (err instanceof ApiError && err.status === 409) {
          const theirs = await fetcher<SetResponse>(editorKeys.set(showId, setId)).catch(() => null);
          if (theirs) {
            const theirLayout = layoutOf(theirs.positions);
            setConflict({ theirs: theirLayout, theirVersion: theirs.set.version, mine: diffLayouts(base.layout, target) });
            setServer({ layout: theirLayout, version: theirs.set.version });
            callbacks.current.onTheirs(theirLayout);
            setStatus("saved");
            return;
          }
        }
        setError(err instanceof Error ? err.message : "The change could not be saved.");
        setStatus("error");
      } finally {
        inFlight.current = false;
      }
    },
    [showId, setId],
  );

  useEffect(() => {
    if (!enabled || !server || conflict || error || inFlight.current) return;
    const d = diffLayouts(server.layout, present);
    if (d.upserts.length === 0 && d.removals.length === 0) return;
    // Sending is the effect's job (the server is the outside system); its "saving" status is meant to show at once.
    // eslint-disable-next-line react-hooks/set-state-in-effect
    void send(server, present);
  }, [enabled, server, conflict, error, present, send]);

  return {
    server,
    status,
    error,
    conflict,
    /** The set as read from the server (first load, or a newer version while we have no unsaved change). */
    adopt: (layout: Layout, version: number) => setServer({ layout, version }),
    setVersion: (version: number) => setServer((s) => (s ? { ...s, version } : s)),
    dirty: server ? (() => {
      const d = diffLayouts(server.layout, present);
      return d.upserts.length + d.removals.length > 0;
    })() : false,
    busy: () => inFlight.current,
    retry: () => setError(null),
    closeConflict: () => setConflict(null),
  };
}
