import { z } from "zod";
import { formatQuantity, tex } from "./format";
import { explainHeaterString } from "./heater-string-explain";
import { lampModel, lampWarnings } from "./heater-string-lamp";
import { COLD_SURGE, findTapped, LIVE_CHASSIS, MATCH, mixedStringWarnings, noTapWarning } from "./heater-string-notes";
import { toPrecision } from "./precision";
import { highVoltageWarning } from "./safety";
import { findHeater, HEATER_SOURCE, TAP_SOURCE, TUBE_NAMES } from "./tables/heaters";
import { nearestPreferred } from "./tables/preferred-values";
import { suggestedRating } from "./tables/wattage";
import { defineCalculator, type OutputValue, type Warning } from "./types";
import { quantity, quantityWithDefault, tidy } from "./units";

/**
 * Series heater string on the mains. In series one current flows through every heater, so the string runs
 * at the highest rated heater current; each heater rated for less gets a shunt resistor across it that
 * carries the difference, R = Vh/(I − Ih), and the dropper takes up the rest of the line, R = (V_line − ΣV)/I
 * (Ohm's and Kirchhoff's laws; RCA receiving tube manual, application notes on series heater operation).
 */

const MAX_HEATERS = 40;

const heater = z.object({
  voltage: quantity("voltage", { positive: true, min: 1e-3, max: 500, label: "Heater voltage" }),
  current: quantity("current", { positive: true, min: 1e-4, max: 20, label: "Heater current" }),
});

/** A lamp across the tapped section of a rectifier heater; the rectifier's DC through the tap is optional. */
const pilotLamp = z
  .object(
    {
      voltage: quantity("voltage", { positive: true, min: 0.5, max: 250, label: "Pilot lamp voltage" }),
      current: quantity("current", { positive: true, min: 1e-3, max: 5, label: "Pilot lamp current" }),
      rectifierCurrent: quantityWithDefault("current", 0, { nonNegative: true, max: 2, label: "Rectifier DC current through the tap" }),
    },
    { error: "Pilot lamp must be given as its rated voltage and current, e.g. { voltage: 6.3, current: 0.15 }" },
  )
  .nullish();

/** A list of type numbers, or one text like "12BE6, 12BA6 12AV6"; names are checked against the table. */
const tubeList = z.union([z.array(z.string()), z.string()], { error: "Tubes must be a list of type numbers" }).transform((raw, ctx) => {
  const names = (typeof raw === "string" ? raw.split(/[,;\s]+/) : raw).map((s) => s.trim());
  const list = typeof raw === "string" ? names.filter(Boolean) : names;
  if (list.length > MAX_HEATERS) {
    ctx.addIssue({ code: "custom", message: `At most ${MAX_HEATERS} tubes` });
    return z.NEVER;
  }
  return list.map((name, i) => {
    const entry = findHeater(name);
    if (!entry) {
      ctx.addIssue({
        code: "custom",
        path: [i],
        message: `tubes.${i}: unknown tube type "${name}" — it is not in the built-in heater table; enter its heater voltage and current under heaters instead`,
      });
      return name;
    }
    return entry.names[0];
  });
});

export const heaterStringSchema = z
  .object({
    lineVoltage: quantity("voltage", { positive: true, max: 1000, label: "Line voltage" }),
    heaters: z
      .array(heater)
      .max(MAX_HEATERS, { error: `At most ${MAX_HEATERS} heaters` })
      .optional(),
    tubes: tubeList.optional(),
    pilotLamp,
  })
  .superRefine((v, ctx) => {
    const hasHeaters = (v.heaters?.length ?? 0) > 0;
    const hasTubes = (v.tubes?.length ?? 0) > 0;
    if (hasHeaters && hasTubes) {
      ctx.addIssue({ code: "custom", path: ["tubes"], message: "Give either heaters or tubes, not both" });
    } else if (!hasHeaters && !hasTubes) {
      ctx.addIssue({
        code: "custom",
        path: ["heaters"],
        message: "Heaters are required: list each heater's voltage and current, or name the tubes instead",
      });
    }
  });

export type HeaterStringInput = z.output<typeof heaterStringSchema>;

/** One shunt resistor, across the heater at `index` (0-based, as in the input list). */
export type Shunt = { index: number; type?: string; resistance: number; dissipation: number; suggestedRating: number | null; nearestPreferred: number };

export type HeaterStringOutputs = {
  stringVoltage: number;
  stringCurrent: number;
  currentsMatch: boolean;
  droppingResistance: number;
  dissipation: number;
  suggestedRating: number | null;
  nearestPreferred: number;
  shunts: Shunt[];
  pilotLampVoltage: number | null;
  pilotLampCurrent: number | null;
  tapSectionCurrent: number | null;
  stringCurrentWithLamp: number | null;
} & Record<string, OutputValue>;

export const calculator = defineCalculator({
  slug: "heater-string",
  title: "Series heater string",
  purpose: "Whether a string of heaters in series suits the mains, the dropping resistor it needs, and a shunt for each odd heater.",
  bench: {
    group: "supplies",
    example: { lineVoltage: "120 V", tubes: ["12BE6", "12BA6", "12AV6", "35C5", "35W4"] },
    headlines: ["droppingResistance", "suggestedRating"],
    alwaysDanger: false,
    chart: null,
    modes: [
      { id: "tubes", label: "By tube type", fields: ["tubes"] },
      { id: "heaters", label: "By heater rating", fields: ["heaters"] },
    ],
    advanced: { title: "Pilot lamp on the rectifier's heater tap", fields: ["pilotLamp"] },
    // Unequal heater currents need shunts: a caution, not a danger.
    tones: [{ output: "currentsMatch", when: false, tone: "caution" }],
  },
  inputs: [
    {
      name: "lineVoltage",
      label: "Line voltage",
      unit: "V",
      required: true,
      control: "quantity",
      quantity: "voltage",
      help: "The mains voltage (rms) across the whole string.",
    },
    {
      name: "heaters",
      label: "Heaters",
      unit: "",
      required: false,
      control: "list",
      help: "Each heater's rated voltage and current, e.g. { voltage: 12.6, current: 0.15 }. Or name the tubes instead.",
    },
    {
      name: "tubes",
      label: "Tubes",
      unit: "",
      required: false,
      control: "list",
      options: TUBE_NAMES,
      help: "Type numbers from the built-in table, e.g. 12BE6, 12BA6, 12AV6, 50C5, 35W4.",
    },
    {
      name: "pilotLamp",
      label: "Pilot lamp on the rectifier's heater tap",
      unit: "",
      required: false,
      control: "list",
      help: "A lamp across the tapped section of a 35W4 or 35Z5GT heater: { voltage, current } of the lamp, and optionally rectifierCurrent, the DC the rectifier's plate draws through the tap.",
    },
  ],
  outputs: [
    { name: "stringVoltage", label: "Voltage the string needs", unit: "V" },
    { name: "stringCurrent", label: "String current (the highest heater current)", unit: "A" },
    { name: "currentsMatch", label: "Heater currents match", unit: "" },
    { name: "droppingResistance", label: "Dropping resistor", unit: "Ω" },
    { name: "dissipation", label: "Dropping resistor dissipation", unit: "W" },
    { name: "suggestedRating", label: "Suggested power rating", unit: "W" },
    { name: "nearestPreferred", label: "Nearest E12 dropping resistor", unit: "Ω" },
    { name: "shunts", label: "Shunt resistors", unit: "" },
    { name: "pilotLampVoltage", label: "Pilot lamp voltage", unit: "V" },
    { name: "pilotLampCurrent", label: "Pilot lamp current", unit: "A" },
    { name: "tapSectionCurrent", label: "Current in the tapped heater section", unit: "A" },
    { name: "stringCurrentWithLamp", label: "String current with the lamp fitted", unit: "A" },
  ],
  schema: heaterStringSchema,
  formulas: [
    { label: "String voltage", latex: tex`V_{string} = \sum_k V_k` },
    { label: "String current", latex: tex`I = \max_k I_k` },
    { label: "Shunt across a heater rated I_h", latex: tex`R_{sh} = \frac{V_h}{I - I_h}, \quad P_{sh} = V_h\,(I - I_h)` },
    { label: "Dropping resistor", latex: tex`R = \frac{V_{line} - V_{string}}{I}` },
    { label: "Dissipation", latex: tex`P = (V_{line} - V_{string})\,I = I^2 R` },
    { label: "Pilot lamp across a heater section", latex: tex`V_{lamp} = (I_h + I_{dc})\,\frac{R_{sec} R_{lamp}}{R_{sec} + R_{lamp}}` },
  ],
  references: [
    {
      title: "RCA Receiving Tube Manual (RC-series)",
      detail: "Heater ratings on each type's data page; application notes on series heater strings and shunting a lower-current heater (from memory)",
    },
    {
      title: "Radiotron Designer's Handbook, 4th ed.",
      detail: "Chapter on heaters and filaments: series operation in AC/DC receivers (from memory; chapter not checked)",
    },
    { title: "Built-in heater table", detail: HEATER_SOURCE },
    { title: "Pilot-lamp tap and warm-up figures", detail: TAP_SOURCE },
    {
      title: '"Longer Life for Dial Lamps", period magazine note on the 35Z5GT',
      detail: "Lamp across the 7.5 V heater section with the plate fed through it: about 110 mA in the lamp, 90 mA in the section (read in a web reprint)",
    },
    {
      title: 'Nuts and Volts, Q&A "Not Just For Looks"',
      detail: "35W4 pilot-lamp tap: the plate current flows through lamp and section, and an open lamp overloads the section (read)",
    },
    { title: "IEC 60063, Preferred number series for resistors and capacitors", detail: "E12 series" },
  ],
  whyItMatters:
    "In an AC/DC radio or a series-string television every heater is in one loop across the mains. Their " +
    "voltages add up, the same current flows through them all, and whatever the string does not use must be " +
    "dropped by a resistor or a ballast. A heater rated for less than the others needs a shunt resistor to carry " +
    "the difference; leave it out, or get the dropper wrong, and some heaters are over-run while others run cold — " +
    "and one open heater darkens the whole set.",
  compute(input: HeaterStringInput) {
    const vLine = input.lineVoltage;
    let sum = 0;
    let iMin = Infinity;
    let iMax = -Infinity;
    let vMax = 0;
    // Plain loops over the given heaters or the table entries, in list order (the sum's rounding depends on it).
    const given = input.heaters && input.heaters.length > 0 ? input.heaters : null;
    const tubes = given ? null : (input.tubes ?? []);
    const n = given ? given.length : tubes!.length;
    for (let k = 0; k < n; k++) {
      const h = given ? given[k] : findHeater(tubes![k])!;
      sum += h.voltage;
      if (h.current < iMin) iMin = h.current;
      if (h.current > iMax) iMax = h.current;
      if (h.voltage > vMax) vMax = h.voltage;
    }
    const stringVoltage = tidy(sum);
    const currentsMatch = iMax <= iMin * (1 + MATCH);
    // One current in series: the highest rating, so no heater is starved; the others are shunted up to it.
    const stringCurrent = iMax;
    const excess = vLine - stringVoltage;
    const needed = excess > 0;
    const droppingResistance = needed ? excess / stringCurrent : 0;
    const dissipation = needed ? excess * stringCurrent : 0;
    const rating = needed ? suggestedRating(dissipation) : { rating: 0, warning: null };
    const pref = droppingResistance > 0 ? nearestPreferred(droppingResistance, "E12") : 0;

    const lamp = input.pilotLamp ?? null;
    const warnings: Warning[] = highVoltageWarning(vLine, vMax, lamp?.voltage);
    if (vLine > 50) warnings.push({ level: "caution", message: LIVE_CHASSIS });

    const shunts: Shunt[] = [];
    if (iMin < iMax) {
      const nearlyAlike: string[] = [];
      for (let k = 0; k < n; k++) {
        const h = given ? given[k] : findHeater(tubes![k])!;
        if (h.current >= iMax) continue;
        // The shunt carries what the heater does not, at the heater's own voltage (Kirchhoff's current law).
        const rest = iMax - h.current;
        const resistance = h.voltage / rest;
        const p = h.voltage * rest;
        const r = suggestedRating(p);
        if (r.warning) warnings.push(r.warning);
        const shunt: Shunt = {
          index: k,
          resistance,
          dissipation: p,
          suggestedRating: r.rating,
          nearestPreferred: resistance > 0 ? nearestPreferred(resistance, "E12") : 0,
        };
        if (tubes) shunt.type = tubes[k];
        shunts.push(shunt);
        if (h.current >= iMax / (1 + MATCH)) nearlyAlike.push(tubes ? tubes[k] : `Heater ${k + 1}`);
      }
      mixedStringWarnings(iMin, iMax, nearlyAlike, tubes, warnings);
    }
    if (excess < 0) {
      const short = (-excess / stringVoltage) * 100;
      warnings.push({
        level: "caution",
        message:
          `The string needs ${formatQuantity(stringVoltage, "V")}, more than the ${formatQuantity(vLine, "V")} line, so every heater runs about ${toPrecision(short, 2)}% below its rating. ` +
          "A few per cent is how many AC/DC sets were built; much more and emission suffers.",
      });
    }
    if (rating.warning) warnings.push(rating.warning);

    let lampOut: { v: number; i: number; sec: number; string: number } | null = null;
    if (lamp) {
      const tapped = findTapped(tubes);
      if (tapped) {
        const m = lampModel(tapped, lamp, vLine, stringVoltage, stringCurrent, droppingResistance);
        lampWarnings(m, lamp, warnings);
        lampOut = { v: m.lampVoltage, i: m.lampCurrent, sec: m.sectionCurrent, string: m.currentWith };
      } else {
        warnings.push(noTapWarning(tubes !== null));
      }
    }
    warnings.push({ level: "info", message: COLD_SURGE });

    const outputs: HeaterStringOutputs = {
      stringVoltage,
      stringCurrent,
      currentsMatch,
      droppingResistance,
      dissipation,
      suggestedRating: rating.rating,
      nearestPreferred: pref,
      shunts,
      pilotLampVoltage: lampOut ? lampOut.v : null,
      pilotLampCurrent: lampOut ? lampOut.i : null,
      tapSectionCurrent: lampOut ? lampOut.sec : null,
      stringCurrentWithLamp: lampOut ? lampOut.string : null,
    };
    return { outputs, warnings };
  },
  explain: (input: HeaterStringInput, o: HeaterStringOutputs) => explainHeaterString(input, o),
});
