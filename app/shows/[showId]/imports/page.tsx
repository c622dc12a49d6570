import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { requireSignedIn } from "@/lib/auth/page-session";
import { ImportsView } from "./ImportsView";

export const metadata: Metadata = { title: "Imports" };

export default async function ImportsPage({ params }: PageProps<"/shows/[showId]/imports">) {
  const { showId } = await params;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}/imports`);
  return (
    <PageShell userName={user.name}>
      <ImportsView showId={showId} />
    </PageShell>
  );
}
