import "server-only";
import { cache } from "react";
import { loadMember } from "@/db/queries/auth";
import { checkSession } from "@/db/queries/sessions";
import type { Member } from "@/lib/auth/can";
import { notSignedIn } from "@/lib/errors";
import { SESSION_MAX_AGE_SECONDS, getSession, idleTimeoutMs } from "./session";

/**
 * The current member, or null when signed out, expired, idle too long, signed out elsewhere or the
 * password changed. A cookie is only as good as its row in `sessions`. Cached per request.
 */
export const getMember = cache(async (): Promise<Member | null> => {
  const session = await getSession();
  if (!session.sid || !session.uid || !session.ver || !session.iat) return null;
  if (Date.now() - session.iat > SESSION_MAX_AGE_SECONDS * 1000) return null;
  if (checkSession(session.sid, session.uid, { idleMs: idleTimeoutMs() }) !== "live") return null;
  const member = loadMember(session.uid, session.wid);
  if (!member || member.sessionVersion !== session.ver) return null;
  const { sessionVersion: _v, ...rest } = member;
  return rest;
});

/** The current session's id, for routes that end every other session. */
export async function currentSessionId(): Promise<string | undefined> {
  return (await getSession()).sid;
}

export async function requireMember(): Promise<Member> {
  const member = await getMember();
  if (!member) throw notSignedIn();
  return member;
}
