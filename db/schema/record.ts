import { index, integer, real, sqliteTable, text, uniqueIndex } from "drizzle-orm/sqlite-core";
import { FILE_KINDS, LOG_KINDS, PART_KINDS, PART_STATES, READING_KINDS } from "../../lib/vocabulary";
import { createdAt, id } from "./columns";
import { jobRef } from "./jobs";
import { actorRef } from "./users";
import { workshopRef } from "./workshop";

/** A job's own record: its parts, readings, saved calculations, files and Log. */

export const parts = sqliteTable(
  "parts",
  {
    id: id(),
    jobId: jobRef(),
    workshopId: workshopRef(),
    designator: text("designator").notNull(),
    kind: text("kind", { enum: PART_KINDS }).notNull(),
    originalValue: text("original_value"),
    originalRating: text("original_rating"),
    replacementValue: text("replacement_value"),
    replacementRating: text("replacement_rating"),
    state: text("state", { enum: PART_STATES }).notNull().default("to-order"),
    /** Unit cost in the workshop's minor currency unit, for estimates. */
    unitCostMinor: integer("unit_cost_minor"),
    /** Ordering: how many, from whom, under the supplier's own part number, and when it was ordered. */
    quantity: integer("quantity").notNull().default(1),
    supplier: text("supplier"),
    supplierPartNumber: text("supplier_part_number"),
    orderedAt: integer("ordered_at", { mode: "timestamp_ms" }),
    /**
     * The value and rating texts read with the calculators' unit parser, in SI (F or Ω; V for a capacitor's
     * rating, W for a resistor's), so the list can be sorted and checked. Null: blank or not readable.
     */
    originalValueSi: real("original_value_si"),
    originalRatingSi: real("original_rating_si"),
    replacementValueSi: real("replacement_value_si"),
    replacementRatingSi: real("replacement_rating_si"),
    /** A technician's check of a part recorded as fitted (apprentices may record fitting); cleared when the state changes. */
    checkedBy: actorRef("checked_by"),
    checkedAt: integer("checked_at", { mode: "timestamp_ms" }),
    createdAt: createdAt(),
  },
  (t) => [index("parts_job").on(t.jobId), index("parts_workshop_state").on(t.workshopId, t.state)],
);

export const readings = sqliteTable(
  "readings",
  {
    id: id(),
    jobId: jobRef(),
    workshopId: workshopRef(),
    /** "resistor" survey rows (Ω) or "voltage" test-point rows (V, nominal = expected). */
    kind: text("kind", { enum: READING_KINDS }).notNull().default("resistor"),
    designator: text("designator").notNull(),
    /**
     * Voltage rows: the part(s) this reading was taken across, comma-separated ("C5a, C5b"), so a
     * capacitor's rating is compared only with a voltage measured at its own position. Null: none named.
     */
    partDesignators: text("part_designators"),
    nominal: real("nominal").notNull(),
    /** Null means open circuit / no reading. */
    measured: real("measured"),
    tolerance: real("tolerance").notNull().default(0.2),
    createdAt: createdAt(),
  },
  (t) => [index("readings_job").on(t.jobId)],
);

export const calculations = sqliteTable(
  "calculations",
  {
    id: id(),
    jobId: jobRef(),
    workshopId: workshopRef(),
    slug: text("slug").notNull(),
    inputs: text("inputs", { mode: "json" }).$type<Record<string, unknown>>().notNull(),
    outputs: text("outputs", { mode: "json" }).$type<Record<string, unknown>>().notNull(),
    note: text("note"),
    authorId: actorRef("author_id"),
    createdAt: createdAt(),
  },
  (t) => [index("calculations_job").on(t.jobId)],
);

export const files = sqliteTable(
  "files",
  {
    id: id(),
    jobId: jobRef(),
    workshopId: workshopRef(),
    storedName: text("stored_name").notNull(),
    originalName: text("original_name").notNull(),
    type: text("type").notNull(),
    size: integer("size").notNull(),
    kind: text("kind", { enum: FILE_KINDS }).notNull().default("photo"),
    hasThumbnail: integer("has_thumbnail", { mode: "boolean" }).notNull().default(false),
    uploadedBy: actorRef("uploaded_by"),
    createdAt: createdAt(),
  },
  (t) => [index("files_job").on(t.jobId), uniqueIndex("files_stored_name").on(t.storedName)],
);

export const logEntries = sqliteTable(
  "log_entries",
  {
    id: id(),
    jobId: jobRef(),
    workshopId: workshopRef(),
    authorId: actorRef("author_id"),
    kind: text("kind", { enum: LOG_KINDS }).notNull().default("note"),
    text: text("text").notNull(),
    data: text("data", { mode: "json" }).$type<Record<string, unknown>>(),
    createdAt: createdAt(),
  },
  (t) => [index("log_job_time").on(t.jobId, t.createdAt)],
);

export type Part = typeof parts.$inferSelect;
export type Reading = typeof readings.$inferSelect;
