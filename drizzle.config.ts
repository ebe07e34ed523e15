import { defineConfig } from "drizzle-kit";

// Migrations are generated from db/schema and committed in drizzle/. They are applied by
// scripts/migrate.ts at start-up and in tests; DATABASE_URL is only needed for
// `drizzle-kit studio`/`push`, which we do not use.
export default defineConfig({
  dialect: "postgresql",
  schema: "./db/schema/index.ts",
  out: "./drizzle",
  dbCredentials: { url: process.env.DATABASE_URL ?? "postgres://ionleaf@127.0.0.1:54329/ionleaf" },
  strict: true,
});
