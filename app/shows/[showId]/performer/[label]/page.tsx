import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { Preloaded } from "@/components/Preloaded";
import { preloadShowPage } from "../../preload";
import { showKeys } from "@/components/api-keys";
import { requireSignedIn } from "@/lib/auth/page-session";
import { PerformerDots } from "./PerformerDots";

export const metadata: Metadata = { title: "My dots" };

export default async function PerformerPage({ params }: PageProps<"/shows/[showId]/performer/[label]">) {
  const { showId, label } = await params;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}/performer/${encodeURIComponent(label)}`);
  const performer = decodeURIComponent(label);
  const answers = await preloadShowPage(showId, () => [showKeys.performerSheet(showId, performer)]);
  return (
    <PageShell userName={user.name}>
      <Preloaded answers={answers}>
        <PerformerDots showId={showId} label={performer} />
      </Preloaded>
    </PageShell>
  );
}
