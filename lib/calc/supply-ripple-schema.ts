import { z } from "zod";
import { formatQuantity } from "./format";
import { stageSchema } from "./ripple-stages";
import { RECTIFIER_TYPES, findRectifier } from "./tables/rectifiers";
import { quantity, quantityWithDefault } from "./units";

/** The supply-ripple calculator's inputs: the load, the reservoir, the mains and rectifier, and the filter stages after it. */

export const RECTIFIERS = ["full-wave", "half-wave"] as const;

const rectifierTubeField = z
  .unknown()
  .transform((raw, ctx): string | undefined => {
    if (raw === undefined || raw === null || (typeof raw === "string" && raw.trim() === "")) return undefined;
    const found = typeof raw === "string" ? findRectifier(raw) : undefined;
    if (!found) {
      ctx.addIssue({ code: "custom", message: `Rectifier tube is not in the built-in table; choose one of ${RECTIFIER_TYPES.join(", ")}` });
      return z.NEVER;
    }
    return found.type;
  })
  .optional();

export const supplyRippleSchema = z
  .object({
    loadCurrent: quantity("current", { positive: true, min: 1e-6, max: 100, label: "Load current" }),
    capacitance: quantity("capacitance", { positive: true, min: 1e-9, max: 10, label: "Reservoir capacitance" }),
    lineFrequency: quantityWithDefault("frequency", 60, { positive: true, min: 1, max: 10_000, label: "Line frequency" }).default(60),
    rectifier: z.enum(RECTIFIERS, { error: 'Rectifier must be "full-wave" or "half-wave"' }),
    rectifierTube: rectifierTubeField,
    stages: z.array(stageSchema).max(10, { error: "At most 10 filter stages" }).optional(),
  })
  .superRefine((v, ctx) => {
    // The reservoir feeds every stage, so no stage can carry more than the whole load current.
    v.stages?.forEach((s, i) => {
      if (s.current !== undefined && s.current > v.loadCurrent) {
        ctx.addIssue({
          code: "custom",
          path: ["stages", i, "current"],
          message: `Stage ${i + 1} current cannot be more than the ${formatQuantity(v.loadCurrent, "A")} load current: the reservoir supplies every stage`,
        });
      }
    });
  });

export type SupplyRippleInput = z.output<typeof supplyRippleSchema>;
