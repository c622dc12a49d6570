// Throwaway databases on the test cluster, for tests that need an empty or private database.
import postgres from "postgres";

export const DATABASE_URL = process.env.DATABASE_URL ?? "postgres://postgres@127.0.0.1:5544/farfield_test";

function urlFor(name: string) {
  const u = new URL(DATABASE_URL);
  u.pathname = `/${name}`;
  return u.toString();
}

export async function createDatabase(tag: string): Promise<{ url: string; drop: () => Promise<void> }> {
  const name = `${tag}_${Date.now()}_${Math.floor(Math.random() * 1e6)}`.replace(/[^a-z0-9_]/g, "_");
  const admin = postgres(urlFor("postgres"), { max: 1, onnotice: () => {} });
  await admin.unsafe(`create database "${name}"`);
  await admin.end();
  return {
    url: urlFor(name),
    drop: async () => {
      const a = postgres(urlFor("postgres"), { max: 1, onnotice: () => {} });
      await a.unsafe(`drop database if exists "${name}" with (force)`);
      await a.end();
    },
  };
}

/** A client on the app's own test database, for reading what the app wrote. */
export function appDatabase() {
  return postgres(DATABASE_URL, { max: 2, onnotice: () => {} });
}
