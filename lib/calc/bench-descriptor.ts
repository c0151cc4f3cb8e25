/**
 * What the Bench knows about a calculator beyond its maths: where it sits on the index, the worked case a
 * page opens with, which figures are shown large, how the form is laid out, the picture and how results
 * read. Declared in each lib/calc/<slug>.ts beside the calculator (the `bench` field of defineCalculator),
 * typed by that calculator's own input and output names, so a misspelt or missing part fails to compile.
 * Plain data only: the server page hands it to the browser as props, so no registry reaches the client.
 */

/** The Bench index's sections, in the order a restorer meets them (lib/bench/groups.ts names them). */
export type CalculatorGroup = "first-power" | "supplies" | "stages" | "radio" | "parts";

/** A picture drawn under the result; components/bench/chart-slot.tsx maps each kind to its chart. */
export type ChartKind =
  | "rc-discharge"
  | "bleeder-discharge"
  | "ripple"
  | "breakdown"
  | "plate-curves"
  | "lamp-current"
  | "reforming-schedule"
  | "coupling-response"
  | "superhet-dial";

/** How a number reads: a fraction as a percentage (signed shows "+" on a rise), or a bare prefix (4.7k). */
export type OutputFormat = "percent" | "signed-percent" | "bare-prefix";

/** A result figure shown in the hazard colour (danger alone) or the caution colour when its value says so. */
export type ToneRule<Out extends string> = { output: Out; tone: "hazard" | "caution" } & (
  { when: string | number | boolean } | { unless: string | number | boolean }
);

export interface InputMode<In extends string> {
  id: string;
  label: string;
  /** The inputs this way of entering uses; the other modes' inputs are hidden and not sent. */
  fields: readonly In[];
}

export interface BenchDescriptor<In extends string = string, Out extends string = string> {
  group: CalculatorGroup;
  /** A worked bench case, written as a person types it; filled in when a page opens without inputs. */
  example: { readonly [K in In]?: unknown };
  /** The outputs shown large at the top of the result and in the working's result; the rest follow in a list. */
  headlines: readonly [Out, ...Out[]];
  /** A calculator about a high-voltage circuit by nature: its danger banner never goes away, whatever is typed. */
  alwaysDanger: boolean;
  /** The picture, or null for none. */
  chart: ChartKind | null;
  /** Alternative ways of entering a list (heaters or tube types; bands or a value). */
  modes?: readonly InputMode<In>[];
  /** Inputs most people leave alone, folded under a heading until needed. */
  advanced?: { title: string; fields: readonly In[] };
  format?: { readonly [K in Out]?: OutputFormat };
  /** Words for string outputs ("high" → "Drifted high"). */
  words?: { readonly [K in Out]?: Readonly<Record<string, string>> };
  tones?: readonly ToneRule<Out>[];
}
