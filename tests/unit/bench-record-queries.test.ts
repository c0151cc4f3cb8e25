import { beforeAll, describe, expect, test } from "vitest";
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from "@/lib/errors";
import type { Member } from "@/lib/auth/can";
import { demoDatabase } from "../helpers/temp-db";

// First, before anything opens the database: a fresh migrated file for the process's one client (getDb).
const demo = await demoDatabase("bench-record");
const jobsQ = await import("@/db/queries/jobs");
const tubesQ = await import("@/db/queries/tubes");
const powerQ = await import("@/db/queries/power-ups");
const faultsQ = await import("@/db/queries/faults");
const partsQ = await import("@/db/queries/parts");
const readingsQ = await import("@/db/queries/readings");
const readyQ = await import("@/db/queries/ready-record");
const logQ = await import("@/db/queries/log");
const { tubeSchema, tubeUpdateSchema } = await import("@/lib/jobs/tube-schemas");
const { candidateUpdateSchema, faultSchema, faultUpdateSchema } = await import("@/lib/jobs/fault-schemas");
const { powerUpSchema, powerUpStepSchema } = await import("@/lib/jobs/power-up-schemas");
const { readingSchema } = await import("@/lib/jobs/reading-schemas");
const { partSchema, partUpdateSchema } = await import("@/lib/jobs/part-schemas");
const { ReadyChecksError } = await import("@/lib/jobs/ready-checks");
const { statusChangeWithChecksSchema } = await import("@/lib/jobs/ready-schemas");

type M = Member;
let tech: M, apprentice: M, other: M;
let job: number;

beforeAll(async () => {
  ({ tech, apprentice, other } = await demo.seed());
  job = jobsQ.createJob(tech, {
    title: "Query test television",
    equipmentKind: "television",
    maker: null,
    model: null,
    year: null,
    customerName: null,
    customerEmail: null,
    notes: null,
  } as never).id;
});

const logTexts = () => logQ.listLog(tech, job).map((e) => e.text);
const step = (supplyVoltage: number, currentDrawn: number) => powerUpStepSchema.parse({ supplyVoltage, currentDrawn, minutes: 2 });

describe("tubes", () => {
  test("a pasted line-up numbers the sockets after those listed and puts a picture tube at CRT", () => {
    tubesQ.createTube(apprentice, job, tubeSchema.parse({ position: "V1", type: "6CB6", function: "RF amplifier" }));
    const { tubes, seriesString } = tubesQ.createTubeLineup(apprentice, job, ["6SN7GT", "6S4", "17BP4A"]);
    expect(tubes.map((t) => [t.position, t.type])).toEqual([
      ["V2", "6SN7GT"],
      ["V3", "6S4"],
      ["CRT", "17BP4A"],
    ]);
    expect(tubes[0].function).toBe("twin triode");
    expect(seriesString).toBe(false);
    expect(logTexts()[0]).toBe("Tube line-up added: 6SN7GT, 6S4, 17BP4A (3 tubes).");
  });

  test("a substitute comes back with its differences; the series string follows the line-up", () => {
    const v2 = tubesQ.listTubes(tech, job).tubes.find((t) => t.position === "V2")!;
    const t = tubesQ.updateTube(apprentice, job, v2.id, tubeUpdateSchema.parse({ substitute: "12SN7GT", test: { reading: 48, minimum: 60 }, verdict: "weak" }));
    expect(t.test).toEqual({ reading: 48, minimum: 60 });
    // RCA RC-30 (from memory): 6SN7GT 0.6 A, 12SN7GT 0.3 A. A parallel-heater line-up: information only.
    expect(t.differences.find((d) => d.what === "Heater current")!.level).toBe("info");
    tubesQ.createTubeLineup(tech, job, ["12AX4GTB"]); // a 600 mA series-string damper
    const again = tubesQ.listTubes(tech, job);
    expect(again.seriesString).toBe(true);
    expect(again.tubes.find((x) => x.id === v2.id)!.differences.find((d) => d.what === "Heater current")!.level).toBe("danger");
    expect(logTexts().some((l) => l.startsWith("Tube V2 (6SN7GT, twin triode): tested 48 against its minimum of 60, verdict weak, substitute 12SN7GT"))).toBe(
      true,
    );
  });

  test("apprentices may not remove a tube; another workshop sees none of them", () => {
    const t = tubesQ.listTubes(tech, job).tubes[0];
    expect(() => tubesQ.deleteTube(apprentice, job, t.id)).toThrow(ForbiddenError);
    expect(() => tubesQ.listTubes(other, job)).toThrow(NotFoundError);
    expect(() => tubesQ.updateTube(other, job, t.id, tubeUpdateSchema.parse({ verdict: "strong" }))).toThrow(NotFoundError);
    tubesQ.deleteTube(tech, job, t.id);
    expect(tubesQ.listTubes(tech, job).tubes.some((x) => x.id === t.id)).toBe(false);
  });
});

describe("power-ups", () => {
  test("steps over the stop current are danger, and the session passes only with a reason", () => {
    const s = powerQ.createPowerUp(
      apprentice,
      job,
      powerUpSchema.parse({ limiter: "series-lamp", lampPower: "100 W", stopCurrent: "0.8 A", checklist: { "fuse-rating": true } }),
    );
    expect(s.checklistWarnings).toHaveLength(6);
    expect(s.outcome).toBeNull();
    expect(powerQ.addPowerUpStep(apprentice, job, s.id, step(60, 0.4)).warnings).toEqual([]);
    const over = powerQ.addPowerUpStep(apprentice, job, s.id, step(90, 0.95));
    expect(over.overStop).toBe(true);
    expect(over.warnings[0].level).toBe("danger");
    let err: unknown;
    try {
      powerQ.updatePowerUp(apprentice, job, s.id, { outcome: "passed", reason: null });
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(ValidationError);
    expect(Object.keys((err as ValidationError).fields)).toEqual(["reason"]);
    const passed = powerQ.updatePowerUp(apprentice, job, s.id, {
      outcome: "passed",
      reason: "Surge while the reformed filter charged; steady at 0.6 A after.",
    });
    expect(passed.outcome).toBe("passed");
    expect(passed.steps.map((x) => x.overStop)).toEqual([false, true]);
    expect(() => powerQ.addPowerUpStep(apprentice, job, s.id, step(100, 0.5))).toThrow(ConflictError);
    expect(logTexts()[0]).toBe("Power-up session passed: Surge while the reformed filter charged; steady at 0.6 A after.");
  });

  test("a power-up written in the Log is also a session with its one step", () => {
    const entry = logQ.addLogEntry(apprentice, job, { kind: "power-up", supplyVoltage: 117, currentDrawn: 0.7, text: "Steady, no hum." });
    const session = powerQ.listPowerUps(tech, job).find((x) => x.fromLog && x.startedAt.getTime() === entry.createdAt.getTime())!;
    expect(session).toMatchObject({ limiter: null, stopCurrent: null, outcome: null, checklistWarnings: [] });
    expect(session.steps.map((st) => [st.supplyVoltage, st.currentDrawn, st.minutes, st.note])).toEqual([[117, 0.7, null, "Steady, no hum."]]);
  });

  test("the demo radio's power-up log entry was moved into a session by the migration or the seed", () => {
    const radio = jobsQ
      .searchJobs(tech, { page: 1, pageSize: 100, sort: "updatedAt", dir: "desc" } as never)
      .jobs.find((j) => j.equipmentKind === "table-radio")!;
    const sessions = powerQ.listPowerUps(tech, radio.id);
    expect(sessions.length).toBeGreaterThanOrEqual(1);
    expect(sessions.some((x) => x.steps.some((st) => st.supplyVoltage === 120 && st.currentDrawn === 0.21))).toBe(true);
  });
});

describe("faults", () => {
  test("state follows the candidates: open → found → fixed → open again when the cause is reopened", () => {
    const f = faultsQ.createFault(apprentice, job, faultSchema.parse({ symptom: "No vertical deflection", section: "vertical deflection" }));
    expect(f.state).toBe("open");
    const c = ["Yoke", "Vertical output transformer", "Vertical output tube", "Vertical oscillator"].map((d) =>
      faultsQ.addCandidate(apprentice, job, f.id, { description: d }),
    );
    expect(c.map((x) => x.position)).toEqual([1, 2, 3, 4]);
    expect(() => faultsQ.updateFault(apprentice, job, f.id, faultUpdateSchema.parse({ resolution: "Replaced the tube" }))).toThrow(ValidationError);
    const reading = readingsQ.createReading(apprentice, job, readingSchema.parse({ kind: "voltage", designator: "V3 cathode", nominal: 18, measured: 2 }));
    let now = faultsQ.updateCandidate(
      apprentice,
      job,
      f.id,
      c[2].id,
      candidateUpdateSchema.parse({ status: "cause", readingId: reading.id, evidence: "Cathode at 2 V against 18 V expected." }),
    );
    expect(now.state).toBe("found");
    expect(now.candidates[2].reading).toEqual({ designator: "V3 cathode", measured: 2, unit: "V" });
    now = faultsQ.updateFault(apprentice, job, f.id, faultUpdateSchema.parse({ resolution: "New vertical output tube; height and linearity set." }));
    expect(now.state).toBe("fixed");
    now = faultsQ.updateCandidate(tech, job, f.id, c[2].id, candidateUpdateSchema.parse({ status: "open" }));
    expect(now.state).toBe("open");
    expect(logTexts()[0]).toMatch(/The fault is open again\.$/);
    now = faultsQ.updateCandidate(tech, job, f.id, c[2].id, candidateUpdateSchema.parse({ status: "cause" }));
    expect(now.state).toBe("fixed");
  });

  test("a reading of another job is refused naming readingId", () => {
    const f = faultsQ.listFaults(tech, job)[0];
    const elsewhere = jobsQ.createJob(tech, { title: "Other set", equipmentKind: "tuner" } as never).id;
    const r = readingsQ.createReading(tech, elsewhere, readingSchema.parse({ kind: "resistor", designator: "R1", nominal: "1k", measured: "1k" }));
    try {
      faultsQ.updateCandidate(tech, job, f.id, f.candidates[0].id, candidateUpdateSchema.parse({ readingId: r.id }));
      expect.unreachable();
    } catch (e) {
      expect((e as ValidationError).fields).toHaveProperty("readingId");
    }
    expect(() => faultsQ.listFaults(other, job)).toThrow(NotFoundError);
  });
});

describe("parts fitted by apprentices, checked by technicians", () => {
  test("an apprentice records fitting only; the technician's check shows beside it", () => {
    const p = partsQ.createPart(tech, job, partSchema.parse({ designator: "C40", kind: "electrolytic", state: "ordered" }));
    expect(() => partsQ.updatePart(apprentice, job, p.id, partUpdateSchema.parse({ state: "ordered" }))).toThrow(ForbiddenError);
    expect(() => partsQ.updatePart(apprentice, job, p.id, partUpdateSchema.parse({ state: "fitted", checked: true }))).toThrow(ForbiddenError);
    const fitted = partsQ.updatePart(apprentice, job, p.id, partUpdateSchema.parse({ state: "fitted" }));
    expect([fitted.state, fitted.checkedBy]).toEqual(["fitted", null]);
    const checked = partsQ.updatePart(tech, job, p.id, partUpdateSchema.parse({ checked: true }));
    expect(checked.checkedBy).toEqual({ id: tech.userId, name: tech.name });
    expect(logTexts().slice(0, 2)).toEqual([
      `Part C40: fitting checked by ${tech.name}.`,
      `Part C40 recorded as fitted by ${apprentice.name}, waiting for a technician's check.`,
    ]);
    expect(partsQ.updatePart(tech, job, p.id, partUpdateSchema.parse({ state: "ordered" })).checkedBy).toBeNull();
  });
});

describe("checks before ready", () => {
  test("moving to ready is refused with the checks, then allowed with a reason that goes to the Log", () => {
    let err: unknown;
    try {
      readyQ.changeStatusWithChecks(tech, job, statusChangeWithChecksSchema.parse({ status: "at-the-counter" }));
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(ReadyChecksError);
    expect((err as InstanceType<typeof ReadyChecksError>).checks.map((c) => c.id)).toEqual(["parts-not-fitted"]);
    expect(jobsQ.getJob(tech, job).status).not.toBe("at-the-counter");
    expect(() =>
      readyQ.changeStatusWithChecks(apprentice, job, statusChangeWithChecksSchema.parse({ status: "at-the-counter", override: true, reason: "x" })),
    ).toThrow(ForbiddenError);
    const moved = readyQ.changeStatusWithChecks(
      tech,
      job,
      statusChangeWithChecksSchema.parse({ status: "at-the-counter", override: true, reason: "Customer collects today; C40 goes in at the counter." }),
    );
    expect(moved.status).toBe("at-the-counter");
    const [override, status] = logQ.listLog(tech, job);
    expect(status.text).toBe("Status: On the rack → At the counter.");
    expect(override.text).toMatch(
      /^Moved to “At the counter” with checks still open — 1 part on the list is not fitted yet: C40\. Reason: Customer collects today/,
    );
    expect(readyQ.changeStatusWithChecks(tech, job, statusChangeWithChecksSchema.parse({ status: "fault-finding" })).status).toBe("fault-finding");
  });
});
