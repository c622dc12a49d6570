import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { Preloaded } from "@/components/Preloaded";
import { preloadShowPage } from "../preload";
import { showKeys } from "@/components/api-keys";
import { requireSignedIn } from "@/lib/auth/page-session";
import { SheetsView } from "./SheetsView";
import "./print.css";

export const metadata: Metadata = { title: "Coordinate sheets" };

export default async function SheetsPage({ params, searchParams }: PageProps<"/shows/[showId]/sheets">) {
  const { showId } = await params;
  const { by } = await searchParams;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}/sheets`);
  const answers = await preloadShowPage(showId, () => [showKeys.sheets(showId)]);
  return (
    <PageShell userName={user.name}>
      <Preloaded answers={answers}>
        <SheetsView showId={showId} by={by === "sets" ? "sets" : "performers"} />
      </Preloaded>
    </PageShell>
  );
}
