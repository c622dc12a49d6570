import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { Preloaded } from "@/components/Preloaded";
import { preloadShowPage } from "../preload";
import { showKeys } from "@/components/api-keys";
import { comparedSets, firstListeningPointId } from "@/lib/show/first-choices";
import { requireSignedIn } from "@/lib/auth/page-session";
import { CompareView } from "./CompareView";

export const metadata: Metadata = { title: "Set compare" };

export default async function ComparePage({ params, searchParams }: { params: Promise<{ showId: string }>; searchParams: Promise<{ a?: string; b?: string }> }) {
  const { showId } = await params;
  const { a, b } = await searchParams;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}/compare`);
  const answers = await preloadShowPage(showId, ({ sets, listeningPoints }) => {
    const { aId, bId } = comparedSets(sets, a ?? null, b ?? null);
    const lp = firstListeningPointId(listeningPoints);
    return [aId && bId && lp ? showKeys.compare(showId, aId, bId, lp) : null, aId && showKeys.set(showId, aId), bId && showKeys.set(showId, bId)];
  });
  return (
    <PageShell userName={user.name}>
      <Preloaded answers={answers}>
        <CompareView showId={showId} initialA={a ?? null} initialB={b ?? null} />
      </Preloaded>
    </PageShell>
  );
}
