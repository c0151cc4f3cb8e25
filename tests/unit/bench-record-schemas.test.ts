import { describe, expect, test } from "vitest";
import type { z } from "zod";
import { fieldErrors } from "@/lib/field-errors";
import { candidateUpdateSchema, faultSchema, faultUpdateSchema } from "@/lib/jobs/fault-schemas";
import { powerUpOutcomeSchema, powerUpSchema, powerUpStepSchema } from "@/lib/jobs/power-up-schemas";
import { tubeLineupSchema, tubeSchema, tubeUpdateSchema } from "@/lib/jobs/tube-schemas";

const fields = (schema: z.ZodType, value: unknown) => {
  const r = schema.safeParse(value);
  return r.success ? {} : fieldErrors(r.error);
};

describe("bench record schemas: bad input names its field", () => {
  test("tubes: type names tidied as the tables read them; bad fields named", () => {
    expect(tubeSchema.parse({ position: "V9", type: " 6sn7-gt", test: { reading: "72", minimum: 60 }, substitute: "" })).toMatchObject({
      type: "6SN7GT",
      test: { reading: 72, minimum: 60 },
      verdict: "not-tested",
      substitute: null,
    });
    expect(Object.keys(fields(tubeSchema, { position: "", type: "6SN7!", test: { reading: -1 }, verdict: "fine" })).sort()).toEqual(
      ["position", "test.minimum", "test.reading", "type", "verdict"].sort(),
    );
    expect(fields(tubeUpdateSchema, {})).toEqual({ _: "Send at least one field to change." });
  });

  test("a pasted line-up splits on spaces, commas and semicolons", () => {
    expect(tubeLineupSchema.parse({ types: "6BE6 6ba6, 6AV6;6AQ5  6X4" }).types).toEqual(["6BE6", "6BA6", "6AV6", "6AQ5", "6X4"]);
    expect(tubeLineupSchema.parse({ types: ["17bp4a", "6S4"] }).types).toEqual(["17BP4A", "6S4"]);
    expect(fields(tubeLineupSchema, { types: "  " })).toHaveProperty("types");
    expect(fields(tubeLineupSchema, { types: "6BE6 <script>" })).toHaveProperty("types");
    expect(fields(tubeLineupSchema, { types: Array(41).fill("6AU6") }).types).toMatch(/at most 40/);
  });

  test("power-ups: the limiter's own figure is required; the checklist refuses items it does not have", () => {
    expect(fields(powerUpSchema, { limiter: "series-lamp", stopCurrent: "0.8 A" })).toEqual({ lampPower: "Give the series lamp's power, like 100 W." });
    expect(fields(powerUpSchema, { limiter: "limited-supply", stopCurrent: "0.8 A" })).toHaveProperty("currentLimit");
    expect(fields(powerUpSchema, { limiter: "variac", stopCurrent: "0.8 A", checklist: { "warm-up": true } }).checklist).toMatch(/no item warm-up/);
    expect(fields(powerUpSchema, { limiter: "lamp", stopCurrent: "lots" })).toHaveProperty("limiter");
    const ok = powerUpSchema.parse({ limiter: "series-lamp", lampPower: "100 W", stopCurrent: "800 mA", checklist: { "fuse-rating": true } });
    expect(ok.stopCurrent).toBe(0.8);
    expect(ok.checklist["fuse-rating"]).toBe(true);
    expect(ok.checklist["output-loaded"]).toBe(false);
  });

  test("steps and outcomes", () => {
    expect(powerUpStepSchema.parse({ supplyVoltage: "60 V", currentDrawn: "450 mA", minutes: "5" })).toMatchObject({
      supplyVoltage: 60,
      currentDrawn: 0.45,
      minutes: 5,
    });
    expect(Object.keys(fields(powerUpStepSchema, { supplyVoltage: "abc", currentDrawn: -1 })).sort()).toEqual(["currentDrawn", "minutes", "supplyVoltage"]);
    expect(fields(powerUpOutcomeSchema, { outcome: "working" })).toHaveProperty("outcome");
  });

  test("faults and candidates", () => {
    expect(fields(faultSchema, { symptom: " " })).toHaveProperty("symptom");
    expect(faultUpdateSchema.parse({ resolution: "" })).toEqual({ resolution: null });
    expect(fields(candidateUpdateSchema, { status: "maybe" })).toHaveProperty("status");
    expect(fields(candidateUpdateSchema, { status: "cause", readingId: "x" })).toHaveProperty("readingId");
    expect(candidateUpdateSchema.parse({ status: "cause", readingId: "12" })).toEqual({ status: "cause", readingId: 12 });
  });
});
