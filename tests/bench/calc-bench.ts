/**
 * Calculator micro-benchmark, for every calculator: evaluations per second of compute alone
 * (inputs parsed once by the schema beforehand), of validation + compute (schema.safeParse of the
 * engineering text a form sends, then compute), and of the whole runCalculator, which also
 * typesets the working (explain) — reported, no target. Plus the triode operating-point solve time. Run: `npx tsx tests/bench/calc-bench.ts`
 * (add `--json` for the figures as JSON). `runCalcBench()` returns the same figures.
 * A calculator whose module fails to load, or whose sample is rejected, is skipped with the reason.
 */
import { performance } from "node:perf_hooks";
import { runCalculator } from "../../lib/calc/run";
import { findTriode } from "../../lib/calc/tables/triodes";
import { solveOperatingPoint } from "../../lib/calc/triode-model";
import type { Calculator } from "../../lib/calc/types";
import { ITERATIVE_SLUGS, samples } from "./samples";

export const TARGETS = {
  /** Closed-form calculators, compute alone, evaluations per second. */
  computePerSecond: 1_000_000,
  /** Closed-form calculators, validation (safeParse) + compute, evaluations per second. */
  validatedPerSecond: 100_000,
  /** Median triode operating-point solve, microseconds. */
  triodeSolveMicros: 50,
} as const;

export interface CalcFigure {
  slug: string;
  kind: "closed-form" | "iterative";
  /** Null when skipped. */
  computePerSecond: number | null;
  validatedPerSecond: number | null;
  /** runCalculator: validation, compute and the LaTeX steps. No target. */
  runPerSecond: number | null;
  meetsTargets: boolean | null;
  skipped?: string;
}

export interface BenchReport {
  node: string;
  targets: typeof TARGETS;
  calculators: CalcFigure[];
  triodeSolve: { medianMicros: number; p90Micros: number; meanIterations: number; meetsTarget: boolean };
}

let sink = 0; // keeps results observable so the loops are not optimised away

/** Median evaluations per second over `rounds` timed rounds of about `roundMs` each. */
function perSecond(fn: () => unknown, roundMs: number, rounds = 5): number {
  let batch = 1;
  const warmEnd = performance.now() + roundMs; // warm-up, and find a batch size worth timing
  while (performance.now() < warmEnd) {
    for (let i = 0; i < batch; i++) sink += fn() === undefined ? 0 : 1;
    if (batch < 1 << 16) batch *= 2;
  }
  const rates: number[] = [];
  for (let r = 0; r < rounds; r++) {
    let n = 0;
    const start = performance.now();
    let now = start;
    while (now - start < roundMs) {
      for (let i = 0; i < batch; i++) sink += fn() === undefined ? 0 : 1;
      n += batch;
      now = performance.now();
    }
    rates.push(n / ((now - start) / 1000));
  }
  return median(rates);
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
}

function quantile(xs: number[], q: number): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor(q * s.length))];
}

async function loadCalculators(): Promise<{ bySlug: Map<string, Calculator>; errors: Map<string, string> }> {
  const bySlug = new Map<string, Calculator>();
  const errors = new Map<string, string>();
  try {
    const registry = await import("../../lib/calc/registry");
    for (const c of registry.calculators) bySlug.set(c.slug, c);
  } catch {
    // The registry fails if any one calculator is missing; load them one by one instead.
    for (const slug of Object.keys(samples)) {
      try {
        const mod = (await import(`../../lib/calc/${slug}`)) as { calculator?: Calculator };
        if (mod.calculator) bySlug.set(slug, mod.calculator);
        else errors.set(slug, "module has no `calculator` export");
      } catch (err) {
        errors.set(slug, `module failed to load: ${err instanceof Error ? err.message.split("\n")[0] : String(err)}`);
      }
    }
  }
  return { bySlug, errors };
}

function benchCalculator(calc: Calculator, roundMs: number): CalcFigure {
  const kind = ITERATIVE_SLUGS.includes(calc.slug) ? "iterative" : "closed-form";
  const skip = (why: string): CalcFigure => ({
    slug: calc.slug,
    kind,
    computePerSecond: null,
    validatedPerSecond: null,
    runPerSecond: null,
    meetsTargets: null,
    skipped: why,
  });
  const sample = samples[calc.slug];
  if (!sample) return skip("no sample input");
  const parsed = calc.schema.safeParse(sample);
  if (!parsed.success) return skip(`sample rejected: ${parsed.error.issues[0]?.message ?? "invalid"}`);
  const input = parsed.data;
  try {
    calc.compute(input);
    const r = runCalculator(calc, sample);
    if (!r.ok) return skip(`runCalculator refused the sample: ${r.error.message}`);
  } catch (err) {
    return skip(`compute threw: ${err instanceof Error ? err.message : String(err)}`);
  }
  const computePerSecond = perSecond(() => calc.compute(input), roundMs);
  const validatedPerSecond = perSecond(() => {
    const p = calc.schema.safeParse(sample);
    return p.success ? calc.compute(p.data) : p;
  }, roundMs);
  const runPerSecond = perSecond(() => runCalculator(calc, sample), roundMs);
  const meetsTargets = kind === "closed-form" ? computePerSecond >= TARGETS.computePerSecond && validatedPerSecond >= TARGETS.validatedPerSecond : null;
  return { slug: calc.slug, kind, computePerSecond, validatedPerSecond, runPerSecond, meetsTargets };
}

/** Median time of one operating-point solve over a spread of realistic 12AX7–6SN7 stages. */
function benchTriodeSolve(batches: number): BenchReport["triodeSolve"] {
  const names = ["12AX7", "12AT7", "12AU7", "6SN7", "6SL7", "6DJ8"];
  const cases: [ReturnType<typeof findTriode>, number, number, number][] = [];
  let seed = 12345; // fixed pseudo-random spread, so runs are comparable
  const rnd = () => (seed = (seed * 16807) % 2147483647) / 2147483647;
  for (let i = 0; i < 256; i++) {
    cases.push([findTriode(names[i % names.length]), 100 + 300 * rnd(), 10 ** (4 + 1.5 * rnd()), rnd() < 0.05 ? 0 : 10 ** (2 + 1.5 * rnd())]);
  }
  let iterations = 0;
  for (const [t, b, ra, rk] of cases) {
    const s = solveOperatingPoint(t!.params, b, ra, rk);
    if (s.ok) iterations += s.iterations;
  }
  for (let w = 0; w < 200; w++) for (const [t, b, ra, rk] of cases) sink += solveOperatingPoint(t!.params, b, ra, rk).ok ? 1 : 0;
  const micros: number[] = [];
  for (let k = 0; k < batches; k++) {
    const start = performance.now();
    for (const [t, b, ra, rk] of cases) sink += solveOperatingPoint(t!.params, b, ra, rk).ok ? 1 : 0;
    micros.push(((performance.now() - start) * 1000) / cases.length);
  }
  const medianMicros = median(micros);
  return { medianMicros, p90Micros: quantile(micros, 0.9), meanIterations: iterations / cases.length, meetsTarget: medianMicros <= TARGETS.triodeSolveMicros };
}

export async function runCalcBench(options: { roundMs?: number; solveBatches?: number } = {}): Promise<BenchReport> {
  const roundMs = options.roundMs ?? 100;
  const { bySlug, errors } = await loadCalculators();
  const calculators: CalcFigure[] = [];
  for (const slug of Object.keys(samples)) {
    const calc = bySlug.get(slug);
    if (!calc) {
      const kind = ITERATIVE_SLUGS.includes(slug) ? "iterative" : "closed-form";
      calculators.push({
        slug,
        kind,
        computePerSecond: null,
        validatedPerSecond: null,
        runPerSecond: null,
        meetsTargets: null,
        skipped: errors.get(slug) ?? "not in the registry",
      });
      continue;
    }
    calculators.push(benchCalculator(calc, roundMs));
  }
  for (const [slug, calc] of bySlug) if (!(slug in samples)) calculators.push(benchCalculator(calc, roundMs));
  const triodeSolve = benchTriodeSolve(options.solveBatches ?? 400);
  return { node: process.version, targets: TARGETS, calculators, triodeSolve };
}

function fmtRate(n: number | null): string {
  return n === null ? "—" : Math.round(n).toLocaleString("en-US");
}

export function formatReport(r: BenchReport): string {
  const rows = [["calculator", "kind", "compute/s", "validate+compute/s", "runCalculator/s", "targets", "note"]];
  for (const c of r.calculators) {
    const verdict = c.meetsTargets === null ? (c.skipped ? "skipped" : "n/a") : c.meetsTargets ? "met" : "MISSED";
    rows.push([c.slug, c.kind, fmtRate(c.computePerSecond), fmtRate(c.validatedPerSecond), fmtRate(c.runPerSecond), verdict, c.skipped ?? ""]);
  }
  const widths = rows[0].map((_, i) => Math.max(...rows.map((row) => row[i].length)));
  const line = (row: string[]) =>
    row
      .map((cell, i) => (i >= 2 && i <= 4 ? cell.padStart(widths[i]) : cell.padEnd(widths[i])))
      .join("  ")
      .trimEnd();
  const t = r.triodeSolve;
  return [
    `Glowbench calculator bench (Node ${r.node})`,
    `Targets: closed-form ≥ ${fmtRate(r.targets.computePerSecond)}/s compute alone, ≥ ${fmtRate(r.targets.validatedPerSecond)}/s with validation; triode solve ≤ ${r.targets.triodeSolveMicros} µs.`,
    "runCalculator/s also typesets the LaTeX working (explain); it has no target.",
    "",
    line(rows[0]),
    line(widths.map((w) => "-".repeat(w))),
    ...rows.slice(1).map(line),
    "",
    `triode operating-point solve: median ${t.medianMicros.toFixed(2)} µs, p90 ${t.p90Micros.toFixed(2)} µs, ` +
      `${t.meanIterations.toFixed(1)} iterations on average — target ≤ ${r.targets.triodeSolveMicros} µs: ${t.meetsTarget ? "met" : "MISSED"}`,
  ].join("\n");
}

if (process.argv[1] && /calc-bench\.ts$/.test(process.argv[1])) {
  runCalcBench().then(
    (report) => {
      console.log(process.argv.includes("--json") ? JSON.stringify(report, null, 2) : formatReport(report));
      if (sink === -1) console.log(""); // never true; reads the sink once more
    },
    (err) => {
      console.error(err);
      process.exitCode = 1;
    },
  );
}
