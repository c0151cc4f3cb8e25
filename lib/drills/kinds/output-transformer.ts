import type { Rng } from "../rng";
import type { DrillKind } from "../types";
import { fmt, RELATIVE_2 } from "./common";

/** The output transformer: its turns ratio, and the plate load another speaker reflects. Part of the signal path's kinds. */

/** Output transformers of the era and the speakers they drive (common practice). */
function transformerSetup(rng: Rng) {
  const zp = rng.pick([2500, 3000, 4000, 5000, 7000, 8000, 10000]);
  const zs = rng.pick([3.2, 4, 8, 16]);
  return { zp, zs, newLoad: rng.pick([3.2, 4, 8, 16].filter((z) => z !== zs)) };
}

export const outputTransformerKinds: DrillKind[] = [
  {
    id: "output-transformer/turns-ratio",
    slug: "output-transformer",
    title: "Turns ratio of an output transformer",
    direction: "forward",
    asked: { name: "turnsRatio", label: "turns ratio (primary : secondary)", unit: "" },
    tolerance: RELATIVE_2,
    answerStep: "Turns ratio",
    generate(rng) {
      const t = transformerSetup(rng);
      return {
        inputs: { primaryImpedance: t.zp, secondaryImpedance: t.zs },
        prompt: `An output transformer matches a ${fmt(t.zp, "Ω")} plate load to a ${fmt(t.zs, "Ω")} speaker. What is its turns ratio, primary to secondary?`,
        given: { "Plate load": fmt(t.zp, "Ω"), Speaker: fmt(t.zs, "Ω") },
      };
    },
    mistakes: (ctx) => [
      {
        value: (ctx.inputs.primaryImpedance as number) / (ctx.inputs.secondaryImpedance as number),
        step: "Turns ratio",
        hint: "That is the impedance ratio; impedance goes as the square of the turns ratio, so take the square root.",
      },
    ],
  },
  {
    id: "output-transformer/reflected",
    slug: "output-transformer",
    title: "Plate load with another speaker",
    direction: "forward",
    asked: { name: "reflectedImpedance", label: "plate load with the new speaker", unit: "Ω" },
    tolerance: RELATIVE_2,
    answerStep: "Plate load with the new speaker",
    generate(rng) {
      const t = transformerSetup(rng);
      return {
        inputs: { primaryImpedance: t.zp, secondaryImpedance: t.zs, newLoad: t.newLoad },
        prompt: `An output transformer made for a ${fmt(t.zp, "Ω")} plate load and a ${fmt(t.zs, "Ω")} speaker is given a ${fmt(t.newLoad, "Ω")} speaker instead. What plate load does the tube now see?`,
        given: { "Design plate load": fmt(t.zp, "Ω"), "Design speaker": fmt(t.zs, "Ω"), "Speaker fitted": fmt(t.newLoad, "Ω") },
      };
    },
    mistakes: (ctx) => {
      const { primaryImpedance: zp, secondaryImpedance: zs, newLoad } = ctx.inputs as Record<string, number>;
      return [
        {
          value: (zp * zs) / newLoad,
          step: "Plate load with the new speaker",
          hint: "Scale by new/old: a lower-impedance speaker reflects a lower plate load, not a higher one.",
        },
      ];
    },
  },
];
