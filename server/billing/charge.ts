/**
 * The two provider calls a pass payment makes (create the intent, confirm it with the card), shared
 * by the purchase and the renewal so both classify failures the same way. Card details are passed
 * through in the confirm call only, never stored or logged. The routes word the messages, because
 * what was kept (an account, the old pass) differs.
 */
import Stripe from "stripe";
import { parseExpiry } from "../../shared/api/billing";
import type { Logger } from "../log";

/** The pass's name, shown in the offer and on the provider's payment. */
export const PASS_NAME = "Self-study pass";

export interface CardDetails {
  cardNumber: string;
  cardExpiry: string;
  cardCvc: string;
}

/** How a confirm call ended when it did not succeed. */
export type ChargeFailure =
  /** The card was declined: no money moved; `message` is the provider's, for people. */
  | { kind: "declined"; message: string; code: string | null; declineCode: string | null }
  /** The provider refused the request (bad parameters, wrong state): no money moved. */
  | { kind: "refused"; code: string | null }
  /** No clear answer (network, timeout, provider error): the payment may still go through; the webhook will tell. */
  | { kind: "unknown" }
  /** Answered, but not (yet) succeeded, e.g. waiting for an extra authentication step. */
  | { kind: "not_succeeded" };

export type ChargeResult = { ok: true; intent: Stripe.PaymentIntent } | { ok: false; failure: ChargeFailure };

/** Create the payment intent for one pass; null when the provider cannot be reached (nothing charged). */
export async function createPassIntent(stripe: Stripe, pass: { amountMinor: number; currency: string }, logger: Logger, metadata: Record<string, string>): Promise<Stripe.PaymentIntent | null> {
  try {
    return await stripe.paymentIntents.create({ amount: pass.amountMinor, currency: pass.currency, description: PASS_NAME, metadata: { product: "self_study_pass", ...metadata } });
  } catch (err) {
    logger.warn("payment intent create failed", { error: err instanceof Error ? err.name : "unknown" });
    return null;
  }
}

/** Confirm the intent with the card and classify the outcome. */
export async function confirmWithCard(stripe: Stripe, intentId: string, card: CardDetails, logger: Logger): Promise<ChargeResult> {
  const { month, year } = parseExpiry(card.cardExpiry);
  let confirmed: Stripe.PaymentIntent;
  try {
    // Raw card data is a fake-provider convenience; the SDK's types only know tokens, hence the cast.
    const params = { payment_method_data: { type: "card", card: { number: card.cardNumber, exp_month: month, exp_year: year, cvc: card.cardCvc } } };
    confirmed = await stripe.paymentIntents.confirm(intentId, params as unknown as Stripe.PaymentIntentConfirmParams);
  } catch (err) {
    if (err instanceof Stripe.errors.StripeCardError) {
      return { ok: false, failure: { kind: "declined", message: err.message, code: err.code ?? null, declineCode: err.decline_code ?? null } };
    }
    if (err instanceof Stripe.errors.StripeInvalidRequestError) return { ok: false, failure: { kind: "refused", code: err.code ?? null } };
    logger.warn("payment confirm failed", { paymentId: intentId, error: err instanceof Error ? err.name : "unknown" });
    return { ok: false, failure: { kind: "unknown" } };
  }
  if (confirmed.status !== "succeeded") return { ok: false, failure: { kind: "not_succeeded" } };
  return { ok: true, intent: confirmed };
}

/** What activation needs from a succeeded intent. */
export const succeededPayment = (intent: Stripe.PaymentIntent) => ({ id: intent.id, amount: intent.amount_received ?? intent.amount, currency: intent.currency });
