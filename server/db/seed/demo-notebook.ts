/**
 * Demo forge-notebook entries and reviews, written by the services behind POST
 * /api/notebook/entries and POST /api/notebook/entries/:id/review (server/services/
 * notebook-entries.ts) from inputs the same zod schemas validated: the steel's composition and
 * comparison key are copied in, and only an instructor teaching the student may review. The
 * writers are history actors, so the reviews e-mail nobody ("none") and nothing is audited: the
 * demo tells nobody about the past. Only the dates are moved back to the story's days afterwards.
 * The core's numbers (tempering parameter, Ms, hardness estimates) are computed from the stored
 * inputs whenever an entry is read, exactly as for a student's own entry. Photos go through the
 * upload pipeline's checks and re-encoding (detectUpload, storeFileBytes).
 * No entry uses 52100: the browser test counts the cohort's 52100 readings.
 */
import { notebookEntryInputSchema, reviewRequestSchema, type ColdTreatment, type NotebookEntryInput, type QuenchMedium } from "../../../shared/api/notebook";
import type { NotebookEntryInstance } from "../../db/models/notebook-entry";
import { createEntry, reviewEntry } from "../../services/notebook-entries";
import { storeFileBytes } from "../../services/notebook-files";
import { detectUpload } from "../../uploads/detect";
import { uploadSettings, type UploadSettings } from "../../uploads/settings";
import { UploadStore } from "../../uploads/store";
import { DEMO_INSTRUCTORS } from "./demo-people";
import { backdate, historyActor, isoDay, seedOf, type SeedContext } from "./demo-context";
import { etchedBarPng } from "./demo-image";

/** The heat treatment as a smith logs it: one column per field of the entry form. */
type Process = [
  steel: string,
  normalizingCycles: number,
  austenitizeC: number,
  soakMinutes: number,
  quenchMedium: QuenchMedium,
  coldTreatment: ColdTreatment,
  temperCycles: number,
  temperC: number,
  temperHours: number,
];

interface EntryPlan {
  local: string;
  workedDaysAgo: number;
  title: string;
  process: Process;
  /** HRC and where on the piece. */
  hardness: [number, string][];
  notes: string;
  photo?: { name: string; hardenedShare: number };
  review?: { daysAgo: number; status: "reviewed" | "needs-rework"; comment: string };
}

function entryInput(plan: EntryPlan, workedOn: string): NotebookEntryInput {
  const [steel, normalizingCycles, austenitizeC, soakMinutes, quenchMedium, coldTreatment, temperCycles, temperC, temperHours] = plan.process;
  const hardness = plan.hardness.map(([hrc, spot]) => ({ hrc, spot }));
  return notebookEntryInputSchema.parse({
    title: plan.title, workedOn, steel, normalizingCycles, austenitizeC, soakMinutes, quenchMedium, coldTreatment,
    temperCycles, temperC, temperHours, hardness, notes: plan.notes,
  });
}

// process: [steel, normalising cycles, austenitise °C, soak min, quench, cold step, tempering cycles, temper °C, h per cycle]
const ENTRY_PLANS: EntryPlan[] = [
  {
    local: "mara.quillon",
    workedDaysAgo: 12,
    title: "1095 test coupon, two tempers at 200 °C",
    process: ["grade:1095", 3, 800, 5, "fast-oil", "none", 2, 200, 1],
    hardness: [[62, "edge"], [61.5, "middle"], [60.5, "spine"]],
    notes: "Coupon 60 × 25 × 4 mm. Clean break on the test tab, fine grey grain. The file skated on the edge before tempering.",
    review: { daysAgo: 10, status: "reviewed", comment: "Clear record, and the three readings across the width show the spine is a touch softer. Next time note the oil temperature too." },
  },
  {
    local: "mara.quillon",
    workedDaysAgo: 3,
    title: "O1 marking knife, etched after tempering",
    process: ["grade:O1", 2, 800, 15, "medium-oil", "none", 2, 190, 1],
    hardness: [[62, "edge"], [61.5, "ricasso"]],
    notes: "Etched in a weak acid bath to see the hardened zone: the dark band follows the bevel, as in the photo.",
    photo: { name: "o1-marking-knife-etch.png", hardenedShare: 0.42 },
  },
  {
    local: "wren.ostby",
    workedDaysAgo: 5,
    title: "440C fillet blank with a dry-ice step",
    process: ["grade:440C", 0, 1060, 30, "plates", "dry-ice", 2, 160, 2],
    hardness: [[59.5, "edge"], [60, "middle"], [59, "tang"]],
    notes: "Wrapped in foil for the soak, plate quench, dry ice within the hour. Slightly lower than I hoped; comparing with the Ms estimate.",
    photo: { name: "440c-blank-etch.png", hardenedShare: 0.7 },
  },
  {
    local: "ines.forthwell",
    workedDaysAgo: 8,
    title: "5160 chopper, first heat treatment",
    process: ["grade:5160", 1, 845, 10, "medium-oil", "none", 1, 230, 1],
    hardness: [[56, "edge"], [52.5, "middle"], [58, "tip"]],
    notes: "Readings jump around. Some scale on the flats before testing.",
    review: { daysAgo: 6, status: "needs-rework", comment: "The readings differ by 5 HRC: grind the scale and any decarburised skin off a flat spot and test again. Please add how long the blade sat in the oil." },
  },
  {
    local: "tobin.ashgrove",
    workedDaysAgo: 2,
    title: "1080 hunting blade, second try",
    process: ["grade:1080", 3, 815, 5, "fast-oil", "none", 2, 205, 1],
    hardness: [[60, "edge"], [59.5, "middle"], [60.5, "near the tip"]],
    notes: "Straightened between the two tempers while still warm. No warp left.",
  },
  {
    local: "dario.penhallow",
    workedDaysAgo: 6,
    title: "1095 coupon tempered hotter",
    process: ["grade:1095", 2, 800, 5, "fast-oil", "none", 2, 230, 1],
    hardness: [[59, "edge"], [59.5, "middle"]],
    notes: "Same steel as Mara's coupon, tempered 30 °C hotter to compare.",
    review: { daysAgo: 4, status: "reviewed", comment: "Good comparison: the chart beside your entry shows the drop in hardness with the higher tempering parameter." },
  },
  {
    local: "yusra.delacombe",
    workedDaysAgo: 9,
    title: "D2 skinner, freezer after the quench",
    process: ["grade:D2", 0, 1010, 30, "plates", "freezer", 2, 205, 2],
    hardness: [[60, "edge"], [60.5, "middle"], [59.5, "spine"]],
    notes: "Freezer overnight before the first temper. Grinding the bevel afterwards was slow.",
    review: { daysAgo: 7, status: "reviewed", comment: "Well documented. Compare the retained austenite estimate for the freezer with the dry-ice value." },
  },
  {
    local: "priya.tallisker",
    workedDaysAgo: 1,
    title: "1080 coupon for the weekend class",
    process: ["grade:1080", 2, 815, 5, "fast-oil", "none", 2, 200, 1],
    hardness: [[61, "edge"], [60.5, "middle"]],
    notes: "",
  },
];

/** A synthetic etch photo stored as an upload is: detected, re-encoded with a thumbnail. */
async function seedPhoto(s: SeedContext, store: UploadStore, settings: UploadSettings, entry: NotebookEntryInstance, photo: NonNullable<EntryPlan["photo"]>, at: Date) {
  const png = await etchedBarPng({ seed: seedOf(photo.name), hardenedShare: photo.hardenedShare });
  const detected = await detectUpload(png);
  if (detected.kind !== "image") throw new Error("demo photo was not recognised as an image");
  await store.ensureDir();
  const stored = await storeFileBytes(store, settings, png, detected, photo.name, s.writtenFiles);
  await s.db.models.NotebookFile.create(
    { ...stored, entryId: entry.id, userId: entry.userId, createdAt: at, updatedAt: at },
    { transaction: s.transaction, silent: true },
  );
}

export async function seedNotebook(s: SeedContext): Promise<{ entries: number; files: number }> {
  const { NotebookEntry, NotebookComment } = s.db.models;
  const settings = uploadSettings(s.ctx.config);
  const store = new UploadStore(settings.dir);
  const reviewer = historyActor(s, DEMO_INSTRUCTORS[0].email);
  let files = 0;

  for (const plan of ENTRY_PLANS) {
    // Written up on the forge day itself.
    const writtenAt = s.when(plan.workedDaysAgo);
    const entry = await createEntry(s.db, historyActor(s, `${plan.local}@grain-edge.test`), entryInput(plan, isoDay(writtenAt)));

    if (plan.photo) {
      await seedPhoto(s, store, settings, entry, plan.photo, writtenAt);
      files += 1;
    }

    let reviewedAt: Date | null = null;
    if (plan.review) {
      const comment = await reviewEntry(s.db, reviewer, entry, reviewRequestSchema.parse({ status: plan.review.status, comment: plan.review.comment }));
      reviewedAt = s.when(plan.review.daysAgo);
      await backdate(s, NotebookComment, comment.id, reviewedAt);
    }
    // The review queue sorts by updatedAt: date the entry from the story, not from the seed run.
    await NotebookEntry.update(
      { createdAt: writtenAt, updatedAt: reviewedAt ?? writtenAt, ...(reviewedAt ? { reviewedAt } : {}) },
      { where: { id: entry.id }, transaction: s.transaction, silent: true },
    );
  }
  return { entries: ENTRY_PLANS.length, files };
}
