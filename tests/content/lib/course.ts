/** Loads a course directory (content/ or a fixture) and runs every check over it. */
import fs from "node:fs";
import path from "node:path";
import type { ZodType } from "zod";
import type { QuizDefinition } from "../../../shared/quiz/definition";
import { collectModules, collectQuizzes, type ManifestModule } from "../../../server/services/lessons/catalog";
import { loadSimSchemas } from "../../../server/quiz/sim-params";
import { SIMULATION_IDS } from "../../../src/lab/registry";
import { checkLesson, parseLessonFile, type LessonFile } from "./check-lesson";
import { checkQuiz } from "./check-quiz";
import type { ParsedLesson } from "./parse";
import type { CourseContext, Problem } from "./types";

export interface LoadedCourse {
  modules: ManifestModule[];
  lessons: LessonFile[];
  /** Quizzes from quizzes/<id>.ts files, with the file's base name. */
  quizFiles: { fileId: string; quizzes: QuizDefinition[] }[];
  /** Quizzes exported by quizzes/index.ts. */
  indexQuizzes: QuizDefinition[] | null;
  glossaryIds: Set<string> | null;
}

/** Ids of a glossary module's terms, whatever shape it exports (array of {id} or a record keyed by id). */
export function collectGlossaryIds(namespace: Record<string, unknown>): Set<string> {
  const ids = new Set<string>();
  for (const value of Object.values(namespace)) {
    if (Array.isArray(value)) {
      for (const entry of value) if (entry && typeof entry === "object" && typeof (entry as { id?: unknown }).id === "string") ids.add((entry as { id: string }).id);
    } else if (value && typeof value === "object") {
      for (const [key, entry] of Object.entries(value)) if (entry && typeof entry === "object") ids.add(typeof (entry as { id?: unknown }).id === "string" ? (entry as { id: string }).id : key);
    }
  }
  return ids;
}

export async function loadCourse(dir: string): Promise<LoadedCourse> {
  const modules = collectModules((await import(path.join(dir, "manifest.ts"))) as Record<string, unknown>);
  const lessons: LessonFile[] = [];
  for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
    if (!entry.isDirectory() || entry.name === "quizzes") continue;
    for (const file of fs.readdirSync(path.join(dir, entry.name))) {
      if (!file.endsWith(".mdx")) continue;
      lessons.push({ moduleSlug: entry.name, lessonSlug: file.replace(/\.mdx$/, ""), source: fs.readFileSync(path.join(dir, entry.name, file), "utf8") });
    }
  }
  const quizDir = path.join(dir, "quizzes");
  const quizFiles: LoadedCourse["quizFiles"] = [];
  let indexQuizzes: QuizDefinition[] | null = null;
  if (fs.existsSync(quizDir)) {
    for (const file of fs.readdirSync(quizDir).sort()) {
      if (!file.endsWith(".ts")) continue;
      const namespace = (await import(path.join(quizDir, file))) as Record<string, unknown>;
      if (file === "index.ts") indexQuizzes = collectQuizzes(namespace);
      else quizFiles.push({ fileId: file.replace(/\.ts$/, ""), quizzes: collectQuizzes(namespace) });
    }
  }
  const glossaryFile = path.join(dir, "glossary.ts");
  const glossaryIds = fs.existsSync(glossaryFile) ? collectGlossaryIds((await import(glossaryFile)) as Record<string, unknown>) : null;
  return { modules, lessons, quizFiles, indexQuizzes, glossaryIds };
}

export interface CheckOptions {
  simIds?: Set<string>;
  simSchemas?: Map<string, ZodType>;
}

export async function checkCourse(course: LoadedCourse, options: CheckOptions = {}): Promise<Problem[]> {
  const problems: Problem[] = [];
  const simIds = options.simIds ?? new Set<string>(SIMULATION_IDS);
  const simSchemas = options.simSchemas ?? (await loadSimSchemas(simIds));
  const quizzes = new Map<string, QuizDefinition>();
  for (const quiz of course.indexQuizzes ?? course.quizFiles.flatMap((f) => f.quizzes)) quizzes.set(quiz.id, quiz);

  if (course.glossaryIds === null) problems.push({ where: "glossary.ts", rule: "manifest", message: "There is no glossary.ts." });
  const context: CourseContext = {
    modules: course.modules,
    headingIds: new Map(),
    quizzes,
    glossaryIds: course.glossaryIds ?? new Set(),
    simIds,
    simSchemas,
  };

  // Manifest against files.
  const seenSlugs = new Set<string>();
  for (const module of course.modules) {
    for (const slug of module.lessons) {
      if (seenSlugs.has(slug)) problems.push({ where: "manifest.ts", rule: "manifest", message: `Lesson slug “${slug}” appears twice; lesson slugs must be unique across the course.` });
      seenSlugs.add(slug);
      if (!course.lessons.some((l) => l.moduleSlug === module.slug && l.lessonSlug === slug)) {
        problems.push({ where: "manifest.ts", rule: "manifest", message: `The manifest lists ${module.slug}/${slug}.mdx, which does not exist.` });
      }
    }
  }

  // First pass: parse every lesson and collect heading ids (links may point across lessons).
  const parsed: { file: LessonFile; lesson: ParsedLesson }[] = [];
  for (const file of course.lessons) {
    const lesson = parseLessonFile(file, problems);
    if (!lesson) continue;
    context.headingIds.set(file.lessonSlug, new Set(lesson.headings.map((h) => h.id)));
    parsed.push({ file, lesson });
  }
  for (const { file, lesson } of parsed) problems.push(...checkLesson(file, lesson, context));

  // Quizzes: one file per quiz, named by its id, all exported from the index.
  for (const { fileId, quizzes: defined } of course.quizFiles) {
    if (defined.length !== 1) problems.push({ where: `quizzes/${fileId}.ts`, rule: "quiz-definition", message: `A quiz file must define exactly one quiz (found ${defined.length}).` });
    for (const quiz of defined) {
      problems.push(...checkQuiz(quiz, context, fileId));
      if (course.indexQuizzes && !course.indexQuizzes.some((q) => q.id === quiz.id)) {
        problems.push({ where: `quizzes/${fileId}.ts`, rule: "quiz-definition", message: `Quiz “${quiz.id}” is not exported from quizzes/index.ts.` });
      }
    }
  }
  return problems;
}

export function formatProblems(problems: Problem[]): string {
  return problems.map((p) => `${p.where}${p.line ? `:${p.line}` : ""} [${p.rule}] ${p.message}`).join("\n");
}
