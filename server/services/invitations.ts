/**
 * Invitations to a cohort: creating them (or enrolling an existing student directly), listing,
 * resending, revoking, and accepting a link. Sending is the dispatcher's job
 * (invitations-dispatch.ts); nothing here talks to the mail server, so a request never waits
 * for it and never fails because of it.
 *
 * Tokens: 32 random bytes from the CSPRNG (256 bits, ASVS 11.5.1), base64url in the link; only
 * SHA-256(token) is stored. A token is replaced at every send, expires, and is accepted once.
 */
import { createHash, randomBytes } from "node:crypto";
import { Op, type Transaction } from "sequelize";
import type { PublicUser } from "../../shared/api/auth";
import type {
  AcceptInvitationRequest,
  InvitationLookup,
  InvitationState,
  InvitationView,
  InviteOutcome,
  InviteResponse,
  InviteResult,
} from "../../shared/api/invitations";
import { hashPassword } from "../auth/passwords";
import type { Db } from "../db/database";
import type { CohortInstance, InvitationInstance, UserInstance } from "../db/models";
import { HttpError, notFound } from "../errors";
import { recordAudit } from "./audit";
import { assertActive } from "./cohorts";

export function newInvitationToken(): string {
  return randomBytes(32).toString("base64url");
}

export function hashInvitationToken(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}

const iso = (d: Date | string | null | undefined) => (d ? new Date(d).toISOString() : null);

export function invitationState(row: Pick<InvitationInstance, "status" | "expiresAt">, now = new Date()): InvitationState {
  if (row.status === "sent" && row.expiresAt && new Date(row.expiresAt).getTime() <= now.getTime()) return "expired";
  return row.status;
}

export function toInvitationView(row: InvitationInstance, now = new Date()): InvitationView {
  return {
    id: row.id,
    email: row.email,
    displayName: row.displayName,
    state: invitationState(row, now),
    sendAttempts: row.sendAttempts,
    lastSendError: row.lastSendError,
    nextSendAt: row.status === "pending" ? iso(row.nextSendAt) : null,
    sentAt: iso(row.sentAt),
    expiresAt: iso(row.expiresAt),
    acceptedAt: iso(row.acceptedAt),
    createdAt: iso(row.createdAt)!,
  };
}

export interface Actor {
  user: PublicUser;
  ip: string | undefined;
}

export interface Person {
  email: string;
  displayName?: string | null;
}

const MESSAGES: Record<InviteOutcome, string> = {
  invited: "Invitation queued; it is e-mailed in a moment.",
  enrolled: "Already has a student account: added to the cohort.",
  already_member: "Already in this cohort.",
  already_invited: "Already invited; resend the open invitation if it got lost.",
  rejected: "",
};

/** How an e-mail address relates to this cohort (shared by invitations and the roster preview). */
export type Relation =
  | { kind: "new" }
  | { kind: "existing_student"; user: UserInstance }
  | { kind: "already_member" }
  | { kind: "already_invited" }
  | { kind: "staff" }
  | { kind: "disabled" };

export async function relationTo(db: Db, cohortId: number, emails: string[], transaction?: Transaction): Promise<Map<string, Relation>> {
  const { User, Enrollment, Invitation } = db.models;
  const out = new Map<string, Relation>();
  if (emails.length === 0) return out;
  const users = await User.findAll({ where: { email: { [Op.in]: emails } }, transaction });
  const members = new Set(
    (await Enrollment.findAll({ where: { cohortId, studentId: { [Op.in]: users.map((u) => u.id) } }, attributes: ["studentId"], raw: true, transaction })).map(
      (e) => e.studentId,
    ),
  );
  const open = await Invitation.findAll({
    where: { cohortId, email: { [Op.in]: emails }, status: { [Op.in]: ["pending", "sent"] } },
    transaction,
  });
  const now = new Date();
  const invited = new Set(open.filter((i) => invitationState(i, now) !== "expired").map((i) => i.email));
  const userByEmail = new Map(users.map((u) => [u.email, u]));
  for (const email of emails) {
    const user = userByEmail.get(email);
    if (user) {
      if (user.role !== "student") out.set(email, { kind: "staff" });
      else if (user.disabledAt) out.set(email, { kind: "disabled" });
      else if (members.has(user.id)) out.set(email, { kind: "already_member" });
      else out.set(email, { kind: "existing_student", user });
    } else out.set(email, invited.has(email) ? { kind: "already_invited" } : { kind: "new" });
  }
  return out;
}

/**
 * Invite people to a cohort in ONE transaction: new addresses get a pending invitation (the
 * dispatcher sends it), existing student accounts are enrolled at once, staff and disabled
 * accounts are refused. Returns the invitation ids to dispatch.
 */
export async function inviteToCohort(
  db: Db,
  actor: Actor,
  cohort: CohortInstance,
  people: Person[],
  linkBase: string,
  source: "invite" | "roster",
): Promise<{ response: InviteResponse; queued: number[] }> {
  assertActive(cohort);
  return db.write(async (transaction) => {
    const { Invitation, Enrollment } = db.models;
    const unique = [...new Map(people.map((p) => [p.email.toLowerCase(), { ...p, email: p.email.toLowerCase() }])).values()];
    const relations = await relationTo(db, cohort.id, unique.map((p) => p.email), transaction);
    const results: InviteResult[] = [];
    const queued: number[] = [];
    const now = new Date();
    for (const person of unique) {
      const relation = relations.get(person.email) ?? { kind: "new" };
      const result = (outcome: InviteOutcome, message = MESSAGES[outcome], invitationId: number | null = null) =>
        results.push({ email: person.email, outcome, message, invitationId });
      switch (relation.kind) {
        case "staff":
          result("rejected", "This address belongs to an instructor or admin account.");
          break;
        case "disabled":
          result("rejected", "This address belongs to a disabled account.");
          break;
        case "already_member":
          result("already_member");
          break;
        case "already_invited":
          result("already_invited");
          break;
        case "existing_student":
          await Enrollment.create({ cohortId: cohort.id, studentId: relation.user.id }, { transaction });
          await recordAudit(db, { actorId: actor.user.id, action: "cohort.student_added", targetType: "user", targetId: relation.user.id, details: { cohortId: cohort.id, source }, ip: actor.ip }, transaction);
          result("enrolled");
          break;
        case "new": {
          // An expired invitation still holds the "one open invitation" slot: close it first.
          await Invitation.update(
            { status: "revoked", tokenHash: null },
            { where: { cohortId: cohort.id, email: person.email, status: "sent", expiresAt: { [Op.lte]: now } }, transaction },
          );
          const row = await Invitation.create(
            {
              cohortId: cohort.id,
              email: person.email,
              displayName: person.displayName ?? null,
              status: "pending",
              nextSendAt: now,
              invitedById: actor.user.id,
              linkBase,
            },
            { transaction },
          );
          await recordAudit(db, { actorId: actor.user.id, action: "invitation.created", targetType: "invitation", targetId: row.id, details: { cohortId: cohort.id, email: person.email, source }, ip: actor.ip }, transaction);
          queued.push(row.id);
          result("invited", MESSAGES.invited, row.id);
          break;
        }
      }
    }
    const counts = { invited: 0, enrolled: 0, already_member: 0, already_invited: 0, rejected: 0 } as Record<InviteOutcome, number>;
    for (const r of results) counts[r.outcome] += 1;
    return { response: { results, counts }, queued };
  });
}

export async function listInvitations(db: Db, cohortId: number): Promise<InvitationView[]> {
  const rows = await db.read(() => db.models.Invitation.findAll({ where: { cohortId }, order: [["createdAt", "DESC"], ["id", "DESC"]] }));
  const now = new Date();
  return rows.map((r) => toInvitationView(r, now));
}

async function findInCohort(db: Db, cohortId: number, invitationId: number, transaction: Transaction): Promise<InvitationInstance> {
  const row = await db.models.Invitation.findOne({ where: { id: invitationId, cohortId }, transaction });
  if (!row) throw notFound("That invitation");
  return row;
}

/** Queue a fresh e-mail (new token, new expiry) for an invitation that was not accepted or revoked. */
export async function resendInvitation(db: Db, actor: Actor, cohort: CohortInstance, invitationId: number): Promise<InvitationInstance> {
  assertActive(cohort);
  return db.write(async (transaction) => {
    const row = await findInCohort(db, cohort.id, invitationId, transaction);
    if (row.status === "accepted" || row.status === "revoked") {
      throw new HttpError(409, "invitation_closed", "This invitation was already accepted or revoked.");
    }
    // Expired or delivered: it becomes pending again; the old link stops working now.
    await row.update({ status: "pending", tokenHash: null, nextSendAt: new Date(), lastSendError: null }, { transaction });
    await recordAudit(db, { actorId: actor.user.id, action: "invitation.resent", targetType: "invitation", targetId: row.id, details: { cohortId: cohort.id }, ip: actor.ip }, transaction);
    return row;
  });
}

export async function revokeInvitation(db: Db, actor: Actor, cohort: CohortInstance, invitationId: number): Promise<InvitationInstance> {
  return db.write(async (transaction) => {
    const row = await findInCohort(db, cohort.id, invitationId, transaction);
    if (row.status === "accepted") throw new HttpError(409, "invitation_closed", "This invitation was already accepted.");
    if (row.status === "revoked") return row;
    await row.update({ status: "revoked", tokenHash: null, nextSendAt: null }, { transaction });
    await recordAudit(db, { actorId: actor.user.id, action: "invitation.revoked", targetType: "invitation", targetId: row.id, details: { cohortId: cohort.id }, ip: actor.ip }, transaction);
    return row;
  });
}

// ---------- Accepting a link ----------

const INVALID = () => new HttpError(404, "invitation_invalid", "This invitation link is not valid. Ask your instructor for a new one.");
const USED = () => new HttpError(410, "invitation_used", "This invitation link has already been used. Sign in with the password you chose.");
const EXPIRED = () => new HttpError(410, "invitation_expired", "This invitation link has expired. Ask your instructor to send a new one.");

/** The open invitation a token belongs to, or the reason it cannot be used. */
async function openInvitation(db: Db, token: string, transaction?: Transaction) {
  const row = await db.models.Invitation.findOne({
    where: { tokenHash: hashInvitationToken(token) },
    include: [{ model: db.models.Cohort, as: "cohort", include: [{ model: db.models.User, as: "instructor", attributes: ["displayName"] }] }],
    transaction,
  });
  if (!row || !row.cohort) throw INVALID();
  if (row.status === "accepted") throw USED();
  if (row.status !== "sent" && row.status !== "pending") throw INVALID();
  if (!row.expiresAt || new Date(row.expiresAt).getTime() <= Date.now()) throw EXPIRED();
  if (row.cohort.archivedAt) throw INVALID();
  return row as InvitationInstance & { cohort: CohortInstance };
}

export async function lookupInvitation(db: Db, token: string): Promise<InvitationLookup> {
  const row = await db.read(() => openInvitation(db, token));
  return {
    email: row.email,
    displayName: row.displayName,
    cohortName: row.cohort.name,
    instructorName: row.cohort.instructor?.displayName ?? "",
    expiresAt: iso(row.expiresAt)!,
  };
}

/**
 * Accept an invitation: create the student account, enrol it, and close the invitation, in one
 * transaction; a second use of the same token (even racing) finds it accepted.
 */
export async function acceptInvitation(db: Db, request: AcceptInvitationRequest, ip: string | undefined): Promise<UserInstance> {
  await db.read(() => openInvitation(db, request.token)); // fail fast before spending ~70 ms on hashing
  const passwordHash = await hashPassword(request.password);
  return db.write(async (transaction) => {
    const invitation = await openInvitation(db, request.token, transaction);
    const { User, Enrollment } = db.models;
    if (await User.findOne({ where: { email: invitation.email }, transaction })) {
      throw new HttpError(409, "account_exists", "An account with this e-mail address already exists. Sign in instead, and ask your instructor to add you.");
    }
    const user = await User.create({ email: invitation.email, displayName: request.displayName, passwordHash, role: "student" }, { transaction });
    await Enrollment.create({ cohortId: invitation.cohortId, studentId: user.id }, { transaction });
    await invitation.update({ status: "accepted", acceptedAt: new Date(), acceptedUserId: user.id, nextSendAt: null }, { transaction });
    await recordAudit(db, { actorId: user.id, action: "invitation.accepted", targetType: "invitation", targetId: invitation.id, details: { cohortId: invitation.cohortId }, ip }, transaction);
    return user;
  });
}
