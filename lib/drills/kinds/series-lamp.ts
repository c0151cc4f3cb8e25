import type { Rng } from "../rng";
import type { DrillKind, DrillSetup, SolvedContext } from "../types";
import { fmt, MAINS, ohms, RELATIVE_2, RELATIVE_3 } from "./common";

/** The series lamp (a current limiter in the mains lead): its hot resistance, the most current, the set's share. Part of the mains kinds. */

const LAMPS = [25, 40, 60, 75, 100] as const;

function lampSetup(rng: Rng, ask: string, withSet = false): DrillSetup {
  const line = rng.pick(MAINS).voltage;
  const lamp = rng.pick(LAMPS);
  const set = withSet ? rng.pick([30, 40, 50, 60, 75, 90]) : undefined;
  return {
    inputs: { lineVoltage: line, lampPower: lamp, ...(set ? { setPower: set } : {}) },
    prompt: `A ${fmt(lamp, "W")} ${fmt(line, "V")} lamp is wired in series with the mains to a set on the bench${set ? ` rated ${fmt(set, "W")}` : ""}, as a current limiter. ${ask}`,
    given: { Mains: fmt(line, "V"), Lamp: `${fmt(lamp, "W")} at ${fmt(line, "V")}`, ...(set ? { "Set's rating": fmt(set, "W") } : {}) },
  };
}

const line = (ctx: SolvedContext) => ctx.inputs.lineVoltage as number;

export const seriesLampKinds: DrillKind[] = [
  {
    id: "series-lamp/hot-resistance",
    slug: "series-lamp",
    title: "Resistance of a series lamp, hot",
    direction: "forward",
    asked: { name: "lampHotResistance", label: "lamp resistance, hot", unit: "Ω" },
    tolerance: RELATIVE_2,
    answerStep: "Lamp resistance, hot",
    generate: (rng) => lampSetup(rng, "What is the lamp's resistance when lit?"),
    mistakes: (ctx) => [
      { value: line(ctx) / (ctx.inputs.lampPower as number), step: "Lamp resistance, hot", hint: "R = V²/P: the voltage is squared." },
      {
        value: ctx.outputs.lampColdResistance as number,
        step: "Lamp resistance, cold",
        hint: "That is the cold filament; lit, tungsten has about ten times the resistance.",
      },
    ],
  },
  {
    id: "series-lamp/max-current",
    slug: "series-lamp",
    title: "Most current through a series lamp",
    direction: "forward",
    asked: { name: "maxCurrent", label: "most current, with a short in the set", unit: "A" },
    tolerance: RELATIVE_2,
    answerStep: "Most current",
    generate: (rng) => lampSetup(rng, "With a dead short in the set, what current flows once the lamp is lit?"),
    mistakes: (ctx) => [
      {
        value: ohms({ voltage: line(ctx), resistance: ctx.outputs.lampColdResistance as number }, "current"),
        step: "Surge while the lamp is cold",
        hint: "That is the surge through the cold filament, over in a moment; lit, the lamp passes its rated P/V.",
      },
    ],
  },
  {
    id: "series-lamp/set-voltage",
    slug: "series-lamp",
    title: "Voltage a set sees behind a series lamp",
    direction: "forward",
    asked: { name: "setVoltage", label: "voltage the set sees (estimate)", unit: "V" },
    tolerance: RELATIVE_3,
    answerStep: "Voltage the set sees",
    generate: (rng) => lampSetup(rng, "Taking the set as a fixed resistance and the lamp at its hot resistance, roughly what voltage does the set see?", true),
    // Only while the lamp is lit near its rating does the hot resistance describe it (the Bench's estimate).
    accept: (ctx) => !ctx.warnings.some((w) => w.level === "caution" && /cold/i.test(w.message)),
    mistakes: (ctx) => [
      {
        value: line(ctx) - (ctx.expected as number),
        step: "Voltage the set sees",
        hint: "That is the lamp's share. The larger the lamp's wattage, the lower its resistance and the more voltage reaches the set.",
      },
    ],
  },
];
