import { z } from "zod";
import { formatQuantity, texQuantity, tex } from "./format";
import { highVoltageWarning } from "./safety";
import { TRIODE_NAMES, findTriode } from "./tables/triodes";
import { solveOperatingPoint, type TriodeParams } from "./triode-model";
import { regionWarnings } from "./triode-region";
import { defineCalculator, type Computed, type Step, type Warning } from "./types";
import { optionalQuantity, quantity } from "./units";

export { plateCurves } from "./triode-model";

/**
 * Common-cathode triode stage with cathode bias: DC operating point from the Koren model
 * (lib/calc/triode-model.ts) and the load line, then small-signal gain
 *   bypassed:   A = µ·RL′/(rp + RL′)
 *   unbypassed: A = µ·RL′/(rp + RL′ + (µ + 1)·Rk)
 * with RL′ = Ra ∥ RL (Radiotron Designer's Handbook 4th ed., ch. 12).
 * Rk = 0 is allowed: the grid then sits at 0 V, still solvable (the model ignores grid current).
 */

const MODEL_KEYS = ["mu", "ex", "kg1", "kp", "kvb"] as const;
type ModelKey = (typeof MODEL_KEYS)[number];
/** Plain-text names of Koren's parameters for messages (no K_G1 in running text); the form typesets the symbols. */
const MODEL_NAMES: Record<ModelKey, string> = {
  mu: "Amplification factor µ",
  ex: "Exponent x",
  kg1: "Grid constant",
  kp: "Plate constant",
  kvb: "Knee constant",
};

const tubeField = z
  .unknown()
  .transform((raw, ctx): string | undefined => {
    if (raw === undefined || raw === null || (typeof raw === "string" && raw.trim() === "")) return undefined;
    const found = typeof raw === "string" ? findTriode(raw) : undefined;
    if (!found) {
      ctx.addIssue({ code: "custom", message: `Tube type is not in the built-in table; choose one of ${TRIODE_NAMES.join(", ")}` });
      return z.NEVER;
    }
    return found.name;
  })
  .optional();

const bypassField = z
  .unknown()
  .transform((raw, ctx): boolean => {
    if (raw === undefined || raw === null || raw === "") return true;
    if (raw === true || raw === "true" || raw === "on") return true;
    if (raw === false || raw === "false" || raw === "off") return false;
    ctx.addIssue({ code: "custom", message: "Cathode bypassed must be true or false" });
    return z.NEVER;
  })
  .optional();

// Ranges are wide enough for any receiving triode and keep every figure finite.
const param = (label: string, min: number, max: number) => optionalQuantity("ratio", { positive: true, min, max, label }).optional();

export const triodeStageSchema = z
  .object({
    tube: tubeField,
    mu: param(MODEL_NAMES.mu, 0.5, 1000),
    ex: param(MODEL_NAMES.ex, 1, 3),
    kg1: param(MODEL_NAMES.kg1, 1, 1e6),
    kp: param(MODEL_NAMES.kp, 1, 1e5),
    kvb: param(MODEL_NAMES.kvb, 1, 1e7),
    supplyVoltage: quantity("voltage", { positive: true, max: 10_000, label: "Supply voltage" }),
    plateResistor: quantity("resistance", { positive: true, min: 1, max: 1e9, label: "Plate resistor" }),
    cathodeResistor: quantity("resistance", { nonNegative: true, max: 1e8, label: "Cathode resistor" }),
    cathodeBypassed: bypassField,
    loadResistance: optionalQuantity("resistance", { positive: true, min: 1, max: 1e12, label: "Load resistance" }).optional(),
  })
  .superRefine((v, ctx) => {
    if (v.tube !== undefined) return;
    const missing = MODEL_KEYS.filter((k) => v[k] === undefined);
    if (missing.length === MODEL_KEYS.length) {
      ctx.addIssue({
        code: "custom",
        path: ["tube"],
        message: "Choose a tube type, or enter all five parameters of Koren's triode model (µ, x and the grid, plate and knee constants)",
      });
      return;
    }
    for (const k of missing) {
      ctx.addIssue({ code: "custom", path: [k], message: `${MODEL_NAMES[k]} is required when no tube type is chosen` });
    }
  });

export type TriodeStageInput = z.output<typeof triodeStageSchema>;

/** Null only when the operating point cannot be found (no bracket or no convergence). */
type N = number | null;
export interface TriodeStageOutputs {
  [key: string]: N;
  /** Plate to cathode (what the tube sees), V. */
  plateVoltage: N;
  plateCurrent: N;
  cathodeVoltage: N;
  plateDissipation: N;
  amplificationFactor: N;
  plateResistance: N;
  transconductance: N;
  gain: N;
  /** Plate to chassis (what a meter from chassis reads): plate-to-cathode plus the cathode voltage, V. */
  plateToChassisVoltage: N;
}

// Koren's equations as his article writes them, the exponent as x (EX in SPICE listings).
const MODEL_TEX = tex`E_1 = \frac{E_p}{K_P}\ln\!\left(1 + e^{K_P\left(\frac{1}{\mu} + \frac{E_g}{\sqrt{K_{VB} + E_p^2}}\right)}\right),\quad I_p = \frac{E_1^{x}}{K_{G1}}\left(1 + \operatorname{sgn} E_1\right)`;
const KOREN_CITE = "Koren's improved triode model (Glass Audio, 1996; revised 2003)";
const LOAD_LINE_TEX = tex`E_p = B^{+} - I_p\,(R_a + R_k),\quad E_g = -I_p R_k`;

const sig6 = (n: number) => String(Number(n.toPrecision(6)));

function modelFor(input: TriodeStageInput): { params: TriodeParams; name: string; rating?: number; overridden: ModelKey[] } {
  const entry = input.tube ? findTriode(input.tube) : undefined;
  const overridden = MODEL_KEYS.filter((k) => input[k] !== undefined);
  const base = entry?.params;
  const pick = (k: ModelKey) => input[k] ?? base?.[k] ?? Number.NaN; // NaN unreachable: the schema demands all five without a tube
  const params: TriodeParams = { mu: pick("mu"), ex: pick("ex"), kg1: pick("kg1"), kp: pick("kp"), kvb: pick("kvb") };
  return { params, name: entry?.name ?? "your model", rating: entry?.maxPlateDissipation, overridden: entry ? overridden : [] };
}

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
    // The five parameters of Koren's improved triode model, named and written as his article sets them;
    // SPICE listings spell them MU, EX, KG1, KP, KVB, and the API keeps mu, ex, kg1, kp, kvb.
    {
      name: "mu",
      label: "Amplification factor",
      symbol: "\\mu",
      unit: "",
      required: false,
      control: "quantity",
      quantity: "ratio",
      help: `As ${KOREN_CITE} uses it. With a tube chosen, any parameter you enter replaces the table's.`,
    },
    {
      name: "ex",
      label: "Exponent",
      symbol: "x",
      unit: "",
      required: false,
      control: "quantity",
      quantity: "ratio",
      help: "The power the plate current follows (EX in SPICE listings): between 1 and 3, usually 1.2–1.4.",
    },
    {
      name: "kg1",
      label: "Grid constant",
      symbol: "K_{G1}",
      unit: "",
      required: false,
      control: "quantity",
      quantity: "ratio",
      help: "Divides the current: a larger value, less current (KG1 in SPICE listings).",
    },
    {
      name: "kp",
      label: "Plate constant",
      symbol: "K_P",
      unit: "",
      required: false,
      control: "quantity",
      quantity: "ratio",
      help: "Sets how the curves bend near cut-off (KP in SPICE listings).",
    },
    {
      name: "kvb",
      label: "Knee constant",
      symbol: "K_{VB}",
      unit: "",
      required: false,
      control: "quantity",
      quantity: "ratio",
      help: "Sets the knee at low plate voltage, in V² (KVB in SPICE listings).",
    },
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
      const outputs: TriodeStageOutputs = {
        plateVoltage: null,
        plateCurrent: null,
        cathodeVoltage: null,
        plateDissipation: null,
        amplificationFactor: null,
        plateResistance: null,
        transconductance: null,
        gain: null,
        plateToChassisVoltage: null,
      };
      return { outputs, warnings };
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

    if (rating !== undefined && dissipation > rating) {
      warnings.push({
        level: "caution",
        message: `Plate dissipation ${formatQuantity(dissipation, "W")} is above the ${name}'s rated ${formatQuantity(rating, "W")} per section; raise Ra or Rk, or lower B+.`,
      });
    }
    if (rating === undefined) {
      warnings.push({ level: "info", message: "No rated plate dissipation is known for custom model parameters; check the data sheet yourself." });
    }
    if (rk === 0) {
      warnings.push({
        level: "info",
        message: "With no cathode resistor the grid sits at 0 V; a real tube then draws grid current on signal peaks, which the model ignores.",
      });
    }
    warnings.push(...regionWarnings(bPlus, ra, rk, ip, ep));
    warnings.push({
      level: "info",
      message: "The model is a fit to typical curves; real tubes of one type differ by 20% or more, so expect your measured voltages to differ too.",
    });

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
  explain(input: TriodeStageInput, o: TriodeStageOutputs) {
    const { supplyVoltage: bPlus, plateResistor: ra, cathodeResistor: rk, loadResistance: rl } = input;
    const bypassed = input.cathodeBypassed ?? true;
    const { params: p, name } = modelFor(input);
    // Each value is formatted once; formatting dominates the cost of the working.
    const tB = texQuantity(bPlus, "V");
    const tRa = texQuantity(ra, "Ω");
    const tRk = texQuantity(rk, "Ω");
    const steps: Step[] = [
      { label: "Koren's improved triode model", latex: MODEL_TEX },
      {
        label: `Model parameters (${name})`,
        latex: tex`\mu = ${sig6(p.mu)},\; x = ${sig6(p.ex)},\; K_{G1} = ${sig6(p.kg1)},\; K_P = ${sig6(p.kp)},\; K_{VB} = ${sig6(p.kvb)}\,\mathrm{V^2}`,
      },
      { label: "Load line and cathode bias", latex: LOAD_LINE_TEX },
      { label: "Load line with your values", latex: tex`E_p = ${tB} - I_p\,(${tRa} + ${tRk}),\quad E_g = -I_p \times ${tRk}` },
    ];
    const {
      plateCurrent: ip,
      plateVoltage: ep,
      cathodeVoltage: vk,
      plateDissipation: dissipation,
      amplificationFactor: mu,
      transconductance: gm,
      plateResistance: rp,
      gain,
    } = o;
    if (ip === null || ep === null || vk === null || dissipation === null || mu === null || gm === null || gain === null) return steps;

    const eg = -ip * rk;
    const rLoad = signalLoad(ra, rl);
    const tIp = texQuantity(ip, "A");
    const tIp4 = texQuantity(ip, "A", 4);
    const tMu = texQuantity(mu, "");
    const tRl = texQuantity(rLoad, "Ω");
    const tGain = texQuantity(gain, "");
    const rpTex = rp === null ? tex`\infty` : texQuantity(rp, "Ω");
    steps.push(
      {
        label: "Operating point (model current equals load-line current); E_p is plate to cathode, the voltage the tube itself sees",
        latex: tex`I_p = ${tIp4},\quad E_p = ${tB} - ${tIp4} \times ${texQuantity(ra + rk, "Ω", 4)} = ${texQuantity(ep, "V", 4)},\quad E_g = ${texQuantity(eg, "V", 4)}`,
      },
      { label: "Cathode voltage", latex: tex`V_k = I_p R_k = ${tIp} \times ${tRk} = ${texQuantity(vk, "V")}` },
      {
        label: "Plate to chassis, as a meter from chassis reads it: the plate-to-cathode voltage above plus the cathode's own voltage",
        latex: tex`V_a = E_p + V_k = ${texQuantity(ep, "V", 4)} + ${texQuantity(vk, "V", 4)} = B^{+} - I_p R_a = ${texQuantity(ep + vk, "V", 4)}`,
      },
      { label: "Plate dissipation", latex: tex`P_a = E_p I_p = ${texQuantity(ep, "V")} \times ${tIp} = ${texQuantity(dissipation, "W")}` },
      {
        label: "Small-signal parameters at the operating point",
        latex: tex`g_m = \frac{\partial I_p}{\partial E_g} = ${texQuantity(gm, "S")},\quad r_p = \left(\frac{\partial I_p}{\partial E_p}\right)^{-1} = ${rpTex},\quad \mu = g_m r_p = ${tMu}`,
      },
    );
    if (rl !== undefined) {
      steps.push({
        label: "Signal load: plate resistor in parallel with the next stage",
        latex: tex`R_L' = \frac{R_a R_L}{R_a + R_L} = \frac{${tRa} \times ${texQuantity(rl, "Ω")}}{${tRa} + ${texQuantity(rl, "Ω")}} = ${tRl}`,
      });
    }
    const gainLabel = "Voltage gain (inverting: the plate swings opposite to the grid)";
    steps.push(
      bypassed
        ? { label: `${gainLabel}, cathode bypassed`, latex: tex`A = \frac{\mu R_L'}{r_p + R_L'} = \frac{${tMu} \times ${tRl}}{${rpTex} + ${tRl}} = ${tGain}` }
        : {
            label: `${gainLabel}, cathode not bypassed`,
            latex: tex`A = \frac{\mu R_L'}{r_p + R_L' + (\mu + 1) R_k} = \frac{${tMu} \times ${tRl}}{${rpTex} + ${tRl} + ${texQuantity(mu + 1, "")} \times ${tRk}} = ${tGain}`,
          },
    );
    return steps;
  },
});

/** Ra alone, or Ra ∥ RL when the next stage's grid resistor loads it. */
function signalLoad(ra: number, rl: number | undefined): number {
  return rl === undefined ? ra : (ra * rl) / (ra + rl);
}
