import { z } from "zod";
import { resistorDriftSchema } from "@/lib/calc/resistor-drift";
import { quantity, quantityWithDefault } from "@/lib/calc/units";
import { requiredText } from "./fields";

/** A reading is either a resistor-survey row (Ω) or a voltage test point (V, nominal = expected). */

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

/**
 * The part(s) a voltage was measured across, so a capacitor's rating is compared only with a
 * reading taken at its own position: "C12", or "C5a, C5b" for a test point across several.
 * Stored tidied ("C5a, C5b"); blank means none named.
 */
export const partDesignatorsField = z
  .string({ error: "The parts at this test point must be text, like “C5a, C5b”." })
  .max(200, "Keep the parts at this test point under 200 characters.")
  .nullable()
  .optional()
  .transform((v, ctx) => {
    const list = splitDesignators(v ?? "");
    const long = list.find((d) => d.length > 20);
    if (long) {
      ctx.addIssue({ code: "custom", message: `“${long.slice(0, 24)}…” is not a part designator: list them like “C5a, C5b”.` });
      return z.NEVER;
    }
    return list.length ? list.join(", ") : null;
  });

/** "C5a, C5b", "C5a; C5b", "C5a & C5b" or "C5a C5b" → ["C5a", "C5b"]. */
export function splitDesignators(text: string): string[] {
  return text.split(/[\s,;&]+/).filter(Boolean);
}

export const voltageReadingSchema = z.object({
  kind: z.literal("voltage"),
  designator,
  partDesignators: partDesignatorsField,
  nominal: quantity("voltage", { min: -1e6, max: 1e6, label: "Expected voltage" }),
  measured: quantity("voltage", { min: -1e6, max: 1e6, label: "Measured voltage" }),
  tolerance,
});

export const readingSchema = z.discriminatedUnion("kind", [resistorReadingSchema, voltageReadingSchema], {
  error: "Choose resistor or voltage as the kind of reading.",
});
export type ReadingValues = z.output<typeof readingSchema>;
