/**
 * Client file names are display text only. They are cut to their last path segment, stripped
 * of control and bidi characters, shortened, and given the extension of what the server stored.
 * Content-Disposition carries an ASCII fallback (quoted, no quotes or backslashes) plus the
 * RFC 5987/6266 `filename*` in UTF-8 (ASVS 5.4.1/5.4.2).
 */

// eslint-disable-next-line no-control-regex
const UNSAFE_CHARS = /[\u0000-\u001f\u007f-\u009f\u200b-\u200f\u202a-\u202e\u2066-\u2069\ufeff]/g;
const MAX_BASE = 100;

/** "../../etc/passwd.png" -> "passwd"; "" -> "upload". */
export function displayBaseName(original: string | undefined): string {
  const lastSegment = String(original ?? "").split(/[\\/]/).pop() ?? "";
  const cleaned = lastSegment.normalize("NFC").replace(UNSAFE_CHARS, "").trim();
  const withoutExt = cleaned.replace(/\.[A-Za-z0-9]{1,5}$/, "").replace(/^\.+/, "").trim();
  const base = Array.from(withoutExt).slice(0, MAX_BASE).join("").trim();
  return base || "upload";
}

export function displayName(original: string | undefined, ext: string): string {
  return `${displayBaseName(original)}.${ext}`;
}

/** Printable ASCII only, no quote, backslash, percent or semicolon. */
function asciiFallback(name: string): string {
  return name.normalize("NFKD").replace(/[\u0300-\u036f]/g, "").replace(/[^\x20-\x7e]|["\\%;]/g, "_");
}

/** RFC 5987 value-chars: encodeURIComponent leaves ' ( ) * unescaped, which attr-char does not allow. */
function rfc5987(value: string): string {
  return encodeURIComponent(value).replace(/['()*]/g, (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`);
}

export function contentDisposition(type: "inline" | "attachment", name: string): string {
  return `${type}; filename="${asciiFallback(name)}"; filename*=UTF-8''${rfc5987(name)}`;
}
