/**
 * PDF reports are stored as sent (no re-rendering), so they get a structural check: the
 * "%PDF-1.x"/"%PDF-2.x" header at the very start, and no active content in the readable part
 * of the file (JavaScript, launch actions, embedded files, rich media, XFA forms). The scan sees
 * only uncompressed dictionaries; it is defence in depth on top of serving PDFs as downloads
 * under a sandboxing Content-Security-Policy, never as a page of this site.
 */
import { HttpError } from "../errors";

const HEADER = /^%PDF-[12]\.\d/;
const ACTIVE = /\/(JavaScript|JS|Launch|EmbeddedFiles?|RichMedia|XFA)(?![A-Za-z])/;

export function checkPdf(buffer: Buffer): void {
  if (!HEADER.test(buffer.subarray(0, 8).toString("latin1"))) {
    throw new HttpError(415, "unsupported_file_type", "This PDF does not start with a PDF header; it may be damaged. Upload a JPEG, PNG or WebP photo, or a PDF report.");
  }
  if (ACTIVE.test(buffer.toString("latin1"))) {
    throw new HttpError(
      422,
      "pdf_active_content",
      "This PDF contains scripts, attachments or other active content, which we do not accept. Print it to a plain PDF and upload that.",
    );
  }
}
