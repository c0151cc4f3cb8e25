import "server-only";
import { NotConfiguredError } from "@/lib/errors";
import { realProduction, serverEnv, type EnvFor } from "@/server/env";
import { requestOrigin } from "./body";

export { realProduction };

export const PUBLIC_URL_MISSING =
  "GLOWBENCH_PUBLIC_URL is not set: a production server needs it (e.g. https://bench.example) to put links in e-mails and payment pages. See README.md.";

/**
 * The address links that leave the app (e-mails, payment return pages) point at. GLOWBENCH_PUBLIC_URL
 * when set. Otherwise, in development and the demo, the origin the browser used (Host or X-Forwarded-Host,
 * X-Forwarded-Proto) — not `request.url`, which Next builds from the address the server listens on
 * (http://localhost:3000 behind any proxy). A real production server without GLOWBENCH_PUBLIC_URL refuses
 * (503) instead: Host is the client's to write, and a reset link built from it would carry someone's
 * token to a site of the sender's choosing.
 */
export function publicOrigin(request: Request, env: EnvFor<"NODE_ENV" | "GLOWBENCH_DEMO" | "GLOWBENCH_PUBLIC_URL"> = serverEnv()): string {
  const configured = env.GLOWBENCH_PUBLIC_URL;
  if (configured) {
    if (!URL.canParse(configured)) throw new NotConfiguredError(`GLOWBENCH_PUBLIC_URL is not a URL: ${configured}`);
    return new URL(configured).origin;
  }
  if (realProduction(env)) {
    console.error(PUBLIC_URL_MISSING);
    throw new NotConfiguredError(PUBLIC_URL_MISSING);
  }
  return requestOrigin(request) ?? new URL(request.url).origin;
}

/** The same, named for what the mail code asks. */
export const emailLinkOrigin = publicOrigin;
