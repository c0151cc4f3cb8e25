import { index, integer, sqliteTable, text, uniqueIndex } from "drizzle-orm/sqlite-core";
import { createdAt, id } from "./columns";
import { actorRef, userRef } from "./users";
import { workshops } from "./workshop";

/** Sign-in state and the audit trail. */

export const passwordResets = sqliteTable(
  "password_resets",
  {
    id: id(),
    userId: userRef("user_id"),
    tokenHash: text("token_hash").notNull(),
    expiresAt: integer("expires_at", { mode: "timestamp_ms" }).notNull(),
    usedAt: integer("used_at", { mode: "timestamp_ms" }),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("password_resets_token").on(t.tokenHash)],
);

/**
 * One row per signed-in browser. The sealed cookie carries a random session id; only its SHA-256 is
 * stored. Signing out deletes the row, so a copied cookie stops working at once; an idle session ends
 * when `lastSeenAt` is older than the idle timeout, any session at `expiresAt`.
 */
export const sessions = sqliteTable(
  "sessions",
  {
    id: id(),
    userId: userRef("user_id"),
    tokenHash: text("token_hash").notNull(),
    lastSeenAt: integer("last_seen_at", { mode: "timestamp_ms" }).notNull(),
    expiresAt: integer("expires_at", { mode: "timestamp_ms" }).notNull(),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("sessions_token").on(t.tokenHash), index("sessions_user").on(t.userId)],
);

export const auditEvents = sqliteTable(
  "audit_events",
  {
    id: id(),
    // Nullable, unlike workshopRef(): the column allows an event that belongs to no workshop.
    workshopId: integer("workshop_id").references(() => workshops.id, { onDelete: "cascade" }),
    actorUserId: actorRef("actor_user_id"),
    action: text("action").notNull(),
    detail: text("detail", { mode: "json" }).$type<Record<string, unknown>>(),
    createdAt: createdAt(),
  },
  (t) => [index("audit_workshop_time").on(t.workshopId, t.createdAt)],
);
