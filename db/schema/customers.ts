import { index, sqliteTable, text, uniqueIndex } from "drizzle-orm/sqlite-core";
import { createdAt, id, updatedAt } from "./columns";
import { workshopRef } from "./workshop";

/** A workshop's customer; their jobs point here. E-mail is stored lower-case, one customer per address. */
export const customers = sqliteTable(
  "customers",
  {
    id: id(),
    workshopId: workshopRef(),
    name: text("name").notNull(),
    email: text("email"),
    phone: text("phone"),
    address: text("address"),
    notes: text("notes"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("customers_workshop_name").on(t.workshopId, t.name), uniqueIndex("customers_workshop_email").on(t.workshopId, t.email)],
);

export type Customer = typeof customers.$inferSelect;
