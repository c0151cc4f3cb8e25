import { integer, sqliteTable, text } from "drizzle-orm/sqlite-core";
import { createdAt, id } from "./columns";

export const workshops = sqliteTable("workshops", {
  id: id(),
  name: text("name").notNull(),
  contactEmail: text("contact_email"),
  contactPhone: text("contact_phone"),
  address: text("address"),
  /** ISO 4217 code; money is always integer minor units. */
  currency: text("currency").notNull().default("GBP"),
  hourlyRateMinor: integer("hourly_rate_minor").notNull().default(0),
  /** Tax rate in basis points (2000 = 20%). */
  taxRateBp: integer("tax_rate_bp").notNull().default(0),
  /** Last invoice number issued; incremented inside the issuing transaction, so numbers have no gaps. */
  lastInvoiceNumber: integer("last_invoice_number").notNull().default(0),
  /** Last job number given; bumped inside the transaction that books a job in, so each workshop counts its own. */
  lastJobNumber: integer("last_job_number").notNull().default(0),
  readyMessageTemplate: text("ready_message_template"),
  createdAt: createdAt(),
});

/** The owning workshop: deleting a workshop deletes its rows. */
export const workshopRef = () =>
  integer("workshop_id")
    .notNull()
    .references(() => workshops.id, { onDelete: "cascade" });

export type Workshop = typeof workshops.$inferSelect;
