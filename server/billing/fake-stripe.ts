/**
 * The in-process fake payment service used when no STRIPE_SECRET_KEY is configured (demo and
 * tests), like the SMTP fake in server/mail/fake-smtp.ts: a real HTTP server on 127.0.0.1 and a
 * free port, so the official SDK goes through the same HTTP path as in production. It implements
 * only what the app calls:
 *
 *   POST /v1/payment_intents              create (amount, currency, metadata)
 *   POST /v1/payment_intents/:id/confirm  confirm with payment_method_data[card][...]
 *   GET  /v1/payment_intents/:id          retrieve
 *
 * Test cards: 4242 4242 4242 4242 succeeds; 4000 0000 0000 0002 is declined; an expiry in the past
 * is declined as expired; any other number is declined (this is a test service). On success it
 * delivers a signed `payment_intent.succeeded` event to the webhook URL BEFORE answering the
 * confirm call (real providers deliver later; the app copes with either order). Card numbers are
 * never logged or kept, only the last four digits.
 */
import { randomBytes } from "node:crypto";
import http from "node:http";
import type { AddressInfo } from "node:net";
import Stripe from "stripe";

export const TEST_CARDS = { succeeds: "4242424242424242", declined: "4000000000000002" } as const;

interface FakeIntent {
  id: string;
  object: "payment_intent";
  amount: number;
  amount_received: number;
  currency: string;
  status: "requires_payment_method" | "succeeded";
  metadata: Record<string, string>;
  created: number;
  livemode: false;
  last_payment_error: { code: string; decline_code?: string; message: string } | null;
  payment_method_last4: string | null;
}

export interface DeliveredEvent {
  id: string;
  payload: string;
  signature: string;
  /** HTTP status of the app's answer, or 0 when delivery failed. */
  status: number;
}

export interface FakeStripe {
  port: number;
  secretKey: string;
  webhookSecret: string;
  /** Where events go (set by the app once it knows its own address). */
  setWebhookUrl(url: string): void;
  /** Every event delivered, oldest first (tests replay them). */
  deliveries: DeliveredEvent[];
  close(): Promise<void>;
}

const rand = (prefix: string) => `${prefix}_${randomBytes(12).toString("hex")}`;

function send(res: http.ServerResponse, status: number, body: unknown): void {
  res.writeHead(status, { "content-type": "application/json" });
  res.end(JSON.stringify(body));
}

function stripeError(res: http.ServerResponse, status: number, type: string, message: string, extra: Record<string, unknown> = {}): void {
  send(res, status, { error: { type, message, ...extra } });
}

function readForm(req: http.IncomingMessage): Promise<URLSearchParams> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    let size = 0;
    req.on("data", (c: Buffer) => {
      size += c.length;
      if (size > 64_000) req.destroy(new Error("body too large"));
      else chunks.push(c);
    });
    req.on("end", () => resolve(new URLSearchParams(Buffer.concat(chunks).toString("utf8"))));
    req.on("error", reject);
  });
}

function publicIntent(pi: FakeIntent) {
  const { payment_method_last4: _last4, ...rest } = pi;
  return rest;
}

/** The decline (if any) for these card details at `now`. */
function declineFor(number: string, expMonth: number, expYear: number, now: Date): { code: string; decline_code?: string; message: string } | null {
  const endOfExpiryMonth = new Date(Date.UTC(expYear, expMonth, 1));
  if (!Number.isFinite(endOfExpiryMonth.getTime()) || endOfExpiryMonth <= now) {
    return { code: "expired_card", message: "Your card has expired." };
  }
  if (number === TEST_CARDS.succeeds) return null;
  if (number === TEST_CARDS.declined) return { code: "card_declined", decline_code: "generic_decline", message: "Your card was declined." };
  return { code: "card_declined", decline_code: "test_mode_live_card", message: "Your card was declined. This test payment service accepts only its test cards." };
}

export async function startFakeStripe(): Promise<FakeStripe> {
  const secretKey = rand("sk_test_fake");
  const webhookSecret = rand("whsec_fake");
  const intents = new Map<string, FakeIntent>();
  const deliveries: DeliveredEvent[] = [];
  let webhookUrl: string | undefined;

  async function deliver(pi: FakeIntent): Promise<void> {
    const event = {
      id: rand("evt"),
      object: "event",
      type: "payment_intent.succeeded",
      api_version: "fake",
      created: Math.floor(Date.now() / 1000),
      livemode: false,
      data: { object: publicIntent(pi) },
    };
    const payload = JSON.stringify(event);
    const signature = Stripe.webhooks.generateTestHeaderString({ payload, secret: webhookSecret });
    let status = 0;
    if (webhookUrl) {
      try {
        const res = await fetch(webhookUrl, { method: "POST", headers: { "content-type": "application/json", "stripe-signature": signature }, body: payload });
        status = res.status;
        await res.arrayBuffer();
      } catch {
        status = 0; // a real provider would retry later; the app also activates from the confirm answer
      }
    }
    deliveries.push({ id: event.id, payload, signature, status });
  }

  async function handle(req: http.IncomingMessage, res: http.ServerResponse): Promise<void> {
    if (req.headers.authorization !== `Bearer ${secretKey}`) {
      return stripeError(res, 401, "invalid_request_error", "Invalid API key provided.");
    }
    const url = new URL(req.url ?? "/", "http://fake");
    const parts = url.pathname.split("/").filter(Boolean); // ["v1","payment_intents",id?,"confirm"?]
    if (parts[0] !== "v1" || parts[1] !== "payment_intents") return stripeError(res, 404, "invalid_request_error", "Unrecognized request URL.");

    if (req.method === "POST" && parts.length === 2) {
      const form = await readForm(req);
      const amount = Number(form.get("amount"));
      const currency = (form.get("currency") ?? "").toLowerCase();
      if (!Number.isInteger(amount) || amount < 50 || !/^[a-z]{3}$/.test(currency)) {
        return stripeError(res, 400, "invalid_request_error", "Missing or invalid amount or currency.");
      }
      const metadata: Record<string, string> = {};
      for (const [k, v] of form) {
        const m = /^metadata\[(.+)\]$/.exec(k);
        if (m) metadata[m[1]] = v;
      }
      const pi: FakeIntent = {
        id: rand("pi"),
        object: "payment_intent",
        amount,
        amount_received: 0,
        currency,
        status: "requires_payment_method",
        metadata,
        created: Math.floor(Date.now() / 1000),
        livemode: false,
        last_payment_error: null,
        payment_method_last4: null,
      };
      intents.set(pi.id, pi);
      return send(res, 200, publicIntent(pi));
    }

    const pi = parts[2] ? intents.get(parts[2]) : undefined;
    if (!pi) return stripeError(res, 404, "invalid_request_error", "No such payment_intent.", { code: "resource_missing" });

    if (req.method === "GET" && parts.length === 3) return send(res, 200, publicIntent(pi));

    if (req.method === "POST" && parts[3] === "confirm" && parts.length === 4) {
      const form = await readForm(req);
      if (pi.status === "succeeded") {
        return stripeError(res, 400, "invalid_request_error", "This PaymentIntent has already succeeded.", { code: "payment_intent_unexpected_state" });
      }
      const number = (form.get("payment_method_data[card][number]") ?? "").replace(/\D/g, "");
      const expMonth = Number(form.get("payment_method_data[card][exp_month]"));
      const expYear = Number(form.get("payment_method_data[card][exp_year]"));
      if (form.get("payment_method_data[type]") !== "card" || !number || !expMonth || !expYear) {
        return stripeError(res, 400, "invalid_request_error", "Missing card details.", { param: "payment_method_data" });
      }
      pi.payment_method_last4 = number.slice(-4);
      const decline = declineFor(number, expMonth, expYear, new Date());
      if (decline) {
        pi.status = "requires_payment_method";
        pi.last_payment_error = decline;
        return stripeError(res, 402, "card_error", decline.message, { code: decline.code, decline_code: decline.decline_code, payment_intent: publicIntent(pi) });
      }
      pi.status = "succeeded";
      pi.amount_received = pi.amount;
      pi.last_payment_error = null;
      await deliver(pi);
      return send(res, 200, publicIntent(pi));
    }
    return stripeError(res, 404, "invalid_request_error", "Unrecognized request URL.");
  }

  const server = http.createServer((req, res) => {
    handle(req, res).catch(() => {
      if (!res.headersSent) stripeError(res, 500, "api_error", "The fake payment service failed.");
      else res.end();
    });
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(0, "127.0.0.1", () => resolve());
  });
  // Never keep the process alive just for the fake.
  server.unref();
  const { port } = server.address() as AddressInfo;
  return {
    port,
    secretKey,
    webhookSecret,
    setWebhookUrl: (url) => {
      webhookUrl = url;
    },
    deliveries,
    close: () =>
      new Promise<void>((resolve) => {
        server.closeAllConnections();
        server.close(() => resolve());
      }),
  };
}
