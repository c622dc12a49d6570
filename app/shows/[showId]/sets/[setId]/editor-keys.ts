// The field editor's SWR keys; a plain module, so the editor page can preload the same ones.
import { apiKeys, showKeys } from "@/components/api-keys";

const setPath = showKeys.set;

export const editorKeys = {
  show: apiKeys.show,
  sets: (showId: string) => `/api/shows/${encodeURIComponent(showId)}/sets`,
  performers: (showId: string) => `/api/shows/${encodeURIComponent(showId)}/performers`,
  set: setPath,
  positions: (showId: string, setId: string) => `${setPath(showId, setId)}/positions`,
  removeFromSet: (showId: string, setId: string) => `${setPath(showId, setId)}/positions/remove`,
  mixInput: (showId: string, setId: string) => `${setPath(showId, setId)}/mix-input`,
  /** The version is part of the key so a save fetches the new stored analysis. */
  analysis: (showId: string, setId: string, listeningPointId: string, version: number) =>
    `${setPath(showId, setId)}/analysis?listeningPointId=${encodeURIComponent(listeningPointId)}&v=${version}`,
};
