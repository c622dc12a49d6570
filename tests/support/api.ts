// An HTTP client for the running app (scripts/test.sh exports APP_URL), carrying its own session cookie.
export const APP_URL = process.env.APP_URL ?? "http://127.0.0.1:3000";
export const DEMO_PASSWORD = process.env.DEMO_PASSWORD ?? "farfield-demo";

export const DEMO = {
  director: "director@harbor-ridge.example",
  designer: "designer@harbor-ridge.example",
  staff: "staff@harbor-ridge.example",
  otherDirector: "director@westbrook.example",
} as const;

export interface ApiAnswer<T = any> {
  status: number;
  body: T;
  headers: Headers;
}

export class Client {
  /** The session cookie (name=value). */
  cookie: string | null = null;
  /** The device cookie a sign-in sets (lib/auth/known-device.ts), sent back like a browser would. */
  device: string | null = null;

  constructor(readonly base: string = APP_URL) {}

  async call<T = any>(method: string, path: string, body?: unknown, init: { headers?: Record<string, string>; raw?: string } = {}): Promise<ApiAnswer<T>> {
    const headers: Record<string, string> = { ...(init.headers ?? {}) };
    const cookies = [this.cookie, this.device].filter(Boolean);
    if (cookies.length) headers.cookie = cookies.join("; ");
    let payload: string | undefined = init.raw;
    if (body !== undefined) {
      payload = JSON.stringify(body);
      headers["content-type"] = "application/json";
    }
    const res = await fetch(this.base + path, { method, headers, body: payload, redirect: "manual" });
    for (const setCookie of res.headers.getSetCookie()) {
      const pair = setCookie.split(";")[0]!;
      const value = pair.endsWith("=") ? null : pair;
      if (pair.startsWith("farfield_device=")) this.device = value;
      else this.cookie = value;
    }
    const text = await res.text();
    let parsed: any = text;
    try {
      parsed = text ? JSON.parse(text) : null;
    } catch {}
    return { status: res.status, body: parsed as T, headers: res.headers };
  }

  get<T = any>(path: string) {
    return this.call<T>("GET", path);
  }
  post<T = any>(path: string, body?: unknown) {
    return this.call<T>("POST", path, body);
  }
  put<T = any>(path: string, body?: unknown) {
    return this.call<T>("PUT", path, body);
  }
}

export async function signedIn(email: string, password = DEMO_PASSWORD, base = APP_URL): Promise<Client> {
  const c = new Client(base);
  const res = await c.post("/api/auth/sign-in", { email, password });
  if (res.status !== 200) throw new Error(`sign-in as ${email} answered ${res.status}: ${JSON.stringify(res.body)}`);
  return c;
}

/** Ids of the demo: the Harbor Ridge program, its show, its sets and listening points, and the second program. */
export async function demoIds() {
  const director = await signedIn(DEMO.director);
  const me = await director.get("/api/me");
  const program = me.body.memberships.find((m: any) => m.programName.startsWith("Harbor Ridge"));
  const shows = await director.get(`/api/programs/${program.programId}/shows`);
  const showId = shows.body.shows[0].id as string;
  const show = await director.get(`/api/shows/${showId}`);
  const other = await signedIn(DEMO.otherDirector);
  const otherMe = await other.get("/api/me");
  const otherProgramId = otherMe.body.memberships[0].programId as string;
  const otherShows = await other.get(`/api/programs/${otherProgramId}/shows`);
  return {
    programId: program.programId as string,
    showId,
    show: show.body,
    setIds: show.body.sets.map((s: any) => s.id as string),
    pressBoxId: show.body.listeningPoints.find((l: any) => l.name === "Press box")?.id ?? show.body.listeningPoints[0].id,
    otherProgramId,
    otherShowId: otherShows.body.shows[0]?.id as string,
    director,
    other,
  };
}

/** A unique e-mail for accounts a test creates. */
export function uniqueEmail(tag: string) {
  return `${tag}-${Date.now()}-${Math.random().toString(36).slice(2, 8)}@test.example`;
}
