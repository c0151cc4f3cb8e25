import { and, asc, count, eq } from "drizzle-orm";
import type { Role } from "@/lib/vocabulary";
import { assertCan, type Member } from "@/lib/auth/can";
import { ConflictError, notFound } from "@/lib/errors";
import { getDb, type DbOrTx, type Tx } from "../client";
import { memberships, users } from "../schema";
import { recordAudit } from "./audit";

/** Raised when a change would leave the workshop without an owner. */
export class LastOwnerError extends ConflictError {
  constructor(what: string) {
    super(`The workshop needs at least one owner; make someone else owner before you ${what}.`);
  }
}

/** Everyone in the member's workshop with their role; any role may read it. */
export function listMembers(member: Member) {
  return getDb()
    .select({ id: memberships.id, userId: users.id, name: users.name, email: users.email, role: memberships.role, joinedAt: memberships.createdAt })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.workshopId, member.workshopId))
    .orderBy(asc(memberships.createdAt), asc(memberships.id))
    .all();
}
export type MemberRow = ReturnType<typeof listMembers>[number];

function findMembership(tx: Tx, member: Member, membershipId: number) {
  const row = tx
    .select({ id: memberships.id, userId: memberships.userId, role: memberships.role, name: users.name, email: users.email })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.id, membershipId), eq(memberships.workshopId, member.workshopId)))
    .get();
  if (!row) throw notFound("That member");
  return row;
}

function ownerCount(tx: Tx, workshopId: number): number {
  return (
    tx
      .select({ n: count() })
      .from(memberships)
      .where(and(eq(memberships.workshopId, workshopId), eq(memberships.role, "owner")))
      .get()?.n ?? 0
  );
}

export function changeMemberRole(member: Member, membershipId: number, role: Role) {
  assertCan(member, "manageMembers", "change members' roles");
  // Immediate transaction: the owner count and the update see the same state even with two owners acting at once.
  return getDb().transaction(
    (tx) => {
      const target = findMembership(tx, member, membershipId);
      if (target.role === role) return { ...target, changed: false };
      if (target.role === "owner" && ownerCount(tx, member.workshopId) <= 1) throw new LastOwnerError("change this role");
      tx.update(memberships).set({ role }).where(eq(memberships.id, target.id)).run();
      recordAudit(tx, {
        workshopId: member.workshopId,
        actorUserId: member.userId,
        action: "member.role-changed",
        detail: { name: target.name, email: target.email, from: target.role, to: role },
      });
      return { ...target, role, changed: true };
    },
    { behavior: "immediate" },
  );
}

export function removeMember(member: Member, membershipId: number) {
  assertCan(member, "manageMembers", "remove members");
  return getDb().transaction(
    (tx) => {
      const target = findMembership(tx, member, membershipId);
      if (target.role === "owner" && ownerCount(tx, member.workshopId) <= 1) throw new LastOwnerError("leave");
      tx.delete(memberships).where(eq(memberships.id, target.id)).run();
      recordAudit(tx, {
        workshopId: member.workshopId,
        actorUserId: member.userId,
        action: "member.removed",
        detail: { name: target.name, email: target.email, role: target.role },
      });
      return target;
    },
    { behavior: "immediate" },
  );
}

export function isMemberOf(tx: DbOrTx, workshopId: number, userId: number): boolean {
  return !!tx
    .select({ id: memberships.id })
    .from(memberships)
    .where(and(eq(memberships.workshopId, workshopId), eq(memberships.userId, userId)))
    .get();
}
