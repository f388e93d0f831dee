/**
 * Payment settings, from the environment (validated like server/config.ts):
 *   STRIPE_SECRET_KEY      provider API key. Unset: an in-process fake payment service is started
 *                          (test cards only, no real money) with a random key and webhook secret.
 *   STRIPE_WEBHOOK_SECRET  signing secret of the webhook endpoint (required with STRIPE_SECRET_KEY)
 *   STRIPE_API_URL         provider API origin (default https://api.stripe.com; for a self-hosted fake)
 *   PASS_PRICE_MINOR       price of the self-study pass in minor units (default 3900)
 *   PASS_CURRENCY          ISO 4217 code (default eur)
 *   PASS_MONTHS            how long a pass is valid (default 12)
 * Purchases are rate limited per IP with the sign-in budget (LOGIN_RATE_LIMIT per LOGIN_RATE_WINDOW_MINUTES).
 */
import { z } from "zod";

const schema = z
  .object({
    STRIPE_SECRET_KEY: z.string().min(8).optional(),
    STRIPE_WEBHOOK_SECRET: z.string().min(8).optional(),
    STRIPE_API_URL: z
      .url()
      .refine((u) => /^https?:\/\//.test(u), "STRIPE_API_URL must be an http(s) URL.")
      .optional(),
    PASS_PRICE_MINOR: z.coerce.number().int().min(50).max(10_000_000).optional().default(3900),
    PASS_CURRENCY: z
      .string()
      .regex(/^[A-Za-z]{3}$/, "PASS_CURRENCY must be a 3-letter ISO 4217 code.")
      .transform((c) => c.toLowerCase())
      .optional()
      .default("eur"),
    PASS_MONTHS: z.coerce.number().int().min(1).max(60).optional().default(12),
  })
  .refine((e) => !e.STRIPE_SECRET_KEY || e.STRIPE_WEBHOOK_SECRET, {
    path: ["STRIPE_WEBHOOK_SECRET"],
    message: "STRIPE_WEBHOOK_SECRET is required when STRIPE_SECRET_KEY is set.",
  });

export interface BillingSettings {
  /** Real provider (key + webhook secret + API origin), or undefined for the in-process fake. */
  provider: { secretKey: string; webhookSecret: string; apiUrl: URL } | undefined;
  pass: { amountMinor: number; currency: string; months: number };
}

export function billingSettings(env: Record<string, string | undefined> = process.env): BillingSettings {
  const parsed = schema.safeParse(env);
  if (!parsed.success) {
    throw new Error(`Invalid payment configuration:\n${parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`).join("\n")}`);
  }
  const e = parsed.data;
  return {
    provider: e.STRIPE_SECRET_KEY
      ? { secretKey: e.STRIPE_SECRET_KEY, webhookSecret: e.STRIPE_WEBHOOK_SECRET!, apiUrl: new URL(e.STRIPE_API_URL ?? "https://api.stripe.com") }
      : undefined,
    pass: { amountMinor: e.PASS_PRICE_MINOR, currency: e.PASS_CURRENCY, months: e.PASS_MONTHS },
  };
}
