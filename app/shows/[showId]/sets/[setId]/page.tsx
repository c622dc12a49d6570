import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { requireSignedIn } from "@/components/require-session";
import { SetEditor } from "./SetEditor";

export const metadata: Metadata = { title: "Field editor" };

export default async function SetPage({ params }: { params: Promise<{ showId: string; setId: string }> }) {
  const { showId, setId } = await params;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}/sets/${encodeURIComponent(setId)}`);
  return (
    <PageShell userName={user.name}>
      <SetEditor showId={showId} setId={setId} />
    </PageShell>
  );
}
