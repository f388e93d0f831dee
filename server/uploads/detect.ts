/**
 * What an upload really is, decided by its bytes (magic numbers via file-type), never by its
 * name or the browser's Content-Type (ASVS 5.2.2). Allowed: JPEG, PNG, WebP and PDF. Everything
 * else, including SVG and HTML (text formats that can carry script) and programs, is refused.
 */
import { fileTypeFromBuffer } from "file-type";
import { HttpError } from "../errors";

export type DetectedUpload = { kind: "image"; format: "jpeg" | "png" | "webp" } | { kind: "pdf" };

const IMAGE_FORMATS: Record<string, "jpeg" | "png" | "webp"> = { "image/jpeg": "jpeg", "image/png": "png", "image/webp": "webp" };
const PROGRAMS = new Set(["exe", "elf", "mach", "dll", "class", "wasm", "msi", "deb", "rpm", "apk", "dmg", "swf", "jar"]);

const MARKUP = new Set(["xml", "svg", "html", "htm", "xhtml"]);

const ACCEPTED = "Upload a JPEG, PNG or WebP photo, or a PDF report.";

export const unsupportedType = (detail: string) => new HttpError(415, "unsupported_file_type", `${detail} ${ACCEPTED}`);

/** Markup (SVG, HTML, XML) starts with "<" after an optional byte-order mark and whitespace. */
function looksLikeMarkup(buffer: Buffer): boolean {
  let text = buffer.subarray(0, 512).toString("utf8");
  if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
  return /^\s*</.test(text);
}

export async function detectUpload(buffer: Buffer): Promise<DetectedUpload> {
  if (buffer.length === 0) throw new HttpError(400, "empty_file", "The file is empty.");
  const type = await fileTypeFromBuffer(buffer);
  if (looksLikeMarkup(buffer) || (type && MARKUP.has(type.ext))) {
    throw unsupportedType("SVG, HTML and other markup files are not accepted: they can carry scripts.");
  }
  if (!type) throw unsupportedType("The file's content is not a type we accept.");
  if (PROGRAMS.has(type.ext)) throw unsupportedType("Programs and executables are not accepted, whatever their name.");
  const format = IMAGE_FORMATS[type.mime];
  if (format) return { kind: "image", format };
  if (type.mime === "application/pdf") return { kind: "pdf" };
  throw unsupportedType(`This file is ${type.ext.toUpperCase()}, which is not accepted.`);
}
