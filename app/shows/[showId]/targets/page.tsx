import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { Preloaded } from "@/components/Preloaded";
import { preloadShowPage } from "../preload";
import { showKeys } from "@/components/api-keys";
import { requireSignedIn } from "@/lib/auth/page-session";
import { TargetsForm } from "./TargetsForm";

export const metadata: Metadata = { title: "Balance targets" };

export default async function TargetsPage({ params }: { params: Promise<{ showId: string }> }) {
  const { showId } = await params;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}/targets`);
  const answers = await preloadShowPage(showId, () => [showKeys.targets(showId)]);
  return (
    <PageShell userName={user.name}>
      <Preloaded answers={answers}>
        <TargetsForm showId={showId} />
      </Preloaded>
    </PageShell>
  );
}
