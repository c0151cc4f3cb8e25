import { formatQuantity } from "./format";
import type { RectifierEntry } from "./tables/rectifiers";
import type { Warning } from "./types";

/** The B+ calculator's advice: what the estimate leaves out, and the rectifier tube's limits against this load. */

/** Ripple this large beside the charged peak (peak-to-peak over peak after drops) puts the simple estimate out of its range. */
export const BIG_RIPPLE = 0.2;

export const ESTIMATE: Warning = {
  level: "info",
  message:
    "This is the textbook capacitor-input estimate: usually within 10–15 % of what a meter shows (common practice). It ignores the transformer's " +
    "leakage reactance and the extra drop of the charging pulses, so loaded B+ often reads lower. With no load B+ rises toward the peak: " +
    "compare the capacitors' voltage rating with the peak, not with the loaded figure.",
};
export const NO_DROP: Warning = {
  level: "info",
  message: "No rectifier drop given, so none is taken. Silicon diodes drop about 1 V each; tube rectifiers 15–60 V (their data sheets give it).",
};

/** The ripple is too large beside what the reservoir charges to for the estimate to hold. */
export function rippleWarning(ripplePeakToPeak: number, charged: number): Warning {
  return {
    level: "caution",
    message:
      `The ripple (${formatQuantity(ripplePeakToPeak, "V")} peak to peak) is large beside the ${formatQuantity(charged > 0 ? charged : 0, "V")} the reservoir charges to, ` +
      "outside the range where this estimate holds. A larger reservoir or a lighter load brings it back.",
  };
}

/** The tube's data-sheet limits: largest reservoir, rated current, peak inverse voltage. */
export function tubeWarnings(warnings: Warning[], tube: RectifierEntry, load: { c: number; i: number; peakVoltage: number; charged: number }): void {
  const { c, i, peakVoltage, charged } = load;
  if (c > tube.maxInputCapacitance * (1 + 1e-9)) {
    warnings.push({
      level: "caution",
      message:
        `The ${formatQuantity(c, "F")} reservoir is more than the ${formatQuantity(tube.maxInputCapacitance, "F")} the ${tube.type} data sheet allows: the charging pulses ` +
        "exceed its peak plate current, which shortens its life or makes it arc. Keep the first capacitor within the figure and put the rest after a choke or resistor.",
    });
  }
  if (i > tube.maxCurrent * (1 + 1e-9)) {
    warnings.push({
      level: "caution",
      message: `The load is more than the ${tube.type}'s rated ${formatQuantity(tube.maxCurrent, "A")} with a capacitor-input filter; the tube will run hot and wear out early. Use a larger rectifier or lighten the load.`,
    });
  }
  // Peak inverse voltage (centre-tapped full-wave, or half-wave with a reservoir): the winding's negative
  // peak plus the charged reservoir on the cathode; it approaches twice the peak with no load.
  const piv = peakVoltage + (charged > 0 ? charged : 0);
  if (tube.peakInverseVoltage !== undefined && piv > tube.peakInverseVoltage) {
    warnings.push({
      level: "caution",
      message:
        `Under this load each plate sees about ${formatQuantity(piv, "V")} in reverse (the peak plus the charged reservoir), more than the ${tube.type}'s rated ` +
        `${formatQuantity(tube.peakInverseVoltage, "V")} peak inverse voltage; with no load it approaches twice the peak.`,
    });
  }
}
