import { and, asc, desc, eq, inArray, type SQL } from "drizzle-orm";
import { alias } from "drizzle-orm/sqlite-core";
import { assertCan, can, type Member } from "@/lib/auth/can";
import { drillKindsFor, generateDrill, generateDrillFor, getDrillKind, newSeed, type Drill } from "@/lib/drills";
import type { DrillAssignmentInput } from "@/lib/drills/schemas";
import { ForbiddenError, ValidationError } from "@/lib/errors";
import { getDb } from "../client";
import { drillAssignments, drills, users } from "../schema";
import { drillFromCalculation, findApprentice, insertDrill } from "./drill-rows";

/**
 * Sets of drills an owner or technician gives an apprentice with a due date. The drills are made when the
 * set is made, so the apprentice works through exactly the set chosen; each is answered like any drill.
 */

/** Each entry, a drill kind or a calculator slug, must have drills; the first that has none is named. */
function checkEntries(entries: readonly string[]): void {
  const unknown = entries.find((e) => !getDrillKind(e) && drillKindsFor(e).length === 0);
  if (unknown !== undefined) throw new ValidationError("Some fields need attention.", { kinds: `There is no drill called "${unknown.slice(0, 80)}".` });
}

function drillFor(entry: string): Drill {
  return getDrillKind(entry) ? generateDrill(entry) : generateDrillFor(entry, newSeed());
}

/** Today as a calendar date (UTC): a set is overdue once its due date is behind it. */
const today = () => new Date().toISOString().slice(0, 10);

export function createAssignment(member: Member, input: DrillAssignmentInput) {
  assertCan(member, "assignDrills");
  const apprentice = findApprentice(member, input.apprentice);
  let plan: { drill: Drill; sourceCalculationId?: number }[];
  let kinds: string[];
  if (input.calculationId !== undefined) {
    const drill = drillFromCalculation(member, input.calculationId);
    plan = [{ drill, sourceCalculationId: input.calculationId }];
    kinds = [drill.problem.slug];
  } else {
    kinds = [...new Set(input.kinds ?? [])];
    checkEntries(kinds);
    const count = input.count ?? kinds.length;
    // Kinds taken in turn, so a set of six over three kinds is two of each.
    plan = Array.from({ length: count }, (_, i) => ({ drill: drillFor(kinds[i % kinds.length]) }));
  }
  const id = getDb().transaction((tx) => {
    const row = tx
      .insert(drillAssignments)
      .values({
        workshopId: member.workshopId,
        assignedBy: member.userId,
        apprenticeId: apprentice.userId,
        kinds,
        count: plan.length,
        dueDate: input.due,
        note: input.note || null,
      })
      .returning({ id: drillAssignments.id })
      .get();
    for (const p of plan) insertDrill(tx, member, apprentice.userId, p.drill, { assignmentId: row.id, sourceCalculationId: p.sourceCalculationId });
    return row.id;
  });
  return listAssignments(member, { id }).find((a) => a.id === id)!;
}

const mentor = alias(users, "mentor");

/**
 * `GET /api/drills/assignments`: an apprentice's own sets; for owners and technicians every set in the
 * workshop, or one apprentice's with `apprentice`. Newest due date last, so what is due first leads.
 */
export function listAssignments(member: Member, filter: { apprentice?: number; id?: number } = {}) {
  assertCan(member, "doDrills");
  const where: SQL[] = [eq(drillAssignments.workshopId, member.workshopId)];
  if (!can.followDrills(member)) {
    if (filter.apprentice !== undefined && filter.apprentice !== member.userId)
      throw new ForbiddenError("Your role does not allow you to see another member's drills.");
    where.push(eq(drillAssignments.apprenticeId, member.userId));
  } else if (filter.apprentice !== undefined) {
    where.push(eq(drillAssignments.apprenticeId, findApprentice(member, filter.apprentice).userId));
  }
  if (filter.id !== undefined) where.push(eq(drillAssignments.id, filter.id));
  const sets = getDb()
    .select({
      id: drillAssignments.id,
      apprenticeId: drillAssignments.apprenticeId,
      apprenticeName: users.name,
      assignedByName: mentor.name,
      kinds: drillAssignments.kinds,
      count: drillAssignments.count,
      dueDate: drillAssignments.dueDate,
      note: drillAssignments.note,
      createdAt: drillAssignments.createdAt,
    })
    .from(drillAssignments)
    .innerJoin(users, eq(users.id, drillAssignments.apprenticeId))
    .leftJoin(mentor, eq(mentor.id, drillAssignments.assignedBy))
    .where(and(...where))
    .orderBy(asc(drillAssignments.dueDate), desc(drillAssignments.id))
    .limit(200)
    .all();
  const items = sets.length
    ? getDb()
        .select({ id: drills.id, assignmentId: drills.assignmentId, kind: drills.kind, correct: drills.correct, answeredAt: drills.answeredAt })
        .from(drills)
        .where(
          and(
            eq(drills.workshopId, member.workshopId),
            inArray(
              drills.assignmentId,
              sets.map((s) => s.id),
            ),
          ),
        )
        .orderBy(asc(drills.id))
        .all()
    : [];
  const now = today();
  return sets.map((s) => {
    const mine = items.filter((d) => d.assignmentId === s.id);
    const answered = mine.filter((d) => d.answeredAt !== null).length;
    const state = answered === mine.length ? "done" : s.dueDate < now ? "overdue" : "open";
    return {
      id: s.id,
      apprentice: { userId: s.apprenticeId, name: s.apprenticeName },
      assignedBy: s.assignedByName,
      kinds: s.kinds,
      count: s.count,
      dueDate: s.dueDate,
      note: s.note,
      createdAt: s.createdAt.toISOString(),
      answered,
      correct: mine.filter((d) => d.correct === true).length,
      state: state as "done" | "overdue" | "open",
      drills: mine.map((d) => ({ id: d.id, kind: d.kind, title: getDrillKind(d.kind)?.title ?? d.kind, answered: d.answeredAt !== null, correct: d.correct })),
    };
  });
}
export type DrillAssignmentView = ReturnType<typeof listAssignments>[number];
