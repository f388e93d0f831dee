/** Roles and their home pages, kept free of zod so the first page the client loads stays small. */
export const ROLES = ["student", "instructor", "admin"] as const;
export type Role = (typeof ROLES)[number];

/** Where each role lands after signing in. */
export const ROLE_HOME: Record<Role, string> = {
  student: "/learn",
  instructor: "/teach",
  admin: "/admin",
};
