// The Listen control's API addresses.
import { showKeys } from "@/components/api-keys";

export const listenKeys = {
  /** The version is part of the key so a saved change fetches the new parts. */
  parts: (showId: string, setId: string, listeningPointId: string, version: number | null) =>
    `${showKeys.set(showId, setId)}/listen?listeningPointId=${encodeURIComponent(listeningPointId)}${version === null ? "" : `&v=${version}`}`,
  scoreNotes: (showId: string) => `/api/shows/${encodeURIComponent(showId)}/score/notes`,
};
