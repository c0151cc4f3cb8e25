import { index, integer, sqliteTable, text, uniqueIndex } from "drizzle-orm/sqlite-core";
import { EQUIPMENT_KINDS, FIRST_JOB_STATUS, JOB_STATUSES } from "../../lib/vocabulary";
import { createdAt, id, updatedAt } from "./columns";
import { customers } from "./customers";
import { workshopRef } from "./workshop";

export const jobs = sqliteTable(
  "jobs",
  {
    id: id(),
    workshopId: workshopRef(),
    /**
     * The job's number in its workshop ("Job 12"), from workshops.lastJobNumber. 0 only for an instant: a
     * row inserted without a number (scripts, fixtures) is numbered by the jobs_number trigger of the
     * customers-and-ordering migration.
     */
    number: integer("number").notNull().default(0),
    title: text("title").notNull(),
    equipmentKind: text("equipment_kind", { enum: EQUIPMENT_KINDS }).notNull(),
    maker: text("maker"),
    model: text("model"),
    year: integer("year"),
    customerName: text("customer_name"),
    customerEmail: text("customer_email"),
    /** The customer record; customerName and customerEmail stay as its copy, so older readers keep working. */
    customerId: integer("customer_id").references(() => customers.id, { onDelete: "set null" }),
    /** Intake: the set's serial or chassis number and what came in with it ("Knobs", "Back cover"). */
    serialNumber: text("serial_number"),
    accessories: text("accessories", { mode: "json" }).$type<string[]>(),
    status: text("status", { enum: JOB_STATUSES }).notNull().default(FIRST_JOB_STATUS),
    notes: text("notes"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index("jobs_workshop_updated").on(t.workshopId, t.updatedAt),
    // Status filter with the list's default order: an ordered scan that stops after one page.
    index("jobs_workshop_status_updated").on(t.workshopId, t.status, t.updatedAt),
    index("jobs_workshop_kind").on(t.workshopId, t.equipmentKind),
    uniqueIndex("jobs_workshop_number").on(t.workshopId, t.number),
    index("jobs_customer").on(t.customerId),
  ],
);

/** The job a row belongs to: deleting the job deletes it. */
export const jobRef = () =>
  integer("job_id")
    .notNull()
    .references(() => jobs.id, { onDelete: "cascade" });

export type Job = typeof jobs.$inferSelect;
