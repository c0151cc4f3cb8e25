import { z } from "zod";
import { formatQuantity, texQuantity, tex } from "./format";
import { highVoltageWarning } from "./safety";
import { nearestPreferred } from "./tables/preferred-values";
import { suggestedRating } from "./tables/wattage";
import { defineCalculator, type Step, type Warning } from "./types";
import { quantity } from "./units";

/**
 * Series dropping resistor from a supply to a stage: R = (Vs − Vl)/I, P = I²R
 * (Ohm's law; Radiotron Designer's Handbook, voltage dividers and dropping resistors).
 * The load is treated as drawing a constant current, so with the nearest E12 part the
 * stage sees Vs − I·R_pref.
 */

const MIN_OHMS = 1e-3;
const MAX_OHMS = 1e12;

export const droppingResistorSchema = z
  .object({
    supplyVoltage: quantity("voltage", { positive: true, max: 1e6, label: "Supply voltage" }),
    loadVoltage: quantity("voltage", { positive: true, max: 1e6, label: "Load voltage" }),
    loadCurrent: quantity("current", { positive: true, min: 1e-12, max: 1e4, label: "Load current" }),
  })
  .superRefine((v, ctx) => {
    if (v.loadVoltage >= v.supplyVoltage) {
      ctx.addIssue({ code: "custom", path: ["loadVoltage"], message: "Load voltage must be below the supply voltage" });
      return;
    }
    const r = (v.supplyVoltage - v.loadVoltage) / v.loadCurrent;
    if (!(r >= MIN_OHMS && r <= MAX_OHMS)) {
      ctx.addIssue({
        code: "custom",
        path: ["loadCurrent"],
        message: `Load current gives a resistance of ${formatQuantity(r, "Ω")}, outside 1 mΩ to 1 TΩ; check the values`,
      });
    }
  });

export type DroppingResistorInput = z.output<typeof droppingResistorSchema>;

export const calculator = defineCalculator({
  slug: "dropping-resistor",
  title: "Dropping resistor",
  purpose: "The series resistor that drops a supply to the voltage a stage needs, and its wattage.",
  bench: {
    group: "supplies",
    example: { supplyVoltage: "300 V", loadVoltage: "250 V", loadCurrent: "10 mA" },
    headlines: ["resistance", "suggestedRating"],
    alwaysDanger: false,
    chart: null,
  },
  inputs: [
    {
      name: "supplyVoltage",
      label: "Supply voltage",
      unit: "V",
      required: true,
      control: "quantity",
      quantity: "voltage",
      help: "The B+ point the resistor is fed from.",
    },
    { name: "loadVoltage", label: "Voltage wanted at the stage", unit: "V", required: true, control: "quantity", quantity: "voltage" },
    {
      name: "loadCurrent",
      label: "Current the stage draws",
      unit: "A",
      required: true,
      control: "quantity",
      quantity: "current",
      help: "Total current through the resistor (plate and screen currents of every stage it feeds).",
    },
  ],
  outputs: [
    { name: "resistance", label: "Resistance", unit: "Ω" },
    { name: "dissipation", label: "Dissipation", unit: "W" },
    { name: "suggestedRating", label: "Suggested rating (≥ 2 × dissipation)", unit: "W" },
    { name: "nearestPreferred", label: "Nearest E12 value", unit: "Ω" },
    { name: "loadVoltageWithPreferred", label: "Stage voltage with the E12 value", unit: "V" },
  ],
  schema: droppingResistorSchema,
  formulas: [
    { label: "Resistance", latex: tex`R = \frac{V_s - V_l}{I}` },
    { label: "Dissipation", latex: tex`P = I^2 R` },
    { label: "Stage voltage with a preferred value", latex: tex`V_l' = V_s - I\,R_\text{pref}` },
  ],
  references: [
    {
      title: "Radiotron Designer's Handbook, 4th ed.",
      detail: "Chapter on power supplies: voltage dividers and series dropping resistors (chapter cited from memory)",
    },
    { title: "The ARRL Handbook for Radio Communications", detail: "Electrical fundamentals chapter: Ohm's law and power in resistors" },
    { title: "IEC 60063, Preferred number series for resistors and capacitors", detail: "E12 series" },
  ],
  whyItMatters:
    "Screen grids and early stages are often fed from the main supply through a dropping resistor. Its value " +
    "sets the stage's voltage only at the current the stage draws, and it turns the dropped voltage into heat: " +
    "a dropping resistor run near its rating darkens, drifts and fails, so rate it for at least twice its dissipation.",
  compute(input: DroppingResistorInput) {
    const { supplyVoltage: vs, loadVoltage: vl, loadCurrent: i } = input;
    const resistance = (vs - vl) / i;
    const dissipation = i * i * resistance;
    const rating = suggestedRating(dissipation);
    const pref = nearestPreferred(resistance, "E12");
    const raw = vs - i * pref;
    const loadVoltageWithPreferred = Math.max(0, raw);
    const warnings: Warning[] = highVoltageWarning(vs, vl);
    if (rating.warning) warnings.push(rating.warning);
    warnings.push({
      level: "info",
      message:
        "The stage is treated as drawing a constant current. A real stage draws a little less when its voltage falls " +
        "(and more when it rises), so the true voltage lands a little closer to the target than shown; measure it after fitting.",
    });
    if (raw <= 0) {
      warnings.push({
        level: "caution",
        message: `With ${formatQuantity(pref, "Ω")} the constant-current estimate drops the whole supply; the model breaks down here. Use the next lower value or a divider.`,
      });
    }
    warnings.push({
      level: "info",
      message:
        "The stage voltage follows the current it draws: a dropping resistor suits a steady load, not one whose current swings widely (use a divider or regulator for that).",
    });
    return {
      outputs: { resistance, dissipation, suggestedRating: rating.rating, nearestPreferred: pref, loadVoltageWithPreferred },
      warnings,
    };
  },
  explain(input: DroppingResistorInput, o) {
    const { supplyVoltage: vs, loadVoltage: vl, loadCurrent: i } = input;
    const { resistance, dissipation, nearestPreferred: pref, loadVoltageWithPreferred } = o;
    return [
      {
        label: "Resistance",
        latex: tex`R = \frac{${texQuantity(vs, "V", 4)} - ${texQuantity(vl, "V", 4)}}{${texQuantity(i, "A", 4)}} = ${texQuantity(resistance, "Ω", 4)}`,
      },
      {
        label: "Dissipation",
        latex: tex`P = (${texQuantity(i, "A", 4)})^2 \times ${texQuantity(resistance, "Ω", 4)} = ${texQuantity(dissipation, "W")}`,
      },
      {
        label: "Suggested rating",
        latex:
          o.suggestedRating === null
            ? tex`2P = ${texQuantity(2 * dissipation, "W")}\ \text{(beyond the standard ratings)}`
            : tex`2P = ${texQuantity(2 * dissipation, "W")} \Rightarrow ${texQuantity(o.suggestedRating, "W")}`,
      },
      { label: "Nearest E12 value", latex: tex`R_\text{pref} = ${texQuantity(pref, "Ω")}` },
      {
        label: "Stage voltage with the E12 value (load taken as a constant current)",
        latex: tex`V_l' = ${texQuantity(vs, "V", 4)} - ${texQuantity(i, "A", 4)} \times ${texQuantity(pref, "Ω")} = ${texQuantity(loadVoltageWithPreferred, "V", 4)}`,
      },
    ] satisfies Step[];
  },
});
