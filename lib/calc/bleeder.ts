import { bleederNotes, largestE12Within, seriesChain } from "./bleeder-chain";
import { explainBleeder } from "./bleeder-explain";
import { bleederSchema, type BleederInput } from "./bleeder-schema";
import { formatQuantity, tex } from "./format";
import { ALWAYS_DANGER } from "./safety";
import { LIMITING_VOLTAGE_SOURCE } from "./tables/limiting-voltage";
import { suggestedRating } from "./tables/wattage";
import { defineCalculator, type Warning } from "./types";

export { bleederSchema, type BleederInput } from "./bleeder-schema";

/**
 * Bleeder resistor across a filter capacitor: R·C·ln(Vw/Vres) ≤ t, so R_max = t / (C·ln(Vw/Vres)).
 * Default target from IEC 60204-1 §6.2.4, protection against residual voltages: live parts above
 * 60 V discharged to 60 V or less within 5 s of disconnection (clause from memory).
 * The time is met at the worst corner: capacitor at its upper tolerance, resistor at its upper one.
 */

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
  explain: (input: BleederInput, o) => explainBleeder(input, o),
});
