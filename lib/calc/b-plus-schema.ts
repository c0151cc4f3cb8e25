import { z } from "zod";
import { findRectifier, RECTIFIERS, type RectifierEntry } from "./tables/rectifiers";
import { optionalQuantity, quantity, quantityWithDefault } from "./units";

/** The B+ calculator's inputs: the secondary, the rectifier circuit and its tube or drop, the load, the reservoir. */

export const B_PLUS_RECTIFIERS = ["full-wave", "bridge", "half-wave"] as const;
export type Circuit = (typeof B_PLUS_RECTIFIERS)[number];

export const TUBES = new Map<string, RectifierEntry>(RECTIFIERS.map((r) => [r.type, r]));

const tubeName = z
  .unknown()
  .transform((raw, ctx): string | undefined => {
    if (raw === undefined || raw === null || (typeof raw === "string" && raw.trim() === "")) return undefined;
    if (typeof raw !== "string") {
      ctx.addIssue({ code: "custom", message: "Rectifier tube must be a type number such as 5Y3GT" });
      return z.NEVER;
    }
    const row = findRectifier(raw);
    if (!row) {
      ctx.addIssue({ code: "custom", message: `Rectifier tube "${raw.trim()}" is not in the built-in table; give its drop under rectifierDrop instead` });
      return z.NEVER;
    }
    return row.type;
  })
  .optional();

export const bPlusSchema = z
  .object({
    secondaryVoltage: quantity("voltage", { positive: true, min: 1, max: 5000, label: "Secondary voltage" }),
    rectifier: z.enum(B_PLUS_RECTIFIERS, { error: 'Rectifier must be "full-wave", "bridge" or "half-wave"' }),
    rectifierTube: tubeName,
    rectifierDrop: optionalQuantity("voltage", { nonNegative: true, max: 500, label: "Rectifier drop" }),
    loadCurrent: quantity("current", { positive: true, min: 1e-6, max: 10, label: "Load current" }),
    capacitance: quantity("capacitance", { positive: true, min: 1e-9, max: 10, label: "Reservoir capacitance" }),
    lineFrequency: quantityWithDefault("frequency", 60, { positive: true, min: 1, max: 10_000, label: "Line frequency" }),
    windingResistance: quantityWithDefault("resistance", 0, { nonNegative: true, max: 1e6, label: "Winding resistance" }),
  })
  .superRefine((v, ctx) => {
    if (v.rectifierTube === undefined) return;
    if (v.rectifierDrop !== undefined) {
      ctx.addIssue({ code: "custom", path: ["rectifierTube"], message: "Rectifier tube: give either a tube or a rectifier drop, not both" });
      return;
    }
    const circuit = TUBES.get(v.rectifierTube)!.circuit;
    if (v.rectifier === "bridge") {
      ctx.addIssue({
        code: "custom",
        path: ["rectifierTube"],
        message: `Rectifier tube: one ${v.rectifierTube} cannot make a bridge; give the drop of each rectifier under rectifierDrop instead`,
      });
    } else if (circuit === "half-wave" && v.rectifier !== "half-wave") {
      ctx.addIssue({
        code: "custom",
        path: ["rectifierTube"],
        message: `Rectifier tube: the ${v.rectifierTube} is a half-wave rectifier; choose the half-wave circuit, or give a drop instead`,
      });
    }
  });

export type BPlusInput = z.output<typeof bPlusSchema>;
