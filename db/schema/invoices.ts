import { index, integer, sqliteTable, text, uniqueIndex } from "drizzle-orm/sqlite-core";
import { INVOICE_STATUSES, LINE_KINDS } from "../../lib/vocabulary";
import { createdAt, id } from "./columns";
import { estimates } from "./estimates";
import { jobRef } from "./jobs";
import { workshopRef } from "./workshop";

export const invoices = sqliteTable(
  "invoices",
  {
    id: id(),
    jobId: jobRef(),
    workshopId: workshopRef(),
    estimateId: integer("estimate_id").references(() => estimates.id, { onDelete: "set null" }),
    number: integer("number").notNull(),
    status: text("status", { enum: INVOICE_STATUSES }).notNull().default("issued"),
    currency: text("currency").notNull(),
    taxRateBp: integer("tax_rate_bp").notNull(),
    subtotalMinor: integer("subtotal_minor").notNull(),
    taxMinor: integer("tax_minor").notNull(),
    totalMinor: integer("total_minor").notNull(),
    checkoutSessionId: text("checkout_session_id"),
    issuedAt: integer("issued_at", { mode: "timestamp_ms" }).notNull(),
    paidAt: integer("paid_at", { mode: "timestamp_ms" }),
    /** The customer's pay link (db/queries/invoice-links.ts): only the SHA-256 of its token, its expiry, to whom and when it went, when it was first opened. */
    payTokenHash: text("pay_token_hash"),
    payTokenExpiresAt: integer("pay_token_expires_at", { mode: "timestamp_ms" }),
    sentTo: text("sent_to"),
    sentAt: integer("sent_at", { mode: "timestamp_ms" }),
    viewedAt: integer("viewed_at", { mode: "timestamp_ms" }),
  },
  (t) => [
    uniqueIndex("invoices_workshop_number").on(t.workshopId, t.number),
    index("invoices_job").on(t.jobId),
    uniqueIndex("invoices_pay_token").on(t.payTokenHash),
    index("invoices_checkout_session").on(t.checkoutSessionId),
  ],
);

export const invoiceLines = sqliteTable(
  "invoice_lines",
  {
    id: id(),
    invoiceId: integer("invoice_id")
      .notNull()
      .references(() => invoices.id, { onDelete: "cascade" }),
    kind: text("kind", { enum: LINE_KINDS }).notNull(),
    description: text("description").notNull(),
    quantityMilli: integer("quantity_milli").notNull(),
    unitPriceMinor: integer("unit_price_minor").notNull(),
    amountMinor: integer("amount_minor").notNull(),
    position: integer("position").notNull().default(0),
  },
  (t) => [index("invoice_lines_invoice").on(t.invoiceId)],
);

/** Payment-service webhook events already applied, so a redelivery changes nothing. */
export const paymentEvents = sqliteTable("payment_events", {
  id: text("id").primaryKey(),
  type: text("type").notNull(),
  invoiceId: integer("invoice_id").references(() => invoices.id, { onDelete: "set null" }),
  receivedAt: createdAt(),
});

export type Invoice = typeof invoices.$inferSelect;
