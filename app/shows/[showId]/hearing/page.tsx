import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { Preloaded } from "@/components/Preloaded";
import { preloadShowPage } from "../preload";
import { apiKeys, showKeys } from "@/components/api-keys";
import { FIRST_REHEARSAL_MINUTES } from "@/lib/show/first-choices";
import { requireSignedIn } from "@/lib/auth/page-session";
import { HearingView } from "./HearingView";

export const metadata: Metadata = { title: "Hearing map" };

export default async function HearingPage({ params }: { params: Promise<{ showId: string }> }) {
  const { showId } = await params;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}/hearing`);
  const answers = await preloadShowPage(showId, ({ show, sets }) => [apiKeys.program(show.programId), sets[0] ? showKeys.hearing(showId, sets[0].id, FIRST_REHEARSAL_MINUTES) : null]);
  return (
    <PageShell userName={user.name}>
      <Preloaded answers={answers}>
        <HearingView showId={showId} />
      </Preloaded>
    </PageShell>
  );
}
