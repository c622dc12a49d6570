import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { requireSignedIn } from "@/lib/auth/page-session";
import { PerformerDots } from "./PerformerDots";

export const metadata: Metadata = { title: "My dots" };

export default async function PerformerPage({ params }: PageProps<"/shows/[showId]/performer/[label]">) {
  const { showId, label } = await params;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}/performer/${encodeURIComponent(label)}`);
  return (
    <PageShell userName={user.name}>
      <PerformerDots showId={showId} label={decodeURIComponent(label)} />
    </PageShell>
  );
}
