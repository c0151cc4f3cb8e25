import "server-only";
import { getIronSession, type SessionOptions } from "iron-session";
import { cookies } from "next/headers";
import { createSession, deleteSession } from "@/db/queries/sessions";
import { serverEnv } from "@/server/env";
import { sessionSecret } from "./session-secret";
import { secureCookies, sessionCookieName } from "./session-cookie";

export { secureCookies, sessionCookieName };

/**
 * What the sealed cookie holds: the session id (its row in `sessions` is what makes it live), who, which
 * session version, when it began, and the workshop it works in.
 */
export interface SessionData {
  sid?: string;
  uid?: number;
  ver?: number;
  iat?: number;
  /** The workshop this session works in, for people who belong to more than one. */
  wid?: number;
}

/** Absolute lifetime, enforced on the server whatever the cookie's own expiry says. */
export const SESSION_MAX_AGE_SECONDS = 60 * 60 * 24 * 14;

/** A session unused this long ends: GLOWBENCH_IDLE_TIMEOUT_MINUTES, 8 hours (a working day at the bench) by default. */
export function idleTimeoutMs(): number {
  // serverEnv() refuses a value that is not a number.
  const minutes = serverEnv().GLOWBENCH_IDLE_TIMEOUT_MINUTES ?? 480;
  const clamped = Math.min(Math.max(minutes, 1), SESSION_MAX_AGE_SECONDS / 60);
  return clamped * 60 * 1000;
}

function options(): SessionOptions {
  return {
    password: sessionSecret(),
    cookieName: sessionCookieName(),
    ttl: SESSION_MAX_AGE_SECONDS,
    cookieOptions: { httpOnly: true, sameSite: "lax", secure: secureCookies(), path: "/" },
  };
}

export async function getSession() {
  return getIronSession<SessionData>(await cookies(), options());
}

/** Starts a fresh session (a new id, so one from before sign-in is never carried over) and ends this browser's old one. */
export async function startSession(userId: number, sessionVersion: number, workshopId?: number): Promise<void> {
  const session = await getSession();
  if (session.sid) deleteSession(session.sid);
  session.sid = createSession(userId, { ttlMs: SESSION_MAX_AGE_SECONDS * 1000, idleMs: idleTimeoutMs() });
  session.uid = userId;
  session.ver = sessionVersion;
  session.iat = Date.now();
  session.wid = workshopId;
  await session.save();
}

/** Ends this browser's session on the server (its row goes) and clears the cookie. */
export async function endSession(): Promise<void> {
  const session = await getSession();
  if (session.sid) deleteSession(session.sid);
  session.destroy();
}
