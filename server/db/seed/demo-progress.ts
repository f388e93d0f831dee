/**
 * Demo lesson progress through the lesson service (updateLessonProgress, as PUT
 * /api/lessons/:slug/progress does): sections must exist, answers merge, and a lesson is
 * completed when every section has been reached. The rows are then dated from the story.
 */
import fs from "node:fs";
import path from "node:path";
import type { CheckAnswer } from "../../../shared/api/lessons";
import { contentDir } from "../../services/lessons/course";
import { updateLessonProgress } from "../../services/lessons/progress";
import { randomFor, type SeedContext } from "./demo-context";
import type { LessonPlan, StudentStory } from "./demo-history";

/** The answer index and option count of each `<Check>` in a lesson's MDX source. */
export function readCheckKeys(source: string): Map<string, { answer: number; options: number }> {
  const keys = new Map<string, { answer: number; options: number }>();
  const tags = source.split("<Check ").slice(1);
  for (const tag of tags) {
    const id = /^\s*id="([^"]+)"/.exec(tag)?.[1];
    const answer = /\banswer=\{(\d+)\}/.exec(tag)?.[1];
    const options = /\boptions=\{\[([\s\S]*?)\]\}/.exec(tag)?.[1];
    if (!id || answer === undefined || !options) continue;
    keys.set(id, { answer: Number(answer), options: (options.match(/"(?:[^"\\]|\\.)*"/g) ?? []).length });
  }
  return keys;
}

function checkKeysOf(s: SeedContext, lessonSlug: string) {
  const lesson = s.catalog.lessons.get(lessonSlug);
  if (!lesson) return new Map<string, { answer: number; options: number }>();
  try {
    return readCheckKeys(fs.readFileSync(path.join(contentDir(), lesson.moduleSlug, `${lessonSlug}.mdx`), "utf8"));
  } catch {
    return new Map<string, { answer: number; options: number }>();
  }
}

async function seedLesson(s: SeedContext, userId: number, story: StudentStory, plan: LessonPlan): Promise<void> {
  const lesson = s.catalog.lessons.get(plan.lesson);
  if (!lesson || lesson.sections.length === 0) return; // another course (test fixture): nothing to seed
  const random = randomFor(`${story.local}:${plan.lesson}`);
  const done = plan.completedDaysAgo !== undefined;
  const sectionCount = done ? lesson.sections.length : Math.max(1, Math.min(lesson.sections.length - 1, Math.round(lesson.sections.length * (plan.reached ?? 0.5))));
  const sections = lesson.sections.slice(0, sectionCount).map((sec) => sec.id);
  // Checks sit through the lesson: a reader who got through a share of it answered that share.
  const keys = checkKeysOf(s, plan.lesson);
  const checkCount = done ? lesson.checkIds.length : Math.floor(lesson.checkIds.length * (sectionCount / lesson.sections.length));
  const checks: Record<string, CheckAnswer> = {};
  for (const id of lesson.checkIds.slice(0, checkCount)) {
    const key = keys.get(id);
    if (!key || key.options < 2) continue;
    const right = random() < story.skill;
    const choice = right ? key.answer : (key.answer + 1 + Math.floor(random() * (key.options - 1))) % key.options;
    checks[id] = { choice, correct: choice === key.answer };
  }
  await updateLessonProgress(s.ctx, s.catalog, userId, plan.lesson, { sectionsReached: sections, lastSection: sections[sections.length - 1], checks });
  await s.db.models.LessonProgress.update(
    { openedAt: s.when(plan.openedDaysAgo), completedAt: done ? s.when(plan.completedDaysAgo!) : null },
    { where: { userId, lessonSlug: plan.lesson }, transaction: s.transaction },
  );
}

export async function seedLessonProgress(s: SeedContext, stories: StudentStory[]): Promise<void> {
  for (const story of stories) {
    const userId = s.userId(`${story.local}@grain-edge.test`);
    for (const plan of story.lessons) await seedLesson(s, userId, story, plan);
  }
}
