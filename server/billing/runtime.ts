/**
 * The payment provider for one app: the official `stripe` SDK pointed either at the configured
 * provider (STRIPE_SECRET_KEY, STRIPE_API_URL) or at the in-process fake (server/billing/fake-stripe.ts),
 * started on first use. One runtime per database (WeakMap), like the mail runtime; createApp's
 * close() calls `closeBillingRuntime(db)` so the fake's port is released.
 */
import type { Request } from "express";
import Stripe from "stripe";
import type { Db } from "../db/database";
import { startFakeStripe, type FakeStripe } from "./fake-stripe";
import { billingSettings, type BillingSettings } from "./settings";

export const WEBHOOK_PATH = "/api/billing/webhook";

export interface BillingClient {
  stripe: Stripe;
  webhookSecret: string;
  /** Only with the fake: inspect deliveries, aim its webhooks. */
  fake: FakeStripe | undefined;
}

export interface BillingRuntime {
  settings: BillingSettings;
  client(): Promise<BillingClient>;
  /** The fake delivers webhooks to this app at the address a request reached it on (no-op for a real provider). */
  aimFakeWebhooks(req: Request): Promise<void>;
  close(): Promise<void>;
}

const runtimes = new WeakMap<Db, BillingRuntime>();

export function billingRuntimeOf(db: Db): BillingRuntime | undefined {
  return runtimes.get(db);
}

export async function closeBillingRuntime(db: Db): Promise<void> {
  await runtimes.get(db)?.close();
}

export function billingRuntime(db: Db, env: Record<string, string | undefined> = process.env): BillingRuntime {
  const existing = runtimes.get(db);
  if (existing) return existing;
  const settings = billingSettings(env);
  let started: Promise<BillingClient> | undefined;
  let closed = false;

  const client = (): Promise<BillingClient> => {
    if (closed) return Promise.reject(new Error("billing runtime closed"));
    started ??= (async () => {
      if (settings.provider) {
        const { secretKey, webhookSecret, apiUrl } = settings.provider;
        const protocol = apiUrl.protocol === "http:" ? "http" : "https";
        const port = apiUrl.port ? Number(apiUrl.port) : protocol === "http" ? 80 : 443;
        const stripe = new Stripe(secretKey, { host: apiUrl.hostname, port, protocol, maxNetworkRetries: 0, timeout: 20_000 });
        return { stripe, webhookSecret, fake: undefined };
      }
      const fake = await startFakeStripe();
      const stripe = new Stripe(fake.secretKey, { host: "127.0.0.1", port: fake.port, protocol: "http", maxNetworkRetries: 0, timeout: 10_000, telemetry: false });
      return { stripe, webhookSecret: fake.webhookSecret, fake };
    })();
    return started;
  };

  const runtime: BillingRuntime = {
    settings,
    client,
    async aimFakeWebhooks(req) {
      if (settings.provider) return;
      const { fake } = await client();
      const host = (req.socket.localAddress ?? "127.0.0.1").replace(/^::ffff:/, "");
      const port = req.socket.localPort;
      if (!port) return;
      const origin = host.includes(":") ? `http://[${host}]:${port}` : `http://${host}:${port}`;
      fake?.setWebhookUrl(`${origin}${WEBHOOK_PATH}`);
    },
    async close() {
      if (closed) return;
      closed = true;
      const c = await started?.catch(() => undefined);
      await c?.fake?.close();
    },
  };
  runtimes.set(db, runtime);
  return runtime;
}
