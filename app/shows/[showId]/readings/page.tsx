import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { requireSignedIn } from "@/lib/auth/page-session";
import { ReadingsView } from "./ReadingsView";

export const metadata: Metadata = { title: "Box readings" };

export default async function ReadingsPage({ params }: { params: Promise<{ showId: string }> }) {
  const { showId } = await params;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}/readings`);
  return (
    <PageShell userName={user.name}>
      <ReadingsView showId={showId} />
    </PageShell>
  );
}
