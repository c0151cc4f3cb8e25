import { z } from "zod";
import { formatQuantity, texQuantity, tex } from "./format";
import { ALWAYS_DANGER } from "./safety";
import { preferredBelow } from "./tables/preferred-values";
import { suggestedRating } from "./tables/wattage";
import { defineCalculator, type Step, type Warning } from "./types";
import { quantity, quantityWithDefault } from "./units";

/**
 * Bleeder resistor across a filter capacitor: R·C·ln(Vw/Vsafe) ≤ t, so R_max = t / (C·ln(Vw/Vsafe)).
 * Default target from IEC 60204-1 §6.2.4 (residual voltage ≤ 60 V within 5 s after disconnection).
 * `.default()` on fields with defaults: zod 4 reports an absent key as an error for a bare transform.
 */

// The working voltage must clear the safe voltage by this ratio, so ln(Vw/Vsafe) stays well away from zero.
const MIN_RATIO = 1.001;

export const bleederSchema = z
  .object({
    capacitance: quantity("capacitance", { positive: true, min: 1e-12, max: 10, label: "Capacitance" }),
    workingVoltage: quantity("voltage", { positive: true, max: 1e6, label: "Working voltage" }),
    safeVoltage: quantityWithDefault("voltage", 60, { positive: true, min: 1e-3, max: 1e6, label: "Safe voltage" }).default(60),
    maxTime: quantityWithDefault("time", 5, { positive: true, min: 1e-3, max: 1e4, label: "Maximum discharge time" }).default(5),
    tolerance: quantityWithDefault("ratio", 0.05, { nonNegative: true, max: 0.5, label: "Tolerance" }).default(0.05),
  })
  .superRefine((v, ctx) => {
    if (!(v.workingVoltage >= v.safeVoltage * MIN_RATIO)) {
      ctx.addIssue({
        code: "custom",
        path: ["workingVoltage"],
        message: "Working voltage must be above the safe voltage; at or below it this rule asks for no bleeder",
      });
    }
  });

export type BleederInput = z.output<typeof bleederSchema>;

export const calculator = defineCalculator({
  slug: "bleeder",
  title: "Bleeder resistor",
  purpose: "The bleeder that drains a filter capacitor to a safe voltage in a given time after switch-off.",
  group: "safety",
  inputs: [
    { name: "capacitance", label: "Filter capacitance", unit: "F", required: true, control: "quantity", quantity: "capacitance", help: "Total capacitance the bleeder drains (add up capacitors in parallel)." },
    { name: "workingVoltage", label: "Working voltage", unit: "V", required: true, control: "quantity", quantity: "voltage", help: "The highest voltage the capacitor reaches, e.g. B+ with no load." },
    { name: "safeVoltage", label: "Safe voltage", unit: "V", required: false, default: 60, control: "quantity", quantity: "voltage", help: "Residual voltage to reach; 60 V follows IEC 60204-1 §6.2.4." },
    { name: "maxTime", label: "Time allowed", unit: "s", required: false, default: 5, control: "quantity", quantity: "time", help: "How long the discharge may take; 5 s follows IEC 60204-1 §6.2.4." },
    { name: "tolerance", label: "Resistor and capacitor tolerance", unit: "", required: false, default: 0.05, control: "quantity", quantity: "ratio", help: "As a fraction: 0.05 means the part may be 5% high and still meet the time." },
  ],
  outputs: [
    { name: "maxResistance", label: "Largest resistance that meets the time", unit: "Ω" },
    { name: "suggestedResistance", label: "Suggested bleeder (E12)", unit: "Ω" },
    { name: "bleederCurrent", label: "Bleeder current at working voltage", unit: "A" },
    { name: "dissipation", label: "Dissipation at working voltage", unit: "W" },
    { name: "suggestedRating", label: "Suggested power rating", unit: "W" },
  ],
  schema: bleederSchema,
  formulas: [
    { label: "Discharge to the safe voltage", latex: tex`t = R\,C\,\ln\frac{V_w}{V_{safe}}` },
    { label: "Largest bleeder", latex: tex`R_{max} = \frac{t_{max}}{C\,\ln(V_w/V_{safe})}` },
    { label: "Allowing for tolerance", latex: tex`R\,(1 + \text{tol}) \le R_{max}` },
    { label: "Current and dissipation", latex: tex`I = \frac{V_w}{R}, \quad P = \frac{V_w^2}{R}` },
  ],
  references: [
    {
      title: "IEC 60204-1, Safety of machinery — Electrical equipment of machines",
      detail: "§6.2.4, protection against residual voltages: live parts above 60 V discharged to 60 V or less within 5 s of disconnection (clause cited from memory; used here as a bench benchmark)",
    },
    {
      title: "Radiotron Designer's Handbook, 4th ed.",
      detail: "Power supply chapters: bleeder resistors across the filter; exponential discharge of CR (chapter cited from memory)",
    },
    { title: "IEC 60063", detail: "E12 series of preferred values for the suggested resistor" },
  ],
  whyItMatters:
    "A filter capacitor in a tube set can hold a lethal charge for minutes after the plug is pulled. A bleeder " +
    "resistor across it drains that charge. Too large a value and it drains too slowly; too small and it wastes " +
    "power and runs hot. This picks the largest standard value that still drains the capacitor in time even if " +
    "the part is at the top of its tolerance — and even then you check with a meter before you touch anything.",
  compute(input: BleederInput) {
    const { capacitance: c, workingVoltage: vw, safeVoltage: vs, maxTime: t, tolerance: tol } = input;
    const maxResistance = t / (c * Math.log(vw / vs));
    let r = preferredBelow(maxResistance / (1 + tol), "E12");
    // preferredBelow treats values within 1e-9 as equal; keep the inequality strict.
    if (r * (1 + tol) > maxResistance) r = preferredBelow(r * (1 - 1e-6), "E12");
    const bleederCurrent = vw / r;
    const dissipation = (vw * vw) / r;
    const rating = suggestedRating(dissipation);

    const warnings: Warning[] = [
      ALWAYS_DANGER,
      {
        level: "caution",
        message:
          "A bleeder can fail open without any sign, leaving the capacitor charged. Always verify the discharge with a meter before touching.",
      },
    ];
    if (rating.warning) warnings.push(rating.warning);
    warnings.push({
      level: "info",
      message: `The bleeder draws ${formatQuantity(bleederCurrent, "A")} from the supply all the time it is on; check the rectifier and transformer can spare it. ` +
        "Wire it directly across the capacitor's terminals so no switch or fuse can disconnect it.",
    });

    return {
      outputs: { maxResistance, suggestedResistance: r, bleederCurrent, dissipation, suggestedRating: rating.rating },
      warnings,
    };
  },
  explain(input: BleederInput, o) {
    const { capacitance: c, workingVoltage: vw, safeVoltage: vs, maxTime: t, tolerance: tol } = input;
    const { maxResistance, suggestedResistance: r, bleederCurrent, dissipation } = o;
    const logRatio = Math.log(vw / vs);
    const allowed = maxResistance / (1 + tol);
    const worstTime = r * (1 + tol) * c * logRatio;
    const energy = 0.5 * c * vw * vw;
    return [
      {
        label: "Largest bleeder that meets the time",
        latex: tex`R_{max} = \frac{t_{max}}{C\,\ln(V_w/V_{safe})} = \frac{${texQuantity(t, "s")}}{${texQuantity(c, "F")} \times \ln(${texQuantity(vw, "V")}/${texQuantity(vs, "V")})} = ${texQuantity(maxResistance, "Ω")}`,
      },
      {
        label: "Allowing for tolerance",
        latex: tex`R \le \frac{R_{max}}{1 + \text{tol}} = \frac{${texQuantity(maxResistance, "Ω")}}{1 + ${tol}} = ${texQuantity(allowed, "Ω")}`,
      },
      { label: "Largest E12 value at or below that", latex: tex`R = ${texQuantity(r, "Ω")}` },
      {
        label: "Check: discharge time with the part at +tolerance",
        latex: tex`t = R\,(1 + \text{tol})\,C\,\ln\frac{V_w}{V_{safe}} = ${texQuantity(r * (1 + tol), "Ω")} \times ${texQuantity(c, "F")} \times ${logRatio.toPrecision(4)} = ${texQuantity(worstTime, "s")} \le ${texQuantity(t, "s")}`,
      },
      { label: "Bleeder current", latex: tex`I = \frac{V_w}{R} = \frac{${texQuantity(vw, "V")}}{${texQuantity(r, "Ω")}} = ${texQuantity(bleederCurrent, "A")}` },
      { label: "Dissipation", latex: tex`P = \frac{V_w^2}{R} = \frac{(${texQuantity(vw, "V")})^2}{${texQuantity(r, "Ω")}} = ${texQuantity(dissipation, "W")}` },
      {
        label: "Suggested rating (at least twice the dissipation)",
        latex: o.suggestedRating === null
          ? tex`2P = ${texQuantity(2 * dissipation, "W")} \text{ — above the largest standard rating}`
          : tex`2P = ${texQuantity(2 * dissipation, "W")} \;\Rightarrow\; ${texQuantity(o.suggestedRating, "W")}`,
      },
      { label: "Energy stored at the working voltage", latex: tex`E = \tfrac{1}{2}\,C\,V_w^2 = \tfrac{1}{2} \times ${texQuantity(c, "F")} \times (${texQuantity(vw, "V")})^2 = ${texQuantity(energy, "J")}` },
    ] satisfies Step[];
  },
});
