import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { Preloaded } from "@/components/Preloaded";
import { preloadShowPage } from "../preload";
import { showKeys } from "@/components/api-keys";
import { firstListeningPointId } from "@/lib/show/first-choices";
import { requireSignedIn } from "@/lib/auth/page-session";
import { TimelineView } from "./TimelineView";

// Stored sweeps answer in tens of milliseconds; sweeps still to compute show their progress instead.
const TIMELINE_WAIT_MS = 400;

export const metadata: Metadata = { title: "Show timeline" };

export default async function TimelinePage({ params }: { params: Promise<{ showId: string }> }) {
  const { showId } = await params;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}/timeline`);
  const answers = await preloadShowPage(showId, ({ listeningPoints }) => {
    const lp = firstListeningPointId(listeningPoints);
    return [lp && showKeys.timeline(showId, lp)];
  }, TIMELINE_WAIT_MS);
  return (
    <PageShell userName={user.name}>
      <Preloaded answers={answers}>
        <TimelineView showId={showId} />
      </Preloaded>
    </PageShell>
  );
}
