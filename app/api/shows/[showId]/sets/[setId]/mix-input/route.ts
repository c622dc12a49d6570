import { NextResponse } from "next/server";
import { requireSet } from "@/lib/auth/access";
import { setAnalysisInput } from "@/lib/analysis/set-input";
import { MODEL_VERSION } from "@/lib/acoustics/version";
import { route } from "@/lib/http/handler";

/** The engine input of the set as stored, so the editor's live preview computes exactly what the server does. */
export const GET = route<{ showId: string; setId: string }>(async (_req, { showId, setId }) => {
  const { show, set } = await requireSet(showId, setId, "read");
  const { input, catalogVersion } = await setAnalysisInput(show, set);
  return NextResponse.json({ modelVersion: MODEL_VERSION, catalogVersion, input });
});
