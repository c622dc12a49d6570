"use client";
// On a page that has nothing to say until the show has a roster, a drill or music: the show's next step,
// with a link to where it is done. Nothing once the show has what the page needs (or while loading).
import { nextStep, type StepNeed } from "@/lib/show/next-step";
import type { ShowResponse } from "./api-types";
import { ButtonLink } from "./Button";
import { apiKeys, useApi } from "./use-api";

export function NextStepNotice({ showId, need }: { showId: string; need: StepNeed }) {
  const show = useApi<ShowResponse>(apiKeys.show(showId));
  const data = show.data;
  if (!data?.progress) return null;
  const step = nextStep({ performers: data.performers.length, ...data.progress }, need);
  if (!step) return null;
  const base = `/shows/${encodeURIComponent(showId)}`;
  const firstSet = data.sets[0]?.id;
  const href = step.need === "roster" ? `${base}#roster-title` : step.need === "drill" && firstSet ? `${base}/sets/${encodeURIComponent(firstSet)}` : `${base}/music`;
  return (
    <section aria-labelledby="next-step-title" className="mb-6 rounded-xl border border-turf/40 bg-turf-light/40 p-6">
      <p className="text-sm font-semibold uppercase tracking-wide text-turf-dark">Nothing to hear yet</p>
      <h2 id="next-step-title" className="mt-1 text-xl font-bold">Next: {step.title.toLowerCase()}</h2>
      <p className="mt-2 max-w-prose text-ink-soft">{step.body}</p>
      <ButtonLink className="mt-4" href={href} variant="primary">
        {step.action}
      </ButtonLink>
    </section>
  );
}
