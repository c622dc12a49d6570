// The GET route handlers a page may ask in process before it renders (components/Preloaded.tsx), by
// the same URL its client-side SWR key names. Only reads belong here.
import "server-only";
import { GET as me } from "@/app/api/me/route";
import { GET as catalog } from "@/app/api/programs/[programId]/catalog/route";
import { GET as catalogFit } from "@/app/api/programs/[programId]/catalog/fit/route";
import { GET as program } from "@/app/api/programs/[programId]/route";
import { GET as programShows } from "@/app/api/programs/[programId]/shows/route";
import { GET as compare } from "@/app/api/shows/[showId]/compare/route";
import { GET as imports } from "@/app/api/shows/[showId]/imports/route";
import { GET as music } from "@/app/api/shows/[showId]/music/route";
import { GET as score } from "@/app/api/shows/[showId]/score/route";
import { GET as readings } from "@/app/api/shows/[showId]/readings/route";
import { GET as rehearsalPlan } from "@/app/api/shows/[showId]/rehearsal-plan/route";
import { GET as keptPlan } from "@/app/api/shows/[showId]/rehearsal-plans/[planId]/route";
import { GET as rehearsalPlans } from "@/app/api/shows/[showId]/rehearsal-plans/route";
import { GET as show } from "@/app/api/shows/[showId]/route";
import { GET as analysis } from "@/app/api/shows/[showId]/sets/[setId]/analysis/route";
import { GET as hearing } from "@/app/api/shows/[showId]/sets/[setId]/hearing/route";
import { GET as mixInput } from "@/app/api/shows/[showId]/sets/[setId]/mix-input/route";
import { GET as set } from "@/app/api/shows/[showId]/sets/[setId]/route";
import { GET as sheets } from "@/app/api/shows/[showId]/sheets/route";
import { GET as targets } from "@/app/api/shows/[showId]/targets/route";
import { GET as timeline } from "@/app/api/shows/[showId]/timeline/route";

// The params are matched from the path by name, so each handler gets the ones it declares.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
type GetHandler = (req: Request, ctx: { params: Promise<any> }) => Promise<Response>;

const ID = "([^/?]+)";
const ROUTES: { path: RegExp; params: string[]; get: GetHandler }[] = [
  { path: /^\/api\/me$/, params: [], get: me },
  { path: new RegExp(`^/api/programs/${ID}$`), params: ["programId"], get: program },
  { path: new RegExp(`^/api/programs/${ID}/shows$`), params: ["programId"], get: programShows },
  { path: new RegExp(`^/api/programs/${ID}/catalog$`), params: ["programId"], get: catalog },
  { path: new RegExp(`^/api/programs/${ID}/catalog/fit$`), params: ["programId"], get: catalogFit },
  { path: new RegExp(`^/api/shows/${ID}$`), params: ["showId"], get: show },
  { path: new RegExp(`^/api/shows/${ID}/compare$`), params: ["showId"], get: compare },
  { path: new RegExp(`^/api/shows/${ID}/imports$`), params: ["showId"], get: imports },
  { path: new RegExp(`^/api/shows/${ID}/music$`), params: ["showId"], get: music },
  { path: new RegExp(`^/api/shows/${ID}/score$`), params: ["showId"], get: score },
  { path: new RegExp(`^/api/shows/${ID}/readings$`), params: ["showId"], get: readings },
  { path: new RegExp(`^/api/shows/${ID}/rehearsal-plan$`), params: ["showId"], get: rehearsalPlan },
  { path: new RegExp(`^/api/shows/${ID}/rehearsal-plans$`), params: ["showId"], get: rehearsalPlans },
  { path: new RegExp(`^/api/shows/${ID}/rehearsal-plans/${ID}$`), params: ["showId", "planId"], get: keptPlan },
  { path: new RegExp(`^/api/shows/${ID}/sheets$`), params: ["showId"], get: sheets },
  { path: new RegExp(`^/api/shows/${ID}/targets$`), params: ["showId"], get: targets },
  { path: new RegExp(`^/api/shows/${ID}/timeline$`), params: ["showId"], get: timeline },
  { path: new RegExp(`^/api/shows/${ID}/sets/${ID}$`), params: ["showId", "setId"], get: set },
  { path: new RegExp(`^/api/shows/${ID}/sets/${ID}/analysis$`), params: ["showId", "setId"], get: analysis },
  { path: new RegExp(`^/api/shows/${ID}/sets/${ID}/hearing$`), params: ["showId", "setId"], get: hearing },
  { path: new RegExp(`^/api/shows/${ID}/sets/${ID}/mix-input$`), params: ["showId", "setId"], get: mixInput },
];

/** One key's answer as the API gives it, or undefined when it refuses or fails (the page then asks again and shows why). */
async function answerOf(key: string): Promise<unknown> {
  const url = new URL(key, "http://in-process.invalid");
  const route = ROUTES.find((r) => r.path.test(url.pathname));
  if (!route) throw new Error(`No GET route to preload for ${key}.`);
  const match = route.path.exec(url.pathname)!;
  const params = Object.fromEntries(route.params.map((name, i) => [name, decodeURIComponent(match[i + 1]!)]));
  const res = await route.get(new Request(url), { params: Promise.resolve(params) });
  return res.ok ? res.json() : undefined;
}

/**
 * The answers of the given keys (nulls skipped), asked at once, for Preloaded. With `waitMs`, an
 * answer not ready by then is left out: the page shows its placeholder (and progress) at once, and
 * its own request joins the work still running.
 */
export async function preloadAnswers(keys: (string | null)[], waitMs?: number): Promise<Record<string, unknown>> {
  const wanted = keys.filter((k): k is string => k !== null);
  const answers = await Promise.all(
    wanted.map((k) => {
      const answer = answerOf(k);
      if (waitMs === undefined) return answer;
      const late = new Promise<undefined>((resolve) => setTimeout(resolve, waitMs, undefined));
      return Promise.race([answer.catch(() => undefined), late]);
    }),
  );
  return Object.fromEntries(wanted.flatMap((k, i) => (answers[i] === undefined ? [] : [[k, answers[i]]])));
}
