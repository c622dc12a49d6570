import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { requireSignedIn } from "@/lib/auth/page-session";
import { ProgramList } from "./ProgramList";

export const metadata: Metadata = { title: "Your programs" };

export default async function ProgramsPage() {
  const user = await requireSignedIn("/programs");
  return (
    <PageShell userName={user.name}>
      <ProgramList />
    </PageShell>
  );
}
