import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
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

const globalForMail = globalThis as unknown as { __glowbenchTransport?: { url: string; transport: Transporter } };

function transport(): Transporter {
  // Read at send time: the local sink sets SMTP_URL when it starts (instrumentation.ts).
  const url = process.env.SMTP_URL;
  if (!url) throw new MailNotConfiguredError();
  const cached = globalForMail.__glowbenchTransport;
  if (cached?.url === url) return cached.transport;
  const created = nodemailer.createTransport(url);
  globalForMail.__glowbenchTransport = { url, transport: created };
  return created;
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
