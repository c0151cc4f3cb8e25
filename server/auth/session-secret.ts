import "server-only";
import { randomBytes } from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import { databasePath } from "@/db/env";
import { realProduction, serverEnv } from "@/server/env";

/**
 * The session-sealing secret. Production requires SESSION_SECRET (32+ characters); development,
 * tests and the demo (GLOWBENCH_DEMO=1) generate one once into data/ so a single command starts the app.
 */
let cached: string | undefined;

export function sessionSecret(): string {
  if (cached) return cached;
  // serverEnv() refuses a SESSION_SECRET shorter than 32 characters.
  const fromEnv = serverEnv().SESSION_SECRET;
  if (fromEnv) return (cached = fromEnv);
  if (realProduction()) {
    throw new Error("SESSION_SECRET is required in production (32+ random characters). See README.md.");
  }
  const file = path.join(path.dirname(databasePath()), "session-secret");
  try {
    cached = fs.readFileSync(file, "utf8").trim();
    if (cached.length >= 32) return cached;
  } catch {
    // not there yet: create it below
  }
  fs.mkdirSync(path.dirname(file), { recursive: true });
  cached = randomBytes(32).toString("base64url");
  fs.writeFileSync(file, cached, { mode: 0o600 });
  return cached;
}
