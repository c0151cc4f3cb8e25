import { sql } from "drizzle-orm";
import { index, integer, real, sqliteTable, text, uniqueIndex } from "drizzle-orm/sqlite-core";
import {
  DRILL_VERDICTS,
  EQUIPMENT_KINDS,
  ESTIMATE_STATUSES,
  FAULT_CANDIDATE_STATUSES,
  FILE_KINDS,
  FIRST_JOB_STATUS,
  INVOICE_STATUSES,
  JOB_STATUSES,
  LINE_KINDS,
  LOG_KINDS,
  PART_KINDS,
  PART_STATES,
  POWER_UP_LIMITERS,
  POWER_UP_OUTCOMES,
  READING_KINDS,
  ROLES,
  TUBE_VERDICTS,
} from "../lib/vocabulary";
import type { DrillProblem, DrillSolution } from "../lib/drills/types";

/** Every table of Glowbench. Each row belongs to one workshop, directly or through its job. */

const id = () => integer("id").primaryKey({ autoIncrement: true });
const createdAt = () =>
  integer("created_at", { mode: "timestamp_ms" })
    .notNull()
    .default(sql`(unixepoch('subsec') * 1000)`);

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

export const memberships = sqliteTable(
  "memberships",
  {
    id: id(),
    workshopId: integer("workshop_id")
      .notNull()
      .references(() => workshops.id, { onDelete: "cascade" }),
    userId: integer("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    role: text("role", { enum: ROLES }).notNull(),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("memberships_workshop_user").on(t.workshopId, t.userId), index("memberships_user").on(t.userId)],
);

export const invitations = sqliteTable(
  "invitations",
  {
    id: id(),
    workshopId: integer("workshop_id")
      .notNull()
      .references(() => workshops.id, { onDelete: "cascade" }),
    email: text("email").notNull(),
    role: text("role", { enum: ROLES }).notNull(),
    /** SHA-256 of the token; the token itself is only ever in the e-mail. */
    tokenHash: text("token_hash").notNull(),
    invitedBy: integer("invited_by").references(() => users.id, { onDelete: "set null" }),
    expiresAt: integer("expires_at", { mode: "timestamp_ms" }).notNull(),
    acceptedAt: integer("accepted_at", { mode: "timestamp_ms" }),
    revokedAt: integer("revoked_at", { mode: "timestamp_ms" }),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("invitations_token").on(t.tokenHash), index("invitations_workshop").on(t.workshopId)],
);

export const passwordResets = sqliteTable(
  "password_resets",
  {
    id: id(),
    userId: integer("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
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
    userId: integer("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
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
    workshopId: integer("workshop_id").references(() => workshops.id, { onDelete: "cascade" }),
    actorUserId: integer("actor_user_id").references(() => users.id, { onDelete: "set null" }),
    action: text("action").notNull(),
    detail: text("detail", { mode: "json" }).$type<Record<string, unknown>>(),
    createdAt: createdAt(),
  },
  (t) => [index("audit_workshop_time").on(t.workshopId, t.createdAt)],
);

/** A workshop's customer; their jobs point here. E-mail is stored lower-case, one customer per address. */
export const customers = sqliteTable(
  "customers",
  {
    id: id(),
    workshopId: integer("workshop_id")
      .notNull()
      .references(() => workshops.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    email: text("email"),
    phone: text("phone"),
    address: text("address"),
    notes: text("notes"),
    createdAt: createdAt(),
    updatedAt: integer("updated_at", { mode: "timestamp_ms" })
      .notNull()
      .default(sql`(unixepoch('subsec') * 1000)`),
  },
  (t) => [index("customers_workshop_name").on(t.workshopId, t.name), uniqueIndex("customers_workshop_email").on(t.workshopId, t.email)],
);

export const jobs = sqliteTable(
  "jobs",
  {
    id: id(),
    workshopId: integer("workshop_id")
      .notNull()
      .references(() => workshops.id, { onDelete: "cascade" }),
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
    updatedAt: integer("updated_at", { mode: "timestamp_ms" })
      .notNull()
      .default(sql`(unixepoch('subsec') * 1000)`),
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

const jobRef = () =>
  integer("job_id")
    .notNull()
    .references(() => jobs.id, { onDelete: "cascade" });
const workshopRef = () =>
  integer("workshop_id")
    .notNull()
    .references(() => workshops.id, { onDelete: "cascade" });

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
    checkedBy: integer("checked_by").references(() => users.id, { onDelete: "set null" }),
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
    authorId: integer("author_id").references(() => users.id, { onDelete: "set null" }),
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
    uploadedBy: integer("uploaded_by").references(() => users.id, { onDelete: "set null" }),
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
    authorId: integer("author_id").references(() => users.id, { onDelete: "set null" }),
    kind: text("kind", { enum: LOG_KINDS }).notNull().default("note"),
    text: text("text").notNull(),
    data: text("data", { mode: "json" }).$type<Record<string, unknown>>(),
    createdAt: createdAt(),
  },
  (t) => [index("log_job_time").on(t.jobId, t.createdAt)],
);

const updatedAt = () =>
  integer("updated_at", { mode: "timestamp_ms" })
    .notNull()
    .default(sql`(unixepoch('subsec') * 1000)`);

/** The Tubes tab: each socket's tube, the tester's own numbers and verdict, and a substitute if one goes in. */
export const tubes = sqliteTable(
  "tubes",
  {
    id: id(),
    jobId: jobRef(),
    workshopId: workshopRef(),
    position: text("position").notNull(),
    type: text("type").notNull(),
    function: text("function"),
    /** The tester's reading and its minimum for the type, on the tester's own scale; both null when not tested. */
    testReading: real("test_reading"),
    testMinimum: real("test_minimum"),
    verdict: text("verdict", { enum: TUBE_VERDICTS }).notNull().default("not-tested"),
    substitute: text("substitute"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("tubes_job").on(t.jobId)],
);

/**
 * A current-limited bring-up. Sessions moved from power-up log entries have no limiter, stop current or
 * checklist (never recorded then) and keep the entry's id.
 */
export const powerUps = sqliteTable(
  "power_ups",
  {
    id: id(),
    jobId: jobRef(),
    workshopId: workshopRef(),
    limiter: text("limiter", { enum: POWER_UP_LIMITERS }),
    lampPower: real("lamp_power"),
    currentLimit: real("current_limit"),
    stopCurrent: real("stop_current"),
    checklist: text("checklist", { mode: "json" }).$type<Record<string, boolean>>(),
    outcome: text("outcome", { enum: POWER_UP_OUTCOMES }),
    reason: text("reason"),
    authorId: integer("author_id").references(() => users.id, { onDelete: "set null" }),
    logEntryId: integer("log_entry_id").references(() => logEntries.id, { onDelete: "set null" }),
    startedAt: integer("started_at", { mode: "timestamp_ms" })
      .notNull()
      .default(sql`(unixepoch('subsec') * 1000)`),
  },
  (t) => [index("power_ups_job").on(t.jobId), index("power_ups_log_entry").on(t.logEntryId)],
);

/** One step of a bring-up; belongs to its job's workshop through the session. */
export const powerUpSteps = sqliteTable(
  "power_up_steps",
  {
    id: id(),
    powerUpId: integer("power_up_id")
      .notNull()
      .references(() => powerUps.id, { onDelete: "cascade" }),
    supplyVoltage: real("supply_voltage").notNull(),
    currentDrawn: real("current_drawn").notNull(),
    /** Null only on steps moved from the Log, which never recorded it. */
    minutes: real("minutes"),
    bPlus: real("b_plus"),
    note: text("note"),
    createdAt: createdAt(),
  },
  (t) => [index("power_up_steps_session").on(t.powerUpId)],
);

/** The Faults tab: a symptom, its candidates in test order, and the repair. */
export const faults = sqliteTable(
  "faults",
  {
    id: id(),
    jobId: jobRef(),
    workshopId: workshopRef(),
    symptom: text("symptom").notNull(),
    section: text("section"),
    resolution: text("resolution"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("faults_job").on(t.jobId)],
);

export const faultCandidates = sqliteTable(
  "fault_candidates",
  {
    id: id(),
    faultId: integer("fault_id")
      .notNull()
      .references(() => faults.id, { onDelete: "cascade" }),
    /** Test order, 1 first. */
    position: integer("position").notNull(),
    description: text("description").notNull(),
    status: text("status", { enum: FAULT_CANDIDATE_STATUSES }).notNull().default("open"),
    evidence: text("evidence"),
    readingId: integer("reading_id").references(() => readings.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [index("fault_candidates_fault").on(t.faultId)],
);

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
    createdBy: integer("created_by").references(() => users.id, { onDelete: "set null" }),
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

/**
 * A set of drills an owner or technician gives an apprentice, due on a calendar date. Its drills are made
 * when it is set (drills.assignmentId), so the set the apprentice sees is the one the mentor chose.
 */
export const drillAssignments = sqliteTable(
  "drill_assignments",
  {
    id: id(),
    workshopId: workshopRef(),
    assignedBy: integer("assigned_by").references(() => users.id, { onDelete: "set null" }),
    apprenticeId: integer("apprentice_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    /** The drill kinds ("cathode-bias/resistor") or calculator slugs the set was made from, as chosen. */
    kinds: text("kinds", { mode: "json" }).$type<string[]>().notNull(),
    count: integer("count").notNull(),
    /** A calendar date, "2025-03-14": due by the end of that day wherever the workshop is. */
    dueDate: text("due_date").notNull(),
    note: text("note"),
    createdAt: createdAt(),
  },
  (t) => [index("drill_assignments_workshop_apprentice").on(t.workshopId, t.apprenticeId, t.dueDate)],
);

/**
 * One practice problem for one member. The problem (what the browser may see) and the solution (the
 * expected answer, tolerance and working, never sent before the answer) are stored when the drill is made,
 * so a later change to a calculator never rewrites a drill already set. Answered once: the answer columns
 * are written by a conditional update.
 */
export const drills = sqliteTable(
  "drills",
  {
    id: id(),
    workshopId: workshopRef(),
    userId: integer("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    kind: text("kind").notNull(),
    slug: text("slug").notNull(),
    seed: integer("seed").notNull(),
    problem: text("problem", { mode: "json" }).$type<DrillProblem>().notNull(),
    solution: text("solution", { mode: "json" }).$type<DrillSolution>().notNull(),
    assignmentId: integer("assignment_id").references(() => drillAssignments.id, { onDelete: "set null" }),
    sourceCalculationId: integer("source_calculation_id").references(() => calculations.id, { onDelete: "set null" }),
    /** The answer as sent (a JSON number or text), kept so the judgement can be shown again. */
    answer: text("answer", { mode: "json" }).$type<number | string>(),
    verdict: text("verdict", { enum: DRILL_VERDICTS }),
    correct: integer("correct", { mode: "boolean" }),
    answeredAt: integer("answered_at", { mode: "timestamp_ms" }),
    createdAt: createdAt(),
  },
  (t) => [
    // Progress reads a member's answered drills by kind and time.
    index("drills_workshop_user_answered").on(t.workshopId, t.userId, t.answeredAt),
    index("drills_assignment").on(t.assignmentId),
  ],
);

export type Workshop = typeof workshops.$inferSelect;
export type Membership = typeof memberships.$inferSelect;
export type Customer = typeof customers.$inferSelect;
export type Job = typeof jobs.$inferSelect;
export type Part = typeof parts.$inferSelect;
export type Reading = typeof readings.$inferSelect;
export type Invitation = typeof invitations.$inferSelect;
export type Estimate = typeof estimates.$inferSelect;
export type Invoice = typeof invoices.$inferSelect;
export type Tube = typeof tubes.$inferSelect;
export type PowerUp = typeof powerUps.$inferSelect;
export type PowerUpStep = typeof powerUpSteps.$inferSelect;
export type Fault = typeof faults.$inferSelect;
export type FaultCandidate = typeof faultCandidates.$inferSelect;
