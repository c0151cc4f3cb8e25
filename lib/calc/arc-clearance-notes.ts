import type { Warning } from "./types";

/**
 * The fixed wording of the arc-clearance calculator's notes. Kept apart from the arithmetic, and
 * made once, because compute runs on every keystroke (the two that carry figures, at the end, are
 * made only when they apply). Every note says what a figure is compared
 * with and what it leaves out; none calls a gap "safe".
 */

export const LIMITS: Warning = {
  level: "caution",
  message:
    "Sharp points, dust, dirt and humidity lower the breakdown voltage, and real layouts are non-uniform fields that break down " +
    "well below the uniform-field figures. This is no substitute for the clearance and creepage rules of the applicable safety " +
    "standard (e.g. IEC 60664-1) and local codes, and never a guarantee.",
};

export const TABLE_ASSUMPTIONS: Warning = {
  level: "info",
  message:
    "The standard's figure comes from IEC 60664-1:2020 Table F.8 (clearances for steady-state and recurring peak voltages: DC such as " +
    "B+ and picture-tube anode supplies, and AC up to 30 kHz), read at the next row up, never interpolated. The table itself is for " +
    "clean, dry air (pollution degree 1); we assume pollution degree 2, usual inside a set's chassis, and so never go below its " +
    "0.2 mm minimum (Table F.2). A damp or dusty chassis is pollution degree 3 and needs at least 0.8 mm. Creepage, the path along " +
    "a surface such as a tag board, a tube socket or a dusty insulator, is a separate check this does not cover.",
};

export const OUT_OF_TABLE: Warning = {
  level: "caution",
  message:
    "The peak voltage is above the highest row of IEC 60664-1 Table F.8 for a non-uniform field, 50 kV (for a uniform field the " +
    "table goes on to 100 kV). We do not extrapolate the table: beyond its rows no standard clearance is shown, and the " +
    "recommendation is compared only with the safety factor times the uniform-field gap and with the table's top non-uniform " +
    "figure (100 mm at 50 kV, altitude-corrected), which is a lower bound, not a clearance for this voltage. Get the figure from " +
    "a high-voltage standard or a specialist.",
};

export const UNIFORM_CHOSEN: Warning = {
  level: "caution",
  message:
    "You chose a uniform field (case B): it applies only to large flat or well-rounded electrodes facing each other, and IEC 60664-1 " +
    "lets a design use it only after a voltage withstand test (from memory). A wire end, a lead, a solder joint, a corner or a " +
    "scratch makes the field non-uniform (case A), so the recommendation never goes below the case A figure.",
};

export const ARCS: Warning = {
  level: "danger",
  message:
    "The peak voltage is at or above the uniform-field breakdown voltage for this gap: even clean air between flat electrodes is " +
    "expected to arc across it, and real points and edges arc sooner.",
};

export const GAP_BELOW_STANDARD: Warning = {
  level: "caution",
  message:
    "The gap is smaller than IEC 60664-1's clearance for a non-uniform field at this voltage (Table F.8 case A, altitude-corrected; " +
    "above 50 kV, its top figure), which the recommendation never goes below. Being below the uniform-field breakdown voltage " +
    "does not make up for it: that figure is for clean flat electrodes only.",
};

export const GAP_BELOW_FACTOR: Warning = {
  level: "caution",
  message: "The gap is smaller than the recommended clearance, which here is the safety factor times the uniform-field minimum gap.",
};

export const GAP_AT_LEAST_RECOMMENDED: Warning = {
  level: "info",
  message:
    "The gap is at least the recommended clearance. It has been compared only with IEC 60664-1's table figure and with the safety " +
    "factor times the uniform-field gap; creepage along surfaces, dirt, moisture, sharp edges and parts that move are not covered.",
};

export const NEAR_PASCHEN_MINIMUM: Warning = {
  level: "caution",
  message:
    "The gap or the uniform-field minimum gap is under about 0.1 mm in sea-level air (δ·d below 0.01 cm; in thinner air the limit " +
    "is wider): near the Paschen minimum, where the uniform-field formula no longer applies, and below a few tens of µm breakdown " +
    "does not follow Paschen's law at all.",
};

export const BEYOND_FIT: Warning = {
  level: "caution",
  message:
    "The gap or the minimum gap is beyond the range the uniform-field formula is fitted for (δ·d up to about 10 cm, i.e. up to about " +
    "10 cm in sea-level air). Long gaps break down by streamers and leaders at a far lower average stress, and uniform fields that " +
    "size hardly exist: the formula is not for gaps of metres, and its figures there are too small.",
};

/** A clean uniform gap in air does not break down below the Paschen minimum, at any spacing. */
export function belowPaschenMinimum(paschenMinV: number): Warning {
  return {
    level: "info",
    message:
      `Below about ${paschenMinV} V (the Paschen minimum of air) a clean uniform air gap does not break down at any spacing; ` +
      "the small gap shown is the formula's, and surfaces can still fail by tracking.",
  };
}

/** A sea-level pressure typed for a high workshop: `isa` is the standard atmosphere's pressure at that altitude. */
export function pressureAboveAltitude(p: number, altitude: number, isa: number): Warning {
  return {
    level: "caution",
    message:
      `The air pressure given (${(p / 1000).toPrecision(4)} kPa) is well above the standard atmosphere at ${Math.round(altitude)} m ` +
      `(about ${(isa / 1000).toPrecision(3)} kPa). The uniform-field figures use the pressure given, so they may be too small: enter the local pressure.`,
  };
}
