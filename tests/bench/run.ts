/**
 * `npm run bench`: every benchmark in one go, one table of figures, targets and pass/miss.
 *   1. calculators (tests/bench/calc-bench.ts): compute alone, validation + compute, runCalculator, triode solve;
 *   2. HTTP (tests/bench/http-bench.ts): POST /api/calculators/cathode-bias against GET /api/health;
 *   3. any other module here that exports run() (jobs-bench.ts, ui-bench.ts), skipped with a note if
 *      absent or failing.
 * The HTTP and UI parts need a production build (`npx next build`). `--json` prints the raw figures.
 */
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { runCalcBench, TARGETS, type BenchReport } from "./calc-bench";
import { HTTP_TARGET_RATIO, runHttpBench, type HttpReport } from "./http-bench";

type Verdict = "met" | "MISSED" | "—" | "skipped";
interface Row {
  part: string;
  figure: string;
  value: string;
  target: string;
  verdict: Verdict;
}

const rate = (n: number | null) => (n === null ? "—" : Math.round(n).toLocaleString("en-US"));
const ms = (n: number) => `${n.toFixed(n < 10 ? 2 : 1)} ms`;

function calcRows(r: BenchReport): Row[] {
  const rows: Row[] = [];
  for (const c of r.calculators) {
    const closed = c.kind === "closed-form";
    if (c.skipped) {
      rows.push({ part: "calc", figure: c.slug, value: "—", target: "", verdict: "skipped" });
      continue;
    }
    const v = (n: number | null, t: number) => (!closed || n === null ? "—" : n >= t ? "met" : "MISSED");
    rows.push({
      part: "calc",
      figure: `${c.slug}: compute/s`,
      value: rate(c.computePerSecond),
      target: closed ? `≥ ${rate(TARGETS.computePerSecond)}` : "",
      verdict: v(c.computePerSecond, TARGETS.computePerSecond),
    });
    rows.push({
      part: "calc",
      figure: `${c.slug}: validate+compute/s`,
      value: rate(c.validatedPerSecond),
      target: closed ? `≥ ${rate(TARGETS.validatedPerSecond)}` : "",
      verdict: v(c.validatedPerSecond, TARGETS.validatedPerSecond),
    });
    rows.push({ part: "calc", figure: `${c.slug}: runCalculator/s (with LaTeX steps)`, value: rate(c.runPerSecond), target: "", verdict: "—" });
  }
  const t = r.triodeSolve;
  rows.push({
    part: "calc",
    figure: "triode solve, median (p90)",
    value: `${t.medianMicros.toFixed(2)} µs (${t.p90Micros.toFixed(2)} µs)`,
    target: `≤ ${TARGETS.triodeSolveMicros} µs`,
    verdict: t.meetsTarget ? "met" : "MISSED",
  });
  return rows;
}

function httpRows(h: HttpReport): Row[] {
  const rows: Row[] = [];
  for (const f of [h.health, h.calculator]) {
    rows.push({ part: "http", figure: `${f.route}: req/s (rounds ${f.rounds.join(", ")})`, value: rate(f.requestsPerSecond), target: "", verdict: "—" });
    rows.push({ part: "http", figure: `${f.route}: p50 / p99`, value: `${ms(f.p50Ms)} / ${ms(f.p99Ms)}`, target: "", verdict: "—" });
    if (f.cpuMicrosPerRequest !== null) {
      rows.push({ part: "http", figure: `${f.route}: server CPU per request`, value: `${Math.round(f.cpuMicrosPerRequest)} µs`, target: "", verdict: "—" });
    }
    if (f.non2xx || f.errors)
      rows.push({ part: "http", figure: `${f.route}: non-2xx / errors`, value: `${f.non2xx} / ${f.errors}`, target: "0", verdict: "MISSED" });
  }
  rows.push({
    part: "http",
    figure: "calculator ÷ health throughput",
    value: h.ratio.toFixed(2),
    target: `≥ ${HTTP_TARGET_RATIO}`,
    verdict: h.meetsTarget ? "met" : "MISSED",
  });
  if (h.cpuRatio !== null) {
    rows.push({
      part: "http",
      figure: "health ÷ calculator CPU per request (the ratio a quiet machine shows)",
      value: h.cpuRatio.toFixed(2),
      target: `≥ ${HTTP_TARGET_RATIO}`,
      verdict: "—",
    });
  }
  return rows;
}

/** Flattens another module's figures; a boolean meets…/pass… key gives the verdict of its group. */
function genericRows(part: string, figures: Record<string, unknown>, prefix = ""): Row[] {
  const rows: Row[] = [];
  for (const [key, value] of Object.entries(figures)) {
    const name = prefix ? `${prefix}.${key}` : key;
    if (/^(meets|pass)/i.test(key) && typeof value === "boolean") {
      rows.push({ part, figure: name, value: String(value), target: "true", verdict: value ? "met" : "MISSED" });
    } else if (value && typeof value === "object" && !Array.isArray(value)) {
      rows.push(...genericRows(part, value as Record<string, unknown>, name));
    } else {
      const text = Array.isArray(value) ? value.map((x) => (typeof x === "object" ? JSON.stringify(x) : String(x))).join(", ") : String(value);
      rows.push({ part, figure: name, value: text.length > 60 ? `${text.slice(0, 57)}...` : text, target: "", verdict: "—" });
    }
  }
  return rows;
}

function table(rows: Row[]): string {
  const head: Row = { part: "part", figure: "figure", value: "value", target: "target", verdict: "—" };
  const cols = (r: Row) => [r.part, r.figure, r.value, r.target, r === head ? "result" : r.verdict];
  const all = [head, ...rows].map(cols);
  const w = all[0].map((_, i) => Math.max(...all.map((c) => c[i].length)));
  const line = (c: string[]) =>
    c
      .map((cell, i) => (i === 2 ? cell.padStart(w[i]) : cell.padEnd(w[i])))
      .join("  ")
      .trimEnd();
  return [line(all[0]), line(w.map((n) => "-".repeat(n))), ...all.slice(1).map(line)].join("\n");
}

async function main() {
  const json = process.argv.includes("--json");
  const rows: Row[] = [];
  const notes: string[] = [];
  const raw: Record<string, unknown> = {};
  const started = Date.now();

  const calc = await runCalcBench();
  raw.calculators = calc;
  rows.push(...calcRows(calc));

  try {
    const http = await runHttpBench();
    raw.http = http;
    rows.push(...httpRows(http));
  } catch (err) {
    notes.push(`http: skipped — ${err instanceof Error ? err.message : String(err)}`);
  }

  const dir = path.dirname(new URL(import.meta.url).pathname);
  for (const name of ["jobs-bench", "ui-bench"]) {
    const file = path.join(dir, `${name}.ts`);
    if (!fs.existsSync(file)) {
      notes.push(`${name}: skipped — tests/bench/${name}.ts is not there`);
      continue;
    }
    try {
      const mod = (await import(`./${name}`)) as { run?: () => Promise<Record<string, unknown>> };
      if (typeof mod.run !== "function") throw new Error("it exports no run()");
      const figures = await mod.run();
      raw[name] = figures;
      rows.push(...genericRows(name.replace(/-bench$/, ""), figures));
    } catch (err) {
      notes.push(`${name}: skipped — ${err instanceof Error ? err.message.split("\n")[0] : String(err)}`);
    }
  }

  if (json) {
    console.log(JSON.stringify({ ...raw, notes }, null, 2));
    return;
  }
  const load = os
    .loadavg()
    .map((l) => l.toFixed(1))
    .join(" ");
  console.log(`Glowbench benchmarks — Node ${process.version}, ${os.cpus().length} cores (${os.cpus()[0]?.model ?? "cpu"}), load average ${load}`);
  console.log("");
  console.log(table(rows));
  if (notes.length) console.log(`\n${notes.join("\n")}`);
  const missed = rows.filter((r) => r.verdict === "MISSED").length;
  const met = rows.filter((r) => r.verdict === "met").length;
  console.log(`\n${met} targets met, ${missed} missed, in ${Math.round((Date.now() - started) / 1000)} s.`);
}

main().catch((err) => {
  console.error(err);
  process.exitCode = 1;
});
