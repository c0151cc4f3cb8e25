import { and, desc, eq } from "drizzle-orm";
import { assertCan, type Member } from "@/lib/auth/can";
import { getCalculator } from "@/lib/calc/registry";
import { runCalculator } from "@/lib/calc/run";
import { NotFoundError, ValidationError, notFound } from "@/lib/errors";
import type { CalculationSave } from "@/lib/jobs/calculation-schemas";
import { getDb } from "../client";
import { calculations, users } from "../schema";
import { assertJobInWorkshop, touchJob } from "./job-access";

/** Saved calculator results on a job. The server recomputes every one; a client's outputs are never stored. */

const columns = {
  id: calculations.id,
  jobId: calculations.jobId,
  slug: calculations.slug,
  inputs: calculations.inputs,
  outputs: calculations.outputs,
  note: calculations.note,
  createdAt: calculations.createdAt,
  authorId: users.id,
  authorName: users.name,
};

type Raw = { authorId: number | null; authorName: string | null } & Omit<typeof calculations.$inferSelect, "workshopId" | "authorId">;

function shape({ authorId, authorName, ...rest }: Raw) {
  return { ...rest, author: authorId === null ? null : { id: authorId, name: authorName ?? "" } };
}

export type SavedCalculation = ReturnType<typeof shape>;

export function listCalculations(member: Member, jobId: number): SavedCalculation[] {
  assertJobInWorkshop(member, jobId);
  return getDb()
    .select(columns)
    .from(calculations)
    .leftJoin(users, eq(users.id, calculations.authorId))
    .where(and(eq(calculations.jobId, jobId), eq(calculations.workshopId, member.workshopId)))
    .orderBy(desc(calculations.createdAt), desc(calculations.id))
    .all()
    .map(shape);
}

/** NotFoundError for an unknown calculator or a job outside the workshop; ValidationError with field messages for bad inputs. */
export function saveCalculation(member: Member, jobId: number, input: CalculationSave): SavedCalculation {
  assertCan(member, "addNotes", "save calculations");
  assertJobInWorkshop(member, jobId);
  const calc = getCalculator(input.slug);
  if (!calc) throw new NotFoundError(`There is no calculator called "${input.slug}".`);
  const run = runCalculator(calc, input.inputs);
  if (!run.ok) throw new ValidationError(run.error.message, run.error.fields);
  // Stored as JSON; the row returned is read back from the database, so it is what a later read gives.
  const { inputs, outputs } = run.result;
  return getDb().transaction((tx) => {
    assertJobInWorkshop(member, jobId, tx);
    const row = tx
      .insert(calculations)
      .values({ jobId, workshopId: member.workshopId, slug: calc.slug, inputs, outputs, note: input.note, authorId: member.userId })
      .returning({
        id: calculations.id,
        jobId: calculations.jobId,
        slug: calculations.slug,
        inputs: calculations.inputs,
        outputs: calculations.outputs,
        note: calculations.note,
        createdAt: calculations.createdAt,
      })
      .get();
    touchJob(member, jobId, tx);
    return { ...row, author: { id: member.userId, name: member.name } };
  });
}

export function deleteCalculation(member: Member, jobId: number, calculationId: number) {
  assertCan(member, "editJobs", "remove saved calculations");
  getDb().transaction((tx) => {
    assertJobInWorkshop(member, jobId, tx);
    const gone = tx
      .delete(calculations)
      .where(and(eq(calculations.id, calculationId), eq(calculations.jobId, jobId), eq(calculations.workshopId, member.workshopId)))
      .returning({ id: calculations.id })
      .get();
    if (!gone) throw notFound("That calculation");
  });
}
