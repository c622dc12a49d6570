// One wrapper for every route handler: typed params, errors as JSON with the codes of shared/API.md.
import { NextResponse } from "next/server";
import { z } from "zod";
import { fieldIssues, validationMessage } from "./body";
import { describeError, HttpError, isDatabaseDown } from "./errors";
import { API_CSP, setSecurityHeaders } from "./security-headers";

type Ctx<P> = { params: Promise<P> };

export function errorResponse(err: unknown): NextResponse {
  if (err instanceof HttpError) {
    return NextResponse.json({ error: err.message, ...err.extra }, { status: err.status, headers: err.headers });
  }
  if (err instanceof z.ZodError) {
    const issues = fieldIssues(err);
    return NextResponse.json({ error: validationMessage(issues), issues }, { status: 400 });
  }
  if (isDatabaseDown(err)) {
    return NextResponse.json({ error: "The database cannot be reached right now. Try again in a moment." }, { status: 503 });
  }
  console.error("[farfield] unexpected error:", describeError(err));
  return NextResponse.json({ error: "Something went wrong on our side." }, { status: 500 });
}

/** Wraps a handler: `handler` receives the request and the route params already awaited. */
export function route<P = Record<string, string>>(handler: (req: Request, params: P) => Promise<Response>) {
  return async (req: Request, ctx: Ctx<P>): Promise<Response> => {
    let res: Response;
    try {
      res = await handler(req, await ctx.params);
    } catch (err) {
      res = errorResponse(err);
    }
    // Here rather than in next.config.ts headers(), whose rules are matched against every request's path.
    setSecurityHeaders(res.headers, API_CSP);
    // Answers carry program data for one signed-in person: no browser or shared cache may keep them.
    if (!res.headers.has("cache-control")) res.headers.set("Cache-Control", "no-store");
    return res;
  };
}

/** Route ids are UUIDs; anything else is an unknown id (404), never a database error. */
export const idSchema = z.string().uuid();
