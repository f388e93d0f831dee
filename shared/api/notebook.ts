/**
 * Forge notebook: a student's record of one blade or test coupon (steel, heat-treatment steps,
 * hardness readings, notes), its photos and PDF reports, and instructors' reviews.
 * The SAME zod schemas validate the client form (react-hook-form + zodResolver) and the server
 * routes (server/routes/notebook.ts), so a mistake gets the same explanation in both places.
 */
import { z } from "zod";
import { GRADE_PRESETS } from "../metallurgy/grades";
import { idParam, plainTextSchema } from "./cohorts";
import type { NotebookComputation } from "./notebook-compute";

// ---------------------------------------------------------------------------------------------
// Vocabulary

export const QUENCH_MEDIA = ["water", "brine", "fast-oil", "medium-oil", "slow-oil", "molten-salt", "plates", "still-air"] as const;
export type QuenchMedium = (typeof QUENCH_MEDIA)[number];
export const QUENCH_MEDIUM_LABELS: Record<QuenchMedium, string> = {
  water: "Water",
  brine: "Brine",
  "fast-oil": "Fast quenching oil",
  "medium-oil": "Medium-speed quenching oil",
  "slow-oil": "Slow quenching oil",
  "molten-salt": "Molten salt (martempering)",
  plates: "Aluminium plates",
  "still-air": "Still air",
};

/** Cold treatment after the quench, with the temperature the computation assumes for it. */
export const COLD_TREATMENTS = ["none", "freezer", "dry-ice", "liquid-nitrogen"] as const;
export type ColdTreatment = (typeof COLD_TREATMENTS)[number];
export const COLD_TREATMENT_LABELS: Record<ColdTreatment, string> = {
  none: "None",
  freezer: "Household freezer (about −18 °C)",
  "dry-ice": "Dry ice and alcohol (about −78 °C)",
  "liquid-nitrogen": "Liquid nitrogen (about −196 °C)",
};
/** Nominal temperatures: freezer [Mem], sublimation of CO2 −78.5 °C and boiling N2 −195.8 °C at 1 atm [Checked, handbook values]. */
export const COLD_TREATMENT_TEMP_C: Record<ColdTreatment, number | null> = {
  none: null,
  freezer: -18,
  "dry-ice": -78,
  "liquid-nitrogen": -196,
};

export const REVIEW_STATUSES = ["unreviewed", "reviewed", "needs-rework"] as const;
export type ReviewStatus = (typeof REVIEW_STATUSES)[number];
export const REVIEW_STATUS_LABELS: Record<ReviewStatus, string> = {
  unreviewed: "Awaiting review",
  reviewed: "Reviewed",
  "needs-rework": "Needs rework",
};

// ---------------------------------------------------------------------------------------------
// Limits (the form shows them; the server enforces them)

export const NOTEBOOK_LIMITS = {
  titleMax: 120,
  notesMax: 4000,
  readingsMax: 12,
  spotMax: 40,
  normalizingCyclesMax: 6,
  austenitizeC: { min: 700, max: 1250 },
  soakMinutes: { min: 1, max: 240 },
  temperCyclesMax: 6,
  /** The range where the Hollomon–Jaffe parameter is used (science-reference §5.1). */
  temperC: { min: 100, max: 700 },
  temperHours: { min: 0.1, max: 48 },
  /** Rockwell C is defined from about 20 to 70 HRC (ASTM E18 scale range) [Mem]. */
  hrc: { min: 20, max: 70 },
  commentMax: 2000,
  entriesPerUser: 500,
  filesPerEntry: 20,
} as const;

/** Upload rules, shown in the form; the server's own settings (server/uploads/settings.ts) decide. */
export const UPLOAD_RULES = {
  field: "file",
  accept: "image/jpeg,image/png,image/webp,application/pdf",
  kinds: "JPEG, PNG or WebP photos, or a PDF report",
} as const;

// ---------------------------------------------------------------------------------------------
// Steel: "grade:<preset id>" or "alloy:<saved alloy id>" (one select in the form)

export const GRADE_IDS = GRADE_PRESETS.map((g) => g.id);
const STEEL_KEY = /^(grade:[A-Za-z0-9-]{1,20}|alloy:[1-9][0-9]{0,9})$/;

export const steelKeySchema = z
  .string({ error: "Choose the steel: a standard grade or one of your saved alloys." })
  .min(1, "Choose the steel: a standard grade or one of your saved alloys.")
  .regex(STEEL_KEY, "Choose the steel: a standard grade or one of your saved alloys.")
  .refine((key) => !key.startsWith("grade:") || GRADE_IDS.includes(key.slice(6)), "That grade is not in the list of standard grades.");

export const gradeSteelKey = (gradeId: string) => `grade:${gradeId}`;
export const alloySteelKey = (alloyId: number) => `alloy:${alloyId}`;
export function parseSteelKey(key: string): { source: "grade"; gradeId: string } | { source: "alloy"; alloyId: number } {
  return key.startsWith("grade:") ? { source: "grade", gradeId: key.slice(6) } : { source: "alloy", alloyId: Number(key.slice(6)) };
}

// ---------------------------------------------------------------------------------------------
// The entry form (POST creates, PUT replaces)

const L = NOTEBOOK_LIMITS;

const numberIn = (what: string, unit: string, min: number, max: number, opts: { int?: boolean } = {}) => {
  const base = z.number({ error: `Enter the ${what}${unit ? ` in ${unit}` : ""}.` });
  const ranged = (opts.int ? base.int(`The ${what} must be a whole number.`) : base)
    .min(min, `The ${what} must be at least ${min}${unit ? ` ${unit}` : ""}.`)
    .max(max, `The ${what} must be at most ${max}${unit ? ` ${unit}` : ""}.`);
  return ranged;
};

export const hardnessReadingSchema = z.strictObject({
  hrc: z
    .number({ error: "Enter the reading in HRC." })
    .min(L.hrc.min, `Rockwell C readings start at ${L.hrc.min} HRC; below that use another scale and convert.`)
    .max(L.hrc.max, `Rockwell C readings stop at ${L.hrc.max} HRC; check the reading.`),
  /** Where on the piece (edge, spine, 10 mm from the tip…); optional. */
  spot: z
    .string()
    .trim()
    .max(L.spotMax, `Describe the spot in at most ${L.spotMax} characters.`)
    .refine((v) => !/[\u0000-\u001f\u007f]/.test(v), "The spot cannot contain line breaks or control characters."),
});
export type HardnessReading = z.infer<typeof hardnessReadingSchema>;

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

export const notebookEntryInputSchema = z
  .strictObject({
    title: plainTextSchema("A title", 1, L.titleMax),
    /** The forge session's date, YYYY-MM-DD. */
    workedOn: z
      .string({ error: "Enter the date you worked on the piece." })
      .regex(ISO_DATE, "Enter the date as YYYY-MM-DD.")
      .refine((v) => !Number.isNaN(Date.parse(`${v}T00:00:00Z`)) && new Date(`${v}T00:00:00Z`).toISOString().startsWith(v), "That date does not exist.")
      .refine((v) => v >= "1990-01-01", "Enter a date after 1990.")
      // One day of slack for time zones ahead of the server's.
      .refine((v) => Date.parse(`${v}T00:00:00Z`) <= Date.now() + 86_400_000, "The date cannot be in the future."),
    steel: steelKeySchema,
    normalizingCycles: numberIn("number of normalising cycles", "", 0, L.normalizingCyclesMax, { int: true }),
    austenitizeC: numberIn("austenitising temperature", "°C", L.austenitizeC.min, L.austenitizeC.max),
    soakMinutes: numberIn("soak time", "minutes", L.soakMinutes.min, L.soakMinutes.max),
    quenchMedium: z.enum(QUENCH_MEDIA, { error: "Choose the quench medium." }),
    coldTreatment: z.enum(COLD_TREATMENTS, { error: "Choose a cold treatment, or None." }),
    temperCycles: numberIn("number of tempering cycles", "", 0, L.temperCyclesMax, { int: true }),
    temperC: numberIn("tempering temperature", "°C", L.temperC.min, L.temperC.max).nullable(),
    temperHours: numberIn("time per tempering cycle", "hours", L.temperHours.min, L.temperHours.max).nullable(),
    hardness: z.array(hardnessReadingSchema, { error: "Send the hardness readings as a list." }).max(L.readingsMax, `Record at most ${L.readingsMax} readings per piece.`),
    notes: z
      .string({ error: "Notes must be text." })
      .max(L.notesMax, `Notes can have at most ${L.notesMax} characters.`)
      .refine((v) => !/[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/.test(v), "Notes cannot contain control characters."),
  })
  .superRefine((v, ctx) => {
    // Tempering temperature and time are needed only when the piece was tempered.
    if (v.temperCycles > 0) {
      if (v.temperC === null) ctx.addIssue({ code: "custom", path: ["temperC"], message: "Enter the tempering temperature in °C, or set the tempering cycles to 0." });
      if (v.temperHours === null) ctx.addIssue({ code: "custom", path: ["temperHours"], message: "Enter the time per tempering cycle in hours, or set the tempering cycles to 0." });
    }
    if (v.temperC !== null && v.temperC >= v.austenitizeC) {
      ctx.addIssue({ code: "custom", path: ["temperC"], message: "Tempering happens below the austenitising temperature; check both values." });
    }
  });
export type NotebookEntryInput = z.infer<typeof notebookEntryInputSchema>;

/** Field names of the form, for putting server errors on fields. */
export const NOTEBOOK_ENTRY_FIELDS = [
  "title",
  "workedOn",
  "steel",
  "normalizingCycles",
  "austenitizeC",
  "soakMinutes",
  "quenchMedium",
  "coldTreatment",
  "temperCycles",
  "temperC",
  "temperHours",
  "hardness",
  "notes",
] as const;

export const entryParamsSchema = z.object({ id: idParam("entry") });
export const fileParamsSchema = z.object({ fileId: idParam("file") });

export const reviewRequestSchema = z.strictObject({
  status: z.enum(["reviewed", "needs-rework"], { error: "Choose Reviewed or Needs rework." }),
  comment: z
    .string({ error: "The comment must be text." })
    .trim()
    .max(L.commentMax, `Keep the comment to at most ${L.commentMax} characters.`)
    .refine((v) => !/[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/.test(v), "The comment cannot contain control characters."),
});
export type ReviewRequest = z.infer<typeof reviewRequestSchema>;

export const reviewListQuerySchema = z.object({
  status: z.enum([...REVIEW_STATUSES, "all"], { error: "Filter by unreviewed, reviewed, needs-rework or all." }).optional().default("all"),
});
export type ReviewListQuery = z.infer<typeof reviewListQuerySchema>;

// ---------------------------------------------------------------------------------------------
// Responses

export interface NotebookSteel {
  key: string;
  source: "grade" | "alloy";
  label: string;
  /** Mass %, copied when the entry was saved (a saved alloy may change or be deleted later). */
  composition: Record<string, number>;
}

export interface NotebookFile {
  id: number;
  kind: "image" | "pdf";
  /** The sanitised original name (display only; the stored name is chosen by the server). */
  name: string;
  mimeType: string;
  sizeBytes: number;
  width: number | null;
  height: number | null;
  url: string;
  thumbUrl: string | null;
  createdAt: string;
}

export interface NotebookComment {
  id: number;
  author: string;
  body: string;
  status: "reviewed" | "needs-rework" | null;
  /** E-mail to the student: sent, failed, or still queued. */
  notification: "sent" | "failed" | "pending" | "none";
  createdAt: string;
}

export interface NotebookProcess {
  normalizingCycles: number;
  austenitizeC: number;
  soakMinutes: number;
  quenchMedium: QuenchMedium;
  coldTreatment: ColdTreatment;
  temperCycles: number;
  temperC: number | null;
  temperHours: number | null;
}

export interface NotebookEntrySummary {
  id: number;
  title: string;
  workedOn: string;
  steel: Pick<NotebookSteel, "key" | "source" | "label">;
  owner: { id: number; displayName: string };
  review: { status: ReviewStatus; reviewedAt: string | null; reviewedBy: string | null };
  readingsCount: number;
  meanHrc: number | null;
  temperingParameter: number | null;
  fileCount: number;
  coverThumbUrl: string | null;
  updatedAt: string;
}

export interface NotebookEntry {
  id: number;
  title: string;
  workedOn: string;
  steel: NotebookSteel;
  process: NotebookProcess;
  hardness: HardnessReading[];
  notes: string;
  owner: { id: number; displayName: string };
  review: { status: ReviewStatus; reviewedAt: string | null; reviewedBy: string | null };
  /** From the science core (shared/api/notebook-compute.ts), the same function the form preview uses. */
  computation: NotebookComputation;
  files: NotebookFile[];
  comments: NotebookComment[];
  /** What the viewer may do. */
  canEdit: boolean;
  canReview: boolean;
  createdAt: string;
  updatedAt: string;
}

export interface ComparisonPoint {
  temperingParameter: number;
  hrc: number;
  /** Set for the viewer's own entries of the same steel; cohort points are anonymous. */
  entryId?: number;
}

export interface NotebookComparison {
  steelLabel: string;
  /** Readings of this entry's owner on entries of the same steel (this entry included). */
  own: ComparisonPoint[];
  /** Readings of the owner's cohort mates on the same steel, without names. */
  cohort: ComparisonPoint[];
}

export interface StorageUsage {
  usedBytes: number;
  quotaBytes: number;
  maxFileBytes: number;
}

export interface NotebookListResponse {
  entries: NotebookEntrySummary[];
  storage: StorageUsage;
}

export interface NotebookEntryResponse {
  entry: NotebookEntry;
  comparison: NotebookComparison;
}

export interface NotebookFileResponse {
  file: NotebookFile;
  storage: StorageUsage;
}

export interface ReviewListItem extends NotebookEntrySummary {
  cohorts: string[];
}

export interface ReviewListResponse {
  entries: ReviewListItem[];
}

export interface ReviewResponse {
  entry: NotebookEntry;
  comment: NotebookComment;
}
