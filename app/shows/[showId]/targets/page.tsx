import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { requireSignedIn } from "@/lib/auth/page-session";
import { TargetsForm } from "./TargetsForm";

export const metadata: Metadata = { title: "Balance targets" };

export default async function TargetsPage({ params }: { params: Promise<{ showId: string }> }) {
  const { showId } = await params;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}/targets`);
  return (
    <PageShell userName={user.name}>
      <TargetsForm showId={showId} />
    </PageShell>
  );
}
