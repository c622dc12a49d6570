import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { requireSignedIn } from "@/lib/auth/page-session";
import { ShowOverview } from "./ShowOverview";

export const metadata: Metadata = { title: "Show overview" };

export default async function ShowPage({ params }: PageProps<"/shows/[showId]">) {
  const { showId } = await params;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}`);
  return (
    <PageShell userName={user.name}>
      <ShowOverview showId={showId} />
    </PageShell>
  );
}
