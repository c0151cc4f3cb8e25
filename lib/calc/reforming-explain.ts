import { texQuantity, tex } from "./format";
import type { ReformingInput } from "./reforming-schema";
import type { OutputValue, Step } from "./types";

/** The reforming calculator's working: the leakage limit, the resistor's figures, and the schedule as a table. */

/** The outputs the working quotes; each schedule row is { voltage, minutes, leakageLimit }, as compute gives it. */
export interface ReformingOutputs {
  leakageLimit: number;
  initialCurrent: number | null;
  resistorPower: number | null;
  timeConstant: number | null;
  steps: { [key: string]: OutputValue }[];
}

export function explainReforming(input: ReformingInput, o: ReformingOutputs): Step[] {
  const { capacitance: c, ratedVoltage: v, seriesResistance: r, leakageFactor: k, leakageOffset: off, leakageFloor: floor } = input;
  const cv = k * c * v + off;
  const offTex = off > 0 ? tex` + ${texQuantity(off, "A")}` : "";
  const out: Step[] = [
    {
      label: "Leakage limit at rated voltage (data-sheet form)",
      latex: tex`I_{max} = \max\left(${texQuantity(k, "")} \times ${texQuantity(c, "F")} \times ${texQuantity(v, "V")}${offTex},\; ${texQuantity(floor, "A")}\right) = \max\left(${texQuantity(cv, "A")},\; ${texQuantity(floor, "A")}\right) = ${texQuantity(o.leakageLimit, "A")}`,
    },
  ];
  if (r !== undefined && o.initialCurrent !== null && o.resistorPower !== null && o.timeConstant !== null) {
    out.push(
      {
        label: "Current if rated voltage meets the discharged capacitor",
        latex: tex`I_0 = \frac{V}{R} = \frac{${texQuantity(v, "V")}}{${texQuantity(r, "Ω")}} = ${texQuantity(o.initialCurrent, "A")}`,
      },
      {
        label: "Resistor dissipation with a shorted capacitor",
        latex: tex`P_R = \frac{V^2}{R} = \frac{(${texQuantity(v, "V")})^2}{${texQuantity(r, "Ω")}} = ${texQuantity(o.resistorPower, "W")}`,
      },
      {
        label: "Charging time constant (each step settles in about 5τ)",
        latex: tex`\tau = R\,C = ${texQuantity(r, "Ω")} \times ${texQuantity(c, "F")} = ${texQuantity(o.timeConstant, "s")}, \quad 5\tau = ${texQuantity(5 * o.timeConstant, "s")}`,
      },
    );
  }
  const steps = o.steps as { voltage: number; minutes: number; leakageLimit: number }[];
  const rows = steps
    .map((s, n) => tex`${n + 1} & ${texQuantity(s.voltage, "V")} & ${s.minutes}\,\mathrm{min} & ${texQuantity(s.leakageLimit, "A")}`)
    .join(" \\\\ ");
  out.push({
    label:
      "Schedule: raise to each voltage, hold at least the time shown and until the leakage falls below the figure (the same form at that voltage); stop if it rises",
    latex: tex`\begin{array}{rrrr} n & V_n & t_n & I_{max}(V_n) \\ \hline ${rows} \end{array}`,
  });
  return out;
}
