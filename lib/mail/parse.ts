/**
 * A small MIME reader (RFC 2045–2047) for the messages our own sender writes: nested multiparts,
 * base64 and quoted-printable bodies, encoded-word headers, UTF-8. The local sink uses it to store
 * each message as JSON the outbox and the tests can read.
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

function splitHead(raw: Buffer): { head: string; body: Buffer } {
  const at = raw.indexOf("\r\n\r\n");
  if (at < 0) return { head: raw.toString("utf8"), body: Buffer.alloc(0) };
  return { head: raw.subarray(0, at).toString("utf8"), body: raw.subarray(at + 4) };
}

/** RFC 2047 encoded words, e.g. =?UTF-8?Q?caf=C3=A9?= or =?UTF-8?B?Y2Fmw6k=?=. */
export function decodeWords(value: string): string {
  return value
    .replace(/(=\?[^?]+\?[bBqQ]\?[^?]*\?=)\s+(?==\?)/g, "$1")
    .replace(/=\?([^?]+)\?([bBqQ])\?([^?]*)\?=/g, (_m, _charset: string, enc: string, text: string) => {
      if (enc.toUpperCase() === "B") return Buffer.from(text, "base64").toString("utf8");
      return decodeQuotedPrintable(text.replace(/_/g, " ")).toString("utf8");
    });
}

export function decodeQuotedPrintable(text: string): Buffer {
  const soft = text.replace(/=\r?\n/g, "");
  const bytes: number[] = [];
  for (let i = 0; i < soft.length; i++) {
    const c = soft[i];
    if (c === "=" && /^[0-9A-Fa-f]{2}$/.test(soft.slice(i + 1, i + 3))) {
      bytes.push(parseInt(soft.slice(i + 1, i + 3), 16));
      i += 2;
    } else bytes.push(...Buffer.from(c, "utf8"));
  }
  return Buffer.from(bytes);
}

function parseHeaders(head: string): Record<string, string> {
  const headers: Record<string, string> = {};
  for (const line of head.replace(/\r?\n[ \t]+/g, " ").split(/\r?\n/)) {
    const colon = line.indexOf(":");
    if (colon > 0) headers[line.slice(0, colon).trim().toLowerCase()] = line.slice(colon + 1).trim();
  }
  return headers;
}

/** `text/plain; charset=utf-8; name="a b.pdf"` → value and parameters (RFC 2231 `name*=` too). */
function parseParams(header = ""): { value: string; params: Record<string, string> } {
  const [value, ...rest] = header.split(";");
  const params: Record<string, string> = {};
  for (const part of rest) {
    const eq = part.indexOf("=");
    if (eq < 0) continue;
    const key = part.slice(0, eq).trim().toLowerCase();
    let val = part.slice(eq + 1).trim().replace(/^"(.*)"$/, "$1");
    if (key.endsWith("*")) val = decodeURIComponent(val.replace(/^[^']*'[^']*'/, ""));
    params[key.replace(/\*(\d+\*?)?$/, "")] = (params[key.replace(/\*(\d+\*?)?$/, "")] ?? "") + val;
  }
  return { value: value.trim().toLowerCase(), params };
}

function decodeBody(body: Buffer, encoding = ""): Buffer {
  const enc = encoding.trim().toLowerCase();
  if (enc === "base64") return Buffer.from(body.toString("ascii").replace(/\s+/g, ""), "base64");
  if (enc === "quoted-printable") return decodeQuotedPrintable(body.toString("ascii"));
  return body;
}

/** SMTP carries CRLF line ends; readers get plain newlines back. */
const asText = (content: Buffer) => content.toString("utf8").replace(/\r\n/g, "\n");

function walk(raw: Buffer, out: ParsedMail): void {
  const { head, body } = splitHead(raw);
  const headers = parseHeaders(head);
  const type = parseParams(headers["content-type"] ?? "text/plain");
  if (type.value.startsWith("multipart/") && type.params.boundary) {
    const marker = Buffer.from(`--${type.params.boundary}`);
    let start = body.indexOf(marker);
    while (start >= 0) {
      const from = start + marker.length;
      if (body.subarray(from, from + 2).toString() === "--") break;
      const next = body.indexOf(marker, from);
      if (next < 0) break;
      walk(body.subarray(from + 2, next - 2), out); // skip the CRLF after the marker and before the next
      start = next;
    }
    return;
  }
  const content = decodeBody(body, headers["content-transfer-encoding"]);
  const disposition = parseParams(headers["content-disposition"]);
  const filename = disposition.params.filename ?? type.params.name;
  if (disposition.value === "attachment" || (filename && !type.value.startsWith("text/"))) {
    out.attachments.push({ filename: decodeWords(filename ?? "attachment"), contentType: type.value, content });
  } else if (type.value === "text/html") out.html ??= asText(content);
  else if (type.value === "text/plain") out.text ||= asText(content);
}

export function parseMail(raw: Buffer): ParsedMail {
  const headers = parseHeaders(splitHead(raw).head);
  const out: ParsedMail = {
    headers,
    subject: decodeWords(headers.subject ?? ""),
    from: decodeWords(headers.from ?? ""),
    to: decodeWords(headers.to ?? ""),
    text: "",
    attachments: [],
  };
  walk(raw, out);
  return out;
}
