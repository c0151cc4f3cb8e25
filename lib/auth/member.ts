import { asc, eq, sql } from "drizzle-orm";
import { cache } from "react";
import { getDb } from "@/db/client";
import { memberships, users, workshops } from "@/db/schema";
import type { Member } from "./can";
import { notSignedIn } from "@/lib/errors";
import { SESSION_MAX_AGE_SECONDS, getSession } from "./session";

/** Load the member for a user id, checking nothing else: the preferred workshop if they belong to it, else their first. */
export function loadMember(userId: number, preferredWorkshopId?: number): (Member & { sessionVersion: number }) | null {
  const row = getDb()
    .select({
      userId: users.id,
      email: users.email,
      name: users.name,
      sessionVersion: users.sessionVersion,
      workshopId: memberships.workshopId,
      workshopName: workshops.name,
      role: memberships.role,
    })
    .from(users)
    .innerJoin(memberships, eq(memberships.userId, users.id))
    .innerJoin(workshops, eq(workshops.id, memberships.workshopId))
    .where(eq(users.id, userId))
    .orderBy(sql`case when ${memberships.workshopId} = ${preferredWorkshopId ?? 0} then 0 else 1 end`, asc(memberships.id))
    .limit(1)
    .get();
  return row ?? null;
}

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

// The role rules live in ./can; re-exported here for the pages that load the member and ask in one import.
export { can, type Member } from "./can";

export async function bumpSessionVersion(userId: number): Promise<void> {
  getDb()
    .update(users)
    .set({ sessionVersion: sql`${users.sessionVersion} + 1` })
    .where(eq(users.id, userId))
    .run();
}
