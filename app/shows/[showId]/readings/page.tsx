import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { Preloaded } from "@/components/Preloaded";
import { preloadShowPage } from "../preload";
import { apiKeys } from "@/components/api-keys";
import { readingKeys } from "./readings-types";
import { requireSignedIn } from "@/lib/auth/page-session";
import { ReadingsView } from "./ReadingsView";

export const metadata: Metadata = { title: "Box readings" };

export default async function ReadingsPage({ params }: { params: Promise<{ showId: string }> }) {
  const { showId } = await params;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}/readings`);
  const answers = await preloadShowPage(showId, ({ show }) => [apiKeys.program(show.programId), readingKeys.readings(showId), readingKeys.fit(show.programId, showId), readingKeys.catalog(show.programId)]);
  return (
    <PageShell userName={user.name}>
      <Preloaded answers={answers}>
        <ReadingsView showId={showId} />
      </Preloaded>
    </PageShell>
  );
}
