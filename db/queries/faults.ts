import { and, asc, eq, inArray, sql } from "drizzle-orm";
import { assertCan, type Member } from "@/lib/auth/can";
import { ValidationError, notFound } from "@/lib/errors";
import { faultState } from "@/lib/jobs/fault-state";
import type { CandidateUpdate, CandidateValues, FaultUpdate, FaultValues } from "@/lib/jobs/fault-schemas";
import { FAULT_CANDIDATE_STATUS_LABELS, FAULT_STATE_LABELS } from "@/lib/vocabulary";
import { getDb, type Db } from "../client";
import { faultCandidates, faults, readings } from "../schema";
import { assertJobInWorkshop, type Tx } from "./job-access";
import { appendLog } from "./job-log";

/** The Faults tab: symptom → candidates in test order → evidence → the cause → the repair. Every member may add and record. */

const faultColumns = {
  id: faults.id,
  symptom: faults.symptom,
  section: faults.section,
  resolution: faults.resolution,
  createdAt: faults.createdAt,
  updatedAt: faults.updatedAt,
};

const candidateColumns = {
  id: faultCandidates.id,
  faultId: faultCandidates.faultId,
  position: faultCandidates.position,
  description: faultCandidates.description,
  status: faultCandidates.status,
  evidence: faultCandidates.evidence,
  readingId: faultCandidates.readingId,
  readingDesignator: readings.designator,
  readingMeasured: readings.measured,
  readingKind: readings.kind,
};

function faultsOf(member: Member, jobId: number, db: Db | Tx, only?: number) {
  const where = [eq(faults.jobId, jobId), eq(faults.workshopId, member.workshopId)];
  if (only !== undefined) where.push(eq(faults.id, only));
  const rows = db
    .select(faultColumns)
    .from(faults)
    .where(and(...where))
    .orderBy(asc(faults.id))
    .all();
  const candidates = rows.length
    ? db
        .select(candidateColumns)
        .from(faultCandidates)
        .leftJoin(readings, and(eq(readings.id, faultCandidates.readingId), eq(readings.workshopId, member.workshopId)))
        .where(
          inArray(
            faultCandidates.faultId,
            rows.map((r) => r.id),
          ),
        )
        .orderBy(asc(faultCandidates.position), asc(faultCandidates.id))
        .all()
    : [];
  return rows.map((f) => {
    const own = candidates
      .filter((c) => c.faultId === f.id)
      .map(({ faultId: _f, readingDesignator, readingMeasured, readingKind, ...c }) => ({
        ...c,
        // An open resistor is stored as a null measurement: shown as such, never as 0 Ω.
        reading: readingDesignator === null ? null : { designator: readingDesignator, measured: readingMeasured, unit: readingKind === "voltage" ? "V" : "Ω" },
      }));
    return { ...f, state: faultState({ resolution: f.resolution, candidates: own }), candidates: own };
  });
}
export type Fault = ReturnType<typeof faultsOf>[number];
export type FaultCandidate = Fault["candidates"][number];

export function listFaults(member: Member, jobId: number): Fault[] {
  assertJobInWorkshop(member, jobId);
  return faultsOf(member, jobId, getDb());
}

function fault(member: Member, jobId: number, faultId: number, tx: Tx): Fault {
  const found = faultsOf(member, jobId, tx, faultId)[0];
  if (!found) throw notFound("That fault");
  return found;
}

const quoted = (text: string) => `“${text}”`;

/** A line for the Log when the fault's state moved. */
function stateWords(before: Fault, after: Fault): string {
  if (before.state === after.state) return "";
  return after.state === "open" && before.state !== "open"
    ? " The fault is open again."
    : ` The fault is now: ${FAULT_STATE_LABELS[after.state].toLowerCase()}.`;
}

export function createFault(member: Member, jobId: number, input: FaultValues): Fault {
  assertCan(member, "addNotes", "record faults");
  return getDb().transaction((tx) => {
    assertJobInWorkshop(member, jobId, tx);
    const { id } = tx
      .insert(faults)
      .values({ jobId, workshopId: member.workshopId, symptom: input.symptom, section: input.section ?? null })
      .returning({ id: faults.id })
      .get();
    appendLog(tx, member, jobId, "fault", `Fault found: ${quoted(input.symptom)}${input.section ? ` (points to the ${input.section})` : ""}.`, { faultId: id });
    return fault(member, jobId, id, tx);
  });
}

/** The repair as done. A resolution needs a candidate marked as the cause first (400 naming `resolution`). */
export function updateFault(member: Member, jobId: number, faultId: number, input: FaultUpdate): Fault {
  assertCan(member, "addNotes", "record faults");
  return getDb().transaction((tx) => {
    assertJobInWorkshop(member, jobId, tx);
    const before = fault(member, jobId, faultId, tx);
    if (input.resolution && !before.candidates.some((c) => c.status === "cause")) {
      throw new ValidationError("Mark the candidate that was the cause before writing the repair.", {
        resolution: "Mark the candidate that was the cause before writing the repair.",
      });
    }
    const changes = Object.fromEntries(Object.entries(input).filter(([, v]) => v !== undefined));
    tx.update(faults)
      .set({ ...changes, updatedAt: sql`(unixepoch('subsec') * 1000)` })
      .where(and(eq(faults.id, faultId), eq(faults.jobId, jobId), eq(faults.workshopId, member.workshopId)))
      .run();
    const after = fault(member, jobId, faultId, tx);
    const words: string[] = [];
    if (input.symptom && input.symptom !== before.symptom) words.push(`symptom now ${quoted(input.symptom)}`);
    if (input.section !== undefined && input.section !== before.section) words.push(input.section ? `points to the ${input.section}` : "section cleared");
    if (input.resolution) words.push(`repair: ${input.resolution}`);
    if (input.resolution === null && before.resolution) words.push("repair cleared");
    appendLog(tx, member, jobId, "fault", `Fault ${quoted(before.symptom)}: ${words.join("; ") || "no change"}.${stateWords(before, after)}`, { faultId });
    return after;
  });
}

const ordinal = (n: number) => `${n}${n % 100 >= 11 && n % 100 <= 13 ? "th" : (["th", "st", "nd", "rd"][n % 10] ?? "th")}`;

export function addCandidate(member: Member, jobId: number, faultId: number, input: CandidateValues): FaultCandidate {
  assertCan(member, "addNotes", "add fault candidates");
  return getDb().transaction((tx) => {
    assertJobInWorkshop(member, jobId, tx);
    const before = fault(member, jobId, faultId, tx);
    const position = 1 + Math.max(0, ...before.candidates.map((c) => c.position));
    const { id } = tx.insert(faultCandidates).values({ faultId, position, description: input.description }).returning({ id: faultCandidates.id }).get();
    appendLog(tx, member, jobId, "fault", `Candidate for ${quoted(before.symptom)}: ${input.description} (${ordinal(position)} to test).`, {
      faultId,
      candidateId: id,
    });
    return fault(member, jobId, faultId, tx).candidates.find((c) => c.id === id)!;
  });
}

/** Status, evidence (a note and/or a reading of this job's Readings tab), or the wording of a candidate. */
export function updateCandidate(member: Member, jobId: number, faultId: number, candidateId: number, input: CandidateUpdate): Fault {
  assertCan(member, "addNotes", "record fault evidence");
  return getDb().transaction((tx) => {
    assertJobInWorkshop(member, jobId, tx);
    const before = fault(member, jobId, faultId, tx);
    const candidate = before.candidates.find((c) => c.id === candidateId);
    if (!candidate) throw notFound("That candidate");
    if (input.readingId) {
      const reading = tx
        .select({ id: readings.id })
        .from(readings)
        .where(and(eq(readings.id, input.readingId), eq(readings.jobId, jobId), eq(readings.workshopId, member.workshopId)))
        .get();
      if (!reading) throw new ValidationError("That reading is not on this job.", { readingId: "Choose a reading from this job's Readings tab." });
    }
    const changes = Object.fromEntries(Object.entries(input).filter(([, v]) => v !== undefined));
    tx.update(faultCandidates)
      .set(changes)
      .where(and(eq(faultCandidates.id, candidateId), eq(faultCandidates.faultId, faultId)))
      .run();
    const after = fault(member, jobId, faultId, tx);
    const now = after.candidates.find((c) => c.id === candidateId)!;
    const words: string[] = [];
    if (input.status && input.status !== candidate.status) words.push(FAULT_CANDIDATE_STATUS_LABELS[input.status].toLowerCase());
    if (input.description && input.description !== candidate.description) words.push(`now reads ${quoted(input.description)}`);
    if (input.evidence) words.push(`evidence: ${input.evidence}`);
    if (input.readingId && now.reading)
      words.push(`reading ${now.reading.designator}${now.reading.measured === null ? " (open)" : ` ${now.reading.measured} ${now.reading.unit}`}`);
    if (input.readingId === null && candidate.readingId !== null) words.push("reading unlinked");
    appendLog(
      tx,
      member,
      jobId,
      "fault",
      `${quoted(before.symptom)} — ${candidate.description}: ${words.join("; ") || "no change"}.${stateWords(before, after)}`,
      { faultId, candidateId },
    );
    return after;
  });
}
