import { slipOf } from "../calc";
import type { DrillKind } from "../types";
import { fmt, ohms, RELATIVE_2, RELATIVE_3, roundTo } from "./common";
import { current, drawStage, ordinary, outputOrZero, SLUG, stageSetup } from "./triode-stage-setup";

/**
 * Triode gain stage. Nobody solves the tube model by hand, so the problem gives the plate current
 * the model finds (as a meter would show it) and asks what follows from it by Ohm's law, or gives
 * µ and rp at the operating point and asks the gain.
 */

export const triodeStageKinds: DrillKind[] = [
  {
    id: "triode-stage/cathode-voltage",
    slug: SLUG,
    title: "Cathode voltage of a triode stage",
    direction: "forward",
    asked: { name: "cathodeVoltage", label: "cathode voltage", unit: "V" },
    tolerance: RELATIVE_2,
    answerStep: "Cathode voltage",
    generate: (rng) => stageSetup(rng, "What voltage does a meter read across the cathode resistor?"),
    accept: ordinary,
    mistakes: (ctx) => [
      {
        value: ohms({ current: current(ctx), resistance: ctx.inputs.plateResistor as number }, "voltage"),
        step: "Cathode voltage",
        hint: "That is the drop across the plate resistor; the bias is the same current through the cathode resistor.",
      },
    ],
  },
  {
    id: "triode-stage/plate-voltage",
    slug: SLUG,
    title: "Plate voltage of a triode stage",
    direction: "forward",
    asked: { name: "plateToChassisVoltage", label: "plate voltage, plate to chassis", unit: "V" },
    tolerance: RELATIVE_2,
    answerStep: "Plate to chassis",
    generate: (rng) => stageSetup(rng, "What does a meter read from plate to chassis?"),
    accept: ordinary,
    mistakes: (ctx) => [
      {
        value: ctx.outputs.plateVoltage as number,
        step: "Plate to chassis",
        hint: "That is plate to cathode. A meter from chassis also sees the cathode's own voltage: B+ minus the plate resistor's drop only.",
      },
      {
        value: ohms({ current: current(ctx), resistance: ctx.inputs.plateResistor as number }, "voltage"),
        step: "Load line with your values",
        hint: "That is the drop across the plate resistor; the plate sits at B+ minus that drop.",
      },
    ],
  },
  {
    id: "triode-stage/plate-dissipation",
    slug: SLUG,
    title: "Plate dissipation of a triode stage",
    direction: "forward",
    asked: { name: "plateDissipation", label: "plate dissipation", unit: "W" },
    tolerance: RELATIVE_3,
    answerStep: "Plate dissipation",
    generate: (rng) => stageSetup(rng, "How much power does the plate dissipate?"),
    accept: ordinary,
    mistakes: (ctx) => [
      {
        value: ohms({ voltage: ctx.inputs.supplyVoltage as number, current: current(ctx) }, "power"),
        step: "Plate dissipation",
        hint: "The tube dissipates its own plate-to-cathode voltage times the current, not the full B+: the resistors drop the rest.",
      },
      {
        value: ohms({ voltage: ctx.outputs.plateToChassisVoltage as number, current: current(ctx) }, "power"),
        step: "Operating point",
        hint: "The tube sees plate to cathode: take the cathode resistor's drop off the plate voltage as well.",
      },
    ],
  },
  {
    id: "triode-stage/gain",
    slug: SLUG,
    title: "Voltage gain of a triode stage",
    direction: "forward",
    asked: { name: "gain", label: "voltage gain", unit: "" },
    tolerance: RELATIVE_3,
    answerStep: "Voltage gain",
    generate(rng) {
      const s = drawStage(rng);
      const bypassed = rng.chance(0.7);
      const load = rng.chance(0.6) ? rng.preferred("E12", 220e3, 1e6) : undefined;
      const inputs = { ...s, cathodeBypassed: bypassed, ...(load ? { loadResistance: load } : {}) };
      const mu = roundTo(outputOrZero(inputs, "amplificationFactor"), 3);
      const rp = roundTo(outputOrZero(inputs, "plateResistance"), 3);
      const given: Record<string, string> = {
        Tube: s.tube,
        "Plate resistor": fmt(s.plateResistor, "Ω"),
        "Cathode resistor": fmt(s.cathodeResistor, "Ω"),
        "Cathode bypassed": bypassed ? "yes" : "no",
        µ: String(mu),
        "Plate resistance rp": fmt(rp, "Ω"),
      };
      if (load) given["Next stage's grid resistor"] = fmt(load, "Ω");
      return {
        inputs,
        prompt:
          `A ${s.tube} stage has a ${fmt(s.plateResistor, "Ω")} plate resistor and a ${fmt(s.cathodeResistor, "Ω")} cathode resistor, ` +
          `${bypassed ? "bypassed by a large capacitor" : "with no bypass capacitor"}` +
          `${load ? `, and feeds a next stage whose grid resistor is ${fmt(load, "Ω")}` : ", and nothing else loads its plate"}. ` +
          `At its operating point µ is ${mu} and the plate resistance is ${fmt(rp, "Ω")}. What voltage gain does the stage give (magnitude)?`,
        given,
      };
    },
    accept: ordinary,
    mistakes(ctx) {
      const out = [];
      if (ctx.inputs.loadResistance !== undefined) {
        const { loadResistance: _, ...alone } = ctx.inputs;
        out.push({
          value: slipOf(SLUG, alone, "gain"),
          step: "Signal load",
          hint: "The next stage's grid resistor is in parallel with the plate resistor: use Ra ∥ RL as the load.",
        });
      }
      if (ctx.inputs.cathodeBypassed === false) {
        out.push({
          value: slipOf(SLUG, { ...ctx.inputs, cathodeBypassed: true }, "gain"),
          step: "Voltage gain",
          hint: "Without a bypass capacitor the cathode resistor feeds back: add (µ + 1)·Rk to the denominator.",
        });
      }
      out.push({
        value: ctx.outputs.amplificationFactor as number,
        step: "Voltage gain",
        hint: "µ is the most a triode could give; the stage gives µ·RL′/(rp + RL′).",
      });
      return out;
    },
  },
];
