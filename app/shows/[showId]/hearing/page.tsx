import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { requireSignedIn } from "@/lib/auth/page-session";
import { HearingView } from "./HearingView";

export const metadata: Metadata = { title: "Hearing map" };

export default async function HearingPage({ params }: { params: Promise<{ showId: string }> }) {
  const { showId } = await params;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}/hearing`);
  return (
    <PageShell userName={user.name}>
      <HearingView showId={showId} />
    </PageShell>
  );
}
