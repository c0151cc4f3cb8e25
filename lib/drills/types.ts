import type { OutputValue, Step, Warning } from "../calc/types";
import type { DrillVerdict } from "../vocabulary";
import type { Rng } from "./rng";

/**
 * Shapes of the Drills core: a drill kind makes problems from one calculator; the problem sent to
 * the browser never carries the answer, which stays in the solution on the server.
 */

/**
 * The unit the answer is asked in: an SI unit symbol of lib/calc (its quantity is read with the
 * shared parser, prefixes welcome), "%" for a fraction asked in per cent, "" for a plain number
 * (a gain, a ratio) and "text" for words (a verdict, colour names).
 */
export type AskedUnit = "V" | "A" | "Ω" | "W" | "F" | "H" | "Hz" | "s" | "m" | "S" | "%" | "" | "text";

export interface Asked {
  /** Output name of the calculator (forward kinds) or the input solved for (backward kinds). */
  name: string;
  /** Plain words: "cathode resistor". */
  label: string;
  unit: AskedUnit;
  /** Text asks: the words a right answer is chosen from ("within", "high", "low", "open"). */
  choices?: readonly string[];
}

/**
 * How close an answer must be. Relative: |a − e| ≤ fraction·|e| (a computed figure, allowing for
 * rounding of the working). Absolute: |a − e| ≤ amount, in SI (a fraction for "%" asks). Exact: the
 * very number (a preferred value, a standard rating, a table figure; 1e-9 relative slack for binary
 * noise) or, for text, the same words ignoring case, spacing and separators.
 */
export type ToleranceRule = { type: "relative"; fraction: number } | { type: "absolute"; amount: number } | { type: "exact" };

/** A typical wrong answer, worked from the same inputs, and where in the working it goes wrong. */
export interface MistakeSpec {
  value: number | string;
  /** The label of the working step where it happens, or the first words of it. */
  step: string;
  hint: string;
}

/** What a kind's generator draws: the calculator inputs and the problem in bench words. */
export interface DrillSetup {
  /** Raw calculator inputs (SI numbers or engineering text); a backward kind leaves its unknown out. */
  inputs: Record<string, unknown>;
  /** The problem, without the "answer in …" line (makeDrill adds it for every kind alike). */
  prompt: string;
  /** What the problem gives, label → value with its unit ("Plate current" → "45 mA"). */
  given: Record<string, string>;
  /**
   * Backward kinds: find `input` so that the calculator's `output` equals `target`, searching between
   * lo and hi (the calculator is run, never a second formula); the answer is that input.
   */
  solve?: { input: string; output: string; target: number; lo: number; hi: number };
}

/** What the kind's mistakes and checks see once the calculator has run. */
export interface SolvedContext {
  /** Normalised SI inputs, as runCalculator gave them back (including a backward kind's solved unknown). */
  inputs: Record<string, unknown>;
  outputs: Record<string, OutputValue>;
  /** The calculator's warnings: a kind may refuse a draw the Bench would caution about. */
  warnings: Warning[];
  expected: number | string;
  setup: DrillSetup;
}

export interface DrillKind {
  /** "cathode-bias/resistor": slug, then what is asked. */
  id: string;
  slug: string;
  title: string;
  /** Backward kinds ask for an input from a figure the calculator would give (the resistor → the bias). */
  direction: "forward" | "backward";
  asked: Asked;
  tolerance: ToleranceRule;
  /** Label (or its first words) of the working step where the asked figure is worked out. */
  answerStep: string;
  generate(rng: Rng): DrillSetup;
  /** Redraw when false (an operating point the model cannot solve, a figure out of the bench's range). */
  accept?(ctx: SolvedContext): boolean;
  /** Typical wrong answers for these inputs. */
  mistakes?(ctx: SolvedContext): MistakeSpec[];
  /** Text kinds: other ways of writing each right answer ("within tolerance" for "within"). */
  synonyms?: Record<string, readonly string[]>;
}

/** The problem as the browser may see it: no inputs, no answer. */
export interface DrillProblem {
  kind: string;
  seed: number;
  slug: string;
  title: string;
  prompt: string;
  given: Record<string, string>;
  asked: Asked & { help: string };
  /** More than 50 V in the circuit: the Bench's danger caution goes with the problem. */
  danger: boolean;
  caution: string | null;
}

/** A mistake as the solution keeps it: its step resolved to the full label in the working. */
export interface Mistake {
  value: number | string;
  step: string;
  stepIndex: number;
  hint: string;
}

/** Server side only: everything needed to judge an answer and show the working. */
export interface DrillSolution {
  inputs: Record<string, unknown>;
  expected: number | string;
  /** The expected answer as a person writes it: "253 Ω", "yellow violet red gold". */
  expectedText: string;
  tolerance: ToleranceRule;
  toleranceText: string;
  steps: Step[];
  warnings: Warning[];
  /** Where the asked figure is worked out in the steps. */
  answerStepIndex: number;
  mistakes: Mistake[];
  /** Backward kinds: the figure the solved input reproduces through the calculator (checked when made). */
  solved: { input: string; output: string; target: number } | null;
  /** The earliest step where one of the kind's typical mistakes happens, pointed out with every answer. */
  pitfall: Mistake | null;
}

export interface Drill {
  problem: DrillProblem;
  solution: DrillSolution;
}

/** "wrong-number" is any wrong answer of the right sort: a wrong figure, or wrong words for a text ask. */
export type Verdict = DrillVerdict | "unreadable";

export interface Judgement {
  correct: boolean;
  verdict: Verdict;
  expected: number | string;
  expectedText: string;
  tolerance: ToleranceRule;
  toleranceText: string;
  /** How the answer was read (SI number, or the words), null when it could not be read. */
  received: number | string | null;
  /** One or two sentences of feedback in plain words. */
  message: string;
  /** The typical mistake the answer matches, with the step where it happens. */
  mistake?: { step: string; stepIndex: number; hint: string };
  /** The first step where a typical mistake of this kind happens, pointed out with every answer. */
  pitfall?: { step: string; stepIndex: number; hint: string };
  steps: Step[];
}
