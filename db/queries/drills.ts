import { and, eq, isNull } from "drizzle-orm";
import { assertCan, can, type Member } from "@/lib/auth/can";
import {
  drillKindsFor,
  generateDrill,
  generateDrillFor,
  getDrillKind,
  judgeDrill,
  newSeed,
  UnknownDrillKindError,
  type Drill,
  type Judgement,
} from "@/lib/drills";
import type { DrillCreate } from "@/lib/drills/schemas";
import { ConflictError, ForbiddenError, ValidationError, notFound } from "@/lib/errors";
import { getDb } from "../client";
import { drills } from "../schema";
import { drillFromCalculation, insertDrill, publicProblem, resultView, type DrillRecord } from "./drill-rows";

/**
 * Drills (docs/PRODUCT.md "Drills"): practice problems made by the Bench's calculators, judged on the server.
 * Every function takes the signed-in member and scopes to their workshop; the solution never leaves here
 * before the drill is answered, and a drill is answered once.
 */

export { drillProgress, apprenticesProgress } from "./drill-progress";
export { createAssignment, listAssignments } from "./drill-assignments";
export type { PublicDrill, DrillResult } from "./drill-rows";

/** A drill of a kind, of a calculator (one of its kinds), or like a saved calculation; for the member themselves. */
export function createDrill(member: Member, input: DrillCreate, seed = newSeed()) {
  assertCan(member, "doDrills");
  let drill: Drill;
  if (input.calculationId !== undefined) {
    drill = drillFromCalculation(member, input.calculationId, seed);
  } else if (input.kind !== undefined) {
    if (!getDrillKind(input.kind)) throw new ValidationError("There is no drill of that kind.", { kind: `There is no drill kind "${input.kind}".` });
    drill = generateDrill(input.kind, seed);
  } else {
    const slug = input.slug ?? "";
    if (drillKindsFor(slug).length === 0)
      throw new ValidationError("There is no drill for that calculator.", { slug: `There is no drill for a calculator called "${slug}".` });
    drill = generateDrillFor(slug, seed);
  }
  const row = insertDrill(getDb(), member, member.userId, drill, input.calculationId !== undefined ? { sourceCalculationId: input.calculationId } : {});
  return publicProblem(row);
}

const notYours = () => new ForbiddenError("Only the member this drill was set for can answer it.");
const alreadyAnswered = () => new ConflictError("This drill has already been answered: each drill takes one answer. Try a similar one for another go.");

function findDrill(member: Member, drillId: number): DrillRecord {
  const row = getDb()
    .select()
    .from(drills)
    .where(and(eq(drills.id, drillId), eq(drills.workshopId, member.workshopId)))
    .get();
  if (!row) throw notFound("That drill");
  return row;
}

/** Judging is pure; a kind retired since the drill was made cannot be judged any more. */
function judge(row: DrillRecord, answer: number | string): Judgement {
  try {
    return judgeDrill(row, answer);
  } catch (err) {
    if (err instanceof UnknownDrillKindError) throw new ConflictError("This kind of drill is no longer offered; start another drill.");
    throw err;
  }
}

/**
 * A drill as its page shows it: the problem, and once answered the judgement with the working. The member's
 * own, or for owners and technicians any in the workshop; another apprentice's drill is refused.
 */
export function getDrill(member: Member, drillId: number) {
  assertCan(member, "doDrills");
  const row = findDrill(member, drillId);
  if (row.userId !== member.userId && !can.followDrills(member)) throw new ForbiddenError("Your role does not allow you to see another member's drills.");
  const result = row.answeredAt && row.answer !== null ? resultView(row, row.answer, judge(row, row.answer), row.answeredAt) : null;
  return { ...publicProblem(row), mine: row.userId === member.userId, result };
}

/** The drill to be answered: in the workshop (404), the member's own (403), not yet answered (409). */
export function getDrillForAnswer(member: Member, drillId: number): DrillRecord {
  assertCan(member, "doDrills");
  const row = findDrill(member, drillId);
  if (row.userId !== member.userId) throw notYours();
  if (row.answeredAt !== null) throw alreadyAnswered();
  return row;
}

/**
 * Judges the one answer. An answer that cannot be read at all (empty, words for a number) is sent back with
 * a message and does not use the drill up; a wrong number or a wrong unit is an answer, judged wrong.
 */
export function answerDrill(member: Member, drillId: number, answer: number | string) {
  const row = getDrillForAnswer(member, drillId);
  const j = judge(row, answer);
  if (j.verdict === "unreadable") throw new ValidationError(j.message, { answer: j.message });
  const saved = getDb()
    .update(drills)
    .set({ answer, verdict: j.verdict, correct: j.correct, answeredAt: new Date() })
    // The condition makes the answer single-use even when two answers race.
    .where(and(eq(drills.id, row.id), eq(drills.workshopId, member.workshopId), eq(drills.userId, member.userId), isNull(drills.answeredAt)))
    .returning({ answeredAt: drills.answeredAt })
    .get();
  if (!saved?.answeredAt) throw alreadyAnswered();
  return resultView(row, answer, j, saved.answeredAt);
}
