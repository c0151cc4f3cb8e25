import { z } from "zod";
import { optionalQuantity, quantity } from "@/lib/calc/units";
import { POWER_UP_CHECKLIST, POWER_UP_LIMITERS, POWER_UP_OUTCOMES, type PowerUpChecklistId } from "@/lib/vocabulary";
import { optionalText } from "./fields";

/** A current-limited bring-up: the session, its steps, and how it ended. */

/** Every checklist item as an optional tick; an item not sent is not done. Unknown items are refused. */
const checklistSchema = z
  .strictObject(
    Object.fromEntries(POWER_UP_CHECKLIST.map((c) => [c.id, z.boolean({ error: `Tick “${c.label}” with true or false.` }).optional()])) as Record<
      PowerUpChecklistId,
      z.ZodOptional<z.ZodBoolean>
    >,
    {
      error: (iss) =>
        iss.code === "unrecognized_keys"
          ? `The checklist has no item ${iss.keys.join(", ")}; its items are ${POWER_UP_CHECKLIST.map((c) => c.id).join(", ")}.`
          : "Send the checklist as { item: true | false }.",
    },
  )
  .default({})
  .transform((v) => Object.fromEntries(POWER_UP_CHECKLIST.map((c) => [c.id, v[c.id] === true])) as Record<PowerUpChecklistId, boolean>);

export const powerUpSchema = z
  .object({
    limiter: z.enum(POWER_UP_LIMITERS, { error: "Choose the limiter: variable transformer, series lamp or current-limited supply." }),
    lampPower: optionalQuantity("power", { positive: true, max: 1000, label: "Lamp power" }),
    currentLimit: optionalQuantity("current", { positive: true, max: 20, label: "Current limit" }),
    stopCurrent: quantity("current", { positive: true, max: 20, label: "Stop current" }),
    checklist: checklistSchema,
  })
  .superRefine((v, ctx) => {
    if (v.limiter === "series-lamp" && v.lampPower === undefined)
      ctx.addIssue({ code: "custom", path: ["lampPower"], message: "Give the series lamp's power, like 100 W." });
    if (v.limiter === "limited-supply" && v.currentLimit === undefined)
      ctx.addIssue({ code: "custom", path: ["currentLimit"], message: "Give the supply's current limit, like 0.5 A." });
  });
export type PowerUpInput = z.input<typeof powerUpSchema>;
export type PowerUpValues = z.output<typeof powerUpSchema>;

export const powerUpStepSchema = z.object({
  supplyVoltage: quantity("voltage", { positive: true, max: 1000, label: "Supply voltage" }),
  currentDrawn: quantity("current", { nonNegative: true, max: 100, label: "Current drawn" }),
  minutes: quantity("ratio", { nonNegative: true, max: 1440, label: "Minutes held" }),
  bPlus: optionalQuantity("voltage", { nonNegative: true, max: 2000, label: "B+" }),
  note: optionalText(2000, "What was seen, heard or smelt"),
});
export type PowerUpStepInput = z.input<typeof powerUpStepSchema>;
export type PowerUpStepValues = z.output<typeof powerUpStepSchema>;

/** The session's end. A reason is required only to pass a session with a step over its stop current (checked with the steps). */
export const powerUpOutcomeSchema = z.object({
  outcome: z.enum(POWER_UP_OUTCOMES, { error: "Choose passed or stopped." }),
  reason: optionalText(1000, "The reason"),
});
export type PowerUpOutcomeInput = z.input<typeof powerUpOutcomeSchema>;
export type PowerUpOutcomeValues = z.output<typeof powerUpOutcomeSchema>;
