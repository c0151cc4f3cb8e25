import type { CalculatorGroup } from "@/lib/calc/types";

/**
 * The Bench index's sections, in the order a set meets them on the bench: made safe to power, its supply,
 * its stages, the radio's own tuning, then the parts and meters. Each calculator names its group in its
 * descriptor (lib/calc/<slug>.ts, `bench.group`).
 */
export const GROUPS: readonly { id: CalculatorGroup; title: string; blurb: string }[] = [
  {
    id: "first-power",
    title: "First power and safety",
    blurb:
      "Before and during the first switch-on: a lamp or fuse to limit the current, reforming old electrolytics, draining the charge, and air gaps at high voltage.",
  },
  {
    id: "supplies",
    title: "Supplies and heaters",
    blurb: "The B+ from the transformer to the last filter, regulators, dropping resistors and series heater strings.",
  },
  { id: "stages", title: "Stages and tubes", blurb: "Bias, operating points, plate dissipation, coupling capacitors and the output transformer." },
  { id: "radio", title: "Radio and alignment", blurb: "Where the oscillator and the image sit on the dial, and the tuned circuits that pick a station." },
  {
    id: "parts",
    title: "Parts and measuring",
    blurb: "Reading colour codes and old markings, preferred values, drifted resistors, meter loading and Ohm's law.",
  },
];

export const GROUP_TITLES: Record<CalculatorGroup, string> = Object.fromEntries(GROUPS.map((g) => [g.id, g.title])) as Record<CalculatorGroup, string>;
