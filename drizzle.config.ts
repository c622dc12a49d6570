import { defineConfig } from "drizzle-kit";

// Only `generate` runs through drizzle-kit (no database needed); migrations are applied by db/migrate.ts.
export default defineConfig({
  dialect: "postgresql",
  // Each area keeps its tables in db/schema.ts or a db/schema-<area>.ts of its own.
  schema: "./db/schema*.ts",
  out: "./db/migrations",
  dbCredentials: { url: process.env.DATABASE_URL ?? "postgres://postgres@127.0.0.1:5544/farfield" },
});
