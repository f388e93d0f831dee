/**
 * The demo instructor's saved alloy, attached to the alloy-explorer task of the stainless lesson.
 * Written with the same schemas and steps as POST /api/alloys and POST /api/alloys/:id/attach
 * (server/routes/alloys.ts): zeros dropped, the lesson must exist in the course, one attachment
 * per alloy and lesson. The composition is invented: a 0.6 % C, 13.8 % Cr blade steel for
 * learners to set beside 440C and D2. It deliberately does NOT answer the lesson's task (how
 * much chromium D2's carbon needs), so the attachment gives nothing away.
 */
import { attachAlloyRequestSchema, createSavedAlloyRequestSchema, type AlloyComposition } from "../../../shared/api/alloys";
import { DEMO_INSTRUCTORS } from "./demo-people";
import type { SeedContext } from "./demo-context";

export const DEMO_ALLOY = {
  name: "Cinderfield fine-carbide stainless",
  composition: { C: 0.62, Cr: 13.8, Mo: 0.2, Mn: 0.6, Si: 0.4 },
  lessonSlug: "carbon-chromium-and-pitting",
  note: "A fine-carbide stainless blade steel with modest carbon, from our stock. Put it beside 440C and D2 before you start: how much of its chromium stays in the matrix, and why is that more than in D2?",
} as const;

export async function seedInstructorAlloy(s: SeedContext): Promise<boolean> {
  if (!s.catalog.lessons.has(DEMO_ALLOY.lessonSlug)) return false; // another course (test fixture)
  const { SavedAlloy, LessonAlloy } = s.db.models;
  const userId = s.userId(DEMO_INSTRUCTORS[0].email);
  const { name, composition } = createSavedAlloyRequestSchema.parse({ name: DEMO_ALLOY.name, composition: DEMO_ALLOY.composition });
  const stored = Object.fromEntries(Object.entries(composition).filter(([, v]) => typeof v === "number" && v > 0)) as AlloyComposition;
  const savedAt = s.when(16);
  const alloy = await SavedAlloy.create({ userId, name, composition: stored, createdAt: savedAt, updatedAt: savedAt }, { transaction: s.transaction, silent: true });

  const { lessonSlug, note } = attachAlloyRequestSchema.parse({ lessonSlug: DEMO_ALLOY.lessonSlug, note: DEMO_ALLOY.note });
  const attachedAt = s.when(15);
  const existing = await LessonAlloy.findOne({ where: { alloyId: alloy.id, lessonSlug }, transaction: s.transaction });
  if (existing) await existing.update({ note, attachedById: userId }, { transaction: s.transaction });
  else await LessonAlloy.create({ alloyId: alloy.id, lessonSlug, note, attachedById: userId, createdAt: attachedAt, updatedAt: attachedAt }, { transaction: s.transaction, silent: true });
  return true;
}
