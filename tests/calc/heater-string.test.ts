import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { calculator, type HeaterStringOutputs } from "@/lib/calc/heater-string";
import { runCalculator } from "@/lib/calc/run";
import { findHeater, HEATERS, TUBE_NAMES } from "@/lib/calc/tables/heaters";
import { nearestPreferred } from "@/lib/calc/tables/preferred-values";
import { calcRunner, logUniform } from "../helpers/calc";

type Out = HeaterStringOutputs;

const { run, out, fields } = calcRunner<Out>(calculator);
const has = (r: { warnings: { level: string; message: string }[] }, level: string, re: RegExp) =>
  r.warnings.some((w) => w.level === level && re.test(w.message));

describe("heater-string: published checks", () => {
  it("the issue's mixed string: 6SN7GT + 6V6GT + 6SL7GT on 117 V runs at 0.6 A with 42 Ω and 21 Ω shunts", () => {
    // Heater ratings from the RCA receiving tube manual data pages (from memory): 6SN7GT 6.3 V 0.6 A,
    // 6V6GT 6.3 V 0.45 A, 6SL7GT 6.3 V 0.3 A. Series-string method (RCA application notes, from memory):
    // the string runs at the highest current and each lower heater is shunted with Vh/(I − Ih).
    const r = run({ lineVoltage: 117, tubes: ["6SN7GT", "6V6GT", "6SL7GT"] });
    const o = r.outputs as unknown as Out;
    expect(o.stringCurrent).toBe(0.6);
    expect(o.stringVoltage).toBeCloseTo(18.9, 9);
    expect(o.currentsMatch).toBe(false);
    expect(o.droppingResistance).toBeCloseTo((117 - 18.9) / 0.6, 9); // 163.5 Ω
    expect(o.dissipation).toBeCloseTo((117 - 18.9) * 0.6, 9); // 58.9 W
    expect(o.suggestedRating).toBeNull(); // 2 × 58.9 W is above the largest standard part (100 W): a caution instead
    expect(has(r, "caution", /largest standard rating/)).toBe(true);
    expect(o.nearestPreferred).toBe(150); // IEC 60063 E12: 163.5 lies below √(150·180) = 164.3
    expect(o.shunts).toHaveLength(2);
    const [s6v6, s6sl7] = o.shunts;
    expect(s6v6).toMatchObject({ index: 1, type: "6V6GT", suggestedRating: 2, nearestPreferred: 39 });
    expect(s6v6.resistance).toBeCloseTo(6.3 / (0.6 - 0.45), 9); // 42 Ω
    expect(s6v6.dissipation).toBeCloseTo(6.3 * 0.15, 9); // 0.945 W → 2 W part
    expect(s6sl7).toMatchObject({ index: 2, type: "6SL7GT", suggestedRating: 5, nearestPreferred: 22 });
    expect(s6sl7.resistance).toBeCloseTo(6.3 / (0.6 - 0.3), 9); // 21 Ω
    expect(s6sl7.dissipation).toBeCloseTo(6.3 * 0.3, 9); // 1.89 W → 5 W part (3.78 W is above 3 W)
    expect(has(r, "caution", /different currents/)).toBe(true);
    expect(has(r, "caution", /warms up unevenly/)).toBe(true);
    expect(has(r, "danger", /Lethal voltage/)).toBe(true); // 117 V mains
  });

  it("the classic five-tube AC/DC set: 12BE6 + 12BA6 + 12AV6 + 50C5 + 35W4 needs 122.8 V at 0.15 A, no shunts", () => {
    // RCA receiving tube manual heater ratings (from memory): 12.6 V ×3, 50 V, 35 V, all 0.15 A;
    // 3 × 12.6 + 50 + 35 = 122.8 V, run straight from 117–120 V mains with no dropping resistor.
    const r = run({ lineVoltage: "117 V", tubes: ["12BE6", "12BA6", "12AV6", "50C5", "35W4"] });
    const o = r.outputs as unknown as Out;
    expect(o.stringVoltage).toBeCloseTo(122.8, 9);
    expect(o.stringCurrent).toBe(0.15);
    expect(o.currentsMatch).toBe(true);
    expect(o.shunts).toEqual([]);
    expect(o.droppingResistance).toBe(0);
    expect(o.dissipation).toBe(0);
    expect(o.nearestPreferred).toBe(0);
    expect(has(r, "caution", /more than the/)).toBe(true);
    expect(has(r, "caution", /warms up unevenly|different currents/)).toBe(false);
  });

  it("the octal five-tube set: 12SA7 + 12SK7 + 12SQ7 + 50L6GT + 35Z5GT also needs 122.8 V at 0.15 A", () => {
    // RCA receiving tube manual heater ratings (from memory)
    const o = out({ lineVoltage: 120, tubes: "12sa7, 12sk7, 12sq7, 50l6gt, 35z5gt" });
    expect(o.stringVoltage).toBeCloseTo(122.8, 9);
    expect(o.stringCurrent).toBe(0.15);
    expect(o.shunts).toEqual([]);
  });

  it("the built-in table agrees with the tube-manual heater ratings", () => {
    // RCA receiving tube manual / data sheets, heater ratings — from memory
    const expected: [string, number, number][] = [
      ["12AV6", 12.6, 0.15],
      ["50C5", 50, 0.15],
      ["35W4", 35, 0.15],
      ["6SN7GTB", 6.3, 0.6],
      ["6SN7GT", 6.3, 0.6],
      ["6SL7GT", 6.3, 0.3],
      ["5U4GB", 5, 3],
      ["5Y3GT", 5, 2],
      ["6V6GT", 6.3, 0.45],
      ["6L6GC", 6.3, 0.9],
      ["EL84", 6.3, 0.76],
      ["25L6GT", 25, 0.3],
      ["117Z3", 117, 0.04],
    ];
    for (const [name, v, i] of expected) {
      expect(findHeater(name), name).toMatchObject({ voltage: v, current: i });
    }
    // 35Z5GT: 7.5 V of its 35 V heater is the lamp section ("Longer Life for Dial Lamps", period note, read);
    // the 35W4's tap taken as the same, from memory.
    expect(findHeater("35Z5GT")?.tap?.voltage).toBe(7.5);
    expect(findHeater("35W4")?.tap?.voltage).toBe(7.5);
    expect(findHeater("6SN7GTB")?.warmUp).toBe(11); // controlled warm-up, from memory of the data sheet
    expect(findHeater("6SN7GT")?.warmUp).toBeUndefined();
    expect(HEATERS.length).toBeGreaterThanOrEqual(40);
  });

  it("a 300 mA string on 117 V: 25L6GT + 25Z6GT + 6SA7 + 6SK7 + 6SQ7 drops 48.1 V in 160 Ω", () => {
    // heater ratings from the RCA receiving tube manual (from memory); 25 + 25 + 3 × 6.3 = 68.9 V
    const o = out({ lineVoltage: 117, tubes: ["25L6GT", "25Z6GT", "6SA7", "6SK7", "6SQ7"] });
    expect(o.stringVoltage).toBeCloseTo(68.9, 9);
    expect(o.stringCurrent).toBe(0.3);
    expect(o.droppingResistance).toBeCloseTo((117 - 68.9) / 0.3, 9);
    expect(o.dissipation).toBeCloseTo(48.1 * 0.3, 9); // 14.4 W
    expect(o.suggestedRating).toBe(50); // next standard rating ≥ 28.9 W
    expect(o.nearestPreferred).toBe(150); // IEC 60063 E12: 160.3 Ω lies below √(150·180)
    expect(o.shunts).toEqual([]);
  });
});

describe("heater-string: identities and rules", () => {
  it("P = I²R = ΔV·I for the dropping resistor", () => {
    const o = out({
      lineVoltage: 230,
      heaters: [
        { voltage: 6.3, current: 0.3 },
        { voltage: "12.6 V", current: "300 mA" },
      ],
    });
    expect(o.dissipation).toBeCloseTo(o.stringCurrent ** 2 * o.droppingResistance, 9);
    expect(o.dissipation).toBeCloseTo((230 - 18.9) * 0.3, 9);
  });

  it("mismatched currents: the string runs at the highest rating and the lower heater is shunted", () => {
    // 6V6GT 0.45 A, 6SQ7 0.3 A (RCA tube manual, from memory)
    const r = run({ lineVoltage: 117, tubes: ["6V6GT", "6SQ7"] });
    const o = r.outputs as unknown as Out;
    expect(o.currentsMatch).toBe(false);
    expect(o.stringCurrent).toBe(0.45);
    expect(o.shunts.map((s) => s.index)).toEqual([1]);
    expect(o.shunts[0].resistance).toBeCloseTo(6.3 / 0.15, 9);
    expect(has(r, "caution", /different currents/)).toBe(true);
  });

  it("currents within 2% match, beyond 2% do not; the near-match shunt is offered as optional", () => {
    const within = run({
      lineVoltage: 30,
      heaters: [
        { voltage: 12.6, current: 0.15 },
        { voltage: 12.6, current: 0.1529 },
      ],
    });
    const beyond = run({
      lineVoltage: 30,
      heaters: [
        { voltage: 12.6, current: 0.15 },
        { voltage: 12.6, current: 0.1531 },
      ],
    });
    expect((within.outputs as unknown as Out).currentsMatch).toBe(true);
    expect((beyond.outputs as unknown as Out).currentsMatch).toBe(false);
    expect(has(within, "info", /optional/)).toBe(true);
    expect(has(within, "caution", /different currents/)).toBe(false);
    expect(has(beyond, "caution", /different currents/)).toBe(true);
  });

  it("warm-up: a controlled warm-up type beside one the table gives no rating for is a caution, only in a mixed string", () => {
    // 6SN7GTB 11 s controlled warm-up (data sheet, from memory); 6V6GT has none in the table.
    expect(has(run({ lineVoltage: 117, tubes: ["6SN7GTB", "6V6GT"] }), "caution", /Warm-up ratings differ/)).toBe(true);
    expect(has(run({ lineVoltage: 117, tubes: ["6SN7GT", "6V6GT"] }), "caution", /Warm-up ratings differ/)).toBe(false);
    expect(has(run({ lineVoltage: 117, tubes: ["6SN7GTB", "6SN7GT"] }), "caution", /Warm-up ratings differ/)).toBe(false); // one current: no shunts
  });

  it("mains is lethal: a danger warning above 50 V, none on a 12 V supply; a heater above 50 V counts too", () => {
    expect(has(run({ lineVoltage: 120, tubes: ["12AV6"] }), "danger", /./)).toBe(true);
    expect(has(run({ lineVoltage: 12.6, tubes: ["12AV6"] }), "danger", /./)).toBe(false);
    expect(has(run({ lineVoltage: 12, heaters: [{ voltage: 117, current: 0.04 }] }), "danger", /./)).toBe(true);
  });

  it("tube names are case-insensitive and normalised in the inputs", () => {
    const r = run({ lineVoltage: 120, tubes: ["el84", " 6bq5 "] });
    expect(r.inputs.tubes).toEqual(["6BQ5", "6BQ5"]);
  });

  it("the working says why the string runs at the highest current and finds each shunt with its values", () => {
    const r = run({ lineVoltage: 117, tubes: ["6SN7GT", "6V6GT", "6SL7GT"] });
    const text = r.steps.map((s) => `${s.label} ${s.latex}`).join("\n");
    expect(text).toMatch(/largest any heater is rated for/);
    expect(text).toMatch(/\\max\(600\\,\\mathrm\{mA\},\\ 450\\,\\mathrm\{mA\},\\ 300\\,\\mathrm\{mA\}\) = 600/);
    expect(text).toMatch(/R_\{sh\} = \\frac\{V_h\}\{I_\{sh\}\} = \\frac\{6\.3\\,\\mathrm\{V\}\}\{150\\,\\mathrm\{mA\}\} = 42\\,/);
    expect(text).toMatch(/= 21\\,\\mathrm\{\\Omega\}/);
    expect(text).toMatch(/Power check/);
  });
});

describe("heater-string: pilot lamp on a tapped rectifier heater", () => {
  const aa5 = ["12BE6", "12BA6", "12AV6", "50C5", "35Z5GT"];
  const lamp47 = { voltage: 6.3, current: 0.15 }; // a 6.3 V 0.15 A dial lamp (common practice)

  it("with 50 mA of rectifier current the lamp takes about 110 mA and the section about 90 mA", () => {
    // "Longer Life for Dial Lamps" (period note on the 35Z5GT, read): 150 mA heater + 50 mA rectified;
    // the dial light takes approximately 110 mA, the heater section 90 mA. Our string on 117 V runs slightly under 150 mA.
    const o = out({ lineVoltage: 117, tubes: aa5, pilotLamp: { ...lamp47, rectifierCurrent: "50 mA" } });
    expect(o.pilotLampCurrent!).toBeCloseTo(0.11, 2);
    expect(o.tapSectionCurrent!).toBeCloseTo(0.09, 2);
  });

  it("Kirchhoff and Ohm in the lamp section: lamp + section = heater current + DC; V = I·R on each", () => {
    const dc = 0.06;
    const o = out({ lineVoltage: 120, tubes: aa5, pilotLamp: { ...lamp47, rectifierCurrent: dc } });
    expect(o.pilotLampCurrent! + o.tapSectionCurrent!).toBeCloseTo(o.stringCurrentWithLamp! + dc, 12);
    expect(o.pilotLampVoltage!).toBeCloseTo(o.pilotLampCurrent! * (6.3 / 0.15), 12);
    expect(o.pilotLampVoltage!).toBeCloseTo(o.tapSectionCurrent! * (7.5 / 0.15), 12);
  });

  it("the lamp lowers the string's resistance: I' = V_line / (ΣV/I + R_drop − R_sec + R_sec∥R_lamp)", () => {
    const o = out({ lineVoltage: 230, tubes: aa5, pilotLamp: lamp47 });
    const rSec = 7.5 / 0.15;
    const rLamp = 6.3 / 0.15;
    const expected = 230 / (122.8 / 0.15 + o.droppingResistance - rSec + (rSec * rLamp) / (rSec + rLamp));
    expect(o.stringCurrentWithLamp!).toBeCloseTo(expected, 12);
    expect(o.stringCurrentWithLamp!).toBeGreaterThan(o.stringCurrent);
    // The outputs without the lamp are untouched by it.
    const bare = out({ lineVoltage: 230, tubes: aa5 });
    expect(bare.droppingResistance).toBe(o.droppingResistance);
    expect(bare.pilotLampVoltage).toBeNull();
  });

  it("warns when the lamp would be under-run (heater current alone) or over-run (a 2 V lamp)", () => {
    const under = run({ lineVoltage: 117, tubes: aa5, pilotLamp: lamp47 });
    expect(has(under, "caution", /under-run.*rectifier current/)).toBe(true);
    const over = run({ lineVoltage: 117, tubes: aa5, pilotLamp: { voltage: 2, current: 0.06 } });
    expect(has(over, "caution", /over-run/)).toBe(true);
    const fine = run({ lineVoltage: 117, tubes: aa5, pilotLamp: { ...lamp47, rectifierCurrent: 0.05 } });
    expect(has(fine, "caution", /over-run|under-run/)).toBe(false);
    expect(has(fine, "caution", /lamp opens/)).toBe(true); // the plate current would then all pass through the section
  });

  it("a lamp with no tapped rectifier in the string is a caution and gives no lamp figures", () => {
    const r = run({ lineVoltage: 117, tubes: ["12BE6", "12BA6", "12AV6", "50C5"], pilotLamp: lamp47 });
    expect(has(r, "caution", /no tube in this string has a heater tapped/)).toBe(true);
    expect((r.outputs as unknown as Out).pilotLampCurrent).toBeNull();
    const byRating = run({ lineVoltage: 117, heaters: [{ voltage: 35, current: 0.15 }], pilotLamp: lamp47 });
    expect(has(byRating, "caution", /carry no tap/)).toBe(true);
  });

  it("the working shows the lamp and section in parallel, with the tap marked as to its source", () => {
    const r = run({ lineVoltage: 117, tubes: ["12BE6", "12BA6", "12AV6", "50C5", "35W4"], pilotLamp: lamp47 });
    expect(r.steps.some((s) => /R_\{sec\} \\parallel R_\{lamp\}/.test(s.latex))).toBe(true);
    expect(has(r, "info", /35W4's heater \(tap recalled from memory\)/)).toBe(true);
  });
});

describe("heater-string: validation", () => {
  it("an unknown tube is reported under tubes.<index>", () => {
    const r = runCalculator(calculator, { lineVoltage: 120, tubes: ["12BE6", "12BA6", "12ZZ9"] });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.fields["tubes.2"]).toMatch(/^tubes\.2: unknown tube type "12ZZ9"/);
  });

  it("needs heaters or tubes, not both and not neither", () => {
    expect(fields({ lineVoltage: 120 }).heaters).toMatch(/required/);
    expect(fields({ lineVoltage: 120, tubes: ["6V6"], heaters: [{ voltage: 6.3, current: 0.45 }] }).tubes).toMatch(/not both/);
  });

  it("a heater with a current in volts is reported by path", () => {
    expect(
      fields({
        lineVoltage: 120,
        heaters: [
          { voltage: 6.3, current: 0.3 },
          { voltage: 6.3, current: "0.3 V" },
        ],
      })["heaters.1.current"],
    ).toMatch(/current/);
  });

  it("a bad pilot lamp is reported by path", () => {
    expect(fields({ lineVoltage: 120, tubes: ["35W4"], pilotLamp: { voltage: "6.3 A", current: 0.15 } })["pilotLamp.voltage"]).toMatch(/voltage/);
    expect(fields({ lineVoltage: 120, tubes: ["35W4"], pilotLamp: { voltage: 6.3 } })["pilotLamp.current"]).toMatch(/required/);
    expect(fields({ lineVoltage: 120, tubes: ["35W4"], pilotLamp: "6.3 V" }).pilotLamp).toMatch(/Pilot lamp/);
  });
});

describe("heater-string: properties", () => {
  const heater = fc.record({ voltage: logUniform(1e-3, 500), current: logUniform(1e-4, 20) });
  const heaters = fc.array(heater, { minLength: 1, maxLength: 40 });

  it("never NaN or Infinity; R and P are zero exactly when the string needs the whole line", () => {
    fc.assert(
      fc.property(logUniform(1e-3, 1000), heaters, (lineVoltage, hs) => {
        const o = out({ lineVoltage, heaters: hs });
        const nums = [o.stringVoltage, o.stringCurrent, o.droppingResistance, o.dissipation, o.nearestPreferred];
        for (const s of o.shunts) nums.push(s.resistance, s.dissipation, s.nearestPreferred);
        for (const x of nums) expect(Number.isFinite(x)).toBe(true);
        expect(o.droppingResistance > 0).toBe(lineVoltage > o.stringVoltage);
        expect(o.dissipation).toBeGreaterThanOrEqual(0);
      }),
    );
  });

  it("every heater carries its rated current: the string at the highest, each lower one shunted (Kirchhoff)", () => {
    fc.assert(
      fc.property(heaters, (hs) => {
        const o = out({ lineVoltage: 230, heaters: hs });
        const iMax = Math.max(...hs.map((h) => h.current));
        expect(o.stringCurrent).toBe(iMax);
        const byIndex = new Map(o.shunts.map((s) => [s.index, s]));
        hs.forEach((h, k) => {
          const s = byIndex.get(k);
          expect(s === undefined).toBe(h.current === iMax);
          // heater current = string current − shunt current, at the heater's own voltage
          const inHeater = s ? o.stringCurrent - h.voltage / s.resistance : o.stringCurrent;
          expect(Math.abs(inHeater - h.current)).toBeLessThanOrEqual(1e-9 * iMax);
          if (s) expect(s.nearestPreferred).toBe(nearestPreferred(s.resistance, "E12"));
        });
      }),
    );
  });

  it("energy balance: line power = heaters + shunts + dropper whenever a dropper is needed", () => {
    fc.assert(
      fc.property(heaters, logUniform(1.01, 10), (hs, ratio) => {
        const sum = hs.reduce((s, h) => s + h.voltage, 0);
        const o = out({ lineVoltage: Math.min(1000, sum * ratio), heaters: hs });
        fc.pre(o.droppingResistance > 0);
        const line = Math.min(1000, sum * ratio) * o.stringCurrent;
        const parts = hs.reduce((s, h) => s + h.voltage * h.current, 0) + o.shunts.reduce((s, x) => s + x.dissipation, 0) + o.dissipation;
        expect(Math.abs(parts - line)).toBeLessThanOrEqual(1e-9 * line);
      }),
    );
  });

  it("any list of table tubes sums the table's voltages and runs at the highest current", () => {
    fc.assert(
      fc.property(fc.array(fc.constantFrom(...TUBE_NAMES), { minLength: 1, maxLength: 12 }), (tubes) => {
        const o = out({ lineVoltage: 120, tubes });
        const sum = tubes.reduce((s, n) => s + findHeater(n)!.voltage, 0);
        expect(o.stringVoltage).toBeCloseTo(sum, 9);
        expect(o.stringCurrent).toBe(Math.max(...tubes.map((n) => findHeater(n)!.current)));
      }),
    );
  });

  it("a pilot lamp on any tapped string gives finite figures that obey the current split", () => {
    fc.assert(
      fc.property(
        fc.array(fc.constantFrom(...TUBE_NAMES), { maxLength: 8 }),
        logUniform(1, 1000),
        fc.record({ voltage: logUniform(0.5, 250), current: logUniform(1e-3, 5), rectifierCurrent: fc.oneof(fc.constant(0), logUniform(1e-3, 2)) }),
        (others, lineVoltage, lamp) => {
          const o = out({ lineVoltage, tubes: [...others, "35W4"], pilotLamp: lamp });
          for (const x of [o.pilotLampVoltage, o.pilotLampCurrent, o.tapSectionCurrent, o.stringCurrentWithLamp]) expect(Number.isFinite(x)).toBe(true);
          expect(o.pilotLampVoltage!).toBeGreaterThan(0);
          expect(o.pilotLampCurrent! * (lamp.voltage / lamp.current)).toBeCloseTo(o.pilotLampVoltage!, 9);
        },
      ),
    );
  });

  const bad = fc.oneof(fc.double({ max: 0, noNaN: true }), fc.constant("lots"), fc.constant(""), fc.constant("3 ohm"), fc.constant(null));

  it("bad line voltage, heater or lamp fields give ok:false under their names", () => {
    fc.assert(
      fc.property(bad, fc.constantFrom("lineVoltage", "heaters.0.voltage", "heaters.1.current", "pilotLamp.voltage", "pilotLamp.current"), (value, key) => {
        const raw: Record<string, unknown> = {
          lineVoltage: 120,
          heaters: [
            { voltage: 6.3, current: 0.3 },
            { voltage: 6.3, current: 0.3 },
          ],
          pilotLamp: { voltage: 6.3, current: 0.15 },
        };
        const path = key.split(".");
        if (path.length === 1) raw[key] = value;
        else {
          let node = raw[path[0]] as Record<string, unknown>;
          if (path.length === 3) node = (node as unknown as Record<string, unknown>[])[Number(path[1])];
          node[path[path.length - 1]] = value;
        }
        const r = runCalculator(calculator, raw);
        expect(r.ok).toBe(false);
        if (!r.ok) expect(typeof r.error.fields[key]).toBe("string");
      }),
    );
  });
});
