import type { Metadata } from "next";
import { preloadAnswers } from "@/app/preload-answers";
import { apiKeys } from "@/components/api-keys";
import { PageShell } from "@/components/PageShell";
import { Preloaded } from "@/components/Preloaded";
import { requireSignedIn } from "@/lib/auth/page-session";
import { ProgramList } from "./ProgramList";

export const metadata: Metadata = { title: "Your programs" };

export default async function ProgramsPage() {
  const user = await requireSignedIn("/programs");
  const answers = await preloadAnswers([apiKeys.me]);
  return (
    <PageShell userName={user.name}>
      <Preloaded answers={answers}>
        <ProgramList />
      </Preloaded>
    </PageShell>
  );
}
