import type { Rng } from "../rng";
import type { DrillKind, DrillSetup, SolvedContext } from "../types";
import { fmt, ohms, RELATIVE_2 } from "./common";

/**
 * Series heater strings of AC/DC sets: the tubes' heaters come from the built-in heater table (the
 * apprentice looks them up as at the bench), the line is the American mains the sets were made for.
 */

const SLUG = "heater-string";

/** Line-ups of the era, one tube per job (common practice): 150 mA and 300 mA strings. */
const LINEUPS: readonly { set: string; tubes: readonly (readonly string[])[] }[] = [
  { set: "a miniature five-tube AC/DC table radio", tubes: [["12BE6"], ["12BA6"], ["12AV6", "12AT6"], ["35C5"], ["35W4"]] },
  { set: "an octal five-tube AC/DC table radio", tubes: [["12SA7"], ["12SK7"], ["12SQ7"], ["35L6GT"], ["35Z5GT"]] },
  {
    set: "a four-tube AC/DC radio without an IF stage",
    tubes: [
      ["12SA7", "12BE6"],
      ["12SQ7", "12AV6"],
      ["50L6GT", "50C5"],
      ["35Z5GT", "35W4"],
    ],
  },
  { set: "a 300 mA AC/DC radio", tubes: [["6SA7"], ["6SK7"], ["6SQ7"], ["25L6GT"], ["25Z6GT"]] },
];

const LINES = [110, 115, 117, 120] as const;

function draw(rng: Rng, ask: string): DrillSetup {
  const l = rng.pick(LINEUPS);
  const tubes = l.tubes.map((choices) => rng.pick(choices));
  const line = rng.pick(LINES);
  return {
    inputs: { lineVoltage: line, tubes },
    prompt: `In ${l.set} the heaters of the ${tubes.join(", ")} are in series across the ${fmt(line, "V")} mains, with a series resistor for the rest. ${ask} Take each heater's rating from the tube data.`,
    given: { Tubes: tubes.join(", "), Mains: fmt(line, "V") },
  };
}

/** A string that needs a dropper of some size, with every heater at the same current (no shunts). */
const needsDropper = (ctx: SolvedContext) => ctx.outputs.currentsMatch === true && (ctx.outputs.droppingResistance as number) > 5;
const lineOf = (ctx: SolvedContext) => ctx.inputs.lineVoltage as number;
const currentOf = (ctx: SolvedContext) => ctx.outputs.stringCurrent as number;

export const heaterStringKinds: DrillKind[] = [
  {
    id: "heater-string/dropper",
    slug: SLUG,
    title: "Series dropper for a heater string",
    direction: "forward",
    asked: { name: "droppingResistance", label: "dropping resistor", unit: "Ω" },
    tolerance: RELATIVE_2,
    answerStep: "Dropping resistor",
    generate: (rng) => draw(rng, "What dropping resistor does the string need?"),
    accept: needsDropper,
    mistakes: (ctx) => [
      {
        value: ohms({ voltage: lineOf(ctx), current: currentOf(ctx) }, "resistance"),
        step: "Dropping resistor",
        hint: "The resistor takes only what the heaters leave: the line voltage minus the string voltage, at the string current.",
      },
      {
        value: ohms({ voltage: ctx.outputs.stringVoltage as number, current: currentOf(ctx) }, "resistance"),
        step: "Dropping resistor",
        hint: "That is the heaters' own resistance; the dropper takes the line voltage the heaters do not use.",
      },
    ],
  },
  {
    id: "heater-string/dissipation",
    slug: SLUG,
    title: "Power in a heater-string dropper",
    direction: "forward",
    asked: { name: "dissipation", label: "power in the dropping resistor", unit: "W" },
    tolerance: RELATIVE_2,
    answerStep: "Dissipation",
    generate: (rng) => draw(rng, "How much power does the dropping resistor dissipate?"),
    accept: needsDropper,
    mistakes: (ctx) => [
      {
        value: ohms({ voltage: lineOf(ctx), current: currentOf(ctx) }, "power"),
        step: "Dissipation",
        hint: "That is what the whole string draws from the line; the dropper dissipates only its own drop times the current.",
      },
    ],
  },
  {
    id: "heater-string/string-voltage",
    slug: SLUG,
    title: "Voltage of a heater string",
    direction: "forward",
    asked: { name: "stringVoltage", label: "voltage the heaters take together", unit: "V" },
    tolerance: RELATIVE_2,
    answerStep: "String voltage",
    generate: (rng) => draw(rng, "How much of the line do the heaters take together?"),
    accept: needsDropper,
  },
];
