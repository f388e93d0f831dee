/**
 * A small MIME reader for what the in-process SMTP fake receives (messages nodemailer composed):
 * headers with RFC 2047 encoded words, nested multipart bodies, quoted-printable and base64
 * transfer encodings, and the charset of each text part. Enough for the outbox, not a general
 * mail parser: attachments are skipped.
 */

export interface ParsedMessage {
  messageId: string | null;
  from: string;
  to: string;
  subject: string;
  text: string;
  html: string | null;
}

type Headers = Map<string, string[]>;

function splitHeaderBody(raw: string): { head: string; body: string } {
  const match = /\r?\n\r?\n/.exec(raw);
  if (!match) return { head: raw, body: "" };
  return { head: raw.slice(0, match.index), body: raw.slice(match.index + match[0].length) };
}

/** Unfold continuation lines and index header values by lower-case name. */
function parseHeaders(head: string): Headers {
  const headers: Headers = new Map();
  const lines = head.split(/\r?\n/);
  const unfolded: string[] = [];
  for (const line of lines) {
    if (/^[ \t]/.test(line) && unfolded.length > 0) unfolded[unfolded.length - 1] += line;
    else unfolded.push(line);
  }
  for (const line of unfolded) {
    const colon = line.indexOf(":");
    if (colon <= 0) continue;
    const name = line.slice(0, colon).trim().toLowerCase();
    const list = headers.get(name) ?? [];
    list.push(line.slice(colon + 1).trim());
    headers.set(name, list);
  }
  return headers;
}

/** "text/plain; charset=utf-8" -> { value: "text/plain", params: { charset: "utf-8" } } */
function headerWithParams(value: string | undefined): { value: string; params: Record<string, string> } {
  if (!value) return { value: "", params: {} };
  const parts: string[] = [];
  let current = "";
  let quoted = false;
  for (const ch of value) {
    if (ch === '"') quoted = !quoted;
    if (ch === ";" && !quoted) {
      parts.push(current);
      current = "";
    } else current += ch;
  }
  parts.push(current);
  const params: Record<string, string> = {};
  for (const p of parts.slice(1)) {
    const eq = p.indexOf("=");
    if (eq < 0) continue;
    params[p.slice(0, eq).trim().toLowerCase()] = p.slice(eq + 1).trim().replace(/^"(.*)"$/, "$1");
  }
  return { value: parts[0].trim().toLowerCase(), params };
}

function decodeCharset(bytes: Buffer, charset = "utf-8"): string {
  try {
    return new TextDecoder(charset.toLowerCase()).decode(bytes);
  } catch {
    return bytes.toString("utf8");
  }
}

/** Quoted-printable (body) or Q (header, with "_" for space) to bytes. */
function decodeQuotedPrintable(text: string, underscoreIsSpace: boolean): Buffer {
  const source = underscoreIsSpace ? text.replace(/_/g, " ") : text.replace(/=\r?\n/g, "");
  const bytes: number[] = [];
  for (let i = 0; i < source.length; i++) {
    const ch = source[i];
    const hex = source.slice(i + 1, i + 3);
    if (ch === "=" && /^[0-9A-Fa-f]{2}$/.test(hex)) {
      bytes.push(parseInt(hex, 16));
      i += 2;
    } else {
      bytes.push(source.charCodeAt(i) & 0xff);
    }
  }
  return Buffer.from(bytes);
}

/** RFC 2047: =?charset?Q|B?text?= words; whitespace between adjacent encoded words is dropped. */
export function decodeEncodedWords(value: string): string {
  const joined = value.replace(/(\?=)\s+(=\?)/g, "$1$2");
  return joined.replace(/=\?([^?]+)\?([QqBb])\?([^?]*)\?=/g, (_m, charset: string, enc: string, text: string) => {
    const bytes = enc.toUpperCase() === "B" ? Buffer.from(text, "base64") : decodeQuotedPrintable(text, true);
    return decodeCharset(bytes, charset.split("*")[0]);
  });
}

function decodeBody(body: string, transferEncoding: string, charset: string | undefined): string {
  const cte = transferEncoding.toLowerCase();
  const bytes =
    cte === "quoted-printable"
      ? decodeQuotedPrintable(body, false)
      : cte === "base64"
        ? Buffer.from(body.replace(/\s+/g, ""), "base64")
        : Buffer.from(body, "latin1");
  return decodeCharset(bytes, charset);
}

function escapeRegExp(s: string): string {
  return s.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
}

/** Walk the MIME tree, keeping the first text/plain and text/html parts that are not attachments. */
function walk(head: Headers, body: string, found: { text?: string; html?: string }, depth: number): void {
  const type = headerWithParams(head.get("content-type")?.[0] ?? "text/plain");
  const disposition = headerWithParams(head.get("content-disposition")?.[0]);
  if (type.value.startsWith("multipart/") && type.params.boundary && depth < 5) {
    const delimiter = new RegExp(`^--${escapeRegExp(type.params.boundary)}(--)?[ \\t]*$`, "m");
    const chunks = body.split(delimiter).filter((c) => c !== undefined && c !== "--");
    // chunks[0] is the preamble; the parts follow; the last chunk after the closing delimiter is the epilogue.
    for (const chunk of chunks.slice(1)) {
      const trimmed = chunk.replace(/^\r?\n/, "").replace(/\r?\n$/, "");
      if (!trimmed.trim()) continue;
      const part = splitHeaderBody(trimmed);
      walk(parseHeaders(part.head), part.body, found, depth + 1);
    }
    return;
  }
  if (disposition.value === "attachment") return;
  const cte = head.get("content-transfer-encoding")?.[0] ?? "7bit";
  if (type.value === "text/plain" && found.text === undefined) found.text = decodeBody(body, cte, type.params.charset);
  if (type.value === "text/html" && found.html === undefined) found.html = decodeBody(body, cte, type.params.charset);
}

/** Parse one raw RFC 5322 message (bytes as received by the SMTP server). */
export function parseMessage(raw: Buffer): ParsedMessage {
  // latin1 keeps every byte; each part is decoded with its own charset afterwards.
  const { head, body } = splitHeaderBody(raw.toString("latin1"));
  const headers = parseHeaders(head);
  const header = (name: string) => decodeCharset(Buffer.from(headers.get(name)?.[0] ?? "", "latin1"));
  const found: { text?: string; html?: string } = {};
  walk(headers, body, found, 0);
  return {
    messageId: header("message-id") || null,
    from: decodeEncodedWords(header("from")),
    to: decodeEncodedWords(header("to")),
    subject: decodeEncodedWords(header("subject")),
    text: (found.text ?? "").replace(/\r\n/g, "\n"),
    html: found.html === undefined ? null : found.html.replace(/\r\n/g, "\n"),
  };
}

/** http(s) links in a plain-text body, in order, without duplicates. */
export function extractLinks(text: string): string[] {
  return [...new Set(text.match(/https?:\/\/[^\s<>"')]+/g) ?? [])];
}
