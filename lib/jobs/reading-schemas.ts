import { z } from "zod";
import { resistorDriftSchema } from "@/lib/calc/resistor-drift";
import { quantity, quantityWithDefault } from "@/lib/calc/units";
import { requiredText } from "./fields";

/** A reading is either a resistor-survey row (Ω) or a voltage test point (V, nominal = expected). */

export const READING_KINDS = ["resistor", "voltage"] as const;
export const DEFAULT_READING_TOLERANCE = 0.2;

const designator = requiredText(40, "The designator", "Say which part or test point, like R4 or “B+ at C5a”.");
const tolerance = quantityWithDefault("ratio", DEFAULT_READING_TOLERANCE, { positive: true, max: 1, label: "Tolerance" }).prefault("");

export const resistorReadingSchema = z.object({
  kind: z.literal("resistor"),
  designator,
  nominal: quantity("resistance", { positive: true, max: 1e15, label: "Nominal resistance" }),
  // The same reading rules as the resistor-drift calculator: "open" / "OL" for over-range.
  measured: resistorDriftSchema.shape.measured,
  tolerance,
});

export const voltageReadingSchema = z.object({
  kind: z.literal("voltage"),
  designator,
  nominal: quantity("voltage", { min: -1e6, max: 1e6, label: "Expected voltage" }),
  measured: quantity("voltage", { min: -1e6, max: 1e6, label: "Measured voltage" }),
  tolerance,
});

export const readingSchema = z.discriminatedUnion("kind", [resistorReadingSchema, voltageReadingSchema], {
  error: "Choose resistor or voltage as the kind of reading.",
});
export type ReadingInput = z.input<typeof readingSchema>;
export type ReadingValues = z.output<typeof readingSchema>;
