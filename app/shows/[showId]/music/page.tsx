import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { requireSignedIn } from "@/lib/auth/page-session";
import { MusicView } from "./MusicView";

export const metadata: Metadata = { title: "Music" };

export default async function MusicPage({ params, searchParams }: { params: Promise<{ showId: string }>; searchParams: Promise<{ phrase?: string }> }) {
  const { showId } = await params;
  const { phrase } = await searchParams;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}/music`);
  return (
    <PageShell userName={user.name}>
      <MusicView showId={showId} initialPhraseId={phrase ?? null} />
    </PageShell>
  );
}
