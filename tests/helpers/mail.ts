import fs from "node:fs";
import path from "node:path";
import { inject } from "vitest";
import type { StoredMail } from "../../lib/mail/sink";

/** What the test SMTP sink received (global-setup.ts starts it; the server sends to it over SMTP). */

export interface ReceivedMail {
  id: string;
  to: string[];
  subject: string;
  text: string;
  html?: string;
  headers: Record<string, string>;
  attachments: { filename: string; contentType: string; content: Buffer }[];
}

function toReceived(m: StoredMail): ReceivedMail {
  return {
    id: m.id,
    to: m.envelope.to.map((a) => a.toLowerCase()),
    subject: m.subject,
    text: m.text,
    html: m.html,
    headers: m.headers,
    attachments: m.attachments.map((a) => ({ filename: a.filename, contentType: a.contentType, content: Buffer.from(a.contentBase64, "base64") })),
  };
}

/** Every message received so far, oldest first. */
export function receivedMail(): ReceivedMail[] {
  const dir = inject("mailDir");
  let names: string[] = [];
  try {
    names = fs.readdirSync(dir).filter((n) => n.endsWith(".json") && !n.startsWith("."));
  } catch {
    return [];
  }
  return names.sort().map((n) => toReceived(JSON.parse(fs.readFileSync(path.join(dir, n), "utf8")) as StoredMail));
}

export function mailTo(address: string): ReceivedMail[] {
  return receivedMail().filter((m) => m.to.includes(address.toLowerCase()));
}

/** Waits for the `count`-th message to an address (1 = the first) and returns it. */
export async function waitForMail(address: string, { count = 1, timeoutMs = 10_000 } = {}): Promise<ReceivedMail> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const found = mailTo(address);
    if (found.length >= count) return found[count - 1];
    if (Date.now() > until) throw new Error(`No message #${count} to ${address} within ${timeoutMs} ms (got ${found.length}).`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

/** The first link in a message's text that starts with the server's address and the given path. */
export function linkIn(mail: ReceivedMail, pathPrefix: string): string {
  const match = mail.text.match(new RegExp(`https?://[^\\s]+${pathPrefix.replace(/[/]/g, "\\/")}[^\\s]*`));
  if (!match) throw new Error(`No ${pathPrefix} link in: ${mail.text}`);
  return match[0];
}
