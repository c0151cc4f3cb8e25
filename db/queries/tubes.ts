import { and, asc, eq, sql } from "drizzle-orm";
import { assertCan, type Member } from "@/lib/auth/can";
import { notFound } from "@/lib/errors";
import { findHeater } from "@/lib/calc/tables/heaters";
import { findTube } from "@/lib/calc/tables/tubes";
import { looksLikeSeriesString, tubeDifferences } from "@/lib/jobs/tube-differences";
import type { TubeUpdate, TubeValues } from "@/lib/jobs/tube-schemas";
import { TUBE_VERDICT_LABELS } from "@/lib/vocabulary";
import { getDb, type Db } from "../client";
import { tubes } from "../schema";
import { assertJobInWorkshop, type Tx } from "./job-access";
import { appendLog } from "./job-log";

/** The Tubes tab. Every member may add and record tubes; removing one is for technicians and owners. */

const tubeColumns = {
  id: tubes.id,
  position: tubes.position,
  type: tubes.type,
  function: tubes.function,
  testReading: tubes.testReading,
  testMinimum: tubes.testMinimum,
  verdict: tubes.verdict,
  substitute: tubes.substitute,
  createdAt: tubes.createdAt,
  updatedAt: tubes.updatedAt,
};
type TubeRow = ReturnType<typeof rowsOf>[number];

/** A tube as the API answers: the test as one pair, and the substitute's differences from the tables. */
function present(row: TubeRow, seriesString: boolean) {
  const { testReading, testMinimum, ...rest } = row;
  return {
    ...rest,
    test: testReading !== null && testMinimum !== null ? { reading: testReading, minimum: testMinimum } : null,
    differences: row.substitute ? tubeDifferences(row.type, row.substitute, { seriesString }) : [],
  };
}
export type Tube = ReturnType<typeof present>;

function rowsOf(member: Member, jobId: number, db: Db | Tx) {
  return db
    .select(tubeColumns)
    .from(tubes)
    .where(and(eq(tubes.jobId, jobId), eq(tubes.workshopId, member.workshopId)))
    .orderBy(asc(tubes.id))
    .all();
}

/** The set's heaters run in a series string when its line-up says so (lib/jobs/tube-differences.ts). */
const seriesOf = (rows: readonly TubeRow[]) => looksLikeSeriesString(rows.map((r) => r.type));

export function listTubes(member: Member, jobId: number) {
  assertJobInWorkshop(member, jobId);
  const rows = rowsOf(member, jobId, getDb());
  const seriesString = seriesOf(rows);
  return { tubes: rows.map((r) => present(r, seriesString)), seriesString };
}

function one(member: Member, jobId: number, tubeId: number, tx: Tx) {
  const rows = rowsOf(member, jobId, tx);
  const row = rows.find((r) => r.id === tubeId);
  if (!row) throw notFound("That tube");
  return present(row, seriesOf(rows));
}

function describe(t: { position: string; type: string; function?: string | null }) {
  return `${t.position} (${t.type}${t.function ? `, ${t.function}` : ""})`;
}

function testWords(v: Partial<Pick<TubeValues, "test" | "verdict" | "substitute">>): string[] {
  const words: string[] = [];
  if (v.test) words.push(`tested ${v.test.reading} against its minimum of ${v.test.minimum}`);
  if (v.test === null) words.push("test result cleared");
  if (v.verdict && v.verdict !== "not-tested") words.push(`verdict ${TUBE_VERDICT_LABELS[v.verdict].toLowerCase()}`);
  if (v.substitute) words.push(`substitute ${v.substitute}`);
  if (v.substitute === null) words.push("no substitute");
  return words;
}

const testColumns = (test: TubeValues["test"]) => (test === undefined ? {} : { testReading: test?.reading ?? null, testMinimum: test?.minimum ?? null });

export function createTube(member: Member, jobId: number, input: TubeValues) {
  assertCan(member, "addNotes", "add tubes");
  return getDb().transaction((tx) => {
    assertJobInWorkshop(member, jobId, tx);
    const { test, ...values } = input;
    const { id } = tx
      .insert(tubes)
      .values({
        ...values,
        function: values.function ?? null,
        substitute: values.substitute ?? null,
        ...testColumns(test),
        jobId,
        workshopId: member.workshopId,
      })
      .returning({ id: tubes.id })
      .get();
    const extra = testWords(input);
    appendLog(tx, member, jobId, "tube", `Tube ${describe(input)} added${extra.length ? `: ${extra.join(", ")}` : ""}.`, { tubeId: id });
    return one(member, jobId, id, tx);
  });
}

/** What a tube of the table does, for a pasted line-up: the heater table's words, or the tube table's kind. */
function functionOf(type: string): string | null {
  return findHeater(type)?.use ?? findTube(type)?.kind ?? null;
}

/** A whole line-up at once: V1, V2, … after the sockets already listed; picture tubes go in as CRT. */
export function createTubeLineup(member: Member, jobId: number, types: readonly string[]) {
  assertCan(member, "addNotes", "add tubes");
  return getDb().transaction((tx) => {
    assertJobInWorkshop(member, jobId, tx);
    const existing = rowsOf(member, jobId, tx);
    let next = 1 + Math.max(0, ...existing.map((r) => Number(/^V(\d+)$/i.exec(r.position)?.[1] ?? 0)));
    const values = types.map((type) => ({
      position: findTube(type)?.category === "picture" ? "CRT" : `V${next++}`,
      type,
      function: functionOf(type),
      jobId,
      workshopId: member.workshopId,
    }));
    const ids = new Set(
      tx
        .insert(tubes)
        .values(values)
        .returning({ id: tubes.id })
        .all()
        .map((r) => r.id),
    );
    appendLog(tx, member, jobId, "tube", `Tube line-up added: ${types.join(", ")} (${types.length} ${types.length === 1 ? "tube" : "tubes"}).`);
    const rows = rowsOf(member, jobId, tx);
    const seriesString = seriesOf(rows);
    return { tubes: rows.filter((r) => ids.has(r.id)).map((r) => present(r, seriesString)), seriesString };
  });
}

export function updateTube(member: Member, jobId: number, tubeId: number, input: TubeUpdate) {
  assertCan(member, "addNotes", "record tube results");
  return getDb().transaction((tx) => {
    assertJobInWorkshop(member, jobId, tx);
    const { test, ...rest } = input;
    const changes = Object.fromEntries(Object.entries(rest).filter(([, v]) => v !== undefined));
    const row = tx
      .update(tubes)
      .set({ ...changes, ...testColumns(test), updatedAt: sql`(unixepoch('subsec') * 1000)` })
      .where(and(eq(tubes.id, tubeId), eq(tubes.jobId, jobId), eq(tubes.workshopId, member.workshopId)))
      .returning({ position: tubes.position, type: tubes.type, function: tubes.function })
      .get();
    if (!row) throw notFound("That tube");
    const words = testWords(input);
    if (input.position || input.type || input.function !== undefined) words.unshift("details changed");
    appendLog(tx, member, jobId, "tube", `Tube ${describe(row)}: ${words.join(", ") || "updated"}.`, { tubeId });
    return one(member, jobId, tubeId, tx);
  });
}

export function deleteTube(member: Member, jobId: number, tubeId: number) {
  assertCan(member, "editJobs", "remove tubes");
  getDb().transaction((tx) => {
    assertJobInWorkshop(member, jobId, tx);
    const gone = tx
      .delete(tubes)
      .where(and(eq(tubes.id, tubeId), eq(tubes.jobId, jobId), eq(tubes.workshopId, member.workshopId)))
      .returning({ position: tubes.position, type: tubes.type, function: tubes.function })
      .get();
    if (!gone) throw notFound("That tube");
    appendLog(tx, member, jobId, "tube", `Tube ${describe(gone)} removed from the list.`);
  });
}
