import { beforeAll, describe, expect, test } from "vitest";
import type { Member } from "@/lib/auth/can";
import { ForbiddenError, NotFoundError, ValidationError } from "@/lib/errors";
import { demoDatabase } from "../helpers/temp-db";

// First, before anything opens the database: a fresh migrated file for the process's one client (getDb).
const demo = await demoDatabase("jobs");
const { DEMO_USERS } = demo;
const jobsQ = await import("@/db/queries/jobs");
const partsQ = await import("@/db/queries/parts");
const readingsQ = await import("@/db/queries/readings");
const calcQ = await import("@/db/queries/calculations");
const logQ = await import("@/db/queries/log");
const { jobListQuerySchema } = await import("@/lib/jobs/job-schemas");
const { readingSchema } = await import("@/lib/jobs/reading-schemas");

type M = Member;
let owner: M, tech: M, apprentice: M, other: M;

beforeAll(async () => {
  ({ owner, tech, apprentice, other } = await demo.seed());
});

const query = (q: Record<string, string> = {}) => jobListQuerySchema.parse(q);
const newJob = (m: M, title: string, extra: Record<string, unknown> = {}) =>
  jobsQ.createJob(m, {
    title,
    equipmentKind: "table-radio",
    maker: null,
    model: null,
    year: null,
    customerName: null,
    customerEmail: null,
    notes: null,
    ...extra,
  } as never);

describe("jobs queries", () => {
  test("the default page holds only the member's workshop, newest work first", () => {
    const page = jobsQ.searchJobs(owner, query());
    expect(page.page).toBe(1);
    expect(page.pageSize).toBe(50);
    expect(page.total).toBe(page.jobs.length);
    expect(page.jobs.map((j) => j.title)).not.toContain("Shortwave receiver, 1960s");
    const times = page.jobs.map((j) => j.updatedAt.getTime());
    expect([...times].sort((a, b) => b - a)).toEqual(times);
  });

  test("filters, search with literal wildcards, sorting and paging", () => {
    const marker = `Zq${Date.now()}`;
    for (let i = 0; i < 7; i++) newJob(tech, `${marker} set ${i}`, { equipmentKind: i % 2 ? "amplifier" : "tuner" });
    newJob(tech, "100% original chassis");
    const found = jobsQ.searchJobs(owner, query({ q: marker.toLowerCase(), sort: "title", dir: "asc", pageSize: "3", page: "2" }));
    expect(found.total).toBe(7);
    expect(found.jobs.map((j) => j.title)).toEqual([3, 4, 5].map((i) => `${marker} set ${i}`));
    const amps = jobsQ.searchJobs(owner, query({ q: marker, kind: "amplifier" }));
    expect(amps.total).toBe(3);
    expect(jobsQ.searchJobs(owner, query({ q: "%" })).jobs.map((j) => j.title)).toEqual(["100% original chassis"]);
    expect(jobsQ.searchJobs(owner, query({ q: marker, status: "at-the-counter,returned" })).total).toBe(0);
    expect(jobsQ.searchJobs(other, query({ q: marker })).total).toBe(0);
  });

  test("bad list parameters are refused by the schema with a message per field", () => {
    const r = jobListQuerySchema.safeParse({ page: "0", pageSize: "500", sort: "password", status: "lost" });
    expect(r.success).toBe(false);
    const paths = r.error!.issues.map((i) => i.path.join("."));
    expect(paths.sort()).toEqual(["page", "pageSize", "sort", "status"]);
  });

  test("apprentices cannot book in, edit, change status or delete; another workshop gets 404", () => {
    const job = newJob(tech, "Role check set");
    expect(() => newJob(apprentice, "nope")).toThrow(ForbiddenError);
    expect(() => jobsQ.updateJob(apprentice, job.id, { title: "x" } as never)).toThrow(ForbiddenError);
    expect(() => jobsQ.changeJobStatus(apprentice, job.id, "at-the-counter")).toThrow(ForbiddenError);
    expect(() => jobsQ.deleteJob(tech, job.id)).toThrow(ForbiddenError);
    expect(() => jobsQ.getJob(other, job.id)).toThrow(NotFoundError);
    expect(() => jobsQ.changeJobStatus(other, job.id, "at-the-counter")).toThrow(NotFoundError);
    expect(() => jobsQ.deleteJob(other, job.id)).toThrow(NotFoundError);
    expect(jobsQ.deleteJob(owner, job.id)).toEqual({ storedNames: [] });
    expect(jobsQ.findJob(owner, job.id)).toBeUndefined();
  });

  test("a status change is logged with both steps; setting the same status logs nothing", () => {
    const job = newJob(tech, "Workflow set");
    jobsQ.changeJobStatus(tech, job.id, "inspecting");
    jobsQ.changeJobStatus(owner, job.id, "inspecting");
    const log = logQ.listLog(apprentice, job.id).filter((e) => e.kind === "status");
    expect(log.map((e) => e.text)).toEqual(["Status: On the rack → Inspecting.", "On the rack: Workflow set."]);
    expect(log[0].author?.name).toBe(DEMO_USERS.technician.name);
  });
});

describe("parts, readings, calculations", () => {
  test("createParts writes all rows or none", () => {
    const job = newJob(tech, "Import set");
    const good = {
      designator: "C1",
      kind: "paper",
      originalValue: null,
      originalRating: null,
      replacementValue: null,
      replacementRating: null,
      state: "to-order",
    } as const;
    // A row the database refuses (kind outside its CHECK list is impossible through zod, so break NOT NULL instead).
    expect(() => partsQ.createParts(tech, job.id, [good, { ...good, designator: null as unknown as string }])).toThrow();
    expect(partsQ.listParts(tech, job.id)).toEqual([]);
    expect(partsQ.createParts(tech, job.id, [good, { ...good, designator: "C2" }])).toHaveLength(2);
    expect(() => partsQ.createParts(apprentice, job.id, [good])).toThrow(ForbiddenError);
    expect(() => partsQ.listParts(other, job.id)).toThrow(NotFoundError);
  });

  test("an apprentice adds readings whose verdicts come from resistor-drift; only technicians fix them", () => {
    const job = newJob(tech, "Survey set");
    const r = readingsQ.createReading(
      apprentice,
      job.id,
      readingSchema.parse({ kind: "resistor", designator: "R4", nominal: "470k", measured: "655k", tolerance: "0.2" }),
    );
    expect(r.verdict).toBe("high");
    expect(r.deviation).toBeCloseTo(185 / 470, 6);
    const open = readingsQ.createReading(apprentice, job.id, readingSchema.parse({ kind: "resistor", designator: "R9", nominal: "1M", measured: "OL" }));
    expect(open).toMatchObject({ measured: null, verdict: "open", deviation: null });
    const v = readingsQ.createReading(
      apprentice,
      job.id,
      readingSchema.parse({ kind: "voltage", designator: "B+", nominal: "250", measured: "240 V", tolerance: "0.1" }),
    );
    expect(v.verdict).toBe("within");
    expect(() => readingsQ.deleteReading(apprentice, job.id, r.id)).toThrow(ForbiddenError);
    readingsQ.deleteReading(tech, job.id, r.id);
    expect(readingsQ.listReadings(owner, job.id).map((x) => x.designator)).toEqual(["R9", "B+"]);
  });

  test("saved calculations are recomputed from the inputs, whatever the caller claims", () => {
    const job = newJob(tech, "Calc set");
    const saved = calcQ.saveCalculation(apprentice, job.id, { slug: "ohms-law", inputs: { voltage: "250 V", resistance: "50k" }, note: "screen feed" });
    expect(saved.inputs).toMatchObject({ voltage: 250, resistance: 50_000 });
    expect(saved.outputs.current).toBeCloseTo(0.005, 12);
    expect(saved.author).toEqual({ id: apprentice.userId, name: apprentice.name });
    expect(() => calcQ.saveCalculation(apprentice, job.id, { slug: "no-such", inputs: {}, note: null })).toThrow(NotFoundError);
    expect(() => calcQ.saveCalculation(apprentice, job.id, { slug: "ohms-law", inputs: { voltage: "-3 A" }, note: null })).toThrow(ValidationError);
    expect(() => calcQ.saveCalculation(other, job.id, { slug: "ohms-law", inputs: { voltage: 1, current: 1 }, note: null })).toThrow(NotFoundError);
    expect(calcQ.listCalculations(owner, job.id).map((c) => c.note)).toEqual(["screen feed"]);
  });

  test("the bench sheet renders a PDF for a member and 404s for another workshop", async () => {
    const { renderBenchSheet } = await import("@/server/bench-sheet/render");
    const { benchSheetData } = await import("@/server/bench-sheet/data");
    const radio = jobsQ.searchJobs(owner, query({ q: "Five-tube" })).jobs[0];
    const data = benchSheetData(owner, radio.id);
    expect(data.partsFitted.map((p) => p.designator)).toEqual(["C1", "C2"]);
    expect(data.resistors.find((r) => r.designator === "R7")?.verdict).toBe("Drifted high");
    expect(data.calculations[0].formulas[0].text).toContain("τ = R C");
    expect(data.caution).toMatch(/Lethal voltage/);
    const pdf = await renderBenchSheet(owner, radio.id);
    expect(pdf.subarray(0, 5).toString()).toBe("%PDF-");
    await expect(renderBenchSheet(other, radio.id)).rejects.toBeInstanceOf(NotFoundError);
  }, 60_000);
});
