import { formatAnswer, normaliseWords } from "./answer";
import type { AskedUnit, ToleranceRule } from "./types";

/** Relative slack of an "exact" number: binary noise only (4.7e3 against 4700). */
const EXACT = 1e-9;

/** Half the width of the window of right answers around a value. */
export function halfWidth(value: number, rule: ToleranceRule): number {
  switch (rule.type) {
    case "relative":
      return rule.fraction * Math.abs(value);
    case "absolute":
      return rule.amount;
    case "exact":
      return EXACT * Math.abs(value);
  }
}

/** Does `answer` fall in the window around `target`? Text is compared as words. */
export function matches(answer: number | string, target: number | string, rule: ToleranceRule): boolean {
  if (typeof answer === "string" || typeof target === "string") {
    return typeof answer === "string" && typeof target === "string" && normaliseWords(answer) === normaliseWords(target);
  }
  // The tiny extra keeps a value typed at the very edge (2.00 % out) on the side of right.
  return Math.abs(answer - target) <= halfWidth(target, rule) * (1 + 1e-9) + 1e-300;
}

/** Two windows overlap: a typical mistake too close to the answer (or to another) cannot be told apart. */
export function overlaps(a: number | string, b: number | string, rule: ToleranceRule): boolean {
  if (typeof a === "string" || typeof b === "string") return matches(a, b, { type: "exact" });
  return Math.abs(a - b) <= halfWidth(a, rule) + halfWidth(b, rule) + 1e-12 * Math.max(Math.abs(a), Math.abs(b));
}

export function toleranceText(rule: ToleranceRule, unit: AskedUnit): string {
  switch (rule.type) {
    case "relative":
      return `within ${Number((rule.fraction * 100).toPrecision(3))} % of the answer`;
    case "absolute":
      return unit === "%" ? `within ±${Number((rule.amount * 100).toPrecision(3))} percentage points` : `within ±${formatAnswer(rule.amount, unit)}`;
    case "exact":
      return unit === "text" ? "the same words (case and spacing do not matter)" : "exactly: a standard value or a table figure";
  }
}
