import { breakdownVolts } from "@/lib/calc/arc-clearance";
import { HAZARD_VOLTS } from "@/lib/calc/safety";
import { findTriode } from "@/lib/calc/tables/triodes";
import { plateCurves, type TriodeParams } from "@/lib/calc/triode-model";

/**
 * Points for the Bench's pictures, from the normalised inputs and outputs of a result. Pure, so the
 * charts stay thin and these can be tested. Each curve uses the same formula as its calculator.
 */

type Rec = Record<string, unknown>;
const num = (v: unknown): number | undefined => (typeof v === "number" && Number.isFinite(v) ? v : undefined);

export interface Discharge {
  points: { t: number; v: number }[];
  /** The level the curve is compared with (a residual-voltage limit, a target, 50 V). */
  limit: number;
  limitLabel: string;
  /** Time the voltage falls to that level. */
  tLimit: number;
  /** A deadline to mark (the bleeder's time allowed), if any. */
  deadline?: number;
}

/** V(t) = V0·e^(−t/τ) from 0 to a little past the level compared with (or 5τ). */
export function dischargeCurve(v0: number, tau: number, limit: number, limitLabel: string, deadline?: number): Discharge {
  const tLimit = limit < v0 ? tau * Math.log(v0 / limit) : 0;
  const end = Math.max(tLimit * 1.5, deadline ? deadline * 1.25 : 0) || tau * 5;
  const n = 60;
  const points = Array.from({ length: n + 1 }, (_, i) => {
    const t = (end * i) / n;
    return { t, v: v0 * Math.exp(-t / tau) };
  });
  return { points, limit, limitLabel, tLimit, deadline };
}

export function timeConstantDischarge(inputs: Rec, outputs: Rec): Discharge | null {
  const v0 = num(inputs.initialVoltage);
  const tau = num(outputs.timeConstant);
  if (v0 === undefined || tau === undefined) return null;
  const target = num(inputs.targetVoltage);
  return dischargeCurve(v0, tau, target ?? Math.min(HAZARD_VOLTS, v0 / 2), target ? "Target" : `${HAZARD_VOLTS} V`);
}

export function bleederDischarge(inputs: Rec, outputs: Rec): Discharge | null {
  const v0 = num(inputs.workingVoltage);
  const c = num(inputs.capacitance);
  const r = num(outputs.suggestedResistance) ?? num(outputs.maxResistance);
  const limit = num(inputs.safeVoltage);
  if (v0 === undefined || c === undefined || r === undefined || limit === undefined) return null;
  // The line is the residual-voltage limit the result is measured against (IEC 60204-1 §6.2.4 by default), never a "safe" level.
  return dischargeCurve(v0, r * c, limit, "Residual-voltage limit", num(inputs.maxTime));
}

export interface Ripple {
  /** One and a half ripple periods of the reservoir sawtooth (AC part), volts. */
  wave: { t: number; v: number }[];
  period: number;
  vpp: number;
  /** rms ripple at the reservoir and after each stage. */
  levels: { name: string; rms: number }[];
}

export function rippleData(inputs: Rec, outputs: Rec): Ripple | null {
  const vpp = num(outputs.ripplePeakToPeak);
  const fr = num(outputs.rippleFrequency);
  const rms = num(outputs.rippleRms);
  if (vpp === undefined || fr === undefined || rms === undefined) return null;
  const period = 1 / fr;
  // Sawtooth: the reservoir recharges quickly near each peak (here 10 % of the period), then discharges into the load.
  const wave: { t: number; v: number }[] = [];
  const n = 90;
  const end = period * 2;
  for (let i = 0; i <= n; i++) {
    const t = (end * i) / n;
    const phase = (t / period) % 1;
    const v = phase < 0.9 ? vpp / 2 - (vpp * phase) / 0.9 : -vpp / 2 + (vpp * (phase - 0.9)) / 0.1;
    wave.push({ t, v });
  }
  const stages = Array.isArray(outputs.stages) ? (outputs.stages as Rec[]) : [];
  const kinds = Array.isArray(inputs.stages) ? (inputs.stages as Rec[]).map((s) => String(s.kind).toUpperCase()) : [];
  const levels = [{ name: "Reservoir", rms }, ...stages.map((s, i) => ({ name: `Stage ${i + 1} (${kinds[i] ?? "?"})`, rms: num(s.rippleRms) ?? 0 }))];
  return { wave, period, vpp, levels };
}

export interface Breakdown {
  points: { gap: number; kv: number }[];
  working: { gap: number; kv: number };
  /** Gaps in mm. */
  minimum: number;
  recommended?: number;
  /** IEC 60664-1's clearance for the voltage (mm), absent above its table. */
  standard?: number;
  /** What the standard's figure is, e.g. "IEC 60664-1 clearance, case A (non-uniform field)". */
  standardLabel?: string;
}

/** Breakdown voltage against gap, the uniform-field law of the calculator, 0 to past the working gap and the standard's clearance. */
export function breakdownData(inputs: Rec, outputs: Rec): Breakdown | null {
  const vp = num(inputs.peakVoltage);
  const delta = num(outputs.relativeAirDensity);
  const min = num(outputs.minimumGap);
  if (vp === undefined || delta === undefined || min === undefined) return null;
  const gap = num(inputs.gap);
  const rec = num(outputs.recommendedClearance);
  const std = num(outputs.standardClearance);
  const end = Math.max(gap ?? 0, rec ?? 0, std ?? 0, min) * 1.5;
  const n = 60;
  const points = Array.from({ length: n }, (_, i) => {
    const g = (end * (i + 1)) / n;
    return { gap: g * 1000, kv: breakdownVolts(g, delta) / 1000 };
  });
  const caseWords = inputs.electrode === "uniform" ? "case B (uniform field)" : "case A (non-uniform field)";
  return {
    points,
    working: { gap: (gap ?? min) * 1000, kv: vp / 1000 },
    minimum: min * 1000,
    recommended: rec === undefined ? undefined : rec * 1000,
    standard: std === undefined ? undefined : std * 1000,
    standardLabel: std === undefined ? undefined : `IEC 60664-1 clearance, ${caseWords}`,
  };
}

export interface PlateFamily {
  curves: { eg: number; points: { ep: number; ip: number }[] }[];
  loadLine: { ep: number; ip: number }[];
  operating?: { ep: number; ip: number };
  maxEp: number;
  maxIpMa: number;
}

const MODEL = ["mu", "ex", "kg1", "kp", "kvb"] as const;

/** The chosen triode's plate curves (mA against V), its DC load line and the operating point. */
export function plateFamily(inputs: Rec, outputs: Rec): PlateFamily | null {
  const supply = num(inputs.supplyVoltage);
  const ra = num(inputs.plateResistor);
  const rk = num(inputs.cathodeResistor) ?? 0;
  if (supply === undefined || ra === undefined) return null;
  const base = typeof inputs.tube === "string" ? findTriode(inputs.tube)?.params : undefined;
  const params = {} as TriodeParams;
  for (const k of MODEL) {
    const v = num(inputs[k]) ?? base?.[k];
    if (v === undefined) return null;
    params[k] = v;
  }
  const maxEp = supply * 1.1;
  const bias = num(outputs.cathodeVoltage) ?? 0;
  // Grid steps that bracket the operating bias: 0 V down to about 2.5× it, at least four curves.
  const stepV = Math.max(0.5, niceStep(Math.max(bias * 2.5, 2) / 5));
  const grids = Array.from({ length: 6 }, (_, i) => -i * stepV);
  const curves = plateCurves(params, { gridVoltages: grids, maxPlateVoltage: maxEp, points: 40 }).map((pts, i) => ({
    eg: grids[i],
    points: pts.map((p) => ({ ep: p.ep, ip: p.ip * 1000 })),
  }));
  const ipShort = (supply / (ra + rk)) * 1000;
  const ep = num(outputs.plateVoltage);
  const ip = num(outputs.plateCurrent);
  return {
    curves,
    loadLine: [
      { ep: 0, ip: ipShort },
      { ep: supply, ip: 0 },
    ],
    operating: ep !== undefined && ip !== undefined ? { ep, ip: ip * 1000 } : undefined,
    maxEp,
    maxIpMa: ipShort * 1.25,
  };
}

function niceStep(x: number): number {
  const p = 10 ** Math.floor(Math.log10(x));
  const m = x / p;
  return (m <= 1 ? 1 : m <= 2 ? 2 : m <= 5 ? 5 : 10) * p;
}
