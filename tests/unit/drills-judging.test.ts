import { describe, expect, it } from "vitest";
import { DRILL_KINDS, generateDrill, judgeDrill, readAnswer, type Asked, type Drill } from "@/lib/drills";

/** Answers as people write them, and the bench examples of the issue: the slip is found and its step named. */

const ask = (unit: Asked["unit"]): Asked => ({ name: "x", label: "x", unit });
const read = (raw: unknown, unit: Asked["unit"]) => readAnswer(raw, ask(unit));

describe("reading answers as people write them", () => {
  it.each([
    ["1.5k", "Ω", 1500],
    ["1k5", "Ω", 1500],
    ["2,2 kΩ", "Ω", 2200],
    ["4k7 Ω", "Ω", 4700],
    ["4.7 kohm", "Ω", 4700],
    ["250 mW", "W", 0.25],
    ["0.25 W", "W", 0.25],
    ["1/4 W", "W", 0.25],
    ["½ W", "W", 0.5],
    ["4.7 uF", "F", 4.7e-6],
    ["4.7 µF", "F", 4.7e-6],
    ["0.047 mfd", "F", 4.7e-8],
    ["25 ms", "s", 0.025],
    ["3.2 kHz", "Hz", 3200],
    ["45 mA", "A", 0.045],
    ["12.5", "V", 12.5],
    ["−12.5 V", "V", -12.5],
    ["28 %", "%", 0.28],
    ["28", "%", 0.28],
    ["56.5", "", 56.5],
    ["56.5 x", "", 56.5],
    ["5 mm", "m", 0.005],
  ] as const)("%s in %s", (raw, unit, value) => {
    const r = read(raw, unit);
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.value as number).toBeCloseTo(value, 12);
  });

  it("reads a JSON number in the asked unit (per cent for a percentage)", () => {
    expect(read(0.25, "W")).toEqual({ ok: true, value: 0.25 });
    expect(read(28, "%")).toEqual({ ok: true, value: 0.28 });
    expect(read(Number.NaN, "W").ok).toBe(false);
  });

  it("tells another quantity's unit from an unreadable answer", () => {
    for (const [raw, unit] of [
      ["0.25 V", "W"],
      ["4.7 uF", "Ω"],
      ["250 mW", "V"],
      ["1.5 kHz", "Ω"],
      ["12 V", "%"],
      ["3 A", ""],
    ] as const) {
      const r = read(raw, unit);
      expect(r.ok, raw).toBe(false);
      if (!r.ok) expect(r.verdict, raw).toBe("wrong-unit");
    }
    for (const [raw, unit] of [
      ["about a bit", "W"],
      ["", "Ω"],
      ["1.2.3", "V"],
      [null, "A"],
    ] as const) {
      const r = read(raw, unit);
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.verdict).toBe("unreadable");
    }
  });

  it("never reads a bare number as farads (docs/PRODUCT.md, vintage markings)", () => {
    const r = read("47", "F");
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.verdict).toBe("unreadable");
      expect(r.message).toMatch(/farads/);
    }
  });

  it("compares words ignoring case, spacing, separators and the spelling of grey", () => {
    expect(read("  Yellow-Violet, RED / gold ", "text")).toEqual({ ok: true, value: "yellow violet red gold" });
    expect(read("gray", "text")).toEqual({ ok: true, value: "grey" });
  });
});

/** The first drill of a kind (searching seeds) that matches a condition: the examples, made by the generator. */
function findDrill(id: string, test: (d: Drill) => boolean): Drill {
  for (let seed = 1; seed < 3000; seed++) {
    const d = generateDrill(id, seed);
    if (test(d)) return d;
  }
  throw new Error(`no ${id} drill matched`);
}

describe("the bench examples of the issue", () => {
  it("6V6GT, 45 mA plate and 4.5 mA screen at 12.5 V bias: about 250 Ω, and 278 Ω is the forgotten screen current", () => {
    // 6V6GT data sheet, class A1 at 250 V: Rk about 250 Ω (from memory); 12.5 V/49.5 mA = 252.5 Ω.
    const d = findDrill(
      "cathode-bias/resistor",
      (x) => x.problem.given["Screen current"] === "4.5 mA" && x.problem.given["Plate current"] === "45 mA" && x.problem.given["Grid bias"] === "12.5 V",
    );
    expect(d.solution.expected as number).toBeCloseTo(252.525, 2);
    expect(judgeDrill(d, "250").correct).toBe(true); // within 2 %
    expect(judgeDrill(d, "252R5").correct).toBe(true);
    const slip = judgeDrill(d, "278 Ω"); // 12.5 V / 45 mA
    expect(slip.verdict).toBe("wrong-number");
    expect(slip.mistake?.step).toBe("Cathode current");
    expect(slip.mistake?.hint).toMatch(/screen current/);
    expect(slip.pitfall?.step).toBe("Cathode current");
    expect(judgeDrill(d, "252.5 V").verdict).toBe("wrong-unit");
  });

  it("its rating: 2 W, and 1 W is the part without the factor of two", () => {
    const d = findDrill(
      "cathode-bias/rating",
      (x) => x.problem.given["Screen current"] === "4.5 mA" && x.problem.given["Plate current"] === "45 mA" && x.problem.given["Grid bias"] === "12.5 V",
    );
    expect(d.solution.expected).toBe(2); // 2 × 0.619 W = 1.24 W → the next standard rating, 2 W (common practice)
    expect(judgeDrill(d, "2 W").correct).toBe(true);
    expect(judgeDrill(d, "2000 mW").correct).toBe(true);
    expect(judgeDrill(d, "1 W").mistake?.hint).toMatch(/twice/);
  });

  it("a dropping resistor worked from the full B+ is pointed out at the resistance step", () => {
    const d = findDrill("dropping-resistor/resistance", () => true);
    const supply = Number.parseFloat(d.problem.given["B+"]);
    const current = readAnswer(d.problem.given["Current drawn"], ask("A"));
    if (!current.ok) throw new Error("unreadable current");
    const j = judgeDrill(d, supply / (current.value as number));
    expect(j.mistake?.step).toBe("Resistance");
    expect(j.mistake?.hint).toMatch(/full B\+/);
  });

  it("a reactance worked without 2π (radians taken for hertz) is pointed out", () => {
    const d = findDrill("reactance/capacitive", () => true);
    const j = judgeDrill(d, (d.solution.expected as number) * 2 * Math.PI);
    expect(j.mistake?.step).toBe("Capacitive reactance");
    expect(j.mistake?.hint).toMatch(/2π/);
  });

  it("a prefix slipped by a thousand is named as such", () => {
    const d = findDrill("ohms-law/current", () => true);
    const j = judgeDrill(d, `${(d.solution.expected as number) * 1000} A`);
    expect(j.mistake?.hint).toMatch(/thousand times too large/);
  });

  it("takes a verdict in the bench's other words, and refuses an answer that names no side", () => {
    const within = findDrill("resistor-drift/verdict", (x) => x.solution.expected === "within");
    expect(judgeDrill(within, "In tolerance").correct).toBe(true);
    const high = findDrill("resistor-drift/verdict", (x) => x.solution.expected === "high");
    expect(judgeDrill(high, "reads HIGH").correct).toBe(true);
    expect(judgeDrill(high, "out of tolerance").verdict).toBe("wrong-number");
    expect(high.problem.prompt).toMatch(/Answer in words: within, high or low\.$/);
  });

  it("covers every kind with at least one drill whose typical mistake is recognised, or the prefix slip", () => {
    for (const k of DRILL_KINDS) {
      const d = generateDrill(k.id, 42);
      if (k.asked.unit !== "text" && k.asked.unit !== "" && k.asked.unit !== "%") expect(d.solution.mistakes.length, k.id).toBeGreaterThan(0);
    }
  });
});
