/**
 * Heater ratings of common receiving tubes of the era.
 *
 * Source: RCA receiving tube manuals (RC-series) and tube makers' data sheets. Every value here was
 * written down FROM MEMORY of those manuals, not re-read from a copy: check the data sheet before
 * relying on one for a design that matters.
 */

export const HEATER_SOURCE = "RCA receiving tube manual (RC-series) and tube data sheets; values recalled from memory, check the data sheet for critical work";

/**
 * Where the tap and warm-up figures come from. The 35Z5GT's 7.5 V lamp section of its 35 V heater was read
 * in a period magazine note on that type ("Longer Life for Dial Lamps", about 1940, in a web reprint); the
 * 35W4's tap is taken as the same 7.5 V from memory. The 11 s controlled warm-up of the television types
 * ("A"/"B" variants for series strings) is from memory of their data sheets.
 */
export const TAP_SOURCE =
  '35Z5GT lamp section 7.5 V of 35 V: period note "Longer Life for Dial Lamps" (read); 35W4 tap 7.5 V and the 11 s warm-up ratings: from memory of the data sheets';

export interface HeaterEntry {
  /** Type numbers, first the one we show; the rest are variants with the same heater. */
  names: readonly string[];
  voltage: number;
  current: number;
  /** What the tube usually does, in a word or two. */
  use: string;
  note?: string;
  /** The heater section a pilot lamp is wired across (35W4/35Z5-style rectifiers): its volts at rated current, and where that figure comes from. */
  tap?: { voltage: number; from: string };
  /** Controlled heater warm-up time (s) of types made for series strings; absent when the data gives none. */
  warmUp?: number;
}

const e = (names: string[], voltage: number, current: number, use: string, note?: string, extra?: Pick<HeaterEntry, "tap" | "warmUp">): HeaterEntry => ({
  names,
  voltage,
  current,
  use,
  ...(note ? { note } : {}),
  ...extra,
});

/** Controlled warm-up of the series-string television types (from memory of their data sheets). */
const WARM_11S = { warmUp: 11 };

export const HEATERS: readonly HeaterEntry[] = [
  // 150 mA series-string types (AC/DC radios)
  e(["12BE6"], 12.6, 0.15, "pentagrid converter"),
  e(["12BA6"], 12.6, 0.15, "remote-cutoff pentode, IF"),
  e(["12AV6"], 12.6, 0.15, "duplex diode triode, detector and first audio"),
  e(["12AT6"], 12.6, 0.15, "duplex diode triode"),
  e(["12AU6"], 12.6, 0.15, "sharp-cutoff pentode"),
  e(["12BD6"], 12.6, 0.15, "remote-cutoff pentode"),
  e(["12SA7", "12SA7GT"], 12.6, 0.15, "pentagrid converter"),
  e(["12SK7", "12SK7GT"], 12.6, 0.15, "remote-cutoff pentode, IF"),
  e(["12SQ7", "12SQ7GT"], 12.6, 0.15, "duplex diode triode"),
  e(["12SJ7", "12SJ7GT"], 12.6, 0.15, "sharp-cutoff pentode"),
  e(["12SL7GT", "12SL7"], 12.6, 0.15, "twin triode"),
  e(["12AX7", "12AX7A", "ECC83"], 12.6, 0.15, "twin high-mu triode", "centre-tapped heater: 6.3 V at 0.3 A with the halves in parallel"),
  e(["12AT7", "ECC81"], 12.6, 0.15, "twin triode", "centre-tapped heater: 6.3 V at 0.3 A with the halves in parallel"),
  e(["12AU7", "ECC82"], 12.6, 0.15, "twin triode", "centre-tapped heater: 6.3 V at 0.3 A with the halves in parallel"),
  e(["12AU7A"], 12.6, 0.15, "twin triode", "centre-tapped heater; controlled warm-up for series strings", WARM_11S),
  e(["19T8"], 18.9, 0.15, "triple diode triode, FM/AM detector"),
  e(["50C5"], 50, 0.15, "beam power output"),
  e(["50B5"], 50, 0.15, "beam power output"),
  e(["50L6GT", "50L6"], 50, 0.15, "beam power output"),
  e(["35C5"], 35, 0.15, "beam power output"),
  e(["35L6GT", "35L6"], 35, 0.15, "beam power output"),
  e(["35W4"], 35, 0.15, "half-wave rectifier", "heater tapped for a pilot lamp", { tap: { voltage: 7.5, from: "recalled from memory" } }),
  e(["35Z5GT", "35Z5"], 35, 0.15, "half-wave rectifier", "heater tapped for a pilot lamp", {
    tap: { voltage: 7.5, from: "read in a period note on the type" },
  }),
  e(["70L7GT"], 70, 0.15, "rectifier and beam power output"),
  // 300 mA series-string types
  e(["25L6GT", "25L6"], 25, 0.3, "beam power output"),
  e(["25Z6GT", "25Z6"], 25, 0.3, "voltage-doubler rectifier"),
  e(["32L7GT"], 32.5, 0.3, "rectifier and beam power output"),
  e(["12SN7GT", "12SN7"], 12.6, 0.3, "twin triode"),
  e(["12BH7A", "12BH7"], 12.6, 0.3, "twin triode", "centre-tapped heater: 6.3 V at 0.6 A with the halves in parallel"),
  // line-voltage heaters
  e(["117Z3"], 117, 0.04, "half-wave rectifier, heater straight across the mains"),
  e(["117Z6GT"], 117, 0.075, "voltage-doubler rectifier, heater straight across the mains"),
  // 600 mA series-string television types
  e(["6SN7GTB"], 6.3, 0.6, "twin triode", "controlled heater warm-up for series strings", WARM_11S),
  e(["6SN7GT", "6SN7GTA", "6SN7"], 6.3, 0.6, "twin triode"),
  e(["6CG7"], 6.3, 0.6, "twin triode"),
  e(["12AX4GTB"], 12.6, 0.6, "television damper diode", "controlled heater warm-up for series strings", WARM_11S),
  e(["12AX4GT"], 12.6, 0.6, "television damper diode"),
  // 6.3 V parallel-heater types
  e(["6BA6"], 6.3, 0.3, "remote-cutoff pentode, IF"),
  e(["6BE6"], 6.3, 0.3, "pentagrid converter"),
  e(["6AV6"], 6.3, 0.3, "duplex diode triode"),
  e(["6AT6"], 6.3, 0.3, "duplex diode triode"),
  e(["6AU6"], 6.3, 0.3, "sharp-cutoff pentode"),
  e(["6AU6A"], 6.3, 0.3, "sharp-cutoff pentode", "controlled heater warm-up for series strings", WARM_11S),
  e(["6SQ7", "6SQ7GT"], 6.3, 0.3, "duplex diode triode"),
  e(["6SK7", "6SK7GT"], 6.3, 0.3, "remote-cutoff pentode"),
  e(["6SA7", "6SA7GT"], 6.3, 0.3, "pentagrid converter"),
  e(["6SJ7", "6SJ7GT"], 6.3, 0.3, "sharp-cutoff pentode"),
  e(["6SL7GT", "6SL7"], 6.3, 0.3, "twin high-mu triode"),
  e(["6K7", "6K7G"], 6.3, 0.3, "remote-cutoff pentode"),
  e(["6Q7", "6Q7G"], 6.3, 0.3, "duplex diode triode"),
  e(["6H6"], 6.3, 0.3, "twin diode"),
  e(["6A8", "6A8G"], 6.3, 0.3, "pentagrid converter"),
  e(["6J5", "6J5GT"], 6.3, 0.3, "triode"),
  e(["6AL5", "EB91"], 6.3, 0.3, "twin diode"),
  e(["6CB6"], 6.3, 0.3, "sharp-cutoff pentode, television IF"),
  e(["6CB6A"], 6.3, 0.3, "sharp-cutoff pentode, television IF", "controlled heater warm-up for series strings", WARM_11S),
  e(["6AG5"], 6.3, 0.3, "sharp-cutoff pentode"),
  e(["6C4"], 6.3, 0.15, "triode"),
  e(["6AK5"], 6.3, 0.175, "sharp-cutoff pentode, VHF"),
  e(["6J6"], 6.3, 0.45, "twin triode, VHF"),
  e(["6U8A"], 6.3, 0.45, "triode-pentode, television", "controlled heater warm-up for series strings", WARM_11S),
  e(["6U8"], 6.3, 0.45, "triode-pentode, television"),
  e(["6T8"], 6.3, 0.45, "triple diode triode"),
  e(["6AC7"], 6.3, 0.45, "sharp-cutoff pentode"),
  e(["6K6GT", "6K6G"], 6.3, 0.4, "pentode power output"),
  e(["6V6GT", "6V6", "6V6G", "6V6GTA"], 6.3, 0.45, "beam power output"),
  e(["6AQ5", "6AQ5A"], 6.3, 0.45, "beam power output"),
  e(["6F6", "6F6G", "6F6GT"], 6.3, 0.7, "pentode power output"),
  e(["6BQ5", "EL84"], 6.3, 0.76, "pentode power output"),
  e(["6L6GC", "6L6", "6L6G", "6L6GB"], 6.3, 0.9, "beam power output"),
  e(["6BG6G"], 6.3, 0.9, "television horizontal output"),
  e(["6BQ6GT", "6BQ6GTB", "6BQ6GA"], 6.3, 1.2, "television horizontal output"),
  e(["6CD6GA", "6CD6G"], 6.3, 2.5, "television horizontal output"),
  e(["6W4GT"], 6.3, 1.2, "television damper diode"),
  e(["6AX4GT", "6AX4GTA"], 6.3, 1.2, "television damper diode"),
  e(["6X4", "EZ90"], 6.3, 0.6, "full-wave rectifier"),
  e(["6X5GT", "6X5"], 6.3, 0.6, "full-wave rectifier"),
  // 5 V rectifier filaments
  e(["5U4GB", "5U4G", "5U4GA"], 5, 3, "full-wave rectifier"),
  e(["5Y3GT", "5Y3G", "5Y3"], 5, 2, "full-wave rectifier"),
  e(["5V4G", "GZ32"], 5, 2, "full-wave rectifier"),
  e(["5AR4", "GZ34"], 5, 1.9, "full-wave rectifier"),
  // high-voltage rectifier of television sets
  e(["1B3GT", "1G3GT"], 1.25, 0.2, "high-voltage rectifier, heated from the flyback"),
];

/** "12ax7", " 12AX7 ", "12-AX7" all read as 12AX7. */
export function normaliseTubeName(name: string): string {
  return name.toUpperCase().replace(/[\s-]/g, "");
}

const byName = new Map<string, HeaterEntry>();
for (const entry of HEATERS) for (const n of entry.names) byName.set(normaliseTubeName(n), entry);

/** The heater of a tube type, case-insensitive; undefined when the table does not list it. */
export function findHeater(name: string): HeaterEntry | undefined {
  // Names the schema has already normalised hit directly; only typed names need the regex.
  return byName.get(name) ?? byName.get(normaliseTubeName(name));
}

/** Every name the table knows, for the form's suggestions. */
export const TUBE_NAMES: readonly string[] = HEATERS.flatMap((h) => h.names);
