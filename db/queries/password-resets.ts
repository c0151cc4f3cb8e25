import { and, asc, eq, gt, isNull, sql } from "drizzle-orm";
import { hashToken, newToken } from "@/lib/auth/tokens";
import { GoneError, NotFoundError } from "@/lib/errors";
import { getDb, type Tx } from "../client";
import { memberships, passwordResets, users } from "../schema";
import { recordAudit, type AuditAction } from "./audit";
import { deleteUserSessions } from "./sessions";

/**
 * Password reset by e-mail. These run before anyone is signed in, so they take an address or a
 * token rather than a Member; the token (only its hash is stored) is the credential.
 */

/** An hour: time to find the e-mail, short enough that a forgotten one in an inbox is harmless. */
export const RESET_TTL_MS = 60 * 60 * 1000;

function auditEveryWorkshop(tx: Tx, userId: number, action: AuditAction, detail: Record<string, unknown>) {
  const rows = tx.select({ workshopId: memberships.workshopId }).from(memberships).where(eq(memberships.userId, userId)).orderBy(asc(memberships.id)).all();
  for (const r of rows) recordAudit(tx, { workshopId: r.workshopId, actorUserId: userId, action, detail });
  return rows[0]?.workshopId;
}

/** A fresh link for a known address (earlier unused links stop working); null for an unknown one. */
export function createPasswordReset(email: string) {
  return getDb().transaction((tx) => {
    const user = tx.select({ id: users.id, name: users.name, email: users.email }).from(users).where(eq(users.email, email)).get();
    if (!user) return null;
    const { token, hash } = newToken();
    const now = new Date();
    tx.update(passwordResets)
      .set({ usedAt: now })
      .where(and(eq(passwordResets.userId, user.id), isNull(passwordResets.usedAt)))
      .run();
    tx.insert(passwordResets)
      .values({ userId: user.id, tokenHash: hash, expiresAt: new Date(now.getTime() + RESET_TTL_MS) })
      .run();
    const workshopId = auditEveryWorkshop(tx, user.id, "password.reset-requested", { name: user.name, email: user.email });
    return { token, name: user.name, email: user.email, workshopId };
  });
}

export const RESET_GONE = "This reset link has expired or was already used. Ask for a new one.";

export function findPasswordReset(token: string): "valid" | "gone" | "unknown" {
  const row = getDb()
    .select({ usedAt: passwordResets.usedAt, expiresAt: passwordResets.expiresAt })
    .from(passwordResets)
    .where(eq(passwordResets.tokenHash, hashToken(token)))
    .get();
  if (!row) return "unknown";
  return row.usedAt || row.expiresAt.getTime() <= Date.now() ? "gone" : "valid";
}

/** Sets the new password, uses up the link and ends every session of the user, in one transaction. */
export function completePasswordReset(token: string, passwordHash: string) {
  return getDb().transaction(
    (tx) => {
      const row = tx
        .select({ id: passwordResets.id, userId: passwordResets.userId })
        .from(passwordResets)
        .where(eq(passwordResets.tokenHash, hashToken(token)))
        .get();
      if (!row) throw new NotFoundError("That reset link is not valid. Check you opened the whole link from the e-mail.");
      const now = new Date();
      const used = tx
        .update(passwordResets)
        .set({ usedAt: now })
        .where(and(eq(passwordResets.id, row.id), isNull(passwordResets.usedAt), gt(passwordResets.expiresAt, now)))
        .run();
      if (used.changes !== 1) throw new GoneError(RESET_GONE);
      // Bumping the session version ends every session of this user, everywhere (server/auth/member.ts compares it).
      const user = tx
        .update(users)
        .set({ passwordHash, sessionVersion: sql`${users.sessionVersion} + 1` })
        .where(eq(users.id, row.userId))
        .returning({ id: users.id, name: users.name, email: users.email })
        .get();
      deleteUserSessions(user.id, undefined, tx);
      auditEveryWorkshop(tx, user.id, "password.reset", { name: user.name, email: user.email });
      return { userId: user.id };
    },
    { behavior: "immediate" },
  );
}
