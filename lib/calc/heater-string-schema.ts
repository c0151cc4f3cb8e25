import { z } from "zod";
import { findHeater } from "./tables/heaters";
import type { OutputValue } from "./types";
import { quantity, quantityWithDefault } from "./units";

/** The heater-string calculator's inputs (heaters by rating or tubes by type, an optional pilot lamp) and its outputs' shape. */

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
