import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { Preloaded } from "@/components/Preloaded";
import { requireSignedIn } from "@/lib/auth/page-session";
import { apiKeys } from "@/components/api-keys";
import { preloadShowPage } from "./preload";
import { ShowOverview } from "./ShowOverview";

export const metadata: Metadata = { title: "Show overview" };

export default async function ShowPage({ params }: PageProps<"/shows/[showId]">) {
  const { showId } = await params;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}`);
  return (
    <PageShell userName={user.name}>
      <Preloaded answers={await preloadShowPage(showId, ({ show }) => [apiKeys.program(show.programId)])}>
        <ShowOverview showId={showId} />
      </Preloaded>
    </PageShell>
  );
}
