// Requests to the app from another loopback address (127.x.y.z), so a test is a client of its own as
// the server sees the connection; and accounts made straight in the database, so a test needs no sign-up.
import { randomBytes, randomUUID } from "node:crypto";
import http from "node:http";
import type postgres from "postgres";
import { hashPassword } from "@/lib/auth/password";
import { APP_URL } from "./api";

/** A random loopback address other than 127.0.0.1 (Linux routes all of 127/8 to the loopback interface). */
export function loopbackAddress(): string {
  const [a, b, c] = randomBytes(3);
  return `127.${a}.${b}.${Math.max(2, c!)}`;
}

export interface LoopbackAnswer {
  status: number;
  headers: http.IncomingHttpHeaders;
  body: any;
  /** name=value of each cookie the answer set */
  cookies: string[];
}

export interface LoopbackRequest {
  body?: unknown;
  headers?: Record<string, string>;
  /** the app's URL (APP_URL unless given) */
  base?: string;
  /** called once the whole request is written to the connection */
  onSent?: () => void;
}

/** One request from `localAddress`, on a connection of its own. */
export function requestFrom(localAddress: string, method: string, path: string, { body, headers = {}, base = APP_URL, onSent }: LoopbackRequest = {}): Promise<LoopbackAnswer> {
  const url = new URL(path, base);
  const payload = body === undefined ? undefined : JSON.stringify(body);
  return new Promise((resolve, reject) => {
    const req = http.request(
      {
        host: url.hostname,
        port: url.port,
        path: url.pathname + url.search,
        method,
        localAddress,
        agent: false,
        headers: { ...(payload ? { "content-type": "application/json" } : {}), ...headers },
      },
      (res) => {
        let text = "";
        res.setEncoding("utf8");
        res.on("data", (d: string) => (text += d));
        res.on("end", () => {
          let parsed: any = text;
          try {
            parsed = text ? JSON.parse(text) : null;
          } catch {}
          const cookies = (res.headers["set-cookie"] ?? []).map((c) => c.split(";")[0]!);
          resolve({ status: res.statusCode ?? 0, headers: res.headers, body: parsed, cookies });
        });
      },
    );
    req.on("error", reject);
    req.end(payload, onSent);
  });
}

/** A user with `password`, inserted directly (no sign-up, no program). */
export async function insertUser(sql: postgres.Sql, email: string, password: string): Promise<void> {
  await sql`insert into users (id, email, name, password_hash) values (${randomUUID()}, ${email}, ${"Limit Test"}, ${await hashPassword(password)})`;
}
