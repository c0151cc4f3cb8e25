import { index, integer, sqliteTable, text, uniqueIndex } from "drizzle-orm/sqlite-core";
import { ESTIMATE_STATUSES, LINE_KINDS } from "../../lib/vocabulary";
import { createdAt, id } from "./columns";
import { jobRef } from "./jobs";
import { parts } from "./record";
import { actorRef } from "./users";
import { workshopRef } from "./workshop";

export const estimates = sqliteTable(
  "estimates",
  {
    id: id(),
    jobId: jobRef(),
    workshopId: workshopRef(),
    status: text("status", { enum: ESTIMATE_STATUSES }).notNull().default("draft"),
    currency: text("currency").notNull(),
    taxRateBp: integer("tax_rate_bp").notNull().default(0),
    approvalTokenHash: text("approval_token_hash"),
    tokenExpiresAt: integer("token_expires_at", { mode: "timestamp_ms" }),
    respondedAt: integer("responded_at", { mode: "timestamp_ms" }),
    createdBy: actorRef("created_by"),
    createdAt: createdAt(),
  },
  (t) => [index("estimates_job").on(t.jobId), uniqueIndex("estimates_token").on(t.approvalTokenHash)],
);

export const estimateLines = sqliteTable(
  "estimate_lines",
  {
    id: id(),
    estimateId: integer("estimate_id")
      .notNull()
      .references(() => estimates.id, { onDelete: "cascade" }),
    kind: text("kind", { enum: LINE_KINDS }).notNull(),
    description: text("description").notNull(),
    /** Quantity in thousandths (hours for labour, pieces for parts). */
    quantityMilli: integer("quantity_milli").notNull(),
    unitPriceMinor: integer("unit_price_minor").notNull(),
    partId: integer("part_id").references(() => parts.id, { onDelete: "set null" }),
    position: integer("position").notNull().default(0),
  },
  (t) => [index("estimate_lines_estimate").on(t.estimateId)],
);

export type Estimate = typeof estimates.$inferSelect;
