import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { requireSignedIn } from "@/lib/auth/page-session";
import { RehearsalView } from "./RehearsalView";
import "../sheets/print.css";

export const metadata: Metadata = { title: "Stadium rehearsal plan" };

const list = (v: string | string[] | undefined) => (Array.isArray(v) ? v : v ? [v] : []);

export default async function RehearsalPage({ params, searchParams }: PageProps<"/shows/[showId]/rehearsal">) {
  const { showId } = await params;
  const q = await searchParams;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}/rehearsal`);
  return (
    <PageShell userName={user.name}>
      <RehearsalView showId={showId} initial={{ phraseIds: list(q.phrase), setIds: list(q.set), pointId: list(q.point)[0] ?? null }} />
    </PageShell>
  );
}
