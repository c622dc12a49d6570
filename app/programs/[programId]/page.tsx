import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { requireSignedIn } from "@/lib/auth/page-session";
import { ProgramOverview } from "./ProgramOverview";

export const metadata: Metadata = { title: "Program" };

export default async function ProgramPage({ params }: PageProps<"/programs/[programId]">) {
  const { programId } = await params;
  const user = await requireSignedIn(`/programs/${encodeURIComponent(programId)}`);
  return (
    <PageShell userName={user.name}>
      <ProgramOverview programId={programId} />
    </PageShell>
  );
}
