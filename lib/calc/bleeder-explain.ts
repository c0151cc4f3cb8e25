import type { BleederInput } from "./bleeder-schema";
import { texQuantity, tex } from "./format";
import { MAX_LIMITING_VOLTAGE } from "./tables/limiting-voltage";
import type { Step } from "./types";

/** The bleeder calculator's working: the largest bleeder, the tolerances, the E12 value and its check, the chain. */

/** The outputs the working quotes. */
export interface BleederOutputs {
  maxResistance: number;
  suggestedResistance: number;
  bleederCurrent: number;
  dissipation: number;
  suggestedRating: number | null;
  resistorsInSeries: number;
  voltagePerResistor: number;
  resistorValue: number;
  resistorRating: number | null;
}

export function explainBleeder(input: BleederInput, o: BleederOutputs): Step[] {
  const { capacitance: c, workingVoltage: vw, safeVoltage: vs, maxTime: t, capacitorTolerance: ct, resistorTolerance: rt } = input;
  const { maxResistance, suggestedResistance: r, bleederCurrent, dissipation } = o;
  const logRatio = Math.log(vw / vs);
  const corner = (1 + ct) * (1 + rt);
  const worstTime = r * (1 + rt) * c * (1 + ct) * logRatio;
  const energy = 0.5 * c * vw * vw;
  const n = o.resistorsInSeries;
  return [
    {
      label: "Largest bleeder that meets the time with nominal parts",
      latex: tex`R_{max} = \frac{t_{max}}{C\,\ln(V_w/V_{res})} = \frac{${texQuantity(t, "s")}}{${texQuantity(c, "F")} \times \ln(${texQuantity(vw, "V")}/${texQuantity(vs, "V")})} = ${texQuantity(maxResistance, "Ω")}`,
    },
    {
      label: "Allowing for both tolerances (capacitor high, resistor high)",
      latex: tex`R \le \frac{R_{max}}{(1 + ${ct})(1 + ${rt})} = ${texQuantity(maxResistance / corner, "Ω")}`,
    },
    { label: "Largest E12 value at or below that", latex: tex`R = ${texQuantity(r, "Ω")}` },
    {
      label: "Check: discharge time at the worst corner",
      latex: tex`t = R\,(1 + ${rt})\;C\,(1 + ${ct})\,\ln\frac{V_w}{V_{res}} = ${texQuantity(r * (1 + rt), "Ω")} \times ${texQuantity(c * (1 + ct), "F")} \times ${logRatio.toPrecision(4)} = ${texQuantity(worstTime, "s")} \le ${texQuantity(t, "s")}`,
    },
    {
      label: "Bleeder current",
      latex: tex`I = \frac{V_w}{R} = \frac{${texQuantity(vw, "V")}}{${texQuantity(r, "Ω")}} = ${texQuantity(bleederCurrent, "A")}`,
    },
    { label: "Dissipation", latex: tex`P = \frac{V_w^2}{R} = \frac{(${texQuantity(vw, "V")})^2}{${texQuantity(r, "Ω")}} = ${texQuantity(dissipation, "W")}` },
    {
      label: "Suggested rating (at least twice the dissipation)",
      latex:
        o.suggestedRating === null
          ? tex`2P = ${texQuantity(2 * dissipation, "W")} \text{ — above the largest standard rating}`
          : tex`2P = ${texQuantity(2 * dissipation, "W")} \;\Rightarrow\; ${texQuantity(o.suggestedRating, "W")}`,
    },
    {
      label: `Resistors in series (typical limiting element voltage ${MAX_LIMITING_VOLTAGE} V at most, IEC 60115-1)`,
      latex: tex`n = \left\lceil \frac{${texQuantity(vw, "V")}}{${texQuantity(MAX_LIMITING_VOLTAGE, "V")}} \right\rceil = ${n}, \quad V_{each} = ${texQuantity(o.voltagePerResistor, "V")}`,
    },
    {
      label: "Each resistor: E12, meeting the time at the worst corner, rated for its power and its voltage",
      latex: tex`R_{each} \le \frac{${texQuantity(maxResistance / corner, "Ω")}}{${n}} \;\Rightarrow\; ${texQuantity(o.resistorValue, "Ω")}, \quad ${o.resistorRating === null ? tex`\text{no single listed rating}` : texQuantity(o.resistorRating, "W")}`,
    },
    {
      label: "Energy stored at the working voltage",
      latex: tex`E = \tfrac{1}{2}\,C\,V_w^2 = \tfrac{1}{2} \times ${texQuantity(c, "F")} \times (${texQuantity(vw, "V")})^2 = ${texQuantity(energy, "J")}`,
    },
  ] satisfies Step[];
}
