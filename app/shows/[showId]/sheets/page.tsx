import type { Metadata } from "next";
import { PageShell } from "@/components/PageShell";
import { Preloaded } from "@/components/Preloaded";
import { preloadShowPage } from "../preload";
import { showKeys } from "@/components/api-keys";
import { requireSignedIn } from "@/lib/auth/page-session";
import { FIRST_SHEETS } from "./sheet-batches";
import { SheetsView } from "./SheetsView";
import "./print.css";

export const metadata: Metadata = { title: "Coordinate sheets" };

export default async function SheetsPage({ params, searchParams }: PageProps<"/shows/[showId]/sheets">) {
  const { showId } = await params;
  const { by } = await searchParams;
  const user = await requireSignedIn(`/shows/${encodeURIComponent(showId)}/sheets`);
  const view = by === "sets" ? "sets" : "performers";
  // Only the first sheets arrive with the page: the whole show's are hundreds of kilobytes, and the view asks for them at once.
  const answers = await preloadShowPage(showId, () => [showKeys.sheets(showId, view, FIRST_SHEETS)]);
  return (
    <PageShell userName={user.name}>
      <Preloaded answers={answers}>
        <SheetsView showId={showId} by={view} />
      </Preloaded>
    </PageShell>
  );
}
