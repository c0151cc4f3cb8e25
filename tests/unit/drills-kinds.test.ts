import { describe, expect, it } from "vitest";
import { calculators } from "@/lib/calc/registry";
import { findTube } from "@/lib/calc/tables/tubes";
import { findHeater } from "@/lib/calc/tables/heaters";
import { DRILL_KINDS, describeDrillKinds, drillKindsFor, generateDrillFor, getDrillKind } from "@/lib/drills";
import { OPERATING_POINTS, unknownTypes } from "@/lib/drills/operating-points";

/** The list of drill kinds against the Bench: every calculator covered, each kind asking for a real output in its unit. */

describe("drill kinds", () => {
  it("every registered calculator has at least one drill kind", () => {
    const missing = calculators.map((c) => c.slug).filter((slug) => drillKindsFor(slug).length === 0);
    expect(missing, `calculators without a drill kind: ${missing.join(", ")}`).toEqual([]);
  });

  it("has unique ids named slug/what-is-asked, each found by id", () => {
    const ids = DRILL_KINDS.map((k) => k.id);
    expect(new Set(ids).size).toBe(ids.length);
    for (const k of DRILL_KINDS) {
      expect(k.id.startsWith(`${k.slug}/`)).toBe(true);
      expect(k.id).toMatch(/^[a-z0-9-]+\/[a-z0-9-]+$/);
      expect(getDrillKind(k.id)).toBe(k);
    }
    expect(getDrillKind("cathode-bias/no-such-kind")).toBeUndefined();
  });

  it("asks for an output of its calculator (an input for a backward kind) in that quantity's unit", () => {
    for (const k of DRILL_KINDS) {
      const calc = calculators.find((c) => c.slug === k.slug)!;
      const meta = k.direction === "forward" ? calc.outputs.find((o) => o.name === k.asked.name) : calc.inputs.find((i) => i.name === k.asked.name);
      expect(meta, `${k.id} asks for ${k.asked.name}`).toBeDefined();
      // Text asks are words and "%" asks a fraction in per cent, both unitless outputs; a unitless figure
      // (a preferred value, any kind of part) takes the unit of the part the drill names; else the calculator's SI unit.
      if (k.asked.unit === "text" || k.asked.unit === "%") expect(meta!.unit).toBe("");
      else if (meta!.unit !== "") expect(k.asked.unit).toBe(meta!.unit);
    }
  });

  it("includes backward kinds that ask for an input from the figure the calculator would give", () => {
    const backward = DRILL_KINDS.filter((k) => k.direction === "backward").map((k) => k.id);
    expect(backward).toEqual(expect.arrayContaining(["cathode-bias/bias-from-resistor", "dropping-resistor/stage-voltage"]));
  });

  it("uses a tolerance that fits the question: exact for standard values and words, relative for computed figures", () => {
    for (const k of DRILL_KINDS) {
      if (k.asked.unit === "text" || /rating|nearest|suggested|\/read$/.test(k.id)) expect(k.tolerance.type, k.id).toBe("exact");
      if (k.tolerance.type === "relative") expect(k.tolerance.fraction).toBeLessThanOrEqual(0.03);
      if (k.asked.unit === "Ω" && k.tolerance.type === "relative") expect(k.tolerance.fraction).toBeLessThanOrEqual(0.02);
    }
  });

  it("describes the kinds for GET /api/drills without generators or answers", () => {
    const described = describeDrillKinds();
    expect(described).toHaveLength(DRILL_KINDS.length);
    for (const d of described) expect(Object.keys(d).sort()).toEqual(["asked", "direction", "id", "slug", "title"]);
    expect(JSON.parse(JSON.stringify(described))).toEqual(described);
  });

  it("makes a drill for a calculator by its slug, the kind chosen by the seed", () => {
    for (const c of calculators) {
      const d = generateDrillFor(c.slug, 7);
      expect(d.problem.slug).toBe(c.slug);
      expect(generateDrillFor(c.slug, 7)).toEqual(d);
    }
    expect(() => generateDrillFor("no-such-calculator", 1)).toThrow();
  });
});

describe("operating points the drills draw on", () => {
  it("name only tubes the built-in tables know", () => {
    expect(unknownTypes()).toEqual([]);
    for (const p of OPERATING_POINTS) expect(findHeater(p.type) ?? findTube(p.type)?.heater, p.type).toBeDefined();
  });

  it("keep each tube within its rated plate dissipation at the listed point", () => {
    // Plate dissipation of a typical operating point is below the type's rating (tube table, from memory).
    for (const p of OPERATING_POINTS) {
      const tube = findTube(p.type);
      if (tube?.category !== "receiving") throw new Error(`${p.type} is not a receiving tube of the table`);
      expect(p.plateVoltage * p.plateCurrent, p.type).toBeLessThanOrEqual(tube.maxPlateDissipation * 1.0001);
    }
  });

  it("hold the 6V6GT's published class-A point that the issue quotes", () => {
    // 6V6GT data sheet, class A1 at 250 V: −12.5 V grid, 45 mA plate, 4.5 mA screen (from memory).
    const p = OPERATING_POINTS.find((o) => o.type === "6V6GT" && o.plateVoltage === 250)!;
    expect([p.bias, p.plateCurrent, p.screenCurrent]).toEqual([12.5, 0.045, 0.0045]);
  });
});
