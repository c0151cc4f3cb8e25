import fs from "node:fs";
import { describe, expect, it } from "vitest";
import { bleederDischarge, breakdownData, plateFamily, rippleData, timeConstantDischarge } from "@/lib/bench/chart-data";
import { lampCurves, reformingSchedule } from "@/lib/bench/chart-data-power-up";
import { couplingResponse, superhetDial } from "@/lib/bench/chart-data-signal";
import { initialMode, initialValues, toRaw } from "@/lib/bench/form-values";
import { GROUPS } from "@/lib/bench/groups";
import { loadCalculator } from "@/lib/bench/load-calculator";
import type { ChartKind } from "@/lib/calc/bench-descriptor";
import { calculators } from "@/lib/calc/registry";
import { runCalculator } from "@/lib/calc/run";
import { LOADERS_FILE, loadersSource, registrySlugs } from "../../scripts/gen-loaders";
import { samples } from "../bench/samples";

/**
 * Every calculator's Bench descriptor (the `bench` field beside it in lib/calc/<slug>.ts) has every part,
 * and each part names things that exist: the compiler checks the names' spelling, these check what the
 * names do at run time.
 */

type Rec = Record<string, unknown>;
/** Each picture's data, from a result: a kind without its data function fails to compile here. */
const CHART_DATA: Record<ChartKind, (inputs: Rec, outputs: Rec) => unknown> = {
  "rc-discharge": timeConstantDischarge,
  "bleeder-discharge": bleederDischarge,
  ripple: rippleData,
  breakdown: breakdownData,
  "plate-curves": plateFamily,
  "lamp-current": lampCurves,
  "reforming-schedule": reformingSchedule,
  "coupling-response": couplingResponse,
  "superhet-dial": superhetDial,
};

describe.each(calculators.map((c) => [c.slug, c] as const))("%s: the descriptor", (_slug, calc) => {
  const bench = calc.bench;
  const inputNames = new Set(calc.inputs.map((i) => i.name));
  const outputNames = new Set(calc.outputs.map((o) => o.name));
  const example = runCalculator(calc, bench.example);

  it("has a group the index shows", () => {
    expect(GROUPS.map((g) => g.id)).toContain(bench.group);
  });

  it("has a worked example of real inputs that runs, as given and through the form the page fills", () => {
    expect(Object.keys(bench.example).length).toBeGreaterThan(0);
    for (const k of Object.keys(bench.example)) expect(inputNames, k).toContain(k);
    if (!example.ok) throw new Error(`${calc.slug} example refused: ${example.error.message}`);
    const form = initialValues(calc.inputs, bench.example);
    const viaForm = runCalculator(calc, toRaw(calc, form, initialMode(bench.modes, form)));
    if (!viaForm.ok) throw new Error(`${calc.slug} example refused through the form: ${viaForm.error.message}`);
    expect(viaForm.result.outputs).toEqual(example.result.outputs);
  });

  it("headlines are real outputs, and the example gives each a value", () => {
    expect(new Set(bench.headlines).size).toBe(bench.headlines.length);
    for (const h of bench.headlines) {
      expect(outputNames, h).toContain(h);
      expect(example.ok && example.result.outputs[h], `${h} of the example`).not.toBeNull();
    }
  });

  it("modes and folded inputs name real inputs; a folded input is never a required one", () => {
    const seen = new Set<string>();
    for (const m of bench.modes ?? []) {
      for (const f of m.fields) {
        expect(inputNames, f).toContain(f);
        expect(seen.has(f), `${f} in two modes`).toBe(false);
        seen.add(f);
      }
    }
    if (bench.modes) expect(new Set(bench.modes.map((m) => m.id)).size).toBe(bench.modes.length);
    for (const f of bench.advanced?.fields ?? []) {
      expect(inputNames, f).toContain(f);
      expect(calc.inputs.find((i) => i.name === f)!.required, `${f} is required but folded away`).toBe(false);
    }
  });

  it("formats, words and tones name real outputs; a percentage is only ever a unitless fraction", () => {
    for (const [name, f] of Object.entries(bench.format ?? {})) {
      expect(outputNames, name).toContain(name);
      if (f !== "bare-prefix") expect(calc.outputs.find((o) => o.name === name)!.unit, name).toBe("");
    }
    for (const name of Object.keys(bench.words ?? {})) expect(outputNames, name).toContain(name);
    for (const t of bench.tones ?? []) expect(outputNames, t.output).toContain(t.output);
  });

  it("a chart kind has chart data for the example", () => {
    if (bench.chart === null) return;
    if (!example.ok) throw new Error("example refused");
    expect(CHART_DATA[bench.chart](example.result.inputs, example.result.outputs)).not.toBeNull();
  });

  it("a banner that never goes away agrees with the calculator's own danger warning", () => {
    if (!example.ok) throw new Error("example refused");
    const danger = example.result.warnings.some((w) => w.level === "danger");
    // Always-danger calculators carry the warning for any input; the rest carry it for voltages over 50 V only.
    if (bench.alwaysDanger) expect(danger).toBe(true);
  });

  it("has a sample for the speed bench that runs", () => {
    expect(samples[calc.slug], "tests/bench/samples.ts").toBeDefined();
    expect(runCalculator(calc, samples[calc.slug]).ok).toBe(true);
  });
});

describe("the registry and the generated loaders", () => {
  it("slugs are unique and every group has a calculator", () => {
    const slugs = calculators.map((c) => c.slug);
    expect(new Set(slugs).size).toBe(slugs.length);
    for (const g of GROUPS)
      expect(
        calculators.some((c) => c.bench.group === g.id),
        g.id,
      ).toBe(true);
  });

  it("the registry lists the calculators group by group, in the index's order of groups", () => {
    const order = calculators.map((c) => GROUPS.findIndex((g) => g.id === c.bench.group));
    expect(order).toEqual([...order].sort((x, y) => x - y));
  });

  it(`${LOADERS_FILE} matches the registry (run \`npm run gen:loaders\` when it does not)`, () => {
    expect(fs.readFileSync(LOADERS_FILE, "utf8")).toBe(loadersSource(registrySlugs()));
  });

  it("each loader brings the calculator of its own slug", async () => {
    for (const c of calculators) expect((await loadCalculator(c.slug)).slug).toBe(c.slug);
    await expect(loadCalculator("no-such-calculator")).rejects.toThrow(/No calculator module/);
  });
});
