import { defineConfig } from "drizzle-kit";

export default defineConfig({
  dialect: "turso",
  schema: "./db/schema.ts",
  out: "./db/migrations",
  dbCredentials: {
    url: process.env.DATABASE_URL ?? "file:./data/leeway.db",
    authToken: process.env.DATABASE_AUTH_TOKEN,
  },
});
