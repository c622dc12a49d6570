import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { requireSignedIn } from "@/lib/auth/page-session";
import { TimelineView } from "./TimelineView";

export const metadata: Metadata = { title: "Show timeline" };

export default async function TimelinePage({ params }: { params: Promise<{ showId: string }> }) {
  const { showId } = await params;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}/timeline`);
  return (
    <PageShell userName={user.name}>
      <TimelineView showId={showId} />
    </PageShell>
  );
}
