import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { processSingletonFor } from "@/lib/singleton";
import { serverEnv } from "@/server/env";
import { mailFrom } from "./config";

/** One outgoing message. `workshopId` tags it so each owner's outbox shows only their workshop's mail. */
export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
  workshopId?: number;
}

export class MailNotConfiguredError extends Error {
  constructor() {
    super("E-mail is not set up: set SMTP_URL (see README.md).");
  }
}

function transport(): Transporter {
  // Read at send time: the local sink fills SMTP_URL in when it starts (instrumentation.ts).
  const url = serverEnv().SMTP_URL;
  if (!url) throw new MailNotConfiguredError();
  return processSingletonFor("Transport", url, () => nodemailer.createTransport(url));
}

/** Sends one message over SMTP; rejects when the server does not accept it. */
export async function sendMail(message: OutgoingMail): Promise<void> {
  await transport().sendMail({
    from: mailFrom(),
    to: message.to,
    subject: message.subject,
    text: message.text,
    html: message.html,
    attachments: message.attachments?.map((a) => ({ filename: a.filename, content: a.content, contentType: a.contentType })),
    headers: message.workshopId ? { "X-Glowbench-Workshop": String(message.workshopId) } : undefined,
  });
}
