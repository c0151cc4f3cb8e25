import type { Warning } from "./types";

/** Above this a circuit is treated as hazardous (IEC 61140 / common practice: ELV ends at 50 V AC, 120 V DC; we use 50 V for both). */
export const HAZARD_VOLTS = 50;

export const HIGH_VOLTAGE_CAUTION =
  "Lethal voltage. Discharge every filter capacitor and confirm with a meter before touching; " +
  "bring the set up on a current-limited supply; keep one hand away from the chassis; " +
  "follow local electrical codes and licensed practice. These figures are estimates, not a guarantee of safety.";

/** The danger warning every calculator adds when any voltage in its circuit exceeds 50 V. A fresh array each call: the caller may push its own warnings onto it. */
export function highVoltageWarning(...volts: (number | undefined)[]): Warning[] {
  // A plain loop: this runs in every compute, where filter/map chains showed up in the benchmark.
  for (const v of volts) {
    if (typeof v === "number" && Number.isFinite(v) && Math.abs(v) > HAZARD_VOLTS) return [{ level: "danger", message: HIGH_VOLTAGE_CAUTION }];
  }
  return [];
}

/** Always-on form, for calculators that are about high voltage by nature (bleeder, arc clearance). */
export const ALWAYS_DANGER: Warning = { level: "danger", message: HIGH_VOLTAGE_CAUTION };
