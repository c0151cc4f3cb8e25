import { getCalculator } from "../../calc/registry";
import type { DrillKind } from "../types";
import { cathodeBiasKinds } from "./cathode-bias";
import { circuitKinds } from "./circuits";
import { dischargeKinds } from "./discharge";
import { droppingResistorKinds } from "./dropping-resistor";
import { heaterStringKinds } from "./heater-string";
import { mainsKinds } from "./mains";
import { partsKinds } from "./parts";
import { signalKinds } from "./signal";
import { supplyKinds } from "./supply";
import { triodeStageKinds } from "./triode-stage";
import { workbenchKinds } from "./workbench";

/**
 * Every drill kind, in the Bench's order of calculators. A kind whose calculator is not registered
 * (yet) is left out, so the list always matches the Bench.
 */
const ALL: readonly DrillKind[] = [
  ...cathodeBiasKinds,
  ...triodeStageKinds,
  ...droppingResistorKinds,
  ...heaterStringKinds,
  ...supplyKinds,
  ...dischargeKinds,
  ...mainsKinds,
  ...partsKinds,
  ...circuitKinds,
  ...signalKinds,
  ...workbenchKinds,
];

export const DRILL_KINDS: readonly DrillKind[] = ALL.filter((k) => getCalculator(k.slug) !== undefined);

const byId = new Map(DRILL_KINDS.map((k) => [k.id, k]));

export function getDrillKind(id: string): DrillKind | undefined {
  return byId.get(id);
}

export function drillKindsFor(slug: string): DrillKind[] {
  return DRILL_KINDS.filter((k) => k.slug === slug);
}
