// Every route handler of the app, found from the file tree, called as anonymous, as a member of another
// program and as each role. The table below is the role model of shared/PRODUCT.md per route; a route
// without an entry fails the test, so a new route cannot be forgotten.
import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { Client, DEMO, demoIds, signedIn } from "../support/api";

type Role = "director" | "designer" | "staff";
const ALL: Role[] = ["director", "designer", "staff"];
const EDITORS: Role[] = ["director", "designer"];
const DIRECTORS: Role[] = ["director"];

/**
 * roles: who may call it (others of the program get 403). "public": no session needed.
 * body: "json" routes are called by permitted roles with malformed JSON (a 400 proves the role passed and nothing
 * is written); "multipart" likewise with a broken upload; "none" write routes act without a body, so permitted
 * roles are not called here (their own tests cover success). scope: "program" routes answer 404 to outsiders.
 */
interface Rule {
  roles: Role[] | "public" | "signed-in";
  body?: "json" | "multipart" | "none";
}

const RULES: Record<string, Rule> = {
  "POST auth/sign-in": { roles: "public", body: "json" },
  "POST auth/sign-up": { roles: "public", body: "json" },
  "GET auth/sign-up/confirm": { roles: "public" },
  "POST auth/sign-up/confirm": { roles: "public", body: "json" },
  "POST auth/sign-out": { roles: "public", body: "none" },
  "POST auth/password-reset": { roles: "public", body: "json" },
  "GET auth/password-reset/confirm": { roles: "public" },
  "POST auth/password-reset/confirm": { roles: "public", body: "json" },
  "GET health": { roles: "public" },
  // Paths no route handles: a JSON 404 for everyone (tests/api/headers.test.ts).
  "GET [...path]": { roles: "public" },
  "POST [...path]": { roles: "public", body: "none" },
  "PUT [...path]": { roles: "public", body: "none" },
  "PATCH [...path]": { roles: "public", body: "none" },
  "DELETE [...path]": { roles: "public", body: "none" },
  "GET invitations/[token]": { roles: "public" },
  "POST invitations/[token]/accept": { roles: "public", body: "json" },
  "GET dev/mail": { roles: "signed-in" },
  "GET me": { roles: "signed-in" },

  "GET programs/[programId]": { roles: ALL },
  "GET programs/[programId]/shows": { roles: ALL },
  "POST programs/[programId]/shows": { roles: EDITORS, body: "json" },
  "POST programs/[programId]/shows/import": { roles: EDITORS, body: "multipart" },
  "POST programs/[programId]/shows/import/preview": { roles: EDITORS, body: "multipart" },
  "GET programs/[programId]/members": { roles: ALL },
  "PATCH programs/[programId]/members/[userId]": { roles: DIRECTORS, body: "json" },
  "DELETE programs/[programId]/members/[userId]": { roles: DIRECTORS, body: "none" },
  "GET programs/[programId]/invitations": { roles: DIRECTORS },
  "POST programs/[programId]/invitations": { roles: DIRECTORS, body: "json" },
  "DELETE programs/[programId]/invitations/[invitationId]": { roles: DIRECTORS, body: "none" },
  "POST programs/[programId]/invitations/[invitationId]/resend": { roles: DIRECTORS, body: "none" },
  "GET programs/[programId]/catalog": { roles: ALL },
  "GET programs/[programId]/catalog/fit": { roles: ALL },
  "POST programs/[programId]/catalog/adopt": { roles: DIRECTORS, body: "json" },
  "POST programs/[programId]/catalog/restore": { roles: DIRECTORS, body: "json" },
  "POST programs/[programId]/catalog/undo": { roles: DIRECTORS, body: "json" },

  "GET shows/[showId]": { roles: ALL },
  "PATCH shows/[showId]": { roles: EDITORS, body: "json" },
  "DELETE shows/[showId]": { roles: DIRECTORS, body: "json" },
  "POST shows/[showId]/duplicate": { roles: DIRECTORS, body: "json" },
  "POST shows/[showId]/archive": { roles: DIRECTORS, body: "json" },
  "POST shows/[showId]/restore": { roles: DIRECTORS, body: "none" },
  "POST shows/[showId]/listening-points": { roles: EDITORS, body: "json" },
  "PATCH shows/[showId]/listening-points/[listeningPointId]": { roles: EDITORS, body: "json" },
  "DELETE shows/[showId]/listening-points/[listeningPointId]": { roles: EDITORS, body: "none" },
  "GET shows/[showId]/export": { roles: ALL },
  "GET shows/[showId]/compare": { roles: ALL },
  "GET shows/[showId]/sweep": { roles: ALL },
  "GET shows/[showId]/timeline": { roles: ALL },
  "GET shows/[showId]/work-progress": { roles: ALL },
  "GET shows/[showId]/music": { roles: ALL },
  "PATCH shows/[showId]/music/assignments": { roles: EDITORS, body: "json" },
  "PUT shows/[showId]/music/overrides": { roles: EDITORS, body: "json" },
  "DELETE shows/[showId]/music/overrides": { roles: EDITORS, body: "json" },
  "POST shows/[showId]/music/phrases": { roles: EDITORS, body: "json" },
  "PATCH shows/[showId]/music/phrases/[phraseId]": { roles: EDITORS, body: "json" },
  "DELETE shows/[showId]/music/phrases/[phraseId]": { roles: EDITORS, body: "none" },
  "GET shows/[showId]/score": { roles: ALL },
  "POST shows/[showId]/score": { roles: EDITORS, body: "multipart" },
  "POST shows/[showId]/score/[uploadId]/preview": { roles: EDITORS, body: "json" },
  "POST shows/[showId]/score/[uploadId]/confirm": { roles: EDITORS, body: "json" },
  "GET shows/[showId]/score/notes": { roles: ALL },
  "GET shows/[showId]/phrases/[phraseId]/plan": { roles: ALL },
  "POST shows/[showId]/phrases/[phraseId]/plan": { roles: DIRECTORS, body: "json" },
  "DELETE shows/[showId]/phrases/[phraseId]/plan": { roles: DIRECTORS, body: "none" },
  "POST shows/[showId]/performers": { roles: EDITORS, body: "json" },
  "PATCH shows/[showId]/performers/[performerId]": { roles: EDITORS, body: "json" },
  "DELETE shows/[showId]/performers/[performerId]": { roles: EDITORS, body: "none" },
  "GET shows/[showId]/readings": { roles: ALL },
  "POST shows/[showId]/readings": { roles: ALL, body: "json" },
  "POST shows/[showId]/readings/upload": { roles: ALL, body: "multipart" },
  "DELETE shows/[showId]/readings/[readingId]": { roles: ALL, body: "none" },
  "GET shows/[showId]/imports": { roles: ALL },
  "POST shows/[showId]/imports": { roles: EDITORS, body: "multipart" },
  "GET shows/[showId]/imports/[uploadId]": { roles: ALL },
  "GET shows/[showId]/imports/[uploadId]/file": { roles: ALL },
  "POST shows/[showId]/imports/[uploadId]/confirm": { roles: EDITORS, body: "none" },
  "GET shows/[showId]/targets": { roles: ALL },
  "PUT shows/[showId]/targets": { roles: DIRECTORS, body: "json" },
  "GET shows/[showId]/plan-limits": { roles: ALL },
  "PUT shows/[showId]/plan-limits": { roles: DIRECTORS, body: "json" },
  "GET shows/[showId]/rehearsal-plan": { roles: ALL },
  "POST shows/[showId]/rehearsal-plan": { roles: ALL, body: "json" },
  "POST shows/[showId]/rehearsal-plan/send": { roles: DIRECTORS, body: "json" },
  "GET shows/[showId]/rehearsal-plans": { roles: ALL },
  "POST shows/[showId]/rehearsal-plans": { roles: DIRECTORS, body: "json" },
  "GET shows/[showId]/rehearsal-plans/[planId]": { roles: ALL },
  // Staff mark items done during the rehearsal.
  "PUT shows/[showId]/rehearsal-plans/[planId]/items/[itemKey]": { roles: ALL, body: "json" },
  "GET shows/[showId]/sheets": { roles: ALL },
  "GET shows/[showId]/sheets/pdf": { roles: ALL },
  "GET shows/[showId]/sheets/roster.csv": { roles: ALL },
  "GET shows/[showId]/sheets/drill.csv": { roles: ALL },
  "POST shows/[showId]/sets": { roles: EDITORS, body: "json" },
  "GET shows/[showId]/sets/[setId]": { roles: ALL },
  "PATCH shows/[showId]/sets/[setId]": { roles: EDITORS, body: "json" },
  "DELETE shows/[showId]/sets/[setId]": { roles: EDITORS, body: "none" },
  "GET shows/[showId]/sets/[setId]/analysis": { roles: ALL },
  "GET shows/[showId]/sets/[setId]/mix-input": { roles: ALL },
  "GET shows/[showId]/sets/[setId]/listen": { roles: ALL },
  "GET shows/[showId]/sets/[setId]/hearing": { roles: ALL },
  "PUT shows/[showId]/sets/[setId]/positions": { roles: EDITORS, body: "json" },
  "POST shows/[showId]/sets/[setId]/positions/remove": { roles: EDITORS, body: "json" },
};

const API_DIR = path.resolve(__dirname, "../../app/api");
const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"] as const;

/** Every "METHOD path" exported by a route.ts under app/api. */
function routesInTree(): string[] {
  const found: string[] = [];
  const walk = (dir: string) => {
    for (const name of readdirSync(dir)) {
      const full = path.join(dir, name);
      if (statSync(full).isDirectory()) walk(full);
      else if (name === "route.ts") {
        const text = readFileSync(full, "utf8");
        const rel = path.relative(API_DIR, dir).split(path.sep).join("/");
        for (const m of METHODS) if (new RegExp(`export (const|async function) ${m}\\b`).test(text)) found.push(`${m} ${rel}`);
      }
    }
  };
  walk(API_DIR);
  return found.sort();
}

/** Files that declare server actions: the app has none; a new one must be added to this test. */
function serverActionFiles(): string[] {
  const out: string[] = [];
  const walk = (dir: string) => {
    for (const name of readdirSync(dir)) {
      const full = path.join(dir, name);
      if (statSync(full).isDirectory()) walk(full);
      else if (/\.(ts|tsx)$/.test(name) && /^\s*["']use server["']/m.test(readFileSync(full, "utf8"))) out.push(full);
    }
  };
  walk(path.resolve(__dirname, "../../app"));
  return out;
}

let ids: Awaited<ReturnType<typeof demoIds>>;
const as = {} as Record<Role | "anonymous" | "outsider", Client>;
let params: Record<string, string>;
let query: Record<string, string>;
const RANDOM = "00000000-0000-4000-8000-00000000abcd";

beforeAll(async () => {
  ids = await demoIds();
  as.anonymous = new Client();
  as.director = ids.director;
  as.designer = await signedIn(DEMO.designer);
  as.staff = await signedIn(DEMO.staff);
  as.outsider = ids.other;
  const music = (await as.director.get(`/api/shows/${ids.showId}/music`)).body;
  const members = (await as.director.get(`/api/programs/${ids.programId}/members`)).body;
  const staffMember = (members.members ?? members).find((m: any) => m.role === "staff");
  params = {
    programId: ids.programId,
    showId: ids.showId,
    setId: ids.setIds[0]!,
    phraseId: music.phrases?.[0]?.id ?? RANDOM,
    userId: staffMember?.userId ?? RANDOM,
    invitationId: RANDOM,
    readingId: RANDOM,
    uploadId: RANDOM,
    token: "not-a-real-token",
  };
  query = { listeningPointId: ids.pressBoxId, a: ids.setIds[0]!, b: ids.setIds[1]!, from: ids.setIds[0]!, to: ids.setIds[1]! };
});

function urlOf(key: string): { method: string; url: string; resolved: boolean } {
  const [method, rel] = key.split(" ") as [string, string];
  let resolved = true;
  const filled = rel.replace(/\[(\w+)\]/g, (_, name: string) => {
    const value = params[name] ?? RANDOM;
    if (value === RANDOM || name === "token") resolved = false;
    return value;
  });
  const qs = new URLSearchParams(query).toString();
  return { method, url: `/api/${filled}?${qs}`, resolved };
}

async function call(who: Client, key: string, body: Rule["body"]) {
  const { method, url } = urlOf(key);
  if (method === "GET") return who.call("GET", url);
  if (body === "multipart") {
    return who.call(method, url, undefined, { headers: { "content-type": "multipart/form-data; boundary=x" }, raw: "--x\r\nbroken" });
  }
  return who.call(method, url, undefined, { headers: { "content-type": "application/json" }, raw: "{" });
}

describe("the route table", () => {
  it("names every route handler in app/api, and nothing that is not there", () => {
    const tree = routesInTree();
    expect(tree.filter((r) => !(r in RULES)), "routes without a rule").toEqual([]);
    expect(Object.keys(RULES).filter((r) => !tree.includes(r)), "rules without a route").toEqual([]);
  });

  it("has no server actions that it does not cover", () => {
    expect(serverActionFiles()).toEqual([]);
  });
});

describe("every route", () => {
  const keys = Object.keys(RULES);

  it("answers 401 JSON to anonymous callers unless it is public", async () => {
    for (const key of keys) {
      const rule = RULES[key]!;
      if (rule.roles === "public") continue;
      const res = await call(as.anonymous, key, rule.body);
      expect(res.status, key).toBe(401);
      expect(typeof res.body?.error, key).toBe("string");
    }
  });

  it("answers 404 to a member of another program, with no data", async () => {
    for (const key of keys) {
      const rule = RULES[key]!;
      if (!Array.isArray(rule.roles)) continue;
      const res = await call(as.outsider, key, rule.body);
      expect(res.status, key).toBe(404);
      expect(Object.keys(res.body ?? {}), key).toEqual(["error"]);
    }
  });

  for (const role of ALL) {
    it(`answers 403 to a ${role} where the role may not act, and lets it through where it may`, async () => {
      for (const key of keys) {
        const rule = RULES[key]!;
        if (!Array.isArray(rule.roles)) continue;
        const allowed = rule.roles.includes(role);
        const { method, resolved } = urlOf(key);
        if (allowed && method !== "GET" && rule.body === "none") continue; // acts without a body: covered by its own tests
        const res = await call(as[role], key, rule.body);
        if (!allowed) {
          expect(res.status, `${role} ${key}`).toBe(403);
          continue;
        }
        expect([401, 403], `${role} ${key}`).not.toContain(res.status);
        if (resolved) expect(res.status, `${role} ${key}`).not.toBe(404);
        if (method !== "GET") expect([400, 413], `${role} ${key} with a malformed body`).toContain(res.status);
      }
    });
  }
});
