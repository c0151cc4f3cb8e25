import { index, integer, real, sqliteTable, text } from "drizzle-orm/sqlite-core";
import { FAULT_CANDIDATE_STATUSES, POWER_UP_LIMITERS, POWER_UP_OUTCOMES, TUBE_VERDICTS } from "../../lib/vocabulary";
import { createdAt, id, startedAt, updatedAt } from "./columns";
import { jobRef } from "./jobs";
import { logEntries, readings } from "./record";
import { actorRef } from "./users";
import { workshopRef } from "./workshop";

/** The bench record of a job: its tubes, current-limited bring-ups and faults. */

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
    authorId: actorRef("author_id"),
    logEntryId: integer("log_entry_id").references(() => logEntries.id, { onDelete: "set null" }),
    startedAt: startedAt(),
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

export type Tube = typeof tubes.$inferSelect;
export type PowerUp = typeof powerUps.$inferSelect;
export type PowerUpStep = typeof powerUpSteps.$inferSelect;
export type Fault = typeof faults.$inferSelect;
export type FaultCandidate = typeof faultCandidates.$inferSelect;
