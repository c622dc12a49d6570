"use client";
// How far the show's long work has got (GET …/work-progress), asked twice a second while a page waits on it.
import useSWR from "swr";
import type { WorkProgress } from "@/lib/analysis/work-progress-types";
import { workProgressKey } from "./api-keys";
import { fetcher } from "./fetcher";

export function useWorkProgress(showId: string, which: "sweeps" | "plans", waiting = true): WorkProgress | null {
  const { data } = useSWR<{ sweeps: WorkProgress | null; plans?: WorkProgress | null }>(waiting ? workProgressKey(showId) : null, fetcher, { refreshInterval: 500, dedupingInterval: 400 });
  return data?.[which] ?? null;
}
