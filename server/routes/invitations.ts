import { Router, type Request } from "express";
import { rateLimit } from "express-rate-limit";
import {
  acceptInvitationRequestSchema,
  createInvitationsRequestSchema,
  invitationParamsSchema,
  lookupInvitationRequestSchema,
  rosterRequestSchema,
  type AcceptInvitationRequest,
  type InvitationListResponse,
  type RosterRequest,
} from "../../shared/api/invitations";
import type { SessionResponse } from "../../shared/api/auth";
import { toPublicUser } from "../auth/public-user";
import type { AppContext } from "../context";
import { HttpError } from "../errors";
import type { TeachingRuntime } from "../mail/runtime";
import { validate } from "../middleware/validate";
import { recordAudit } from "../services/audit";
import {
  acceptInvitation,
  inviteToCohort,
  listInvitations,
  lookupInvitation,
  resendInvitation,
  revokeInvitation,
  toInvitationView,
} from "../services/invitations";
import { importableRows, previewRoster } from "../services/roster";
import { actorOf, cohortGuards, ownedCohort } from "./cohorts";

/** Where e-mailed links point: PUBLIC_URL, else the origin the instructor is using right now. */
function linkBase(req: Request, rt: TeachingRuntime): string {
  return rt.settings.publicUrl ?? `${req.protocol}://${req.host}`.slice(0, 200);
}

/**
 * /api/cohorts/:cohortId/invitations and /roster: invite by e-mail, list, resend, revoke, and the
 * roster CSV preview (stores nothing) and import. Sending happens in the background: these
 * answer 202 and never wait for (or fail because of) the mail server.
 */
export function createCohortInvitationsRouter(ctx: AppContext, rt: TeachingRuntime): Router {
  const router = Router();

  // GET /api/cohorts/:cohortId/invitations -> InvitationListResponse
  router.get("/:cohortId/invitations", ...cohortGuards(ctx), async (_req, res) => {
    const body: InvitationListResponse = { invitations: await listInvitations(ctx.db, ownedCohort(res).id) };
    res.json(body);
  });

  // POST /api/cohorts/:cohortId/invitations {invitations:[{email, displayName?}]} -> 202 InviteResponse
  router.post("/:cohortId/invitations", ...cohortGuards(ctx), validate({ body: createInvitationsRequestSchema }), async (req, res) => {
    const { invitations } = req.body as { invitations: { email: string; displayName?: string }[] };
    const { response, queued } = await inviteToCohort(ctx.db, actorOf(req), ownedCohort(res), invitations, linkBase(req, rt), "invite");
    rt.invitations.enqueue(queued);
    res.status(202).json(response);
  });

  // POST /api/cohorts/:cohortId/invitations/:invitationId/resend -> 202 { invitation }
  router.post("/:cohortId/invitations/:invitationId/resend", ...cohortGuards(ctx, invitationParamsSchema), async (req, res) => {
    const row = await resendInvitation(ctx.db, actorOf(req), ownedCohort(res), Number(req.params.invitationId));
    rt.invitations.enqueue([row.id]);
    res.status(202).json({ invitation: toInvitationView(row) });
  });

  // DELETE /api/cohorts/:cohortId/invitations/:invitationId -> 200 { invitation } (revoked; the link stops working)
  router.delete("/:cohortId/invitations/:invitationId", ...cohortGuards(ctx, invitationParamsSchema), async (req, res) => {
    const row = await revokeInvitation(ctx.db, actorOf(req), ownedCohort(res), Number(req.params.invitationId));
    res.json({ invitation: toInvitationView(row) });
  });

  // POST /api/cohorts/:cohortId/roster/preview {csv} -> RosterPreview (nothing stored)
  router.post("/:cohortId/roster/preview", ...cohortGuards(ctx), validate({ body: rosterRequestSchema }), async (req, res) => {
    res.json(await previewRoster(ctx.db, ownedCohort(res), (req.body as RosterRequest).csv));
  });

  // POST /api/cohorts/:cohortId/roster/import {csv} -> 202 InviteResponse (only rows that pass the preview)
  router.post("/:cohortId/roster/import", ...cohortGuards(ctx), validate({ body: rosterRequestSchema }), async (req, res) => {
    const cohort = ownedCohort(res);
    const preview = await previewRoster(ctx.db, cohort, (req.body as RosterRequest).csv);
    if (preview.fileErrors.length) {
      throw new HttpError(400, "validation_failed", preview.fileErrors[0], { csv: preview.fileErrors });
    }
    const rows = importableRows(preview);
    const actor = actorOf(req);
    const { response, queued } = await inviteToCohort(
      ctx.db,
      actor,
      cohort,
      rows.map((r) => ({ email: r.email, displayName: r.name })),
      linkBase(req, rt),
      "roster",
    );
    await ctx.db.write((t) =>
      recordAudit(ctx.db, { actorId: actor.user.id, action: "roster.imported", targetType: "cohort", targetId: cohort.id, details: { rows: preview.rows.length, ...response.counts, skipped: preview.rows.length - rows.length }, ip: actor.ip }, t),
    );
    rt.invitations.enqueue(queued);
    res.status(202).json(response);
  });

  return router;
}

/**
 * /api/invitations: the public side of an invitation link. Rate-limited per IP (like sign-in);
 * the token travels in the JSON body, never in an API URL.
 */
export function createInvitationsRouter(ctx: AppContext): Router {
  const router = Router();
  const limiter = rateLimit({
    windowMs: ctx.config.loginRateLimit.windowMs,
    limit: ctx.config.loginRateLimit.limit * 3,
    standardHeaders: "draft-8",
    legacyHeaders: false,
    handler: (_req, _res, next) => next(new HttpError(429, "rate_limited", "Too many attempts from this network. Try again later.")),
  });

  // POST /api/invitations/lookup {token} -> InvitationLookup | 404 invitation_invalid | 410 invitation_used/expired
  router.post("/lookup", limiter, validate({ body: lookupInvitationRequestSchema }), async (req, res) => {
    res.json(await lookupInvitation(ctx.db, (req.body as { token: string }).token));
  });

  // POST /api/invitations/accept {token, displayName, password} -> 201 { user }, signed in as the new student
  router.post("/accept", limiter, validate({ body: acceptInvitationRequestSchema }), async (req, res) => {
    if (req.user) throw new HttpError(409, "signed_in", "Sign out first: this link creates a new account.");
    const user = toPublicUser(await acceptInvitation(ctx.db, req.body as AcceptInvitationRequest, req.ip));
    // passport regenerates the session (new id); the client fetches a new CSRF token afterwards.
    await new Promise<void>((resolve, reject) => req.logIn(user, (err) => (err ? reject(err) : resolve())));
    req.session.signedInAt = Date.now();
    const body: SessionResponse = { user };
    res.status(201).json(body);
  });

  return router;
}
