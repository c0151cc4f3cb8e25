import { and, eq } from "drizzle-orm";
import type { Member } from "@/lib/auth/can";
import { getCalculator } from "@/lib/calc/registry";
import { drillKindsFor, generateDrill, getDrillKind, newSeed, type Drill, type Judgement } from "@/lib/drills";
import { ValidationError, notFound } from "@/lib/errors";
import type { Role } from "@/lib/vocabulary";
import { getDb, type DbOrTx } from "../client";
import { calculations, drills, jobs, memberships, users } from "../schema";

/**
 * Shared by the drills query modules: storing a drill, shaping what the browser may see (never the
 * solution before the answer), finding a member of the workshop, and a drill from a saved calculation.
 */

export type DrillRecord = typeof drills.$inferSelect;

/** The problem as the API sends it: no seed (the seed and the kind would let a browser regenerate the answer). */
export function publicProblem(row: Pick<DrillRecord, "id" | "problem" | "assignmentId" | "sourceCalculationId" | "createdAt" | "answeredAt">) {
  const p = row.problem;
  return {
    id: row.id,
    kind: p.kind,
    slug: p.slug,
    title: p.title,
    prompt: p.prompt,
    given: p.given,
    asked: { name: p.asked.name, label: p.asked.label, unit: p.asked.unit, help: p.asked.help, ...(p.asked.choices ? { choices: p.asked.choices } : {}) },
    danger: p.danger,
    caution: p.caution,
    assignmentId: row.assignmentId,
    sourceCalculationId: row.sourceCalculationId,
    createdAt: row.createdAt.toISOString(),
    answered: row.answeredAt !== null,
  };
}
export type PublicDrill = ReturnType<typeof publicProblem>;

/** What goes back once a drill is answered: the judgement, the working, and a similar one to try. */
export function resultView(row: Pick<DrillRecord, "id" | "kind" | "slug">, answer: number | string, j: Judgement, answeredAt: Date) {
  return {
    id: row.id,
    correct: j.correct,
    verdict: j.verdict,
    answer,
    received: j.received,
    expected: j.expected,
    expectedText: j.expectedText,
    tolerance: j.tolerance,
    toleranceText: j.toleranceText,
    message: j.message,
    steps: j.steps,
    mistake: j.mistake ?? null,
    pitfall: j.pitfall ?? null,
    answeredAt: answeredAt.toISOString(),
    // "Try a similar one": POST /api/drills with this kind makes a fresh problem of the same sort.
    similar: { kind: row.kind, slug: row.slug, title: getDrillKind(row.kind)?.title ?? row.slug },
  };
}
export type DrillResult = ReturnType<typeof resultView>;

export function insertDrill(
  db: DbOrTx,
  member: Member,
  userId: number,
  drill: Drill,
  origin: { assignmentId?: number; sourceCalculationId?: number } = {},
): DrillRecord {
  return db
    .insert(drills)
    .values({
      workshopId: member.workshopId,
      userId,
      kind: drill.problem.kind,
      slug: drill.problem.slug,
      seed: drill.problem.seed,
      problem: drill.problem,
      solution: drill.solution,
      assignmentId: origin.assignmentId ?? null,
      sourceCalculationId: origin.sourceCalculationId ?? null,
    })
    .returning()
    .get();
}

export interface WorkshopPerson {
  userId: number;
  name: string;
  role: Role;
}

/** A member of the caller's workshop by user id, or null (another workshop's member is never found). */
export function findWorkshopPerson(member: Member, userId: number, db: DbOrTx = getDb()): WorkshopPerson | null {
  return (
    db
      .select({ userId: users.id, name: users.name, role: memberships.role })
      .from(memberships)
      .innerJoin(users, eq(users.id, memberships.userId))
      .where(and(eq(memberships.workshopId, member.workshopId), eq(memberships.userId, userId)))
      .get() ?? null
  );
}

/** An apprentice of the caller's workshop; anyone else (another role, another workshop) is a 404. */
export function findApprentice(member: Member, userId: number, db: DbOrTx = getDb()): WorkshopPerson {
  const person = findWorkshopPerson(member, userId, db);
  if (!person || person.role !== "apprentice") throw notFound("That apprentice");
  return person;
}

/**
 * "Do this one yourself": a drill from a saved calculation. The drill kinds make their own problems (they
 * cannot be fed a saved set of figures), so this is a fresh problem of the same calculator, preferring a
 * kind that asks for a figure the saved calculation worked out; the prompt says so.
 */
export function drillFromCalculation(member: Member, calculationId: number, seed = newSeed(), db: DbOrTx = getDb()): Drill {
  const calc = db
    .select({ slug: calculations.slug, outputs: calculations.outputs, jobTitle: jobs.title })
    .from(calculations)
    .innerJoin(jobs, eq(jobs.id, calculations.jobId))
    .where(and(eq(calculations.id, calculationId), eq(calculations.workshopId, member.workshopId)))
    .get();
  if (!calc) throw notFound("That saved calculation");
  const title = getCalculator(calc.slug)?.title ?? calc.slug;
  const kinds = drillKindsFor(calc.slug);
  if (kinds.length === 0)
    throw new ValidationError(`There is no drill for the ${title} calculator yet.`, { calculationId: `There is no drill for the ${title} calculator yet.` });
  const matching = kinds.filter((k) => k.direction === "forward" && typeof calc.outputs[k.asked.name] === "number");
  const pool = matching.length ? matching : kinds;
  const drill = generateDrill(pool[(seed >>> 0) % pool.length].id, seed);
  const lead = `Like the ${title} calculation saved on “${calc.jobTitle}”, with figures of its own (not the saved ones): work it through yourself.`;
  return { ...drill, problem: { ...drill.problem, prompt: `${lead} ${drill.problem.prompt}` } };
}
