// The one database client. Kept on globalThis so dev reloads do not open new pools.
import { drizzle } from "drizzle-orm/postgres-js";
import postgres from "postgres";
import { env } from "@/lib/env";
import * as schema from "./schema";

type Client = postgres.Sql;

/**
 * Drizzle asks postgres-js to prepare only the queries it is given a name for; every other query is
 * parsed and planned again on each call, which costs the hot reads (session, access, stored analysis)
 * about as much as the rest of the request. postgres-js keeps one prepared statement per query text and
 * connection, so preparing them all is safe; tagged-template queries are prepared already.
 */
function preparingEveryQuery(client: Client): Client {
  return new Proxy(client, {
    get(target, key, receiver) {
      if (key === "unsafe") {
        return (query: string, params?: postgres.ParameterOrJSON<never>[], options?: postgres.UnsafeQueryOptions) =>
          target.unsafe(query, params, { ...options, prepare: true });
      }
      if (key === "begin" || key === "savepoint") {
        return (...args: unknown[]) => {
          const work = args.pop() as (inner: Client) => unknown;
          const open = Reflect.get(target, key) as (...a: unknown[]) => unknown; // savepoint: inside a transaction
          return open(...args, (inner: Client) => work(preparingEveryQuery(inner)));
        };
      }
      return Reflect.get(target, key, receiver);
    },
  });
}

function connect() {
  const sql = postgres(env.DATABASE_URL, {
    max: env.DATABASE_POOL_SIZE,
    // Fail fast when the database is down: the API answers 503 instead of hanging.
    connect_timeout: 2,
    idle_timeout: 30,
    onnotice: () => {},
  });
  return { sql, db: drizzle(preparingEveryQuery(sql), { schema }) };
}

type Connection = ReturnType<typeof connect>;
const holder = globalThis as unknown as { farfieldDb?: Connection };
const connection = (holder.farfieldDb ??= connect());

export const db = connection.db;
export const sql = connection.sql;
export type Db = typeof db;
export type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];
/** A query runner: the client itself or a transaction. */
export type Runner = Db | Tx;
