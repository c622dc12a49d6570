import { NextResponse } from "next/server";
import { sql } from "@/db/client";
import { route } from "@/lib/http/handler";

export const dynamic = "force-dynamic";

/** Liveness and database reachability, for scripts and load balancers. */
export const GET = route(async () => {
  await sql`select 1`;
  return NextResponse.json({ ok: true });
});
