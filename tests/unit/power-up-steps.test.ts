import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { POWER_UP_CHECKLIST } from "@/lib/vocabulary";
import { checklistWarnings, niceCeiling, outcomeRefusal, plotData, plotPoints, stepWarnings } from "@/lib/jobs/power-up-steps";

// A stepped series-lamp bring-up of a television (common practice: raise the variac in steps, hold, watch the lamp).
const steps = [
  { supplyVoltage: 40, currentDrawn: 0.32 },
  { supplyVoltage: 60, currentDrawn: 0.45 },
  { supplyVoltage: 80, currentDrawn: 0.95 },
  { supplyVoltage: 70, currentDrawn: 0.55 },
  { supplyVoltage: 117, currentDrawn: 0.78 },
];

describe("power-up steps", () => {
  test("a step above the stop current is danger; at the stop current it is not over; close to it is a caution", () => {
    expect(stepWarnings({ supplyVoltage: 80, currentDrawn: 0.95 }, 0.8)).toEqual([expect.objectContaining({ level: "danger" })]);
    expect(stepWarnings({ supplyVoltage: 80, currentDrawn: 0.95 }, 0.8)[0].message).toContain("above the 0.8 A stop current");
    expect(stepWarnings({ supplyVoltage: 80, currentDrawn: 0.8 }, 0.8)).toEqual([expect.objectContaining({ level: "caution" })]);
    expect(stepWarnings({ supplyVoltage: 60, currentDrawn: 0.45 }, 0.8)).toEqual([]);
    expect(stepWarnings({ supplyVoltage: 60, currentDrawn: 5 }, null)).toEqual([]);
  });

  test("the plot's points follow the steps in the order taken, a step back down included", () => {
    const pts = plotPoints(steps, 0.8);
    expect(pts.map((p) => [p.supplyVoltage, p.currentDrawn])).toEqual(steps.map((s) => [s.supplyVoltage, s.currentDrawn]));
    expect(pts.map((p) => p.overStop)).toEqual([false, false, true, false, false]);
  });

  test("the plot's axes are tidy and always take in the stop current and every point", () => {
    const data = plotData(steps, 0.8);
    expect(data.maxVoltage).toBe(200);
    expect(data.maxCurrent).toBe(1);
    expect(plotData([{ supplyVoltage: 30, currentDrawn: 0.1 }], 1.5).maxCurrent).toBe(2);
    expect(plotData([], null)).toEqual({ points: [], stopCurrent: null, maxVoltage: 1, maxCurrent: 1 });
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 1e6, noNaN: true }), (x) => {
        const c = niceCeiling(x);
        expect(c).toBeGreaterThanOrEqual(x * (1 - 1e-12));
        expect(c).toBeLessThanOrEqual(x * 10);
      }),
    );
  });

  test("unticked checklist items are cautions, one per item, in the checklist's order; a moved session has none", () => {
    expect(checklistWarnings({})).toHaveLength(POWER_UP_CHECKLIST.length);
    const some = checklistWarnings({ "filters-replaced": true, "caps-discharged": true, "fuse-rating": true });
    expect(some.map((w) => w.id)).toEqual(["hv-lead-dressed", "no-bplus-short", "tubes-seated", "output-loaded"]);
    expect(some.every((w) => w.level === "caution")).toBe(true);
    expect(some[1].message).toBe("Not done before first power: no short on B+, measured with an ohmmeter.");
    expect(checklistWarnings(Object.fromEntries(POWER_UP_CHECKLIST.map((c) => [c.id, true])))).toEqual([]);
    expect(checklistWarnings(null)).toEqual([]);
  });

  test("passed needs a reason only when a step went over the stop current; stopped never does", () => {
    expect(outcomeRefusal("passed", null, steps, 0.8)).toMatch(/A step went over the 0.8 A stop current/);
    expect(outcomeRefusal("passed", "  ", steps, 0.8)).not.toBeNull();
    expect(outcomeRefusal("passed", "Surge from the reformed filter; settled at 0.55 A.", steps, 0.8)).toBeNull();
    expect(outcomeRefusal("stopped", null, steps, 0.8)).toBeNull();
    expect(
      outcomeRefusal(
        "passed",
        null,
        steps.filter((s) => s.currentDrawn <= 0.8),
        0.8,
      ),
    ).toBeNull();
  });
});
