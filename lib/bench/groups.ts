import type { CalculatorGroup } from "@/lib/calc/types";

/** The Bench index's sections, named for the task at the bench rather than the maths. */
export const GROUPS: readonly { id: CalculatorGroup; title: string; blurb: string }[] = [
  { id: "stages", title: "Biasing and stages", blurb: "Operating points, bias resistors and the voltage each stage is fed." },
  { id: "supplies", title: "Supplies and filtering", blurb: "B+ ripple, discharge times and series heater strings." },
  { id: "safety", title: "Safety and high voltage", blurb: "Bleeders that drain the charge, and air gaps set against breakdown and the clearance tables." },
  { id: "parts", title: "Parts and values", blurb: "Colour codes, preferred values, drift and the everyday arithmetic." },
];

export const GROUP_TITLES: Record<CalculatorGroup, string> = Object.fromEntries(GROUPS.map((g) => [g.id, g.title])) as Record<
  CalculatorGroup,
  string
>;

/**
 * Calculators about high-voltage circuits by nature: their danger banner never goes away, whatever is
 * typed. A cathode resistor sits under a plate at B+ and a ripple filter is the B+ supply itself, even
 * when the figures typed (a 1.5 V bias, a load current) are low.
 */
export const ALWAYS_DANGER_SLUGS: ReadonlySet<string> = new Set(["arc-clearance", "bleeder", "cathode-bias", "supply-ripple", "coupling-cap", "output-transformer"]);
