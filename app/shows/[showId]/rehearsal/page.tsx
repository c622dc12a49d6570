import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { Preloaded } from "@/components/Preloaded";
import { preloadShowPage } from "../preload";
import { showKeys } from "@/components/api-keys";
import { requireSignedIn } from "@/lib/auth/page-session";
import { RehearsalView } from "./RehearsalView";
import "../sheets/print.css";

export const metadata: Metadata = { title: "Stadium rehearsal plan" };

const list = (v: string | string[] | undefined) => (Array.isArray(v) ? v : v ? [v] : []);

export default async function RehearsalPage({ params, searchParams }: PageProps<"/shows/[showId]/rehearsal">) {
  const { showId } = await params;
  const q = await searchParams;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}/rehearsal`);
  const answers = await preloadShowPage(showId, () => [showKeys.rehearsalPlan(showId), showKeys.rehearsalPlans(showId)]);
  return (
    <PageShell userName={user.name}>
      <Preloaded answers={answers}>
        <RehearsalView showId={showId} initial={{ phraseIds: list(q.phrase), setIds: list(q.set), pointId: list(q.point)[0] ?? null }} />
      </Preloaded>
    </PageShell>
  );
}
