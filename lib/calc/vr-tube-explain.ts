import { formatQuantity, texQuantity, tex } from "./format";
import type { Step } from "./types";
import { tubeFigures, type VrTubeInput } from "./vr-tube-schema";

/** The VR-tube calculator's working: the resistor, the tube's current at each end of the load, the dissipation, before the strike. */

/** The outputs the working quotes. */
export interface VrTubeOutputs {
  seriesResistance: number;
  resistorPower: number;
  preferredResistance: number;
  voltageBeforeStrike: number;
}

export function explainVrTube(input: VrTubeInput, o: VrTubeOutputs): Step[] {
  const { supplyVoltage: vs, loadCurrentMin: ilMin, loadCurrentMax: ilMax, fittedResistance } = input;
  const t = tubeFigures(input);
  const v = (x: number) => texQuantity(x, "V", 4);
  const a = (x: number) => texQuantity(x, "A", 3);
  const r = fittedResistance ?? o.seriesResistance;
  const rTex = texQuantity(r, "Ω", 4);
  const which = fittedResistance === undefined ? "" : " (with the fitted resistor)";
  // A negative figure means the resistor cannot feed the load: the glow goes out and the tube carries nothing.
  const it = (x: number) => (x > 0 ? a(x) : tex`${a(x)} \Rightarrow 0\ \text{(the tube goes out)}`);
  const steps: Step[] = [
    {
      label: `Series resistance (${t.name}: ${formatQuantity(t.vvr, "V")}, ${formatQuantity(t.iMin, "A")} to ${formatQuantity(t.iMax, "A")})`,
      latex: tex`R = \frac{${v(vs)} - ${v(t.vvr)}}{${a(ilMax)} + ${a(t.iMin)}} = ${texQuantity(o.seriesResistance, "Ω", 4)}`,
    },
    {
      label: `Tube current at the greatest load${which}`,
      latex: tex`I_t = \frac{${v(vs - t.vvr)}}{${rTex}} - ${a(ilMax)} = ${it((vs - t.vvr) / r - ilMax)}`,
    },
    { label: `Tube current at the least load${which}`, latex: tex`I_t = \frac{${v(vs - t.vvr)}}{${rTex}} - ${a(ilMin)} = ${it((vs - t.vvr) / r - ilMin)}` },
    { label: `Resistor dissipation${which}`, latex: tex`P = \frac{(${v(vs - t.vvr)})^2}{${rTex}} = ${texQuantity(o.resistorPower, "W")}` },
    {
      label: "E12 value at or below (keeps full-load current at or above the minimum)",
      latex: tex`R_\text{E12} = ${texQuantity(o.preferredResistance, "Ω")}`,
    },
    {
      label: "Voltage on the tube before it strikes, full load taken as a resistance",
      latex:
        ilMax > 0
          ? tex`V = ${v(vs)} \times \frac{${texQuantity(t.vvr / ilMax, "Ω", 4)}}{${rTex} + ${texQuantity(t.vvr / ilMax, "Ω", 4)}} = ${v(o.voltageBeforeStrike)}`
          : tex`V = V_s = ${v(vs)}\ \text{(no load)}`,
    },
  ];
  return steps;
}
