import { z } from "zod";

/** The "ready to collect" message form: what the technician may edit before it goes. */
export const readyMessageSchema = z.object({
  subject: z.string({ error: "Give the message a subject." }).trim().min(1, "Give the message a subject.").max(200, "Keep the subject under 200 characters."),
  text: z.string({ error: "Write the message." }).trim().min(1, "Write the message.").max(5000, "Keep the message under 5,000 characters."),
});
export type ReadyMessageForm = z.input<typeof readyMessageSchema>;
