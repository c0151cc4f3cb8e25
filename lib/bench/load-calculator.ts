import type { Calculator } from "@/lib/calc/types";
import { LOADERS } from "./loaders.generated";

/**
 * A calculator module by its slug, through the generated one-import-per-calculator table
 * (lib/bench/loaders.generated.ts, `npm run gen:loaders`), so a Bench page's browser bundle carries only
 * the module it shows and never the whole registry.
 */
export async function loadCalculator(slug: string): Promise<Calculator> {
  const load = (LOADERS as Partial<Record<string, () => Promise<{ calculator: unknown }>>>)[slug];
  if (!load) throw new Error(`No calculator module for "${slug}"`);
  return (await load()).calculator as Calculator;
}
