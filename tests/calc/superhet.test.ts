import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { runCalculator } from "@/lib/calc/run";
import { calculator } from "@/lib/calc/superhet";
import { calcRunner, logUniform } from "../helpers/calc";

type Out = {
  oscillatorFrequency: number;
  imageFrequency: number;
  imageSeparation: number;
  imageRejection: number | null;
  imageRejectionDb: number | null;
};

const { run, out, fields } = calcRunner<Out>(calculator);

describe("superhet: checks against published worked examples", () => {
  it("1000 kHz with a 455 kHz IF: oscillator 1455 kHz, image 1910 kHz", () => {
    // Kennedy & Davis, Electronic Communication Systems, receivers chapter worked example (from memory)
    const o = out({ signalFrequency: "1000 kHz" });
    expect(o.oscillatorFrequency).toBeCloseTo(1455e3, 6);
    expect(o.imageFrequency).toBeCloseTo(1910e3, 6);
    expect(o.imageSeparation).toBeCloseTo(910e3, 6);
    expect(o.imageRejection).toBeNull();
  });

  it("image rejection with a loaded Q of 100: 138.6 at 1000 kHz, only 7.22 at 25 MHz", () => {
    // Kennedy & Davis, same example: α = √(1 + Q²ρ²); 138.6 at 1000 kHz, image 25.91 MHz and 7.22 at 25 MHz (from memory)
    const mw = out({ signalFrequency: "1000 kHz", intermediateFrequency: "455 kHz", loadedQ: 100 });
    expect(mw.imageRejection!).toBeCloseTo(138.6, 1);
    const sw = run({ signalFrequency: "25 MHz", intermediateFrequency: "455 kHz", loadedQ: 100 });
    expect(sw.outputs.imageFrequency).toBeCloseTo(25.91e6, 3);
    expect(sw.outputs.imageRejection as number).toBeCloseTo(7.22, 2);
    expect(sw.outputs.imageRejectionDb as number).toBeCloseTo(20 * Math.log10(7.2216), 2);
    // 17 dB: heard twice, and it says so; 42.8 dB at 1000 kHz draws no caution
    expect(sw.warnings.some((w) => w.level === "caution" && /17\.2 dB/.test(w.message))).toBe(true);
    expect(run({ signalFrequency: "1000 kHz", loadedQ: 100 }).warnings.some((w) => w.level === "caution")).toBe(false);
  });

  it("broadcast band 540–1600 kHz: the oscillator tunes 995–2055 kHz", () => {
    // Kennedy & Davis, tracking discussion: oscillator 995–2055 kHz for a 455 kHz IF (from memory)
    expect(out({ signalFrequency: "540 kHz" }).oscillatorFrequency).toBeCloseTo(995e3, 6);
    expect(out({ signalFrequency: "1600 kHz" }).oscillatorFrequency).toBeCloseTo(2055e3, 6);
  });

  it("FM at 100 MHz with a 10.7 MHz IF: oscillator 110.7 MHz, image 121.4 MHz, outside the 88–108 MHz band", () => {
    // ARRL Handbook, receivers chapter: 10.7 MHz IF puts FM images outside the band (from memory)
    const o = out({ signalFrequency: "100 MHz", intermediateFrequency: "10.7 MHz" });
    expect(o.oscillatorFrequency).toBeCloseTo(110.7e6, 3);
    expect(o.imageFrequency).toBeCloseTo(121.4e6, 3);
    fc.assert(
      fc.property(fc.double({ min: 88e6, max: 108e6, noNaN: true }), (f) => {
        expect(out({ signalFrequency: f, intermediateFrequency: 10.7e6 }).imageFrequency).toBeGreaterThan(108e6);
      }),
    );
  });

  it("oscillator below: 1000 kHz, 455 kHz IF gives 545 kHz and an image at 90 kHz", () => {
    // f_o = f_s − f_IF, f_im = f_s − 2 f_IF (Kennedy & Davis, as above)
    const r = run({ signalFrequency: "1000 kHz", oscillatorAbove: false });
    expect(r.outputs.oscillatorFrequency).toBeCloseTo(545e3, 6);
    expect(r.outputs.imageFrequency).toBeCloseTo(90e3, 6);
    expect(r.warnings.some((w) => /2055 kHz/.test(w.message))).toBe(true);
    // 600 kHz below: oscillator 145 kHz; the other response is the sum, 310 kHz + 145 kHz = 455 kHz
    const sum = run({ signalFrequency: "600 kHz", oscillatorAbove: "false" });
    expect(sum.outputs.imageFrequency).toBeCloseTo(310e3, 6);
    expect(sum.warnings.some((w) => /sum of oscillator and signal/.test(w.message))).toBe(true);
    expect(sum.steps.some((s) => /f_\\text\{im\} \+ f_o/.test(s.latex))).toBe(true);
  });

  it("a signal near the IF is a caution; no voltage, so no danger", () => {
    const r = run({ signalFrequency: "470 kHz" });
    expect(r.warnings.some((w) => w.level === "caution" && /wave trap/.test(w.message))).toBe(true);
    expect(r.warnings.some((w) => w.level === "danger")).toBe(false);
    expect(run({ signalFrequency: "1000 kHz" }).warnings.some((w) => w.level === "caution")).toBe(false);
  });
});

describe("superhet: identities and properties", () => {
  it("property: the oscillator is one IF from the signal and one IF from the image; rejection ≥ 1 and grows with Q", () => {
    fc.assert(
      fc.property(logUniform(1e4, 1e9), logUniform(1e4, 1e8), fc.boolean(), logUniform(1, 1000), (fs, fif, above, q) => {
        const r = runCalculator(calculator, { signalFrequency: fs, intermediateFrequency: fif, oscillatorAbove: above, loadedQ: q });
        if (!r.ok) {
          expect(above).toBe(false);
          expect(r.error.fields).toHaveProperty("intermediateFrequency");
          expect(fif).toBeGreaterThanOrEqual((fs * (1 - 1e-6)) / 2);
          return;
        }
        const o = r.result.outputs as unknown as Out;
        const tol = 1e-9 * (fs + 2 * fif);
        expect(Math.abs(Math.abs(o.oscillatorFrequency - fs) - fif)).toBeLessThan(tol);
        expect(o.oscillatorFrequency > fs).toBe(above);
        if (above || fs > 2 * fif) {
          expect(Math.abs(Math.abs(o.imageFrequency - o.oscillatorFrequency) - fif)).toBeLessThan(tol);
          expect(Math.abs(o.imageSeparation - 2 * fif)).toBeLessThan(tol);
        } else {
          expect(Math.abs(o.imageFrequency + o.oscillatorFrequency - fif)).toBeLessThan(tol); // the sum response
        }
        expect(o.imageFrequency).toBeGreaterThan(0);
        expect(o.imageRejection!).toBeGreaterThanOrEqual(1);
        expect(Number.isFinite(o.imageRejectionDb!)).toBe(true);
        const more = runCalculator(calculator, { signalFrequency: fs, intermediateFrequency: fif, oscillatorAbove: above, loadedQ: q * 2 });
        if (more.ok) expect(more.result.outputs.imageRejection as number).toBeGreaterThanOrEqual(o.imageRejection!);
        for (const s of r.result.steps) expect(s.latex).not.toMatch(/NaN|Infinity/);
      }),
    );
  });
});

describe("superhet: refusals", () => {
  it("an IF at or above the signal with the oscillator below; half the signal puts the oscillator on the IF", () => {
    expect(fields({ signalFrequency: "400 kHz", oscillatorAbove: false }).intermediateFrequency).toMatch(/below the signal frequency/);
    expect(fields({ signalFrequency: "455 kHz", oscillatorAbove: false })).toHaveProperty("intermediateFrequency");
    expect(fields({ signalFrequency: "910 kHz", oscillatorAbove: false }).intermediateFrequency).toMatch(/on the IF itself/);
    expect(out({ signalFrequency: "400 kHz" }).oscillatorFrequency).toBeCloseTo(855e3, 6); // above: allowed
  });

  it("property: non-positive, non-finite, wrong-unit or missing frequencies are refused under their field", () => {
    const bad = fc.oneof(fc.double({ max: 0, noNaN: true }), fc.constantFrom("abc", "5 V", Number.NaN, Number.POSITIVE_INFINITY, "-1 kHz"));
    for (const name of ["signalFrequency", "intermediateFrequency"]) {
      fc.assert(fc.property(bad, (v) => void expect(fields({ signalFrequency: 1e6, [name]: v })).toHaveProperty(name)));
    }
    expect(fields({})).toHaveProperty("signalFrequency");
    expect(fields({ signalFrequency: 1e6, oscillatorAbove: "maybe" }).oscillatorAbove).toMatch(/true .* or false/);
    expect(fields({ signalFrequency: 1e6, loadedQ: -5 })).toHaveProperty("loadedQ");
  });
});
