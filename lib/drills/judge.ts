import { formatAnswer, normaliseWords, readAnswer } from "./answer";
import { matches } from "./tolerance";
import type { Drill, DrillKind, Judgement, Mistake } from "./types";

/**
 * Judging one answer against the solution the server kept: right within the kind's tolerance, a
 * wrong number (and which typical mistake it matches, if any), a wrong unit, or unreadable. The
 * working goes back with every verdict, and the step where this kind usually goes wrong is pointed out.
 */

const point = (m: Mistake | null | undefined) => (m ? { step: m.step, stepIndex: m.stepIndex, hint: m.hint } : undefined);

/** Text answers: the expected words, or one of the kind's other ways of writing them. */
function textMatches(answer: string, expected: string, kind: DrillKind): boolean {
  if (normaliseWords(answer) === normaliseWords(expected)) return true;
  return (kind.synonyms?.[expected] ?? []).some((s) => normaliseWords(s) === normaliseWords(answer));
}

export function judgeAnswer(kind: DrillKind, drill: Drill, raw: unknown): Judgement {
  const { solution } = drill;
  const { expected, tolerance } = solution;
  const base = {
    expected,
    expectedText: solution.expectedText,
    tolerance,
    toleranceText: solution.toleranceText,
    steps: solution.steps,
    pitfall: point(solution.pitfall),
  };
  const reading = readAnswer(raw, kind.asked);
  if (!reading.ok) {
    if (reading.verdict === "unreadable") {
      return { ...base, correct: false, verdict: "unreadable", received: null, message: reading.message };
    }
    // The number itself may be right with the wrong unit on it ("0.25 V" for 0.25 W): say so.
    const asAsked = kind.asked.unit === "%" ? reading.value / 100 : reading.value;
    const numberRight = typeof expected === "number" && matches(asAsked, expected, tolerance);
    const message = numberRight
      ? `${reading.message} The number would be right in ${kind.asked.unit}.`
      : `${reading.message} The answer is ${solution.expectedText}.`;
    return { ...base, correct: false, verdict: "wrong-unit", received: reading.value, message };
  }
  const value = reading.value;
  const right = typeof value === "string" && typeof expected === "string" ? textMatches(value, expected, kind) : matches(value, expected, tolerance);
  if (right) {
    return { ...base, correct: true, verdict: "correct", received: value, message: `Right: ${solution.expectedText} (${solution.toleranceText}).` };
  }
  if (typeof value !== typeof expected) {
    return { ...base, correct: false, verdict: "unreadable", received: null, message: "The answer is of the wrong sort for this question." };
  }
  const mistake = solution.mistakes.find((m) => matches(value, m.value, tolerance));
  const shown = formatAnswer(value, kind.asked.unit, 4);
  const message = mistake
    ? `Not quite: ${shown} is a typical slip at "${mistake.step}". ${mistake.hint} The answer is ${solution.expectedText}.`
    : `Not quite: ${shown} against ${solution.expectedText} (${solution.toleranceText}). Go through the working step by step.`;
  return { ...base, correct: false, verdict: "wrong-number", received: value, message, ...(mistake ? { mistake: point(mistake) } : {}) };
}
