import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { findHeater } from "@/lib/calc/tables/heaters";
import { RECTIFIERS, RECTIFIER_TYPES, findRectifier } from "@/lib/calc/tables/rectifiers";

describe("rectifier table: data-sheet figures", () => {
  it("5Y3GT: 20 µF filter-input capacitor, 125 mA, 5 V 2 A filament", () => {
    // RCA receiving tube manual, 5Y3GT — from memory, and agreeing with a published summary of the RCA sheet.
    const t = findRectifier("5Y3GT")!;
    expect(t.maxInputCapacitance).toBeCloseTo(20e-6, 12);
    expect(t.maxCurrent).toBeCloseTo(0.125, 12);
    expect([t.heaterVoltage, t.heaterCurrent]).toEqual([5, 2]);
    expect(t.heating).toBe("filament");
  });

  it("5AR4/GZ34: 60 µF reservoir, 250 mA, indirectly heated, far lower drop than the filament types", () => {
    // GZ34 data sheet — from memory: 60 µF max reservoir, 250 mA. Common practice: the indirectly heated
    // 5AR4 drops much less than a 5U4 or 5Y3, the reason it is fitted to raise B+.
    const t = findRectifier("gz34")!;
    expect(t.type).toBe("5AR4");
    expect(t.maxInputCapacitance).toBeCloseTo(60e-6, 12);
    expect(t.maxCurrent).toBeCloseTo(0.25, 12);
    expect(t.tubeDrop).toBeLessThan(findRectifier("5U4GB")!.tubeDrop / 2);
    expect(t.tubeDrop).toBeLessThan(findRectifier("5Y3GT")!.tubeDrop / 2);
  });

  it("6X4: 70 mA, about 22 V drop, 1250 V peak inverse", () => {
    // RCA 6X4 data — from memory, and agreeing with a published summary of the data sheet.
    const t = findRectifier("EZ90")!;
    expect(t.type).toBe("6X4");
    expect([t.maxCurrent, t.tubeDrop, t.peakInverseVoltage]).toEqual([0.07, 22, 1250]);
  });

  it("5U4G and 5U4GB are kept apart: the GB is rated for more current", () => {
    // RCA 5U4G 225 mA, 5U4GB 275 mA with a capacitor-input filter — from memory.
    expect(findRectifier("5U4")!.type).toBe("5U4G");
    expect(findRectifier("5U4GB")!.maxCurrent).toBeGreaterThan(findRectifier("5U4G")!.maxCurrent);
    expect(findRectifier("5U4GA")).toBeUndefined(); // a revision letter is never guessed
  });
});

describe("rectifier table: consistency", () => {
  it("every row is complete, positive and finite, and names its source", () => {
    for (const r of RECTIFIERS) {
      for (const x of [r.heaterVoltage, r.heaterCurrent, r.maxInputCapacitance, r.maxCurrent, r.tubeDrop, r.tubeDropCurrent]) {
        expect(Number.isFinite(x) && x > 0, `${r.type}`).toBe(true);
      }
      if (r.peakInverseVoltage !== undefined) expect(r.peakInverseVoltage).toBeGreaterThan(0);
      expect(r.maxInputCapacitance).toBeLessThan(1e-3); // µF, never a slipped prefix
      expect(r.tubeDropCurrent).toBeLessThanOrEqual(r.maxCurrent);
      expect(r.source).toMatch(/data sheet|manual/i);
      expect(r.source).toMatch(/from memory/);
    }
  });

  it("heaters agree with the heater table wherever both list the type", () => {
    let compared = 0;
    for (const r of RECTIFIERS) {
      const h = findHeater(r.type);
      if (!h) continue;
      compared++;
      expect(h.voltage, r.type).toBe(r.heaterVoltage);
      expect(h.current, r.type).toBe(r.heaterCurrent);
    }
    expect(compared).toBeGreaterThanOrEqual(8);
  });

  it("series-string types have the 150 mA or 40 mA heaters of AC/DC sets; transformer types 5 or 6.3 V", () => {
    // Common practice: 35W4/35Z5/50Y6 on a 150 mA string, 117Z3 straight across the mains.
    for (const r of RECTIFIERS) {
      if (r.heaterVoltage >= 35) expect([0.15, 0.04]).toContain(r.heaterCurrent);
      else expect([5, 6.3]).toContain(r.heaterVoltage);
    }
  });

  it("type names are unique, and each is found by its own name and aliases", () => {
    const all = RECTIFIERS.flatMap((r) => [r.type, ...r.aliases]);
    expect(new Set(all).size).toBe(all.length);
    expect(RECTIFIER_TYPES).toEqual(RECTIFIERS.map((r) => r.type));
    for (const r of RECTIFIERS) for (const n of [r.type, ...r.aliases]) expect(findRectifier(n)).toBe(r);
  });
});

describe("findRectifier", () => {
  it("reads names as the trade writes them: any case, spaces or hyphens, a G or GT suffix", () => {
    expect(findRectifier(" 5y3-gt ")!.type).toBe("5Y3GT");
    expect(findRectifier("6x5g")!.type).toBe("6X5GT");
    expect(findRectifier("117Z3GT")!.type).toBe("117Z3");
    expect(findRectifier("35Z5")!.type).toBe("35Z5GT");
    expect(findRectifier("12AX7")).toBeUndefined();
    expect(findRectifier("")).toBeUndefined();
  });

  it("property: case and separators never change the answer", () => {
    const name = fc.constantFrom(...RECTIFIERS.flatMap((r) => [r.type, ...r.aliases]));
    fc.assert(
      fc.property(name, fc.array(fc.boolean(), { minLength: 8, maxLength: 8 }), fc.constantFrom("", " ", "-"), (n, cases, sep) => {
        const mangled = [...n].map((ch, i) => (cases[i % 8] ? ch.toLowerCase() : ch)).join("");
        const withSep = mangled.length > 2 ? `${mangled.slice(0, 2)}${sep}${mangled.slice(2)}` : mangled;
        expect(findRectifier(withSep)).toBe(findRectifier(n));
      }),
    );
  });
});
