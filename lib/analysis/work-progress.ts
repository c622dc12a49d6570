// How far long whole-show work has got, for the pages that wait on it (the timeline's "3 of 17
// transitions", the rehearsal plan's "2 of 8 phrases"). Kept in this process's memory: the request doing the work and the page asking for
// its progress reach the same server process in the deployments we ship (one Node process).
import "server-only";

import type { WorkProgress } from "./work-progress-types";

export type { WorkProgress };

const running = new Map<string, WorkProgress>();

export const sweepWork = (showId: string) => `sweeps:${showId}`;
/** The balance plans of the phrases a rehearsal plan takes in. */
export const planWork = (showId: string) => `plans:${showId}`;

/** Tracks `work` under `key` while it runs; `work` reports through the callback it is given. */
export async function withProgress<T>(key: string, work: (report: (done: number, total: number) => void) => Promise<T>): Promise<T> {
  const startedAt = new Date().toISOString();
  try {
    return await work((done, total) => running.set(key, { done, total, startedAt }));
  } finally {
    running.delete(key);
  }
}

/** The progress of the work running under `key`, or null when none is. */
export function progressOf(key: string): WorkProgress | null {
  return running.get(key) ?? null;
}
