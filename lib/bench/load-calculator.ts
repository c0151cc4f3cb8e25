import type { Calculator } from "@/lib/calc/types";

/**
 * One dynamic import per calculator, so a Bench page's browser bundle carries only the module it
 * shows (never the whole registry). Each entry becomes its own chunk.
 */
type Loader = () => Promise<{ calculator: unknown }>;

const LOADERS: Record<string, Loader> = {
  "arc-clearance": () => import("@/lib/calc/arc-clearance"),
  "b-plus": () => import("@/lib/calc/b-plus"),
  bleeder: () => import("@/lib/calc/bleeder"),
  "cathode-bias": () => import("@/lib/calc/cathode-bias"),
  "colour-code": () => import("@/lib/calc/colour-code"),
  "coupling-cap": () => import("@/lib/calc/coupling-cap"),
  "dropping-resistor": () => import("@/lib/calc/dropping-resistor"),
  fuse: () => import("@/lib/calc/fuse"),
  "meter-loading": () => import("@/lib/calc/meter-loading"),
  "heater-string": () => import("@/lib/calc/heater-string"),
  "ohms-law": () => import("@/lib/calc/ohms-law"),
  "output-transformer": () => import("@/lib/calc/output-transformer"),
  "plate-dissipation": () => import("@/lib/calc/plate-dissipation"),
  "preferred-value": () => import("@/lib/calc/preferred-value"),
  reactance: () => import("@/lib/calc/reactance"),
  reforming: () => import("@/lib/calc/reforming"),
  "resistor-drift": () => import("@/lib/calc/resistor-drift"),
  "series-lamp": () => import("@/lib/calc/series-lamp"),
  "series-parallel": () => import("@/lib/calc/series-parallel"),
  superhet: () => import("@/lib/calc/superhet"),
  "supply-ripple": () => import("@/lib/calc/supply-ripple"),
  "time-constant": () => import("@/lib/calc/time-constant"),
  "triode-stage": () => import("@/lib/calc/triode-stage"),
  "vintage-markings": () => import("@/lib/calc/vintage-markings"),
  "vr-tube": () => import("@/lib/calc/vr-tube"),
};

export const LOADABLE_SLUGS = Object.keys(LOADERS);

export async function loadCalculator(slug: string): Promise<Calculator> {
  const load = LOADERS[slug];
  if (!load) throw new Error(`No calculator module for "${slug}"`);
  return (await load()).calculator as Calculator;
}
