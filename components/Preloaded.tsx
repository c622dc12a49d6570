// Pages arrive with their first data in them: the page's server component asks our own GET route
// handlers in process (same session, same answers as over HTTP; app/preload-answers.ts) and hands
// the answers to SWR as fallback. Without it a page waited for its script to load before it could
// even ask for its data, half a second or more on a busy machine (issue on speed as a person feels it).
import "server-only";
import type { ReactNode } from "react";
import { SWRConfig } from "swr";

/** Children read the given answers at once through useApi(key); keys without an answer are fetched as usual. */
export function Preloaded({ answers, children }: { answers: Record<string, unknown>; children: ReactNode }) {
  return <SWRConfig value={{ fallback: answers }}>{children}</SWRConfig>;
}
