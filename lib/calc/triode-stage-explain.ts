import { texQuantity, tex } from "./format";
import { modelFor, type TriodeStageInput, type TriodeStageOutputs } from "./triode-stage-schema";
import type { Step } from "./types";

/** The triode stage's working: Koren's model, the load line, the operating point and the gain, typeset. */

// Koren's equations as his article writes them, the exponent as x (EX in SPICE listings).
export const MODEL_TEX = tex`E_1 = \frac{E_p}{K_P}\ln\!\left(1 + e^{K_P\left(\frac{1}{\mu} + \frac{E_g}{\sqrt{K_{VB} + E_p^2}}\right)}\right),\quad I_p = \frac{E_1^{x}}{K_{G1}}\left(1 + \operatorname{sgn} E_1\right)`;
export const LOAD_LINE_TEX = tex`E_p = B^{+} - I_p\,(R_a + R_k),\quad E_g = -I_p R_k`;

const sig6 = (n: number) => String(Number(n.toPrecision(6)));

/** Ra alone, or Ra ∥ RL when the next stage's grid resistor loads it. */
export function signalLoad(ra: number, rl: number | undefined): number {
  return rl === undefined ? ra : (ra * rl) / (ra + rl);
}

/** The substituted steps, in the order the operating point is found and the gain follows from it. */
export function explainTriodeStage(input: TriodeStageInput, o: TriodeStageOutputs): Step[] {
  const { supplyVoltage: bPlus, plateResistor: ra, cathodeResistor: rk, loadResistance: rl } = input;
  const bypassed = input.cathodeBypassed ?? true;
  const { params: p, name } = modelFor(input);
  // Each value is formatted once; formatting dominates the cost of the working.
  const tB = texQuantity(bPlus, "V");
  const tRa = texQuantity(ra, "Ω");
  const tRk = texQuantity(rk, "Ω");
  const steps: Step[] = [
    { label: "Koren's improved triode model", latex: MODEL_TEX },
    {
      label: `Model parameters (${name})`,
      latex: tex`\mu = ${sig6(p.mu)},\; x = ${sig6(p.ex)},\; K_{G1} = ${sig6(p.kg1)},\; K_P = ${sig6(p.kp)},\; K_{VB} = ${sig6(p.kvb)}\,\mathrm{V^2}`,
    },
    { label: "Load line and cathode bias", latex: LOAD_LINE_TEX },
    { label: "Load line with your values", latex: tex`E_p = ${tB} - I_p\,(${tRa} + ${tRk}),\quad E_g = -I_p \times ${tRk}` },
  ];
  const {
    plateCurrent: ip,
    plateVoltage: ep,
    cathodeVoltage: vk,
    plateDissipation: dissipation,
    amplificationFactor: mu,
    transconductance: gm,
    plateResistance: rp,
    gain,
  } = o;
  if (ip === null || ep === null || vk === null || dissipation === null || mu === null || gm === null || gain === null) return steps;

  const eg = -ip * rk;
  const rLoad = signalLoad(ra, rl);
  const tIp = texQuantity(ip, "A");
  const tIp4 = texQuantity(ip, "A", 4);
  const tMu = texQuantity(mu, "");
  const tRl = texQuantity(rLoad, "Ω");
  const tGain = texQuantity(gain, "");
  const rpTex = rp === null ? tex`\infty` : texQuantity(rp, "Ω");
  steps.push(
    {
      label: "Operating point (model current equals load-line current); E_p is plate to cathode, the voltage the tube itself sees",
      latex: tex`I_p = ${tIp4},\quad E_p = ${tB} - ${tIp4} \times ${texQuantity(ra + rk, "Ω", 4)} = ${texQuantity(ep, "V", 4)},\quad E_g = ${texQuantity(eg, "V", 4)}`,
    },
    { label: "Cathode voltage", latex: tex`V_k = I_p R_k = ${tIp} \times ${tRk} = ${texQuantity(vk, "V")}` },
    {
      label: "Plate to chassis, as a meter from chassis reads it: the plate-to-cathode voltage above plus the cathode's own voltage",
      latex: tex`V_a = E_p + V_k = ${texQuantity(ep, "V", 4)} + ${texQuantity(vk, "V", 4)} = B^{+} - I_p R_a = ${texQuantity(ep + vk, "V", 4)}`,
    },
    { label: "Plate dissipation", latex: tex`P_a = E_p I_p = ${texQuantity(ep, "V")} \times ${tIp} = ${texQuantity(dissipation, "W")}` },
    {
      label: "Small-signal parameters at the operating point",
      latex: tex`g_m = \frac{\partial I_p}{\partial E_g} = ${texQuantity(gm, "S")},\quad r_p = \left(\frac{\partial I_p}{\partial E_p}\right)^{-1} = ${rpTex},\quad \mu = g_m r_p = ${tMu}`,
    },
  );
  if (rl !== undefined) {
    steps.push({
      label: "Signal load: plate resistor in parallel with the next stage",
      latex: tex`R_L' = \frac{R_a R_L}{R_a + R_L} = \frac{${tRa} \times ${texQuantity(rl, "Ω")}}{${tRa} + ${texQuantity(rl, "Ω")}} = ${tRl}`,
    });
  }
  const gainLabel = "Voltage gain (inverting: the plate swings opposite to the grid)";
  steps.push(
    bypassed
      ? { label: `${gainLabel}, cathode bypassed`, latex: tex`A = \frac{\mu R_L'}{r_p + R_L'} = \frac{${tMu} \times ${tRl}}{${rpTex} + ${tRl}} = ${tGain}` }
      : {
          label: `${gainLabel}, cathode not bypassed`,
          latex: tex`A = \frac{\mu R_L'}{r_p + R_L' + (\mu + 1) R_k} = \frac{${tMu} \times ${tRl}}{${rpTex} + ${tRl} + ${texQuantity(mu + 1, "")} \times ${tRk}} = ${tGain}`,
        },
  );
  return steps;
}
