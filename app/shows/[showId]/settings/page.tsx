import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { Preloaded } from "@/components/Preloaded";
import { preloadShowPage } from "../preload";
import { requireSignedIn } from "@/lib/auth/page-session";
import { SettingsView } from "./SettingsView";

export const metadata: Metadata = { title: "Show settings" };

export default async function SettingsPage({ params }: PageProps<"/shows/[showId]/settings">) {
  const { showId } = await params;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}/settings`);
  const answers = await preloadShowPage(showId);
  return (
    <PageShell userName={user.name}>
      <Preloaded answers={answers}>
        <SettingsView showId={showId} />
      </Preloaded>
    </PageShell>
  );
}
