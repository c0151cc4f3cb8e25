import type { Calculator } from "./types";
import { calculator as arcClearance } from "./arc-clearance";
import { calculator as bPlus } from "./b-plus";
import { calculator as bleeder } from "./bleeder";
import { calculator as cathodeBias } from "./cathode-bias";
import { calculator as colourCode } from "./colour-code";
import { calculator as couplingCap } from "./coupling-cap";
import { calculator as droppingResistor } from "./dropping-resistor";
import { calculator as fuse } from "./fuse";
import { calculator as meterLoading } from "./meter-loading";
import { calculator as heaterString } from "./heater-string";
import { calculator as ohmsLaw } from "./ohms-law";
import { calculator as outputTransformer } from "./output-transformer";
import { calculator as plateDissipation } from "./plate-dissipation";
import { calculator as preferredValue } from "./preferred-value";
import { calculator as reactance } from "./reactance";
import { calculator as reforming } from "./reforming";
import { calculator as resistorDrift } from "./resistor-drift";
import { calculator as seriesLamp } from "./series-lamp";
import { calculator as seriesParallel } from "./series-parallel";
import { calculator as superhet } from "./superhet";
import { calculator as supplyRipple } from "./supply-ripple";
import { calculator as timeConstant } from "./time-constant";
import { calculator as triodeStage } from "./triode-stage";
import { calculator as vintageMarkings } from "./vintage-markings";
import { calculator as vrTube } from "./vr-tube";

/** Every calculator of the Bench, group by group in the order the index shows them (each names its group in `bench.group`). */
const ALL = [
  // First power and safety
  seriesLamp,
  fuse,
  reforming,
  bleeder,
  timeConstant,
  arcClearance,
  // Supplies and heaters
  bPlus,
  supplyRipple,
  vrTube,
  droppingResistor,
  heaterString,
  // Stages and tubes
  cathodeBias,
  triodeStage,
  plateDissipation,
  couplingCap,
  outputTransformer,
  // Radio and alignment
  superhet,
  reactance,
  // Parts and measuring
  resistorDrift,
  meterLoading,
  colourCode,
  vintageMarkings,
  preferredValue,
  seriesParallel,
  ohmsLaw,
] as const;

/** Every calculator's URL name, as a literal union: a table keyed by `Slug` misses none. */
export type Slug = (typeof ALL)[number]["slug"];

export const calculators = ALL as unknown as readonly (Calculator & { slug: Slug })[];

const bySlug = new Map<string, Calculator>(calculators.map((c) => [c.slug, c]));

export function getCalculator(slug: string): Calculator | undefined {
  return bySlug.get(slug);
}

export function isSlug(slug: string): slug is Slug {
  return bySlug.has(slug);
}

/** GET /api/calculators metadata, as PRODUCT.md gives it. */
export function describeCalculators() {
  return calculators.map((c) => ({
    slug: c.slug,
    title: c.title,
    group: c.bench.group,
    purpose: c.purpose,
    inputs: c.inputs.map(({ name, unit, required, default: d }) => ({ name, unit, required, default: d ?? null })),
    outputs: c.outputs.map(({ name, unit }) => ({ name, unit })),
  }));
}
