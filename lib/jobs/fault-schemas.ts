import { z } from "zod";
import { FAULT_CANDIDATE_STATUSES } from "@/lib/vocabulary";
import { optionalText, requiredText } from "./fields";

/** A fault hunt: symptom → candidates in test order → evidence → the cause → the repair. */

export const faultSchema = z.object({
  symptom: requiredText(300, "The symptom", "Describe the symptom, like “No vertical deflection: a bright horizontal line”."),
  section: optionalText(80, "The section"),
});
export type FaultInput = z.input<typeof faultSchema>;
export type FaultValues = z.output<typeof faultSchema>;

/** The resolution is the repair as done; a blank one clears it. The symptom may be reworded. */
export const faultUpdateSchema = z
  .object({
    symptom: faultSchema.shape.symptom.optional(),
    section: faultSchema.shape.section,
    resolution: optionalText(2000, "The resolution"),
  })
  .refine((v) => Object.values(v).some((x) => x !== undefined), { message: "Send the resolution, or another field to change." });
export type FaultUpdate = z.output<typeof faultUpdateSchema>;

export const candidateSchema = z.object({
  description: requiredText(200, "The candidate", "Say what might cause it, like “Vertical output tube”."),
});
export type CandidateInput = z.input<typeof candidateSchema>;
export type CandidateValues = z.output<typeof candidateSchema>;

/** A reading of this job's Readings tab as evidence; null unlinks it. */
const readingId = z
  .union([z.number(), z.string()], { error: "Choose a reading from the Readings tab." })
  .nullable()
  .optional()
  .transform((v, ctx): number | null | undefined => {
    if (v === undefined || v === null) return v;
    if (typeof v === "string" && v.trim() === "") return null;
    const n = Number(v);
    if (!Number.isSafeInteger(n) || n < 1) {
      ctx.addIssue({ code: "custom", message: "Choose a reading from the Readings tab." });
      return z.NEVER;
    }
    return n;
  });

export const candidateUpdateSchema = z
  .object({
    status: z.enum(FAULT_CANDIDATE_STATUSES, { error: "Status must be open, ruled-out or cause." }).optional(),
    evidence: optionalText(1000, "The evidence"),
    readingId,
    description: candidateSchema.shape.description.optional(),
  })
  .refine((v) => Object.values(v).some((x) => x !== undefined), { message: "Send the status, evidence or reading to record." });
export type CandidateUpdate = z.output<typeof candidateUpdateSchema>;
