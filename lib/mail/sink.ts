import { randomUUID } from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import { SMTPServer } from "smtp-server";
import { parseMail } from "./parse";

/**
 * The local SMTP sink: accepts every message on loopback and stores it twice in `dir`, as the raw
 * `<id>.eml` and as `<id>.json` (envelope, subject, text, html, attachments in base64) for the
 * outbox and the tests. Never started in a real production deployment.
 */

export interface StoredMail {
  id: string;
  receivedAt: string;
  envelope: { from: string; to: string[] };
  headers: Record<string, string>;
  from: string;
  to: string;
  subject: string;
  text: string;
  html?: string;
  workshopId: number | null;
  attachments: { filename: string; contentType: string; size: number; contentBase64: string }[];
}

const MAX_MESSAGE_BYTES = 25 * 1024 * 1024;

export async function storeMessage(dir: string, raw: Buffer, envelope: StoredMail["envelope"]): Promise<StoredMail> {
  const parsed = await parseMail(raw);
  const receivedAt = new Date();
  // Time first so a plain sort of the names is the order of arrival.
  const id = `${receivedAt.getTime().toString().padStart(14, "0")}-${randomUUID().slice(0, 8)}`;
  const workshop = Number(parsed.headers["x-glowbench-workshop"]);
  const mail: StoredMail = {
    id,
    receivedAt: receivedAt.toISOString(),
    envelope,
    headers: parsed.headers,
    from: parsed.from,
    to: parsed.to,
    subject: parsed.subject,
    text: parsed.text,
    html: parsed.html,
    workshopId: Number.isInteger(workshop) && workshop > 0 ? workshop : null,
    attachments: parsed.attachments.map((a) => ({
      filename: a.filename,
      contentType: a.contentType,
      size: a.content.length,
      contentBase64: a.content.toString("base64"),
    })),
  };
  fs.mkdirSync(dir, { recursive: true });
  fs.writeFileSync(path.join(dir, `${id}.eml`), raw);
  // Written under a temporary name then renamed, so a reader never sees half a file.
  const tmp = path.join(dir, `.${id}.json.tmp`);
  fs.writeFileSync(tmp, JSON.stringify(mail));
  fs.renameSync(tmp, path.join(dir, `${id}.json`));
  return mail;
}

export interface MailSink {
  url: string;
  port: number;
  close(): Promise<void>;
}

export function startMailSink(dir: string, port = 0): Promise<MailSink> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS", "AUTH"],
    logger: false,
    size: MAX_MESSAGE_BYTES,
    banner: "Glowbench local mail sink",
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on("data", (c: Buffer) => chunks.push(c));
      stream.on("end", () => {
        const envelope = {
          from: session.envelope.mailFrom ? session.envelope.mailFrom.address : "",
          to: session.envelope.rcptTo.map((r) => r.address),
        };
        storeMessage(dir, Buffer.concat(chunks), envelope).then(
          () => callback(),
          (err: Error) => callback(err),
        );
      });
    },
  });
  return new Promise((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, "127.0.0.1", () => {
      const actual = (server.server.address() as { port: number }).port;
      resolve({
        url: `smtp://127.0.0.1:${actual}`,
        port: actual,
        close: () => new Promise<void>((done) => server.close(() => done())),
      });
    });
  });
}
