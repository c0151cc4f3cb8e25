import { invert, outputOf, slipOf } from "../calc";
import { OPERATING_POINTS, TRIODE_POINTS, type OperatingPoint } from "../operating-points";
import type { Rng } from "../rng";
import type { DrillKind, DrillSetup, MistakeSpec, SolvedContext } from "../types";
import { EXACT, fmt, nearby, noDerating, RELATIVE_2, TWO_PI } from "./common";

/** Cathode bias: the resistor, its wattage and rating, the bias a fitted resistor gives, the bypass corner. */

const SLUG = "cathode-bias";

interface Point {
  op: OperatingPoint;
  plateCurrent: number;
  screenCurrent: number;
  /** "draws" for the data sheet's figure, "measured" when varied as a real tube would be. */
  measured: boolean;
}

/** A data-sheet point, or half the time the currents a real tube of the type was measured at. */
function drawPoint(rng: Rng, points: readonly OperatingPoint[] = OPERATING_POINTS): Point {
  const op = rng.pick(points);
  if (rng.chance(0.5)) return { op, plateCurrent: op.plateCurrent, screenCurrent: op.screenCurrent, measured: false };
  return { op, plateCurrent: nearby(rng, op.plateCurrent), screenCurrent: op.screenCurrent ? nearby(rng, op.screenCurrent) : 0, measured: true };
}

function currents(p: Point): { text: string; given: Record<string, string> } {
  const verb = p.measured ? "is measured at" : "runs at";
  const given: Record<string, string> = { Tube: p.op.type, "Plate current": fmt(p.plateCurrent, "A") };
  if (p.screenCurrent > 0) {
    given["Screen current"] = fmt(p.screenCurrent, "A");
    return { text: `${verb} ${fmt(p.plateCurrent, "A")} plate current and ${fmt(p.screenCurrent, "A")} screen current`, given };
  }
  return { text: `${verb} ${fmt(p.plateCurrent, "A")} plate current`, given };
}

function pointSetup(rng: Rng, ask: string, points?: readonly OperatingPoint[]): DrillSetup {
  const p = drawPoint(rng, points);
  const c = currents(p);
  return {
    inputs: { biasVoltage: p.op.bias, plateCurrent: p.plateCurrent, screenCurrent: p.screenCurrent },
    prompt: `A ${p.op.type} in the ${p.op.role} ${c.text}, with ${fmt(p.op.bias, "V")} of grid bias from its cathode resistor. ${ask}`,
    given: { ...c.given, "Grid bias": fmt(p.op.bias, "V") },
  };
}

/** The same figure with the screen current left out of the cathode current. */
function withoutScreen(ctx: SolvedContext, output: string, hint: string): MistakeSpec[] {
  if (!((ctx.inputs.screenCurrent as number) > 0)) return [];
  return [{ value: slipOf(SLUG, { ...ctx.inputs, screenCurrent: 0 }, output), step: "Cathode current", hint }];
}

const SCREEN_HINT = "The screen current returns through the cathode too: add it to the plate current before working with the cathode current.";

export const cathodeBiasKinds: DrillKind[] = [
  {
    id: "cathode-bias/resistor",
    slug: SLUG,
    title: "Cathode resistor for a bias",
    direction: "forward",
    asked: { name: "cathodeResistance", label: "cathode resistor", unit: "Ω" },
    tolerance: RELATIVE_2,
    answerStep: "Cathode resistance",
    generate: (rng) => pointSetup(rng, "What cathode resistor gives that bias?"),
    mistakes: (ctx) => [
      ...withoutScreen(ctx, "cathodeResistance", SCREEN_HINT),
      {
        value: ctx.outputs.nearestPreferred as number,
        step: "Nearest E12",
        hint: "The question asks for the resistance the bias needs; rounding to a preferred value comes after.",
      },
    ],
  },
  {
    id: "cathode-bias/dissipation",
    slug: SLUG,
    title: "Power in the cathode resistor",
    direction: "forward",
    asked: { name: "dissipation", label: "power in the cathode resistor", unit: "W" },
    tolerance: RELATIVE_2,
    answerStep: "Dissipation",
    generate: (rng) => pointSetup(rng, "How much power does the cathode resistor dissipate?"),
    mistakes: (ctx) => withoutScreen(ctx, "dissipation", SCREEN_HINT),
  },
  {
    id: "cathode-bias/rating",
    slug: SLUG,
    title: "Wattage rating of a cathode resistor",
    direction: "forward",
    asked: { name: "suggestedRating", label: "resistor wattage rating", unit: "W" },
    tolerance: EXACT,
    answerStep: "Suggested rating",
    generate: (rng) => pointSetup(rng, "What standard wattage rating should the cathode resistor have, allowing the usual factor of two?"),
    mistakes: (ctx) => [...withoutScreen(ctx, "suggestedRating", SCREEN_HINT), ...noDerating(ctx.outputs.dissipation as number)],
  },
  {
    id: "cathode-bias/bias-from-resistor",
    slug: SLUG,
    title: "Bias from a fitted cathode resistor",
    direction: "backward",
    asked: { name: "biasVoltage", label: "grid bias", unit: "V" },
    tolerance: RELATIVE_2,
    answerStep: "Cathode resistance",
    generate(rng) {
      const p = drawPoint(rng);
      const c = currents(p);
      // A fitted part is a preferred value: the E12 member nearest the data sheet's resistor.
      const rk = outputOf(SLUG, { biasVoltage: p.op.bias, plateCurrent: p.op.plateCurrent, screenCurrent: p.op.screenCurrent }, "nearestPreferred");
      return {
        inputs: { plateCurrent: p.plateCurrent, screenCurrent: p.screenCurrent },
        prompt: `A ${p.op.type} in the ${p.op.role} has a ${fmt(rk, "Ω")} cathode resistor and ${c.text}. What grid bias does the resistor set?`,
        given: { ...c.given, "Cathode resistor": fmt(rk, "Ω") },
        solve: { input: "biasVoltage", output: "cathodeResistance", target: rk, lo: 0.01, hi: 1000 },
      };
    },
    mistakes(ctx) {
      if (!((ctx.inputs.screenCurrent as number) > 0) || !ctx.setup.solve) return [];
      const { input, output, target, lo, hi } = ctx.setup.solve;
      let plateOnly = Number.NaN;
      try {
        plateOnly = invert(SLUG, { ...ctx.setup.inputs, screenCurrent: 0 }, input, output, target, lo, hi);
      } catch {
        // No such bias within the bracket: the mistake is left out.
      }
      return [
        {
          value: plateOnly,
          step: "Cathode current",
          hint: "The bias is the cathode resistor times the whole cathode current: plate and screen current together.",
        },
      ];
    },
  },
  {
    id: "cathode-bias/bypass-corner",
    slug: SLUG,
    title: "Corner frequency of a cathode bypass",
    direction: "forward",
    asked: { name: "bypassCornerFrequency", label: "bypass corner frequency", unit: "Hz" },
    tolerance: RELATIVE_2,
    answerStep: "Bypass corner frequency",
    generate(rng) {
      const ck = rng.pick([5, 10, 20, 25, 50, 100]) * 1e-6;
      const s = pointSetup(
        rng,
        `It is bypassed by ${fmt(ck, "F")}. Taking the cathode resistor alone (the first estimate), at what frequency is the bypass 3 dB down?`,
        TRIODE_POINTS,
      );
      return { ...s, inputs: { ...s.inputs, bypassCapacitance: ck }, given: { ...s.given, "Bypass capacitor": fmt(ck, "F") } };
    },
    mistakes: (ctx) => [
      {
        value: (ctx.expected as number) * TWO_PI,
        step: "Bypass corner frequency",
        hint: "1/(R·C) is the corner in radians per second; divide by 2π for hertz.",
      },
    ],
  },
];
