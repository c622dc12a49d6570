import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { requireSignedIn } from "@/lib/auth/page-session";
import { KeptPlanView } from "./KeptPlanView";

export const metadata: Metadata = { title: "Rehearsal plan" };

export default async function KeptPlanPage({ params }: { params: Promise<{ showId: string; planId: string }> }) {
  const { showId, planId } = await params;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}/rehearsal/plans/${encodeURIComponent(planId)}`);
  return (
    <PageShell userName={user.name}>
      <KeptPlanView showId={showId} planId={planId} />
    </PageShell>
  );
}
