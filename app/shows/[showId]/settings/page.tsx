import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { requireSignedIn } from "@/lib/auth/page-session";
import { SettingsView } from "./SettingsView";

export const metadata: Metadata = { title: "Show settings" };

export default async function SettingsPage({ params }: PageProps<"/shows/[showId]/settings">) {
  const { showId } = await params;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}/settings`);
  return (
    <PageShell userName={user.name}>
      <SettingsView showId={showId} />
    </PageShell>
  );
}
