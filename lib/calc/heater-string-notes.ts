import { formatQuantity } from "./format";
import type { TappedHeater } from "./heater-string-lamp";
import { findHeater } from "./tables/heaters";
import type { Warning } from "./types";

/** The heater-string calculator's standing advice, and the checks that need the tube table. */

/** Rated currents within this fraction of each other count as one string current (common practice). */
export const MATCH = 0.02;

export const LIVE_CHASSIS =
  "A heater string across the mains usually means an AC/DC set whose chassis can be tied to one side of the line. " +
  "Work on it through an isolation transformer and never trust a plug's orientation.";
export const COLD_SURGE =
  "Cold heaters draw a surge well above their rating until they warm up, and one open heater breaks the whole string: every tube goes dark.";
const UNEVEN_WARM_UP =
  "A shunted string warms up unevenly: a cold heater has a fraction of its hot resistance while its shunt does not change, and small heaters heat faster than large ones, " +
  "so for the first seconds some heaters run above their rated voltage (common practice). Measure each heater's voltage once the set has warmed up.";

/** Cautions for a string of mixed heater currents (shunts present). */
export function mixedStringWarnings(iMin: number, iMax: number, nearlyAlike: string[], tubes: readonly string[] | null, warnings: Warning[]): void {
  if (nearlyAlike.length) {
    warnings.push({
      level: "info",
      message: `${nearlyAlike.join(", ")} ${nearlyAlike.length > 1 ? "are" : "is"} within 2 % of the string current, inside the usual spread of heater ratings: sets were built without a shunt there (common practice), so that shunt is optional.`,
    });
  }
  // Every heater within 2 % of the others: one string current in practice, nothing more to say.
  if (iMax <= iMin * (1 + MATCH)) return;
  warnings.push({
    level: "caution",
    message:
      `The heaters are rated for different currents (${formatQuantity(iMin, "A")} to ${formatQuantity(iMax, "A")}). ` +
      `In series one current flows through them all, so the string runs at the highest, ${formatQuantity(iMax, "A")}, and each lower-current heater ` +
      "needs the shunt resistor listed for it to carry the difference. Fit every shunt before power-up: without them the heaters do not run at their ratings.",
  });
  warnings.push({ level: "caution", message: UNEVEN_WARM_UP });
  if (tubes) warmUpWarning(tubes, warnings);
}

/** A caution when the table rates some tubes of a mixed string for a controlled warm-up and not others alike. */
function warmUpWarning(tubes: readonly string[], warnings: Warning[]): void {
  const rated = new Map<string, number>();
  const other = new Set<string>();
  for (const t of tubes) {
    const w = findHeater(t)!.warmUp;
    if (w === undefined) other.add(t);
    else rated.set(t, w);
  }
  const times = new Set(rated.values());
  if (rated.size === 0 || (other.size === 0 && times.size === 1)) return;
  const list = [...rated].map(([t, w]) => `${t} (${w} s)`);
  warnings.push({
    level: "caution",
    message:
      `Warm-up ratings differ: ${list.join(", ")} ${list.length > 1 ? "are" : "is"} rated for a controlled heater warm-up` +
      (other.size ? `, while the table gives none for ${[...other].join(", ")}` : "") +
      ". In a series string the heater that warms first takes more than its share of the line until the rest catch up, and a mixed, shunted string makes that worse. " +
      "Prefer controlled warm-up types throughout (warm-up figures from memory of the data sheets).",
  });
}

/** The first tube of the string whose heater has a pilot-lamp tap, with its place in the list. */
export function findTapped(tubes: readonly string[] | null): TappedHeater | null {
  if (!tubes) return null;
  for (let k = 0; k < tubes.length; k++) {
    const e = findHeater(tubes[k])!;
    if (e.tap) return { index: k, type: e.names[0], voltage: e.voltage, current: e.current, tapVoltage: e.tap.voltage, tapFrom: e.tap.from };
  }
  return null;
}

export function noTapWarning(byTubes: boolean): Warning {
  return {
    level: "caution",
    message: byTubes
      ? "A pilot lamp was entered, but no tube in this string has a heater tapped for one (the table knows the 35W4 and 35Z5GT): the lamp was left out of the result."
      : "A pilot lamp was entered, but heaters given by rating carry no tap: name the tubes (a 35W4 or 35Z5GT) to place the lamp. It was left out of the result.",
  };
}
