import { z } from "zod";
import { DEFAULT_CHOKE_RESISTANCE } from "./choke-default";
import { optionalQuantity, quantity } from "./units";

export { DEFAULT_CHOKE_RESISTANCE };

/**
 * The smoothing stages after a reservoir capacitor, for the supply-ripple calculator. Each stage is a
 * series element (a resistor, or a choke with its winding resistance) and a capacitor to chassis,
 * treated as a voltage divider at the ripple frequency (Radiotron Designer's Handbook 4th ed.,
 * ch. 34, smoothing filters; ARRL Handbook, power supplies):
 *   RC:  |H| = Xc/√(R² + Xc²) = 1/√(1 + (ωRC)²)
 *   LC:  H = Zc/(R + jωL + Zc) = 1/(1 − ω²LC + jωRC),  |H| = 1/√((1 − ω²LC)² + (ωRC)²)
 * At resonance (ω²LC = 1) the LC stage passes 1/(ω₀RC) = √(L/C)/R = Q times the ripple: finite
 * because a real choke has resistance. The load, which damps the peak further, is left out.
 */

const capacitance = quantity("capacitance", { positive: true, min: 1e-12, max: 10, label: "Stage capacitance" });
const current = optionalQuantity("current", { positive: true, min: 1e-6, max: 100, label: "Stage current" });

const rcStage = z.object({
  kind: z.literal("rc"),
  resistance: quantity("resistance", { positive: true, min: 1e-3, max: 1e9, label: "Stage resistance" }),
  capacitance,
  current,
});

const lcStage = z.object({
  kind: z.literal("lc"),
  inductance: quantity("inductance", { positive: true, min: 1e-6, max: 1e4, label: "Choke inductance" }),
  // Zero is refused: an ideal choke makes the resonant peak infinite.
  resistance: optionalQuantity("resistance", { positive: true, min: 1e-3, max: 1e6, label: "Choke resistance" }),
  capacitance,
  current,
});

export const stageSchema = z.discriminatedUnion("kind", [rcStage, lcStage], {
  error: 'Each stage needs kind "rc" (resistance and capacitance) or "lc" (inductance and capacitance)',
});

export type StageInput = z.output<typeof stageSchema>;

export interface StageResult {
  [key: string]: number;
  /** Fraction of the ripple that gets through (above 1: the stage magnifies it). */
  attenuation: number;
  rippleRms: number;
  /** current × series resistance (the resistor, or the choke's winding). */
  dcDrop: number;
  /** The DC current through this stage, A. */
  current: number;
  /** Series resistance used, Ω (for a choke, the given or default winding resistance). */
  resistance: number;
}

export interface LcStageResult extends StageResult {
  resonantFrequency: number;
  /** √(L/C)/R: how many times the ripple would be multiplied at exact resonance. */
  q: number;
}

/** |H| of an RC stage at angular frequency omega. */
export function rcAttenuation(omega: number, r: number, c: number): number {
  return 1 / Math.hypot(1, omega * r * c);
}

/** |H| of an LC stage with winding resistance r at angular frequency omega. */
export function lcAttenuation(omega: number, l: number, c: number, r: number): number {
  return 1 / Math.hypot(1 - omega * omega * l * c, omega * r * c);
}

/** One stage's figures, before the ripple reaching it is known (rippleRms is filled by the caller). */
export function stageFigures(s: StageInput, omega: number, stageCurrent: number): StageResult | LcStageResult {
  if (s.kind === "rc") {
    return {
      attenuation: rcAttenuation(omega, s.resistance, s.capacitance),
      rippleRms: 0,
      dcDrop: stageCurrent * s.resistance,
      current: stageCurrent,
      resistance: s.resistance,
    };
  }
  const r = s.resistance ?? DEFAULT_CHOKE_RESISTANCE;
  return {
    attenuation: lcAttenuation(omega, s.inductance, s.capacitance, r),
    rippleRms: 0,
    dcDrop: stageCurrent * r,
    current: stageCurrent,
    resistance: r,
    resonantFrequency: 1 / (2 * Math.PI * Math.sqrt(s.inductance * s.capacitance)),
    q: Math.sqrt(s.inductance / s.capacitance) / r,
  };
}
