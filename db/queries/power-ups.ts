import { and, asc, eq, inArray } from "drizzle-orm";
import { assertCan, type Member } from "@/lib/auth/can";
import { ConflictError, ValidationError, notFound } from "@/lib/errors";
import { checklistWarnings, isOverStop, lowerFirst, outcomeRefusal, stepWarnings } from "@/lib/jobs/power-up-steps";
import type { PowerUpOutcomeValues, PowerUpStepValues, PowerUpValues } from "@/lib/jobs/power-up-schemas";
import { POWER_UP_CHECKLIST, POWER_UP_LIMITER_LABELS } from "@/lib/vocabulary";
import { getDb, type Db } from "../client";
import { powerUpSteps, powerUps, users } from "../schema";
import { assertJobInWorkshop, type Tx } from "./job-access";
import { appendLog } from "./job-log";

/** The Power-ups tab: bring-up sessions and their steps. Every member may start one, add steps and close it. */

const sessionColumns = {
  id: powerUps.id,
  limiter: powerUps.limiter,
  lampPower: powerUps.lampPower,
  currentLimit: powerUps.currentLimit,
  stopCurrent: powerUps.stopCurrent,
  checklist: powerUps.checklist,
  outcome: powerUps.outcome,
  reason: powerUps.reason,
  startedAt: powerUps.startedAt,
  logEntryId: powerUps.logEntryId,
  authorId: users.id,
  authorName: users.name,
};

const stepColumns = {
  id: powerUpSteps.id,
  powerUpId: powerUpSteps.powerUpId,
  supplyVoltage: powerUpSteps.supplyVoltage,
  currentDrawn: powerUpSteps.currentDrawn,
  minutes: powerUpSteps.minutes,
  bPlus: powerUpSteps.bPlus,
  note: powerUpSteps.note,
  createdAt: powerUpSteps.createdAt,
};

type StepRow = typeof powerUpSteps.$inferSelect;

function presentStep(s: StepRow, stopCurrent: number | null) {
  return {
    id: s.id,
    supplyVoltage: s.supplyVoltage,
    currentDrawn: s.currentDrawn,
    minutes: s.minutes,
    bPlus: s.bPlus,
    note: s.note,
    overStop: isOverStop(s.currentDrawn, stopCurrent),
    warnings: stepWarnings(s, stopCurrent),
    createdAt: s.createdAt,
  };
}
export type PowerUpStep = ReturnType<typeof presentStep>;

function sessionsOf(member: Member, jobId: number, db: Db | Tx, only?: number) {
  const where = [eq(powerUps.jobId, jobId), eq(powerUps.workshopId, member.workshopId)];
  if (only !== undefined) where.push(eq(powerUps.id, only));
  const rows = db
    .select(sessionColumns)
    .from(powerUps)
    .leftJoin(users, eq(users.id, powerUps.authorId))
    .where(and(...where))
    .orderBy(asc(powerUps.startedAt), asc(powerUps.id))
    .all();
  const steps = rows.length
    ? db
        .select(stepColumns)
        .from(powerUpSteps)
        .where(
          inArray(
            powerUpSteps.powerUpId,
            rows.map((r) => r.id),
          ),
        )
        .orderBy(asc(powerUpSteps.id))
        .all()
    : [];
  return rows.map(({ authorId, authorName, logEntryId, ...s }) => {
    const own = steps.filter((st) => st.powerUpId === s.id).map((st) => presentStep(st, s.stopCurrent));
    return {
      ...s,
      checklistWarnings: checklistWarnings(s.checklist),
      author: authorId === null ? null : { id: authorId, name: authorName ?? "" },
      /** Moved from a power-up entry of the Log: limiter, stop current and checklist were never recorded. */
      fromLog: logEntryId !== null,
      overStop: own.some((st) => st.overStop),
      steps: own,
    };
  });
}
export type PowerUp = ReturnType<typeof sessionsOf>[number];

export function listPowerUps(member: Member, jobId: number): PowerUp[] {
  assertJobInWorkshop(member, jobId);
  return sessionsOf(member, jobId, getDb());
}

function session(member: Member, jobId: number, powerUpId: number, tx: Tx): PowerUp {
  const found = sessionsOf(member, jobId, tx, powerUpId)[0];
  if (!found) throw notFound("That power-up session");
  return found;
}

const amps = (a: number) => `${Number(a.toPrecision(3))} A`;

function limiterWords(v: PowerUpValues): string {
  if (v.limiter === "series-lamp") return `behind a ${v.lampPower} W series lamp`;
  if (v.limiter === "limited-supply") return `on a supply limited to ${amps(v.currentLimit!)}`;
  return `on a ${POWER_UP_LIMITER_LABELS.variac.toLowerCase()}`;
}

export function createPowerUp(member: Member, jobId: number, input: PowerUpValues): PowerUp {
  assertCan(member, "addNotes", "record power-ups");
  return getDb().transaction((tx) => {
    assertJobInWorkshop(member, jobId, tx);
    const { id } = tx
      .insert(powerUps)
      .values({
        jobId,
        workshopId: member.workshopId,
        authorId: member.userId,
        limiter: input.limiter,
        // Only the chosen limiter's own figure is kept.
        lampPower: input.limiter === "series-lamp" ? input.lampPower : null,
        currentLimit: input.limiter === "limited-supply" ? input.currentLimit : null,
        stopCurrent: input.stopCurrent,
        checklist: input.checklist,
      })
      .returning({ id: powerUps.id })
      .get();
    const undone = POWER_UP_CHECKLIST.filter((c) => !input.checklist[c.id]);
    const checks = undone.length
      ? `${POWER_UP_CHECKLIST.length - undone.length} of ${POWER_UP_CHECKLIST.length} checks done (not done: ${undone.map((c) => lowerFirst(c.label)).join("; ")})`
      : "every check done";
    appendLog(tx, member, jobId, "power-up", `Power-up session started ${limiterWords(input)}, stop current ${amps(input.stopCurrent)}; ${checks}.`, {
      powerUpId: id,
    });
    return session(member, jobId, id, tx);
  });
}

export function addPowerUpStep(member: Member, jobId: number, powerUpId: number, input: PowerUpStepValues): PowerUpStep {
  assertCan(member, "addNotes", "record power-up steps");
  return getDb().transaction((tx) => {
    assertJobInWorkshop(member, jobId, tx);
    const s = session(member, jobId, powerUpId, tx);
    if (s.outcome) throw new ConflictError(`This session is closed (${s.outcome}): start a new session for more steps.`);
    const row = tx
      .insert(powerUpSteps)
      .values({
        powerUpId,
        supplyVoltage: input.supplyVoltage,
        currentDrawn: input.currentDrawn,
        minutes: input.minutes,
        bPlus: input.bPlus ?? null,
        note: input.note ?? null,
      })
      .returning()
      .get();
    const step = presentStep(row, s.stopCurrent);
    const words = [`${input.supplyVoltage} V in, ${amps(input.currentDrawn)} drawn for ${input.minutes} min`];
    if (input.bPlus !== undefined) words.push(`B+ ${input.bPlus} V`);
    if (step.overStop) words.push(`over the ${amps(s.stopCurrent!)} stop current`);
    appendLog(tx, member, jobId, "power-up", `Power-up step: ${words.join(", ")}.${input.note ? ` ${input.note}` : ""}`, { powerUpId, stepId: row.id });
    return step;
  });
}

/** Passed or stopped. A session with a step over its stop current passes only with a reason (400 naming `reason`). */
export function updatePowerUp(member: Member, jobId: number, powerUpId: number, input: PowerUpOutcomeValues): PowerUp {
  assertCan(member, "addNotes", "close power-up sessions");
  return getDb().transaction((tx) => {
    assertJobInWorkshop(member, jobId, tx);
    const s = session(member, jobId, powerUpId, tx);
    const refusal = outcomeRefusal(input.outcome, input.reason, s.steps, s.stopCurrent);
    if (refusal) throw new ValidationError(refusal, { reason: refusal });
    tx.update(powerUps)
      .set({ outcome: input.outcome, reason: input.reason ?? null })
      .where(and(eq(powerUps.id, powerUpId), eq(powerUps.jobId, jobId), eq(powerUps.workshopId, member.workshopId)))
      .run();
    appendLog(tx, member, jobId, "power-up", `Power-up session ${input.outcome}${input.reason ? `: ${input.reason}` : "."}`, {
      powerUpId,
      outcome: input.outcome,
    });
    return session(member, jobId, powerUpId, tx);
  });
}
