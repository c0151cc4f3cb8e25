import type { QuantityKind } from "./quantity-text";

/**
 * The widest magnitude each kind of quantity may have on the bench. Anything outside is a slipped
 * prefix or a typing error (a 1e-300 Ω nominal, 47 MF read as megafarads), and left in it would give
 * Infinity or 0 in the working; so it is refused with a message instead. The limits bound the
 * magnitude, so a negative bias voltage is checked like a positive one. The lower limit guards the
 * fields that refuse zero, because a calculator may divide by them; where zero is a valid entry
 * (no screen current, a 0 Ω cathode, sea-level altitude) a value close to it does no harm, and only
 * the upper limit applies.
 *
 * Each range is wide enough for every set, part and instrument of the trade, with room to spare
 * (common practice, not from a standard): a calculator field may be narrower, never wider.
 */
interface Limit {
  min: number;
  max: number;
  /** The limits as a person reads them. */
  minText: string;
  maxText: string;
}

export const LIMITS: Record<QuantityKind, Limit> = {
  // A meter's lowest range to any CRT, X-ray or test supply, with room above.
  voltage: { min: 1e-9, max: 1e7, minText: "1 nV", maxText: "10 MV" },
  // An electrometer's femtoamps (grid and insulation leakage) to a welding transformer's kiloamps.
  current: { min: 1e-15, max: 1e5, minText: "1 fA", maxText: "100 kA" },
  // Below a milliohm shunt; up to the insulation resistance of the best film capacitors, whose
  // self-discharge the time-constant calculator works out, and the resistor-drift meter limit.
  resistance: { min: 1e-6, max: 1e15, minText: "1 µΩ", maxText: "1 PΩ" },
  // Stray capacitance between socket pins (tenths of a pF) to a double-layer memory-backup capacitor.
  capacitance: { min: 1e-14, max: 10, minText: "0.01 pF", maxText: "10 F" },
  // A single turn at VHF to the largest smoothing choke.
  inductance: { min: 1e-9, max: 1e4, minText: "1 nH", maxText: "10 kH" },
  // A slow sweep to microwave.
  frequency: { min: 1e-3, max: 1e11, minText: "1 mHz", maxText: "100 GHz" },
  // A picosecond edge to a set left thirty years in an attic.
  time: { min: 1e-12, max: 1e9, minText: "1 ps", maxText: "about 30 years (1e9 s)" },
  // A micrometre gap to a 10 km line.
  length: { min: 1e-6, max: 1e4, minText: "1 µm", maxText: "10 km" },
  // A vacuum gauge's pascal to a hydraulic press.
  pressure: { min: 1, max: 1e8, minText: "1 Pa", maxText: "100 MPa" },
  temperature: { min: 1, max: 1e4, minText: "1 K", maxText: "10 000 K" },
  // The femtowatts of a high resistance at a few volts to a broadcast station's supply.
  power: { min: 1e-15, max: 1e9, minText: "1 fW", maxText: "1 GW" },
  // A tube's transconductance is micro- to millisiemens.
  conductance: { min: 1e-12, max: 1e3, minText: "1 pS", maxText: "1 kS" },
  // Tolerances, factors and model constants: no lower limit (a tiny tolerance is fussy, not
  // harmful); beyond a million million is a slip.
  ratio: { min: 0, max: 1e12, minText: "0", maxText: "1e12" },
};

const NOUNS: Record<QuantityKind, string> = {
  voltage: "voltage",
  current: "current",
  resistance: "resistance",
  capacitance: "capacitance",
  inductance: "inductance",
  frequency: "frequency",
  time: "time",
  length: "length",
  pressure: "pressure",
  temperature: "temperature",
  power: "power",
  conductance: "conductance",
  ratio: "number",
};

/**
 * Null when the value is inside the kind's limits, else a message saying which limit and what to check.
 * `zeroAllowed`: the field accepts zero, so only the upper limit applies.
 */
export function magnitudeMessage(value: number, kind: QuantityKind, zeroAllowed = false): string | null {
  const l = LIMITS[kind];
  const a = value < 0 ? -value : value;
  if (a <= l.max && (a >= l.min || zeroAllowed)) return null;
  const size = value < 0 ? " in size" : "";
  return a < l.min
    ? `is below ${l.minText}${size}, too small for a ${NOUNS[kind]} on the bench: check the prefix and unit`
    : `is above ${l.maxText}${size}, too large for a ${NOUNS[kind]} on the bench: check the prefix and unit`;
}
