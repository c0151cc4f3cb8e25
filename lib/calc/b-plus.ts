import { B_PLUS_RECTIFIERS, bPlusSchema, TUBES as TUBES_BY_TYPE, type BPlusInput, type Circuit } from "./b-plus-schema";
import * as advice from "./b-plus-warnings";
import { formatQuantity, texQuantity, tex } from "./format";
import { highVoltageWarning } from "./safety";
import { RECTIFIER_SOURCE, RECTIFIER_TYPES, type RectifierEntry } from "./tables/rectifiers";
import { defineCalculator, type Step, type Warning } from "./types";

export { B_PLUS_RECTIFIERS, bPlusSchema, type BPlusInput } from "./b-plus-schema";

// Module-level copies of what compute reads: under the CommonJS interop the benchmark runs in, every
// read of an imported binding is a getter call (as in arc-clearance.ts).
const TUBES = TUBES_BY_TYPE;
const { BIG_RIPPLE, ESTIMATE, NO_DROP, rippleWarning, tubeWarnings } = advice;

/**
 * B+ from a transformer, rectifier and reservoir capacitor: the textbook capacitor-input estimate
 * V_dc ≈ √2·V_rms − rectifier drop − I·R_winding − V_pp/2, with V_pp = I/(f_r·C) (Radiotron Designer's
 * Handbook 4th ed., rectification and capacitor-input filters; Floyd, Electronic Devices, the filtered
 * rectifier). A tube's drop is its data-sheet figure scaled by Child's three-halves-power law,
 * I ∝ V^(3/2), so V ∝ I^(2/3) (any electronics-physics text, from memory).
 */

const rippleFrequencyOf = (f: number, rectifier: Circuit) => (rectifier === "half-wave" ? f : 2 * f);
/** Drop of one rectifier at the load current: the given figure, or the tube's scaled as I^(2/3). */
function dropOf(input: BPlusInput, tube: RectifierEntry | undefined): number {
  if (tube) return tube.tubeDrop * Math.cbrt((input.loadCurrent / tube.tubeDropCurrent) ** 2);
  return input.rectifierDrop ?? 0;
}

export const calculator = defineCalculator({
  slug: "b-plus",
  title: "B+ from the transformer",
  purpose: "The DC a transformer, rectifier and reservoir capacitor give under load, and its ripple.",
  bench: {
    group: "supplies",
    example: { secondaryVoltage: "350 V", rectifier: "full-wave", rectifierTube: "5Y3GT", loadCurrent: "90 mA", capacitance: "20 uF" },
    headlines: ["dcOutput", "ripplePeakToPeak"],
    alwaysDanger: false,
    chart: null,
  },
  inputs: [
    {
      name: "secondaryVoltage",
      label: "Secondary voltage (rms)",
      unit: "V",
      required: true,
      control: "quantity",
      quantity: "voltage",
      help: "For a centre-tapped full-wave circuit, each half (centre tap to one end, the 350 of 350-0-350).",
    },
    {
      name: "rectifier",
      label: "Rectifier circuit",
      unit: "",
      required: true,
      control: "select",
      options: B_PLUS_RECTIFIERS,
      help: "Full-wave here means a centre-tapped winding with two rectifiers (or one two-plate tube).",
    },
    {
      name: "rectifierTube",
      label: "Rectifier tube",
      unit: "",
      required: false,
      control: "select",
      options: RECTIFIER_TYPES,
      blankLabel: "None: enter the drop below",
      help: "From the built-in table: its drop, rated current and largest reservoir capacitor are used.",
    },
    {
      name: "rectifierDrop",
      label: "Rectifier drop",
      unit: "V",
      required: false,
      control: "quantity",
      quantity: "voltage",
      help: "Or the drop of one rectifier at this current (a bridge counts two).",
    },
    {
      name: "loadCurrent",
      label: "Load current",
      unit: "A",
      required: true,
      control: "quantity",
      quantity: "current",
      help: "Total DC current: every plate, screen and bleeder.",
    },
    {
      name: "capacitance",
      label: "Reservoir capacitance",
      unit: "F",
      required: true,
      control: "quantity",
      quantity: "capacitance",
      help: "The first capacitor after the rectifier.",
    },
    { name: "lineFrequency", label: "Mains frequency", unit: "Hz", required: false, default: 60, control: "quantity", quantity: "frequency" },
    {
      name: "windingResistance",
      label: "Winding resistance",
      unit: "Ω",
      required: false,
      default: 0,
      control: "quantity",
      quantity: "resistance",
      help: "DC resistance of the winding in the current's path (one half for centre-tapped).",
    },
  ],
  outputs: [
    { name: "peakVoltage", label: "Peak of the secondary", unit: "V" },
    { name: "rippleFrequency", label: "Ripple frequency", unit: "Hz" },
    { name: "ripplePeakToPeak", label: "Ripple, peak to peak", unit: "V" },
    { name: "rectifierVoltageDrop", label: "Rectifier drop at this current", unit: "V" },
    { name: "dcOutput", label: "B+ under load (estimate)", unit: "V" },
    { name: "maxReservoirCapacitance", label: "Largest reservoir the tube allows", unit: "F" },
  ],
  schema: bPlusSchema,
  formulas: [
    { label: "Peak", latex: tex`V_{pk} = \sqrt{2}\,V_{rms}` },
    { label: "Ripple", latex: tex`f_r = 2f\ (\text{full-wave, bridge}),\ f\ (\text{half-wave}); \quad V_{pp} = \frac{I}{f_r\,C}` },
    { label: "Tube drop at the load current", latex: tex`V_t = V_{t,0} \left(\frac{I}{I_0}\right)^{2/3}` },
    { label: "B+ under load", latex: tex`V_{dc} \approx V_{pk} - n\,V_t - I\,R_w - \frac{V_{pp}}{2}, \quad n = 2\ \text{for a bridge}` },
  ],
  references: [
    {
      title: "Radiotron Designer's Handbook, 4th ed.",
      detail: "Rectification chapter: capacitor-input filters, regulation and the rectifier's peak-current limits (chapter cited from memory)",
    },
    { title: "Floyd, Electronic Devices", detail: "Power supplies chapter: the capacitor-input filter, V_r(pp) and V_DC ≈ V_p − V_r(pp)/2 (from memory)" },
    { title: "Built-in rectifier table", detail: RECTIFIER_SOURCE },
  ],
  whyItMatters:
    "A restored set's B+ is the first reading that says whether the supply is right. Knowing what to expect from the " +
    "transformer, the rectifier and the reservoir tells you whether a low reading means a tired rectifier or a heavy load, " +
    "and a larger reservoir than the rectifier tube's data sheet allows shortens the tube's life — or makes it arc.",
  compute(input: BPlusInput) {
    const { secondaryVoltage: vs, rectifier, loadCurrent: i, capacitance: c, lineFrequency: f, windingResistance: rw } = input;
    const tube = input.rectifierTube === undefined ? undefined : TUBES.get(input.rectifierTube);
    const peakVoltage = Math.SQRT2 * vs;
    const rippleFrequency = rippleFrequencyOf(f, rectifier);
    const ripplePeakToPeak = i / (rippleFrequency * c);
    const rectifierVoltageDrop = (rectifier === "bridge" ? 2 : 1) * dropOf(input, tube);
    const charged = peakVoltage - rectifierVoltageDrop - i * rw;
    const raw = charged - ripplePeakToPeak / 2;
    const dcOutput = raw > 0 ? raw : 0;

    const warnings: Warning[] = highVoltageWarning(vs, peakVoltage);
    warnings.push(ESTIMATE);
    if (!tube && input.rectifierDrop === undefined) warnings.push(NO_DROP);
    if (raw <= 0 || ripplePeakToPeak > BIG_RIPPLE * charged) warnings.push(rippleWarning(ripplePeakToPeak, charged));
    if (tube) tubeWarnings(warnings, tube, { c, i, peakVoltage, charged });
    return {
      outputs: {
        peakVoltage,
        rippleFrequency,
        ripplePeakToPeak,
        rectifierVoltageDrop,
        dcOutput,
        maxReservoirCapacitance: tube ? tube.maxInputCapacitance : null,
      },
      warnings,
    };
  },
  explain(input: BPlusInput, o) {
    const { secondaryVoltage: vs, rectifier, loadCurrent: i, capacitance: c, lineFrequency: f, windingResistance: rw } = input;
    const tube = input.rectifierTube === undefined ? undefined : TUBES.get(input.rectifierTube);
    const steps: Step[] = [
      { label: "Peak of the secondary", latex: tex`V_{pk} = \sqrt{2} \times ${texQuantity(vs, "V", 4)} = ${texQuantity(o.peakVoltage, "V", 4)}` },
      {
        label: "Ripple frequency",
        latex:
          rectifier === "half-wave"
            ? tex`f_r = f = ${texQuantity(f, "Hz")}`
            : tex`f_r = 2f = 2 \times ${texQuantity(f, "Hz")} = ${texQuantity(o.rippleFrequency, "Hz")}`,
      },
      {
        label: "Ripple on the reservoir, peak to peak",
        latex: tex`V_{pp} = \frac{I}{f_r\,C} = \frac{${texQuantity(i, "A")}}{${texQuantity(o.rippleFrequency, "Hz")} \times ${texQuantity(c, "F")}} = ${texQuantity(o.ripplePeakToPeak, "V")}`,
      },
    ];
    const n = rectifier === "bridge" ? tex`2 \times ` : "";
    steps.push(
      tube
        ? {
            label: `${tube.type} drop at this current (data sheet: ${formatQuantity(tube.tubeDrop, "V")} at ${formatQuantity(tube.tubeDropCurrent, "A")})`,
            latex: tex`V_t = ${texQuantity(tube.tubeDrop, "V")} \times \left(\frac{${texQuantity(i, "A")}}{${texQuantity(tube.tubeDropCurrent, "A")}}\right)^{2/3} = ${texQuantity(o.rectifierVoltageDrop, "V")}`,
          }
        : { label: "Rectifier drop", latex: tex`${n}${texQuantity(input.rectifierDrop ?? 0, "V")} = ${texQuantity(o.rectifierVoltageDrop, "V")}` },
      {
        label: "B+ under load (estimate)",
        latex: tex`V_{dc} \approx ${texQuantity(o.peakVoltage, "V", 4)} - ${texQuantity(o.rectifierVoltageDrop, "V")} - ${texQuantity(i, "A")} \times ${texQuantity(rw, "Ω")} - \frac{${texQuantity(o.ripplePeakToPeak, "V")}}{2} = ${texQuantity(o.dcOutput, "V", 4)}`,
      },
    );
    if (o.maxReservoirCapacitance !== null && tube) {
      steps.push({ label: `Largest reservoir the ${tube.type} allows`, latex: tex`C \le ${texQuantity(o.maxReservoirCapacitance, "F")}` });
    }
    return steps;
  },
});
