// The one database client. Kept on globalThis so dev reloads do not open new pools.
import { drizzle } from "drizzle-orm/postgres-js";
import postgres from "postgres";
import { env } from "@/lib/env";
import * as schema from "./schema";

function connect() {
  const sql = postgres(env.DATABASE_URL, {
    max: env.DATABASE_POOL_SIZE,
    // Fail fast when the database is down: the API answers 503 instead of hanging.
    connect_timeout: 2,
    idle_timeout: 30,
    onnotice: () => {},
  });
  return { sql, db: drizzle(sql, { schema }) };
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
