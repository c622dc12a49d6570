"use client";
// The balance plan's musical limits for this phrase or the whole show (directors change them; others read).
import { useState } from "react";
import { useSWRConfig } from "swr";
import { Button } from "@/components/Button";
import { sendJson } from "@/components/fetcher";
import type { PlanLimits } from "./music-types";

const STEPS = [0, 1, 2, 3, 4, 5, 6];

export function LimitsForm({ showId, phraseId, canEdit, inForce }: { showId: string; phraseId: string; canEdit: boolean; inForce: PlanLimits }) {
  const [draft, setDraft] = useState<PlanLimits | null>(null);
  const [status, setStatus] = useState("");
  const { mutate } = useSWRConfig();
  const limits = draft ?? inForce;
  const path = `/api/shows/${encodeURIComponent(showId)}/plan-limits`;

  async function save(body: { phraseId?: string; limits: PlanLimits | null }, done: string) {
    setStatus("Saving…");
    try {
      await sendJson(path, "PUT", body);
      await mutate((k) => typeof k === "string" && (k.includes("/plan") || k.includes("/analysis") || k.includes("/timeline")));
      setDraft(null);
      setStatus(done);
    } catch (e) {
      setStatus(e instanceof Error ? e.message : "That did not work.");
    }
  }

  const step = (label: string, key: "windSteps" | "percussionSteps") => (
    <label className="flex items-center gap-2">
      {label}
      <select
        className="min-h-11 rounded-lg border border-ink-soft/40 bg-paper-raised px-2"
        value={limits[key]}
        disabled={!canEdit}
        onChange={(e) => setDraft({ ...limits, [key]: Number(e.target.value) })}
      >
        {STEPS.map((n) => <option key={n} value={n}>{n === 0 ? "as written" : `up to ${n} step${n === 1 ? "" : "s"}`}</option>)}
      </select>
    </label>
  );

  return (
    <details className="mt-4 rounded-lg border border-ink/10 p-3 text-sm">
      <summary className="cursor-pointer font-semibold">Musical limits</summary>
      <p className="mt-2 text-ink-soft">How far the plan may move a section from what is written, and whether it keeps the written shape (a section written louder stays louder unless a target needs otherwise; the melody is never planned under its accompaniment).</p>
      <div className="mt-2 flex flex-wrap items-center gap-4">
        {step("Winds", "windSteps")}
        {step("Battery and front ensemble", "percussionSteps")}
        <label className="flex min-h-11 items-center gap-2">
          <input type="checkbox" checked={limits.keepShape} disabled={!canEdit} onChange={(e) => setDraft({ ...limits, keepShape: e.target.checked })} />
          Keep the written shape
        </label>
      </div>
      {canEdit ? (
        <div className="mt-3 flex flex-wrap gap-3">
          <Button onClick={() => save({ phraseId, limits }, "Limits saved for this phrase.")}>Use for this phrase</Button>
          <Button variant="secondary" onClick={() => save({ limits }, "Limits saved for the whole show.")}>Use for the whole show</Button>
          <Button variant="secondary" onClick={() => save({ phraseId, limits: null }, "This phrase now follows the show's limits.")}>Follow the show&apos;s limits</Button>
        </div>
      ) : (
        <p className="mt-2 text-ink-soft">Only the director can change the limits.</p>
      )}
      <p aria-live="polite" className="mt-2 min-h-6">{status}</p>
    </details>
  );
}
