import { getCalculator } from "../calc/registry";
import { runCalculator, type CalculationResponse } from "../calc/run";
import type { Calculator } from "../calc/types";

/**
 * The one way the Drills reach a number: the Bench's own calculator. Expected answers, backward
 * answers (by searching an input until the calculator gives the stated figure) and most typical
 * mistakes (the same calculator with the slip made, e.g. the screen current left out) come from here.
 */

export class DrillSetupError extends Error {}

export function calculatorFor(slug: string): Calculator {
  const calc = getCalculator(slug);
  if (!calc) throw new DrillSetupError(`No calculator "${slug}" is registered`);
  return calc;
}

/** runCalculator for a drill's inputs; a refusal is a fault of the drill kind, so it throws. */
export function runFor(slug: string, inputs: Record<string, unknown>): CalculationResponse {
  const r = runCalculator(calculatorFor(slug), inputs);
  if (!r.ok) throw new DrillSetupError(`${slug} refused the drill's inputs: ${r.error.message} ${JSON.stringify(r.error.fields)}`);
  return r.result;
}

/** One numeric output of the calculator for these inputs (a mistake made with the calculator itself). */
export function outputOf(slug: string, inputs: Record<string, unknown>, name: string): number {
  const v = runFor(slug, inputs).outputs[name];
  if (typeof v !== "number" || !Number.isFinite(v)) throw new DrillSetupError(`${slug} gave no number for ${name}`);
  return v;
}

/**
 * The figure a typical slip gives, worked by the calculator with the slip made; NaN when the calculator
 * refuses the slipped inputs (that mistake is then left out of the drill).
 */
export function slipOf(slug: string, inputs: Record<string, unknown>, name: string): number {
  try {
    return outputOf(slug, inputs, name);
  } catch {
    return Number.NaN;
  }
}

/** The output for a trial value of the unknown, through schema and compute only (cheap: no working typeset). */
function trial(calc: Calculator, inputs: Record<string, unknown>, input: string, x: number, output: string): number | null {
  const parsed = calc.schema.safeParse({ ...inputs, [input]: x });
  if (!parsed.success) return null;
  const v = calc.compute(parsed.data).outputs[output];
  return typeof v === "number" && Number.isFinite(v) ? v : null;
}

/**
 * The value of `input` for which the calculator's `output` equals `target`, by bisection on a log
 * scale between lo and hi (bench figures are positive and span decades). The output must change
 * monotonically over the bracket; the result is checked by running the calculator in full.
 */
export function invert(slug: string, inputs: Record<string, unknown>, input: string, output: string, target: number, lo: number, hi: number): number {
  const calc = calculatorFor(slug);
  let a = Math.log(lo);
  let b = Math.log(hi);
  const fa = trial(calc, inputs, input, lo, output);
  const fb = trial(calc, inputs, input, hi, output);
  if (fa === null || fb === null || (fa - target) * (fb - target) > 0) {
    throw new DrillSetupError(`${slug}: ${output} = ${target} is not reached for ${input} between ${lo} and ${hi}`);
  }
  const rising = fb > fa;
  for (let i = 0; i < 200 && b - a > 1e-13; i++) {
    const m = (a + b) / 2;
    const fm = trial(calc, inputs, input, Math.exp(m), output);
    if (fm === null) throw new DrillSetupError(`${slug}: ${input} = ${Math.exp(m)} was refused while solving`);
    if (fm < target === rising) a = m;
    else b = m;
  }
  // Ten figures: ample for any answer, and it turns 1.4999999999998 back into 1.5.
  const x = Number(Math.exp((a + b) / 2).toPrecision(10));
  const check = outputOf(slug, { ...inputs, [input]: x }, output);
  if (Math.abs(check - target) > 1e-7 * Math.abs(target)) {
    throw new DrillSetupError(`${slug}: ${input} = ${x} gives ${output} = ${check}, not ${target}`);
  }
  return x;
}
