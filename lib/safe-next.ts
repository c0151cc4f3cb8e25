/**
 * Where to go after signing in: only a path on our own origin. The address is resolved with the URL
 * parser exactly as a browser would ("/\\other.host", "/\t/other.host" and "//other.host" all resolve to
 * another host), and anything that leaves the origin falls back.
 */
const BASE = "http://glowbench.invalid";

export function safeNextPath(next: string | string[] | undefined | null, fallback = "/jobs"): string {
  if (typeof next !== "string" || !next.startsWith("/")) return fallback;
  let url: URL;
  try {
    url = new URL(next, BASE);
  } catch {
    return fallback;
  }
  if (url.origin !== BASE) return fallback;
  return `${url.pathname}${url.search}${url.hash}`;
}
