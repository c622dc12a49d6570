import type { Metadata } from "next";
import { preloadAnswers } from "@/app/preload-answers";
import { PageShell } from "@/components/PageShell";
import { Preloaded } from "@/components/Preloaded";
import { firstListeningPointId } from "@/lib/show/first-choices";
import { preloadShowPage } from "../../preload";
import { editorKeys } from "./editor-keys";
import type { SetResponse } from "./editor-api";
import { requireSignedIn } from "@/lib/auth/page-session";
import { SetEditor } from "./SetEditor";

export const metadata: Metadata = { title: "Field editor" };

export default async function SetPage({ params, searchParams }: { params: Promise<{ showId: string; setId: string }>; searchParams: Promise<{ count?: string | string[] }> }) {
  const { showId, setId } = await params;
  // ?count=N (from the timeline): a count of the transition into this set, shown paused.
  const raw = (await searchParams).count;
  const count = typeof raw === "string" && /^\d{1,4}$/.test(raw) ? Number(raw) : null;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}/sets/${encodeURIComponent(setId)}`);
  // The show, this set and the one before it, the live mix's input, then the stored box mix of this set's version.
  const answers = await preloadShowPage(showId, ({ sets }) => {
    const previous = sets[sets.findIndex((s) => s.id === setId) - 1];
    return [editorKeys.set(showId, setId), previous ? editorKeys.set(showId, previous.id) : null, editorKeys.mixInput(showId, setId)];
  });
  const set = answers[editorKeys.set(showId, setId)] as SetResponse | undefined;
  const show = answers[editorKeys.show(showId)] as { listeningPoints: { id: string; name: string }[] } | undefined;
  const lp = show && firstListeningPointId(show.listeningPoints);
  if (set && lp) Object.assign(answers, await preloadAnswers([editorKeys.analysis(showId, setId, lp, set.set.version)]));
  return (
    <PageShell userName={user.name}>
      <Preloaded answers={answers}>
        <SetEditor showId={showId} setId={setId} initialCount={count} />
      </Preloaded>
    </PageShell>
  );
}
