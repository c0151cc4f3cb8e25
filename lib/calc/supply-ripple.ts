import { z } from "zod";
import { formatQuantity, texQuantity, tex } from "./format";
import { ALWAYS_DANGER } from "./safety";
import { defineCalculator, type OutputValue, type Step, type Warning } from "./types";
import { quantity, quantityWithDefault } from "./units";

/**
 * Ripple of a capacitor-input filter and the smoothing stages after it.
 * Reservoir: Vpp ≈ I/(f_ripple·C), a sawtooth with rms Vpp/(2√3) (Radiotron Designer's Handbook 4th ed.,
 * capacitor-input filters; ARRL Handbook, power supplies). Each stage is treated as a divider at the
 * ripple frequency: RC gives Xc/√(R²+Xc²), an ideal LC gives |Xc/(XL−Xc)| = 1/|ω²LC − 1|.
 */

export const RECTIFIERS = ["full-wave", "half-wave"] as const;

// An LC stage this close to resonance (|ω²LC − 1| below it) has no meaningful ideal answer.
const RESONANCE_GUARD = 1e-3;

const rcStage = z.object({
  kind: z.literal("rc"),
  resistance: quantity("resistance", { positive: true, min: 1e-3, max: 1e9, label: "Stage resistance" }),
  capacitance: quantity("capacitance", { positive: true, min: 1e-12, max: 10, label: "Stage capacitance" }),
});

const lcStage = z.object({
  kind: z.literal("lc"),
  inductance: quantity("inductance", { positive: true, min: 1e-6, max: 1e4, label: "Choke inductance" }),
  capacitance: quantity("capacitance", { positive: true, min: 1e-12, max: 10, label: "Stage capacitance" }),
});

const stage = z.discriminatedUnion("kind", [rcStage, lcStage], {
  error: 'Each stage needs kind "rc" (resistance and capacitance) or "lc" (inductance and capacitance)',
});

export const supplyRippleSchema = z
  .object({
    loadCurrent: quantity("current", { positive: true, min: 1e-6, max: 100, label: "Load current" }),
    capacitance: quantity("capacitance", { positive: true, min: 1e-9, max: 10, label: "Reservoir capacitance" }),
    lineFrequency: quantityWithDefault("frequency", 60, { positive: true, min: 1, max: 10_000, label: "Line frequency" }).default(60),
    rectifier: z.enum(RECTIFIERS, { error: 'Rectifier must be "full-wave" or "half-wave"' }),
    stages: z.array(stage).max(10, { error: "At most 10 filter stages" }).optional(),
  })
  .superRefine((v, ctx) => {
    const omega = 2 * Math.PI * rippleFrequencyOf(v.lineFrequency, v.rectifier);
    v.stages?.forEach((s, i) => {
      if (s.kind === "lc" && Math.abs(omega * omega * s.inductance * s.capacitance - 1) < RESONANCE_GUARD) {
        ctx.addIssue({
          code: "custom",
          path: ["stages", i, "inductance"],
          message: `Stage ${i + 1}: this choke and capacitor resonate at the ripple frequency, where the filter would magnify ripple instead of removing it. Change the inductance or capacitance`,
        });
      }
    });
  });

export type SupplyRippleInput = z.output<typeof supplyRippleSchema>;

function rippleFrequencyOf(line: number, rectifier: (typeof RECTIFIERS)[number]): number {
  return rectifier === "full-wave" ? 2 * line : line;
}

export const calculator = defineCalculator({
  slug: "supply-ripple",
  title: "Supply ripple",
  purpose: "The hum left on B+ by a capacitor-input filter, and how much each RC or LC stage after it removes.",
  group: "supplies",
  inputs: [
    { name: "loadCurrent", label: "Load current", unit: "A", required: true, control: "quantity", quantity: "current", help: "Total DC current the supply delivers." },
    { name: "capacitance", label: "Reservoir capacitance", unit: "F", required: true, control: "quantity", quantity: "capacitance", help: "The first capacitor after the rectifier." },
    { name: "lineFrequency", label: "Mains frequency", unit: "Hz", required: false, default: 60, control: "quantity", quantity: "frequency" },
    { name: "rectifier", label: "Rectifier", unit: "", required: true, control: "select", options: RECTIFIERS, help: "Full-wave (two diodes or a bridge, or a 5Y3-type tube) ripples at twice the mains frequency." },
    { name: "stages", label: "Filter stages", unit: "", required: false, control: "list", help: 'Each stage: { kind: "rc", resistance, capacitance } or { kind: "lc", inductance, capacitance }, in order after the reservoir.' },
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
    { label: "RC stage", latex: tex`\frac{V_{out}}{V_{in}} = \frac{X_C}{\sqrt{R^2 + X_C^2}}, \quad X_C = \frac{1}{2\pi f_r C}, \quad \Delta V_{dc} = I R` },
    { label: "LC stage (ideal choke)", latex: tex`\frac{V_{out}}{V_{in}} = \left|\frac{X_C}{X_L - X_C}\right|, \quad X_L = 2\pi f_r L` },
  ],
  references: [
    {
      title: "Radiotron Designer's Handbook, 4th ed.",
      detail: "Ch. 30, rectification: capacitor-input filter and reservoir ripple; ch. 31, filtering: RC and LC smoothing sections (chapter numbers from memory)",
    },
    {
      title: "The ARRL Handbook for Radio Communications",
      detail: "Power supplies chapter: capacitor-input filters, ripple, choke-input filters and critical inductance",
    },
  ],
  whyItMatters:
    "Hum in a restored set usually means too much ripple on B+: a dried-out reservoir or filter capacitor, or a " +
    "replacement that is too small. Knowing roughly how much ripple each stage should leave tells you whether a " +
    "value is reasonable before you fit it, and which stage to suspect when the hum stays.",
  compute(input: SupplyRippleInput) {
    const { loadCurrent: i, capacitance: c, lineFrequency: f, rectifier } = input;
    const stagesIn = input.stages ?? [];
    const fr = rippleFrequencyOf(f, rectifier);
    const omega = 2 * Math.PI * fr;
    const vpp = i / (fr * c);
    const rippleRms = vpp / (2 * Math.sqrt(3));
    const warnings: Warning[] = [ALWAYS_DANGER];

    let ripple = rippleRms;
    const stages: { attenuation: number; rippleRms: number; dcDrop: number }[] = [];
    stagesIn.forEach((s, n) => {
      const xc = 1 / (omega * s.capacitance);
      let attenuation: number;
      let dcDrop: number;
      if (s.kind === "rc") {
        attenuation = xc / Math.hypot(s.resistance, xc);
        dcDrop = i * s.resistance;
      } else {
        attenuation = Math.abs(xc / (omega * s.inductance - xc));
        dcDrop = 0;
        const f0 = 1 / (2 * Math.PI * Math.sqrt(s.inductance * s.capacitance));
        if (f0 > fr / 3) {
          const where = attenuation >= 1 ? "at or above" : "near";
          warnings.push({
            level: "caution",
            message:
              `Stage ${n + 1}: the choke and capacitor resonate at ${formatQuantity(f0, "Hz")}, ${where} the ${formatQuantity(fr, "Hz")} ripple frequency, ` +
              `so this stage ${attenuation >= 1 ? "magnifies ripple rather than removing it" : "removes little ripple"}. Common practice keeps the resonance well below the ripple frequency (a third or less); use a larger choke or capacitor.`,
          });
        }
      }
      ripple *= attenuation;
      stages.push({ attenuation, rippleRms: ripple, dcDrop });
    });

    if (stagesIn.some((s) => s.kind === "lc")) {
      warnings.push({
        level: "info",
        message:
          "Chokes are treated as ideal: a real choke's DC resistance (often 100–300 Ω) also drops I × R on the way to B+; subtract that yourself. " +
          "A choke-input supply (choke straight after the rectifier, no reservoir capacitor) behaves differently and needs at least the critical inductance, " +
          "about R_load/1000 henries at 60 Hz full-wave (common practice); this calculator does not model it.",
      });
    }
    warnings.push({
      level: "info",
      message:
        "The reservoir estimate assumes the capacitor alone feeds the load for the whole ripple period, and ripple small beside the DC voltage; it errs on the high side.",
    });

    return {
      outputs: { rippleFrequency: fr, ripplePeakToPeak: vpp, rippleRms, stages: stages as { [key: string]: OutputValue }[], finalRippleRms: ripple },
      warnings,
    };
  },
  explain(input: SupplyRippleInput, o) {
    const { loadCurrent: i, capacitance: c, lineFrequency: f, rectifier } = input;
    const { rippleFrequency: fr, ripplePeakToPeak: vpp, rippleRms } = o;
    const omega = 2 * Math.PI * fr;
    const steps: Step[] = [
      {
        label: "Ripple frequency",
        latex: rectifier === "full-wave"
          ? tex`f_r = 2f = 2 \times ${texQuantity(f, "Hz")} = ${texQuantity(fr, "Hz")}`
          : tex`f_r = f = ${texQuantity(fr, "Hz")}`,
      },
      {
        label: "Ripple on the reservoir, peak to peak",
        latex: tex`V_{pp} = \frac{I}{f_r\,C} = \frac{${texQuantity(i, "A")}}{${texQuantity(fr, "Hz")} \times ${texQuantity(c, "F")}} = ${texQuantity(vpp, "V")}`,
      },
      {
        label: "Ripple on the reservoir, rms (sawtooth)",
        latex: tex`V_{rms} = \frac{V_{pp}}{2\sqrt{3}} = \frac{${texQuantity(vpp, "V")}}{3.464} = ${texQuantity(rippleRms, "V")}`,
      },
    ];
    let before = rippleRms;
    (input.stages ?? []).forEach((s, n) => {
      const out = o.stages[n] as { attenuation: number; rippleRms: number; dcDrop: number };
      const xc = 1 / (omega * s.capacitance);
      const tag = `Stage ${n + 1}`;
      const att = out.attenuation.toPrecision(3);
      if (s.kind === "rc") {
        steps.push({
          label: `${tag} (RC): attenuation`,
          latex: tex`X_C = \frac{1}{2\pi f_r C} = ${texQuantity(xc, "Ω")}, \quad \frac{X_C}{\sqrt{R^2 + X_C^2}} = \frac{${texQuantity(xc, "Ω")}}{\sqrt{(${texQuantity(s.resistance, "Ω")})^2 + (${texQuantity(xc, "Ω")})^2}} = ${att}`,
        });
        steps.push({ label: `${tag} (RC): DC drop`, latex: tex`\Delta V = I R = ${texQuantity(i, "A")} \times ${texQuantity(s.resistance, "Ω")} = ${texQuantity(out.dcDrop, "V")}` });
      } else {
        steps.push({
          label: `${tag} (LC): attenuation`,
          latex: tex`X_L = ${texQuantity(omega * s.inductance, "Ω")}, \; X_C = ${texQuantity(xc, "Ω")}, \quad \left|\frac{X_C}{X_L - X_C}\right| = ${att}`,
        });
      }
      steps.push({ label: `${tag}: ripple after it`, latex: tex`V_{rms} = ${texQuantity(before, "V")} \times ${att} = ${texQuantity(out.rippleRms, "V")}` });
      before = out.rippleRms;
    });
    return steps;
  },
});
