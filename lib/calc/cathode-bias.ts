import { bypassResistance as bypassResistanceOf, explainCathodeBias } from "./cathode-bias-explain";
import { cathodeBiasSchema, type CathodeBiasInput } from "./cathode-bias-schema";
import { formatQuantity, tex } from "./format";
import { ALWAYS_DANGER } from "./safety";
import { nearestPreferred } from "./tables/preferred-values";
import { suggestedRating } from "./tables/wattage";
import { defineCalculator, type Warning } from "./types";

export { bypassResistance } from "./cathode-bias-explain";
export { cathodeBiasSchema, type CathodeBiasInput } from "./cathode-bias-schema";

/**
 * Self (cathode) bias: the cathode resistor carries plate plus screen current, so
 * Ik = Ip + Ig2, Rk = Vk/Ik, P = Ik²·Rk. The bypass capacitor's −3 dB corner is
 * f = 1/(2π·R·Ck), where R is the resistance the capacitor sees: Rk in parallel with the
 * resistance looking into the cathode, (rp + Ra)/(µ + 1) for a triode or about 1/gm for a
 * pentode (Radiotron Designer's Handbook 4th ed., cathode bias and by-passing).
 */

// Module-level copy of what compute calls: under the CommonJS interop the benchmark runs in, every
// read of an imported binding is a getter call (as in arc-clearance.ts).
const bypassResistance = bypassResistanceOf;

export const calculator = defineCalculator({
  slug: "cathode-bias",
  title: "Cathode bias resistor",
  purpose: "The cathode resistor that sets a tube's bias, its wattage, and the bypass capacitor's corner frequency.",
  bench: {
    group: "stages",
    example: { biasVoltage: "1.5 V", plateCurrent: "1 mA", bypassCapacitance: "25 uF" },
    headlines: ["cathodeResistance", "suggestedRating"],
    // The resistor sits under a plate at B+, even when the bias typed is 1.5 V.
    alwaysDanger: true,
    chart: null,
    advanced: { title: "Tube figures, for a better bypass estimate", fields: ["amplificationFactor", "plateResistance", "plateLoad", "transconductance"] },
  },
  inputs: [
    {
      name: "biasVoltage",
      label: "Bias voltage (grid to cathode)",
      unit: "V",
      required: true,
      control: "quantity",
      quantity: "voltage",
      help: "The magnitude, e.g. 12.5 for a data sheet's −12.5 V grid; a negative figure is read as its magnitude.",
    },
    { name: "plateCurrent", label: "Plate current", unit: "A", required: true, control: "quantity", quantity: "current" },
    {
      name: "screenCurrent",
      label: "Screen current",
      unit: "A",
      required: false,
      default: 0,
      control: "quantity",
      quantity: "current",
      help: "For a tetrode or pentode; it flows through the cathode resistor too. Zero for a triode.",
    },
    {
      name: "bypassCapacitance",
      label: "Bypass capacitor",
      unit: "F",
      required: false,
      control: "quantity",
      quantity: "capacitance",
      help: "Optional: gives the low-frequency corner of the bypass.",
    },
    {
      name: "amplificationFactor",
      label: "Amplification factor µ (triode)",
      unit: "",
      required: false,
      control: "quantity",
      quantity: "ratio",
      help: "With plate resistance and plate load, for a better bypass estimate on a triode.",
    },
    { name: "plateResistance", label: "Plate resistance rp (triode)", unit: "Ω", required: false, control: "quantity", quantity: "resistance" },
    { name: "plateLoad", label: "Plate load Ra (triode)", unit: "Ω", required: false, control: "quantity", quantity: "resistance" },
    {
      name: "transconductance",
      label: "Transconductance gm (pentode)",
      unit: "S",
      required: false,
      control: "quantity",
      quantity: "conductance",
      help: "In siemens: 4100 µmho is 4.1 mS, entered as 4.1m.",
    },
  ],
  outputs: [
    { name: "cathodeCurrent", label: "Cathode current", unit: "A" },
    { name: "cathodeResistance", label: "Cathode resistance", unit: "Ω" },
    { name: "dissipation", label: "Dissipation", unit: "W" },
    { name: "suggestedRating", label: "Suggested rating (≥ 2 × dissipation)", unit: "W" },
    { name: "nearestPreferred", label: "Nearest E12 value", unit: "Ω" },
    { name: "bypassCornerFrequency", label: "Bypass corner frequency", unit: "Hz" },
  ],
  schema: cathodeBiasSchema,
  formulas: [
    { label: "Cathode current", latex: tex`I_k = I_p + I_{g2}` },
    { label: "Cathode resistance", latex: tex`R_k = \frac{V_k}{I_k}` },
    { label: "Dissipation", latex: tex`P = I_k^2 R_k` },
    {
      label: "Bypass corner",
      latex: tex`f = \frac{1}{2\pi R C_k},\quad R = R_k \parallel \frac{r_p + R_a}{\mu + 1}\ \text{(triode)},\ R_k \parallel \frac{1}{g_m}\ \text{(pentode)}`,
    },
  ],
  references: [
    {
      title: "Radiotron Designer's Handbook, 4th ed.",
      detail:
        "Chapter on resistance-capacitance coupled amplifiers: cathode bias and cathode by-pass capacitors, the resistance looking into the cathode (chapter cited from memory)",
    },
    {
      title: "Tube manufacturers' data sheets",
      detail: "Typical operation tables: plate and screen currents and cathode-bias resistor for each operating point",
    },
    { title: "IEC 60063, Preferred number series for resistors and capacitors", detail: "E12 series" },
  ],
  whyItMatters:
    "The cathode resistor sets how hard a tube conducts. Too small and the tube runs hot and wears out early, too " +
    "large and it distorts. In an old set the resistor has often drifted and its bypass electrolytic has dried " +
    "out, which costs gain and bass. Working it out from the data sheet's operating point tells you what the " +
    "parts should be, and the corner frequency tells you whether the bypass is big enough.",
  compute(input: CathodeBiasInput) {
    const { biasVoltage: vk, plateCurrent: ip, screenCurrent: ig2, bypassCapacitance: ck } = input;
    const cathodeCurrent = ip + ig2;
    const cathodeResistance = vk / cathodeCurrent;
    const dissipation = cathodeCurrent * cathodeCurrent * cathodeResistance;
    const rating = suggestedRating(dissipation);
    const pref = nearestPreferred(cathodeResistance, "E12");

    const warnings: Warning[] = [ALWAYS_DANGER];
    if (rating.warning) warnings.push(rating.warning);

    let bypassCornerFrequency: number | null = null;
    if (ck !== undefined) {
      const b = bypassResistance(cathodeResistance, input);
      bypassCornerFrequency = 1 / (2 * Math.PI * b.r * ck);
      if (b.model === "rk") {
        warnings.push({
          level: "caution",
          message:
            "Without the tube's figures (µ, rp and plate load for a triode, or gm for a pentode) the corner uses Rk alone. " +
            "The tube's cathode lowers the resistance the capacitor sees, so Rk alone underestimates the corner frequency: the real corner is higher.",
        });
      }
      if (bypassCornerFrequency > 20) {
        warnings.push({
          level: "info",
          message: `The bypass corner is ${formatQuantity(bypassCornerFrequency, "Hz")}; for full bass in an audio stage it is usually put well below 20 Hz.`,
        });
      }
    } else if (input.transconductance !== undefined || input.amplificationFactor !== undefined) {
      warnings.push({ level: "info", message: "The tube's figures are used only for the bypass estimate; enter a bypass capacitor to see it." });
    }
    warnings.push({
      level: "info",
      message: "Measure the bias across the fitted resistor with the set running; an old bypass electrolytic should be replaced at the same time.",
    });

    return {
      outputs: {
        cathodeCurrent,
        cathodeResistance,
        dissipation,
        suggestedRating: rating.rating,
        nearestPreferred: pref,
        bypassCornerFrequency,
      },
      warnings,
    };
  },
  explain: (input: CathodeBiasInput, o) => explainCathodeBias(input, o),
});
