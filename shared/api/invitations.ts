/**
 * Invitations by e-mail and roster (CSV) import. The link in an invitation e-mail carries a
 * random 256-bit token (43 base64url characters); the server stores only its hash, lets it
 * expire and accepts it once.
 */
import { z } from "zod";
import { passwordSchema } from "./auth";
import { idParam, plainTextSchema } from "./cohorts";

export const inviteEmailSchema = z
  .email("Enter a valid e-mail address.")
  .max(254, "E-mail addresses have at most 254 characters.")
  .transform((e) => e.toLowerCase());

export const displayNameSchema = plainTextSchema("Name", 1, 120);

export const invitationParamsSchema = z.object({ cohortId: idParam("cohort"), invitationId: idParam("invitation") });

export const createInvitationsRequestSchema = z.strictObject({
  invitations: z
    .array(z.strictObject({ email: inviteEmailSchema, displayName: displayNameSchema.optional() }))
    .min(1, "Add at least one person.")
    .max(50, "Invite at most 50 people at a time; import a roster for more."),
});
export type CreateInvitationsRequest = z.input<typeof createInvitationsRequestSchema>;

/** Roster files are small: at most 500 rows and 90 kB of CSV text. */
export const ROSTER_MAX_ROWS = 500;
export const rosterRequestSchema = z.strictObject({
  csv: z.string().min(1, "The file is empty.").max(90_000, "The roster is too large (90 kB at most)."),
});
export type RosterRequest = z.infer<typeof rosterRequestSchema>;

export type InvitationState = "pending" | "sent" | "accepted" | "revoked" | "expired";

export interface InvitationView {
  id: number;
  email: string;
  displayName: string | null;
  /** "pending" = not delivered yet (queued, or the mail server was down and a retry is scheduled). */
  state: InvitationState;
  sendAttempts: number;
  /** A short, generic reason when the last send failed. */
  lastSendError: string | null;
  nextSendAt: string | null;
  sentAt: string | null;
  expiresAt: string | null;
  acceptedAt: string | null;
  createdAt: string;
}

export interface InvitationListResponse {
  invitations: InvitationView[];
}

export type InviteOutcome = "invited" | "enrolled" | "already_member" | "already_invited" | "rejected";

export interface InviteResult {
  email: string;
  outcome: InviteOutcome;
  message: string;
  invitationId: number | null;
}

/** POST /api/cohorts/:cohortId/invitations and .../roster/import answer 202 with this. */
export interface InviteResponse {
  results: InviteResult[];
  counts: Record<InviteOutcome, number>;
}

export type RosterRowStatus = "new" | "existing_student" | "already_member" | "already_invited" | "duplicate" | "invalid";

export interface RosterRow {
  /** 1-based line number in the file. */
  line: number;
  name: string;
  email: string;
  status: RosterRowStatus;
  messages: string[];
}

/** POST /api/cohorts/:cohortId/roster/preview (stores nothing). */
export interface RosterPreview {
  headerDetected: boolean;
  rows: RosterRow[];
  counts: Record<RosterRowStatus, number>;
  /** Problems with the file as a whole (e.g. too many rows). */
  fileErrors: string[];
}

// ---------- Accepting (public, rate-limited) ----------

export const invitationTokenSchema = z
  .string({ error: "The invitation link is incomplete." })
  .regex(/^[A-Za-z0-9_-]{43}$/, "The invitation link is incomplete or damaged.");

export const lookupInvitationRequestSchema = z.strictObject({ token: invitationTokenSchema });

export interface InvitationLookup {
  email: string;
  displayName: string | null;
  cohortName: string;
  instructorName: string;
  expiresAt: string;
}

export const acceptInvitationRequestSchema = z.strictObject({
  token: invitationTokenSchema,
  displayName: displayNameSchema,
  password: passwordSchema,
});
export type AcceptInvitationRequest = z.infer<typeof acceptInvitationRequestSchema>;
