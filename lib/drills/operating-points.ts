import { findTube } from "../calc/tables/tubes";

/**
 * Typical class-A1 operating points (single tube, cathode bias) that drills set problems from, as
 * the makers' data sheets list them under "typical operation". Source: RCA receiving tube manual
 * (RC-series) and the types' data sheets; every figure recalled FROM MEMORY, not re-read, which is
 * enough for practice problems but not for a design: read the data sheet of the tube in the set.
 * Each type is also in lib/calc/tables/tubes.ts (checked below), where its ratings live.
 */

export interface OperatingPoint {
  type: string;
  /** What it does in the set, in bench words. */
  role: string;
  plateVoltage: number;
  screenVoltage?: number;
  /** Grid bias, magnitude, V. */
  bias: number;
  plateCurrent: number;
  /** Zero for a triode. */
  screenCurrent: number;
}

const mA = 1e-3;
const op = (type: string, role: string, plateVoltage: number, screenVoltage: number | undefined, bias: number, ipMa: number, ig2Ma = 0): OperatingPoint => ({
  type,
  role,
  plateVoltage,
  ...(screenVoltage === undefined ? {} : { screenVoltage }),
  bias,
  plateCurrent: Number((ipMa * mA).toPrecision(6)),
  screenCurrent: Number((ig2Ma * mA).toPrecision(6)),
});

export const PENTODE_POINTS: readonly OperatingPoint[] = [
  op("6V6GT", "audio output stage", 250, 250, 12.5, 45, 4.5),
  op("6V6GT", "audio output stage", 315, 225, 13, 34, 2.2),
  op("6AQ5", "audio output stage", 250, 250, 12.5, 45, 4.5),
  op("6L6GC", "audio output stage", 250, 250, 14, 72, 5),
  op("6L6GC", "audio output stage", 350, 250, 18, 54, 2.5),
  op("6F6", "audio output stage", 250, 250, 16.5, 34, 6.5),
  op("6K6GT", "audio output stage", 250, 250, 18, 32, 5.5),
  op("6BQ5", "audio output stage", 250, 250, 7.3, 48, 5.5),
  op("50C5", "output stage of an AC/DC radio", 110, 110, 7.5, 49, 4),
  op("35C5", "output stage of an AC/DC radio", 110, 110, 7.5, 40, 3),
  op("50L6GT", "output stage of an AC/DC radio", 110, 110, 7.5, 49, 4),
  op("25L6GT", "output stage of an AC/DC radio", 110, 110, 7.5, 49, 4),
  op("6BA6", "IF amplifier", 250, 100, 1, 11, 4.2),
  op("6SK7", "IF amplifier", 250, 100, 3, 9.2, 2.4),
  op("6AU6", "audio voltage amplifier", 250, 150, 1, 10.6, 4.3),
];

export const TRIODE_POINTS: readonly OperatingPoint[] = [
  op("12AX7", "first audio stage", 250, undefined, 2, 1.2),
  op("12AX7", "first audio stage", 100, undefined, 1, 0.5),
  op("12AU7", "driver stage", 250, undefined, 8.5, 10.5),
  op("12AT7", "amplifier stage", 250, undefined, 2, 10),
  op("6SN7GT", "driver stage", 250, undefined, 8, 9),
  op("6SL7GT", "first audio stage", 250, undefined, 2, 2.3),
  op("6J5", "amplifier stage", 250, undefined, 8, 9),
  op("6AV6", "first audio stage", 250, undefined, 2, 1.2),
  op("2A3", "output stage", 250, undefined, 45, 60),
  op("45", "output stage", 250, undefined, 50, 34),
];

export const OPERATING_POINTS: readonly OperatingPoint[] = [...PENTODE_POINTS, ...TRIODE_POINTS];

/** Types missing from the tube table: empty unless a row above names a tube the table does not know. */
export function unknownTypes(): string[] {
  return OPERATING_POINTS.filter((p) => !findTube(p.type)).map((p) => p.type);
}
