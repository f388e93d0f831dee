/** Client routes of the teaching screens (kept here until src/config/paths.ts adopts them). */
export const teachPaths = {
  dashboard: "/teach",
  cohort: (id: number) => `/teach/cohorts/${id}`,
  gradebook: (id: number) => `/teach/cohorts/${id}/gradebook`,
  student: (cohortId: number, studentId: number) => `/teach/cohorts/${cohortId}/students/${studentId}`,
} as const;

export const adminPaths = {
  overview: "/admin",
  users: "/admin/users",
  audit: "/admin/audit",
  outbox: "/admin/outbox",
} as const;

export const invitePattern = "/invite/:token";
