import { formatQuantity, texQuantity, tex } from "./format";
import { DEFAULT_CHOKE_RESISTANCE, type LcStageResult, type StageInput, type StageResult } from "./ripple-stages";
import type { SupplyRippleInput } from "./supply-ripple-schema";
import type { OutputValue, Step } from "./types";

/** The supply-ripple calculator's working: the reservoir's ripple, then each stage's reactances, share passed and DC drop. */

/** The outputs the working quotes; each stage is a StageResult in the shape compute gives. */
export interface SupplyRippleOutputs {
  rippleFrequency: number;
  ripplePeakToPeak: number;
  rippleRms: number;
  stages: { [key: string]: OutputValue }[];
}

export function explainSupplyRipple(input: SupplyRippleInput, o: SupplyRippleOutputs): Step[] {
  const { loadCurrent: i, capacitance: c, lineFrequency: f, rectifier } = input;
  const { rippleFrequency: fr, ripplePeakToPeak: vpp, rippleRms } = o;
  const steps: Step[] = [
    {
      label: "Ripple frequency",
      latex: rectifier === "full-wave" ? tex`f_r = 2f = 2 \times ${texQuantity(f, "Hz")} = ${texQuantity(fr, "Hz")}` : tex`f_r = f = ${texQuantity(fr, "Hz")}`,
    },
    {
      label: "Ripple on the reservoir, peak to peak: the whole load current drains it between charging peaks",
      latex: tex`V_{pp} = \frac{I}{f_r\,C} = \frac{${texQuantity(i, "A")}}{${texQuantity(fr, "Hz")} \times ${texQuantity(c, "F")}} = ${texQuantity(vpp, "V")}`,
    },
    {
      label: "Ripple on the reservoir, rms (sawtooth)",
      latex: tex`V_{rms} = \frac{V_{pp}}{2\sqrt{3}} = \frac{${texQuantity(vpp, "V")}}{3.464} = ${texQuantity(rippleRms, "V")}`,
    },
  ];
  let before = rippleRms;
  (input.stages ?? []).forEach((s, n) => {
    const out = o.stages[n] as unknown as StageResult;
    steps.push(...stageSteps(s, out, n + 1, 2 * Math.PI * fr, i));
    steps.push({
      label: `Stage ${n + 1}: ripple after it, the ripple reaching it times the fraction passed`,
      latex: tex`V_{rms} = ${texQuantity(before, "V")} \times ${out.attenuation.toPrecision(3)} = ${texQuantity(out.rippleRms, "V")}`,
    });
    before = out.rippleRms;
  });
  return steps;
}

/** The working of one stage, in words an apprentice can follow. */
function stageSteps(s: StageInput, out: StageResult, n: number, omega: number, load: number): Step[] {
  const att = out.attenuation.toPrecision(3);
  const tI = texQuantity(out.current, "A");
  const whose =
    s.current === undefined
      ? `the whole ${formatQuantity(load, "A")} load current, since no current was given for this stage`
      : "the current this stage carries";
  const xc = 1 / (omega * s.capacitance);
  if (s.kind === "rc") {
    return [
      {
        label: `Stage ${n} (RC): the capacitor's reactance at the ripple frequency, and the share of ripple the resistor–capacitor divider lets through`,
        latex: tex`X_C = \frac{1}{2\pi f_r C} = ${texQuantity(xc, "Ω")}, \quad \frac{X_C}{\sqrt{R^2 + X_C^2}} = \frac{${texQuantity(xc, "Ω")}}{\sqrt{(${texQuantity(s.resistance, "Ω")})^2 + (${texQuantity(xc, "Ω")})^2}} = ${att}`,
      },
      {
        label: `Stage ${n} (RC): DC drop across the resistor, Ohm's law with ${whose}`,
        latex: tex`\Delta V = I_{${n}} R = ${tI} \times ${texQuantity(s.resistance, "Ω")} = ${texQuantity(out.dcDrop, "V")}`,
      },
    ];
  }
  const lc = out as LcStageResult;
  const r = lc.resistance;
  const x = omega * omega * s.inductance * s.capacitance;
  const y = omega * r * s.capacitance;
  const rNote = s.resistance === undefined ? ` (not given: ${DEFAULT_CHOKE_RESISTANCE} Ω assumed, a typical filter choke)` : "";
  return [
    {
      label: `Stage ${n} (LC): the choke's and the capacitor's reactances at the ripple frequency`,
      latex: tex`X_L = 2\pi f_r L = ${texQuantity(omega * s.inductance, "Ω")}, \quad X_C = ${texQuantity(xc, "Ω")}`,
    },
    {
      label: `Stage ${n} (LC): where choke and capacitor resonate. At f₀ they swap energy back and forth and the ripple grows instead of shrinking; only the choke's resistance R${rNote} limits the rise, to Q times`,
      latex: tex`f_0 = \frac{1}{2\pi\sqrt{LC}} = ${texQuantity(lc.resonantFrequency, "Hz")}, \quad Q = \frac{1}{R}\sqrt{\frac{L}{C}} = ${texQuantity(lc.q, "")}`,
    },
    {
      label: `Stage ${n} (LC): the share of ripple that gets through, the choke's resistance included. With the ripple frequency well above f₀ this is close to 1/(ω²LC − 1)`,
      latex: tex`\frac{1}{\sqrt{(1 - \omega^2 LC)^2 + (\omega R C)^2}} = \frac{1}{\sqrt{(1 - ${texQuantity(x, "")})^2 + (${texQuantity(y, "")})^2}} = ${att}`,
    },
    {
      label: `Stage ${n} (LC): DC drop across the choke's winding resistance, Ohm's law with ${whose}`,
      latex: tex`\Delta V = I_{${n}} R = ${tI} \times ${texQuantity(r, "Ω")} = ${texQuantity(out.dcDrop, "V")}`,
    },
  ];
}
