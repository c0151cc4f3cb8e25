import { findHeater, normaliseTubeName } from "./heaters";

/**
 * Ratings of common receiving tubes and picture tubes of the era: plain data for the
 * plate-dissipation calculator and for comparing a substitute with the original in a job's Tubes.
 *
 * Source: RCA receiving tube manuals (RC-series), RCA picture tube data, and the European makers'
 * data sheets (EL34, EL84, KT66). Every figure was recalled FROM MEMORY of those sheets, not re-read
 * from a copy. Older American sheets give design-centre ratings, later ones design-maximum, European
 * ones absolute maxima, and suffixes (GT/GTA/GTB, A, B) often carry different ratings: read the data
 * sheet of the tube in the set before relying on one for a design that matters.
 *
 * Heaters come from heaters.ts (`tubeHeater`); a row carries its own heater only where that table
 * does not list the type. Rectifiers are in rectifiers.ts, not here.
 */

export const TUBE_SOURCE = "RCA receiving tube manual (RC-series) and tube data sheets; values recalled from memory, check the data sheet for critical work";

export type TubeKind =
  | "triode"
  | "twin triode"
  | "duplex diode triode"
  | "sharp-cutoff pentode"
  | "remote-cutoff pentode"
  | "pentagrid converter"
  | "power pentode"
  | "beam power"
  | "damper diode";

export type TubeBase = "octal" | "7-pin miniature" | "9-pin noval" | "4-pin (UX)" | "duodecal";

export interface Heater {
  voltage: number;
  current: number;
}

export interface ReceivingTube {
  category: "receiving";
  /** The type number we show. */
  type: string;
  /** Other type numbers with the same ratings, accepted by findTube. */
  aliases: readonly string[];
  kind: TubeKind;
  base: TubeBase;
  /** Filament (directly heated) or heater and separate cathode. */
  heating: "filament" | "indirect";
  /** Triode sections in the envelope; ratings below are per section. */
  sections: 1 | 2;
  /** Maximum DC plate voltage, V (absent for a damper diode, rated by peak inverse voltage). */
  maxPlateVoltage?: number;
  /** Horizontal-output types: maximum peak positive pulse plate voltage, V. */
  maxPeakPulseVoltage?: number;
  /** Damper diodes: maximum peak inverse plate voltage, V. */
  maxPeakInverseVoltage?: number;
  /** Maximum plate dissipation, W (per section). */
  maxPlateDissipation: number;
  /** Maximum screen-grid dissipation, W (tetrodes, pentodes, converters). */
  maxScreenDissipation?: number;
  /** Only where heaters.ts does not list the type. */
  heater?: Heater;
  source: string;
  note?: string;
}

export type CrtFocus = "magnetic" | "electrostatic";

export interface PictureTube {
  category: "picture";
  type: string;
  aliases: readonly string[];
  kind: "picture tube";
  base: TubeBase;
  /** Round or rectangular face; the type number begins with the nominal size in inches. */
  face: "round" | "rectangular";
  /** Lowest and highest anode (ultor) voltage of the sheet's operating range, V. */
  anodeVoltageMin: number;
  anodeVoltageMax: number;
  /** Full deflection angle, degrees (diagonal). */
  deflectionAngle: number;
  focus: CrtFocus;
  /** Needs an ion-trap magnet on the neck. */
  ionTrap: boolean;
  heater: Heater;
  source: string;
  note?: string;
}

export type TubeEntry = ReceivingTube | PictureTube;

const RCA = "RCA receiving tube manual (RC-series)";
const memo = (type: string, from = RCA) => `${from}, ${type} data (from memory)`;
const h = (voltage: number, current: number): Heater => ({ voltage, current });

type Row = Omit<ReceivingTube, "category" | "aliases" | "source" | "heating" | "sections"> &
  Partial<Pick<ReceivingTube, "aliases" | "source" | "heating" | "sections">>;
const r = (row: Row): ReceivingTube => ({
  category: "receiving",
  aliases: [],
  heating: "indirect",
  sections: 1,
  source: memo(row.type),
  ...row,
});

export const RECEIVING_TUBES: readonly ReceivingTube[] = [
  // Output pentodes and beam power tubes
  r({ type: "6V6GT", aliases: ["6V6", "6V6G"], kind: "beam power", base: "octal", maxPlateVoltage: 315, maxPlateDissipation: 12, maxScreenDissipation: 2 }),
  r({
    type: "6V6GTA",
    kind: "beam power",
    base: "octal",
    maxPlateVoltage: 350,
    maxPlateDissipation: 14,
    maxScreenDissipation: 2.2,
    note: "Design-maximum ratings, higher than the older 6V6GT's.",
  }),
  r({ type: "6L6", aliases: ["6L6G", "6L6GB"], kind: "beam power", base: "octal", maxPlateVoltage: 360, maxPlateDissipation: 19, maxScreenDissipation: 2.5 }),
  r({
    type: "6L6GC",
    kind: "beam power",
    base: "octal",
    maxPlateVoltage: 500,
    maxPlateDissipation: 30,
    maxScreenDissipation: 5,
    note: "Rated well above the older 6L6 and 6L6G; those are no substitute at 6L6GC voltages.",
  }),
  r({
    type: "6F6",
    aliases: ["6F6G", "6F6GT"],
    kind: "power pentode",
    base: "octal",
    maxPlateVoltage: 375,
    maxPlateDissipation: 11,
    maxScreenDissipation: 3.75,
  }),
  r({ type: "6K6GT", aliases: ["6K6G"], kind: "power pentode", base: "octal", maxPlateVoltage: 315, maxPlateDissipation: 8.5, maxScreenDissipation: 2.8 }),
  r({ type: "6AQ5", kind: "beam power", base: "7-pin miniature", maxPlateVoltage: 250, maxPlateDissipation: 12, maxScreenDissipation: 2 }),
  r({ type: "6AQ5A", kind: "beam power", base: "7-pin miniature", maxPlateVoltage: 275, maxPlateDissipation: 12, maxScreenDissipation: 2 }),
  r({
    type: "6BQ5",
    aliases: ["EL84"],
    kind: "power pentode",
    base: "9-pin noval",
    maxPlateVoltage: 300,
    maxPlateDissipation: 12,
    maxScreenDissipation: 2,
    source: memo("EL84/6BQ5", "EL84 data sheet"),
  }),
  r({
    type: "EL34",
    kind: "power pentode",
    base: "octal",
    maxPlateVoltage: 800,
    maxPlateDissipation: 25,
    maxScreenDissipation: 8,
    heater: h(6.3, 1.5),
    source: memo("EL34", "EL34 data sheet"),
  }),
  r({
    type: "6CA7",
    kind: "power pentode",
    base: "octal",
    maxPlateVoltage: 800,
    maxPlateDissipation: 25,
    maxScreenDissipation: 8,
    heater: h(6.3, 1.5),
    note: "The American number for the EL34; some makers built it as a beam tetrode.",
  }),
  r({
    type: "6550",
    kind: "beam power",
    base: "octal",
    maxPlateVoltage: 600,
    maxPlateDissipation: 35,
    maxScreenDissipation: 6,
    heater: h(6.3, 1.6),
    note: "The later 6550A is rated higher.",
  }),
  r({
    type: "KT66",
    kind: "beam power",
    base: "octal",
    maxPlateVoltage: 500,
    maxPlateDissipation: 25,
    maxScreenDissipation: 3.5,
    heater: h(6.3, 1.27),
    source: memo("KT66", "KT66 data sheet"),
  }),
  r({ type: "35C5", kind: "beam power", base: "7-pin miniature", maxPlateVoltage: 135, maxPlateDissipation: 5.5, maxScreenDissipation: 1 }),
  r({ type: "50C5", kind: "beam power", base: "7-pin miniature", maxPlateVoltage: 135, maxPlateDissipation: 5.5, maxScreenDissipation: 1 }),
  r({ type: "50L6GT", aliases: ["50L6"], kind: "beam power", base: "octal", maxPlateVoltage: 200, maxPlateDissipation: 10, maxScreenDissipation: 1.25 }),
  r({ type: "25L6GT", aliases: ["25L6"], kind: "beam power", base: "octal", maxPlateVoltage: 200, maxPlateDissipation: 10, maxScreenDissipation: 1.25 }),
  // Television horizontal output and damper: the DC plate rating is far below the flyback pulse the plate sees.
  r({
    type: "6BQ6GT",
    aliases: ["6BQ6GA"],
    kind: "beam power",
    base: "octal",
    maxPlateVoltage: 550,
    maxPeakPulseVoltage: 6000,
    maxPlateDissipation: 10,
    maxScreenDissipation: 2.5,
  }),
  r({
    type: "6BQ6GTB",
    kind: "beam power",
    base: "octal",
    maxPlateVoltage: 600,
    maxPeakPulseVoltage: 6000,
    maxPlateDissipation: 11,
    maxScreenDissipation: 2.5,
  }),
  r({
    type: "6DQ6A",
    aliases: ["6DQ6"],
    kind: "beam power",
    base: "octal",
    maxPlateVoltage: 700,
    maxPeakPulseVoltage: 6500,
    maxPlateDissipation: 15,
    maxScreenDissipation: 3.2,
    heater: h(6.3, 1.2),
  }),
  r({
    type: "6DQ6B",
    kind: "beam power",
    base: "octal",
    maxPlateVoltage: 700,
    maxPeakPulseVoltage: 6500,
    maxPlateDissipation: 18,
    maxScreenDissipation: 3.6,
    heater: h(6.3, 1.2),
  }),
  r({
    type: "6AU4GT",
    aliases: ["6AU4GTA"],
    kind: "damper diode",
    base: "octal",
    maxPeakInverseVoltage: 4500,
    maxPlateDissipation: 6.5,
    heater: h(6.3, 1.8),
    note: "Its cathode swings with the flyback pulse: the heater-to-cathode rating matters as much as the plate's.",
  }),
  // Triodes (ratings per section)
  r({ type: "6SN7GT", aliases: ["6SN7"], kind: "twin triode", base: "octal", sections: 2, maxPlateVoltage: 450, maxPlateDissipation: 2.5 }),
  r({
    type: "6SN7GTB",
    aliases: ["6SN7GTA"],
    kind: "twin triode",
    base: "octal",
    sections: 2,
    maxPlateVoltage: 450,
    maxPlateDissipation: 5,
    note: "5 W each section, 7.5 W both together.",
  }),
  r({ type: "12AX7", aliases: ["12AX7A", "ECC83"], kind: "twin triode", base: "9-pin noval", sections: 2, maxPlateVoltage: 300, maxPlateDissipation: 1 }),
  r({ type: "12AU7", aliases: ["12AU7A", "ECC82"], kind: "twin triode", base: "9-pin noval", sections: 2, maxPlateVoltage: 300, maxPlateDissipation: 2.75 }),
  r({ type: "12AT7", aliases: ["ECC81"], kind: "twin triode", base: "9-pin noval", sections: 2, maxPlateVoltage: 300, maxPlateDissipation: 2.5 }),
  r({ type: "6SL7GT", aliases: ["6SL7"], kind: "twin triode", base: "octal", sections: 2, maxPlateVoltage: 250, maxPlateDissipation: 1 }),
  // The 6SN7GT's sections on a 12.6 V 0.3 A heater, for 300 mA series strings.
  r({ type: "12SN7GT", aliases: ["12SN7"], kind: "twin triode", base: "octal", sections: 2, maxPlateVoltage: 450, maxPlateDissipation: 2.5 }),
  r({
    type: "6CG7",
    kind: "twin triode",
    base: "9-pin noval",
    sections: 2,
    maxPlateVoltage: 330,
    maxPlateDissipation: 3.5,
    note: "The miniature counterpart of the 6SN7GT, on a noval base.",
  }),
  // Television vertical deflection output triode.
  r({
    type: "6S4",
    aliases: ["6S4A"],
    kind: "triode",
    base: "9-pin noval",
    maxPlateVoltage: 550,
    maxPlateDissipation: 7.5,
    heater: h(6.3, 0.6),
    note: "Its plate also sees the vertical flyback pulse, well above the DC rating.",
  }),
  r({ type: "6J5", aliases: ["6J5GT"], kind: "triode", base: "octal", maxPlateVoltage: 300, maxPlateDissipation: 2.5 }),
  r({ type: "2A3", kind: "triode", base: "4-pin (UX)", heating: "filament", maxPlateVoltage: 300, maxPlateDissipation: 15, heater: h(2.5, 2.5) }),
  r({
    type: "300B",
    kind: "triode",
    base: "4-pin (UX)",
    heating: "filament",
    maxPlateVoltage: 450,
    maxPlateDissipation: 36,
    heater: h(5, 1.2),
    source: memo("300B", "300B data sheet"),
    note: "Later sheets rate it at 40 W.",
  }),
  r({ type: "45", kind: "triode", base: "4-pin (UX)", heating: "filament", maxPlateVoltage: 275, maxPlateDissipation: 10, heater: h(2.5, 1.5) }),
  // Small-signal types of the table radio
  r({ type: "6BA6", kind: "remote-cutoff pentode", base: "7-pin miniature", maxPlateVoltage: 300, maxPlateDissipation: 3, maxScreenDissipation: 0.6 }),
  r({ type: "6BE6", kind: "pentagrid converter", base: "7-pin miniature", maxPlateVoltage: 300, maxPlateDissipation: 1, maxScreenDissipation: 1 }),
  r({ type: "6AV6", kind: "duplex diode triode", base: "7-pin miniature", maxPlateVoltage: 300, maxPlateDissipation: 0.5 }),
  r({
    type: "6SK7",
    aliases: ["6SK7GT"],
    kind: "remote-cutoff pentode",
    base: "octal",
    maxPlateVoltage: 300,
    maxPlateDissipation: 4,
    maxScreenDissipation: 0.4,
  }),
  r({ type: "6SA7", aliases: ["6SA7GT"], kind: "pentagrid converter", base: "octal", maxPlateVoltage: 300, maxPlateDissipation: 1, maxScreenDissipation: 1 }),
  r({ type: "6SQ7", aliases: ["6SQ7GT"], kind: "duplex diode triode", base: "octal", maxPlateVoltage: 250, maxPlateDissipation: 0.5 }),
  r({ type: "6AU6", kind: "sharp-cutoff pentode", base: "7-pin miniature", maxPlateVoltage: 300, maxPlateDissipation: 3, maxScreenDissipation: 0.65 }),
  r({ type: "6AU6A", kind: "sharp-cutoff pentode", base: "7-pin miniature", maxPlateVoltage: 330, maxPlateDissipation: 3.5, maxScreenDissipation: 0.75 }),
  r({ type: "6CB6", kind: "sharp-cutoff pentode", base: "7-pin miniature", maxPlateVoltage: 300, maxPlateDissipation: 2, maxScreenDissipation: 0.5 }),
];

const CRT = "RCA picture tube data";
const p = (row: Omit<PictureTube, "category" | "kind" | "aliases" | "source" | "heater" | "base">): PictureTube => ({
  category: "picture",
  kind: "picture tube",
  aliases: [],
  base: "duodecal",
  heater: h(6.3, 0.6),
  source: memo(row.type, CRT),
  ...row,
});

/** Black-and-white picture tubes of the 1950s. */
export const PICTURE_TUBES: readonly PictureTube[] = [
  p({ type: "10BP4", face: "round", anodeVoltageMin: 8000, anodeVoltageMax: 12000, deflectionAngle: 50, focus: "magnetic", ionTrap: true }),
  p({ type: "12LP4", face: "round", anodeVoltageMin: 9000, anodeVoltageMax: 12000, deflectionAngle: 54, focus: "magnetic", ionTrap: true }),
  p({ type: "17BP4A", face: "rectangular", anodeVoltageMin: 12000, anodeVoltageMax: 16000, deflectionAngle: 70, focus: "magnetic", ionTrap: true }),
  p({
    type: "17HP4",
    face: "rectangular",
    anodeVoltageMin: 12000,
    anodeVoltageMax: 16000,
    deflectionAngle: 70,
    focus: "electrostatic",
    ionTrap: true,
    note: "Electrostatic focus: in place of a 17BP4A it needs a focus-electrode connection, not the focus coil.",
  }),
  p({ type: "21YP4", face: "rectangular", anodeVoltageMin: 14000, anodeVoltageMax: 18000, deflectionAngle: 70, focus: "electrostatic", ionTrap: true }),
];

/** Every tube of the table, receiving tubes first. */
export const TUBES: readonly TubeEntry[] = [...RECEIVING_TUBES, ...PICTURE_TUBES];

/** The type numbers we show, for the form's choices. */
export const TUBE_TYPES: readonly string[] = TUBES.map((t) => t.type);

const byName = new Map<string, TubeEntry>();
for (const t of TUBES) for (const n of [t.type, ...t.aliases]) byName.set(normaliseTubeName(n), t);

/**
 * A tube by type number, read as the heater table reads names (any case, spaces, hyphens). A G or GT
 * envelope suffix the table does not name is tolerated ("6K6" → 6K6GT, "6J5G" → 6J5), but a lettered
 * revision (A, B, GTA, GTB) is never guessed: a 6V6GTA or 6L6GC is rated differently from its elder.
 */
export function findTube(type: string): TubeEntry | undefined {
  const n = normaliseTubeName(type);
  const hit = byName.get(n);
  if (hit || n === "") return hit;
  const base = n.replace(/GT?$/, "");
  return byName.get(base) ?? byName.get(`${base}GT`) ?? byName.get(`${base}G`);
}

/** The tube's heater: heaters.ts where it lists the type (by its number or an alias), else the row's own. */
export function tubeHeater(t: TubeEntry): Heater | undefined {
  for (const n of [t.type, ...t.aliases]) {
    const found = findHeater(n);
    if (found) return { voltage: found.voltage, current: found.current };
  }
  return t.heater;
}
