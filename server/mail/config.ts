import "server-only";
import path from "node:path";
import { databasePath } from "@/db/env";
import { realProduction, serverEnv, type EnvFor } from "@/server/env";

/**
 * Where mail goes. A real deployment sets SMTP_URL. Development, the demo (GLOWBENCH_DEMO=1) and the
 * tests keep mail on this machine: a local SMTP sink stores every message in a folder beside the
 * database (or GLOWBENCH_MAIL_DIR), and the owner reads it at /workshop/outbox.
 */

/** True unless this is a real production deployment: dev, demo, or an explicit local mail folder. */
export function localMailEnabled(env: EnvFor<"NODE_ENV" | "GLOWBENCH_DEMO" | "GLOWBENCH_MAIL_DIR"> = serverEnv()): boolean {
  return !realProduction(env) || !!env.GLOWBENCH_MAIL_DIR;
}

export function mailDir(): string {
  return path.resolve(/*turbopackIgnore: true*/ serverEnv().GLOWBENCH_MAIL_DIR ?? path.join(path.dirname(databasePath()), "mail"));
}

/** The sender shown on every message; an operator with a real relay sets MAIL_FROM. */
export function mailFrom(): string {
  return serverEnv().MAIL_FROM;
}

export { publicOrigin as appUrl } from "@/server/http/public-origin";
