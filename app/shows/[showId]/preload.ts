// A show page's first answers: the show (its nav, title, sets and listening points), then what the
// page builds from it. An unreadable show preloads nothing; the page then shows the API's refusal.
import "server-only";
import { preloadAnswers } from "@/app/preload-answers";
import { apiKeys } from "@/components/api-keys";
import type { ShowResponse } from "@/components/api-types";

/** `waitMs` bounds the wait for what `more` names (see preloadAnswers). */
export async function preloadShowPage(showId: string, more: (show: ShowResponse) => (string | null)[] = () => [], waitMs?: number) {
  const key = apiKeys.show(showId);
  const first = await preloadAnswers([key]);
  const show = first[key] as ShowResponse | undefined;
  return show ? { ...first, ...(await preloadAnswers(more(show), waitMs)) } : first;
}
