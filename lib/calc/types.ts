import type { z } from "zod";
import type { BenchDescriptor, CalculatorGroup } from "./bench-descriptor";
import type { QuantityKind } from "./units";

export type { BenchDescriptor, CalculatorGroup };

/** Shared shapes of every calculator in lib/calc. PRODUCT.md's HTTP contract is built from these. */

export type WarningLevel = "danger" | "caution" | "info";

export interface Step {
  label: string;
  latex: string;
}

export interface Warning {
  level: WarningLevel;
  message: string;
}

export interface Reference {
  title: string;
  /** Section, table, page or equation of the source. */
  detail: string;
}

export type OutputValue = number | boolean | string | null | OutputValue[] | { [key: string]: OutputValue };

export interface InputMeta {
  name: string;
  /** Plain-words label for the form. */
  label: string;
  /**
   * The quantity's symbol as its published source writes it, typeset after the label: a base letter
   * or \mu, then _{subscript} and ^{superscript} (K_{G1}, x, \mu). See components/ui/quantity-symbol.tsx.
   */
  symbol?: string;
  /** SI unit symbol shown beside the field ("" for none). */
  unit: string;
  required: boolean;
  default?: unknown;
  /** How the form renders it; "quantity" is a text box that takes engineering notation. */
  control: "quantity" | "select" | "boolean" | "list" | "text";
  quantity?: QuantityKind;
  options?: readonly string[];
  /** What an optional select's empty choice reads ("None" when absent); selects with a default have no empty choice. */
  blankLabel?: string;
  help?: string;
}

export interface OutputMeta {
  name: string;
  label: string;
  unit: string;
}

/** What compute returns: numbers and advice only, no typesetting, so it is cheap enough for every keystroke. */
export interface Computed<O extends Record<string, OutputValue>> {
  outputs: O;
  warnings: Warning[];
}

/** A computed result with its working shown: what runCalculator assembles from compute and explain. */
export interface CalcResult<O extends Record<string, OutputValue>> extends Computed<O> {
  steps: Step[];
}

/** A schema's input names; any string when the schema's input is not an object type (the general Calculator). */
export type InputName<S extends z.ZodType> = [keyof z.input<S>] extends [never] ? string : keyof z.input<S> & string;

export interface Calculator<S extends z.ZodType = z.ZodType, O extends Record<string, OutputValue> = Record<string, OutputValue>, L extends string = string> {
  /** The URL name, a literal type so the registry's `Slug` union can be derived from the calculators. */
  slug: L;
  title: string;
  /** One line: what bench task it answers. */
  purpose: string;
  /** The Bench's knowledge of this calculator (lib/calc/bench-descriptor.ts), typed by its own input and output names. */
  bench: BenchDescriptor<NoInfer<InputName<S>>, NoInfer<keyof O & string>>;
  inputs: readonly InputMeta[];
  outputs: readonly OutputMeta[];
  /** Parses raw inputs (numbers or engineering text) into normalised SI values. */
  schema: S;
  /** The general formulas, shown before the substituted steps. */
  formulas: readonly Step[];
  references: readonly Reference[];
  /** A short paragraph on why the number matters at the bench. */
  whyItMatters: string;
  /** Pure: validated input to outputs and warnings. Never NaN/Infinity for input the schema accepts. */
  compute(input: z.output<S>): Computed<O>;
  /**
   * The substituted steps (LaTeX) for outputs that compute gave for this input. Kept apart from
   * compute because typesetting costs far more than the arithmetic; only shown working needs it.
   */
  explain(input: z.output<S>, outputs: O): Step[];
}

/** Identity helper that keeps the schema's output type flowing into compute, and the slug a literal. */
export function defineCalculator<S extends z.ZodType, O extends Record<string, OutputValue>, const L extends string>(
  c: Calculator<S, O, L>,
): Calculator<S, O, L> {
  return c;
}
