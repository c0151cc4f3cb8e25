import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { AB_IDLE_MARGIN, calculator } from "@/lib/calc/plate-dissipation";
import { runCalculator } from "@/lib/calc/run";
import { RECEIVING_TUBES } from "@/lib/calc/tables/tubes";
import { calcRunner, logUniform } from "../helpers/calc";

type Out = { dissipation: number; fractionOfMax: number; ratedDissipation: number; screenDissipation: number | null; screenFractionOfMax: number | null };

const { run, out, fields } = calcRunner<Out>(calculator);
const has = (r: ReturnType<typeof run>, level: string, re: RegExp) => r.warnings.some((w) => w.level === level && re.test(w.message));

describe("plate-dissipation: checks against published data", () => {
  it("6V6GT class A at 250 V, 45 mA, fixed bias: 11.25 W, 94 % of its 12 W", () => {
    // RCA receiving tube manual, 6V6GT: class A1 typical operation 250 V, 45 mA; maximum plate dissipation 12 W (from memory)
    const o = out({ plateVoltage: "250 V", plateCurrent: "45 mA", tube: "6V6GT" });
    expect(o.dissipation).toBeCloseTo(11.25, 12);
    expect(o.ratedDissipation).toBe(12);
    expect(o.fractionOfMax).toBeCloseTo(0.9375, 12);
  });

  it("EL84 class A, cathode bias: 250 V plate, 7.2 V cathode, 48 mA; screen 250 V at 5.5 mA", () => {
    // EL84 data sheet, single-ended class A typical operation: Va 250 V, Ia 48 mA, Vg2 250 V, Ig2 5.5 mA, Rk 135 Ω (from memory); Pa max 12 W, Pg2 max 2 W
    const vk = 135 * (0.048 + 0.0055);
    const o = out({ plateVoltage: 250, cathodeVoltage: vk, plateCurrent: "48m", tube: "EL84", screenVoltage: 250, screenCurrent: "5.5m", stageClass: "A" });
    expect(o.dissipation).toBeCloseTo((250 - vk) * 0.048, 12);
    expect(o.dissipation).toBeCloseTo(11.65, 2);
    expect(o.fractionOfMax).toBeCloseTo(0.971, 3);
    expect(o.screenDissipation).toBeCloseTo((250 - vk) * 0.0055, 12);
    expect(o.screenFractionOfMax).toBeCloseTo(((250 - vk) * 0.0055) / 2, 12);
  });

  it("12AX7 section at 250 V, 2 V cathode, 1.2 mA: 0.30 W, 30 % of 1 W per section", () => {
    // RCA 12AX7: typical 250 V, −2 V, 1.2 mA; maximum 1 W per section (from memory)
    const r = run({ plateVoltage: 250, cathodeVoltage: 2, plateCurrent: "1.2 mA", tube: "12ax7" });
    expect(r.outputs.dissipation).toBeCloseTo(0.2976, 12);
    expect(r.outputs.fractionOfMax).toBeCloseTo(0.2976, 12);
    expect(has(r, "info", /per section/)).toBe(true);
    expect(r.warnings.some((w) => w.level === "caution")).toBe(false);
  });

  it("6L6GC class AB push-pull idling at 450 V, 60 mA: 27 W, 90 % — a caution against the 70 % common practice", () => {
    // RCA 6L6GC: maximum plate dissipation 30 W (from memory); 70 % idle for class AB is common practice
    const r = run({ plateVoltage: 450, plateCurrent: "60 mA", tube: "6L6GC", stageClass: "AB" });
    expect(r.outputs.fractionOfMax).toBeCloseTo(0.9, 12);
    expect(has(r, "caution", /Above 70 % of the data-sheet maximum, the most a push-pull class AB/)).toBe(true);
    expect(has(r, "danger", /beyond its rating/)).toBe(false);
  });
});

describe("plate-dissipation: warnings", () => {
  it("above 100 % is a danger; class A near the maximum is information, not a caution; never 'safe'", () => {
    const over = run({ plateVoltage: 350, plateCurrent: "50 mA", tube: "6V6GT" }); // 17.5 W on a 12 W tube
    expect(has(over, "danger", /beyond its rating/)).toBe(true);
    expect(has(over, "caution", /maximum plate voltage/)).toBe(true); // 350 V above the 6V6GT's 315 V (table)
    const classA = run({ plateVoltage: 250, plateCurrent: "45 mA", tube: "6V6GT", stageClass: "A" });
    expect(classA.warnings.some((w) => w.level === "caution")).toBe(false);
    expect(has(classA, "info", /single-ended class A/)).toBe(true);
    for (const w of [...over.warnings, ...classA.warnings]) expect(w.message).not.toMatch(/\bsafe\b/i);
    expect(has(classA, "danger", /Lethal voltage/)).toBe(true);
    expect(run({ plateVoltage: 12.6, plateCurrent: "1 mA", maxDissipation: 1 }).warnings.some((w) => w.level === "danger")).toBe(false);
  });

  it("maxDissipation overrides the table; a screen beyond its rating is a danger", () => {
    const r = run({ plateVoltage: 300, plateCurrent: "40 mA", tube: "6V6GT", maxDissipation: "14 W", screenVoltage: 300, screenCurrent: "10 mA" });
    expect(r.outputs.ratedDissipation).toBe(14);
    expect(r.outputs.fractionOfMax).toBeCloseTo(12 / 14, 12);
    expect(r.outputs.screenFractionOfMax).toBeCloseTo(1.5, 12); // 3 W on the table's 2 W
    expect(has(r, "danger", /screen dissipates/)).toBe(true);
    expect(has(r, "info", /built-in table/)).toBe(false);
  });
});

describe("plate-dissipation: identities and properties", () => {
  const tube = fc.constantFrom(...RECEIVING_TUBES.map((t) => t.type));

  it("property: P = (Vp − Vk)·Ip; fraction = P / rated; warnings follow the fraction", () => {
    fc.assert(
      fc.property(logUniform(1, 1000), fc.double({ min: 0, max: 0.5, noNaN: true }), logUniform(1e-5, 0.3), tube, (vp, kFrac, ip, type) => {
        const vk = vp * kFrac;
        const r = run({ plateVoltage: vp, cathodeVoltage: vk, plateCurrent: ip, tube: type });
        const o = r.outputs as unknown as Out;
        const rated = RECEIVING_TUBES.find((t) => t.type === type)!.maxPlateDissipation;
        expect(o.dissipation / ((vp - vk) * ip)).toBeCloseTo(1, 12);
        expect(o.ratedDissipation).toBe(rated);
        expect(o.fractionOfMax * rated).toBeCloseTo(o.dissipation, 9);
        expect(has(r, "danger", /beyond its rating/)).toBe(o.fractionOfMax > 1);
        expect(has(r, "caution", /class AB/)).toBe(o.fractionOfMax > AB_IDLE_MARGIN && o.fractionOfMax <= 1);
        expect(o.screenDissipation).toBeNull();
      }),
    );
  });

  it("property: doubling the current doubles the dissipation; the cathode voltage only ever lowers it", () => {
    fc.assert(
      fc.property(logUniform(60, 600), logUniform(1e-4, 0.1), fc.double({ min: 0, max: 50, noNaN: true }), (vp, ip, vk) => {
        const a = out({ plateVoltage: vp, plateCurrent: ip, maxDissipation: 10 });
        expect(out({ plateVoltage: vp, plateCurrent: 2 * ip, maxDissipation: 10 }).dissipation / a.dissipation).toBeCloseTo(2, 12);
        expect(out({ plateVoltage: vp, cathodeVoltage: vk, plateCurrent: ip, maxDissipation: 10 }).dissipation).toBeLessThanOrEqual(a.dissipation);
      }),
    );
  });
});

describe("plate-dissipation: refusals", () => {
  it("tube or maximum; known receiving tubes only; cathode below plate; screen figures in pairs", () => {
    expect(fields({ plateVoltage: 250, plateCurrent: "45m" }).tube).toMatch(/maximum plate dissipation/);
    expect(fields({ plateVoltage: 250, plateCurrent: "45m", tube: "6ZZ9" }).tube).toMatch(/not in the built-in table/);
    expect(fields({ plateVoltage: 250, plateCurrent: "45m", tube: "17BP4A" }).tube).toMatch(/picture tube/);
    expect(fields({ plateVoltage: 250, plateCurrent: "45m", tube: "5Y3GT" }).tube).toMatch(/not in the built-in table/);
    expect(fields({ plateVoltage: 250, cathodeVoltage: 250, plateCurrent: "45m", tube: "6V6GT" }).cathodeVoltage).toMatch(/below the plate/);
    expect(fields({ plateVoltage: 250, plateCurrent: "45m", tube: "6V6GT", screenVoltage: 250 }).screenCurrent).toMatch(/required/);
    expect(fields({ plateVoltage: 250, plateCurrent: "45m", tube: "6V6GT", screenCurrent: "4m" }).screenVoltage).toMatch(/required/);
    expect(fields({ plateVoltage: 250, plateCurrent: "45m", tube: "6V6GT", stageClass: "B" }).stageClass).toMatch(/"A" or "AB"/);
    expect(out({ plateVoltage: 250, plateCurrent: "45m", tube: "6V6GT", stageClass: "" }).fractionOfMax).toBeCloseTo(0.9375, 12);
    expect(run({ plateVoltage: 250, plateCurrent: "45m", tube: "6V6GT", stageClass: "class a" }).warnings.some((w) => w.level === "caution")).toBe(false);
  });

  it("property: bad numbers are refused under their own field", () => {
    const bad = fc.constantFrom("", "abc", "5 Ω", Number.NaN, Number.POSITIVE_INFINITY, -5, 0);
    fc.assert(
      fc.property(fc.constantFrom("plateVoltage", "plateCurrent", "maxDissipation"), bad, (name, x) => {
        const r = runCalculator(calculator, { plateVoltage: 250, plateCurrent: "45m", maxDissipation: 12, [name]: x });
        expect(r.ok).toBe(false);
        if (!r.ok) expect(r.error.fields).toHaveProperty(name === "maxDissipation" ? (x === "" ? "tube" : name) : name);
      }),
    );
  });
});
