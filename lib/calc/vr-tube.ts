import { z } from "zod";
import { formatQuantity, texQuantity, tex } from "./format";
import { highVoltageWarning } from "./safety";
import { preferredBelow } from "./tables/preferred-values";
import { findVrTube, VR_SOURCE, VR_TUBES, VR_TYPES, type VrTube } from "./tables/vr-tubes";
import { suggestedRating } from "./tables/wattage";
import { defineCalculator, type Step, type Warning } from "./types";
import { optionalQuantity, quantity, quantityWithDefault } from "./units";
import { tubeNotes, vrWarnings, type TubeFigures } from "./vr-tube-warnings";

/**
 * Series resistor for a glow-discharge VR tube (shunt regulator): R = (Vs − Vvr)/(I_L,max + I_t,min),
 * so at full load the tube still carries its minimum; at lighter loads the tube takes what the load
 * leaves, I_t = (Vs − Vvr)/R − I_L (Radiotron Designer's Handbook, gaseous regulator tubes; RCA receiving
 * tube manual, VR tube application notes; both from memory). Before the tube strikes the load hangs
 * straight on the resistor, so the tube sees the divider Vs·R_L/(R + R_L), R_L = Vvr/I_L,max.
 */

const TUBES = new Map<string, VrTube>(VR_TUBES.map((t) => [t.type, t]));
/** Each table tube's figures with its fixed wording, made once (compute runs on every keystroke). */
const FIGURES = new Map<string, TubeFigures>(
  VR_TUBES.map((t) => [
    t.type,
    {
      name: t.type,
      vvr: t.regulatedVoltage,
      iMin: t.minCurrent,
      iMax: t.maxCurrent,
      vStrike: t.strikingVoltage,
      notes: tubeNotes(t.type, t.minCurrent, t.maxCurrent, t.strikingVoltage),
    },
  ]),
);

const tubeField = z
  .unknown()
  .transform((raw, ctx): string | undefined => {
    if (raw === undefined || raw === null || (typeof raw === "string" && raw.trim() === "")) return undefined;
    const row = typeof raw === "string" ? findVrTube(raw) : undefined;
    if (!row) {
      ctx.addIssue({ code: "custom", message: `Tube must be one of ${VR_TYPES.join(", ")}, or leave it empty and give its regulated voltage and currents` });
      return z.NEVER;
    }
    return row.type;
  })
  .optional();

const CUSTOM = ["regulatedVoltage", "minCurrent", "maxCurrent"] as const;
const LABEL: Record<(typeof CUSTOM)[number] | "strikingVoltage", string> = {
  regulatedVoltage: "Regulated voltage",
  minCurrent: "Minimum tube current",
  maxCurrent: "Maximum tube current",
  strikingVoltage: "Striking voltage",
};

export const vrTubeSchema = z
  .object({
    supplyVoltage: quantity("voltage", { positive: true, min: 1, max: 2000, label: "Supply voltage" }),
    tube: tubeField,
    regulatedVoltage: optionalQuantity("voltage", { positive: true, min: 1, max: 1000, label: "Regulated voltage" }),
    minCurrent: optionalQuantity("current", { positive: true, min: 1e-6, max: 1, label: "Minimum tube current" }),
    maxCurrent: optionalQuantity("current", { positive: true, min: 1e-6, max: 1, label: "Maximum tube current" }),
    strikingVoltage: optionalQuantity("voltage", { positive: true, min: 1, max: 2000, label: "Striking voltage" }),
    loadCurrentMin: quantityWithDefault("current", 0, { nonNegative: true, max: 10, label: "Least load current" }),
    loadCurrentMax: quantity("current", { nonNegative: true, max: 10, label: "Greatest load current" }),
    fittedResistance: optionalQuantity("resistance", { positive: true, min: 1, max: 1e9, label: "Fitted resistor" }),
  })
  .superRefine((v, ctx) => {
    if (v.tube !== undefined) {
      for (const name of [...CUSTOM, "strikingVoltage"] as const) {
        if (v[name] !== undefined)
          ctx.addIssue({ code: "custom", path: [name], message: `${LABEL[name]}: give either a tube from the list or its figures, not both` });
      }
    } else {
      for (const name of CUSTOM) {
        if (v[name] === undefined) ctx.addIssue({ code: "custom", path: [name], message: `${LABEL[name]} is required when no tube is chosen` });
      }
      if (v.minCurrent !== undefined && v.maxCurrent !== undefined && v.maxCurrent <= v.minCurrent) {
        ctx.addIssue({ code: "custom", path: ["maxCurrent"], message: "Maximum tube current must be above the minimum tube current" });
      }
      if (v.strikingVoltage !== undefined && v.regulatedVoltage !== undefined && v.strikingVoltage < v.regulatedVoltage) {
        ctx.addIssue({ code: "custom", path: ["strikingVoltage"], message: "Striking voltage cannot be below the regulated voltage" });
      }
    }
    if (v.loadCurrentMin > v.loadCurrentMax) {
      ctx.addIssue({ code: "custom", path: ["loadCurrentMin"], message: "Least load current cannot be above the greatest load current" });
    }
    const vvr = v.tube !== undefined ? TUBES.get(v.tube)!.regulatedVoltage : v.regulatedVoltage;
    if (vvr !== undefined && v.supplyVoltage <= vvr) {
      ctx.addIssue({ code: "custom", path: ["supplyVoltage"], message: `Supply voltage must be above the tube's regulated ${formatQuantity(vvr, "V")}` });
    }
  });

export type VrTubeInput = z.output<typeof vrTubeSchema>;

/** The tube's figures: from the table, or as typed (the schema has made sure they are all there). */
export function tubeFigures(input: VrTubeInput): TubeFigures {
  if (input.tube !== undefined) return FIGURES.get(input.tube)!;
  return { name: "tube", vvr: input.regulatedVoltage!, iMin: input.minCurrent!, iMax: input.maxCurrent!, vStrike: input.strikingVoltage, notes: null };
}

export const calculator = defineCalculator({
  slug: "vr-tube",
  title: "VR tube regulator",
  purpose: "The series resistor that keeps a glow-discharge regulator tube in regulation from no load to full load.",
  bench: {
    group: "supplies",
    example: { supplyVoltage: "250 V", tube: "0A2", loadCurrentMax: "20 mA" },
    headlines: ["seriesResistance", "tubeCurrentAtMinLoad"],
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
      help: "The unregulated B+ the series resistor is fed from.",
    },
    {
      name: "tube",
      label: "Regulator tube",
      unit: "",
      required: false,
      control: "select",
      options: VR_TYPES,
      help: "From the built-in table; or leave empty and give the figures below.",
    },
    {
      name: "regulatedVoltage",
      label: "Regulated voltage",
      unit: "V",
      required: false,
      control: "quantity",
      quantity: "voltage",
      help: "Only without a tube from the list.",
    },
    {
      name: "minCurrent",
      label: "Tube's minimum current",
      unit: "A",
      required: false,
      control: "quantity",
      quantity: "current",
      help: "Only without a tube from the list: the data sheet's lower limit.",
    },
    {
      name: "maxCurrent",
      label: "Tube's maximum current",
      unit: "A",
      required: false,
      control: "quantity",
      quantity: "current",
      help: "Only without a tube from the list: the data sheet's upper limit.",
    },
    {
      name: "strikingVoltage",
      label: "Striking voltage",
      unit: "V",
      required: false,
      control: "quantity",
      quantity: "voltage",
      help: "Optional, only without a tube from the list: the supply needed to start the glow.",
    },
    {
      name: "loadCurrentMin",
      label: "Least load current",
      unit: "A",
      required: false,
      default: 0,
      control: "quantity",
      quantity: "current",
      help: "What the regulated stages draw at their lightest (0 when they can be unplugged or cold).",
    },
    {
      name: "loadCurrentMax",
      label: "Greatest load current",
      unit: "A",
      required: true,
      control: "quantity",
      quantity: "current",
      help: "What the regulated stages draw at most.",
    },
    {
      name: "fittedResistance",
      label: "Resistor fitted (optional)",
      unit: "Ω",
      required: false,
      control: "quantity",
      quantity: "resistance",
      help: "The resistor in the set or the one you mean to fit: the tube currents are then worked out with it.",
    },
  ],
  outputs: [
    { name: "seriesResistance", label: "Series resistance", unit: "Ω" },
    { name: "tubeCurrentAtMinLoad", label: "Tube current at the least load", unit: "A" },
    { name: "tubeCurrentAtMaxLoad", label: "Tube current at the greatest load", unit: "A" },
    { name: "resistorPower", label: "Resistor dissipation", unit: "W" },
    { name: "suggestedRating", label: "Suggested rating (≥ 2 × dissipation)", unit: "W" },
    { name: "preferredResistance", label: "E12 value at or below", unit: "Ω" },
    { name: "strikingVoltage", label: "Striking voltage (data sheet)", unit: "V" },
    { name: "voltageBeforeStrike", label: "Voltage on the tube before it strikes, full load", unit: "V" },
  ],
  schema: vrTubeSchema,
  formulas: [
    { label: "Series resistance", latex: tex`R = \frac{V_s - V_{VR}}{I_{L,\max} + I_{t,\min}}` },
    { label: "Tube current", latex: tex`I_t = \frac{V_s - V_{VR}}{R} - I_L` },
    { label: "Resistor dissipation", latex: tex`P = \frac{(V_s - V_{VR})^2}{R}` },
    { label: "Before the tube strikes", latex: tex`V_\text{tube} = V_s\,\frac{R_L}{R + R_L},\quad R_L = \frac{V_{VR}}{I_{L,\max}}` },
  ],
  references: [
    {
      title: "RCA receiving tube manual (RC-series)",
      detail: "Voltage-regulator tube data (0A2, 0B2, 0C3/VR105, 0D3/VR150) and the application notes on series resistor and starting supply (from memory)",
    },
    {
      title: "Radiotron Designer's Handbook, 4th ed.",
      detail: "Chapter on voltage regulators: gaseous (glow-discharge) regulator tubes (chapter cited from memory)",
    },
    { title: "Built-in VR tube table", detail: VR_SOURCE },
  ],
  whyItMatters:
    "A VR tube holds its voltage only while its current stays inside the data sheet's range. The series resistor must pass " +
    "the full load plus the tube's minimum, or the glow goes out at full load and the regulated line sags; when the load " +
    "drops away the tube takes all of it, and above its maximum the cathode wears out or the tube arcs. The supply must " +
    "also reach the striking voltage, with the load already connected, or the tube never lights.",
  compute(input: VrTubeInput) {
    const { supplyVoltage: vs, loadCurrentMin: ilMin, loadCurrentMax: ilMax, fittedResistance } = input;
    const t = tubeFigures(input);
    const drop = vs - t.vvr;
    const seriesResistance = drop / (ilMax + t.iMin);
    const r = fittedResistance ?? seriesResistance;
    const through = drop / r;
    const atMin = through - ilMin;
    const atMax = through - ilMax;
    const resistorPower = drop * through;
    const rating = suggestedRating(resistorPower);
    const voltageBeforeStrike = ilMax > 0 ? (vs * (t.vvr / ilMax)) / (r + t.vvr / ilMax) : vs;
    const warnings: Warning[] = highVoltageWarning(vs, t.vvr, input.strikingVoltage);
    if (rating.warning) warnings.push(rating.warning);
    vrWarnings(warnings, t, { vs, ilMin, ilMax, atMin, atMax, fitted: fittedResistance !== undefined, voltageBeforeStrike });
    return {
      outputs: {
        seriesResistance,
        tubeCurrentAtMinLoad: atMin > 0 ? atMin : 0,
        tubeCurrentAtMaxLoad: atMax > 0 ? atMax : 0,
        resistorPower,
        suggestedRating: rating.rating,
        preferredResistance: preferredBelow(seriesResistance, "E12"),
        strikingVoltage: t.vStrike ?? null,
        voltageBeforeStrike,
      },
      warnings,
    };
  },
  explain(input: VrTubeInput, o) {
    const { supplyVoltage: vs, loadCurrentMin: ilMin, loadCurrentMax: ilMax, fittedResistance } = input;
    const t = tubeFigures(input);
    const v = (x: number) => texQuantity(x, "V", 4);
    const a = (x: number) => texQuantity(x, "A", 3);
    const r = fittedResistance ?? o.seriesResistance;
    const rTex = texQuantity(r, "Ω", 4);
    const which = fittedResistance === undefined ? "" : " (with the fitted resistor)";
    // A negative figure means the resistor cannot feed the load: the glow goes out and the tube carries nothing.
    const it = (x: number) => (x > 0 ? a(x) : tex`${a(x)} \Rightarrow 0\ \text{(the tube goes out)}`);
    const steps: Step[] = [
      {
        label: `Series resistance (${t.name}: ${formatQuantity(t.vvr, "V")}, ${formatQuantity(t.iMin, "A")} to ${formatQuantity(t.iMax, "A")})`,
        latex: tex`R = \frac{${v(vs)} - ${v(t.vvr)}}{${a(ilMax)} + ${a(t.iMin)}} = ${texQuantity(o.seriesResistance, "Ω", 4)}`,
      },
      {
        label: `Tube current at the greatest load${which}`,
        latex: tex`I_t = \frac{${v(vs - t.vvr)}}{${rTex}} - ${a(ilMax)} = ${it((vs - t.vvr) / r - ilMax)}`,
      },
      { label: `Tube current at the least load${which}`, latex: tex`I_t = \frac{${v(vs - t.vvr)}}{${rTex}} - ${a(ilMin)} = ${it((vs - t.vvr) / r - ilMin)}` },
      { label: `Resistor dissipation${which}`, latex: tex`P = \frac{(${v(vs - t.vvr)})^2}{${rTex}} = ${texQuantity(o.resistorPower, "W")}` },
      {
        label: "E12 value at or below (keeps full-load current at or above the minimum)",
        latex: tex`R_\text{E12} = ${texQuantity(o.preferredResistance, "Ω")}`,
      },
      {
        label: "Voltage on the tube before it strikes, full load taken as a resistance",
        latex:
          ilMax > 0
            ? tex`V = ${v(vs)} \times \frac{${texQuantity(t.vvr / ilMax, "Ω", 4)}}{${rTex} + ${texQuantity(t.vvr / ilMax, "Ω", 4)}} = ${v(o.voltageBeforeStrike)}`
            : tex`V = V_s = ${v(vs)}\ \text{(no load)}`,
      },
    ];
    return steps;
  },
});
