"use client";
// Times in the reader's own time zone. A page's first render happens on the server (its data is
// preloaded), which knows no reader's zone, and the browser's first render must match it: both say
// UTC, and the browser turns it local right after.
import { useSyncExternalStore } from "react";

const never = () => () => {};

/** False on the server and while the browser takes over its HTML; true after. */
export function useInBrowser(): boolean {
  return useSyncExternalStore(never, () => true, () => false);
}

/** A formatter of ISO times: the reader's zone in the browser, UTC (said so) before. */
export function useLocalTimes(): (iso: string, options: Intl.DateTimeFormatOptions) => string {
  const local = useInBrowser();
  return (iso, options) => (local ? new Date(iso).toLocaleString(undefined, options) : `${new Date(iso).toLocaleString("en-US", { ...options, timeZone: "UTC" })} UTC`);
}
