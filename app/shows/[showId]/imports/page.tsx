import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { Preloaded } from "@/components/Preloaded";
import { preloadShowPage } from "../preload";
import { showKeys } from "@/components/api-keys";
import { requireSignedIn } from "@/lib/auth/page-session";
import { ImportsView } from "./ImportsView";

export const metadata: Metadata = { title: "Imports" };

export default async function ImportsPage({ params }: PageProps<"/shows/[showId]/imports">) {
  const { showId } = await params;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}/imports`);
  const answers = await preloadShowPage(showId, () => [showKeys.imports(showId)]);
  return (
    <PageShell userName={user.name}>
      <Preloaded answers={answers}>
        <ImportsView showId={showId} />
      </Preloaded>
    </PageShell>
  );
}
