import { simpleParser, type AddressObject, type HeaderLines } from "mailparser";

/**
 * Reads a message as the local sink received it, with mailparser (MIME, encoded words, quoted-printable,
 * base64, charsets), into what the outbox and the tests read: decoded subject and addresses, the plain and
 * HTML bodies, the attachments, and the raw headers (X-Glowbench-Workshop says whose outbox it shows in).
 */

export interface ParsedAttachment {
  filename: string;
  contentType: string;
  content: Buffer;
}

export interface ParsedMail {
  headers: Record<string, string>;
  subject: string;
  from: string;
  to: string;
  text: string;
  html?: string;
  attachments: ParsedAttachment[];
}

/** Each header as sent (unfolded, not decoded), by its lower-case name; a repeated header keeps its last value. */
function rawHeaders(lines: HeaderLines): Record<string, string> {
  const headers: Record<string, string> = {};
  for (const { key, line } of lines)
    headers[key] = line
      .slice(line.indexOf(":") + 1)
      .replace(/\r?\n[ \t]+/g, " ")
      .trim();
  return headers;
}

/** "Name <address>" as a person writes it (mailparser's own text quotes every name). */
const addresses = (field: AddressObject | AddressObject[] | undefined) =>
  [field ?? []]
    .flat()
    .flatMap((a) => a.value)
    .map((v) => (v.name ? `${v.name} <${v.address ?? ""}>` : (v.address ?? "")))
    .join(", ");

/** SMTP carries CRLF line ends; readers get plain newlines back. */
const plain = (text: string) => text.replace(/\r\n/g, "\n");

export async function parseMail(raw: Buffer): Promise<ParsedMail> {
  // Bodies exactly as sent: no text made from the HTML, no HTML made from the text, cid: links left alone.
  const mail = await simpleParser(raw, { skipHtmlToText: true, skipTextToHtml: true, keepCidLinks: true });
  return {
    headers: rawHeaders(mail.headerLines),
    subject: mail.subject ?? "",
    from: addresses(mail.from),
    to: addresses(mail.to),
    text: plain(mail.text ?? ""),
    html: typeof mail.html === "string" ? plain(mail.html) : undefined,
    attachments: mail.attachments.map((a) => ({ filename: a.filename ?? "attachment", contentType: a.contentType, content: a.content })),
  };
}
