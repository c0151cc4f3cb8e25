import { tex } from "./format";
import { highVoltageWarning } from "./safety";
import { TRIODE_NAMES } from "./tables/triodes";
import { solveOperatingPoint } from "./triode-model";
import { explainTriodeStage, LOAD_LINE_TEX, MODEL_TEX, signalLoad } from "./triode-stage-explain";
import { MODEL_INPUTS, MODEL_NAMES, modelFor, triodeStageSchema, type TriodeStageInput, type TriodeStageOutputs } from "./triode-stage-schema";
import { noOperatingPoint, stageWarnings } from "./triode-stage-warnings";
import { defineCalculator, type Computed, type Warning } from "./types";

export { plateCurves } from "./triode-model";
export { triodeStageSchema, type TriodeStageInput, type TriodeStageOutputs } from "./triode-stage-schema";

/**
 * Common-cathode triode stage with cathode bias: DC operating point from the Koren model
 * (lib/calc/triode-model.ts) and the load line, then small-signal gain
 *   bypassed:   A = µ·RL′/(rp + RL′)
 *   unbypassed: A = µ·RL′/(rp + RL′ + (µ + 1)·Rk)
 * with RL′ = Ra ∥ RL (Radiotron Designer's Handbook 4th ed., ch. 12).
 * Rk = 0 is allowed: the grid then sits at 0 V, still solvable (the model ignores grid current).
 */

export const calculator = defineCalculator({
  slug: "triode-stage",
  title: "Triode gain stage",
  purpose: "Operating point, plate dissipation and voltage gain of a cathode-biased triode stage.",
  bench: {
    group: "stages",
    example: { tube: "12AX7", supplyVoltage: "250 V", plateResistor: "100k", cathodeResistor: "1.5k", cathodeBypassed: true, loadResistance: "470k" },
    headlines: ["plateVoltage", "gain"],
    alwaysDanger: false,
    chart: "plate-curves",
    advanced: { title: "Koren's triode model: override the table, or model another tube", fields: ["mu", "ex", "kg1", "kp", "kvb"] },
  },
  inputs: [
    {
      name: "tube",
      label: "Tube type",
      unit: "",
      required: false,
      control: "select",
      options: TRIODE_NAMES,
      blankLabel: "None (enter the figures below)",
      help: "Pick a type from the built-in table, or leave it blank and enter the five parameters of Koren's model below.",
    },
    ...MODEL_INPUTS,
    {
      name: "supplyVoltage",
      label: "Supply voltage (B+)",
      unit: "V",
      required: true,
      control: "quantity",
      quantity: "voltage",
      help: "At the top of the plate resistor.",
    },
    { name: "plateResistor", label: "Plate resistor Ra", unit: "Ω", required: true, control: "quantity", quantity: "resistance" },
    {
      name: "cathodeResistor",
      label: "Cathode resistor Rk",
      unit: "Ω",
      required: true,
      control: "quantity",
      quantity: "resistance",
      help: "0 is allowed: the grid then sits at 0 V bias.",
    },
    { name: "cathodeBypassed", label: "Cathode resistor bypassed", unit: "", required: false, default: true, control: "boolean" },
    {
      name: "loadResistance",
      label: "Next stage's load (grid resistor)",
      unit: "Ω",
      required: false,
      control: "quantity",
      quantity: "resistance",
      help: "Optional: it sits in parallel with Ra for the signal.",
    },
  ],
  outputs: [
    { name: "plateVoltage", label: "Plate voltage, plate to cathode (what the tube sees)", unit: "V" },
    { name: "plateCurrent", label: "Plate current", unit: "A" },
    { name: "cathodeVoltage", label: "Cathode voltage (bias)", unit: "V" },
    { name: "plateDissipation", label: "Plate dissipation", unit: "W" },
    { name: "amplificationFactor", label: "Amplification factor µ", unit: "" },
    { name: "plateResistance", label: "Plate resistance rp", unit: "Ω" },
    { name: "transconductance", label: "Transconductance gm", unit: "S" },
    { name: "gain", label: "Voltage gain (magnitude, inverting)", unit: "" },
    { name: "plateToChassisVoltage", label: "Plate voltage, plate to chassis (what a meter reads)", unit: "V" },
  ],
  schema: triodeStageSchema,
  formulas: [
    { label: "Koren's improved triode model", latex: MODEL_TEX },
    { label: "Load line and cathode bias", latex: LOAD_LINE_TEX },
    { label: "Gain, cathode bypassed", latex: tex`A = \frac{\mu R_L'}{r_p + R_L'},\quad R_L' = R_a \parallel R_L` },
    { label: "Gain, cathode not bypassed", latex: tex`A = \frac{\mu R_L'}{r_p + R_L' + (\mu + 1) R_k}` },
  ],
  references: [
    {
      title:
        "N. L. Koren, Improved vacuum tube models for SPICE simulations, Glass Audio 8(5), 1996, p. 18; revised online edition, Part 1: Models and example, 20 March 2003",
      detail:
        "The improved triode equations for E1 and Ip and the parameter table: amplification factor µ, exponent x (EX), grid constant K_G1, plate constant K_P, knee constant K_VB; parameters recalled from memory",
    },
    {
      title: "Radiotron Designer's Handbook, 4th ed.",
      detail:
        "Chapter 12, resistance-capacitance coupled triode amplifiers: stage gain µRL/(rp + RL) and the effect of an unbypassed cathode resistor (cited from memory)",
    },
    {
      title: "Tube data sheets (12AX7, 12AT7, 12AU7, 6SN7, 6SL7 and others)",
      detail: "Typical operating characteristics and maximum plate dissipation per section (from memory)",
    },
  ],
  whyItMatters:
    "Whether a preamp or driver stage sounds right depends on where the tube sits on its curves: too little " +
    "current and it distorts, too much and the plate overheats. This works out the plate voltage you should " +
    "measure on a healthy stage, so a reading far off points to a drifted plate resistor, a leaky coupling " +
    "capacitor or a weak tube. It also shows why leaving out the cathode bypass capacitor cuts the gain.",
  compute(input: TriodeStageInput): Computed<TriodeStageOutputs> {
    const { supplyVoltage: bPlus, plateResistor: ra, cathodeResistor: rk, loadResistance: rl } = input;
    const bypassed = input.cathodeBypassed ?? true;
    const { params: p, name, rating, overridden } = modelFor(input);
    const solved = solveOperatingPoint(p, bPlus, ra, rk);
    const warnings: Warning[] = highVoltageWarning(bPlus);
    if (overridden.length) {
      warnings.push({ level: "info", message: `Using the ${name} table entry with your own ${overridden.map((k) => MODEL_NAMES[k]).join(", ")}.` });
    }
    if (!solved.ok) {
      warnings.push({ level: "caution", message: solved.message });
      return { outputs: noOperatingPoint(), warnings };
    }

    const { ip, ep, vk, point } = solved;
    const dissipation = ep * ip;
    const mu = point.mu;
    const gm = point.gm;
    const rp = point.gp > 0 && Number.isFinite(1 / point.gp) ? 1 / point.gp : null;
    const rLoad = signalLoad(ra, rl);
    // Conductance form of the gain formulas (multiply through by gp = 1/rp), finite even if rp is not.
    const degeneration = bypassed ? 0 : (mu + 1) * rk;
    const gain = (gm * rLoad) / (1 + point.gp * (rLoad + degeneration));

    stageWarnings(warnings, { name, rating, dissipation, bPlus, ra, rk, ip, ep });

    const outputs = {
      plateVoltage: ep,
      plateCurrent: ip,
      cathodeVoltage: vk,
      plateDissipation: dissipation,
      amplificationFactor: mu,
      plateResistance: rp,
      transconductance: gm,
      gain,
      plateToChassisVoltage: ep + vk,
    };
    return { outputs, warnings };
  },
  explain: (input: TriodeStageInput, o: TriodeStageOutputs) => explainTriodeStage(input, o),
});
