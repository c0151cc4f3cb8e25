import { z } from "zod";
import { formatQuantity, texQuantity, tex } from "./format";
import { ALWAYS_DANGER } from "./safety";
import { bleederNotes, largestE12Within, seriesChain } from "./bleeder-chain";
import { LIMITING_VOLTAGE_SOURCE, MAX_LIMITING_VOLTAGE } from "./tables/limiting-voltage";
import { suggestedRating } from "./tables/wattage";
import { defineCalculator, type Step, type Warning } from "./types";
import { optionalQuantity, quantity, quantityWithDefault } from "./units";

/**
 * Bleeder resistor across a filter capacitor: R·C·ln(Vw/Vres) ≤ t, so R_max = t / (C·ln(Vw/Vres)).
 * Default target from IEC 60204-1 §6.2.4, protection against residual voltages: live parts above
 * 60 V discharged to 60 V or less within 5 s of disconnection (clause from memory).
 * The time is met at the worst corner: capacitor at its upper tolerance, resistor at its upper one.
 */

// The working voltage must clear the limit by this ratio, so ln(Vw/Vres) stays well away from zero.
const MIN_RATIO = 1.001;
const VRES = { positive: true, min: 1e-3, max: 1e6, label: "Residual-voltage limit" } as const;
const RTOL = { nonNegative: true, max: 0.5, label: "Resistor tolerance" } as const;

export const bleederSchema = z
  .object({
    capacitance: quantity("capacitance", { positive: true, min: 1e-12, max: 10, label: "Capacitance" }),
    workingVoltage: quantity("voltage", { positive: true, max: 1e6, label: "Working voltage" }),
    // safeVoltage is the contract's first name for the limit; residualVoltage is accepted too.
    safeVoltage: optionalQuantity("voltage", VRES),
    residualVoltage: optionalQuantity("voltage", VRES),
    maxTime: quantityWithDefault("time", 5, { positive: true, min: 1e-3, max: 1e4, label: "Maximum discharge time" }).default(5),
    // Upper tolerance only: a capacitor below nominal discharges sooner. Electrolytics run −10 %/+50 % or wider.
    capacitorTolerance: quantityWithDefault("ratio", 0.5, { nonNegative: true, max: 1, label: "Capacitor tolerance" }).default(0.5),
    resistorTolerance: optionalQuantity("ratio", RTOL),
    // The single tolerance of the first contract, now read as the resistor's.
    tolerance: optionalQuantity("ratio", RTOL),
  })
  .superRefine((v, ctx) => {
    if (v.safeVoltage !== undefined && v.residualVoltage !== undefined && v.safeVoltage !== v.residualVoltage) {
      ctx.addIssue({
        code: "custom",
        path: ["residualVoltage"],
        message: "Residual-voltage limit given twice (safeVoltage and residualVoltage) with different values; give one",
      });
    }
    if (v.tolerance !== undefined && v.resistorTolerance !== undefined && v.tolerance !== v.resistorTolerance) {
      ctx.addIssue({
        code: "custom",
        path: ["tolerance"],
        message: "Tolerance is the older name of the resistor tolerance; give one of tolerance and resistorTolerance",
      });
    }
    const limit = v.safeVoltage ?? v.residualVoltage ?? 60;
    if (!(v.workingVoltage >= limit * MIN_RATIO)) {
      ctx.addIssue({
        code: "custom",
        path: ["workingVoltage"],
        message: "Working voltage must be above the residual-voltage limit; at or below it this rule asks for no bleeder",
      });
    }
  })
  .transform((v) => {
    const limit = v.safeVoltage ?? v.residualVoltage ?? 60;
    const rt = v.resistorTolerance ?? v.tolerance ?? 0.05;
    // Both names of each alias are echoed, so a client that sent either reads its own back.
    return {
      capacitance: v.capacitance,
      workingVoltage: v.workingVoltage,
      safeVoltage: limit,
      residualVoltage: limit,
      maxTime: v.maxTime,
      capacitorTolerance: v.capacitorTolerance,
      resistorTolerance: rt,
      tolerance: rt,
    };
  });

export type BleederInput = z.output<typeof bleederSchema>;

export const calculator = defineCalculator({
  slug: "bleeder",
  title: "Bleeder resistor",
  purpose: "The bleeder that brings a filter capacitor below a residual-voltage limit within a given time after switch-off.",
  bench: {
    group: "first-power",
    example: { capacitance: "40 uF", workingVoltage: "450 V" },
    // The rating that allows for the voltage as well as the power (a chain's cautions follow in the notes).
    headlines: ["suggestedResistance", "resistorRating"],
    alwaysDanger: true,
    chart: "bleeder-discharge",
  },
  inputs: [
    {
      name: "capacitance",
      label: "Filter capacitance",
      unit: "F",
      required: true,
      control: "quantity",
      quantity: "capacitance",
      help: "Total nominal capacitance the bleeder drains (add up capacitors in parallel).",
    },
    {
      name: "workingVoltage",
      label: "Working voltage",
      unit: "V",
      required: true,
      control: "quantity",
      quantity: "voltage",
      help: "The highest voltage the capacitor reaches, e.g. B+ with no load.",
    },
    {
      name: "safeVoltage",
      label: "Residual-voltage limit",
      unit: "V",
      required: false,
      default: 60,
      control: "quantity",
      quantity: "voltage",
      help: "The voltage to fall below; 60 V is the residual-voltage limit of IEC 60204-1 §6.2.4. Also accepted as residualVoltage.",
    },
    {
      name: "maxTime",
      label: "Time allowed",
      unit: "s",
      required: false,
      default: 5,
      control: "quantity",
      quantity: "time",
      help: "How long the discharge may take; 5 s follows IEC 60204-1 §6.2.4.",
    },
    {
      name: "capacitorTolerance",
      label: "Capacitor tolerance (upper)",
      unit: "",
      required: false,
      default: 0.5,
      control: "quantity",
      quantity: "ratio",
      help: "As a fraction: 0.5 means the capacitor may be 50% above nominal. Electrolytics are commonly −10%/+50% or wider.",
    },
    {
      name: "resistorTolerance",
      label: "Resistor tolerance",
      unit: "",
      required: false,
      default: 0.05,
      control: "quantity",
      quantity: "ratio",
      help: "As a fraction: 0.05 means the resistor may be 5% high. Also accepted as tolerance.",
    },
  ],
  outputs: [
    { name: "maxResistance", label: "Largest resistance that meets the time (nominal parts)", unit: "Ω" },
    { name: "suggestedResistance", label: "Suggested bleeder (E12)", unit: "Ω" },
    { name: "bleederCurrent", label: "Bleeder current at working voltage", unit: "A" },
    { name: "dissipation", label: "Dissipation at working voltage", unit: "W" },
    { name: "suggestedRating", label: "Suggested power rating", unit: "W" },
    { name: "resistorsInSeries", label: "Resistors in series", unit: "" },
    { name: "voltagePerResistor", label: "Voltage across each resistor", unit: "V" },
    { name: "resistorValue", label: "Each resistor of the chain (E12)", unit: "Ω" },
    { name: "resistorRating", label: "Rating of each resistor (power and voltage)", unit: "W" },
  ],
  schema: bleederSchema,
  formulas: [
    { label: "Discharge to the residual-voltage limit", latex: tex`t = R\,C\,\ln\frac{V_w}{V_{res}}` },
    { label: "Largest bleeder, nominal parts", latex: tex`R_{max} = \frac{t_{max}}{C\,\ln(V_w/V_{res})}` },
    {
      label: "Worst corner: both parts at their upper tolerance",
      latex: tex`R\,(1 + \text{tol}_R)\;C\,(1 + \text{tol}_C)\,\ln\frac{V_w}{V_{res}} \le t_{max}`,
    },
    { label: "Series chain", latex: tex`n = \left\lceil \frac{V_w}{U_{max}} \right\rceil, \quad V_{each} = \frac{V_w}{n}` },
    { label: "Current and dissipation", latex: tex`I = \frac{V_w}{R}, \quad P = \frac{V_w^2}{R}` },
  ],
  references: [
    {
      title: "IEC 60204-1, Safety of machinery — Electrical equipment of machines",
      detail:
        "§6.2.4, protection against residual voltages: live parts above 60 V discharged to 60 V or less within 5 s of disconnection (clause cited from memory; used here as a bench benchmark)",
    },
    { title: "IEC 60115-1, Fixed resistors — Generic specification", detail: `Limiting element voltage. Figures used: ${LIMITING_VOLTAGE_SOURCE}` },
    {
      title: "Aluminium electrolytic capacitor data sheets",
      detail: "Capacitance tolerance commonly −10 %/+50 % for high-voltage parts, wider on older ones (common practice)",
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
    "power and runs hot. This picks the largest standard value that still meets the time with the capacitor and " +
    "the resistor both at the top of their tolerances, and splits it into a chain where one resistor could not " +
    "stand the voltage. It is a design figure: a bleeder can fail open, so you still measure before you touch anything.",
  compute(input: BleederInput) {
    const { capacitance: c, workingVoltage: vw, safeVoltage: vs, maxTime: t, capacitorTolerance: ct, resistorTolerance: rt } = input;
    const maxResistance = t / (c * Math.log(vw / vs));
    const corner = (1 + ct) * (1 + rt);
    const r = largestE12Within(maxResistance / corner);
    const bleederCurrent = vw / r;
    const dissipation = (vw * vw) / r;
    const rating = suggestedRating(dissipation);
    const chain = seriesChain(vw, maxResistance / corner, r);

    const warnings: Warning[] = [ALWAYS_DANGER];
    if (rating.warning) warnings.push(rating.warning);
    bleederNotes(warnings, input, chain, rating.rating);
    warnings.push({
      level: "info",
      message:
        `The bleeder draws ${formatQuantity(bleederCurrent, "A")} from the supply all the time it is on; check the rectifier and transformer can spare it. ` +
        "Wire it directly across the capacitor's terminals so no switch or fuse can disconnect it.",
    });

    return {
      outputs: {
        maxResistance,
        suggestedResistance: r,
        bleederCurrent,
        dissipation,
        suggestedRating: rating.rating,
        resistorsInSeries: chain.count,
        voltagePerResistor: chain.voltageEach,
        resistorValue: chain.value,
        resistorRating: chain.rating,
      },
      warnings,
    };
  },
  explain(input: BleederInput, o) {
    const { capacitance: c, workingVoltage: vw, safeVoltage: vs, maxTime: t, capacitorTolerance: ct, resistorTolerance: rt } = input;
    const { maxResistance, suggestedResistance: r, bleederCurrent, dissipation } = o;
    const logRatio = Math.log(vw / vs);
    const corner = (1 + ct) * (1 + rt);
    const worstTime = r * (1 + rt) * c * (1 + ct) * logRatio;
    const energy = 0.5 * c * vw * vw;
    const n = o.resistorsInSeries;
    return [
      {
        label: "Largest bleeder that meets the time with nominal parts",
        latex: tex`R_{max} = \frac{t_{max}}{C\,\ln(V_w/V_{res})} = \frac{${texQuantity(t, "s")}}{${texQuantity(c, "F")} \times \ln(${texQuantity(vw, "V")}/${texQuantity(vs, "V")})} = ${texQuantity(maxResistance, "Ω")}`,
      },
      {
        label: "Allowing for both tolerances (capacitor high, resistor high)",
        latex: tex`R \le \frac{R_{max}}{(1 + ${ct})(1 + ${rt})} = ${texQuantity(maxResistance / corner, "Ω")}`,
      },
      { label: "Largest E12 value at or below that", latex: tex`R = ${texQuantity(r, "Ω")}` },
      {
        label: "Check: discharge time at the worst corner",
        latex: tex`t = R\,(1 + ${rt})\;C\,(1 + ${ct})\,\ln\frac{V_w}{V_{res}} = ${texQuantity(r * (1 + rt), "Ω")} \times ${texQuantity(c * (1 + ct), "F")} \times ${logRatio.toPrecision(4)} = ${texQuantity(worstTime, "s")} \le ${texQuantity(t, "s")}`,
      },
      {
        label: "Bleeder current",
        latex: tex`I = \frac{V_w}{R} = \frac{${texQuantity(vw, "V")}}{${texQuantity(r, "Ω")}} = ${texQuantity(bleederCurrent, "A")}`,
      },
      { label: "Dissipation", latex: tex`P = \frac{V_w^2}{R} = \frac{(${texQuantity(vw, "V")})^2}{${texQuantity(r, "Ω")}} = ${texQuantity(dissipation, "W")}` },
      {
        label: "Suggested rating (at least twice the dissipation)",
        latex:
          o.suggestedRating === null
            ? tex`2P = ${texQuantity(2 * dissipation, "W")} \text{ — above the largest standard rating}`
            : tex`2P = ${texQuantity(2 * dissipation, "W")} \;\Rightarrow\; ${texQuantity(o.suggestedRating, "W")}`,
      },
      {
        label: `Resistors in series (typical limiting element voltage ${MAX_LIMITING_VOLTAGE} V at most, IEC 60115-1)`,
        latex: tex`n = \left\lceil \frac{${texQuantity(vw, "V")}}{${texQuantity(MAX_LIMITING_VOLTAGE, "V")}} \right\rceil = ${n}, \quad V_{each} = ${texQuantity(o.voltagePerResistor, "V")}`,
      },
      {
        label: "Each resistor: E12, meeting the time at the worst corner, rated for its power and its voltage",
        latex: tex`R_{each} \le \frac{${texQuantity(maxResistance / corner, "Ω")}}{${n}} \;\Rightarrow\; ${texQuantity(o.resistorValue, "Ω")}, \quad ${o.resistorRating === null ? tex`\text{no single listed rating}` : texQuantity(o.resistorRating, "W")}`,
      },
      {
        label: "Energy stored at the working voltage",
        latex: tex`E = \tfrac{1}{2}\,C\,V_w^2 = \tfrac{1}{2} \times ${texQuantity(c, "F")} \times (${texQuantity(vw, "V")})^2 = ${texQuantity(energy, "J")}`,
      },
    ] satisfies Step[];
  },
});
