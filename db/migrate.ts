// Applies the committed SQL migrations in db/migrations (npm start, npm test).
import path from "node:path";
import { drizzle } from "drizzle-orm/postgres-js";
import { migrate } from "drizzle-orm/postgres-js/migrator";
import postgres from "postgres";
import { env } from "@/lib/env";

export async function runMigrations(url: string) {
  const sql = postgres(url, { max: 1, onnotice: () => {} });
  try {
    await migrate(drizzle(sql), { migrationsFolder: path.join(__dirname, "migrations") });
  } finally {
    await sql.end();
  }
}

if (require.main === module) {
  runMigrations(env.DATABASE_URL).then(
    () => console.log("[farfield] migrations applied"),
    (err) => {
      console.error("[farfield] migration failed:", err.message);
      process.exit(1);
    },
  );
}
