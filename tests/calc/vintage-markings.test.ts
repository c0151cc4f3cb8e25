import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { calculator as colourCode } from "@/lib/calc/colour-code";
import { runCalculator } from "@/lib/calc/run";
import { DOT_COLOURS, FIGURE_COLOURS } from "@/lib/calc/tables/vintage-markings";
import { calculator } from "@/lib/calc/vintage-markings";
import { calcRunner } from "../helpers/calc";

type Out = { resistance: number; tolerance: number; equivalentBands: string[] };

const { run, out, fields } = calcRunner<Out>(calculator);

describe("vintage-markings: body-end-dot against the era's colour code", () => {
  it("brown body, black end, orange dot is 10 kΩ", () => {
    // RMA colour code of the 1930s–40s: body 1st figure, end 2nd, dot multiplier (from memory)
    expect(out({ scheme: "body-end-dot", body: "brown", end: "black", dot: "orange" }).resistance).toBe(10_000);
  });

  it("yellow–violet–red is 4.7 kΩ, red–violet–yellow 270 kΩ, brown–black–green 1 MΩ", () => {
    // RMA code (from memory): 47 × 10², 27 × 10⁴, 10 × 10⁵
    expect(out({ body: "yellow", end: "violet", dot: "red" }).resistance).toBe(4700);
    expect(out({ body: "red", end: "violet", dot: "yellow" }).resistance).toBe(270_000);
    expect(out({ body: "brown", end: "black", dot: "green" }).resistance).toBe(1_000_000);
  });

  it("a missing dot is the body colour: red body, red end, no dot is 2.2 kΩ; an all-orange part 33 kΩ", () => {
    // common practice (from memory): paint of the body's own colour is not applied, so it cannot be seen
    const r = run({ body: "red", end: "red" });
    expect(r.outputs.resistance).toBe(2200);
    expect(r.warnings.some((w) => /No dot given: read as the body colour/.test(w.message))).toBe(true);
    expect(r.steps[1].label).toMatch(/not shown: the body colour/);
    const orange = run({ body: "orange" });
    expect(orange.outputs.resistance).toBe(33_000);
    expect(orange.warnings.some((w) => /No end colour given/.test(w.message))).toBe(true);
    expect(run({ body: "red", end: "red", dot: "red" }).warnings.some((w) => /No dot/.test(w.message))).toBe(false);
  });

  it("gold and silver dots divide: yellow–violet–gold is 4.7 Ω; the other end gives the tolerance", () => {
    // RMA code: gold ×0.1, silver ×0.01; tolerance end gold ±5 %, silver ±10 %, none ±20 % (from memory)
    expect(out({ body: "yellow", end: "violet", dot: "gold" }).resistance).toBe(4.7);
    expect(out({ body: "red", end: "red", dot: "silver" }).resistance).toBe(0.22);
    expect(out({ body: "brown", end: "black", dot: "orange", toleranceEnd: "silver" }).tolerance).toBe(0.1);
    expect(out({ body: "brown", end: "black", dot: "orange", toleranceEnd: "gold" }).tolerance).toBe(0.05);
    expect(out({ body: "brown", end: "black", dot: "orange" }).tolerance).toBe(0.2);
  });

  it("reads the trade's spellings: Gray, upper case, spaces", () => {
    expect(out({ body: " Gray ", end: "RED", dot: "brown" }).resistance).toBe(820);
  });
});

describe("vintage-markings: identities and properties", () => {
  it("property: equals today's three-band reading of body, end, dot (IEC 60062 uses the same figures)", () => {
    const body = fc.constantFrom(...FIGURE_COLOURS.filter((c) => c !== "black"));
    fc.assert(
      fc.property(body, fc.constantFrom(...FIGURE_COLOURS), fc.constantFrom(...DOT_COLOURS), (b, e, d) => {
        const o = out({ body: b, end: e, dot: d });
        const modern = runCalculator(colourCode, { bands: [b, e, d] });
        if (!modern.ok) throw new Error(modern.error.message);
        expect(o.resistance).toBe(modern.result.outputs.resistance);
        expect(o.equivalentBands).toEqual([b, e, d, "none"]);
        expect(Number.isFinite(o.resistance) && o.resistance > 0).toBe(true);
      }),
    );
  });

  it("property: leaving out the end or dot is the same as giving the body colour", () => {
    fc.assert(
      fc.property(fc.constantFrom(...FIGURE_COLOURS.filter((c) => c !== "black")), fc.constantFrom(...FIGURE_COLOURS), (b, e) => {
        expect(out({ body: b, end: e }).resistance).toBe(out({ body: b, end: e, dot: b }).resistance);
        expect(out({ body: b }).resistance).toBe(out({ body: b, end: b, dot: b }).resistance);
      }),
    );
  });

  it("no voltage here, so no danger; nothing is called safe", () => {
    const r = run({ body: "brown", end: "black", dot: "orange" });
    expect(r.warnings.some((w) => w.level === "danger")).toBe(false);
    for (const w of r.warnings) expect(w.message).not.toMatch(/\bsafe\b/i);
  });
});

describe("vintage-markings: refusals", () => {
  it("names the field: body required, black body, unknown colours, gold as a figure, pink dot, unknown scheme", () => {
    expect(fields({ end: "black", dot: "orange" }).body).toMatch(/required/);
    expect(fields({ body: "black", end: "brown", dot: "red" }).body).toMatch(/black is 0/);
    expect(fields({ body: "mauve", end: "black" }).body).toMatch(/colour name/);
    expect(fields({ body: "brown", end: "gold" }).end).toMatch(/not a figure/);
    expect(fields({ body: "brown", end: "black", dot: "pink" }).dot).toMatch(/not a multiplier/);
    expect(fields({ scheme: "six-band", body: "brown" }).scheme).toMatch(/body-end-dot/);
    expect(fields({ body: "brown", toleranceEnd: "red" }).toleranceEnd).toMatch(/gold, silver or none/);
  });

  it("property: anything but a colour name is refused under its field", () => {
    const bad = fc.oneof(fc.integer(), fc.constantFrom(true, {}, [1], "12", "brownish"));
    for (const name of ["body", "end", "dot"]) {
      fc.assert(fc.property(bad, (v) => void expect(fields({ body: "brown", [name]: v })).toHaveProperty(name)));
    }
  });
});
