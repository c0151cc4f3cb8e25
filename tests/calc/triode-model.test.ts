import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { plateCurrent, plateCurves, triodePoint, type TriodeParams } from "@/lib/calc/triode-model";
import { TRIODES, TRIODE_NAMES, findTriode } from "@/lib/calc/tables/triodes";

const tube = (name: string): TriodeParams => {
  const t = findTriode(name);
  if (!t) throw new Error(`no ${name} in the table`);
  return t.params;
};

/** |got − want| ≤ tol·want, with the tolerance in the failure message. */
function near(got: number, want: number, tol: number) {
  expect(Math.abs(got - want), `got ${got}, want ${want} ±${tol * 100}%`).toBeLessThanOrEqual(tol * Math.abs(want));
}

/*
 * The model against data-sheet typical operating points. Koren fitted his parameters to the
 * published plate curves as a whole, not to the single typical point, so the model misses
 * those points by amounts that differ per tube. Each tolerance below is the observed miss
 * rounded up (stated beside it), not a general claim about the model's accuracy; typical
 * points are themselves "typical" values, and real tubes of one type spread ±20% or more.
 */
describe("Koren model vs data-sheet typical operating points", () => {
  it("12AX7 at Ep 250 V, Eg −2 V: Ip 1.2 mA, µ 100, rp 62.5 kΩ, gm 1.6 mA/V", () => {
    // 12AX7 data sheet, characteristics table (from memory). Model: 0.95 mA (−21%), gm +4%, µ −10%, rp −14%.
    const p = triodePoint(tube("12AX7"), 250, -2);
    near(p.ip, 1.2e-3, 0.25);
    near(p.gm, 1.6e-3, 0.15);
    near(p.mu, 100, 0.15);
    near(1 / p.gp, 62.5e3, 0.2);
  });

  it("12AU7 at Ep 250 V, Eg −8.5 V: Ip 10.5 mA, µ 17, rp 7.7 kΩ, gm 2.2 mA/V", () => {
    // 12AU7 data sheet, characteristics table (from memory). Model: −1%, gm +13%, µ +6%, rp −6%.
    const p = triodePoint(tube("12AU7"), 250, -8.5);
    near(p.ip, 10.5e-3, 0.1);
    near(p.gm, 2.2e-3, 0.2);
    near(p.mu, 17, 0.1);
    near(1 / p.gp, 7.7e3, 0.1);
  });

  it("12AU7 at Ep 100 V, Eg 0 V: Ip 11.8 mA, µ 19.5, rp 6.25 kΩ, gm 3.1 mA/V", () => {
    // 12AU7 data sheet, characteristics table, first column (from memory). Model: +7%, gm +9%, µ +6%, rp −2%.
    const p = triodePoint(tube("12AU7"), 100, 0);
    near(p.ip, 11.8e-3, 0.1);
    near(p.gm, 3.1e-3, 0.15);
    near(p.mu, 19.5, 0.1);
    near(1 / p.gp, 6.25e3, 0.1);
  });

  it("12AT7 at Ep 250 V, Eg −2 V: Ip 10 mA, µ 60, rp 10.9 kΩ, gm 5.5 mA/V (the loosest fit)", () => {
    // 12AT7 data sheet, characteristics table (from memory). Model: +28%, gm +31%, µ −5%, rp −28%.
    // Koren's 12AT7 set runs hot at this point; we keep his figures rather than refit them.
    const p = triodePoint(tube("12AT7"), 250, -2);
    near(p.ip, 10e-3, 0.35);
    near(p.gm, 5.5e-3, 0.35);
    near(p.mu, 60, 0.1);
    near(1 / p.gp, 10.9e3, 0.35);
  });

  it("6DJ8 at Ep 90 V, Eg −1.3 V: Ip 15 mA, µ 33, gm 12.5 mA/V", () => {
    // 6DJ8/ECC88 data sheet, characteristics table (from memory). Model: −5%, gm −25%, µ −16%.
    const p = triodePoint(tube("6DJ8"), 90, -1.3);
    near(p.ip, 15e-3, 0.1);
    near(p.gm, 12.5e-3, 0.3);
    near(p.mu, 33, 0.2);
  });

  it("6SN7 (fitted at 250 V) predicts the data sheet's other point, Ep 90 V, Eg 0 V: 10 mA, µ 20, rp 6.7 kΩ, gm 3.0 mA/V", () => {
    // 6SN7GT data sheet, characteristics table (from memory). This point was NOT used in the fit,
    // so it is an independent check. Model: −8%, gm −12%, µ −1%, rp +13%.
    const p = triodePoint(tube("6SN7"), 90, 0);
    near(p.ip, 10e-3, 0.15);
    near(p.gm, 3.0e-3, 0.2);
    near(p.mu, 20, 0.1);
    near(1 / p.gp, 6.7e3, 0.2);
  });

  it("fitted entries still reproduce the point they were fitted to (a table regression check, not an independent one)", () => {
    // Data-sheet typical points, from memory: 6SN7 250 V/−8 V 9 mA 2.6 mA/V; 6SL7 250 V/−2 V 2.3 mA 1.6 mA/V;
    // 12AY7 250 V/−4 V 3 mA 1.75 mA/V.
    const cases: [string, number, number, number, number][] = [
      ["6SN7", 250, -8, 9e-3, 2.6e-3],
      ["6CG7", 250, -8, 9e-3, 2.6e-3],
      ["6SL7", 250, -2, 2.3e-3, 1.6e-3],
      ["12AY7", 250, -4, 3e-3, 1.75e-3],
    ];
    for (const [name, ep, eg, ip, gm] of cases) {
      const p = triodePoint(tube(name), ep, eg);
      near(p.ip, ip, 0.05);
      near(p.gm, gm, 0.05);
    }
  });
});

describe("model identities", () => {
  const ax7 = tube("12AX7");

  it("no plate current at or below zero plate voltage", () => {
    expect(plateCurrent(ax7, 0, 0)).toBe(0);
    expect(plateCurrent(ax7, -50, 0)).toBe(0);
    expect(triodePoint(ax7, 0, -1)).toEqual({ ip: 0, gm: 0, gp: 0, mu: 0 });
  });

  it("far above cut-off it tends to the power law Ip = 2·(Ep/µ + Eg)^EX / KG1", () => {
    // Identity of the formula: for large x, ln(1 + eˣ) → x and √(KVB + Ep²) → Ep.
    // 12AX7 at Eg 0: x = KP/µ = 6, so ln(1 + eˣ) − x ≈ 0.25% of x.
    const p = tube("12AX7");
    const ep = 400;
    const eg = 0;
    const powerLaw = (2 * Math.pow(ep / p.mu + eg, p.ex)) / p.kg1;
    near(plateCurrent(p, ep, eg), powerLaw, 0.01);
  });

  it("analytic gm and gp agree with central differences", () => {
    for (const t of TRIODES) {
      for (const [ep, eg] of [
        [250, -2],
        [100, -1],
        [300, -10],
        [50, 0],
      ] as const) {
        const pt = triodePoint(t.params, ep, eg);
        const h = 1e-4;
        const gm = (plateCurrent(t.params, ep, eg + h) - plateCurrent(t.params, ep, eg - h)) / (2 * h);
        const gp = (plateCurrent(t.params, ep + h, eg) - plateCurrent(t.params, ep - h, eg)) / (2 * h);
        near(pt.gm, gm, 1e-5);
        near(pt.gp, gp, 1e-5);
        near(pt.ip, plateCurrent(t.params, ep, eg), 1e-14);
      }
    }
  });

  it("µ = gm·rp", () => {
    for (const t of TRIODES) {
      const pt = triodePoint(t.params, 200, -1.5);
      near(pt.mu, pt.gm / pt.gp, 1e-12);
    }
  });

  it("current rises with plate voltage and with grid voltage", () => {
    let last = 0;
    for (let ep = 10; ep <= 400; ep += 10) {
      const ip = plateCurrent(ax7, ep, -1);
      expect(ip).toBeGreaterThan(last);
      last = ip;
    }
    expect(plateCurrent(ax7, 250, -1)).toBeGreaterThan(plateCurrent(ax7, 250, -2));
  });
});

describe("plateCurves", () => {
  it("gives one curve per grid voltage, from 0 V to the end, matching plateCurrent", () => {
    const p = tube("12AX7");
    const curves = plateCurves(p, { gridVoltages: [0, -1, -2], maxPlateVoltage: 300, points: 31 });
    expect(curves).toHaveLength(3);
    for (const [i, curve] of curves.entries()) {
      expect(curve).toHaveLength(31);
      expect(curve[0]).toEqual({ ep: 0, ip: 0 });
      expect(curve[30].ep).toBe(300);
      expect(curve[10].ip).toBe(plateCurrent(p, 100, [0, -1, -2][i]));
    }
    // More negative grid → less current at the same plate voltage.
    expect(curves[2][30].ip).toBeLessThan(curves[1][30].ip);
  });

  it("never returns fewer than two points or NaN for odd options", () => {
    const curves = plateCurves(tube("12AU7"), { gridVoltages: [-4], maxPlateVoltage: Number.NaN, points: 0 });
    expect(curves[0]).toHaveLength(2);
    expect(curves[0].every((q) => Number.isFinite(q.ep) && Number.isFinite(q.ip))).toBe(true);
  });
});

describe("table", () => {
  it("holds the required types, each with sane parameters, a rating and a source", () => {
    for (const name of ["12AX7", "12AT7", "12AU7", "6SN7", "6SL7"]) expect(TRIODE_NAMES).toContain(name);
    for (const t of TRIODES) {
      expect(t.params.mu).toBeGreaterThan(1);
      expect(t.params.ex).toBeGreaterThanOrEqual(1);
      expect(t.params.kg1).toBeGreaterThan(0);
      expect(t.params.kp).toBeGreaterThan(0);
      expect(t.params.kvb).toBeGreaterThan(0);
      expect(t.maxPlateDissipation).toBeGreaterThan(0);
      expect(t.source.length).toBeGreaterThan(10);
      if (t.fromMemory) expect(t.source).toMatch(/from memory/);
    }
  });

  it("finds types by alias, ignoring case and spaces", () => {
    expect(findTriode("ecc83")?.name).toBe("12AX7");
    expect(findTriode(" 6sn7 gtb")?.name).toBe("6SN7");
    expect(findTriode("EL84")).toBeUndefined();
  });
});

describe("properties", () => {
  const params = fc.record({
    mu: fc.double({ min: 1, max: 500, noNaN: true }),
    ex: fc.double({ min: 1, max: 2.5, noNaN: true }),
    kg1: fc.double({ min: 1, max: 1e5, noNaN: true }),
    kp: fc.double({ min: 1, max: 5000, noNaN: true }),
    kvb: fc.double({ min: 1, max: 1e5, noNaN: true }),
  });

  it("finite, non-negative current and conductances anywhere in a wide range", () => {
    fc.assert(
      fc.property(params, fc.double({ min: 0, max: 5000, noNaN: true }), fc.double({ min: -1000, max: 0, noNaN: true }), (p, ep, eg) => {
        const pt = triodePoint(p, ep, eg);
        for (const v of [pt.ip, pt.gm, pt.gp, pt.mu]) {
          expect(Number.isFinite(v)).toBe(true);
          expect(v).toBeGreaterThanOrEqual(0);
        }
      }),
      { numRuns: 2000 },
    );
  });
});
