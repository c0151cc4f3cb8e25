import { tex } from "./format";
import { stageFigures, type StageResult } from "./ripple-stages";
import { ALWAYS_DANGER } from "./safety";
import { explainSupplyRipple } from "./supply-ripple-explain";
import { RECTIFIERS, supplyRippleSchema, type SupplyRippleInput } from "./supply-ripple-schema";
import { rippleWarnings } from "./supply-ripple-warnings";
import { RECTIFIER_TYPES } from "./tables/rectifiers";
import { defineCalculator, type OutputValue, type Warning } from "./types";

export { RECTIFIERS, supplyRippleSchema, type SupplyRippleInput } from "./supply-ripple-schema";

/**
 * Ripple of a capacitor-input filter and the smoothing stages after it.
 * Reservoir: Vpp ≈ I/(f_ripple·C), a sawtooth with rms Vpp/(2√3) (Radiotron Designer's Handbook 4th ed.,
 * capacitor-input filters; ARRL Handbook, power supplies). The stages are in lib/calc/ripple-stages.ts.
 */

function rippleFrequencyOf(line: number, rectifier: (typeof RECTIFIERS)[number]): number {
  return rectifier === "full-wave" ? 2 * line : line;
}

export const calculator = defineCalculator({
  slug: "supply-ripple",
  title: "Supply ripple",
  purpose: "The hum left on B+ by a capacitor-input filter, and how much each RC or LC stage after it removes.",
  bench: {
    group: "supplies",
    example: {
      loadCurrent: "60 mA",
      capacitance: "40 uF",
      rectifier: "full-wave",
      // A 5Y3GT with the 40 µF a recap often fits: the page shows the data sheet's 20 µF limit straight away.
      rectifierTube: "5Y3GT",
      stages: [{ kind: "rc", resistance: "470", capacitance: "20 uF" }],
    },
    headlines: ["rippleRms", "finalRippleRms"],
    // The ripple filter is the B+ supply itself, even when the figures typed are a load current.
    alwaysDanger: true,
    chart: "ripple",
  },
  inputs: [
    {
      name: "loadCurrent",
      label: "Load current",
      unit: "A",
      required: true,
      control: "quantity",
      quantity: "current",
      help: "Total DC current the supply delivers.",
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
      name: "rectifier",
      label: "Rectifier",
      unit: "",
      required: true,
      control: "select",
      options: RECTIFIERS,
      help: "Full-wave (two diodes or a bridge, or a 5Y3-type tube) ripples at twice the mains frequency.",
    },
    {
      name: "rectifierTube",
      label: "Rectifier tube (optional)",
      unit: "",
      required: false,
      control: "select",
      options: RECTIFIER_TYPES,
      blankLabel: "Not given",
      help: "Checks the reservoir and load current against the tube's data-sheet limits.",
    },
    {
      name: "stages",
      label: "Filter stages",
      unit: "",
      required: false,
      control: "list",
      help: 'Each stage: { kind: "rc", resistance, capacitance } or { kind: "lc", inductance, capacitance, resistance (the choke\'s DC resistance, 100 Ω if blank) }, in order after the reservoir; each may give current (its own DC load, the whole load current if blank).',
    },
  ],
  outputs: [
    { name: "rippleFrequency", label: "Ripple frequency", unit: "Hz" },
    { name: "ripplePeakToPeak", label: "Ripple on the reservoir, peak to peak", unit: "V" },
    { name: "rippleRms", label: "Ripple on the reservoir, rms", unit: "V" },
    { name: "stages", label: "Each stage: attenuation, ripple after it (rms), DC drop", unit: "" },
    { name: "finalRippleRms", label: "Ripple at the output, rms", unit: "V" },
  ],
  schema: supplyRippleSchema,
  formulas: [
    { label: "Ripple frequency", latex: tex`f_r = 2f \;(\text{full-wave}), \quad f_r = f \;(\text{half-wave})` },
    { label: "Reservoir ripple", latex: tex`V_{pp} = \frac{I}{f_r\,C}, \quad V_{rms} = \frac{V_{pp}}{2\sqrt{3}}` },
    { label: "RC stage", latex: tex`\frac{V_{out}}{V_{in}} = \frac{X_C}{\sqrt{R^2 + X_C^2}}, \quad X_C = \frac{1}{2\pi f_r C}, \quad \Delta V_{dc} = I_n R` },
    {
      label: "LC stage (choke of resistance R)",
      latex: tex`\frac{V_{out}}{V_{in}} = \frac{1}{\sqrt{(1 - \omega^2 LC)^2 + (\omega R C)^2}}, \quad \omega = 2\pi f_r, \quad \Delta V_{dc} = I_n R`,
    },
    { label: "LC resonance and its peak", latex: tex`f_0 = \frac{1}{2\pi\sqrt{LC}}, \quad Q = \frac{1}{R}\sqrt{\frac{L}{C}}` },
  ],
  references: [
    {
      title: "Radiotron Designer's Handbook, 4th ed.",
      detail:
        "Ch. 30, rectification: capacitor-input filter and reservoir ripple; ch. 34, smoothing filters: RC and LC sections, resonance of the LC section (chapter numbers from memory)",
    },
    {
      title: "The ARRL Handbook for Radio Communications",
      detail: "Power supplies chapter: capacitor-input filters, ripple, choke resistance, choke-input filters and critical inductance",
    },
    {
      title: "Rectifier tube data sheets (RCA receiving tube manual and makers' sheets)",
      detail: "Maximum filter-input capacitor and DC output current of each type (from memory)",
    },
  ],
  whyItMatters:
    "Hum in a restored set usually means too much ripple on B+: a dried-out reservoir or filter capacitor, or a " +
    "replacement that is too small. Knowing roughly how much ripple each stage should leave tells you whether a " +
    "value is reasonable before you fit it, and which stage to suspect when the hum stays. A reservoir far larger " +
    "than the original can also overwork a rectifier tube.",
  compute(input: SupplyRippleInput) {
    const { loadCurrent: i, capacitance: c, lineFrequency: f, rectifier } = input;
    const stagesIn = input.stages ?? [];
    const fr = rippleFrequencyOf(f, rectifier);
    const omega = 2 * Math.PI * fr;
    const vpp = i / (fr * c);
    const rippleRms = vpp / (2 * Math.sqrt(3));
    let ripple = rippleRms;
    const stages: StageResult[] = [];
    for (const s of stagesIn) {
      // Each stage's own DC current (later stages usually feed only the preamp); blank means all of it.
      const out = stageFigures(s, omega, s.current ?? i);
      ripple *= out.attenuation;
      out.rippleRms = ripple;
      stages.push(out);
    }
    // No voltage is an input here, but a B+ filter is a high-voltage circuit by nature: always danger.
    const warnings: Warning[] = [ALWAYS_DANGER];
    rippleWarnings(input, fr, stages, warnings);
    return {
      outputs: { rippleFrequency: fr, ripplePeakToPeak: vpp, rippleRms, stages: stages as { [key: string]: OutputValue }[], finalRippleRms: ripple },
      warnings,
    };
  },
  explain: (input: SupplyRippleInput, o) => explainSupplyRipple(input, o),
});
