import { beforeAll, describe, expect, test } from "vitest";
import type { Member } from "@/lib/auth/can";
import { demoDatabase } from "../helpers/temp-db";

// Voltage readings linked to the capacitors they were taken across, through the real queries on a
// fresh migrated database (the migration adds readings.part_designators), made before anything opens it.
const demo = await demoDatabase("links");
const jobsQ = await import("@/db/queries/jobs");
const partsQ = await import("@/db/queries/parts");
const readingsQ = await import("@/db/queries/readings");
const { readingSchema } = await import("@/lib/jobs/reading-schemas");
const { capacitorChecks } = await import("@/lib/jobs/part-cautions");

type M = Member;
let tech: M, apprentice: M;

beforeAll(async () => {
  ({ tech, apprentice } = await demo.seed());
});

const newJob = (title: string) =>
  jobsQ.createJob(tech, {
    title,
    equipmentKind: "television",
    maker: null,
    model: null,
    year: null,
    customerName: null,
    customerEmail: null,
    notes: null,
  } as never);
const add = (jobId: number, body: Record<string, unknown>) => readingsQ.createReading(apprentice, jobId, readingSchema.parse(body));
const checks = (jobId: number) => capacitorChecks(partsQ.listParts(tech, jobId), readingsQ.listReadings(tech, jobId));

describe("capacitor ratings against readings at their own position", () => {
  let job: number;
  beforeAll(() => {
    job = newJob("Black-and-white television, 1950s").id;
    const cap = (designator: string, replacementRating: string) =>
      ({ designator, kind: "paper", originalValue: null, originalRating: "250 V", replacementValue: null, replacementRating, state: "to-order" }) as const;
    // Seven capacitors, none rated anywhere near a CRT anode (the issue's case).
    partsQ.createParts(tech, job, [
      cap("C1", "630 V"),
      cap("C2", "630 V"),
      cap("C5", "630 V"),
      cap("C8", "630 V"),
      cap("C12", "350 V"),
      cap("C20", "630 V"),
      cap("C21", "630 V"),
    ]);
  });

  test("a 6.6 kV anode reading linked to no capacitor flags none of the seven", () => {
    add(job, { kind: "voltage", designator: "CRT anode", nominal: "7 kV", measured: "6.6 kV", tolerance: "0.1" });
    const { cautions, notes } = checks(job);
    expect(cautions).toEqual([]);
    expect(notes.size).toBe(7);
    expect(new Set(notes.values())).toEqual(new Set(["no reading at this capacitor"]));
  });

  test("a reading linked through a test point is stored tidied and flags the capacitor it is above", () => {
    const tp = add(job, { kind: "voltage", designator: "TP3", partDesignators: " c12 ;C20 ", nominal: "350 V", measured: "380 V", tolerance: "0.1" });
    expect(tp.partDesignators).toBe("c12, C20");
    const { cautions, notes } = checks(job);
    expect(cautions.map((c) => c.designator)).toEqual(["C12"]);
    expect(cautions[0].message).toBe("C12: measured 380 V at TP3 (across C12) is above its 350 V rating. Choose a higher rating, or recheck the reading.");
    // C20 (630 V) sees the same reading and is not above its rating.
    expect(notes.get(partsQ.listParts(tech, job).find((p) => p.designator === "C20")!.id)).toBe(
      "380 V measured at TP3 (across C20), not above its 630 V rating",
    );
  });

  test("a reading named by the capacitor's own designator links to it; below its rating is not flagged", () => {
    const job2 = newJob("Table radio for own-designator links").id;
    partsQ.createParts(tech, job2, [
      {
        designator: "C7",
        kind: "electrolytic",
        originalValue: null,
        originalRating: "450 WV",
        replacementValue: null,
        replacementRating: null,
        state: "to-order",
      },
    ]);
    add(job2, { kind: "voltage", designator: "c7", nominal: "300 V", measured: "310 V", tolerance: "0.1" });
    expect(checks(job2).cautions).toEqual([]);
    add(job2, { kind: "voltage", designator: " C7 ", nominal: "300 V", measured: "-470 V", tolerance: "0.1" });
    expect(checks(job2).cautions.map((c) => c.message)).toEqual([
      "C7: measured 470 V at C7 is above the original part's 450 V rating. Choose a higher rating, or recheck the reading.",
    ]);
  });

  test("a link is for voltages only, can be cleared by a technician, and a bad list names its field", () => {
    const r = add(job, { kind: "resistor", designator: "R4", partDesignators: "C12", nominal: "470k", measured: "480k" });
    expect(r.partDesignators).toBeNull();
    const tp = readingsQ.listReadings(tech, job).find((x) => x.designator === "TP3")!;
    const cleared = readingsQ.updateReading(
      tech,
      job,
      tp.id,
      readingSchema.parse({ kind: "voltage", designator: "TP3", partDesignators: "", nominal: "350 V", measured: "380 V" }),
    );
    expect(cleared.partDesignators).toBeNull();
    expect(checks(job).cautions).toEqual([]);
    const tooLong = readingSchema.safeParse({
      kind: "voltage",
      designator: "TP4",
      partDesignators: "C12-filter-section-under-chassis",
      nominal: "1",
      measured: "1",
    });
    expect(tooLong.success).toBe(false);
    expect(tooLong.error!.issues.map((i) => i.path.join("."))).toEqual(["partDesignators"]);
  });
});
