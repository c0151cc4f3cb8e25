import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { DEFAULT_CHOKE_RESISTANCE } from "@/lib/calc/ripple-stages";
import { runCalculator } from "@/lib/calc/run";
import { calculator } from "@/lib/calc/supply-ripple";
import { calcRunner, logUniform } from "../helpers/calc";

type StageOut = { attenuation: number; rippleRms: number; dcDrop: number; current: number; resistance: number; resonantFrequency?: number; q?: number };
type Out = {
  rippleFrequency: number;
  ripplePeakToPeak: number;
  rippleRms: number;
  stages: StageOut[];
  finalRippleRms: number;
};

const { run, out, fields } = calcRunner<Out>(calculator);
const W120 = 2 * Math.PI * 120;
const base = { loadCurrent: "60mA", capacitance: "33uF", rectifier: "full-wave" };
const has = (ws: { level: string; message: string }[], level: string, re: RegExp) => ws.some((w) => w.level === level && re.test(w.message));

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
    const c = 47e-6;
    const o = out({ loadCurrent: i, capacitance: c, rectifier: "full-wave", lineFrequency: 60 });
    expect(o.rippleRms / vdc).toBeCloseTo(1 / (4 * Math.sqrt(3) * 60 * c * (vdc / i)), 12);
  });

  it("an RC section with R ≫ Xc smooths by about ωRC", () => {
    // Radiotron Designer's Handbook 4th ed., ch. 34 smoothing filters: RC section smoothing factor ≈ ωCR — from memory
    const o = out({ loadCurrent: "20mA", capacitance: "20uF", rectifier: "full-wave", stages: [{ kind: "rc", resistance: "22k", capacitance: "10uF" }] });
    expect(1 / o.stages[0].attenuation).toBeCloseTo(W120 * 22e3 * 10e-6, 1); // ≈ 166, R ≫ Xc ≈ 133 Ω
  });

  it("an LC section well above resonance smooths by ω²LC − 1, whatever a typical choke's resistance", () => {
    // Radiotron Designer's Handbook 4th ed., ch. 34: LC section smoothing factor ω²LC − 1 for a choke of
    // negligible resistance — from memory. 10 H, 20 µF at 120 Hz: ≈ 112.7.
    const ideal = W120 * W120 * 10 * 20e-6 - 1;
    const nearIdeal = out({ ...base, stages: [{ kind: "lc", inductance: "10 H", capacitance: "20 uF", resistance: "0.01" }] });
    expect(1 / nearIdeal.stages[0].attenuation).toBeCloseTo(ideal, 4);
    // A 100–300 Ω winding (common practice) changes the factor by well under 0.1 % this far from resonance.
    for (const r of [undefined, "300"]) {
      const o = out({ ...base, stages: [{ kind: "lc", inductance: "10 H", capacitance: "20 uF", resistance: r }] });
      expect(Math.abs(1 / o.stages[0].attenuation - ideal) / ideal).toBeLessThan(1e-3);
    }
  });

  it("at resonance the LC section passes Q = √(L/C)/R times the ripple: large but finite", () => {
    // Terman, Radio Engineers' Handbook, series resonance: the voltage across C at resonance is Q times
    // the applied voltage — from memory. L = 1/(ω²C) puts resonance exactly on 120 Hz.
    const c = 20e-6;
    const l = 1 / (W120 * W120 * c);
    const o = out({ ...base, stages: [{ kind: "lc", inductance: l, capacitance: c, resistance: "50" }] });
    const q = Math.sqrt(l / c) / 50;
    expect(o.stages[0].attenuation).toBeCloseTo(q, 9);
    expect(o.stages[0].q).toBeCloseTo(q, 12);
    expect(o.stages[0].resonantFrequency).toBeCloseTo(120, 9);
    // Halving the choke's resistance doubles the peak: it is the resistance that bounds it.
    const sharper = out({ ...base, stages: [{ kind: "lc", inductance: l, capacitance: c, resistance: "25" }] });
    expect(sharper.stages[0].attenuation / o.stages[0].attenuation).toBeCloseTo(2, 9);
  });
});

describe("supply-ripple: per-stage current and DC drop (Ohm's law)", () => {
  it("each stage drops its own current times its resistance; a blank current is the whole load current", () => {
    const o = out({
      loadCurrent: "60mA",
      capacitance: "40uF",
      rectifier: "full-wave",
      stages: [
        { kind: "rc", resistance: "470", capacitance: "20uF" },
        { kind: "rc", resistance: "10k", capacitance: "10uF", current: "4 mA" },
        { kind: "lc", inductance: "5H", capacitance: "10uF", current: "2mA", resistance: "250" },
      ],
    });
    expect(o.stages.map((s) => s.current)).toEqual([0.06, 0.004, 0.002]);
    expect(o.stages[0].dcDrop).toBeCloseTo(0.06 * 470, 12); // 28.2 V
    expect(o.stages[1].dcDrop).toBeCloseTo(0.004 * 10e3, 12); // 40 V, not the 600 V the whole load would give
    expect(o.stages[2].dcDrop).toBeCloseTo(0.002 * 250, 12); // 0.5 V across the winding
  });

  it("an LC stage without a resistance uses the default winding resistance, and says so", () => {
    const r = run({ ...base, stages: [{ kind: "lc", inductance: "10H", capacitance: "20uF" }] });
    const o = r.outputs as unknown as Out;
    expect(o.stages[0].resistance).toBe(DEFAULT_CHOKE_RESISTANCE);
    expect(o.stages[0].dcDrop).toBeCloseTo(0.06 * DEFAULT_CHOKE_RESISTANCE, 12);
    expect(has(r.warnings, "info", /Choke resistance not given for stage 1/)).toBe(true);
    const given = run({ ...base, stages: [{ kind: "lc", inductance: "10H", capacitance: "20uF", resistance: "180" }] });
    expect(has(given.warnings, "info", /Choke resistance not given/)).toBe(false);
  });

  it("the per-stage current does not change the ripple: the reservoir's ripple is set by the whole load", () => {
    const a = out({ ...base, stages: [{ kind: "rc", resistance: "2.2k", capacitance: "20uF" }] });
    const b = out({ ...base, stages: [{ kind: "rc", resistance: "2.2k", capacitance: "20uF", current: "3mA" }] });
    expect(b.finalRippleRms).toBe(a.finalRippleRms);
    expect(b.stages[0].dcDrop).toBeLessThan(a.stages[0].dcDrop);
  });

  it("cautions only when a later stage is given more current than the stage before it", () => {
    const wrong = run({
      ...base,
      stages: [
        { kind: "rc", resistance: "1k", capacitance: "20uF", current: "20mA" },
        { kind: "rc", resistance: "10k", capacitance: "10uF" },
      ],
    });
    expect(has(wrong.warnings, "caution", /Stage 2 is given 60 mA, more than the 20 mA through stage 1/)).toBe(true);
    const right = run({
      ...base,
      stages: [
        { kind: "rc", resistance: "1k", capacitance: "20uF" },
        { kind: "rc", resistance: "10k", capacitance: "10uF", current: "5mA" },
      ],
    });
    expect(has(right.warnings, "caution", /more than the/)).toBe(false);
  });
});

describe("supply-ripple: identities", () => {
  it("Vpp = I/(f_r·C) and the sawtooth rms is Vpp/(2√3) by direct integration", () => {
    const o = out({ loadCurrent: "100 mA", capacitance: "50 uF", rectifier: "full-wave" });
    expect(o.ripplePeakToPeak).toBeCloseTo(0.1 / (120 * 50e-6), 12); // 16.7 V
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

  it("stages chain: final ripple is the product of the reservoir ripple and every stage's fraction", () => {
    const o = out({
      ...base,
      stages: [
        { kind: "rc", resistance: "1k", capacitance: "22uF" },
        { kind: "lc", inductance: "8H", capacitance: "16uF" },
      ],
    });
    expect(o.stages[0].rippleRms).toBeCloseTo(o.rippleRms * o.stages[0].attenuation, 12);
    expect(o.finalRippleRms).toBeCloseTo(o.rippleRms * o.stages[0].attenuation * o.stages[1].attenuation, 12);
    expect(o.finalRippleRms).toBe(o.stages[1].rippleRms);
  });

  it("no stages: final ripple is the reservoir ripple", () => {
    const o = out(base);
    expect(o.stages).toEqual([]);
    expect(o.finalRippleRms).toBe(o.rippleRms);
  });
});

describe("supply-ripple: warnings fire only when they should", () => {
  it("always warns of danger: no voltage is an input, and a B+ filter is high voltage", () => {
    expect(run(base).warnings.filter((w) => w.level === "danger")).toHaveLength(1);
  });

  it("the resonance caution fires above a third of the ripple frequency, not below", () => {
    // Common practice: keep the LC resonance at a third of the ripple frequency or lower.
    const c = 20e-6;
    const lFor = (f0: number) => 1 / ((2 * Math.PI * f0) ** 2 * c);
    const below = run({ ...base, stages: [{ kind: "lc", inductance: lFor(38), capacitance: c }] }); // 38 Hz < 40 Hz
    expect(has(below.warnings, "caution", /resonate/)).toBe(false);
    const above = run({ ...base, stages: [{ kind: "lc", inductance: lFor(42), capacitance: c }] }); // reduces, but little
    expect(has(above.warnings, "caution", /resonate at 42 Hz, near the 120 Hz.*passes 0\.\d+ of the ripple/)).toBe(true);
    const magnifies = run({ ...base, stages: [{ kind: "lc", inductance: "0.1H", capacitance: "10uF" }] }); // f0 ≈ 159 Hz
    expect(has(magnifies.warnings, "caution", /above the 120 Hz ripple frequency, so this stage multiplies the ripple/)).toBe(true);
    expect((magnifies.outputs as unknown as Out).stages[0].attenuation).toBeGreaterThan(1);
  });

  it("an LC stage exactly on resonance is worked out, not refused, and the caution names its Q", () => {
    const c = 20e-6;
    const r = run({ ...base, stages: [{ kind: "lc", inductance: 1 / (W120 * W120 * c), capacitance: c, resistance: "100" }] });
    const q = Math.sqrt(1 / (W120 * W120 * c) / c) / 100;
    expect(has(r.warnings, "caution", new RegExp(`Q = ${q.toPrecision(3).replace(".", "\\.")} times`))).toBe(true);
  });

  it("warns when the reservoir exceeds the rectifier tube's maximum input capacitance, and only then", () => {
    // 5Y3GT data sheet (RCA receiving tube manual): filter-input capacitor 20 µF max — from memory.
    const big = run({ ...base, capacitance: "40uF", rectifierTube: "5Y3GT" });
    expect(has(big.warnings, "caution", /40 µF reservoir is larger than the 20 µF the 5Y3GT data sheet allows/)).toBe(true);
    const atLimit = run({ ...base, capacitance: "20uF", rectifierTube: "5y3" });
    expect(has(atLimit.warnings, "caution", /reservoir is larger/)).toBe(false);
    // GZ34/5AR4 data sheet: 60 µF max — from memory. The same 40 µF is within it.
    const gz34 = run({ ...base, capacitance: "40uF", rectifierTube: "GZ34" });
    expect(has(gz34.warnings, "caution", /reservoir is larger/)).toBe(false);
    expect(has(run({ ...base, capacitance: "40uF" }).warnings, "caution", /reservoir is larger/)).toBe(false);
  });

  it("warns when the load is above the tube's rated DC output, and only then", () => {
    // 5Y3GT: 125 mA DC output with a capacitor-input filter (RCA data, from memory).
    expect(
      has(run({ ...base, capacitance: "20uF", loadCurrent: "150mA", rectifierTube: "5Y3GT" }).warnings, "caution", /150 mA load is more than the 125 mA/),
    ).toBe(true);
    expect(has(run({ ...base, capacitance: "20uF", loadCurrent: "120mA", rectifierTube: "5Y3GT" }).warnings, "caution", /load is more than/)).toBe(false);
  });

  it("a half-wave tube with full-wave chosen gets a note; the echoed input is the table's type name", () => {
    const r = run({ ...base, rectifierTube: "35w4" });
    expect((r.inputs as { rectifierTube: string }).rectifierTube).toBe("35W4");
    expect(has(r.warnings, "info", /35W4 is a half-wave rectifier/)).toBe(true);
    expect(has(run({ ...base, rectifier: "half-wave", rectifierTube: "35W4" }).warnings, "info", /is a half-wave rectifier/)).toBe(false);
  });
});

describe("supply-ripple: validation", () => {
  it("nested fields are reported by path", () => {
    const f = fields({
      ...base,
      stages: [
        { kind: "rc", resistance: "1k", capacitance: "22uF" },
        { kind: "rc", resistance: "-5", capacitance: "1 H" },
      ],
    });
    expect(f["stages.1.resistance"]).toBeTruthy();
    expect(f["stages.1.capacitance"]).toMatch(/capacitance/);
  });

  it("an unknown stage kind, rectifier or rectifier tube is rejected under its name", () => {
    expect(fields({ ...base, stages: [{ kind: "pi" }] })["stages.0.kind"]).toMatch(/rc|lc/);
    expect(fields({ ...base, rectifier: "bridge" }).rectifier).toBeTruthy();
    expect(fields({ ...base, rectifierTube: "5Z9" }).rectifierTube).toMatch(/not in the built-in table.*5Y3GT/);
  });

  it("a stage current above the load current, or a choke of zero resistance, is refused under its path", () => {
    expect(fields({ ...base, stages: [{ kind: "rc", resistance: "1k", capacitance: "20uF", current: "80mA" }] })["stages.0.current"]).toMatch(
      /cannot be more than the 60 mA load current/,
    );
    expect(fields({ ...base, stages: [{ kind: "lc", inductance: "10H", capacitance: "20uF", resistance: 0 }] })["stages.0.resistance"]).toMatch(
      /greater than zero/,
    );
    expect(fields({ ...base, stages: [{ kind: "lc", inductance: "10H", capacitance: "20uF", current: "5 V" }] })["stages.0.current"]).toMatch(/current/);
  });
});

describe("supply-ripple: properties", () => {
  const rc = fc.record({ kind: fc.constant("rc" as const), resistance: logUniform(1e-3, 1e9), capacitance: logUniform(1e-12, 10) });
  const lc = fc.record({
    kind: fc.constant("lc" as const),
    inductance: logUniform(1e-6, 1e4),
    capacitance: logUniform(1e-12, 10),
    resistance: fc.option(logUniform(1e-3, 1e6), { nil: undefined }),
  });
  const valid = fc.record({
    loadCurrent: logUniform(1e-6, 100),
    capacitance: logUniform(1e-9, 10),
    lineFrequency: logUniform(1, 10_000),
    rectifier: fc.constantFrom("full-wave", "half-wave"),
    stages: fc.array(fc.tuple(fc.oneof(rc, lc), fc.option(fc.double({ min: 0, max: 1, noNaN: true }), { nil: undefined })), { maxLength: 10 }),
  });
  // A stage current as a fraction of the load: every such input is valid.
  type Generated = { loadCurrent: number; stages: [Record<string, unknown>, number | undefined][] };
  const toRaw = (v: Generated & Record<string, unknown>) => ({
    ...v,
    stages: v.stages.map(([s, frac]) => (frac === undefined ? s : { ...s, current: Math.max(1e-6, frac * v.loadCurrent) })),
  });

  it("valid input is never refused and never yields NaN or Infinity; RC stages never amplify", () => {
    fc.assert(
      fc.property(valid, (v) => {
        const raw = toRaw(v);
        const o = out(raw);
        const nums = [o.rippleFrequency, o.ripplePeakToPeak, o.rippleRms, o.finalRippleRms, ...o.stages.flatMap((s) => [s.attenuation, s.rippleRms, s.dcDrop])];
        for (const x of nums) expect(Number.isFinite(x)).toBe(true);
        o.stages.forEach((s, k) => {
          if (raw.stages[k].kind === "rc") expect(s.attenuation).toBeLessThanOrEqual(1);
          expect(s.dcDrop).toBeCloseTo(s.current * s.resistance, 9); // Ohm's law, stage by stage
        });
      }),
    );
  });

  it("an LC stage never amplifies well above resonance (ω²LC ≥ 2) and never beyond its resonant peak", () => {
    fc.assert(
      fc.property(logUniform(1, 10_000), lc, (line, s) => {
        const o = out({ loadCurrent: 0.05, capacitance: 4e-5, lineFrequency: line, rectifier: "full-wave", stages: [s] });
        const w = 2 * Math.PI * 2 * line;
        const h = o.stages[0].attenuation;
        if (w * w * s.inductance * s.capacitance >= 2) expect(h).toBeLessThanOrEqual(1 + 1e-12);
        // Second-order low-pass: the peak over all frequencies is Q/√(1 − 1/(4Q²)) for Q > 1/√2, else 1.
        const q = o.stages[0].q!;
        const peak = q > Math.SQRT1_2 ? q / Math.sqrt(1 - 1 / (4 * q * q)) : 1;
        expect(h).toBeLessThanOrEqual(peak * (1 + 1e-9));
      }),
    );
  });

  const bad = fc.oneof(fc.double({ max: 0, noNaN: true }), fc.constant("zz"), fc.constant("2 V"));

  it("bad top-level input gives ok:false under its name", () => {
    fc.assert(
      fc.property(fc.constantFrom("loadCurrent", "capacitance", "lineFrequency"), bad, (name, value) => {
        expect(typeof fields({ loadCurrent: 0.1, capacitance: 4e-5, rectifier: "full-wave", [name]: value })[name]).toBe("string");
      }),
    );
    expect(runCalculator(calculator, { loadCurrent: 0.1, capacitance: 4e-5, rectifier: "full-wave", lineFrequency: "" }).ok).toBe(true); // blank: 60 Hz
  });

  it("bad stage input gives ok:false under its nested path", () => {
    fc.assert(
      fc.property(fc.nat({ max: 3 }), fc.constantFrom("resistance", "capacitance", "current"), bad, (at, name, value) => {
        const stages = Array.from({ length: 4 }, () => ({ kind: "rc", resistance: "1k", capacitance: "10u" }) as Record<string, unknown>);
        stages[at][name] = value;
        expect(typeof fields({ loadCurrent: 0.1, capacitance: 4e-5, rectifier: "full-wave", stages })[`stages.${at}.${name}`]).toBe("string");
      }),
    );
  });
});
