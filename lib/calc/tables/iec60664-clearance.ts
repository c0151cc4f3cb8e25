/**
 * IEC 60664-1:2020 (edition 3.0), Insulation coordination for equipment within low-voltage supply
 * systems — Part 1: Principles, requirements and tests.
 *
 * - Table F.8: clearances to withstand steady-state voltages, temporary overvoltages or recurring
 *   peak voltages — the table for DC such as B+ and picture-tube anode supplies. Case A is the
 *   inhomogeneous (non-uniform) field, case B the homogeneous (uniform) one. The 2007 edition
 *   (2.0) carries the same figures as Table F.7 (from memory).
 * - Table A.2: altitude correction factors for clearances (the clearance tables are for up to 2000 m).
 * - Table F.2: the minimum clearance for pollution degree 2, 0.2 mm.
 *
 * Where the figures come from: read row by row from two independent open-source copies
 * of the 2020 edition (KiCad's pcb_calculator, iec60664.cpp; OpenMagnetics MKF's insulation test
 * data), which agree with each other and with the rows recalled from the 2007 edition; not read
 * from the standard's own pages. Check against a purchased copy before relying on them.
 *
 * What the table assumes: dry air as the insulating medium; no pollution-degree column, so its
 * smallest figures (a micrometre at 40 V) are for clean surfaces — pollution degree 1. Inside a
 * set's chassis pollution degree 2 is usual (non-conductive dust, occasional condensation), so the
 * Table F.2 minimum for that degree is applied as a floor; a dusty, damp chassis is degree 3
 * (0.8 mm), which we do not assume. The scope covers DC and AC up to 30 kHz (IEC 60664-4 above),
 * and not ionised gas. Creepage (along a surface) is a separate check this table does not cover.
 */

/** [highest peak voltage of the row in kV, case A in mm (null: no figure), case B in mm]. */
type Row = readonly [kv: number, caseA: number | null, caseB: number];

const F8: readonly Row[] = [
  [0.04, 0.001, 0.001],
  [0.06, 0.002, 0.002],
  [0.1, 0.003, 0.003],
  [0.12, 0.004, 0.004],
  [0.15, 0.005, 0.005],
  [0.2, 0.006, 0.006],
  [0.25, 0.008, 0.008],
  [0.33, 0.01, 0.01],
  [0.4, 0.02, 0.02],
  [0.5, 0.04, 0.04],
  [0.6, 0.06, 0.06],
  [0.8, 0.13, 0.1],
  [1.0, 0.26, 0.15],
  [1.2, 0.42, 0.2],
  [1.5, 0.76, 0.3],
  [2.0, 1.27, 0.45],
  [2.5, 1.8, 0.6],
  [3.0, 2.4, 0.8],
  [4.0, 3.8, 1.2],
  [5.0, 5.7, 1.5],
  [6.0, 7.9, 2],
  [8.0, 11.0, 3],
  [10, 15.2, 3.5],
  [12, 19, 4.5],
  [15, 25, 5.5],
  [20, 34, 8],
  [25, 44, 10],
  [30, 55, 12.5],
  [40, 77, 17],
  [50, 100, 22],
  // Case A stops at 50 kV; case B goes on to 100 kV.
  [60, null, 27],
  [80, null, 35],
  [100, null, 45],
];

/** Table A.2: [altitude up to, in m; factor]. */
const A2: readonly (readonly [number, number])[] = [
  [2000, 1.0],
  [3000, 1.14],
  [4000, 1.29],
  [5000, 1.48],
  [6000, 1.7],
  [7000, 1.95],
  [8000, 2.25],
  [9000, 2.62],
  [10000, 3.02],
  [15000, 6.67],
  [20000, 14.5],
];

export type FieldCase = "A" | "B";

// The columns as plain number arrays (NaN for "no figure"), so the lookups in every compute stay cheap.
const ROW_KV: readonly number[] = F8.map((r) => r[0]);
const COLUMN_MM: Readonly<Record<FieldCase, readonly number[]>> = { A: F8.map((r) => r[1] ?? NaN), B: F8.map((r) => r[2]) };
const ALT_UP_TO: readonly number[] = A2.map((r) => r[0]);
const ALT_FACTOR: readonly number[] = A2.map((r) => r[1]);

export const TABLE_NAME = "IEC 60664-1:2020 Table F.8";
/** Highest peak voltage (V) with a figure, by case. */
export const TABLE_MAX_VOLTS: Readonly<Record<FieldCase, number>> = { A: 50e3, B: 100e3 };
/** The case A and case B figures at the top of each column (m). */
export const TABLE_TOP_METRES: Readonly<Record<FieldCase, number>> = { A: 0.1, B: 0.045 };
/** Table F.2's minimum clearance for pollution degree 2 (m), applied as a floor. */
export const POLLUTION_DEGREE_2_MIN_M = 0.2e-3;
/** Highest altitude in Table A.2 (m). */
export const ALTITUDE_TABLE_MAX_M = 20_000;

/** Each row's figure in metres, raised to the pollution degree 2 minimum (NaN for no figure). */
const FLOORED_M: Readonly<Record<FieldCase, readonly number[]>> = {
  A: COLUMN_MM.A.map((mm) => Math.max(mm / 1000, POLLUTION_DEGREE_2_MIN_M)),
  B: COLUMN_MM.B.map((mm) => Math.max(mm / 1000, POLLUTION_DEGREE_2_MIN_M)),
};

/** Index of the first row at or above the peak voltage (no interpolation: the cautious reading); -1 above every row. */
function firstRow(peakVolts: number): number {
  const kv = peakVolts / 1000;
  for (let i = 0; i < ROW_KV.length; i++) if (kv <= ROW_KV[i]) return i;
  return -1;
}

/** The row of a column for a voltage, or -1 where the column has no figure (case A above 50 kV, anything above 100 kV). */
export function tableRow(peakVolts: number, field: FieldCase): number {
  const i = firstRow(peakVolts);
  return i >= 0 && COLUMN_MM[field][i] === COLUMN_MM[field][i] ? i : -1;
}

export interface TableClearance {
  /** The figure in metres, before the altitude factor, raised to the pollution floor; null above the column's highest row. */
  metres: number | null;
  /** The table's own figure in metres (before the floor); null above the column's highest row. */
  raw: number | null;
  /** The row's upper voltage in volts (the row read), or the column's top when out of range. */
  rowVolts: number;
  /** True when the pollution degree 2 minimum is larger than the table's own figure. */
  pollutionFloor: boolean;
}

/** Table F.8's clearance for a peak voltage, the first row at or above it, raised to the pollution degree 2 minimum. */
export function tableClearance(peakVolts: number, field: FieldCase): TableClearance {
  const i = tableRow(peakVolts, field);
  if (i < 0) return { metres: null, raw: null, rowVolts: TABLE_MAX_VOLTS[field], pollutionFloor: false };
  const raw = COLUMN_MM[field][i] / 1000;
  return { metres: FLOORED_M[field][i], raw, rowVolts: ROW_KV[i] * 1000, pollutionFloor: raw < POLLUTION_DEGREE_2_MIN_M };
}

/** Row index of Table A.2 for an altitude (up to 2000 m: the first row, factor 1); the last row past the table. */
export function altitudeRow(altitude: number): number {
  for (let i = 0; i < ALT_UP_TO.length; i++) if (altitude <= ALT_UP_TO[i]) return i;
  return ALT_UP_TO.length - 1; // the schema keeps altitude inside the table; past it, the last factor is the least that applies
}

/** Table A.2's factor and the upper altitude of its row (no interpolation). */
export function altitudeFactor(altitude: number): { factor: number; rowMetres: number } {
  const i = altitudeRow(altitude);
  return { factor: ALT_FACTOR[i], rowMetres: ALT_UP_TO[i] };
}

/** Every row, for tests and for anyone checking the copied figures. */
export const TABLE_F8_ROWS = F8;
export const TABLE_A2_ROWS = A2;

const CASE_WORDS: Readonly<Record<FieldCase, string>> = { A: "case A (inhomogeneous field)", B: "case B (homogeneous field)" };
const F2_FLOOR = "IEC 60664-1:2020 Table F.2 minimum for pollution degree 2 (0.2 mm), above";
const ALTITUDE_WORDS = A2.map(([upTo, f]) => `; altitude factor ${f} (Table A.2, up to ${upTo} m)`);
function names(field: FieldCase): { rows: string[][]; out: string[] } {
  const rows = F8.map(([kv], i) => {
    const base =
      FLOORED_M[field][i] > COLUMN_MM[field][i] / 1000
        ? `${F2_FLOOR} ${TABLE_NAME} ${CASE_WORDS[field]} up to ${kv} kV`
        : `${TABLE_NAME}, ${CASE_WORDS[field]}, row up to ${kv} kV`;
    return ALTITUDE_WORDS.map((a) => base + a);
  });
  const out = ALTITUDE_WORDS.map((a) => `${TABLE_NAME}, ${CASE_WORDS[field]}: no row above ${TABLE_MAX_VOLTS[field] / 1000} kV, no figure${a}`);
  return { rows, out };
}
/** Every name the output can take, made once: compute runs on every keystroke and must not format numbers. */
const NAMES: Readonly<Record<FieldCase, { rows: string[][]; out: string[] }>> = { A: names("A"), B: names("B") };

export interface StandardFigures {
  field: FieldCase;
  /** Row of Table F.8 read for the chosen case, and for case A; -1 where the column has no figure. */
  row: number;
  caseARow: number;
  /** Row of Table A.2 and its factor. */
  altitudeRow: number;
  factor: number;
  /** The chosen case's figure times the altitude factor; null above the table. */
  standardClearance: number | null;
  /** The least the recommendation may be: the larger of the chosen case and case A (the top figure above its range), altitude-corrected. */
  floor: number;
  /** Which table, row and factor, in words, e.g. "IEC 60664-1:2020 Table F.8, case A (inhomogeneous field), row up to 8 kV; altitude factor 1 (Table A.2, up to 2000 m)". */
  name: string;
}

/**
 * IEC 60664-1's figures for a peak voltage, electrode shape and altitude. `floor` carries PRODUCT.md's rule: a
 * clearance is never below the non-uniform (case A) figure, whichever shape is chosen.
 */
export function standardFigures(peakVolts: number, electrode: "uniform" | "non-uniform", altitude: number): StandardFigures {
  const field: FieldCase = electrode === "uniform" ? "B" : "A";
  const row = tableRow(peakVolts, field);
  const caseARow = field === "A" ? row : tableRow(peakVolts, "A");
  const alt = altitudeRow(altitude);
  const factor = ALT_FACTOR[alt];
  const chosen = row < 0 ? TABLE_TOP_METRES[field] : FLOORED_M[field][row];
  const caseA = caseARow < 0 ? TABLE_TOP_METRES.A : FLOORED_M.A[caseARow];
  return {
    field,
    row,
    caseARow,
    altitudeRow: alt,
    factor,
    standardClearance: row < 0 ? null : chosen * factor,
    floor: (caseA > chosen ? caseA : chosen) * factor,
    name: row < 0 ? NAMES[field].out[alt] : NAMES[field].rows[row][alt],
  };
}
