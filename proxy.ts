import { NextResponse, type NextRequest } from "next/server";
import { sessionCookieName } from "@/server/auth/session-cookie";
import { serverEnv } from "@/server/env";
import { addHsts } from "@/server/http/hsts";

/**
 * Runs before pages: sets a nonce-based Content-Security-Policy (as the Next.js CSP guide shows) and
 * sends signed-out visitors of member-only areas to sign-in. This is a convenience, never the
 * security check: every page, action and route handler checks the session and role itself.
 */

const MEMBER_AREAS = ["/jobs", "/workshop", "/invoices", "/account"];

export function proxy(request: NextRequest) {
  const { pathname, search } = request.nextUrl;
  if (MEMBER_AREAS.some((p) => pathname === p || pathname.startsWith(`${p}/`)) && !request.cookies.has(sessionCookieName())) {
    const url = request.nextUrl.clone();
    url.pathname = "/sign-in";
    url.search = `?next=${encodeURIComponent(pathname + search)}`;
    return addHsts(NextResponse.redirect(url), request.headers);
  }

  const nonce = Buffer.from(crypto.randomUUID()).toString("base64");
  const dev = serverEnv().NODE_ENV !== "production";
  const csp = [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${dev ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' blob: data:",
    "font-src 'self' data:",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");

  const requestHeaders = new Headers(request.headers);
  requestHeaders.set("x-nonce", nonce);
  requestHeaders.set("Content-Security-Policy", csp);
  const response = NextResponse.next({ request: { headers: requestHeaders } });
  response.headers.set("Content-Security-Policy", csp);
  return addHsts(response, request.headers);
}

// Prefetches too: a page a browser prefetched (Purpose: prefetch) is shown later as a navigation, and
// must carry its policy like any other. API routes set their own headers in the route wrapper.
export const config = {
  matcher: ["/((?!api|_next/static|_next/image|favicon.ico|fonts/).*)"],
};
