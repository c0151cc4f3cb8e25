import { tex } from "./format";
import { highVoltageWarning } from "./safety";
import { preferredBelow } from "./tables/preferred-values";
import { VR_SOURCE, VR_TYPES } from "./tables/vr-tubes";
import { suggestedRating } from "./tables/wattage";
import { defineCalculator, type Warning } from "./types";
import { explainVrTube } from "./vr-tube-explain";
import { tubeFigures as tubeFiguresOf, vrTubeSchema, type VrTubeInput } from "./vr-tube-schema";
import { vrWarnings as vrWarningsOf } from "./vr-tube-warnings";

export { tubeFigures, vrTubeSchema, type VrTubeInput } from "./vr-tube-schema";

/**
 * Series resistor for a glow-discharge VR tube (shunt regulator): R = (Vs − Vvr)/(I_L,max + I_t,min),
 * so at full load the tube still carries its minimum; at lighter loads the tube takes what the load
 * leaves, I_t = (Vs − Vvr)/R − I_L (Radiotron Designer's Handbook, gaseous regulator tubes; RCA receiving
 * tube manual, VR tube application notes; both from memory). Before the tube strikes the load hangs
 * straight on the resistor, so the tube sees the divider Vs·R_L/(R + R_L), R_L = Vvr/I_L,max.
 */

// Module-level copies of what compute reads: under the CommonJS interop the benchmark runs in, every
// read of an imported binding is a getter call (as in arc-clearance.ts).
const tubeFigures = tubeFiguresOf;
const vrWarnings = vrWarningsOf;

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
  explain: (input: VrTubeInput, o) => explainVrTube(input, o),
});
