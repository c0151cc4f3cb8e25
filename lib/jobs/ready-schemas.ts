import { readyMessageSchema } from "@/lib/mail/ready-schemas";
import { statusChangeSchema } from "./job-schemas";
import { readyOverrideFields, requireOverrideReason } from "./ready-checks";

/**
 * The status change and the customer's ready message, each with the way past the checks before "ready":
 * `{ override: true, reason }`. Without a reason an override is refused, naming `reason`.
 */
export const statusChangeWithChecksSchema = statusChangeSchema.extend(readyOverrideFields).superRefine(requireOverrideReason);
export type StatusChangeWithChecks = ReturnType<typeof statusChangeWithChecksSchema.parse>;

export const readyMessageSendSchema = readyMessageSchema.extend(readyOverrideFields).superRefine(requireOverrideReason);
export type ReadyMessageSend = ReturnType<typeof readyMessageSendSchema.parse>;
