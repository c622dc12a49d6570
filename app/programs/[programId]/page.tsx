import type { Metadata } from "next";
import { preloadAnswers } from "@/app/preload-answers";
import { apiKeys } from "@/components/api-keys";
import { PageShell } from "@/components/PageShell";
import { Preloaded } from "@/components/Preloaded";
import { requireSignedIn } from "@/lib/auth/page-session";
import { ProgramOverview } from "./ProgramOverview";

export const metadata: Metadata = { title: "Program" };

export default async function ProgramPage({ params }: PageProps<"/programs/[programId]">) {
  const { programId } = await params;
  const user = await requireSignedIn(`/programs/${encodeURIComponent(programId)}`);
  const answers = await preloadAnswers([apiKeys.program(programId), apiKeys.programShows(programId)]);
  return (
    <PageShell userName={user.name}>
      <Preloaded answers={answers}>
        <ProgramOverview programId={programId} />
      </Preloaded>
    </PageShell>
  );
}
