import type { Role } from "../shared/api/auth";

/**
 * Route -> access policy (ASVS 8.1.1: the rules, written down). Every /api route must be listed;
 * tests/server/policy.test.ts fails when a registered route is missing here, and checks that
 * anonymous users get 401 and disallowed roles get 403 on each listed route.
 *
 * access:  "public"         anyone, signed in or not
 *          "authenticated"  any signed-in, enabled user
 *          [roles]          only these roles (others: 403)
 * object:  how object-level access is decided (loadOwned in the route); denials answer 404.
 * body:    "multipart" lets an upload route receive multipart/form-data (everything else is JSON-only).
 *
 * HOW TO ADD A ROUTE: add the route in server/routes/<resource>.ts with its guards from
 * middleware/authorize.ts, then add ONE line here.
 */
export type Access = "public" | "authenticated" | readonly Role[];
export type Method = "GET" | "POST" | "PUT" | "PATCH" | "DELETE";

export interface RoutePolicy {
  method: Method;
  /** Express path with :params, e.g. "/api/cohorts/:cohortId". */
  path: string;
  access: Access;
  object?: string;
  body?: "json" | "multipart";
}

export const ROUTE_POLICY: readonly RoutePolicy[] = [
  { method: "GET", path: "/api/health", access: "public" },
  { method: "GET", path: "/api/auth/csrf", access: "public" },
  { method: "POST", path: "/api/auth/login", access: "public" },
  { method: "POST", path: "/api/auth/logout", access: "public" },
  { method: "GET", path: "/api/auth/me", access: "authenticated" },
  { method: "POST", path: "/api/auth/password", access: "authenticated" },
  { method: "GET", path: "/api/me/summary", access: "authenticated", object: "own data only (req.user)" },
  { method: "GET", path: "/api/modules", access: "authenticated", object: "own progress only (req.user)" },
  { method: "GET", path: "/api/lessons/:slug/progress", access: "authenticated", object: "own progress only (req.user)" },
  { method: "PUT", path: "/api/lessons/:slug/progress", access: "authenticated", object: "own progress only (req.user)" },
  { method: "GET", path: "/api/quizzes/:id", access: "authenticated", object: "own open attempt (req.user)" },
  { method: "POST", path: "/api/quizzes/:id/attempts", access: "authenticated", object: "own attempts only (req.user)" },
  { method: "GET", path: "/api/quizzes/:id/attempts", access: "authenticated", object: "own attempts only (req.user)" },
  { method: "GET", path: "/api/audit-log", access: ["admin"] },
  { method: "GET", path: "/api/alloys", access: "authenticated", object: "own saved alloys only (req.user)" },
  { method: "POST", path: "/api/alloys", access: "authenticated", object: "created for req.user" },
  { method: "PATCH", path: "/api/alloys/:id", access: "authenticated", object: "owner only (loadOwned, else 404)" },
  { method: "DELETE", path: "/api/alloys/:id", access: "authenticated", object: "owner only (loadOwned, else 404)" },
  { method: "POST", path: "/api/alloys/:id/attach", access: ["instructor", "admin"], object: "owner of the alloy only (loadOwned, else 404)" },
  { method: "DELETE", path: "/api/alloys/:id/attach/:slug", access: ["instructor", "admin"], object: "owner of the alloy only (loadOwned, else 404)" },
  { method: "GET", path: "/api/lessons/:slug/attached-alloys", access: "authenticated" },
  { method: "GET", path: "/api/cohorts", access: ["instructor", "admin"], object: "own cohorts (instructor) or all (admin)" },
  { method: "POST", path: "/api/cohorts", access: ["instructor", "admin"], object: "instructorId: admins only (else 403)" },
  { method: "GET", path: "/api/cohorts/:cohortId", access: ["instructor", "admin"], object: "own cohort (instructor) or any (admin); else 404" },
  { method: "PATCH", path: "/api/cohorts/:cohortId", access: ["instructor", "admin"], object: "own cohort (instructor) or any (admin); else 404; instructorId: admins only (403)" },
  { method: "DELETE", path: "/api/cohorts/:cohortId/students/:studentId", access: ["instructor", "admin"], object: "own cohort (instructor) or any (admin); else 404" },
  { method: "POST", path: "/api/cohorts/:cohortId/students/:studentId/move", access: ["instructor", "admin"], object: "own cohort (instructor) or any (admin); else 404, for both cohorts" },
  { method: "GET", path: "/api/cohorts/:cohortId/invitations", access: ["instructor", "admin"], object: "own cohort (instructor) or any (admin); else 404" },
  { method: "POST", path: "/api/cohorts/:cohortId/invitations", access: ["instructor", "admin"], object: "own cohort (instructor) or any (admin); else 404" },
  { method: "POST", path: "/api/cohorts/:cohortId/invitations/:invitationId/resend", access: ["instructor", "admin"], object: "own cohort (instructor) or any (admin); else 404" },
  { method: "DELETE", path: "/api/cohorts/:cohortId/invitations/:invitationId", access: ["instructor", "admin"], object: "own cohort (instructor) or any (admin); else 404" },
  { method: "POST", path: "/api/cohorts/:cohortId/roster/preview", access: ["instructor", "admin"], object: "own cohort (instructor) or any (admin); else 404" },
  { method: "POST", path: "/api/cohorts/:cohortId/roster/import", access: ["instructor", "admin"], object: "own cohort (instructor) or any (admin); else 404" },
  { method: "GET", path: "/api/cohorts/:cohortId/assignments", access: ["instructor", "admin"], object: "own cohort (instructor) or any (admin); else 404" },
  { method: "POST", path: "/api/cohorts/:cohortId/assignments", access: ["instructor", "admin"], object: "own cohort (instructor) or any (admin); else 404" },
  { method: "PATCH", path: "/api/cohorts/:cohortId/assignments/:assignmentId", access: ["instructor", "admin"], object: "own cohort (instructor) or any (admin); else 404" },
  { method: "DELETE", path: "/api/cohorts/:cohortId/assignments/:assignmentId", access: ["instructor", "admin"], object: "own cohort (instructor) or any (admin); else 404" },
  { method: "GET", path: "/api/cohorts/:cohortId/gradebook", access: ["instructor", "admin"], object: "own cohort (instructor) or any (admin); else 404" },
  { method: "GET", path: "/api/cohorts/:cohortId/gradebook.csv", access: ["instructor", "admin"], object: "own cohort (instructor) or any (admin); else 404; audited" },
  { method: "GET", path: "/api/cohorts/:cohortId/analytics", access: ["instructor", "admin"], object: "own cohort (instructor) or any (admin); else 404" },
  { method: "GET", path: "/api/cohorts/:cohortId/students/:studentId/attempts", access: ["instructor", "admin"], object: "own cohort (instructor) or any (admin); else 404, student enrolled in it" },
  { method: "GET", path: "/api/teaching/overview", access: ["instructor", "admin"], object: "own cohorts (instructor) or all (admin)" },
  { method: "GET", path: "/api/assignments", access: "authenticated", object: "own assignments only (req.user)" },
  { method: "POST", path: "/api/invitations/lookup", access: "public", object: "the token is the credential; rate-limited" },
  { method: "POST", path: "/api/invitations/accept", access: "public", object: "the token is the credential; single use; rate-limited" },
  { method: "GET", path: "/api/admin/users", access: ["admin"] },
  { method: "PATCH", path: "/api/admin/users/:userId", access: ["admin"], object: "not one's own account (409)" },
  { method: "DELETE", path: "/api/admin/users/:userId/sessions", access: ["admin"], object: "not one's own account (409)" },
  { method: "GET", path: "/api/admin/outbox", access: ["admin"] },
  { method: "GET", path: "/api/admin/outbox/:messageId", access: ["admin"] },
  { method: "POST", path: "/api/admin/jobs/run", access: ["admin"] },
  { method: "GET", path: "/api/notebook/entries", access: "authenticated", object: "own entries only (req.user)" },
  { method: "POST", path: "/api/notebook/entries", access: "authenticated", object: "created for req.user; a saved alloy must be one's own" },
  { method: "GET", path: "/api/notebook/entries/:id", access: "authenticated", object: "owner, instructors of the owner's cohorts, admins (loadOwned, else 404)" },
  { method: "PUT", path: "/api/notebook/entries/:id", access: "authenticated", object: "owner only (loadOwned, else 404)" },
  { method: "DELETE", path: "/api/notebook/entries/:id", access: "authenticated", object: "owner only (loadOwned, else 404)" },
  { method: "POST", path: "/api/notebook/entries/:id/files", access: "authenticated", object: "owner only (loadOwned, else 404); per-user quota", body: "multipart" },
  { method: "GET", path: "/api/notebook/files/:fileId", access: "authenticated", object: "owner, instructors of the owner's cohorts, admins (else 404); sandboxed response" },
  { method: "GET", path: "/api/notebook/files/:fileId/thumb", access: "authenticated", object: "owner, instructors of the owner's cohorts, admins (else 404); sandboxed response" },
  { method: "DELETE", path: "/api/notebook/files/:fileId", access: "authenticated", object: "owner only (loadOwned, else 404)" },
  { method: "POST", path: "/api/notebook/entries/:id/review", access: ["instructor", "admin"], object: "instructor of a cohort the owner is in, or admin (loadOwned, else 404)" },
  { method: "GET", path: "/api/notebook/review", access: ["instructor", "admin"], object: "entries of students in own cohorts (instructor) or all (admin)" },
  { method: "GET", path: "/api/billing/offer", access: "public" },
  { method: "POST", path: "/api/billing/purchase", access: "public", object: "creates a new \"self\" account; refused when signed in; rate-limited" },
  { method: "POST", path: "/api/billing/renew", access: ["student"], object: "own pass only (req.user); \"self\" accounts only (school students 403); rate-limited" },
  { method: "POST", path: "/api/billing/webhook", access: "public", object: "provider signature over the raw body (no session, no CSRF); event ids stored once" },
];

function pathPattern(path: string): RegExp {
  const source = path
    .split("/")
    .map((seg) => (seg.startsWith(":") ? "[^/]+" : seg.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")))
    .join("/");
  return new RegExp(`^${source}/?$`);
}

const MULTIPART = ROUTE_POLICY.filter((r) => r.body === "multipart").map((r) => ({
  method: r.method,
  pattern: pathPattern(r.path),
}));

/** True when the policy marks this method + path as a multipart upload route. */
export function allowsMultipart(method: string, originalPath: string): boolean {
  return MULTIPART.some((r) => r.method === method && r.pattern.test(originalPath));
}
