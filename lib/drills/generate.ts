import { HAZARD_VOLTS, HIGH_VOLTAGE_CAUTION } from "../calc/safety";
import type { OutputValue, Step } from "../calc/types";
import { askedHelp, formatAnswer, UNIT_KIND } from "./answer";
import { calculatorFor, DrillSetupError, invert, runFor } from "./calc";
import { createRng } from "./rng";
import { overlaps, toleranceText } from "./tolerance";
import type { Drill, DrillKind, DrillProblem, Mistake, MistakeSpec, SolvedContext } from "./types";

/**
 * Making a drill: draw inputs with the seeded generator, run the Bench's calculator (searching the
 * unknown input for a backward kind), and split the result into the problem the browser sees and
 * the solution the server keeps. The same kind and seed always give the same drill.
 */

const MAX_DRAWS = 200;

/** The asked figure from the calculator's output: a number, or words (colour bands joined by spaces). */
function expectedFrom(v: OutputValue | undefined): number | string | null {
  if (typeof v === "number") return Number.isFinite(v) ? v : null;
  if (typeof v === "string") return v;
  if (typeof v === "boolean") return v ? "yes" : "no";
  if (Array.isArray(v) && v.every((x) => typeof x === "string")) return v.join(" ");
  return null;
}

/** The first step whose label begins with `prefix`: a mistake names its step by its opening words. */
function stepIndex(steps: readonly Step[], prefix: string, kind: DrillKind): number {
  const i = steps.findIndex((s) => s.label.startsWith(prefix));
  if (i < 0) throw new DrillSetupError(`${kind.id}: no working step starts with "${prefix}"`);
  return i;
}

/** A factor of a thousand out is a prefix slipped (mA written as A, µF as mF): worth its own hint. */
function prefixSlips(kind: DrillKind, expected: number): MistakeSpec[] {
  if (!UNIT_KIND[kind.asked.unit] || expected === 0) return [];
  return [
    {
      value: expected * 1000,
      step: kind.answerStep,
      hint: "That is a thousand times too large: check the prefixes (k, m, µ) as you carry values through the working.",
    },
    {
      value: expected / 1000,
      step: kind.answerStep,
      hint: "That is a thousand times too small: check the prefixes (k, m, µ) as you carry values through the working.",
    },
  ];
}

/** Mistakes that can be told apart: finite, away from the answer and from each other. */
function keepDistinct(kind: DrillKind, specs: MistakeSpec[], expected: number | string, steps: readonly Step[]): Mistake[] {
  const kept: Mistake[] = [];
  for (const m of specs) {
    if (typeof m.value === "number" && !Number.isFinite(m.value)) continue;
    if (typeof m.value !== typeof expected) continue;
    if (overlaps(m.value, expected, kind.tolerance) || kept.some((k) => overlaps(k.value, m.value, kind.tolerance))) continue;
    const i = stepIndex(steps, m.step, kind);
    kept.push({ value: m.value, step: steps[i].label, stepIndex: i, hint: m.hint });
  }
  return kept;
}

/** More than 50 V anywhere in the circuit: the calculator's own danger warning, or a voltage input above it. */
function involvesHighVoltage(kind: DrillKind, inputs: Record<string, unknown>, warnings: { level: string }[]): boolean {
  if (warnings.some((w) => w.level === "danger")) return true;
  return calculatorFor(kind.slug).inputs.some(
    (meta) => meta.quantity === "voltage" && typeof inputs[meta.name] === "number" && Math.abs(inputs[meta.name] as number) > HAZARD_VOLTS,
  );
}

/** "a 8 µF" → "an 8 µF": the article as the figure is spoken (eight, eleven, eighteen, eighty …). */
export function fixArticles(text: string): string {
  return text.replace(/\b([Aa]) (?=(?:8|11(?!\d)|18(?!\d)))/g, (_, a: string) => `${a}n `);
}

export function makeDrill(kind: DrillKind, seed: number): Drill {
  const rng = createRng(seed);
  for (let draw = 0; draw < MAX_DRAWS; draw++) {
    const setup = kind.generate(rng);
    let raw = setup.inputs;
    if (setup.solve) {
      const { input, output, target, lo, hi } = setup.solve;
      raw = { ...raw, [input]: invert(kind.slug, raw, input, output, target, lo, hi) };
    }
    const result = runFor(kind.slug, raw);
    const expected = setup.solve ? expectedFrom(result.inputs[setup.solve.input] as OutputValue) : expectedFrom(result.outputs[kind.asked.name]);
    if (expected === null) continue;
    const ctx: SolvedContext = { inputs: result.inputs, outputs: result.outputs, warnings: result.warnings, expected, setup };
    if (kind.accept && !kind.accept(ctx)) continue;

    const danger = involvesHighVoltage(kind, result.inputs, result.warnings);
    const problem: DrillProblem = {
      kind: kind.id,
      seed: seed >>> 0,
      slug: kind.slug,
      title: kind.title,
      // The unit line closes the prompt, so a bare number's meaning is stated where it is asked.
      prompt: `${fixArticles(setup.prompt)} ${askedHelp(kind.asked)}`,
      given: setup.given,
      asked: { ...kind.asked, help: askedHelp(kind.asked) },
      danger,
      caution: danger ? HIGH_VOLTAGE_CAUTION : null,
    };
    const own = keepDistinct(kind, kind.mistakes?.(ctx) ?? [], expected, result.steps);
    const slips = typeof expected === "number" ? prefixSlips(kind, expected) : [];
    const mistakes = keepDistinct(kind, [...own.map((m) => ({ ...m })), ...slips], expected, result.steps);
    return {
      problem,
      solution: {
        inputs: result.inputs,
        expected,
        expectedText: formatAnswer(expected, kind.asked.unit, 4),
        tolerance: kind.tolerance,
        toleranceText: toleranceText(kind.tolerance, kind.asked.unit),
        steps: result.steps,
        warnings: result.warnings,
        answerStepIndex: stepIndex(result.steps, kind.answerStep, kind),
        mistakes,
        solved: setup.solve ? { input: setup.solve.input, output: setup.solve.output, target: setup.solve.target } : null,
        pitfall: own.length ? [...own].sort((a, b) => a.stepIndex - b.stepIndex)[0] : null,
      },
    };
  }
  throw new DrillSetupError(`${kind.id}: no acceptable problem in ${MAX_DRAWS} draws from seed ${seed}`);
}
