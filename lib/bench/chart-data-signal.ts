import { tunedCircuitRejection } from "@/lib/calc/tuned-circuit";

/**
 * Points for the signal pictures (coupling capacitor, superhet dial), from a result's normalised inputs
 * and outputs. Pure, so the charts stay thin and these can be tested; each curve uses its calculator's formula.
 */

type Rec = Record<string, unknown>;
const num = (v: unknown): number | undefined => (typeof v === "number" && Number.isFinite(v) ? v : undefined);

/** Frequencies from a to b, evenly spaced on a log scale. */
function logSpace(a: number, b: number, n: number): number[] {
  return Array.from({ length: n + 1 }, (_, i) => a * (b / a) ** (i / n));
}

export interface CouplingResponse {
  /** Frequency (Hz) and the next grid's share of the signal in dB (0 dB: all of it). */
  points: { f: number; db: number }[];
  corner: number;
}

/**
 * Response of the coupling network around its corner: a first-order high-pass, Vg/Vs = 1/√(1 + (fc/f)²),
 * fc/f being X_C/(Rg + Rs) (Terman, Radio Engineers' Handbook, resistance-coupled amplifiers:
 * low-frequency response, from memory). From a tenth of the corner to a hundred times it.
 */
export function couplingResponse(_inputs: Rec, outputs: Rec): CouplingResponse | null {
  const fc = num(outputs.cornerFrequency);
  if (fc === undefined || fc <= 0) return null;
  const points = logSpace(fc / 10, fc * 100, 90).map((f) => ({ f, db: responseDb(fc, f) }));
  return { points, corner: fc };
}

export function responseDb(fc: number, f: number): number {
  const x = fc / f;
  return -10 * Math.log10(1 + x * x);
}

export interface DialMark {
  name: "Signal" | "Oscillator" | "Image";
  f: number;
}

export interface Dial {
  marks: DialMark[];
  /** Left and right ends of the scale (Hz). */
  span: [number, number];
  /** The front end's response (dB) across the scale, with exact points at the signal and the image; only with a loaded Q. */
  response?: { f: number; db: number }[];
  q?: number;
  intermediate: number;
}

/** Signal, oscillator and image on one frequency scale, and one tuned circuit's response when its Q is known. */
export function superhetDial(inputs: Rec, outputs: Rec): Dial | null {
  const fs = num(inputs.signalFrequency);
  const fif = num(inputs.intermediateFrequency);
  const fo = num(outputs.oscillatorFrequency);
  const fim = num(outputs.imageFrequency);
  if (fs === undefined || fif === undefined || fo === undefined || fim === undefined) return null;
  const marks: DialMark[] = [
    { name: "Signal", f: fs },
    { name: "Oscillator", f: fo },
    { name: "Image", f: fim },
  ];
  const lo = Math.min(fs, fo, fim);
  const hi = Math.max(fs, fo, fim);
  const pad = (hi - lo) * 0.15;
  const span: [number, number] = [Math.max(0, lo - pad), hi + pad];
  const q = num(inputs.loadedQ);
  if (q === undefined) return { marks, span, intermediate: fif };
  const n = 120;
  const from = Math.max(span[0], (hi - lo) * 0.001);
  const fr = Array.from({ length: n + 1 }, (_, i) => from + ((span[1] - from) * i) / n);
  for (const f of [fs, fim]) if (!fr.includes(f)) fr.push(f);
  fr.sort((a, b) => a - b);
  const response = fr.map((f) => ({ f, db: -20 * Math.log10(tunedCircuitRejection(q, fs, f)) }));
  return { marks, span, response, q, intermediate: fif };
}
