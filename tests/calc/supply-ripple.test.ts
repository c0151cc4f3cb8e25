import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { runCalculator } from "@/lib/calc/run";
import { calculator } from "@/lib/calc/supply-ripple";
import { calcRunner, logUniform } from "../helpers/calc";

type StageOut = { attenuation: number; rippleRms: number; dcDrop: number };
type Out = {
  rippleFrequency: number;
  ripplePeakToPeak: number;
  rippleRms: number;
  stages: StageOut[];
  finalRippleRms: number;
};

const { run, out } = calcRunner<Out>(calculator);

describe("supply-ripple: published checks", () => {
  it("full-wave ripples at twice the mains frequency, half-wave at the mains frequency", () => {
    // ARRL Handbook, power supplies chapter: full-wave ripple at 120 Hz on 60 Hz mains — from memory
    expect(out({ loadCurrent: "50mA", capacitance: "40uF", rectifier: "full-wave" }).rippleFrequency).toBe(120);
    expect(out({ loadCurrent: "50mA", capacitance: "40uF", rectifier: "half-wave", lineFrequency: "50 Hz" }).rippleFrequency).toBe(50);
  });

  it("matches the textbook ripple factor of a full-wave capacitor filter, r = 1/(4√3·f·C·R_L)", () => {
    // Millman & Halkias, Electronic Devices and Circuits, capacitor filter ripple factor — from memory;
    // the same result as the Radiotron Designer's Handbook 4th ed. reservoir-ripple approximation.
    const vdc = 300;
    const i = 0.075;
    const rl = vdc / i;
    const c = 47e-6;
    const o = out({ loadCurrent: i, capacitance: c, rectifier: "full-wave", lineFrequency: 60 });
    expect(o.rippleRms / vdc).toBeCloseTo(1 / (4 * Math.sqrt(3) * 60 * c * rl), 12);
  });

  it("an RC section with R ≫ Xc smooths by about ωRC", () => {
    // Radiotron Designer's Handbook 4th ed., filtering chapter: RC section smoothing factor ≈ ωCR — from memory
    const o = out({ loadCurrent: "20mA", capacitance: "20uF", rectifier: "full-wave", stages: [{ kind: "rc", resistance: "22k", capacitance: "10uF" }] });
    const omega = 2 * Math.PI * 120;
    expect(1 / o.stages[0].attenuation).toBeCloseTo(omega * 22e3 * 10e-6, 1); // ≈ 166, R ≫ Xc ≈ 133 Ω
  });

  it("an LC section smooths by ω²LC − 1", () => {
    // Radiotron Designer's Handbook 4th ed., filtering chapter: LC section filter factor 1/(ω²LC − 1) — from memory
    const o = out({ loadCurrent: "100mA", capacitance: "40uF", rectifier: "full-wave", stages: [{ kind: "lc", inductance: "10 H", capacitance: "20 uF" }] });
    const omega = 2 * Math.PI * 120;
    expect(1 / o.stages[0].attenuation).toBeCloseTo(omega * omega * 10 * 20e-6 - 1, 6); // ≈ 112.7
    expect(o.stages[0].dcDrop).toBe(0);
  });
});

describe("supply-ripple: identities", () => {
  it("Vpp = I/(f_r·C) and the sawtooth rms is Vpp/(2√3) by direct integration", () => {
    const o = out({ loadCurrent: "100 mA", capacitance: "50 uF", rectifier: "full-wave" });
    expect(o.ripplePeakToPeak).toBeCloseTo(0.1 / (120 * 50e-6), 12); // 16.7 V
    // numerical rms of a zero-mean sawtooth of the same peak-to-peak
    const n = 100_000;
    let sum = 0;
    for (let k = 0; k < n; k++) {
      const v = o.ripplePeakToPeak * ((k + 0.5) / n - 0.5);
      sum += v * v;
    }
    expect(o.rippleRms).toBeCloseTo(Math.sqrt(sum / n), 6);
  });

  it("half-wave doubles the ripple of full-wave", () => {
    const fw = out({ loadCurrent: 0.05, capacitance: 40e-6, rectifier: "full-wave" });
    const hw = out({ loadCurrent: 0.05, capacitance: 40e-6, rectifier: "half-wave" });
    expect(hw.ripplePeakToPeak / fw.ripplePeakToPeak).toBeCloseTo(2, 12);
  });

  it("stages chain: final ripple is the product, RC drop is I·R", () => {
    const o = out({
      loadCurrent: "60mA",
      capacitance: "33uF",
      rectifier: "full-wave",
      stages: [
        { kind: "rc", resistance: "1k", capacitance: "22uF" },
        { kind: "lc", inductance: "8H", capacitance: "16uF" },
      ],
    });
    expect(o.stages[0].dcDrop).toBeCloseTo(60, 9);
    expect(o.stages[0].rippleRms).toBeCloseTo(o.rippleRms * o.stages[0].attenuation, 12);
    expect(o.finalRippleRms).toBeCloseTo(o.rippleRms * o.stages[0].attenuation * o.stages[1].attenuation, 12);
    expect(o.finalRippleRms).toBe(o.stages[1].rippleRms);
  });

  it("no stages: final ripple is the reservoir ripple", () => {
    const o = out({ loadCurrent: "60mA", capacitance: "33uF", rectifier: "full-wave" });
    expect(o.stages).toEqual([]);
    expect(o.finalRippleRms).toBe(o.rippleRms);
  });

  it("always warns of danger; cautions when an LC stage resonates near the ripple frequency", () => {
    const fine = run({ loadCurrent: "60mA", capacitance: "33uF", rectifier: "full-wave", stages: [{ kind: "lc", inductance: "10H", capacitance: "20uF" }] });
    expect(fine.warnings.some((w) => w.level === "danger")).toBe(true);
    expect(fine.warnings.some((w) => w.level === "caution" && /resonate/.test(w.message))).toBe(false);
    const near = run({ loadCurrent: "60mA", capacitance: "33uF", rectifier: "full-wave", stages: [{ kind: "lc", inductance: "0.1H", capacitance: "10uF" }] });
    // f0 = 1/(2π√(1e-6)) ≈ 159 Hz, above 120 Hz: magnifies
    expect(near.warnings.some((w) => w.level === "caution" && /resonate/.test(w.message))).toBe(true);
    expect((near.outputs as unknown as Out).stages[0].attenuation).toBeGreaterThan(1);
  });
});

describe("supply-ripple: validation", () => {
  it("nested fields are reported by path", () => {
    const r = runCalculator(calculator, {
      loadCurrent: "60mA",
      capacitance: "33uF",
      rectifier: "full-wave",
      stages: [{ kind: "rc", resistance: "1k", capacitance: "22uF" }, { kind: "rc", resistance: "-5", capacitance: "1 H" }],
    });
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.fields["stages.1.resistance"]).toBeTruthy();
      expect(r.error.fields["stages.1.capacitance"]).toMatch(/capacitance/);
    }
  });

  it("an unknown stage kind or rectifier is rejected", () => {
    const a = runCalculator(calculator, { loadCurrent: 0.1, capacitance: 4e-5, rectifier: "full-wave", stages: [{ kind: "pi" }] });
    expect(a.ok).toBe(false);
    if (!a.ok) expect(a.error.fields["stages.0.kind"]).toMatch(/rc|lc/);
    const b = runCalculator(calculator, { loadCurrent: 0.1, capacitance: 4e-5, rectifier: "bridge" });
    expect(b.ok).toBe(false);
    if (!b.ok) expect(b.error.fields.rectifier).toBeTruthy();
  });

  it("an LC stage resonating exactly at the ripple frequency is rejected under its inductance", () => {
    const l = 1 / ((2 * Math.PI * 120) ** 2 * 20e-6);
    const r = runCalculator(calculator, { loadCurrent: 0.1, capacitance: 4e-5, rectifier: "full-wave", stages: [{ kind: "lc", inductance: l, capacitance: 20e-6 }] });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.fields["stages.0.inductance"]).toMatch(/resonate/);
  });
});

describe("supply-ripple: properties", () => {
  const rc = fc.record({ kind: fc.constant("rc" as const), resistance: logUniform(1e-3, 1e9), capacitance: logUniform(1e-12, 10) });
  const lc = fc.record({ kind: fc.constant("lc" as const), inductance: logUniform(1e-6, 1e4), capacitance: logUniform(1e-12, 10) });
  const valid = fc.record({
    loadCurrent: logUniform(1e-6, 100),
    capacitance: logUniform(1e-9, 10),
    lineFrequency: logUniform(1, 10_000),
    rectifier: fc.constantFrom("full-wave", "half-wave"),
    stages: fc.array(fc.oneof(rc, lc), { maxLength: 10 }),
  });

  it("valid input never yields NaN or Infinity; RC stages never amplify", () => {
    fc.assert(
      fc.property(valid, (v) => {
        const r = runCalculator(calculator, v);
        if (!r.ok) {
          // the only rejection allowed for these ranges: an LC stage sitting on resonance
          expect(Object.values(r.error.fields).every((m) => /resonate/.test(m))).toBe(true);
          return;
        }
        const o = r.result.outputs as unknown as Out;
        const nums = [o.rippleFrequency, o.ripplePeakToPeak, o.rippleRms, o.finalRippleRms, ...o.stages.flatMap((s) => [s.attenuation, s.rippleRms, s.dcDrop])];
        for (const x of nums) expect(Number.isFinite(x)).toBe(true);
        o.stages.forEach((s, k) => {
          if (v.stages[k].kind === "rc") expect(s.attenuation).toBeLessThanOrEqual(1);
        });
      }),
    );
  });

  const bad = fc.oneof(fc.double({ max: 0, noNaN: true }), fc.constant("zz"), fc.constant(""), fc.constant("2 V"));

  it("bad top-level input gives ok:false under its name", () => {
    fc.assert(
      fc.property(fc.constantFrom("loadCurrent", "capacitance", "lineFrequency"), bad, (name, value) => {
        const r = runCalculator(calculator, { loadCurrent: 0.1, capacitance: 4e-5, rectifier: "full-wave", [name]: value });
        if (name === "lineFrequency" && value === "") {
          expect(r.ok).toBe(true); // blank takes the 60 Hz default
          return;
        }
        expect(r.ok).toBe(false);
        if (!r.ok) expect(typeof r.error.fields[name]).toBe("string");
      }),
    );
  });

  it("bad stage input gives ok:false under its nested path", () => {
    fc.assert(
      fc.property(fc.nat({ max: 3 }), fc.constantFrom("resistance", "capacitance"), bad, (at, name, value) => {
        const stages = Array.from({ length: 4 }, () => ({ kind: "rc", resistance: "1k", capacitance: "10u" }) as Record<string, unknown>);
        stages[at][name] = value;
        const r = runCalculator(calculator, { loadCurrent: 0.1, capacitance: 4e-5, rectifier: "full-wave", stages });
        expect(r.ok).toBe(false);
        if (!r.ok) expect(typeof r.error.fields[`stages.${at}.${name}`]).toBe("string");
      }),
    );
  });
});
