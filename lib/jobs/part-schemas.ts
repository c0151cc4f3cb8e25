import { z } from "zod";
import { PART_KINDS, PART_STATES } from "@/lib/vocabulary";
import { optionalText, requiredText } from "./fields";

export const PART_KIND_LABELS: Record<(typeof PART_KINDS)[number], string> = {
  paper: "Paper capacitor",
  electrolytic: "Electrolytic",
  mica: "Mica capacitor",
  ceramic: "Ceramic capacitor",
  film: "Film capacitor",
  resistor: "Resistor",
  tube: "Tube",
  other: "Other",
};

/** How many to order: whole pieces. */
const quantityField = z.union([z.number(), z.string()], { error: "Enter how many, as a whole number." }).transform((v, ctx) => {
  const n = typeof v === "number" ? v : v.trim() === "" ? Number.NaN : Number(v.trim());
  if (!Number.isInteger(n) || n < 1 || n > 9999) {
    ctx.addIssue({ code: "custom", message: "Enter how many as a whole number from 1 to 9999." });
    return z.NEVER;
  }
  return n;
});

/**
 * A unit cost as typed ("1.20", "1,250.00"); blank clears it. The server turns it into minor units of the
 * workshop's currency with parseMoney (lib/money), never through a float, and refuses extra decimals.
 */
const unitCostField = optionalText(20, "Unit cost")
  .refine((v) => v == null || /^\d{1,9}(\.\d{1,3})?$/.test(v.replace(/,/g, "")), "Enter a price like 1.20, or leave it blank.")
  .optional();

export const partFields = {
  designator: requiredText(20, "The designator", "Give the part's designator, like C12 or R4."),
  kind: z.enum(PART_KINDS, { error: `Kind must be one of ${PART_KINDS.join(", ")}.` }),
  originalValue: optionalText(40, "Original value"),
  originalRating: optionalText(40, "Original rating"),
  replacementValue: optionalText(40, "Replacement value"),
  replacementRating: optionalText(40, "Replacement rating"),
  state: z.enum(PART_STATES, { error: `State must be one of ${PART_STATES.join(", ")}.` }).default("to-order"),
  quantity: quantityField.optional(),
  unitCost: unitCostField,
  supplier: optionalText(80, "Supplier").optional(),
  supplierPartNumber: optionalText(60, "The supplier's part number").optional(),
};

export const partSchema = z.object(partFields);
export type PartInput = z.input<typeof partSchema>;
export type PartValues = z.output<typeof partSchema>;

export const partUpdateSchema = z
  .object({
    ...partFields,
    designator: partFields.designator.optional(),
    kind: partFields.kind.optional(),
    state: z.enum(PART_STATES, { error: `State must be one of ${PART_STATES.join(", ")}.` }).optional(),
    /** A technician's check of a fitted part (apprentices may record fitting, not check it). */
    checked: z.boolean({ error: "Send checked as true or false." }).optional(),
  })
  .refine((v) => Object.values(v).some((x) => x !== undefined), { message: "Send at least one field to change." });
export type PartUpdate = z.output<typeof partUpdateSchema>;

/** CSV import body: the file's text, read in the browser (the route takes JSON only). */
export const partsImportSchema = z.object({
  csv: z.string({ error: "Send the CSV text under csv." }).min(1, "The CSV file is empty.").max(60_000, "Keep the CSV under 60 kB."),
});
