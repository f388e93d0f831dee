/**
 * Forge notebook: who may see what, the steel of an entry, the JSON shapes, and the cohort
 * comparison.
 *
 * RULES (ASVS 8.2.2, 8.4.1):
 *   read    the owner; an instructor teaching a cohort the owner is enrolled in; an admin.
 *   change  the owner only (edit, delete, upload, delete a file).
 *   review  an instructor teaching a cohort the owner is enrolled in, or an admin.
 * Anyone else gets 404 (loadOwned), so ids of other people's entries and files are not confirmed.
 * Cohort comparison points are anonymous: readings and tempering parameter only, no names or ids.
 */
import { Op } from "sequelize";
import type { PublicUser } from "../../shared/api/auth";
import {
  gradeSteelKey,
  parseSteelKey,
  type ComparisonPoint,
  type NotebookComment,
  type NotebookComparison,
  type NotebookEntry,
  type NotebookEntryInput,
  type NotebookEntrySummary,
  type NotebookFile,
  type NotebookSteel,
  type StorageUsage,
} from "../../shared/api/notebook";
import { computeNotebookEntry, computeTempering, summarizeReadings, type NotebookComputeInput } from "../../shared/api/notebook-compute";
import { findGrade, GRADE_PRESETS, type Composition } from "../../shared/metallurgy";
import type { Db } from "../db/database";
import type { NotebookCommentInstance } from "../db/models/notebook-comment";
import type { NotebookEntryInstance } from "../db/models/notebook-entry";
import type { NotebookFileInstance } from "../db/models/notebook-file";
import { HttpError } from "../errors";

const iso = (d: Date | string) => new Date(d).toISOString();

// ---------------------------------------------------------------------------------------------
// Access

/** Does this instructor teach a cohort (archived or not) that the student is enrolled in? */
export async function teachesStudent(db: Db, instructorId: number, studentId: number): Promise<boolean> {
  const n = await db.models.Enrollment.count({
    where: { studentId },
    include: [{ model: db.models.Cohort, as: "cohort", where: { instructorId }, attributes: [], required: true }],
  });
  return n > 0;
}

export async function canReadEntry(db: Db, user: PublicUser, entry: Pick<NotebookEntryInstance, "userId">): Promise<boolean> {
  if (entry.userId === user.id || user.role === "admin") return true;
  return user.role === "instructor" && (await teachesStudent(db, user.id, entry.userId));
}

export async function canReviewEntry(db: Db, user: PublicUser, entry: Pick<NotebookEntryInstance, "userId">): Promise<boolean> {
  if (user.role === "admin") return true;
  return user.role === "instructor" && (await teachesStudent(db, user.id, entry.userId));
}

// ---------------------------------------------------------------------------------------------
// Steel

export interface ResolvedSteel {
  steelKey: string;
  steelLabel: string;
  composition: Record<string, number>;
  comparisonKey: string;
}

/** Non-zero contents, rounded, in a fixed order: equal compositions give equal strings. */
function canonicalComposition(composition: Composition): string {
  return Object.entries(composition)
    .filter(([, v]) => typeof v === "number" && v > 0)
    .map(([el, v]) => `${el}${Number((v as number).toFixed(3))}`)
    .sort()
    .join("-");
}

const GRADE_CANONICAL = new Map(GRADE_PRESETS.map((g) => [canonicalComposition(g.composition), g.id]));

/** Entries compare with others of the same grade, or of the same composition (a saved alloy equal to a preset counts as that grade). */
export function comparisonKeyFor(composition: Composition): string {
  const canonical = canonicalComposition(composition);
  const grade = GRADE_CANONICAL.get(canonical);
  return grade ? gradeSteelKey(grade) : `comp:${canonical}`.slice(0, 200);
}

/**
 * The steel named by the form's key. A saved alloy must be the user's own; its name and
 * composition are copied into the entry. Editing an entry whose saved alloy was since deleted
 * keeps the copy.
 */
export async function resolveSteel(db: Db, userId: number, key: string, existing?: NotebookEntryInstance | null): Promise<ResolvedSteel> {
  const parsed = parseSteelKey(key);
  if (parsed.source === "grade") {
    const grade = findGrade(parsed.gradeId);
    if (!grade) throw steelError("That grade is not in the list of standard grades.");
    const composition = { ...grade.composition } as Record<string, number>;
    return { steelKey: key, steelLabel: grade.label, composition, comparisonKey: comparisonKeyFor(composition) };
  }
  const alloy = await db.models.SavedAlloy.findOne({ where: { id: parsed.alloyId, userId } });
  if (!alloy) {
    if (existing && existing.steelKey === key) {
      return { steelKey: key, steelLabel: existing.steelLabel, composition: existing.composition, comparisonKey: existing.comparisonKey };
    }
    throw steelError("That saved alloy was not found among yours. Choose another steel.");
  }
  const composition = Object.fromEntries(Object.entries(alloy.composition).filter(([, v]) => typeof v === "number" && v > 0)) as Record<string, number>;
  return { steelKey: key, steelLabel: alloy.name.slice(0, 80), composition, comparisonKey: comparisonKeyFor(composition) };
}

function steelError(message: string): HttpError {
  return new HttpError(400, "validation_failed", "Some fields are missing or invalid.", { steel: [message] });
}

/** The columns an entry form writes. */
export function entryAttributes(input: NotebookEntryInput, steel: ResolvedSteel) {
  return {
    title: input.title,
    workedOn: input.workedOn,
    ...steel,
    normalizingCycles: input.normalizingCycles,
    austenitizeC: input.austenitizeC,
    soakMinutes: input.soakMinutes,
    quenchMedium: input.quenchMedium,
    coldTreatment: input.coldTreatment,
    temperCycles: input.temperCycles,
    // Without tempering cycles the temperature and time mean nothing: store none.
    temperC: input.temperCycles > 0 ? input.temperC : null,
    temperHours: input.temperCycles > 0 ? input.temperHours : null,
    hardness: input.hardness.map((r) => ({ hrc: r.hrc, spot: r.spot })),
    notes: input.notes,
  };
}

// ---------------------------------------------------------------------------------------------
// Shapes

export function computeInputOf(row: NotebookEntryInstance): NotebookComputeInput {
  return {
    composition: row.composition as Composition,
    austenitizeC: row.austenitizeC,
    coldTreatment: row.coldTreatment,
    temperCycles: row.temperCycles,
    temperC: row.temperC,
    temperHours: row.temperHours,
    hardness: row.hardness ?? [],
  };
}

export function toFile(row: NotebookFileInstance): NotebookFile {
  return {
    id: row.id,
    kind: row.kind,
    name: row.originalName,
    mimeType: row.mimeType,
    sizeBytes: row.sizeBytes,
    width: row.width,
    height: row.height,
    url: `/api/notebook/files/${row.id}`,
    thumbUrl: row.thumbName ? `/api/notebook/files/${row.id}/thumb` : null,
    createdAt: iso(row.createdAt),
  };
}

export function toComment(row: NotebookCommentInstance): NotebookComment {
  return {
    id: row.id,
    author: row.author?.displayName ?? "A former instructor",
    body: row.body,
    status: row.status,
    notification: row.notification,
    createdAt: iso(row.createdAt),
  };
}

function steelOf(row: NotebookEntryInstance): NotebookSteel {
  return { key: row.steelKey, source: row.steelKey.startsWith("grade:") ? "grade" : "alloy", label: row.steelLabel, composition: row.composition };
}

function reviewOf(row: NotebookEntryInstance) {
  return { status: row.reviewStatus, reviewedAt: row.reviewedAt ? iso(row.reviewedAt) : null, reviewedBy: row.reviewer?.displayName ?? null };
}

function safeParameter(row: NotebookEntryInstance): number | null {
  try {
    return computeTempering(computeInputOf(row))?.parameter ?? null;
  } catch {
    return null;
  }
}

export function toSummary(row: NotebookEntryInstance): NotebookEntrySummary {
  const files = [...(row.files ?? [])].sort((a, b) => a.id - b.id);
  const cover = files.find((f) => f.thumbName);
  const readings = summarizeReadings(row.hardness ?? []);
  const { composition: _composition, ...steel } = steelOf(row);
  return {
    id: row.id,
    title: row.title,
    workedOn: row.workedOn,
    steel,
    owner: { id: row.userId, displayName: row.owner?.displayName ?? "" },
    review: reviewOf(row),
    readingsCount: readings.count,
    meanHrc: readings.meanHrc,
    temperingParameter: safeParameter(row),
    fileCount: files.length,
    coverThumbUrl: cover ? `/api/notebook/files/${cover.id}/thumb` : null,
    updatedAt: iso(row.updatedAt),
  };
}

export function toEntry(row: NotebookEntryInstance, viewer: { canEdit: boolean; canReview: boolean }): NotebookEntry {
  return {
    id: row.id,
    title: row.title,
    workedOn: row.workedOn,
    steel: steelOf(row),
    process: {
      normalizingCycles: row.normalizingCycles,
      austenitizeC: row.austenitizeC,
      soakMinutes: row.soakMinutes,
      quenchMedium: row.quenchMedium,
      coldTreatment: row.coldTreatment,
      temperCycles: row.temperCycles,
      temperC: row.temperC,
      temperHours: row.temperHours,
    },
    hardness: row.hardness ?? [],
    notes: row.notes,
    owner: { id: row.userId, displayName: row.owner?.displayName ?? "" },
    review: reviewOf(row),
    computation: computeNotebookEntry(computeInputOf(row)),
    files: [...(row.files ?? [])].sort((a, b) => a.id - b.id).map(toFile),
    comments: [...(row.comments ?? [])].sort((a, b) => a.id - b.id).map(toComment),
    canEdit: viewer.canEdit,
    canReview: viewer.canReview,
    createdAt: iso(row.createdAt),
    updatedAt: iso(row.updatedAt),
  };
}

// ---------------------------------------------------------------------------------------------
// Loading

export function summaryIncludes(db: Db) {
  return [
    { model: db.models.User, as: "owner", attributes: ["id", "displayName"] },
    { model: db.models.User, as: "reviewer", attributes: ["id", "displayName"] },
    { model: db.models.NotebookFile, as: "files", attributes: ["id", "thumbName"] },
  ];
}

export function loadEntryFull(db: Db, id: number) {
  return db.models.NotebookEntry.findByPk(id, {
    include: [
      { model: db.models.User, as: "owner", attributes: ["id", "displayName"] },
      { model: db.models.User, as: "reviewer", attributes: ["id", "displayName"] },
      { model: db.models.NotebookFile, as: "files" },
      { model: db.models.NotebookComment, as: "comments", include: [{ model: db.models.User, as: "author", attributes: ["id", "displayName"] }] },
    ],
  });
}

export async function entryResponse(db: Db, id: number, viewer: PublicUser) {
  const row = await loadEntryFull(db, id);
  if (!row) return null;
  const entry = toEntry(row, { canEdit: row.userId === viewer.id, canReview: await canReviewEntry(db, viewer, row) });
  return { entry, comparison: await comparisonFor(db, row) };
}

// ---------------------------------------------------------------------------------------------
// Cohort comparison (the chart beside the entry)

const MAX_POINTS = 600;

function pointsOf(rows: NotebookEntryInstance[], withIds: boolean): ComparisonPoint[] {
  const out: ComparisonPoint[] = [];
  for (const row of rows) {
    const parameter = safeParameter(row);
    if (parameter === null) continue;
    for (const reading of row.hardness ?? []) {
      out.push(withIds ? { temperingParameter: parameter, hrc: reading.hrc, entryId: row.id } : { temperingParameter: parameter, hrc: reading.hrc });
      if (out.length >= MAX_POINTS) return out;
    }
  }
  return out;
}

export async function comparisonFor(db: Db, entry: NotebookEntryInstance): Promise<NotebookComparison> {
  const { NotebookEntry, Enrollment } = db.models;
  const attributes = ["id", "userId", "composition", "temperCycles", "temperC", "temperHours", "hardness", "austenitizeC", "coldTreatment"] as const;
  const own = await NotebookEntry.findAll({
    where: { userId: entry.userId, comparisonKey: entry.comparisonKey },
    attributes: [...attributes],
    order: [["id", "ASC"]],
    limit: 200,
  });
  const cohortIds = (await Enrollment.findAll({ where: { studentId: entry.userId }, attributes: ["cohortId"], raw: true })).map((e) => e.cohortId);
  let mates: number[] = [];
  if (cohortIds.length > 0) {
    const rows = await Enrollment.findAll({
      where: { cohortId: { [Op.in]: cohortIds }, studentId: { [Op.ne]: entry.userId } },
      attributes: ["studentId"],
      raw: true,
    });
    mates = [...new Set(rows.map((r) => r.studentId))];
  }
  const cohort = mates.length
    ? await NotebookEntry.findAll({
        where: { userId: { [Op.in]: mates }, comparisonKey: entry.comparisonKey },
        attributes: [...attributes],
        order: [["id", "ASC"]],
        limit: 300,
      })
    : [];
  return { steelLabel: entry.steelLabel, own: pointsOf(own, true), cohort: pointsOf(cohort, false) };
}

// ---------------------------------------------------------------------------------------------
// Storage

export async function storageUsedBytes(db: Db, userId: number): Promise<number> {
  const [size, thumbs] = await Promise.all([
    db.models.NotebookFile.sum("sizeBytes", { where: { userId } }),
    db.models.NotebookFile.sum("thumbBytes", { where: { userId } }),
  ]);
  return (Number(size) || 0) + (Number(thumbs) || 0);
}

export async function storageUsage(db: Db, userId: number, limits: { quotaBytes: number; maxFileBytes: number }): Promise<StorageUsage> {
  return { usedBytes: await storageUsedBytes(db, userId), quotaBytes: limits.quotaBytes, maxFileBytes: limits.maxFileBytes };
}
