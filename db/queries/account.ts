import { asc, eq, sql } from "drizzle-orm";
import { getDb } from "../client";
import { memberships, users } from "../schema";
import { recordAudit } from "./audit";
import { deleteUserSessions } from "./sessions";

/**
 * A signed-in person's own account. The caller has checked the current password; this sets the new hash,
 * moves the session version on and ends every session, all in one transaction, and notes it in the audit
 * trail of each of their workshops. The route then opens a fresh session for the browser that asked.
 */
export function changePassword(userId: number, passwordHash: string): { sessionVersion: number } {
  return getDb().transaction(
    (tx) => {
      const user = tx
        .update(users)
        .set({ passwordHash, sessionVersion: sql`${users.sessionVersion} + 1` })
        .where(eq(users.id, userId))
        .returning({ name: users.name, email: users.email, sessionVersion: users.sessionVersion })
        .get();
      deleteUserSessions(userId, undefined, tx);
      const rows = tx.select({ workshopId: memberships.workshopId }).from(memberships).where(eq(memberships.userId, userId)).orderBy(asc(memberships.id)).all();
      for (const r of rows)
        recordAudit(tx, { workshopId: r.workshopId, actorUserId: userId, action: "password.changed", detail: { name: user.name, email: user.email } });
      return { sessionVersion: user.sessionVersion };
    },
    { behavior: "immediate" },
  );
}
