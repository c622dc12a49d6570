import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { requireSignedIn } from "@/lib/auth/page-session";
import { SetEditor } from "./SetEditor";

export const metadata: Metadata = { title: "Field editor" };

export default async function SetPage({ params, searchParams }: { params: Promise<{ showId: string; setId: string }>; searchParams: Promise<{ count?: string | string[] }> }) {
  const { showId, setId } = await params;
  // ?count=N (from the timeline): a count of the transition into this set, shown paused.
  const raw = (await searchParams).count;
  const count = typeof raw === "string" && /^\d{1,4}$/.test(raw) ? Number(raw) : null;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}/sets/${encodeURIComponent(setId)}`);
  return (
    <PageShell userName={user.name}>
      <SetEditor showId={showId} setId={setId} initialCount={count} />
    </PageShell>
  );
}
