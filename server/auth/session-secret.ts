import "server-only";
import { randomBytes } from "node:crypto";
import fs from "node:fs";
import path from "node:path";

/**
 * The session-sealing secret. Production requires SESSION_SECRET (32+ characters); development,
 * tests and the demo (GLOWBENCH_DEMO=1) generate one once into data/ so a single command starts the app.
 */
let cached: string | undefined;

export function sessionSecret(): string {
  if (cached) return cached;
  const fromEnv = process.env.SESSION_SECRET;
  if (fromEnv) {
    if (fromEnv.length < 32) throw new Error("SESSION_SECRET must be at least 32 characters.");
    return (cached = fromEnv);
  }
  const mayGenerate = process.env.NODE_ENV !== "production" || process.env.GLOWBENCH_DEMO === "1";
  if (!mayGenerate) {
    throw new Error("SESSION_SECRET is required in production (32+ random characters). See README.md.");
  }
  const dbFile = process.env.GLOWBENCH_DB ?? path.join("data", "glowbench.db");
  const file = path.join(path.dirname(path.resolve(/*turbopackIgnore: true*/ dbFile)), "session-secret");
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
