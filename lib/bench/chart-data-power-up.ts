import { lampCircuitCurrent } from "@/lib/calc/series-lamp-circuit";

/**
 * Points for the first-power pictures (series lamp, reforming), from a result's normalised inputs and
 * outputs. Pure, so the charts stay thin and these can be tested; each curve uses its calculator's formula.
 */

type Rec = Record<string, unknown>;
const num = (v: unknown): number | undefined => (typeof v === "number" && Number.isFinite(v) ? v : undefined);

/** Household incandescent lamp sizes a bench keeps for a series lamp (common practice). */
export const COMMON_LAMPS = [25, 40, 60, 100] as const;

export interface LampLine {
  /** Data key in each point. */
  key: string;
  /** What the line is: "60 W lamp", or "Set alone, no lamp". */
  label: string;
  /** Lamp wattage; null for the set alone on the line. */
  lampPower: number | null;
  /** The lamp typed into the calculator. */
  yours: boolean;
}

export interface LampCurves {
  lineVoltage: number;
  /** Set power (W) and, per line key, the current (A) through lamp and set. */
  points: Record<string, number>[];
  lines: LampLine[];
  /** The typed set and what it draws through the typed lamp (the calculator's setCurrent). */
  set?: { power: number; current: number };
  /** The typed lamp's current with a dead short in the set (the calculator's maxCurrent). */
  maxCurrent: number;
}

/** Current drawn through lamp and set, the set a fixed resistance V²/P_set: the calculator's own circuit. */
export function lampCurrent(lineVoltage: number, lampPower: number, setPower: number): number {
  if (setPower <= 0) return 0;
  return lampCircuitCurrent(lineVoltage, (lineVoltage * lineVoltage) / lampPower, lampPower / lineVoltage, (lineVoltage * lineVoltage) / setPower);
}

/** A round axis end at or above x: 1, 2, 2.5 or 5 times a power of ten. */
function niceCeil(x: number): number {
  const p = 10 ** Math.floor(Math.log10(x));
  const m = x / p;
  return (m <= 1 ? 1 : m <= 2 ? 2 : m <= 2.5 ? 2.5 : m <= 5 ? 5 : 10) * p;
}

/** Current against set power for the common lamp sizes and the typed one, beside the set alone on the line. */
export function lampCurves(inputs: Rec, outputs: Rec): LampCurves | null {
  const v = num(inputs.lineVoltage);
  const lamp = num(inputs.lampPower);
  const maxCurrent = num(outputs.maxCurrent);
  if (v === undefined || lamp === undefined || maxCurrent === undefined) return null;
  const setPower = num(inputs.setPower);
  const sizes = [...new Set([...COMMON_LAMPS, lamp])].sort((a, b) => a - b);
  const lines: LampLine[] = sizes.map((p) => ({ key: `lamp${p}`, label: `${Number(p.toPrecision(3))} W lamp`, lampPower: p, yours: p === lamp }));
  lines.push({ key: "alone", label: "Set alone, no lamp", lampPower: null, yours: false });
  const end = niceCeil(Math.max(150, 2 * (setPower ?? 0), 1.5 * lamp));
  const n = 60;
  const powers = Array.from({ length: n + 1 }, (_, i) => (end * i) / n);
  if (setPower !== undefined && !powers.includes(setPower)) powers.push(setPower);
  powers.sort((a, b) => a - b);
  const points = powers.map((ps) => {
    const row: Record<string, number> = { setPower: ps };
    for (const l of lines) row[l.key] = l.lampPower === null ? ps / v : lampCurrent(v, l.lampPower, ps);
    return row;
  });
  const setCurrent = num(outputs.setCurrent);
  return {
    lineVoltage: v,
    points,
    lines,
    set: setPower !== undefined && setCurrent !== undefined ? { power: setPower, current: setCurrent } : undefined,
    maxCurrent,
  };
}

export interface ReformingSchedule {
  /** Time (minutes from the start), the voltage applied and the leakage to wait for, at each step's start and the end. */
  points: { t: number; v: number; leak: number }[];
  steps: { start: number; voltage: number; minutes: number; leakageLimit: number }[];
  rated: number;
  totalMinutes: number;
}

/** The calculator's voltage schedule laid out against time, each step held for its minutes. */
export function reformingSchedule(inputs: Rec, outputs: Rec): ReformingSchedule | null {
  const rated = num(inputs.ratedVoltage);
  const raw = Array.isArray(outputs.steps) ? (outputs.steps as Rec[]) : null;
  if (rated === undefined || !raw || raw.length === 0) return null;
  let t = 0;
  const steps: ReformingSchedule["steps"] = [];
  for (const s of raw) {
    const voltage = num(s.voltage);
    const minutes = num(s.minutes);
    const leakageLimit = num(s.leakageLimit);
    if (voltage === undefined || minutes === undefined || leakageLimit === undefined) return null;
    steps.push({ start: t, voltage, minutes, leakageLimit });
    t += minutes;
  }
  const last = steps[steps.length - 1];
  // A step line holds each value until the next point, so the last step is closed with a point at the end.
  const points = [...steps.map((s) => ({ t: s.start, v: s.voltage, leak: s.leakageLimit })), { t, v: last.voltage, leak: last.leakageLimit }];
  return { points, steps, rated, totalMinutes: t };
}
