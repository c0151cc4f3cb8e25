import "server-only";
import { getIronSession, type SessionOptions } from "iron-session";
import { cookies } from "next/headers";
import { sessionSecret } from "./session-secret";
import { SESSION_COOKIE } from "./session-cookie";

export { SESSION_COOKIE };

/** What the cookie holds: only who, which session version, and when the session began. */
export interface SessionData {
  uid?: number;
  ver?: number;
  iat?: number;
  /** The workshop this session works in, for people who belong to more than one. */
  wid?: number;
}

/** Absolute lifetime, enforced on the server whatever the cookie's own expiry says. */
export const SESSION_MAX_AGE_SECONDS = 60 * 60 * 24 * 14;

export function secureCookies(): boolean {
  if (process.env.GLOWBENCH_INSECURE_COOKIES === "1") return false;
  return process.env.NODE_ENV === "production";
}

function options(): SessionOptions {
  return {
    password: sessionSecret(),
    cookieName: SESSION_COOKIE,
    ttl: SESSION_MAX_AGE_SECONDS,
    cookieOptions: { httpOnly: true, sameSite: "lax", secure: secureCookies(), path: "/" },
  };
}

export async function getSession() {
  return getIronSession<SessionData>(await cookies(), options());
}

export async function startSession(userId: number, sessionVersion: number, workshopId?: number): Promise<void> {
  const session = await getSession();
  session.uid = userId;
  session.ver = sessionVersion;
  session.iat = Date.now();
  session.wid = workshopId;
  await session.save();
}

export async function endSession(): Promise<void> {
  const session = await getSession();
  session.destroy();
}
