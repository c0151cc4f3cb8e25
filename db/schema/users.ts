import { index, integer, sqliteTable, text, uniqueIndex } from "drizzle-orm/sqlite-core";
import { ROLES } from "../../lib/vocabulary";
import { createdAt, id } from "./columns";
import { workshopRef } from "./workshop";

/** People, the workshops they belong to, and invitations to join one. */

export const users = sqliteTable(
  "users",
  {
    id: id(),
    email: text("email").notNull(),
    name: text("name").notNull(),
    passwordHash: text("password_hash").notNull(),
    /** Bumped on sign-out-everywhere and password change: older cookies stop working. */
    sessionVersion: integer("session_version").notNull().default(1),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("users_email_unique").on(t.email)],
);

/** The user a row belongs to: deleting the user deletes it. */
export const userRef = <N extends string>(name: N) =>
  integer(name)
    .notNull()
    .references(() => users.id, { onDelete: "cascade" });

/** Who did something: kept as null when that user is deleted. */
export const actorRef = <N extends string>(name: N) => integer(name).references(() => users.id, { onDelete: "set null" });

export const memberships = sqliteTable(
  "memberships",
  {
    id: id(),
    workshopId: workshopRef(),
    userId: userRef("user_id"),
    role: text("role", { enum: ROLES }).notNull(),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("memberships_workshop_user").on(t.workshopId, t.userId), index("memberships_user").on(t.userId)],
);

export const invitations = sqliteTable(
  "invitations",
  {
    id: id(),
    workshopId: workshopRef(),
    email: text("email").notNull(),
    role: text("role", { enum: ROLES }).notNull(),
    /** SHA-256 of the token; the token itself is only ever in the e-mail. */
    tokenHash: text("token_hash").notNull(),
    invitedBy: actorRef("invited_by"),
    expiresAt: integer("expires_at", { mode: "timestamp_ms" }).notNull(),
    acceptedAt: integer("accepted_at", { mode: "timestamp_ms" }),
    revokedAt: integer("revoked_at", { mode: "timestamp_ms" }),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("invitations_token").on(t.tokenHash), index("invitations_workshop").on(t.workshopId)],
);

export type Membership = typeof memberships.$inferSelect;
export type Invitation = typeof invitations.$inferSelect;
