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

export const partFields = {
  designator: requiredText(20, "The designator", "Give the part's designator, like C12 or R4."),
  kind: z.enum(PART_KINDS, { error: `Kind must be one of ${PART_KINDS.join(", ")}.` }),
  originalValue: optionalText(40, "Original value"),
  originalRating: optionalText(40, "Original rating"),
  replacementValue: optionalText(40, "Replacement value"),
  replacementRating: optionalText(40, "Replacement rating"),
  state: z.enum(PART_STATES, { error: `State must be one of ${PART_STATES.join(", ")}.` }).default("to-order"),
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
