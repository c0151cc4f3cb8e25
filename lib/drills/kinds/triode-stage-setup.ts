import { TRIODES } from "../../calc/tables/triodes";
import { outputOf } from "../calc";
import type { Rng } from "../rng";
import type { DrillSetup, SolvedContext } from "../types";
import { fmt, roundTo } from "./common";

/** The triode-stage kinds' shared pieces: the stage drawn, the problem that describes it, the stages worth asking about. */

export const SLUG = "triode-stage";

/** Plate and cathode resistors of the era for each kind of triode (E12 ranges, common practice). */
const HIGH_MU = { ra: [47e3, 270e3], rk: [680, 2700] } as const;
const LOW_MU = { ra: [10e3, 47e3], rk: [470, 2700] } as const;
const MEDIUM = { ra: [10e3, 47e3], rk: [100, 1000] } as const;
const RANGES: Record<string, { ra: readonly [number, number]; rk: readonly [number, number] }> = {
  "12AX7": HIGH_MU,
  "6SL7": HIGH_MU,
  "12AY7": HIGH_MU,
  "12AU7": LOW_MU,
  "6SN7": LOW_MU,
  "6CG7": LOW_MU,
  "12AT7": MEDIUM,
  "6DJ8": MEDIUM,
};

export function drawStage(rng: Rng) {
  const tube = rng.pick(TRIODES.map((t) => t.name));
  const r = RANGES[tube] ?? LOW_MU;
  return {
    tube,
    supplyVoltage: rng.pick([150, 180, 200, 250, 275, 300]),
    plateResistor: rng.preferred("E12", r.ra[0], r.ra[1]),
    cathodeResistor: rng.preferred("E12", r.rk[0], r.rk[1]),
  };
}

/** The stage described, with the plate current a meter would show (three figures). */
export function stageSetup(rng: Rng, ask: string): DrillSetup {
  const s = drawStage(rng);
  const ip = roundTo(outputOrZero({ ...s, cathodeBypassed: true }, "plateCurrent"), 3);
  return {
    inputs: { ...s, cathodeBypassed: true },
    prompt:
      `A ${s.tube} stage runs from ${fmt(s.supplyVoltage, "V")} B+ through a ${fmt(s.plateResistor, "Ω")} plate resistor, ` +
      `with a ${fmt(s.cathodeResistor, "Ω")} cathode resistor; the plate current is ${fmt(ip, "A")}. ${ask}`,
    given: {
      Tube: s.tube,
      "B+": fmt(s.supplyVoltage, "V"),
      "Plate resistor": fmt(s.plateResistor, "Ω"),
      "Cathode resistor": fmt(s.cathodeResistor, "Ω"),
      "Plate current": fmt(ip, "A"),
    },
  };
}

/** The model's plate current, or 0 where it finds no operating point (the draw is then refused). */
export function outputOrZero(inputs: Record<string, unknown>, name: string): number {
  try {
    return outputOf(SLUG, inputs, name);
  } catch {
    return 0;
  }
}

/**
 * A stage an apprentice would meet: solved, neither cut off nor bottomed nor over its rating (no
 * caution from the Bench), and with the plate well up the load line, so the three-figure plate
 * current leaves every answer within its tolerance.
 */
export function ordinary(ctx: SolvedContext): boolean {
  const { plateCurrent: ip, plateToChassisVoltage: va } = ctx.outputs;
  const bPlus = ctx.inputs.supplyVoltage as number;
  if (typeof ip !== "number" || !(ip > 0) || typeof va !== "number") return false;
  return va > 0.4 * bPlus && va < 0.8 * bPlus && !ctx.warnings.some((w) => w.level === "caution");
}

export const current = (ctx: SolvedContext) => ctx.outputs.plateCurrent as number;
