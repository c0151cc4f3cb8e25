/**
 * Rectifier tubes of the era, with the ratings a B+ calculation needs.
 *
 * Source: RCA receiving tube manuals (RC-series) and the makers' data sheets. Every figure was
 * recalled FROM MEMORY of those sheets unless the row says it was checked; ratings also differ
 * between makers and suffixes, so read the data sheet of the tube in the set before relying on one.
 *
 * - maxInputCapacitance: the largest filter-input (reservoir) capacitor the data sheet allows with a
 *   capacitor-input filter; above it the charging pulses exceed the rated peak plate current.
 * - maxCurrent: rated DC output current with a capacitor-input filter.
 * - tubeDrop: the tube's own voltage drop at tubeDropCurrent, read from the data sheet's curves or
 *   the trade's rectifier comparison tables; the filter's ripple and the winding add more.
 * The 1B3GT (television EHT, flyback-pulse service) is left out: its ratings are for pulses, not
 * a mains-frequency reservoir, so none of these columns would mean what they say.
 */

export const RECTIFIER_SOURCE =
  "RCA receiving tube manual (RC-series) and tube data sheets; values recalled from memory, check the data sheet for critical work";

/** One tube's arrangement: two plates on one cathode, one plate, or two separate diodes (doubler or paralleled). */
export type RectifierCircuit = "full-wave" | "half-wave" | "doubler";

export interface RectifierEntry {
  /** The type number we show. */
  type: string;
  /** Other type numbers with the same ratings, accepted by findRectifier. */
  aliases: readonly string[];
  circuit: RectifierCircuit;
  /** Filament (directly heated) or heater and separate cathode: decides how fast B+ appears. */
  heating: "filament" | "indirect";
  heaterVoltage: number;
  heaterCurrent: number;
  /** Largest reservoir capacitor for a capacitor-input filter, F. */
  maxInputCapacitance: number;
  /** Rated DC output current, capacitor-input filter, A. */
  maxCurrent: number;
  /** Typical voltage drop across the tube, V, at tubeDropCurrent. */
  tubeDrop: number;
  /** The DC output current the tubeDrop figure belongs to, A. */
  tubeDropCurrent: number;
  /** Peak inverse plate voltage, V, where known. */
  peakInverseVoltage?: number;
  source: string;
  note?: string;
}

const µF = 1e-6;
const mA = 1e-3;
const RCA = "RCA receiving tube manual (RC-series)";

export const RECTIFIERS: readonly RectifierEntry[] = [
  {
    type: "5Y3GT",
    aliases: ["5Y3G", "5Y3"],
    circuit: "full-wave",
    heating: "filament",
    heaterVoltage: 5,
    heaterCurrent: 2,
    maxInputCapacitance: 20 * µF,
    maxCurrent: 125 * mA,
    tubeDrop: 60,
    tubeDropCurrent: 125 * mA,
    peakInverseVoltage: 1400,
    source: `${RCA}, 5Y3GT data (from memory); 20 µF and 125 mA agree with a published summary of the RCA sheet; the sheet gives curves, the 60 V drop is the trade's comparison-table figure`,
  },
  {
    type: "5U4G",
    aliases: ["5U4"],
    circuit: "full-wave",
    heating: "filament",
    heaterVoltage: 5,
    heaterCurrent: 3,
    maxInputCapacitance: 40 * µF,
    maxCurrent: 225 * mA,
    tubeDrop: 44,
    tubeDropCurrent: 225 * mA,
    peakInverseVoltage: 1550,
    source: `${RCA}, 5U4G data (from memory)`,
  },
  {
    type: "5U4GB",
    aliases: [],
    circuit: "full-wave",
    heating: "filament",
    heaterVoltage: 5,
    heaterCurrent: 3,
    maxInputCapacitance: 40 * µF,
    maxCurrent: 275 * mA,
    tubeDrop: 50,
    tubeDropCurrent: 275 * mA,
    peakInverseVoltage: 1550,
    source: `${RCA}, 5U4GB data (from memory)`,
    note: "Rated for more current than the older 5U4G; a 5U4G is rated below the GB's current, so it does not stand in for one.",
  },
  {
    type: "5AR4",
    aliases: ["GZ34"],
    circuit: "full-wave",
    heating: "indirect",
    heaterVoltage: 5,
    heaterCurrent: 1.9,
    maxInputCapacitance: 60 * µF,
    maxCurrent: 250 * mA,
    tubeDrop: 17,
    tubeDropCurrent: 250 * mA,
    peakInverseVoltage: 1500,
    source: "GZ34/5AR4 data sheet (from memory); the 60 µF limit agrees with a published summary of the data sheet",
  },
  {
    type: "5V4G",
    aliases: ["5V4GA"],
    circuit: "full-wave",
    heating: "indirect",
    heaterVoltage: 5,
    heaterCurrent: 2,
    maxInputCapacitance: 10 * µF,
    maxCurrent: 175 * mA,
    tubeDrop: 25,
    tubeDropCurrent: 175 * mA,
    peakInverseVoltage: 1400,
    source: `${RCA}, 5V4G data (from memory)`,
    note: "European GZ32 sheets allow a larger reservoir; this row follows the 5V4G sheet.",
  },
  {
    type: "6X4",
    aliases: ["EZ90"],
    circuit: "full-wave",
    heating: "indirect",
    heaterVoltage: 6.3,
    heaterCurrent: 0.6,
    maxInputCapacitance: 10 * µF,
    maxCurrent: 70 * mA,
    tubeDrop: 22,
    tubeDropCurrent: 70 * mA,
    peakInverseVoltage: 1250,
    source: `${RCA}, 6X4 data (from memory); 70 mA, 22 V and 1250 V agree with a published summary of the data sheet`,
  },
  {
    type: "6X5GT",
    aliases: ["6X5", "6X5G"],
    circuit: "full-wave",
    heating: "indirect",
    heaterVoltage: 6.3,
    heaterCurrent: 0.6,
    maxInputCapacitance: 16 * µF,
    maxCurrent: 70 * mA,
    tubeDrop: 22,
    tubeDropCurrent: 70 * mA,
    peakInverseVoltage: 1250,
    source: `${RCA}, 6X5GT data (from memory)`,
  },
  {
    type: "6CA4",
    aliases: ["EZ81"],
    circuit: "full-wave",
    heating: "indirect",
    heaterVoltage: 6.3,
    heaterCurrent: 1,
    maxInputCapacitance: 50 * µF,
    maxCurrent: 150 * mA,
    tubeDrop: 20,
    tubeDropCurrent: 150 * mA,
    peakInverseVoltage: 1300,
    source: "EZ81/6CA4 data sheet (from memory)",
  },
  {
    type: "35W4",
    aliases: [],
    circuit: "half-wave",
    heating: "indirect",
    heaterVoltage: 35,
    heaterCurrent: 0.15,
    maxInputCapacitance: 40 * µF,
    maxCurrent: 100 * mA,
    tubeDrop: 20,
    tubeDropCurrent: 100 * mA,
    peakInverseVoltage: 330,
    source: `${RCA}, 35W4 data (from memory)`,
    note: "100 mA without a pilot lamp on the heater tap; less with one (see the data sheet).",
  },
  {
    type: "35Z5GT",
    aliases: ["35Z5", "35Z5G"],
    circuit: "half-wave",
    heating: "indirect",
    heaterVoltage: 35,
    heaterCurrent: 0.15,
    maxInputCapacitance: 40 * µF,
    maxCurrent: 100 * mA,
    tubeDrop: 20,
    tubeDropCurrent: 100 * mA,
    peakInverseVoltage: 700,
    source: `${RCA}, 35Z5GT data (from memory); 100 mA without a pilot lamp agrees with a contemporary magazine note on the type`,
    note: "100 mA without a pilot lamp on the heater tap; less with one (see the data sheet).",
  },
  {
    type: "50Y6GT",
    aliases: ["50Y6", "50Y6G"],
    circuit: "doubler",
    heating: "indirect",
    heaterVoltage: 50,
    heaterCurrent: 0.15,
    maxInputCapacitance: 40 * µF,
    maxCurrent: 85 * mA,
    tubeDrop: 20,
    tubeDropCurrent: 85 * mA,
    peakInverseVoltage: 700,
    source: `${RCA}, 50Y6GT data (from memory)`,
    note: "Two separate diodes, for a voltage doubler or in parallel as one half-wave rectifier.",
  },
  {
    type: "117Z3",
    aliases: [],
    circuit: "half-wave",
    heating: "indirect",
    heaterVoltage: 117,
    heaterCurrent: 0.04,
    maxInputCapacitance: 40 * µF,
    maxCurrent: 90 * mA,
    tubeDrop: 20,
    tubeDropCurrent: 90 * mA,
    peakInverseVoltage: 330,
    source: `${RCA}, 117Z3 data (from memory)`,
    note: "Heater straight across the mains.",
  },
];

/** "5y3", " 5Y3-GT " read as 5Y3 and 5Y3GT, as the heater table reads names. */
const normalise = (name: string) => name.toUpperCase().replace(/[\s-]/g, "");

const byName = new Map<string, RectifierEntry>();
for (const r of RECTIFIERS) for (const n of [r.type, ...r.aliases]) byName.set(normalise(n), r);

/**
 * The rectifier of a type number, case-insensitive; undefined when the table does not list it.
 * A G or GT envelope suffix the table does not name is tolerated ("6X5G" → 6X5GT, "117Z3GT" → 117Z3),
 * but a lettered revision (GA, GB) is never guessed: a 5U4GB is rated differently from a 5U4G.
 */
export function findRectifier(type: string): RectifierEntry | undefined {
  const n = normalise(type);
  const hit = byName.get(n);
  if (hit) return hit;
  const base = n.replace(/GT?$/, "");
  return byName.get(base) ?? byName.get(`${base}GT`) ?? byName.get(`${base}G`);
}

/** The type numbers we show, for the form's choices. */
export const RECTIFIER_TYPES: readonly string[] = RECTIFIERS.map((r) => r.type);
