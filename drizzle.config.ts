import { defineConfig } from "drizzle-kit";
import { databasePath } from "./db/env";

export default defineConfig({
  dialect: "sqlite",
  schema: "./db/schema/index.ts",
  out: "./db/migrations",
  dbCredentials: { url: databasePath() },
});
