import { formatQuantity } from "./format";
import type { TriodeStageOutputs } from "./triode-stage-schema";
import { regionWarnings } from "./triode-region";
import type { Warning } from "./types";

/** The triode stage's advice once its operating point is found, and its outputs when none is. */

interface SolvedStage {
  name: string;
  /** The table's maximum plate dissipation per section; undefined for a custom model. */
  rating: number | undefined;
  dissipation: number;
  bPlus: number;
  ra: number;
  rk: number;
  ip: number;
  ep: number;
}

/** Appends, in this order: the rating check, grid at 0 V, the load-line region, and the model's spread. */
export function stageWarnings(warnings: Warning[], s: SolvedStage): void {
  const { name, rating, dissipation } = s;
  if (rating !== undefined && dissipation > rating) {
    warnings.push({
      level: "caution",
      message: `Plate dissipation ${formatQuantity(dissipation, "W")} is above the ${name}'s rated ${formatQuantity(rating, "W")} per section; raise Ra or Rk, or lower B+.`,
    });
  }
  if (rating === undefined) {
    warnings.push({ level: "info", message: "No rated plate dissipation is known for custom model parameters; check the data sheet yourself." });
  }
  if (s.rk === 0) {
    warnings.push({
      level: "info",
      message: "With no cathode resistor the grid sits at 0 V; a real tube then draws grid current on signal peaks, which the model ignores.",
    });
  }
  warnings.push(...regionWarnings(s.bPlus, s.ra, s.rk, s.ip, s.ep));
  warnings.push({
    level: "info",
    message: "The model is a fit to typical curves; real tubes of one type differ by 20% or more, so expect your measured voltages to differ too.",
  });
}

/** Every output null: the model found no operating point on this load line. */
export function noOperatingPoint(): TriodeStageOutputs {
  return {
    plateVoltage: null,
    plateCurrent: null,
    cathodeVoltage: null,
    plateDissipation: null,
    amplificationFactor: null,
    plateResistance: null,
    transconductance: null,
    gain: null,
    plateToChassisVoltage: null,
  };
}
