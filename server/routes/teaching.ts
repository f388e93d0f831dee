import type { Router } from "express";
import type { AppContext } from "../context";
import { teachingRuntime } from "../mail/runtime";
import { createAdminRouter } from "./admin";
import { createCohortAssignmentsRouter, createMyAssignmentsRouter } from "./assignments";
import { createCohortsRouter } from "./cohorts";
import { createGradebookRouter, createTeachingRouter } from "./gradebook";
import { createCohortInvitationsRouter, createInvitationsRouter } from "./invitations";

/**
 * Every router of the instructors' workflow and school admin, with their shared runtime (mailer,
 * invitation dispatcher, reminder jobs). Registered with one line in routes/index.ts.
 */
export function teachingRouters(ctx: AppContext): [string, Router][] {
  const rt = teachingRuntime(ctx);
  return [
    ["/cohorts", createCohortsRouter(ctx)],
    ["/cohorts", createCohortInvitationsRouter(ctx, rt)],
    ["/cohorts", createCohortAssignmentsRouter(ctx)],
    ["/cohorts", createGradebookRouter(ctx)],
    ["/teaching", createTeachingRouter(ctx)],
    ["/assignments", createMyAssignmentsRouter(ctx)],
    ["/invitations", createInvitationsRouter(ctx)],
    ["/admin", createAdminRouter(ctx, rt)],
  ];
}
