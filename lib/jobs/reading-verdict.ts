import { calculator as resistorDrift } from "@/lib/calc/resistor-drift";
import { runCalculator } from "@/lib/calc/run";

/**
 * The verdict of a stored reading. Resistor rows go through the resistor-drift calculator itself
 * (runCalculator), so the survey table and the Bench always agree; voltage rows compare the
 * measurement with the expected value at the same ± tolerance.
 */

export type ReadingVerdict = "within" | "high" | "low" | "open" | "unknown";

export interface JudgedReading {
  deviation: number | null;
  verdict: ReadingVerdict;
}

export function judgeReading(r: { kind: "resistor" | "voltage"; nominal: number; measured: number | null; tolerance: number }): JudgedReading {
  if (r.kind === "resistor") {
    const run = runCalculator(resistorDrift, { nominal: r.nominal, measured: r.measured ?? "open", tolerance: r.tolerance });
    if (!run.ok) return { deviation: null, verdict: "unknown" };
    const { deviation, verdict } = run.result.outputs;
    return { deviation: typeof deviation === "number" ? deviation : null, verdict: verdict as ReadingVerdict };
  }
  if (r.measured === null) return { deviation: null, verdict: "unknown" };
  if (r.nominal === 0) return { deviation: null, verdict: r.measured === 0 ? "within" : r.measured > 0 ? "high" : "low" };
  // Deviation relative to the size of the expected value, so a −2 V bias reading of −2.6 V counts as "high" in magnitude.
  const deviation = (Math.abs(r.measured) - Math.abs(r.nominal)) / Math.abs(r.nominal);
  const verdict: ReadingVerdict = Math.abs(deviation) <= r.tolerance * (1 + 1e-9) ? "within" : deviation > 0 ? "high" : "low";
  return { deviation, verdict };
}

export const VERDICT_LABELS: Record<ReadingVerdict, string> = {
  within: "Within tolerance",
  high: "Drifted high",
  low: "Reads low",
  open: "Open",
  unknown: "No verdict",
};
