/**
 * Self-study pass: the public offer, the purchase (creates a "self" account and pays through the
 * provider in one request), and the provider's webhook. See server/billing/ for the provider
 * runtime, the fake and pass activation.
 *
 * Purchase, in order: refuse an e-mail that already has a usable account; create the payment
 * intent; create the account (kind "self") with a "pending" pass tied to the intent id; confirm the
 * payment with the card (passed through, never stored or logged). Declined: delete the account
 * (no usable account is left and the same e-mail can try again) and answer 402 with the provider's
 * message. Succeeded: activate the pass (idempotent; the webhook may have done it already) and
 * sign the person in, regenerating the session as sign-in does.
 *
 * Renewal (signed-in "self" accounts only): the same provider path with a new "pending" pass row
 * for the caller; succeeded = activatePass, which starts the new months at the later of now and the
 * current end (so renewing early extends); declined = the pending row is removed and the old end
 * date stands.
 */
import express, { Router, type Request } from "express";
import { rateLimit } from "express-rate-limit";
import { Op, UniqueConstraintError } from "sequelize";
import Stripe from "stripe";
import type { SessionResponse } from "../../shared/api/auth";
import { purchasePassRequestSchema, renewPassRequestSchema, type PassOffer, type RenewPassResponse } from "../../shared/api/billing";
import { hashPassword } from "../auth/passwords";
import { normalizeEmail, toPublicUser } from "../auth/public-user";
import { requireStudyPass } from "../billing/access";
import { confirmWithCard, createPassIntent, PASS_NAME, succeededPayment, type CardDetails } from "../billing/charge";
import { activatePass, latestPassValidUntil } from "../billing/passes";
import { billingRuntime } from "../billing/runtime";
import type { AppContext } from "../context";
import type { UserInstance } from "../db/models";
import { HttpError } from "../errors";
import { currentUser } from "../middleware/authorize";
import { validate } from "../middleware/validate";
import { recordAudit } from "../services/audit";

/** A "pending" sign-up older than this is treated as abandoned (e.g. the server stopped mid-purchase). */
const ABANDONED_AFTER_MS = 15 * 60_000;

interface PurchaseBody extends CardDetails {
  displayName: string;
  email: string;
  password: string;
}

const emailTaken = () =>
  new HttpError(409, "account_exists", "An account with this e-mail address already exists. Sign in instead.", {
    email: ["An account with this e-mail address already exists. Sign in instead."],
  });

/**
 * Whether this e-mail may start a purchase: free, or held by a "self" sign-up that never paid and
 * is not in flight. Returns the abandoned user to replace, if any.
 */
async function checkEmailFree(ctx: AppContext, email: string, now: number): Promise<UserInstance | null> {
  const { User, StudyPass } = ctx.db.models;
  const user = await User.findOne({ where: { email } });
  if (!user) return null;
  if (user.kind !== "self") throw emailTaken();
  if (await StudyPass.findOne({ where: { userId: user.id, status: "succeeded" } })) throw emailTaken();
  const inFlight = await StudyPass.findOne({ where: { userId: user.id, status: "pending", updatedAt: { [Op.gt]: new Date(now - ABANDONED_AFTER_MS) } } });
  if (inFlight) throw new HttpError(409, "payment_in_progress", "A payment for this e-mail address is still being processed. Wait a few minutes, then try again or sign in.");
  return user;
}

export function createBillingRouter(ctx: AppContext): Router {
  const router = Router();
  const rt = billingRuntime(ctx.db);
  const { pass } = rt.settings;
  // The same per-IP budget as sign-in (LOGIN_RATE_LIMIT per LOGIN_RATE_WINDOW_MINUTES), counting every attempt; one budget per route.
  const paymentLimiter = (what: string) =>
    rateLimit({
      windowMs: ctx.config.loginRateLimit.windowMs,
      limit: ctx.config.loginRateLimit.limit,
      standardHeaders: "draft-8",
      legacyHeaders: false,
      handler: (_req, _res, next) => next(new HttpError(429, "rate_limited", `Too many ${what} attempts from this network. Try again later.`)),
    });
  const limiter = paymentLimiter("purchase");
  const renewLimiter = paymentLimiter("renewal");

  // GET /api/billing/offer -> PassOffer
  router.get("/offer", (_req, res) => {
    const body: PassOffer = { name: PASS_NAME, amountMinor: pass.amountMinor, currency: pass.currency, months: pass.months, testMode: !rt.settings.provider };
    res.json(body);
  });

  // POST /api/billing/purchase PurchasePassRequest -> 201 { user } (signed in) | 402 payment_declined | 409 account_exists
  router.post("/purchase", limiter, validate({ body: purchasePassRequestSchema }), async (req, res) => {
    if (req.user) throw new HttpError(409, "signed_in", "Sign out first: this page creates a new account.");
    const body = req.body as PurchaseBody;
    const email = normalizeEmail(body.email);
    await ctx.db.read(() => checkEmailFree(ctx, email, Date.now())); // fail fast before hashing and paying
    const passwordHash = await hashPassword(body.password);

    const { stripe } = await rt.client();
    await rt.aimFakeWebhooks(req);
    const intent = await createPassIntent(stripe, pass, ctx.logger, {});
    if (!intent) throw new HttpError(502, "payment_unavailable", "The payment service is not available right now. Nothing was charged and no account was created; try again later.");

    const user = await ctx.db.write(async (transaction) => {
      const abandoned = await checkEmailFree(ctx, email, Date.now());
      if (abandoned) await abandoned.destroy({ transaction });
      try {
        const created = await ctx.db.models.User.create({ email, displayName: body.displayName, passwordHash, role: "student", kind: "self" }, { transaction });
        await ctx.db.models.StudyPass.create({ userId: created.id, providerPaymentId: intent.id, amountMinor: pass.amountMinor, currency: pass.currency, status: "pending" }, { transaction });
        await recordAudit(ctx.db, { actorId: created.id, action: "billing.purchase_started", targetType: "user", targetId: created.id, details: { paymentId: intent.id }, ip: req.ip }, transaction);
        return created;
      } catch (err) {
        if (err instanceof UniqueConstraintError) throw emailTaken();
        throw err;
      }
    });

    const charge = await confirmWithCard(stripe, intent.id, body, ctx.logger);
    if (!charge.ok) {
      const { failure } = charge;
      // A card decline or a refused request means no money moved: remove the account so the e-mail stays free.
      if (failure.kind === "declined" || failure.kind === "refused") {
        await ctx.db.write(async (transaction) => {
          await user.destroy({ transaction }); // cascades to the pending pass
          const details = { email, paymentId: intent.id, code: failure.code, declineCode: failure.kind === "declined" ? failure.declineCode : null };
          await recordAudit(ctx.db, { actorId: null, action: "billing.payment_declined", details, ip: req.ip }, transaction);
        });
        if (failure.kind === "refused") {
          throw new HttpError(502, "payment_unavailable", "The payment service refused the request. Nothing was charged and no account was created; try again later.");
        }
        const message = `${failure.message} No account was created and nothing was charged; you can try again.`;
        throw new HttpError(402, "payment_declined", message, { cardNumber: [failure.message] });
      }
      if (failure.kind === "unknown") {
        throw new HttpError(502, "payment_unavailable", "The payment service did not answer. Your account is on hold; wait a few minutes and try signing in, or try again later.");
      }
      throw new HttpError(502, "payment_unavailable", "The payment has not gone through yet. Wait a few minutes, then try signing in.");
    }
    await activatePass(ctx.db, succeededPayment(charge.intent), pass.months);

    const publicUser = toPublicUser(user);
    // passport regenerates the session (new id); the client fetches a new CSRF token afterwards.
    await new Promise<void>((resolve, reject) => req.logIn(publicUser, (err) => (err ? reject(err) : resolve())));
    req.session.signedInAt = Date.now();
    const response: SessionResponse = { user: publicUser };
    res.status(201).json(response);
  });

  // POST /api/billing/renew RenewPassRequest -> 200 RenewPassResponse | 402 payment_declined | 403 not a "self" account | 409 payment_in_progress
  router.post("/renew", renewLimiter, requireSelfLearner(ctx), validate({ body: renewPassRequestSchema }), async (req, res) => {
    const userId = currentUser(req).id;
    const card = req.body as CardDetails;
    const { stripe } = await rt.client();
    await rt.aimFakeWebhooks(req);
    const intent = await createPassIntent(stripe, pass, ctx.logger, { renewal: "true" });
    if (!intent) throw new HttpError(502, "payment_unavailable", "The payment service is not available right now. Nothing was charged and your pass is unchanged; try again later.");

    // One renewal at a time per account (a double click must not pay twice); the check and the new row share one write.
    await ctx.db.write(async (transaction) => {
      const { StudyPass } = ctx.db.models;
      const inFlight = await StudyPass.findOne({ where: { userId, status: "pending", updatedAt: { [Op.gt]: new Date(Date.now() - ABANDONED_AFTER_MS) } }, transaction });
      if (inFlight) throw new HttpError(409, "payment_in_progress", "A payment for your pass is still being processed. Wait a few minutes, then check your pass before paying again.");
      await StudyPass.create({ userId, providerPaymentId: intent.id, amountMinor: pass.amountMinor, currency: pass.currency, status: "pending" }, { transaction });
      await recordAudit(ctx.db, { actorId: userId, action: "billing.renewal_started", targetType: "user", targetId: userId, details: { paymentId: intent.id }, ip: req.ip }, transaction);
    });

    const charge = await confirmWithCard(stripe, intent.id, card, ctx.logger);
    if (!charge.ok) {
      const { failure } = charge;
      if (failure.kind === "declined" || failure.kind === "refused") {
        // No money moved: drop the pending row so nothing looks paid and the next attempt is not blocked.
        await ctx.db.write(async (transaction) => {
          await ctx.db.models.StudyPass.destroy({ where: { providerPaymentId: intent.id, status: "pending" }, transaction });
          const details = { paymentId: intent.id, code: failure.code, declineCode: failure.kind === "declined" ? failure.declineCode : null };
          await recordAudit(ctx.db, { actorId: userId, action: "billing.renewal_declined", targetType: "user", targetId: userId, details, ip: req.ip }, transaction);
        });
        if (failure.kind === "refused") {
          throw new HttpError(502, "payment_unavailable", "The payment service refused the request. Nothing was charged and your pass is unchanged; try again later.");
        }
        throw new HttpError(402, "payment_declined", `${failure.message} Nothing was charged and your pass is unchanged; you can try again.`, { cardNumber: [failure.message] });
      }
      // The payment may still go through; the provider's webhook then activates the pending row.
      throw new HttpError(502, "payment_unavailable", "The payment service has not confirmed the payment yet. Wait a few minutes and check your pass before paying again.");
    }
    const outcome = await activatePass(ctx.db, succeededPayment(charge.intent), pass.months);
    if (outcome !== "activated" && outcome !== "already_active") {
      ctx.logger.warn("renewal not activated", { paymentId: intent.id, outcome });
      throw new HttpError(502, "payment_unavailable", "The payment could not be matched to your pass. Contact the school office before paying again.");
    }
    const until = await latestPassValidUntil(ctx.db, userId);
    const response: RenewPassResponse = { passValidUntil: until!.toISOString() };
    res.json(response);
  });

  return router;
}

/**
 * Renewal is for signed-in "self" accounts (role student, kind "self"): 401 signed out; 403 with a
 * plain reason for staff and for school students, whose access comes from the school.
 */
function requireSelfLearner(ctx: AppContext) {
  return async (req: Request, _res: unknown, next: () => void) => {
    const { id, role } = currentUser(req);
    if (role !== "student") {
      throw new HttpError(403, "forbidden", "Self-study passes are for self-learner accounts; instructor and admin accounts have access through the school.");
    }
    const user = await ctx.db.read(() => ctx.db.models.User.findByPk(id, { attributes: ["id", "kind"] }));
    if (user?.kind !== "self") {
      throw new HttpError(403, "forbidden", "Your school provides your access, so there is no pass to renew. Ask your instructor if lessons do not open.");
    }
    next();
  };
}

/**
 * POST /api/billing/webhook: the provider's events. Mounted BEFORE the session, CSRF and JSON
 * middleware (server/app.ts): it authenticates by the signature over the raw body, checked with the
 * SDK's constructEvent and the shared webhook secret. Each event id is stored once (unique), in
 * the same write as its effect, so a replayed event changes nothing.
 */
export function createBillingWebhookRouter(ctx: AppContext): Router {
  const router = Router();
  const rt = billingRuntime(ctx.db);

  router.post("/", express.raw({ type: "application/json", limit: "100kb" }), async (req: Request, res) => {
    const signature = req.get("stripe-signature");
    if (!Buffer.isBuffer(req.body) || !signature) throw new HttpError(400, "invalid_signature", "Missing webhook body or signature.");
    const { stripe, webhookSecret } = await rt.client();
    let event: Stripe.Event;
    try {
      event = stripe.webhooks.constructEvent(req.body, signature, webhookSecret);
    } catch {
      throw new HttpError(400, "invalid_signature", "The webhook signature is not valid.");
    }
    const outcome = await ctx.db.write(async (transaction) => {
      const { BillingEvent } = ctx.db.models;
      if (await BillingEvent.findOne({ where: { providerEventId: event.id }, transaction })) return "duplicate";
      let result: string = "ignored";
      let paymentId: string | null = null;
      if (event.type === "payment_intent.succeeded") {
        const pi = event.data.object;
        paymentId = pi.id;
        result = await activatePass(ctx.db, { id: pi.id, amount: pi.amount_received ?? pi.amount, currency: pi.currency }, rt.settings.pass.months);
      }
      await BillingEvent.create({ providerEventId: event.id, type: event.type, providerPaymentId: paymentId, outcome: result }, { transaction });
      return result;
    });
    res.json({ received: true, outcome });
  });

  return router;
}

/** Pass gates mounted in front of the lessons and quizzes routers (server/routes/index.ts). */
export function createStudyPassGates(ctx: AppContext): [string, Router][] {
  const lessons = Router();
  lessons.use("/:slug/progress", requireStudyPass(ctx.db));
  const quizzes = Router();
  quizzes.use(requireStudyPass(ctx.db));
  return [
    ["/lessons", lessons],
    ["/quizzes", quizzes],
  ];
}
