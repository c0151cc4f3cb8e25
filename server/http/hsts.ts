import "server-only";
import { serverEnv, type EnvFor } from "@/server/env";

/** A year, subdomains included (RFC 6797); sent only where the browser really came over HTTPS. */
export const HSTS_VALUE = "max-age=31536000; includeSubDomains";

/**
 * True when the browser reached us over HTTPS: GLOWBENCH_PUBLIC_URL is an https address, or our trusted
 * proxy (GLOWBENCH_TRUST_PROXY=1) says so in the last X-Forwarded-Proto it set. Browsers ignore HSTS
 * over plain HTTP anyway; keeping it to these cases means a closed LAN served over HTTP is never pinned.
 */
export function servedOverHttps(headers: Headers, env: EnvFor<"GLOWBENCH_PUBLIC_URL" | "GLOWBENCH_TRUST_PROXY"> = serverEnv()): boolean {
  if (env.GLOWBENCH_PUBLIC_URL?.startsWith("https://")) return true;
  if (env.GLOWBENCH_TRUST_PROXY !== "1") return false;
  const proto = (headers.get("x-forwarded-proto") ?? "")
    .split(",")
    .map((s) => s.trim().toLowerCase())
    .filter(Boolean)
    .at(-1);
  return proto === "https";
}

export function addHsts(response: Response, requestHeaders: Headers): Response {
  if (servedOverHttps(requestHeaders)) response.headers.set("Strict-Transport-Security", HSTS_VALUE);
  return response;
}
