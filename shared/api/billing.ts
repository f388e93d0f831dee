/**
 * Self-study pass: the offer shown on /join, the purchase and the renewal requests. Card details go to the
 * server only to be passed through to the payment provider in one call; they are never stored or
 * logged (see server/billing/).
 */
import { z } from "zod";
import { passwordSchema } from "./auth";
import { displayNameSchema, inviteEmailSchema } from "./invitations";

/** Luhn (mod 10) check digit test over a string of digits. */
export function luhnValid(digits: string): boolean {
  let sum = 0;
  for (let i = 0; i < digits.length; i += 1) {
    let d = Number(digits[digits.length - 1 - i]);
    if (i % 2 === 1) {
      d *= 2;
      if (d > 9) d -= 9;
    }
    sum += d;
  }
  return digits.length > 0 && sum % 10 === 0;
}

/** Card number as typed (spaces allowed), normalised to digits only. */
export const cardNumberSchema = z
  .string({ error: "Enter the card number." })
  .transform((v) => v.replace(/[\s-]/g, ""))
  .refine((v) => /^\d{12,19}$/.test(v), "Enter the card number: 12 to 19 digits.")
  .refine((v) => luhnValid(v), "Check the card number: it has a typing mistake.");

/** "MM/YY" (or MM/YYYY); whether it has passed is the provider's decision. */
export const cardExpirySchema = z
  .string({ error: "Enter the expiry date." })
  .trim()
  .regex(/^(0[1-9]|1[0-2])\s*\/\s*(\d{2}|\d{4})$/, "Enter the expiry date as MM/YY.");

export const cardCvcSchema = z.string({ error: "Enter the security code." }).trim().regex(/^\d{3,4}$/, "Enter the 3 or 4 digit security code.");

export const purchasePassRequestSchema = z.strictObject({
  displayName: displayNameSchema,
  email: inviteEmailSchema,
  password: passwordSchema,
  cardNumber: cardNumberSchema,
  cardExpiry: cardExpirySchema,
  cardCvc: cardCvcSchema,
});
export type PurchasePassRequest = z.input<typeof purchasePassRequestSchema>;

/** POST /api/billing/renew (signed-in "self" accounts): the card only; the account is the session's. */
export const renewPassRequestSchema = z.strictObject({
  cardNumber: cardNumberSchema,
  cardExpiry: cardExpirySchema,
  cardCvc: cardCvcSchema,
});
export type RenewPassRequest = z.input<typeof renewPassRequestSchema>;

/** POST /api/billing/renew -> 200 */
export interface RenewPassResponse {
  /** ISO 8601: the new end of the pass (months after the later of now and the old end). */
  passValidUntil: string;
}

/** Month and four-digit year from a valid "MM/YY" or "MM/YYYY". */
export function parseExpiry(expiry: string): { month: number; year: number } {
  const [mm, yy] = expiry.split("/").map((s) => s.trim());
  return { month: Number(mm), year: yy.length === 2 ? 2000 + Number(yy) : Number(yy) };
}

/** GET /api/billing/offer */
export interface PassOffer {
  name: string;
  /** Integer minor units (cents). */
  amountMinor: number;
  /** ISO 4217, lower-case. */
  currency: string;
  months: number;
  /** True when payments go to the built-in test payment service (no real money moves). */
  testMode: boolean;
}

/** Formats an amount in minor units for people, e.g. 3900 "eur" -> "€39.00" (minor digits from Intl, 0 for JPY). */
export function formatMoney(amountMinor: number, currency: string, locale = "en-GB"): string {
  const format = new Intl.NumberFormat(locale, { style: "currency", currency: currency.toUpperCase() });
  const digits = format.resolvedOptions().maximumFractionDigits ?? 2;
  return format.format(amountMinor / 10 ** digits);
}

/** A pass end date (ISO, or null when never paid) still in the future at `now`. */
export function isPassActive(passValidUntil: string | null, now = Date.now()): boolean {
  return passValidUntil !== null && new Date(passValidUntil).getTime() > now;
}
