import { z } from "zod";
import { formatQuantity, texQuantity, tex } from "./format";
import { ALWAYS_DANGER } from "./safety";
import { nearestPreferred } from "./tables/preferred-values";
import { suggestedRating } from "./tables/wattage";
import { defineCalculator, type Step, type Warning } from "./types";
import { optionalQuantity, quantity, quantityWithDefault } from "./units";

/**
 * Self (cathode) bias: the cathode resistor carries plate plus screen current, so
 * Ik = Ip + Ig2, Rk = Vk/Ik, P = Ik²·Rk. The bypass capacitor's −3 dB corner is
 * f = 1/(2π·R·Ck), where R is the resistance the capacitor sees: Rk in parallel with the
 * resistance looking into the cathode, (rp + Ra)/(µ + 1) for a triode or about 1/gm for a
 * pentode (Radiotron Designer's Handbook 4th ed., cathode bias and by-passing).
 */

const OPTIONAL = { positive: true } as const;

export const cathodeBiasSchema = z
  .object({
    biasVoltage: quantity("voltage", { min: -1e4, max: 1e4, label: "Bias voltage" }).transform((v, ctx) => {
      if (v === 0) {
        ctx.addIssue({ code: "custom", message: "Bias voltage must not be zero" });
        return z.NEVER;
      }
      return Math.abs(v); // a data sheet's "−12.5 V grid" is taken as its magnitude
    }),
    plateCurrent: quantity("current", { positive: true, min: 1e-9, max: 10, label: "Plate current" }),
    screenCurrent: quantityWithDefault("current", 0, { nonNegative: true, max: 10, label: "Screen current" }).prefault(""),
    bypassCapacitance: optionalQuantity("capacitance", { ...OPTIONAL, min: 1e-12, max: 1, label: "Bypass capacitance" }).optional(),
    amplificationFactor: optionalQuantity("ratio", { ...OPTIONAL, max: 1e4, label: "Amplification factor" }).optional(),
    plateResistance: optionalQuantity("resistance", { ...OPTIONAL, min: 1, max: 1e9, label: "Plate resistance" }).optional(),
    plateLoad: optionalQuantity("resistance", { nonNegative: true, max: 1e9, label: "Plate load" }).optional(),
    transconductance: optionalQuantity("conductance", { ...OPTIONAL, min: 1e-7, max: 10, label: "Transconductance" }).optional(),
  })
  .superRefine((v, ctx) => {
    const triode = ["amplificationFactor", "plateResistance", "plateLoad"] as const;
    const given = triode.filter((n) => v[n] !== undefined);
    if (given.length > 0 && given.length < 3) {
      for (const n of triode.filter((m) => v[m] === undefined)) {
        ctx.addIssue({
          code: "custom",
          path: [n],
          message: "For the triode estimate give amplification factor, plate resistance and plate load together",
        });
      }
    }
    if (given.length > 0 && v.transconductance !== undefined) {
      ctx.addIssue({
        code: "custom",
        path: ["transconductance"],
        message: "Give either the triode figures (µ, rp, plate load) or the transconductance, not both",
      });
    }
  });

export type CathodeBiasInput = z.output<typeof cathodeBiasSchema>;

/** Resistance the bypass capacitor sees, and which model gave it. */
export function bypassResistance(rk: number, input: CathodeBiasInput): { r: number; model: "triode" | "pentode" | "rk"; rCathode?: number } {
  const { amplificationFactor: mu, plateResistance: rp, plateLoad: ra, transconductance: gm } = input;
  if (mu !== undefined && rp !== undefined && ra !== undefined) {
    const rc = (rp + ra) / (mu + 1);
    return { r: (rk * rc) / (rk + rc), model: "triode", rCathode: rc };
  }
  if (gm !== undefined) {
    const rc = 1 / gm;
    return { r: (rk * rc) / (rk + rc), model: "pentode", rCathode: rc };
  }
  return { r: rk, model: "rk" };
}

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
  explain(input: CathodeBiasInput, o) {
    const { biasVoltage: vk, plateCurrent: ip, screenCurrent: ig2, bypassCapacitance: ck } = input;
    const { cathodeCurrent, cathodeResistance, dissipation, nearestPreferred: pref } = o;
    const steps: Step[] = [
      {
        label: "Cathode current",
        latex: tex`I_k = ${texQuantity(ip, "A", 4)} + ${texQuantity(ig2, "A", 4)} = ${texQuantity(cathodeCurrent, "A", 4)}`,
      },
      {
        label: "Cathode resistance",
        latex: tex`R_k = \frac{${texQuantity(vk, "V", 4)}}{${texQuantity(cathodeCurrent, "A", 4)}} = ${texQuantity(cathodeResistance, "Ω", 4)}`,
      },
      {
        label: "Dissipation",
        latex: tex`P = (${texQuantity(cathodeCurrent, "A", 4)})^2 \times ${texQuantity(cathodeResistance, "Ω", 4)} = ${texQuantity(dissipation, "W")}`,
      },
      {
        label: "Suggested rating",
        latex:
          o.suggestedRating === null
            ? tex`2P = ${texQuantity(2 * dissipation, "W")}\ \text{(beyond the standard ratings)}`
            : tex`2P = ${texQuantity(2 * dissipation, "W")} \Rightarrow ${texQuantity(o.suggestedRating, "W")}`,
      },
      {
        label: "Nearest E12 value and the bias it gives at the same current",
        latex: tex`R_\text{pref} = ${texQuantity(pref, "Ω")},\quad V_k' \approx ${texQuantity(pref * cathodeCurrent, "V")}`,
      },
    ];
    if (ck === undefined || o.bypassCornerFrequency === null) return steps;
    const b = bypassResistance(cathodeResistance, input);
    if (b.model === "triode") {
      steps.push({
        label: "Resistance looking into the cathode (triode)",
        latex: tex`\frac{r_p + R_a}{\mu + 1} = \frac{${texQuantity(input.plateResistance as number, "Ω")} + ${texQuantity(input.plateLoad as number, "Ω")}}{${input.amplificationFactor} + 1} = ${texQuantity(b.rCathode as number, "Ω")}`,
      });
    } else if (b.model === "pentode") {
      steps.push({
        label: "Resistance looking into the cathode (pentode)",
        latex: tex`\frac{1}{g_m} = \frac{1}{${texQuantity(input.transconductance as number, "S")}} = ${texQuantity(b.rCathode as number, "Ω")}`,
      });
    }
    if (b.model !== "rk") {
      steps.push({
        label: "Resistance the capacitor sees",
        latex: tex`R = ${texQuantity(cathodeResistance, "Ω")} \parallel ${texQuantity(b.rCathode as number, "Ω")} = ${texQuantity(b.r, "Ω")}`,
      });
    }
    steps.push({
      label: "Bypass corner frequency",
      latex: tex`f = \frac{1}{2\pi \times ${texQuantity(b.r, "Ω")} \times ${texQuantity(ck, "F")}} = ${texQuantity(o.bypassCornerFrequency, "Hz")}`,
    });
    return steps;
  },
});
