import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { localMailEnabled } from "@/server/mail/config";
import { parseMail } from "@/lib/mail/parse";
import { sendMail } from "@/server/mail/send";
import { startMailSink, type MailSink, type StoredMail } from "@/lib/mail/sink";

let sink: MailSink;
let dir: string;
const previousUrl = process.env.SMTP_URL;

beforeAll(async () => {
  dir = fs.mkdtempSync(path.join(os.tmpdir(), "glowbench-mail-"));
  sink = await startMailSink(dir);
  process.env.SMTP_URL = sink.url;
});
afterAll(async () => {
  process.env.SMTP_URL = previousUrl;
  await sink.close();
});

function stored(): StoredMail[] {
  return fs
    .readdirSync(dir)
    .filter((n) => n.endsWith(".json"))
    .sort()
    .map((n) => JSON.parse(fs.readFileSync(path.join(dir, n), "utf8")));
}

describe("sendMail over SMTP to the local sink", () => {
  test("subject, text, html, workshop tag and a binary attachment arrive intact", async () => {
    const pdf = Buffer.concat([Buffer.from("%PDF-1.7\n"), Buffer.from([0, 1, 2, 250, 251, 255]), Buffer.alloc(5000, 7)]);
    const text = "Your set is ready — the 6V6s glow evenly.\n".repeat(30) + "Line with = sign and trailing space ";
    await sendMail({
      to: "Customer@Example.com",
      subject: "Ready to collect: café radio ✓",
      text,
      html: "<p>Ready — <b>café</b></p>",
      attachments: [{ filename: "bench sheet 12.pdf", content: pdf, contentType: "application/pdf" }],
      workshopId: 42,
    });
    const [mail] = stored();
    expect(mail.envelope.to.map((a) => a.toLowerCase())).toEqual(["customer@example.com"]);
    expect(mail.subject).toBe("Ready to collect: café radio ✓");
    expect(mail.text.trimEnd()).toBe(text.trimEnd());
    expect(mail.html).toBe("<p>Ready — <b>café</b></p>");
    expect(mail.workshopId).toBe(42);
    expect(mail.attachments).toHaveLength(1);
    expect(mail.attachments[0]).toMatchObject({ filename: "bench sheet 12.pdf", contentType: "application/pdf", size: pdf.length });
    expect(Buffer.from(mail.attachments[0].contentBase64, "base64").equals(pdf)).toBe(true);
    expect(fs.existsSync(path.join(dir, `${mail.id}.eml`))).toBe(true);
  });

  test("a message without a workshop tag is stored with workshopId null", async () => {
    await sendMail({ to: "someone@example.com", subject: "Plain", text: "Hello" });
    const last = stored().at(-1)!;
    expect(last.subject).toBe("Plain");
    expect(last.text.trim()).toBe("Hello");
    expect(last.workshopId).toBeNull();
    expect(last.attachments).toEqual([]);
  });
});

describe("MIME decoding", () => {
  // RFC 2047 encoded words and RFC 2045 quoted-printable, written out by hand rather than by our sender.
  const raw = (headers: string[], body: string) => Buffer.from([...headers, "MIME-Version: 1.0", "", body].join("\r\n"));

  test("encoded words in B and Q form", async () => {
    const mail = await parseMail(
      raw(["From: =?UTF-8?Q?Caf=C3=A9_bench?= <bench@example.com>", "To: a@example.com", "Subject: =?UTF-8?B?Y2Fmw6k=?= and =?UTF-8?Q?caf=C3=A9_bar?="], "Hi"),
    );
    expect(mail.subject).toBe("café and café bar");
    expect(mail.from).toContain("Café bench");
    expect(mail.headers.subject).toBe("=?UTF-8?B?Y2Fmw6k=?= and =?UTF-8?Q?caf=C3=A9_bar?=");
  });
  test("quoted-printable soft breaks and escapes", async () => {
    const mail = await parseMail(
      raw(["Subject: QP", "Content-Type: text/plain; charset=utf-8", "Content-Transfer-Encoding: quoted-printable"], "a=3Db=\r\nc =E2=9C=93"),
    );
    expect(mail.text.trimEnd()).toBe("a=bc ✓");
  });
});

describe("local mail only outside real production", () => {
  test.each([
    [{ NODE_ENV: "development" }, true],
    [{ NODE_ENV: "production" }, false],
    [{ NODE_ENV: "production", GLOWBENCH_DEMO: "1" }, true],
    [{ NODE_ENV: "production", GLOWBENCH_MAIL_DIR: "/tmp/x" }, true],
  ])("%o → %s", (env, expected) => {
    const saved = { NODE_ENV: process.env.NODE_ENV, GLOWBENCH_DEMO: process.env.GLOWBENCH_DEMO, GLOWBENCH_MAIL_DIR: process.env.GLOWBENCH_MAIL_DIR };
    const target = process.env as Record<string, string | undefined>;
    delete target.GLOWBENCH_DEMO;
    delete target.GLOWBENCH_MAIL_DIR;
    Object.assign(target, env);
    try {
      expect(localMailEnabled()).toBe(expected);
    } finally {
      for (const [k, v] of Object.entries(saved)) {
        if (v === undefined) delete target[k];
        else target[k] = v;
      }
    }
  });
});
