import "server-only";
import { cache } from "react";
import { loadMember } from "@/db/queries/auth";
import type { Member } from "@/lib/auth/can";
import { notSignedIn } from "@/lib/errors";
import { SESSION_MAX_AGE_SECONDS, getSession } from "./session";

/** The current member, or null when signed out, expired or signed out everywhere. Cached per request. */
export const getMember = cache(async (): Promise<Member | null> => {
  const session = await getSession();
  if (!session.uid || !session.ver || !session.iat) return null;
  if (Date.now() - session.iat > SESSION_MAX_AGE_SECONDS * 1000) return null;
  const member = loadMember(session.uid, session.wid);
  if (!member || member.sessionVersion !== session.ver) return null;
  const { sessionVersion: _v, ...rest } = member;
  return rest;
});

export async function requireMember(): Promise<Member> {
  const member = await getMember();
  if (!member) throw notSignedIn();
  return member;
}
