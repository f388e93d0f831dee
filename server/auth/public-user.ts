import type { PublicUser } from "../../shared/api/auth";
import type { UserInstance } from "../db/models";

/** The only user fields that leave the server (no hash, no counters). */
export function toPublicUser(user: UserInstance): PublicUser {
  return { id: user.id, email: user.email, displayName: user.displayName, role: user.role };
}

/** E-mail addresses are stored and compared lower-case. */
export const normalizeEmail = (email: string) => email.trim().toLowerCase();
