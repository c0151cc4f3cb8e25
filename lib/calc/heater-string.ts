import { z } from "zod";
import { formatQuantity, texQuantity, tex } from "./format";
import { toPrecision } from "./precision";
import { highVoltageWarning } from "./safety";
import { findHeater, HEATER_SOURCE, TUBE_NAMES } from "./tables/heaters";
import { suggestedRating } from "./tables/wattage";
import { defineCalculator, type Step, type Warning } from "./types";
import { quantity, tidy } from "./units";

/**
 * Series heater string on the mains: the heaters carry one current, their voltages add, and a
 * dropping resistor takes up the difference, R = (V_line − ΣV)/I (Ohm's law; RCA receiving tube
 * manual, application notes on series heater operation).
 */

// Rated currents within this fraction of each other count as one string current (common practice).
const MATCH = 0.02;
const MAX_HEATERS = 40;

const LIVE_CHASSIS =
  "A heater string across the mains usually means an AC/DC set whose chassis can be tied to one side of the line. " +
  "Work on it through an isolation transformer and never trust a plug's orientation.";
const COLD_SURGE =
  "Cold heaters draw a surge well above their rating until they warm up, and one open heater breaks the whole string: every tube goes dark.";

const heater = z.object({
  voltage: quantity("voltage", { positive: true, max: 500, label: "Heater voltage" }),
  current: quantity("current", { positive: true, max: 20, label: "Heater current" }),
});

/** A list of type numbers, or one text like "12BE6, 12BA6 12AV6"; names are checked against the table. */
const tubeList = z
  .union([z.array(z.string()), z.string()], { error: "Tubes must be a list of type numbers" })
  .transform((raw, ctx) => {
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
    heaters: z.array(heater).max(MAX_HEATERS, { error: `At most ${MAX_HEATERS} heaters` }).optional(),
    tubes: tubeList.optional(),
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

export const calculator = defineCalculator({
  slug: "heater-string",
  title: "Series heater string",
  purpose: "Whether a string of heaters in series suits the mains, and the dropping resistor it needs.",
  group: "supplies",
  inputs: [
    { name: "lineVoltage", label: "Line voltage", unit: "V", required: true, control: "quantity", quantity: "voltage", help: "The mains voltage (rms) across the whole string." },
    { name: "heaters", label: "Heaters", unit: "", required: false, control: "list", help: "Each heater's rated voltage and current, e.g. { voltage: 12.6, current: 0.15 }. Or name the tubes instead." },
    { name: "tubes", label: "Tubes", unit: "", required: false, control: "list", options: TUBE_NAMES, help: "Type numbers from the built-in table, e.g. 12BE6, 12BA6, 12AV6, 50C5, 35W4." },
  ],
  outputs: [
    { name: "stringVoltage", label: "Voltage the string needs", unit: "V" },
    { name: "stringCurrent", label: "String current", unit: "A" },
    { name: "currentsMatch", label: "Heater currents match", unit: "" },
    { name: "droppingResistance", label: "Dropping resistor", unit: "Ω" },
    { name: "dissipation", label: "Dropping resistor dissipation", unit: "W" },
    { name: "suggestedRating", label: "Suggested power rating", unit: "W" },
  ],
  schema: heaterStringSchema,
  formulas: [
    { label: "String voltage", latex: tex`V_{string} = \sum_k V_k` },
    { label: "Dropping resistor", latex: tex`R = \frac{V_{line} - V_{string}}{I}` },
    { label: "Dissipation", latex: tex`P = (V_{line} - V_{string})\,I = I^2 R` },
  ],
  references: [
    { title: "RCA receiving tube manual (RC-series)", detail: "Heater ratings of each type; application notes on series heater strings (from memory)" },
    { title: "Built-in heater table", detail: HEATER_SOURCE },
    { title: "Radiotron Designer's Handbook, 4th ed.", detail: "Series heater operation in AC/DC receivers (chapter not checked)" },
  ],
  whyItMatters:
    "In an AC/DC radio or a series-string television every heater is in one loop across the mains. Their " +
    "voltages add up, the same current flows through them all, and whatever the string does not use must be " +
    "dropped by a resistor or a ballast. Substituting a tube with a different heater current, or getting the " +
    "resistor wrong, over-runs some heaters and under-runs others — and one open heater darkens the whole set.",
  compute(input: HeaterStringInput) {
    const vLine = input.lineVoltage;
    let sum = 0;
    let iMin = Infinity;
    let iMax = -Infinity;
    // A plain loop over the given heaters or the table entries, in list order (the sum's rounding depends on it).
    const given = input.heaters && input.heaters.length > 0 ? input.heaters : null;
    const n = given ? given.length : (input.tubes?.length ?? 0);
    for (let k = 0; k < n; k++) {
      const h = given ? given[k] : findHeater(input.tubes![k])!;
      sum += h.voltage;
      if (h.current < iMin) iMin = h.current;
      if (h.current > iMax) iMax = h.current;
    }
    const stringVoltage = tidy(sum);
    const currentsMatch = iMax <= iMin * (1 + MATCH);
    const stringCurrent = iMin;
    const excess = vLine - stringVoltage;
    const needed = excess > 0;
    const droppingResistance = needed ? excess / stringCurrent : 0;
    const dissipation = needed ? excess * stringCurrent : 0;
    const rating = needed ? suggestedRating(dissipation) : { rating: 0, warning: null };

    const warnings: Warning[] = highVoltageWarning(vLine);
    if (vLine > 50) {
      warnings.push({ level: "caution", message: LIVE_CHASSIS });
    }
    if (!currentsMatch) {
      warnings.push({
        level: "caution",
        message:
          `The heaters are rated for different currents (${formatQuantity(iMin, "A")} to ${formatQuantity(iMax, "A")}). ` +
          "In series they all carry one current, so this string only approximately suits the lowest-current heater's rating: " +
          "the others run cool, and the lowest-current one may be over-run while the others warm up. Use tubes of one heater current, or shunt the odd heater.",
      });
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
    warnings.push({ level: "info", message: COLD_SURGE });

    return {
      outputs: { stringVoltage, stringCurrent, currentsMatch, droppingResistance, dissipation, suggestedRating: rating.rating },
      warnings,
    };
  },
  explain(input: HeaterStringInput, o) {
    const vLine = input.lineVoltage;
    const { stringVoltage, stringCurrent, currentsMatch, droppingResistance, dissipation } = o;
    const terms = heaterList(input).map((h) => texQuantity(h.voltage, "V")).join(" + ");
    const steps: Step[] = [
      { label: "String voltage", latex: tex`V_{string} = ${terms} = ${texQuantity(stringVoltage, "V", 4)}` },
      {
        label: currentsMatch ? "String current (all heaters rated alike)" : "String current (lowest rated heater current)",
        latex: tex`I = ${texQuantity(stringCurrent, "A")}`,
      },
    ];
    if (vLine - stringVoltage > 0) {
      steps.push(
        {
          label: "Dropping resistor",
          latex: tex`R = \frac{V_{line} - V_{string}}{I} = \frac{${texQuantity(vLine, "V")} - ${texQuantity(stringVoltage, "V")}}{${texQuantity(stringCurrent, "A")}} = ${texQuantity(droppingResistance, "Ω")}`,
        },
        {
          label: "Dissipation",
          latex: tex`P = (V_{line} - V_{string})\,I = ${texQuantity(vLine - stringVoltage, "V")} \times ${texQuantity(stringCurrent, "A")} = ${texQuantity(dissipation, "W")}`,
        },
        {
          label: "Suggested rating (at least twice the dissipation)",
          latex: o.suggestedRating === null
            ? tex`2P = ${texQuantity(2 * dissipation, "W")} \text{ — above the largest standard rating}`
            : tex`2P = ${texQuantity(2 * dissipation, "W")} \;\Rightarrow\; ${texQuantity(o.suggestedRating, "W")}`,
        },
      );
    } else {
      steps.push({
        label: "No dropping resistor",
        latex: tex`V_{string} = ${texQuantity(stringVoltage, "V", 4)} \ge V_{line} = ${texQuantity(vLine, "V")} \;\Rightarrow\; R = 0`,
      });
    }
    return steps;
  },
});

/** The heaters as voltage and current, from the table when tubes are named. */
function heaterList(input: HeaterStringInput): { voltage: number; current: number }[] {
  if (input.heaters && input.heaters.length > 0) return input.heaters;
  return (input.tubes ?? []).map((name) => findHeater(name)!);
}
