import { and, desc, eq, gt, isNull } from "drizzle-orm";
import type { Role } from "@/lib/vocabulary";
import { assertCan, type Member } from "@/lib/auth/can";
import { hashToken, newToken } from "@/lib/auth/tokens";
import { ConflictError, ForbiddenError, GoneError, NotFoundError, notFound } from "@/lib/errors";
import { getDb } from "../client";
import { invitations, memberships, users, workshops } from "../schema";
import { recordAudit } from "./audit";
import { isMemberOf } from "./members";

/** A week: long enough to reach someone on holiday, short enough that an old e-mail is harmless. */
export const INVITATION_TTL_MS = 7 * 24 * 3_600_000;

export type InvitationState = "pending" | "expired" | "accepted" | "revoked";

function stateOf(row: { expiresAt: Date; acceptedAt: Date | null; revokedAt: Date | null }, now = Date.now()): InvitationState {
  if (row.acceptedAt) return "accepted";
  if (row.revokedAt) return "revoked";
  return row.expiresAt.getTime() <= now ? "expired" : "pending";
}

/** Invitations not yet accepted or revoked, newest first (expired ones too, so the owner can send again). */
export function listInvitations(member: Member) {
  assertCan(member, "manageMembers", "see invitations");
  return getDb()
    .select({
      id: invitations.id,
      email: invitations.email,
      role: invitations.role,
      expiresAt: invitations.expiresAt,
      createdAt: invitations.createdAt,
      acceptedAt: invitations.acceptedAt,
      revokedAt: invitations.revokedAt,
      invitedBy: users.name,
    })
    .from(invitations)
    .leftJoin(users, eq(users.id, invitations.invitedBy))
    .where(and(eq(invitations.workshopId, member.workshopId), isNull(invitations.acceptedAt), isNull(invitations.revokedAt)))
    .orderBy(desc(invitations.createdAt), desc(invitations.id))
    .limit(50)
    .all()
    .map(({ acceptedAt: _a, revokedAt: _r, ...row }) => ({ ...row, state: stateOf({ ...row, acceptedAt: null, revokedAt: null }) }));
}
export type InvitationRow = ReturnType<typeof listInvitations>[number];

/** A new invitation; an earlier pending one to the same address stops working, so only the newest link joins. */
export function createInvitation(member: Member, input: { email: string; role: Role }) {
  assertCan(member, "manageMembers", "invite members");
  const { token, hash } = newToken();
  const expiresAt = new Date(Date.now() + INVITATION_TTL_MS);
  return getDb().transaction(
    (tx) => {
      const existing = tx.select({ id: users.id }).from(users).where(eq(users.email, input.email)).get();
      if (existing && isMemberOf(tx, member.workshopId, existing.id)) {
        throw new ConflictError("That person is already a member.", { email: "Already a member of this workshop; change their role in the list instead." });
      }
      const now = new Date();
      tx.update(invitations)
        .set({ revokedAt: now })
        .where(
          and(eq(invitations.workshopId, member.workshopId), eq(invitations.email, input.email), isNull(invitations.acceptedAt), isNull(invitations.revokedAt)),
        )
        .run();
      const row = tx
        .insert(invitations)
        .values({ workshopId: member.workshopId, email: input.email, role: input.role, tokenHash: hash, invitedBy: member.userId, expiresAt })
        .returning({ id: invitations.id, email: invitations.email, role: invitations.role, expiresAt: invitations.expiresAt })
        .get();
      recordAudit(tx, {
        workshopId: member.workshopId,
        actorUserId: member.userId,
        action: "invitation.created",
        detail: { email: input.email, role: input.role },
      });
      return { ...row, token };
    },
    { behavior: "immediate" },
  );
}

export function revokeInvitation(member: Member, invitationId: number, reason: "revoked" | "undeliverable" = "revoked") {
  assertCan(member, "manageMembers", "revoke invitations");
  return getDb().transaction((tx) => {
    const row = tx
      .select({ id: invitations.id, email: invitations.email, role: invitations.role, acceptedAt: invitations.acceptedAt, revokedAt: invitations.revokedAt })
      .from(invitations)
      .where(and(eq(invitations.id, invitationId), eq(invitations.workshopId, member.workshopId)))
      .get();
    if (!row) throw notFound("That invitation");
    if (row.acceptedAt) throw new ConflictError("That invitation was already accepted; remove the member instead.");
    if (row.revokedAt) return { id: row.id, email: row.email };
    tx.update(invitations).set({ revokedAt: new Date() }).where(eq(invitations.id, row.id)).run();
    recordAudit(tx, {
      workshopId: member.workshopId,
      actorUserId: member.userId,
      action: "invitation.revoked",
      detail: { email: row.email, role: row.role, reason },
    });
    return { id: row.id, email: row.email };
  });
}

/** What the invite page shows. The token is the credential here: whoever holds the link may see it. */
export function findInvitation(token: string) {
  const row = getDb()
    .select({
      id: invitations.id,
      workshopId: invitations.workshopId,
      workshopName: workshops.name,
      email: invitations.email,
      role: invitations.role,
      expiresAt: invitations.expiresAt,
      acceptedAt: invitations.acceptedAt,
      revokedAt: invitations.revokedAt,
      inviterName: users.name,
    })
    .from(invitations)
    .innerJoin(workshops, eq(workshops.id, invitations.workshopId))
    .leftJoin(users, eq(users.id, invitations.invitedBy))
    .where(eq(invitations.tokenHash, hashToken(token)))
    .get();
  if (!row) return null;
  const account = getDb().select({ id: users.id }).from(users).where(eq(users.email, row.email)).get();
  return {
    id: row.id,
    workshopId: row.workshopId,
    workshopName: row.workshopName,
    email: row.email,
    role: row.role,
    expiresAt: row.expiresAt,
    inviterName: row.inviterName,
    state: stateOf(row),
    accountExists: !!account,
  };
}

export const INVITATION_GONE: Record<Exclude<InvitationState, "pending">, string> = {
  expired: "This invitation has expired. Ask the workshop owner to send a new one.",
  accepted: "This invitation has already been used. Sign in to reach the workshop.",
  revoked: "This invitation was withdrawn by the workshop owner.",
};

/**
 * Joins the invitation's workshop with its role, as an existing user or a new one created here, all
 * in one transaction. The conditional update makes the link single-use even when two tabs race.
 */
export function acceptInvitation(token: string, who: { userId: number } | { name: string; passwordHash: string }) {
  return getDb().transaction(
    (tx) => {
      const inv = tx
        .select()
        .from(invitations)
        .where(eq(invitations.tokenHash, hashToken(token)))
        .get();
      if (!inv) throw new NotFoundError("That invitation link is not valid. Check you opened the whole link from the e-mail.");
      const state = stateOf(inv);
      if (state !== "pending") throw new GoneError(INVITATION_GONE[state]);

      let user: { id: number; name: string; sessionVersion: number };
      if ("userId" in who) {
        const found = tx
          .select({ id: users.id, name: users.name, email: users.email, sessionVersion: users.sessionVersion })
          .from(users)
          .where(eq(users.id, who.userId))
          .get();
        if (!found || found.email !== inv.email) throw new ForbiddenError(`This invitation is for ${inv.email}.`);
        user = found;
      } else {
        if (tx.select({ id: users.id }).from(users).where(eq(users.email, inv.email)).get()) {
          throw new ConflictError("That e-mail already has an account; join with its password instead.");
        }
        user = tx
          .insert(users)
          .values({ email: inv.email, name: who.name, passwordHash: who.passwordHash })
          .returning({ id: users.id, name: users.name, sessionVersion: users.sessionVersion })
          .get();
      }
      if (isMemberOf(tx, inv.workshopId, user.id)) throw new ConflictError("You already belong to this workshop. Sign in to reach it.");

      const used = tx
        .update(invitations)
        .set({ acceptedAt: new Date() })
        .where(and(eq(invitations.id, inv.id), isNull(invitations.acceptedAt), isNull(invitations.revokedAt), gt(invitations.expiresAt, new Date())))
        .run();
      if (used.changes !== 1) throw new GoneError(INVITATION_GONE.accepted);
      tx.insert(memberships).values({ workshopId: inv.workshopId, userId: user.id, role: inv.role }).run();
      recordAudit(tx, {
        workshopId: inv.workshopId,
        actorUserId: user.id,
        action: "member.joined",
        detail: { name: user.name, email: inv.email, role: inv.role },
      });
      return { userId: user.id, sessionVersion: user.sessionVersion, workshopId: inv.workshopId, role: inv.role };
    },
    { behavior: "immediate" },
  );
}
