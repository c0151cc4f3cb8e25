import { and, asc, eq, lt, ne, or, sql } from "drizzle-orm";
import { hashToken, newToken } from "@/lib/auth/tokens";
import { getDb, type DbOrTx } from "../client";
import { memberships, sessions, users } from "../schema";
import { recordAudit, type AuditAction } from "./audit";

/**
 * Server-side sessions: the cookie holds a random id, the table its SHA-256. These run before (or while)
 * a Member is known, so they take user ids; the session id is the credential.
 */

/** lastSeenAt is written at most this often, so reading a page is not a database write each time. */
export const TOUCH_EVERY_MS = 60 * 1000;

/** Opens a session; expired and idle rows of everyone are swept on the way (an indexless scan of a small table). */
export function createSession(userId: number, opts: { ttlMs: number; idleMs: number; now?: number }): string {
  const now = opts.now ?? Date.now();
  const { token, hash } = newToken();
  const db = getDb();
  db.transaction((tx) => {
    tx.delete(sessions)
      .where(or(lt(sessions.expiresAt, new Date(now)), lt(sessions.lastSeenAt, new Date(now - opts.idleMs))))
      .run();
    tx.insert(sessions)
      .values({ userId, tokenHash: hash, lastSeenAt: new Date(now), expiresAt: new Date(now + opts.ttlMs) })
      .run();
  });
  return token;
}

export type SessionCheck = "live" | "ended";

/**
 * Is this session still live for this user? Ends it (deletes the row) when it has expired or sat idle for
 * `idleMs`; otherwise notes that it was seen, at most once a minute.
 */
export function checkSession(token: string, userId: number, opts: { idleMs: number; now?: number }): SessionCheck {
  const now = opts.now ?? Date.now();
  const db = getDb();
  const row = db
    .select({ id: sessions.id, userId: sessions.userId, lastSeenAt: sessions.lastSeenAt, expiresAt: sessions.expiresAt })
    .from(sessions)
    .where(eq(sessions.tokenHash, hashToken(token)))
    .get();
  if (!row || row.userId !== userId) return "ended";
  if (row.expiresAt.getTime() <= now || now - row.lastSeenAt.getTime() > opts.idleMs) {
    db.delete(sessions).where(eq(sessions.id, row.id)).run();
    return "ended";
  }
  if (now - row.lastSeenAt.getTime() >= TOUCH_EVERY_MS)
    db.update(sessions)
      .set({ lastSeenAt: new Date(now) })
      .where(eq(sessions.id, row.id))
      .run();
  return "live";
}

export function deleteSession(token: string): void {
  getDb()
    .delete(sessions)
    .where(eq(sessions.tokenHash, hashToken(token)))
    .run();
}

/** Ends every session of a user, or every one but `keepToken`'s. */
export function deleteUserSessions(userId: number, keepToken?: string, tx: DbOrTx = getDb()): void {
  const mine = eq(sessions.userId, userId);
  tx.delete(sessions)
    .where(keepToken ? and(mine, ne(sessions.tokenHash, hashToken(keepToken))) : mine)
    .run();
}

/** Sign out everywhere: every session row goes and the session version moves on, in one transaction. */
export function endAllSessions(userId: number): void {
  getDb().transaction((tx) => {
    deleteUserSessions(userId, undefined, tx);
    tx.update(users)
      .set({ sessionVersion: sql`${users.sessionVersion} + 1` })
      .where(eq(users.id, userId))
      .run();
  });
}

/** Audit events about a person's own account go to each of their workshops, so every owner sees them. */
export function auditAccountEvent(userId: number, action: AuditAction, detail: Record<string, unknown> = {}, onlyWorkshopId?: number): void {
  const db = getDb();
  const user = db.select({ name: users.name, email: users.email }).from(users).where(eq(users.id, userId)).get();
  if (!user) return;
  const rows = db.select({ workshopId: memberships.workshopId }).from(memberships).where(eq(memberships.userId, userId)).orderBy(asc(memberships.id)).all();
  db.transaction((tx) => {
    for (const r of rows) {
      if (onlyWorkshopId !== undefined && r.workshopId !== onlyWorkshopId) continue;
      recordAudit(tx, { workshopId: r.workshopId, actorUserId: userId, action, detail: { name: user.name, email: user.email, ...detail } });
    }
  });
}

/** The account behind an address, for audit events about sign-in attempts; null for an unknown address. */
export function userIdForEmail(email: string): number | null {
  return getDb().select({ id: users.id }).from(users).where(eq(users.email, email.toLowerCase())).get()?.id ?? null;
}
