import { asc, eq, sql } from "drizzle-orm";
import type { Member } from "@/lib/auth/can";
import { getDb } from "../client";
import { auditEvents, memberships, users, workshops } from "../schema";

/** Credentials for the sign-in check only; nothing here leaves the server. */
export function findCredentials(email: string) {
  return getDb()
    .select({ id: users.id, passwordHash: users.passwordHash, sessionVersion: users.sessionVersion })
    .from(users)
    .where(eq(users.email, email.toLowerCase()))
    .get();
}

export function emailTaken(email: string): boolean {
  return !!getDb().select({ id: users.id }).from(users).where(eq(users.email, email.toLowerCase())).get();
}

/** Sign-up: a workshop, its first user and the owner membership, all or nothing. */
export function createWorkshopWithOwner(input: { workshopName: string; name: string; email: string; passwordHash: string }) {
  return getDb().transaction((tx) => {
    const workshop = tx.insert(workshops).values({ name: input.workshopName }).returning({ id: workshops.id }).get();
    const user = tx
      .insert(users)
      .values({ email: input.email.toLowerCase(), name: input.name, passwordHash: input.passwordHash })
      .returning({ id: users.id, sessionVersion: users.sessionVersion })
      .get();
    tx.insert(memberships).values({ workshopId: workshop.id, userId: user.id, role: "owner" }).run();
    tx.insert(auditEvents)
      .values({ workshopId: workshop.id, actorUserId: user.id, action: "workshop.created", detail: { name: input.workshopName } })
      .run();
    return { userId: user.id, sessionVersion: user.sessionVersion, workshopId: workshop.id };
  });
}

/** The member for a user id, checking nothing else: the preferred workshop if they belong to it, else their first. */
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
