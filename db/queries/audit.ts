import { desc, eq } from "drizzle-orm";
import { assertCan, type Member } from "@/lib/auth/can";
import { getDb, type DbOrTx } from "../client";
import { auditEvents, users } from "../schema";

/** Who did what to the workshop's membership and accounts. Written inside the change's own transaction. */

export type AuditAction =
  | "workshop.updated"
  | "workshop.charges-updated"
  | "invitation.created"
  | "invitation.revoked"
  | "member.joined"
  | "member.role-changed"
  | "member.removed"
  | "password.reset-requested"
  | "password.reset"
  | "password.changed"
  | "session.signed-in"
  | "session.signed-out"
  | "session.signed-out-everywhere"
  | "sign-in.delayed";

export function recordAudit(
  tx: DbOrTx,
  event: { workshopId: number; actorUserId: number | null; action: AuditAction; detail?: Record<string, unknown> },
): void {
  tx.insert(auditEvents).values(event).run();
}

/** The owner's view of the workshop's recent audit trail, newest first. */
export function listAuditEvents(member: Member, limit = 50) {
  assertCan(member, "manageWorkshop", "see the workshop's audit trail");
  return getDb()
    .select({
      id: auditEvents.id,
      action: auditEvents.action,
      detail: auditEvents.detail,
      createdAt: auditEvents.createdAt,
      actorName: users.name,
    })
    .from(auditEvents)
    .leftJoin(users, eq(users.id, auditEvents.actorUserId))
    .where(eq(auditEvents.workshopId, member.workshopId))
    .orderBy(desc(auditEvents.createdAt), desc(auditEvents.id))
    .limit(limit)
    .all();
}
export type AuditEventRow = ReturnType<typeof listAuditEvents>[number];
