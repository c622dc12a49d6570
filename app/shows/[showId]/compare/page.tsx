import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { requireSignedIn } from "@/lib/auth/page-session";
import { CompareView } from "./CompareView";

export const metadata: Metadata = { title: "Set compare" };

export default async function ComparePage({ params, searchParams }: { params: Promise<{ showId: string }>; searchParams: Promise<{ a?: string; b?: string }> }) {
  const { showId } = await params;
  const { a, b } = await searchParams;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}/compare`);
  return (
    <PageShell userName={user.name}>
      <CompareView showId={showId} initialA={a ?? null} initialB={b ?? null} />
    </PageShell>
  );
}
