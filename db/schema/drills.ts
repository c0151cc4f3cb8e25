import { index, integer, sqliteTable, text } from "drizzle-orm/sqlite-core";
import type { DrillProblem, DrillSolution } from "../../lib/drills/types";
import { DRILL_VERDICTS } from "../../lib/vocabulary";
import { createdAt, id } from "./columns";
import { calculations } from "./record";
import { actorRef, userRef } from "./users";
import { workshopRef } from "./workshop";

/**
 * A set of drills an owner or technician gives an apprentice, due on a calendar date. Its drills are made
 * when it is set (drills.assignmentId), so the set the apprentice sees is the one the mentor chose.
 */
export const drillAssignments = sqliteTable(
  "drill_assignments",
  {
    id: id(),
    workshopId: workshopRef(),
    assignedBy: actorRef("assigned_by"),
    apprenticeId: userRef("apprentice_id"),
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
    userId: userRef("user_id"),
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
