// A phrase's plan in a worker thread (lib/heavy): the search can take a while on a large phrase, and
// the rehearsal plan runs one per phrase. The phrase and the point are checked here first, so a
// wrong id still answers 404 (an error thrown in a worker comes back as a plain Error).
import "server-only";
import { runHeavy } from "@/lib/heavy/pool";
import { planSubject, type PhrasePlan } from "./phrase-plan";
import type { ShowBalance } from "./show-context";

/** The phrase's plan at the listening point, computed off the request thread. */
export async function runPhrasePlan(sb: ShowBalance, phraseId: string, listeningPointId: string): Promise<PhrasePlan> {
  planSubject(sb, phraseId, listeningPointId);
  return runHeavy("phrasePlan", sb, phraseId, listeningPointId);
}
