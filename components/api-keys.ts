// One SWR key per resource URL. A plain module, so server pages can name the keys they preload.
export const apiKeys = {
  me: "/api/me",
  program: (programId: string) => `/api/programs/${encodeURIComponent(programId)}`,
  programShows: (programId: string) => `/api/programs/${encodeURIComponent(programId)}/shows`,
  show: (showId: string) => `/api/shows/${encodeURIComponent(showId)}`,
};

const showPath = (showId: string) => `/api/shows/${encodeURIComponent(showId)}`;
const setPath = (showId: string, setId: string) => `${showPath(showId)}/sets/${encodeURIComponent(setId)}`;

/** What the show pages read; each view builds its key here, and its page preloads the same one. */
export const showKeys = {
  music: (showId: string) => `${showPath(showId)}/music`,
  score: (showId: string) => `${showPath(showId)}/score`,
  sheets: (showId: string, by: "performers" | "sets", first?: number) => `${showPath(showId)}/sheets?by=${by}${first ? `&first=${first}` : ""}`,
  performerSheet: (showId: string, label: string) => `${showPath(showId)}/sheets?by=performers&label=${encodeURIComponent(label)}`,
  imports: (showId: string) => `${showPath(showId)}/imports`,
  targets: (showId: string) => `${showPath(showId)}/targets`,
  rehearsalPlan: (showId: string) => `${showPath(showId)}/rehearsal-plan`,
  rehearsalPlans: (showId: string) => `${showPath(showId)}/rehearsal-plans`,
  keptPlan: (showId: string, planId: string) => `${showPath(showId)}/rehearsal-plans/${encodeURIComponent(planId)}`,
  timeline: (showId: string, listeningPointId: string) => `${showPath(showId)}/timeline?listeningPointId=${listeningPointId}`,
  compare: (showId: string, a: string, b: string, listeningPointId: string) => `${showPath(showId)}/compare?a=${a}&b=${b}&listeningPointId=${listeningPointId}`,
  set: setPath,
  hearing: (showId: string, setId: string, minutes: number) => `${setPath(showId, setId)}/hearing?minutes=${minutes}`,
};

/** How far the show's long work has got (GET …/work-progress). */
export const workProgressKey = (showId: string) => `${showPath(showId)}/work-progress`;
