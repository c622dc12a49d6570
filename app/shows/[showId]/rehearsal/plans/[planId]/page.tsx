import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { requireSignedIn } from "@/lib/auth/page-session";
import { KeptPlanView } from "./KeptPlanView";
import { showKeys } from "@/components/api-keys";
import { Preloaded } from "@/components/Preloaded";
import { preloadShowPage } from "../../../preload";

export const metadata: Metadata = { title: "Rehearsal plan" };

export default async function KeptPlanPage({ params }: { params: Promise<{ showId: string; planId: string }> }) {
  const { showId, planId } = await params;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}/rehearsal/plans/${encodeURIComponent(planId)}`);
  const answers = await preloadShowPage(showId, () => [showKeys.keptPlan(showId, planId)]);
  return (
    <PageShell userName={user.name}>
      <Preloaded answers={answers}>
        <KeptPlanView showId={showId} planId={planId} />
      </Preloaded>
    </PageShell>
  );
}
