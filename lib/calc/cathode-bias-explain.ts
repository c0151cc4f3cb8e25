import type { CathodeBiasInput } from "./cathode-bias-schema";
import { texQuantity, tex } from "./format";
import type { Step } from "./types";

/** The resistance the cathode bypass sees (for compute and the working), and the cathode-bias working itself. */

/** Resistance the bypass capacitor sees, which model gave it, and the tube figures that model used. */
export type Bypass =
  | { r: number; model: "triode"; rCathode: number; mu: number; rp: number; ra: number }
  | { r: number; model: "pentode"; rCathode: number; gm: number }
  | { r: number; model: "rk" };

export function bypassResistance(rk: number, input: CathodeBiasInput): Bypass {
  const { amplificationFactor: mu, plateResistance: rp, plateLoad: ra, transconductance: gm } = input;
  if (mu !== undefined && rp !== undefined && ra !== undefined) {
    const rc = (rp + ra) / (mu + 1);
    return { r: (rk * rc) / (rk + rc), model: "triode", rCathode: rc, mu, rp, ra };
  }
  if (gm !== undefined) {
    const rc = 1 / gm;
    return { r: (rk * rc) / (rk + rc), model: "pentode", rCathode: rc, gm };
  }
  return { r: rk, model: "rk" };
}

/** The outputs the working quotes. */
export interface CathodeBiasOutputs {
  cathodeCurrent: number;
  cathodeResistance: number;
  dissipation: number;
  suggestedRating: number | null;
  nearestPreferred: number;
  bypassCornerFrequency: number | null;
}

export function explainCathodeBias(input: CathodeBiasInput, o: CathodeBiasOutputs): Step[] {
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
      latex: tex`\frac{r_p + R_a}{\mu + 1} = \frac{${texQuantity(b.rp, "Ω")} + ${texQuantity(b.ra, "Ω")}}{${b.mu} + 1} = ${texQuantity(b.rCathode, "Ω")}`,
    });
  } else if (b.model === "pentode") {
    steps.push({
      label: "Resistance looking into the cathode (pentode)",
      latex: tex`\frac{1}{g_m} = \frac{1}{${texQuantity(b.gm, "S")}} = ${texQuantity(b.rCathode, "Ω")}`,
    });
  }
  if (b.model !== "rk") {
    steps.push({
      label: "Resistance the capacitor sees",
      latex: tex`R = ${texQuantity(cathodeResistance, "Ω")} \parallel ${texQuantity(b.rCathode, "Ω")} = ${texQuantity(b.r, "Ω")}`,
    });
  }
  steps.push({
    label: "Bypass corner frequency",
    latex: tex`f = \frac{1}{2\pi \times ${texQuantity(b.r, "Ω")} \times ${texQuantity(ck, "F")}} = ${texQuantity(o.bypassCornerFrequency, "Hz")}`,
  });
  return steps;
}
