import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { calculator } from "@/lib/calc/resistor-drift";
import { calcRunner, logUniform } from "../helpers/calc";

type Out = { deviation: number | null; withinTolerance: boolean; verdict: string };

const { run, out, fields } = calcRunner<Out>(calculator);

describe("resistor-drift: checks against the published tolerances", () => {
  it("defaults to ±20 %, the no-band tolerance of IEC 60062 and of the era's composition resistors", () => {
    // IEC 60062: no tolerance band = ±20 % (from memory); carbon composition of the era ±20 % (common practice)
    const r = run({ nominal: "100k", measured: "119k" });
    expect(r.inputs).toMatchObject({ tolerance: 0.2 });
    expect(r.outputs).toMatchObject({ verdict: "within", withinTolerance: true });
    expect(out({ nominal: "100k", measured: "121k" }).verdict).toBe("high");
    expect(out({ nominal: "100k", measured: "79k" }).verdict).toBe("low");
  });

  it("the tolerance edge itself is within: 100 Ω ±20 % at 120 Ω and 80 Ω", () => {
    expect(out({ nominal: 100, measured: 120 })).toMatchObject({ verdict: "within", deviation: 0.2 });
    expect(out({ nominal: 100, measured: 80 }).verdict).toBe("within");
  });

  it("silver band ±10 %: 470 kΩ reading 520 kΩ is high by 10.6 %", () => {
    // IEC 60062: silver = ±10 % (from memory)
    const o = out({ nominal: "470k", measured: "520k", tolerance: 0.1 });
    expect(o.verdict).toBe("high");
    expect(o.deviation as number).toBeCloseTo(50 / 470, 12);
  });

  it("gold band ±5 %: 1 MΩ reading 1.04 MΩ is within", () => {
    // IEC 60062: gold = ±5 % (from memory)
    expect(out({ nominal: "1M", measured: "1.04 MΩ", tolerance: 0.05 })).toMatchObject({ verdict: "within", withinTolerance: true });
  });

  it("a high reading notes that composition resistors drift high with age", () => {
    const r = run({ nominal: "100k", measured: "150k" });
    expect(r.outputs.deviation).toBeCloseTo(0.5, 12);
    expect(r.warnings.some((w) => /drift high/.test(w.message))).toBe(true);
  });
});

describe("resistor-drift: open and short", () => {
  it.each(["open", "OL", "O.L.", "ol", "∞", "inf", " Open "])("%s reads as open", (measured) => {
    expect(out({ nominal: 1000, measured })).toEqual({ deviation: null, withinTolerance: false, verdict: "open" });
  });

  it("the number Infinity from code reads as open", () => {
    expect(out({ nominal: 1000, measured: Number.POSITIVE_INFINITY }).verdict).toBe("open");
  });

  it("zero is a short: low, with a caution", () => {
    const r = run({ nominal: 1000, measured: 0 });
    expect(r.outputs).toMatchObject({ verdict: "low", deviation: -1, withinTolerance: false });
    expect(r.warnings.some((w) => w.level === "caution" && /short/.test(w.message))).toBe(true);
  });
});

describe("resistor-drift: identities and properties", () => {
  it("property: deviation = measured/nominal − 1, and the verdict follows it", () => {
    fc.assert(
      fc.property(logUniform(1e-2, 1e12), fc.double({ min: 0, max: 10, noNaN: true }), fc.double({ min: 0.001, max: 1, noNaN: true }), (n, k, t) => {
        const o = out({ nominal: n, measured: n * k, tolerance: t });
        const d = o.deviation as number;
        expect(Number.isFinite(d)).toBe(true);
        expect(d).toBeCloseTo(k - 1, 9);
        if (Math.abs(d) < t * 0.999) expect(o.verdict).toBe("within");
        if (d > t * 1.001) expect(o.verdict).toBe("high");
        if (d < -t * 1.001) expect(o.verdict).toBe("low");
        expect(o.withinTolerance).toBe(o.verdict === "within");
      }),
    );
  });

  it("property: invalid input is refused under its field", () => {
    fc.assert(
      fc.property(fc.oneof(fc.double({ max: 0, noNaN: true }), fc.constantFrom("", "5 V", "x", null, Number.NaN)), (bad) => {
        expect(fields({ nominal: bad, measured: 100 })).toHaveProperty("nominal");
      }),
    );
    fc.assert(
      fc.property(fc.oneof(fc.double({ max: -1e-300, noNaN: true }), fc.constantFrom("", "5 uF", "shorted", null, Number.NaN)), (bad) => {
        expect(fields({ nominal: 100, measured: bad })).toHaveProperty("measured");
      }),
    );
    fc.assert(
      fc.property(
        fc.oneof(fc.double({ max: 0, noNaN: true }), fc.double({ min: 1.0001, max: 1e6, noNaN: true }), fc.constantFrom("5%", "x", Number.NaN)),
        (bad) => {
          expect(fields({ nominal: 100, measured: 100, tolerance: bad })).toHaveProperty("tolerance");
        },
      ),
    );
    expect(fields({ nominal: 100 }).measured).toMatch(/open/);
    expect(fields({ nominal: 100, measured: "5 V" }).measured).toMatch(/expected a resistance, got volts/);
  });
});
