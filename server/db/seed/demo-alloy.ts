/**
 * The demo instructor's saved alloy, attached to the alloy-explorer task of the stainless lesson,
 * through the same schemas and services as POST /api/alloys and POST /api/alloys/:id/attach
 * (server/services/alloys.ts); only the dates are moved back to the story's days afterwards.
 * The composition is invented: a 0.6 % C, 13.8 % Cr blade steel for learners to set beside
 * 440C and D2. It deliberately does NOT answer the lesson's task (how much chromium D2's carbon
 * needs), so the attachment gives nothing away.
 */
import { attachAlloyRequestSchema, createSavedAlloyRequestSchema } from "../../../shared/api/alloys";
import { attachAlloy, saveAlloy } from "../../services/alloys";
import { DEMO_INSTRUCTORS } from "./demo-people";
import { backdate, historyActor, type SeedContext } from "./demo-context";

export const DEMO_ALLOY = {
  name: "Cinderfield fine-carbide stainless",
  composition: { C: 0.62, Cr: 13.8, Mo: 0.2, Mn: 0.6, Si: 0.4 },
  lessonSlug: "carbon-chromium-and-pitting",
  note: "A fine-carbide stainless blade steel with modest carbon, from our stock. Put it beside 440C and D2 before you start: how much of its chromium stays in the matrix, and why is that more than in D2?",
} as const;

export async function seedInstructorAlloy(s: SeedContext): Promise<boolean> {
  if (!s.catalog.lessons.has(DEMO_ALLOY.lessonSlug)) return false; // another course (test fixture)
  const instructor = historyActor(s, DEMO_INSTRUCTORS[0].email);
  const alloy = await saveAlloy(s.db, instructor, createSavedAlloyRequestSchema.parse({ name: DEMO_ALLOY.name, composition: DEMO_ALLOY.composition }));
  const { attachment } = await attachAlloy(
    s.db,
    s.catalog,
    instructor,
    alloy,
    attachAlloyRequestSchema.parse({ lessonSlug: DEMO_ALLOY.lessonSlug, note: DEMO_ALLOY.note }),
  );
  await backdate(s, s.db.models.SavedAlloy, alloy.id, s.when(16));
  await backdate(s, s.db.models.LessonAlloy, attachment.id, s.when(15));
  return true;
}
