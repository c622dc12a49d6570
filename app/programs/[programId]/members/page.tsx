import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { requireSignedIn } from "@/lib/auth/page-session";
import { MembersView } from "./MembersView";

export const metadata: Metadata = { title: "Members" };

export default async function MembersPage({ params }: PageProps<"/programs/[programId]/members">) {
  const { programId } = await params;
  const user = await requireSignedIn(`/programs/${encodeURIComponent(programId)}/members`);
  return (
    <PageShell userName={user.name}>
      <MembersView programId={programId} />
    </PageShell>
  );
}
