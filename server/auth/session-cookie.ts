import "server-only";
import { serverEnv } from "@/server/env";

/**
 * The cookie's name and security flags alone, importable by proxy.ts without pulling in iron-session or
 * the secret. Wherever cookies are Secure (production) the name carries the `__Host-` prefix: browsers
 * then keep it only if it is Secure, set by this exact host for path `/`, so neither a sibling subdomain
 * nor a plain-HTTP page can plant or shadow a session cookie.
 */
export const SESSION_COOKIE_PLAIN = "glowbench_session";
export const SESSION_COOKIE_HOST = "__Host-glowbench_session";

export function secureCookies(): boolean {
  const env = serverEnv();
  if (env.GLOWBENCH_INSECURE_COOKIES === "1") return false;
  return env.NODE_ENV === "production";
}

export function sessionCookieName(): string {
  return secureCookies() ? SESSION_COOKIE_HOST : SESSION_COOKIE_PLAIN;
}
