// Lucia v3 over the Drizzle adapter: sessions are rows of `sessions`, with sliding expiry.
import { DrizzlePostgreSQLAdapter } from "@lucia-auth/adapter-drizzle";
import { Lucia, TimeSpan } from "lucia";
import { db } from "@/db/client";
import { sessions, users } from "@/db/schema";
import { cookieSecure } from "@/lib/env";

export const SESSION_COOKIE = "farfield_session";

export const lucia = new Lucia(new DrizzlePostgreSQLAdapter(db, sessions, users), {
  sessionExpiresIn: new TimeSpan(30, "d"),
  sessionCookie: {
    name: SESSION_COOKIE,
    expires: false,
    attributes: { secure: cookieSecure, sameSite: "lax" },
  },
  // Only these columns ever leave the server.
  getUserAttributes: (row) => ({ email: row.email, name: row.name }),
});

declare module "lucia" {
  interface Register {
    Lucia: typeof lucia;
    DatabaseUserAttributes: { email: string; name: string };
  }
}
