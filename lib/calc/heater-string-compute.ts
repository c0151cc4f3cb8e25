import { formatQuantity } from "./format";
import { lampModel, lampWarnings, type LampInput } from "./heater-string-lamp";
import { findTapped, MATCH, mixedStringWarnings, noTapWarning } from "./heater-string-notes";
import type { HeaterStringInput, Shunt } from "./heater-string-schema";
import { toPrecision } from "./precision";
import { findHeater as findHeaterOf } from "./tables/heaters";
import { nearestPreferred as nearestPreferredOf } from "./tables/preferred-values";
import { suggestedRating as suggestedRatingOf } from "./tables/wattage";
import type { Warning } from "./types";

/** The heater-string calculator's arithmetic, step by step: totals, shunts, shortfall, pilot lamp. */

// Module-level copies of what the loops read: under the CommonJS interop the benchmark runs in, every
// read of an imported binding is a getter call (as in arc-clearance.ts).
const findHeater = findHeaterOf;
const nearestPreferred = nearestPreferredOf;
const suggestedRating = suggestedRatingOf;

interface Heater {
  voltage: number;
  current: number;
}

/** The heaters as given, or the table's entries for the named tubes, with the totals the string needs. */
export interface StringTotals {
  given: readonly Heater[] | null;
  tubes: readonly string[] | null;
  n: number;
  sum: number;
  iMin: number;
  iMax: number;
  vMax: number;
}

const heaterAt = (t: StringTotals, k: number): Heater => (t.given ? t.given[k] : findHeater(t.tubes![k])!);

export function stringTotals(input: HeaterStringInput): StringTotals {
  // Plain loops over the given heaters or the table entries, in list order (the sum's rounding depends on it).
  const given = input.heaters && input.heaters.length > 0 ? input.heaters : null;
  const tubes = given ? null : (input.tubes ?? []);
  const t: StringTotals = { given, tubes, n: given ? given.length : tubes!.length, sum: 0, iMin: Infinity, iMax: -Infinity, vMax: 0 };
  for (let k = 0; k < t.n; k++) {
    const h = heaterAt(t, k);
    t.sum += h.voltage;
    if (h.current < t.iMin) t.iMin = h.current;
    if (h.current > t.iMax) t.iMax = h.current;
    if (h.voltage > t.vMax) t.vMax = h.voltage;
  }
  return t;
}

/** A shunt across each heater rated below the string current, with the cautions a mixed string needs. */
export function shuntsFor(t: StringTotals, warnings: Warning[]): Shunt[] {
  const shunts: Shunt[] = [];
  const { iMin, iMax, tubes } = t;
  if (!(iMin < iMax)) return shunts;
  const nearlyAlike: string[] = [];
  for (let k = 0; k < t.n; k++) {
    const h = heaterAt(t, k);
    if (h.current >= iMax) continue;
    // The shunt carries what the heater does not, at the heater's own voltage (Kirchhoff's current law).
    const rest = iMax - h.current;
    const resistance = h.voltage / rest;
    const p = h.voltage * rest;
    const r = suggestedRating(p);
    if (r.warning) warnings.push(r.warning);
    const shunt: Shunt = {
      index: k,
      resistance,
      dissipation: p,
      suggestedRating: r.rating,
      nearestPreferred: resistance > 0 ? nearestPreferred(resistance, "E12") : 0,
    };
    if (tubes) shunt.type = tubes[k];
    shunts.push(shunt);
    if (h.current >= iMax / (1 + MATCH)) nearlyAlike.push(tubes ? tubes[k] : `Heater ${k + 1}`);
  }
  mixedStringWarnings(iMin, iMax, nearlyAlike, tubes, warnings);
  return shunts;
}

/** A string needing more than the line runs every heater short by the same fraction. */
export function shortfallWarning(stringVoltage: number, vLine: number): Warning {
  const excess = vLine - stringVoltage;
  const short = (-excess / stringVoltage) * 100;
  return {
    level: "caution",
    message:
      `The string needs ${formatQuantity(stringVoltage, "V")}, more than the ${formatQuantity(vLine, "V")} line, so every heater runs about ${toPrecision(short, 2)}% below its rating. ` +
      "A few per cent is how many AC/DC sets were built; much more and emission suffers.",
  };
}

export interface LampFigures {
  v: number;
  i: number;
  sec: number;
  string: number;
}

/** The pilot lamp on the rectifier's tap, or null (with a caution) when no heater of the string has one. */
export function pilotLampFigures(
  lamp: LampInput,
  tubes: readonly string[] | null,
  string: { vLine: number; voltage: number; current: number; dropper: number },
  warnings: Warning[],
): LampFigures | null {
  const tapped = findTapped(tubes);
  if (!tapped) {
    warnings.push(noTapWarning(tubes !== null));
    return null;
  }
  const m = lampModel(tapped, lamp, string.vLine, string.voltage, string.current, string.dropper);
  lampWarnings(m, lamp, warnings);
  return { v: m.lampVoltage, i: m.lampCurrent, sec: m.sectionCurrent, string: m.currentWith };
}
