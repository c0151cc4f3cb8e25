import fs from "node:fs";
import path from "node:path";
import { databasePath } from "@/db/client";

/**
 * Interim transport for the estimate e-mails until the workshop's e-mail transport (lib/mail/send.ts) is in:
 * development, the demo and the tests append each message to `outbox.jsonl` beside the database, where the
 * tests read it. A production build without the demo refuses, so nothing is silently lost.
 * Swap the body for `export { sendMail } from "@/lib/mail/send"` when that lands.
 */
export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
}

export function outboxPath(): string {
  return path.join(path.dirname(databasePath()), "outbox.jsonl");
}

export async function sendMail(mail: OutgoingMail): Promise<void> {
  if (process.env.NODE_ENV === "production" && process.env.GLOWBENCH_DEMO !== "1" && !process.env.GLOWBENCH_OUTBOX) {
    throw new Error("E-mail is not set up on this Glowbench yet.");
  }
  fs.appendFileSync(outboxPath(), `${JSON.stringify({ ...mail, at: new Date().toISOString() })}\n`);
}
