import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { Preloaded } from "@/components/Preloaded";
import { preloadShowPage } from "../preload";
import { showKeys } from "@/components/api-keys";
import { requireSignedIn } from "@/lib/auth/page-session";
import { MusicView } from "./MusicView";

export const metadata: Metadata = { title: "Music" };

export default async function MusicPage({ params, searchParams }: { params: Promise<{ showId: string }>; searchParams: Promise<{ phrase?: string }> }) {
  const { showId } = await params;
  const { phrase } = await searchParams;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}/music`);
  const answers = await preloadShowPage(showId, () => [showKeys.music(showId), showKeys.score(showId)]);
  return (
    <PageShell userName={user.name}>
      <Preloaded answers={answers}>
        <MusicView showId={showId} initialPhraseId={phrase ?? null} />
      </Preloaded>
    </PageShell>
  );
}
