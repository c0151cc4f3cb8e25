import { z } from "zod";
import { quantity } from "@/lib/calc/units";
import { requiredText } from "./fields";

export const logNoteSchema = z.object({
  kind: z.literal("note"),
  text: requiredText(2000, "The entry", "Write what you did or found."),
});

/** A current-limited bring-up: what the supply was set to, what the set drew, what was seen. */
export const powerUpSchema = z.object({
  kind: z.literal("power-up"),
  supplyVoltage: quantity("voltage", { positive: true, max: 1000, label: "Supply voltage" }),
  currentDrawn: quantity("current", { nonNegative: true, max: 100, label: "Current drawn" }),
  text: requiredText(2000, "What was seen", "Say what you saw, heard or smelt at power-up."),
});

export const logEntrySchema = z.discriminatedUnion("kind", [logNoteSchema, powerUpSchema], {
  error: "Choose a note or a power-up entry.",
});
export type LogEntryValues = z.output<typeof logEntrySchema>;
