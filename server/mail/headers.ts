/**
 * Values that reach e-mail headers (names, subjects, addresses) never carry a line break or other
 * control character (ASVS 1.3.11: no SMTP/header injection). nodemailer encodes header values too;
 * this is the layer we own, applied before anything is handed to it.
 */

// eslint-disable-next-line no-control-regex
const CONTROL = /[\u0000-\u001f\u007f-\u009f\u2028\u2029\u200e\u200f\u202a-\u202e\u2066-\u2069]+/g;

/** One line of text for a header: control characters become a space, runs of spaces collapse. */
export function headerText(value: string, maxLength = 200): string {
  return value.replace(CONTROL, " ").replace(/\s+/g, " ").trim().slice(0, maxLength);
}

/** A bare address for the SMTP envelope and the To header; throws on anything that is not one. */
export function headerAddress(email: string): string {
  const trimmed = email.trim();
  // Deliberately strict: one @, no spaces, quotes, angle brackets, commas or control characters.
  if (!/^[^\s"'<>,;:()\\@\u0000-\u001f\u007f]+@[A-Za-z0-9.-]+\.[A-Za-z]{2,}$/.test(trimmed) || trimmed.length > 254) {
    throw new Error("Not a deliverable e-mail address.");
  }
  return trimmed;
}
