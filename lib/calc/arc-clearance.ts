import { z } from "zod";
import { formatQuantity, texQuantity, tex } from "./format";
import { ALWAYS_DANGER } from "./safety";
import { defineCalculator, type Step, type Warning } from "./types";
import { optionalQuantity, quantity, quantityWithDefault } from "./units";

/**
 * Uniform-field breakdown of air, corrected for relative air density:
 *   δ = (p/101325)·(293.15/T),   V_b [kV] = 24.22·δd + 6.08·√(δd),  d in cm
 * (Kuffel, Zaengl & Kuffel, High Voltage Engineering Fundamentals, 2nd ed., ch. 5, breakdown of
 * uniform-field gaps in air; constants recalled from memory). The inverse is a quadratic in √(δd).
 */

const A = 24.22; // kV per cm
const B = 6.08; // kV per √cm
const P0 = 101_325;
const T0 = 293.15;
/** Below this δ·d (cm) the gap is down among the Paschen minimum, where the fit no longer holds. */
const FIT_MIN_REDUCED_GAP_CM = 0.01;
/** Smallest gap we compute at all. */
const MIN_GAP_M = 10e-6;
/** Minimum sparking voltage of air (Paschen minimum), Kuffel, Zaengl & Kuffel table of gases — from memory. */
const PASCHEN_MIN_V = 327;

const P_MIN = 10e3;
const P_MAX = 1e6;
const T_MIN = 150;
const T_MAX = 1000;

export const arcClearanceSchema = z
  .object({
    peakVoltage: quantity("voltage", { positive: true, max: 1e6, label: "Peak voltage" }),
    gap: optionalQuantity("length", { positive: true, max: 10, label: "Gap" }).optional(),
    pressure: quantityWithDefault("pressure", P0, { positive: true, label: "Pressure" }).default(P0),
    temperature: quantityWithDefault("temperature", T0, { positive: true, label: "Temperature" }).default(T0),
    safetyFactor: quantityWithDefault("ratio", 2, { min: 1, max: 100, label: "Safety factor" }).default(2),
  })
  .superRefine((v, ctx) => {
    if (v.gap !== undefined && v.gap < MIN_GAP_M) {
      ctx.addIssue({
        code: "custom",
        path: ["gap"],
        message: "Gap must be at least 10 µm: below a few tens of µm in air the uniform-field (Paschen) formula does not hold",
      });
    }
    if (v.pressure < P_MIN || v.pressure > P_MAX) {
      ctx.addIssue({ code: "custom", path: ["pressure"], message: "Pressure must be between 10 kPa and 1 MPa (sea level is 101.325 kPa)" });
    }
    if (v.temperature < T_MIN || v.temperature > T_MAX) {
      ctx.addIssue({ code: "custom", path: ["temperature"], message: "Temperature must be between 150 K and 1000 K (20 °C is 293.15 K)" });
    }
  });

export type ArcClearanceInput = z.output<typeof arcClearanceSchema>;

export function relativeAirDensity(pressure: number, temperature: number): number {
  return (pressure / P0) * (T0 / temperature);
}

/** Uniform-field breakdown voltage in volts for a gap in metres. */
export function breakdownVolts(gapM: number, delta: number): number {
  const x = delta * gapM * 100; // δ·d in cm
  return 1000 * (A * x + B * Math.sqrt(x));
}

/** The gap in metres whose uniform-field breakdown is `volts`: the positive root of A·s² + B·s = V_kV, s = √(δd). */
export function gapForVolts(volts: number, delta: number): number {
  const kv = volts / 1000;
  // 2c/(b + √(b² + 4ac)) avoids cancellation at small voltages
  const s = (2 * kv) / (B + Math.sqrt(B * B + 4 * A * kv));
  return (s * s) / delta / 100;
}

export const calculator = defineCalculator({
  slug: "arc-clearance",
  title: "Arc clearance in air",
  purpose: "Whether a high-voltage gap will flash over, and the air gap a peak voltage needs.",
  group: "safety",
  inputs: [
    { name: "peakVoltage", label: "Peak voltage", unit: "V", required: true, control: "quantity", quantity: "voltage", help: "The highest instantaneous voltage across the gap; for sine-wave AC that is 1.414 × the rms value." },
    { name: "gap", label: "Gap", unit: "m", required: false, control: "quantity", quantity: "length", help: "Optional: the air gap to check, e.g. \"3 mm\"." },
    { name: "pressure", label: "Air pressure", unit: "Pa", required: false, default: P0, control: "quantity", quantity: "pressure", help: "101.325 kPa at sea level; lower at altitude, where air breaks down more easily." },
    { name: "temperature", label: "Air temperature", unit: "K", required: false, default: T0, control: "quantity", quantity: "temperature", help: "In kelvin, or in degrees Celsius such as \"20 °C\"." },
    { name: "safetyFactor", label: "Safety factor", unit: "", required: false, default: 2, control: "quantity", quantity: "ratio", help: "Multiplies the bare minimum gap; at least 1." },
  ],
  outputs: [
    { name: "relativeAirDensity", label: "Relative air density δ", unit: "" },
    { name: "breakdownVoltage", label: "Breakdown voltage of the gap", unit: "V" },
    { name: "willArc", label: "Gap will arc", unit: "" },
    { name: "minimumGap", label: "Minimum gap (uniform field)", unit: "m" },
    { name: "recommendedClearance", label: "Recommended clearance", unit: "m" },
  ],
  schema: arcClearanceSchema,
  formulas: [
    { label: "Relative air density", latex: tex`\delta = \frac{p}{101.325\,\mathrm{kPa}} \cdot \frac{293.15\,\mathrm{K}}{T}` },
    { label: "Uniform-field breakdown (d in cm)", latex: tex`V_b = 24.22\,\delta d + 6.08\sqrt{\delta d}\;\mathrm{kV}` },
    { label: "Minimum gap", latex: tex`\sqrt{\delta d} = \frac{-6.08 + \sqrt{6.08^2 + 4 \cdot 24.22\,V}}{2 \cdot 24.22}, \quad d = \frac{(\sqrt{\delta d})^2}{\delta}` },
    { label: "Recommended clearance", latex: tex`d_{rec} = k\,d_{min}` },
  ],
  references: [
    {
      title: "Kuffel, Zaengl & Kuffel, High Voltage Engineering Fundamentals, 2nd ed.",
      detail: "Ch. 5, electrical breakdown in gases: Paschen's law, breakdown of uniform-field gaps in air, V_b = 24.22·δd + 6.08·√(δd) kV with d in cm, relative air density δ (constants and chapter cited from memory)",
    },
    {
      title: "IEC 60664-1, Insulation coordination for equipment within low-voltage systems",
      detail: "Clearance and creepage distances: the rules that govern a real layout, which this estimate does not replace",
    },
  ],
  whyItMatters:
    "A television's picture-tube supply runs at many kilovolts, and even a radio's B+ can jump a surprisingly " +
    "small gap when the air is thin or the surface is dirty. This gives the gap at which clean air between flat " +
    "electrodes would just break down — the best case. Real wiring has points and edges, so treat the figure as " +
    "a floor, keep well clear of it, and follow the safety standard's clearances.",
  compute(input: ArcClearanceInput) {
    const { peakVoltage: v, gap, pressure: p, temperature: t, safetyFactor: k } = input;
    const delta = relativeAirDensity(p, t);
    const minimumGap = gapForVolts(v, delta);
    const recommendedClearance = minimumGap * k;
    const breakdownVoltage = gap === undefined ? null : breakdownVolts(gap, delta);
    const willArc = breakdownVoltage === null ? null : v >= breakdownVoltage;

    const warnings: Warning[] = [
      ALWAYS_DANGER,
      {
        level: "caution",
        message:
          "Sharp points, dust, dirt and humidity lower the breakdown voltage, and real layouts are non-uniform fields that break down " +
          "well below these figures. This is no substitute for the clearance and creepage rules of the applicable safety standard " +
          "(e.g. IEC 60664-1) and local codes, and never a guarantee.",
      },
    ];
    if (willArc) {
      warnings.push({
        level: "danger",
        message: `This gap is expected to arc even in clean air between flat electrodes: it breaks down at about ${formatQuantity(breakdownVoltage!, "V")}.`,
      });
    }
    const smallest = Math.min(delta * minimumGap, gap === undefined ? Infinity : delta * gap) * 100;
    if (smallest < FIT_MIN_REDUCED_GAP_CM) {
      warnings.push({
        level: "caution",
        message:
          "At this spacing (under about 0.1 mm in sea-level air) the gap is near the Paschen minimum, where the formula no longer holds; " +
          "below a few tens of µm breakdown does not follow Paschen's law at all.",
      });
    }
    if (v < PASCHEN_MIN_V) {
      warnings.push({
        level: "info",
        message:
          `Below about ${PASCHEN_MIN_V} V (the Paschen minimum of air) a clean uniform air gap does not break down at any spacing; ` +
          "the small gap shown is the formula's, and surfaces can still fail by tracking.",
      });
    }

    return { outputs: { relativeAirDensity: delta, breakdownVoltage, willArc, minimumGap, recommendedClearance }, warnings };
  },
  explain(input: ArcClearanceInput, o) {
    const { peakVoltage: v, gap, pressure: p, temperature: t, safetyFactor: k } = input;
    const { relativeAirDensity: delta, breakdownVoltage, willArc, minimumGap, recommendedClearance } = o;
    const sqrtDd = Math.sqrt(delta * minimumGap * 100);
    const steps: Step[] = [
      {
        label: "Relative air density",
        latex: tex`\delta = \frac{${texQuantity(p / 1000, "kPa", 6)}}{101.325\,\mathrm{kPa}} \cdot \frac{293.15\,\mathrm{K}}{${texQuantity(t, "K", 5)}} = ${delta.toPrecision(4)}`,
      },
    ];
    if (gap !== undefined && breakdownVoltage !== null) {
      const dcm = gap * 100;
      steps.push(
        {
          label: "Breakdown voltage of the gap",
          latex: tex`V_b = 24.22 \times ${delta.toPrecision(4)} \times ${dcm.toPrecision(4)} + 6.08\sqrt{${delta.toPrecision(4)} \times ${dcm.toPrecision(4)}} = ${texQuantity(breakdownVoltage, "V")}`,
        },
        {
          label: willArc ? "The gap arcs" : "The gap holds",
          latex: tex`${texQuantity(v, "V")} ${willArc ? "\\ge" : "<"} ${texQuantity(breakdownVoltage, "V")}`,
        },
      );
    }
    steps.push(
      {
        label: "Minimum gap for the peak voltage",
        latex: tex`\sqrt{\delta d} = \frac{-6.08 + \sqrt{6.08^2 + 4 \times 24.22 \times ${(v / 1000).toPrecision(4)}}}{2 \times 24.22} = ${sqrtDd.toPrecision(4)}, \quad d = \frac{${sqrtDd.toPrecision(4)}^2}{${delta.toPrecision(4)}}\,\mathrm{cm} = ${texQuantity(minimumGap, "m")}`,
      },
      {
        label: "Recommended clearance",
        latex: tex`d_{rec} = ${k} \times ${texQuantity(minimumGap, "m")} = ${texQuantity(recommendedClearance, "m")}`,
      },
    );
    return steps;
  },
});
