import { z } from "zod";
import { isCommonPassword } from "./common-passwords";

import { ROLES } from "./roles";

export { ROLES, ROLE_HOME, type Role } from "./roles";
export const roleSchema = z.enum(ROLES);

/**
 * New passwords: 8 to 128 characters, checked exactly as typed (no trimming, no truncation,
 * no composition rules), and not on the short common-password list.
 */
export const passwordSchema = z
  .string()
  .min(8, "Use at least 8 characters.")
  .max(128, "Use at most 128 characters.")
  .refine((p) => !isCommonPassword(p), "This password is too common. Choose another.");

export const loginRequestSchema = z.object({
  email: z.email("Enter a valid e-mail address.").max(254),
  password: z.string().min(1, "Enter your password.").max(128),
});
export type LoginRequest = z.infer<typeof loginRequestSchema>;

export const passwordChangeRequestSchema = z.object({
  currentPassword: z.string().min(1, "Enter your current password.").max(128),
  newPassword: passwordSchema,
});
export type PasswordChangeRequest = z.infer<typeof passwordChangeRequestSchema>;

export const publicUserSchema = z.object({
  id: z.number().int(),
  email: z.string(),
  displayName: z.string(),
  role: roleSchema,
});
export type PublicUser = z.infer<typeof publicUserSchema>;

/** GET /api/auth/me and POST /api/auth/login respond with this. */
export interface SessionResponse {
  user: PublicUser;
}

/** GET /api/auth/csrf */
export interface CsrfResponse {
  csrfToken: string;
}
