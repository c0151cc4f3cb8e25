import { describe, expect, it } from "vitest";
import { formatQuantity } from "@/lib/calc/format";
import { getCalculator } from "@/lib/calc/registry";
import { runCalculator } from "@/lib/calc/run";
import { HIGH_VOLTAGE_CAUTION } from "@/lib/calc/safety";
import { askedHelp, DRILL_KINDS, generateDrill, judgeDrill, similarDrill, type Drill } from "@/lib/drills";
import { drillsOf } from "../helpers/drills";

/**
 * What a drill is made of: the problem carries no answer, seeds regenerate it, the answer is the
 * calculator's own, typical mistakes are recognised with their hint, and the danger caution follows
 * the Bench's rule (more than 50 V in the circuit).
 */

/** The calculator run again on the solution's inputs: the answer must be its figure, not a second formula's. */
function rerun(d: Drill) {
  const calc = getCalculator(d.problem.slug);
  if (!calc) throw new Error(`no calculator ${d.problem.slug}`);
  const r = runCalculator(calc, d.solution.inputs);
  if (!r.ok) throw new Error(JSON.stringify(r.error));
  return r.result;
}

/** Figures of a number as it prints: 252.525… has many, 0.25 has two, 3e-6 has one. */
const significantFigures = (x: number) =>
  x
    .toPrecision(15)
    .replace(/e.*$/, "")
    .replace(".", "")
    .replace(/^[-0]+/, "")
    .replace(/0+$/, "").length;

describe.each(DRILL_KINDS.map((k) => [k.id, k] as const))("%s", (_id, kind) => {
  // Seeds 1001… so these are other problems than the answers file's.
  const drills = drillsOf(kind, 30, 1001);

  it("regenerates the same problem and solution from its seed, and varies between seeds", () => {
    for (const d of drills.slice(0, 5)) expect(generateDrill(kind.id, d.problem.seed)).toEqual(d);
    expect(new Set(drills.map((d) => d.problem.prompt)).size).toBeGreaterThan(1);
    const similar = similarDrill(drills[0]);
    expect(similar.problem.kind).toBe(kind.id);
    expect(similar.problem.seed).not.toBe(drills[0].problem.seed);
  });

  it("keeps the answer out of the problem sent to the browser", () => {
    for (const d of drills) {
      // Only these fields, and no number but the seed: nothing of the solution rides along.
      expect(Object.keys(d.problem).sort()).toEqual(["asked", "caution", "danger", "given", "kind", "prompt", "seed", "slug", "title"]);
      expect(d.problem.asked).toEqual({ ...kind.asked, help: askedHelp(kind.asked) });
      expect(d.problem.prompt.endsWith(` ${d.problem.asked.help}`)).toBe(true);
      expect(Object.values(d.problem.given).every((v) => typeof v === "string")).toBe(true);
      const json = JSON.stringify(d.problem);
      expect(json).not.toMatch(/"(expected|solution|inputs|mistakes|steps|solved)"/);
      const { expected, expectedText } = d.solution;
      const told = JSON.stringify({ prompt: d.problem.prompt, given: d.problem.given });
      if (typeof expected === "string") {
        expect(Object.values(d.problem.given).map((v) => v.toLowerCase())).not.toContain(expected.toLowerCase());
        continue;
      }
      // The full-precision figure (four or more figures, so no round number of the wording matches by chance).
      if (significantFigures(expected) >= 4) {
        expect(told).not.toContain(String(expected));
      }
      // The answer as written with its unit ("253 Ω") may appear only as a constant of the kind's wording
      // (the 3 µA floor), that is also in problems whose answer is something else.
      if (kind.asked.unit !== "" && kind.asked.unit !== "%" && told.includes(expectedText)) {
        const elsewhere = drills.some((e) => e.solution.expectedText !== expectedText && JSON.stringify(e.problem).includes(expectedText));
        expect(elsewhere, `${expectedText} in: ${d.problem.prompt}`).toBe(true);
      }
    }
  });

  it("takes its answer from the calculator (a backward kind: the input that reproduces the given figure)", () => {
    for (const d of drills) {
      const r = rerun(d);
      const solved = d.solution.solved;
      if (kind.direction === "backward") {
        expect(solved).not.toBeNull();
        if (!solved) continue;
        expect(d.solution.expected).toBe(r.inputs[solved.input]);
        const got = r.outputs[solved.output] as number;
        expect(Math.abs(got - solved.target)).toBeLessThanOrEqual(1e-7 * Math.abs(solved.target));
        // The figure the problem states is the one the calculator reproduces.
        const unit = getCalculator(kind.slug)!.outputs.find((o) => o.name === solved.output)!.unit;
        expect(Object.values(d.problem.given)).toContain(formatQuantity(solved.target, unit));
      } else {
        expect(solved).toBeNull();
        const out = r.outputs[kind.asked.name];
        expect(d.solution.expected).toEqual(Array.isArray(out) ? out.join(" ") : out);
      }
      expect(r.steps).toEqual(d.solution.steps);
    }
  });

  it("recognises each typical mistake and points to its step with its hint", () => {
    for (const d of drills) {
      for (const m of d.solution.mistakes) {
        expect(d.solution.steps[m.stepIndex].label).toBe(m.step);
        const j = judgeDrill(d, typeof m.value === "number" && kind.asked.unit === "%" ? m.value * 100 : m.value);
        expect(j.verdict, `${m.value} for ${d.solution.expected}`).toBe("wrong-number");
        expect(j.mistake).toEqual({ step: m.step, stepIndex: m.stepIndex, hint: m.hint });
        expect(j.message).toContain(m.hint);
      }
      if (d.solution.pitfall) expect(d.solution.mistakes.map((m) => m.hint)).toContain(d.solution.pitfall.hint);
    }
  });

  it("carries the danger caution exactly when more than 50 V is involved, and never calls a figure safe", () => {
    for (const d of drills) {
      const r = rerun(d);
      const volts = getCalculator(kind.slug)!
        .inputs.filter((i) => i.quantity === "voltage")
        .map((i) => r.inputs[i.name]);
      const over50 = volts.some((v) => typeof v === "number" && Math.abs(v) > 50);
      const benchDanger = r.warnings.some((w) => w.level === "danger");
      expect(d.problem.danger).toBe(over50 || benchDanger);
      if (over50) expect(d.problem.danger).toBe(true);
      expect(d.problem.caution).toBe(d.problem.danger ? HIGH_VOLTAGE_CAUTION : null);
      const words = [d.problem.prompt, ...Object.keys(d.problem.given), ...Object.values(d.problem.given), ...d.solution.mistakes.map((m) => m.hint)].join(" ");
      expect(words).not.toMatch(/\bsafe(ly|r|st|ty)?\b/i);
    }
  });
});
