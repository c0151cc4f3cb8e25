import { ratingAtLeast } from "../../calc/tables/fuses";
import { PICTURE_TUBES } from "../../calc/tables/tubes";
import { slipOf } from "../calc";
import type { Rng } from "../rng";
import type { DrillKind, DrillSetup } from "../types";
import { EXACT, fmt, MAINS, RELATIVE_2 } from "./common";
import { seriesLampKinds } from "./series-lamp";

/** Mains and high voltage at the bench: the series lamp (its own module), the mains fuse, clearances in air. */

function fuseSetup(rng: Rng, ask: string): DrillSetup {
  const m = rng.pick(MAINS);
  const power = rng.pick([25, 35, 40, 50, 60, 75, 85, 100, 150, 200, 250]);
  const kind = rng.pick(["quick", "time-lag"] as const);
  const pf = rng.chance(0.4) ? rng.pick([0.6, 0.7, 0.8]) : 1;
  return {
    inputs: { loadPower: power, lineVoltage: m.voltage, powerFactor: pf, kind },
    prompt:
      `A set rated ${fmt(power, "W")} runs from ${fmt(m.voltage, "V")} mains${pf < 1 ? ` with a power factor of ${pf} (a transformer set)` : ""}, ` +
      `fused with a ${kind} fuse (margin ${kind === "quick" ? "2" : "1.25"} × the running current). ${ask}`,
    given: { "Set's rating": fmt(power, "W"), Mains: fmt(m.voltage, "V"), "Power factor": String(pf), "Fuse kind": kind },
  };
}

const CRT_VOLTS = PICTURE_TUBES.map((t) => t.anodeVoltageMax);

export const mainsKinds: DrillKind[] = [
  ...seriesLampKinds,
  {
    id: "fuse/rating",
    slug: "fuse",
    title: "Mains fuse rating",
    direction: "forward",
    asked: { name: "suggestedRating", label: "fuse rating", unit: "A" },
    tolerance: EXACT,
    answerStep: "Next IEC 60127",
    generate: (rng) => fuseSetup(rng, "Which IEC 60127 rated current should the fuse have?"),
    accept: (ctx) => typeof ctx.outputs.suggestedRating === "number",
    mistakes(ctx) {
      const noMargin = ratingAtLeast(ctx.outputs.runningCurrent as number);
      const other = ctx.inputs.kind === "quick" ? "time-lag" : "quick";
      return [
        ...(noMargin === null
          ? []
          : [
              {
                value: noMargin,
                step: "Least rating",
                hint: "A fuse at the running current blows on the switch-on surge: multiply by the margin the fuse kind needs first.",
              },
            ]),
        {
          value: slipOf("fuse", { ...ctx.inputs, kind: other }, "suggestedRating"),
          step: "Least rating",
          hint: `That is the margin of a ${other} fuse; a ${ctx.inputs.kind} fuse needs its own.`,
        },
      ];
    },
  },
  {
    id: "fuse/running-current",
    slug: "fuse",
    title: "Running current from the mains",
    direction: "forward",
    asked: { name: "runningCurrent", label: "running current", unit: "A" },
    tolerance: RELATIVE_2,
    answerStep: "Running current",
    generate: (rng) => fuseSetup(rng, "What current does it draw from the mains?"),
    mistakes: (ctx) =>
      (ctx.inputs.powerFactor as number) < 1
        ? [
            {
              value: slipOf("fuse", { ...ctx.inputs, powerFactor: 1 }, "runningCurrent"),
              step: "Running current",
              hint: "With a power factor below 1 the set draws more current than P/V: divide by the power factor as well.",
            },
          ]
        : [],
  },
  {
    id: "arc-clearance/breakdown",
    slug: "arc-clearance",
    title: "Breakdown voltage of a gap in air",
    direction: "forward",
    asked: { name: "breakdownVoltage", label: "uniform-field breakdown voltage", unit: "V" },
    tolerance: RELATIVE_2,
    answerStep: "Uniform-field breakdown",
    generate(rng) {
      const gap = rng.pick([1, 2, 3, 5, 8, 10]) * 1e-3;
      const peak = rng.pick(CRT_VOLTS);
      return {
        inputs: { peakVoltage: peak, gap, electrode: "uniform" },
        prompt:
          `Two flat, clean electrodes stand ${fmt(gap, "m")} apart in air at sea level and 20 °C. At what voltage does the gap break down (uniform field, V = 24.22·δd + 6.08·√(δd) kV with d in cm)? ` +
          "Real edges and points break down far lower, so this is not a clearance to build to.",
        given: { Gap: fmt(gap, "m"), Air: "sea level, 20 °C (δ = 1)", Field: "uniform (flat electrodes)" },
      };
    },
    mistakes: (ctx) => [
      {
        value: slipOf("arc-clearance", { ...ctx.inputs, gap: (ctx.inputs.gap as number) * 10 }, "breakdownVoltage"),
        step: "Uniform-field breakdown",
        hint: "The constants are per centimetre: 5 mm is 0.5 cm, not 5.",
      },
    ],
  },
  {
    id: "arc-clearance/standard",
    slug: "arc-clearance",
    title: "Clearance from the standard's table",
    direction: "forward",
    asked: { name: "standardClearance", label: "clearance from IEC 60664-1", unit: "m" },
    // The table's figure times the altitude factor has more figures than anyone writes: three will do.
    tolerance: { type: "relative", fraction: 0.005 },
    answerStep: "Altitude factor",
    generate(rng) {
      const peak = rng.pick([...CRT_VOLTS, 500, 1000, 1500, 5000, 10000]);
      const altitude = rng.pick([0, 500, 1500, 2500, 3000]);
      return {
        inputs: { peakVoltage: peak, electrode: "non-uniform", altitude },
        prompt: `A lead carries ${fmt(peak, "V")} peak (steady DC) past a chassis in a workshop ${fmt(altitude, "m")} above sea level. What clearance does IEC 60664-1 Table F.8 (case A, non-uniform field) give, corrected for altitude by Table A.2?`,
        given: { "Peak voltage": fmt(peak, "V"), Altitude: fmt(altitude, "m"), Field: "non-uniform (case A)" },
      };
    },
    accept: (ctx) => typeof ctx.outputs.standardClearance === "number",
    mistakes: (ctx) => [
      {
        value: slipOf("arc-clearance", { ...ctx.inputs, altitude: 0 }, "standardClearance"),
        step: "Altitude factor",
        hint: "The table is for up to 2000 m; higher up the air is thinner, so multiply by the altitude factor of Table A.2.",
      },
      {
        value: slipOf("arc-clearance", { ...ctx.inputs, electrode: "uniform" }, "standardClearance"),
        step: "IEC 60664-1 Table F.8",
        hint: "A chassis, solder tags and wire ends make a non-uniform field: read case A, not case B.",
      },
    ],
  },
];
