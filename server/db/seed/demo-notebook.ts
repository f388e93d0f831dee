/**
 * Demo forge-notebook entries, written the way POST /api/notebook/entries writes them: the same
 * zod schema, resolveSteel (the grade's composition and comparison key copied in) and
 * entryAttributes. The core's numbers (tempering parameter, Ms, hardness estimates) are computed
 * from these stored inputs whenever an entry is read, exactly as for a student's own entry.
 * Photos go through the upload pipeline's checks and re-encoding (detectUpload, processImage,
 * UploadStore); reviews are stored as POST /api/notebook/entries/:id/review stores them, but
 * with no e-mail ("none"): the demo sends nobody mail about the past.
 * No entry uses 52100: the browser test counts the cohort's 52100 readings.
 */
import { notebookEntryInputSchema, reviewRequestSchema, type NotebookEntryInput } from "../../../shared/api/notebook";
import { canReviewEntry, entryAttributes, resolveSteel } from "../../services/notebook";
import { detectUpload } from "../../uploads/detect";
import { processImage } from "../../uploads/images";
import { displayName } from "../../uploads/names";
import { uploadSettings } from "../../uploads/settings";
import { UploadStore } from "../../uploads/store";
import { DEMO_INSTRUCTORS } from "./demo-people";
import { isoDay, seedOf, type SeedContext } from "./demo-context";
import { etchedBarPng } from "./demo-image";

interface EntryPlan {
  local: string;
  workedDaysAgo: number;
  input: Omit<NotebookEntryInput, "workedOn">;
  photo?: { name: string; hardenedShare: number };
  review?: { daysAgo: number; status: "reviewed" | "needs-rework"; comment: string };
}

const readings = (...pairs: [number, string][]) => pairs.map(([hrc, spot]) => ({ hrc, spot }));

const ENTRY_PLANS: EntryPlan[] = [
  {
    local: "mara.quillon",
    workedDaysAgo: 12,
    input: {
      title: "1095 test coupon, two tempers at 200 °C",
      steel: "grade:1095", normalizingCycles: 3, austenitizeC: 800, soakMinutes: 5, quenchMedium: "fast-oil", coldTreatment: "none",
      temperCycles: 2, temperC: 200, temperHours: 1,
      hardness: readings([62, "edge"], [61.5, "middle"], [60.5, "spine"]),
      notes: "Coupon 60 × 25 × 4 mm. Clean break on the test tab, fine grey grain. The file skated on the edge before tempering.",
    },
    review: { daysAgo: 10, status: "reviewed", comment: "Clear record, and the three readings across the width show the spine is a touch softer. Next time note the oil temperature too." },
  },
  {
    local: "mara.quillon",
    workedDaysAgo: 3,
    input: {
      title: "O1 marking knife, etched after tempering",
      steel: "grade:O1", normalizingCycles: 2, austenitizeC: 800, soakMinutes: 15, quenchMedium: "medium-oil", coldTreatment: "none",
      temperCycles: 2, temperC: 190, temperHours: 1,
      hardness: readings([62, "edge"], [61.5, "ricasso"]),
      notes: "Etched in a weak acid bath to see the hardened zone: the dark band follows the bevel, as in the photo.",
    },
    photo: { name: "o1-marking-knife-etch.png", hardenedShare: 0.42 },
  },
  {
    local: "wren.ostby",
    workedDaysAgo: 5,
    input: {
      title: "440C fillet blank with a dry-ice step",
      steel: "grade:440C", normalizingCycles: 0, austenitizeC: 1060, soakMinutes: 30, quenchMedium: "plates", coldTreatment: "dry-ice",
      temperCycles: 2, temperC: 160, temperHours: 2,
      hardness: readings([59.5, "edge"], [60, "middle"], [59, "tang"]),
      notes: "Wrapped in foil for the soak, plate quench, dry ice within the hour. Slightly lower than I hoped; comparing with the Ms estimate.",
    },
    photo: { name: "440c-blank-etch.png", hardenedShare: 0.7 },
  },
  {
    local: "ines.forthwell",
    workedDaysAgo: 8,
    input: {
      title: "5160 chopper, first heat treatment",
      steel: "grade:5160", normalizingCycles: 1, austenitizeC: 845, soakMinutes: 10, quenchMedium: "medium-oil", coldTreatment: "none",
      temperCycles: 1, temperC: 230, temperHours: 1,
      hardness: readings([56, "edge"], [52.5, "middle"], [58, "tip"]),
      notes: "Readings jump around. Some scale on the flats before testing.",
    },
    review: { daysAgo: 6, status: "needs-rework", comment: "The readings differ by 5 HRC: grind the scale and any decarburised skin off a flat spot and test again. Please add how long the blade sat in the oil." },
  },
  {
    local: "tobin.ashgrove",
    workedDaysAgo: 2,
    input: {
      title: "1080 hunting blade, second try",
      steel: "grade:1080", normalizingCycles: 3, austenitizeC: 815, soakMinutes: 5, quenchMedium: "fast-oil", coldTreatment: "none",
      temperCycles: 2, temperC: 205, temperHours: 1,
      hardness: readings([60, "edge"], [59.5, "middle"], [60.5, "near the tip"]),
      notes: "Straightened between the two tempers while still warm. No warp left.",
    },
  },
  {
    local: "dario.penhallow",
    workedDaysAgo: 6,
    input: {
      title: "1095 coupon tempered hotter",
      steel: "grade:1095", normalizingCycles: 2, austenitizeC: 800, soakMinutes: 5, quenchMedium: "fast-oil", coldTreatment: "none",
      temperCycles: 2, temperC: 230, temperHours: 1,
      hardness: readings([59, "edge"], [59.5, "middle"]),
      notes: "Same steel as Mara's coupon, tempered 30 °C hotter to compare.",
    },
    review: { daysAgo: 4, status: "reviewed", comment: "Good comparison: the chart beside your entry shows the drop in hardness with the higher tempering parameter." },
  },
  {
    local: "yusra.delacombe",
    workedDaysAgo: 9,
    input: {
      title: "D2 skinner, freezer after the quench",
      steel: "grade:D2", normalizingCycles: 0, austenitizeC: 1010, soakMinutes: 30, quenchMedium: "plates", coldTreatment: "freezer",
      temperCycles: 2, temperC: 205, temperHours: 2,
      hardness: readings([60, "edge"], [60.5, "middle"], [59.5, "spine"]),
      notes: "Freezer overnight before the first temper. Grinding the bevel afterwards was slow.",
    },
    review: { daysAgo: 7, status: "reviewed", comment: "Well documented. Compare the retained austenite estimate for the freezer with the dry-ice value." },
  },
  {
    local: "priya.tallisker",
    workedDaysAgo: 1,
    input: {
      title: "1080 coupon for the weekend class",
      steel: "grade:1080", normalizingCycles: 2, austenitizeC: 815, soakMinutes: 5, quenchMedium: "fast-oil", coldTreatment: "none",
      temperCycles: 2, temperC: 200, temperHours: 1,
      hardness: readings([61, "edge"], [60.5, "middle"]),
      notes: "",
    },
  },
];

export async function seedNotebook(s: SeedContext): Promise<{ entries: number; files: number }> {
  const { NotebookEntry, NotebookFile, NotebookComment } = s.db.models;
  const settings = uploadSettings(s.ctx.config);
  const store = new UploadStore(settings.dir);
  const reviewer = { id: s.userId(DEMO_INSTRUCTORS[0].email), email: DEMO_INSTRUCTORS[0].email, displayName: DEMO_INSTRUCTORS[0].displayName, role: DEMO_INSTRUCTORS[0].role };
  const reviewerId = reviewer.id;
  let files = 0;

  for (const plan of ENTRY_PLANS) {
    const userId = s.userId(`${plan.local}@grain-edge.test`);
    // Written up on the forge day itself.
    const writtenAt = s.when(plan.workedDaysAgo);
    const input = notebookEntryInputSchema.parse({ ...plan.input, workedOn: isoDay(writtenAt) });
    const steel = await resolveSteel(s.db, userId, input.steel);
    const entry = await NotebookEntry.create({ userId, ...entryAttributes(input, steel) }, { transaction: s.transaction });

    if (plan.photo) {
      const png = await etchedBarPng({ seed: seedOf(plan.photo.name), hardenedShare: plan.photo.hardenedShare });
      const detected = await detectUpload(png);
      if (detected.kind !== "image") throw new Error("demo photo was not recognised as an image");
      const image = await processImage(png, detected.format, settings);
      await store.ensureDir();
      const main = await store.write(image.main.data, image.main.ext);
      s.writtenFiles.push(main);
      const thumb = await store.write(image.thumb.data, "webp", { thumb: true, base: main.slice(0, 32) });
      s.writtenFiles.push(thumb);
      await NotebookFile.create(
        {
          entryId: entry.id, userId, kind: "image", mimeType: image.main.mimeType, storedName: main, thumbName: thumb,
          originalName: displayName(plan.photo.name, image.main.ext), sizeBytes: image.main.data.length, thumbBytes: image.thumb.data.length,
          width: image.main.width, height: image.main.height, createdAt: writtenAt, updatedAt: writtenAt,
        },
        { transaction: s.transaction, silent: true },
      );
      files += 1;
    }

    let touchedAt = writtenAt;
    if (plan.review) {
      // The route's rule: only an instructor teaching one of the student's cohorts may review.
      if (!(await canReviewEntry(s.db, reviewer, entry))) throw new Error(`demo reviewer does not teach ${plan.local}`);
      const { status, comment } = reviewRequestSchema.parse({ status: plan.review.status, comment: plan.review.comment });
      const reviewedAt = s.when(plan.review.daysAgo);
      await NotebookComment.create(
        { entryId: entry.id, authorId: reviewerId, body: comment, status, notification: "none", createdAt: reviewedAt, updatedAt: reviewedAt },
        { transaction: s.transaction, silent: true },
      );
      await entry.update({ reviewStatus: status, reviewedAt, reviewedById: reviewerId }, { transaction: s.transaction });
      touchedAt = reviewedAt;
    }
    // The review queue sorts by updatedAt: date the entry from the story, not from the seed run.
    await NotebookEntry.update({ createdAt: writtenAt, updatedAt: touchedAt }, { where: { id: entry.id }, transaction: s.transaction, silent: true });
  }
  return { entries: ENTRY_PLANS.length, files };
}
