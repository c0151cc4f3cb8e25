import { formatQuantity } from "./format";
import { limitingVoltage, MAX_LIMITING_VOLTAGE, ratingForPowerAndVoltage } from "./tables/limiting-voltage";
import { preferredBelow } from "./tables/preferred-values";
import type { Warning } from "./types";

/** The bleeder's series chain and the notes that say what its figures are measured against. */

/**
 * The largest E12 value strictly within `limit` (by a relative 1e-12, so float noise in the
 * caller's time check can never tip the worst corner over the time allowed).
 */
export function largestE12Within(limit: number): number {
  const r = preferredBelow(limit, "E12");
  return r <= limit * (1 - 1e-12) ? r : preferredBelow(r * (1 - 1e-6), "E12");
}

export interface Chain {
  /** Equal resistors in series, so each sees no more than MAX_LIMITING_VOLTAGE. */
  count: number;
  voltageEach: number;
  /** E12 value of each, so the whole chain still meets the time at the worst corner. */
  value: number;
  /** Smallest standard rating that carries each one's power (×2) and stands its voltage; null if none listed does. */
  rating: number | null;
}

/**
 * `rAllowed` is the largest total resistance that meets the time at the worst corner; `single` is
 * largestE12Within(rAllowed), already found by the caller (the whole chain when one part will do).
 */
export function seriesChain(workingVoltage: number, rAllowed: number, single: number): Chain {
  const count = workingVoltage <= MAX_LIMITING_VOLTAGE ? 1 : Math.ceil(workingVoltage / MAX_LIMITING_VOLTAGE);
  const voltageEach = workingVoltage / count;
  const value = count === 1 ? single : largestE12Within(rAllowed / count);
  const rating = ratingForPowerAndVoltage((voltageEach * voltageEach) / value, voltageEach);
  return { count, voltageEach, value, rating };
}

// Above this many parts a single purpose-made high-voltage resistor is usually the better answer.
const LONG_CHAIN = 20;

interface Limits {
  workingVoltage: number;
  safeVoltage: number;
  maxTime: number;
  capacitorTolerance: number;
  resistorTolerance: number;
}

const pct = (x: number) => `${Number((x * 100).toPrecision(3))} %`;

/** What the result is compared with, and what it leaves out. */
function measuredAgainst(input: Limits): Warning {
  const { safeVoltage: vs, maxTime: t } = input;
  const target =
    vs === 60 && t === 5
      ? "below the 60 V residual-voltage limit of IEC 60204-1 (§6.2.4) after 5 s"
      : `below ${formatQuantity(vs, "V")} after ${formatQuantity(t, "s")} (the residual-voltage limit of IEC 60204-1 §6.2.4 is 60 V after 5 s)`;
  return {
    level: "caution",
    message:
      `The suggested bleeder takes the capacitor ${target} with the capacitor up to +${pct(input.capacitorTolerance)} and the resistor up to +${pct(input.resistorTolerance)} of nominal. ` +
      "It does not cover a bleeder that has failed open (they can, without any sign), charge that returns after discharge (dielectric absorption), " +
      "or capacitors not wired across this bleeder. Always measure with a meter before touching.",
  };
}

// The defaults' note, made once: compute runs on every keystroke and the benchmark counts it.
const DEFAULT_NOTE = measuredAgainst({ workingVoltage: 0, safeVoltage: 60, maxTime: 5, capacitorTolerance: 0.5, resistorTolerance: 0.05 });

/** What the result is compared with and what it leaves out, then the chain's cautions. */
export function bleederNotes(warnings: Warning[], input: Limits, chain: Chain, singleRating: number | null): void {
  const vw = input.workingVoltage;
  const usual = input.safeVoltage === 60 && input.maxTime === 5 && input.capacitorTolerance === 0.5 && input.resistorTolerance === 0.05;
  warnings.push(usual ? DEFAULT_NOTE : measuredAgainst(input));
  if (chain.count > 1) {
    const each = chain.rating === null ? "" : `, ${formatQuantity(chain.rating, "W")} each`;
    warnings.push({
      level: "caution",
      message:
        `At ${formatQuantity(vw, "V")} one resistor would see more than ${MAX_LIMITING_VOLTAGE} V, about the most an ordinary resistor stands continuously ` +
        `(its limiting element voltage, IEC 60115-1; typical data-sheet figures, from memory). Fit ${chain.count} × ${formatQuantity(chain.value, "Ω")}${each} in series ` +
        `(${formatQuantity(chain.count * chain.value, "Ω")} in all), each seeing ${formatQuantity(chain.voltageEach, "V")}, and keep the whole chain's clearances for the full voltage.` +
        (chain.count > LONG_CHAIN ? " A purpose-made high-voltage resistor, rated for the full voltage by its own data sheet, may be simpler." : ""),
    });
  } else if (chain.rating !== null && singleRating !== null && chain.rating > singleRating) {
    warnings.push({
      level: "caution",
      message:
        `A ${formatQuantity(singleRating, "W")} resistor carries the power, but its body is typically limited to ${limitingVoltage(singleRating)} V (limiting element voltage, IEC 60115-1; ` +
        `typical data-sheet figures, from memory). At ${formatQuantity(vw, "V")} fit a ${formatQuantity(chain.rating, "W")} part (typically ${limitingVoltage(chain.rating)} V) or check the data sheet of the one you have.`,
    });
  }
  if (chain.rating === null) {
    warnings.push({
      level: "caution",
      message:
        "No listed standard rating carries each resistor's power at twice its dissipation and its voltage; use power resistors rated by their data sheet for both, and check the design.",
    });
  }
}
