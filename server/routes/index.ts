import type { Router } from "express";
import type { AppContext } from "../context";
import { createAuditLogRouter } from "./audit-log";
import { createAuthRouter, type AuthRouterDeps } from "./auth";
import { createMeRouter } from "./me";
import { createLessonsRouter, createModulesRouter } from "./lessons";
import { createQuizzesRouter } from "./quizzes";
import { createAlloysRouter, createLessonAlloysRouter } from "./alloys";
import { teachingRouters } from "./teaching";
import { createNotebookRouter } from "./notebook";
import { createBillingRouter, createStudyPassGates } from "./billing";

/**
 * API routers, mounted under /api after the session, CSRF and JSON-body middleware.
 *
 * HOW TO ADD AN API ROUTE
 *   1. In server/routes/<resource>.ts export `create<Resource>Router(ctx: AppContext): Router`; give each
 *      route its guards from middleware/authorize.ts and `validate({ body, query, params })` with schemas
 *      from shared/api/<resource>.ts; throw HttpError for failures; do all writes in `ctx.db.write(...)`.
 *   2. Add ONE line below: [mount path, router].
 *   3. Add each route to ROUTE_POLICY in server/policy.ts (tests fail for unlisted routes).
 */
export function apiRouters(ctx: AppContext, auth: AuthRouterDeps): [string, Router][] {
  return [
    ["/auth", createAuthRouter(ctx, auth)],
    ["/me", createMeRouter(ctx)],
    // Self-study pass gates run before the lessons' progress and quiz routes (server/billing/access.ts).
    ...createStudyPassGates(ctx),
    ["/modules", createModulesRouter(ctx)],
    ["/lessons", createLessonsRouter(ctx)],
    ["/quizzes", createQuizzesRouter(ctx)],
    ["/audit-log", createAuditLogRouter(ctx)],
    ["/alloys", createAlloysRouter(ctx)],
    ["/lessons", createLessonAlloysRouter(ctx)],
    ...teachingRouters(ctx),
    ["/notebook", createNotebookRouter(ctx)],
    ["/billing", createBillingRouter(ctx)],
  ];
}
