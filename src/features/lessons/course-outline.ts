import type { LessonOutline, ModuleOutline } from "@shared/api/lessons";

export interface LessonPosition {
  module: ModuleOutline;
  lesson: LessonOutline;
  /** 1-based index inside the module. */
  index: number;
  previous: LessonOutline | null;
  next: LessonOutline | null;
}

/** Where a lesson sits in the course, with the lessons before and after it (across modules). */
export function findLesson(modules: ModuleOutline[], moduleSlug: string, lessonSlug: string): LessonPosition | null {
  const flat = modules.flatMap((module) => module.lessons.map((lesson) => ({ module, lesson })));
  const at = flat.findIndex((entry) => entry.module.slug === moduleSlug && entry.lesson.slug === lessonSlug);
  if (at < 0) return null;
  const { module, lesson } = flat[at];
  return {
    module,
    lesson,
    index: module.lessons.indexOf(lesson) + 1,
    previous: flat[at - 1]?.lesson ?? null,
    next: flat[at + 1]?.lesson ?? null,
  };
}

export type LessonState = "not-started" | "in-progress" | "completed";

export function lessonState(lesson: LessonOutline): LessonState {
  if (lesson.progress.completedAt) return "completed";
  return lesson.progress.openedAt ? "in-progress" : "not-started";
}
