/**
 * The course as the server knows it: modules in manifest order, each lesson's
 * frontmatter, `##` sections and check ids (read from the MDX source), and the
 * quiz definitions (server-only). Built once at start-up.
 */
import fs from "node:fs";
import path from "node:path";
import type { LessonSection } from "../../../shared/api/lessons";
import type { QuizDefinition } from "../../../shared/quiz/definition";
import { loadSimSchemas, type SimSchemas } from "../../quiz/sim-params";
import { extractFrontmatter, parseFrontmatter, type FrontmatterValue } from "./frontmatter";

export interface ManifestModule {
  slug: string;
  title: string;
  summary: string;
  lessons: string[];
}

export interface LessonEntry {
  slug: string;
  moduleSlug: string;
  title: string;
  summary: string;
  order: number;
  minutes: number;
  objectives: string[];
  quizId: string | null;
  sections: LessonSection[];
  checkIds: string[];
}

export interface ModuleEntry {
  slug: string;
  title: string;
  summary: string;
  order: number;
  lessons: LessonEntry[];
}

export interface CourseCatalog {
  modules: ModuleEntry[];
  lessons: Map<string, LessonEntry>;
  quizzes: Map<string, QuizDefinition>;
  /** Parameter schemas of the simulations that sim-task questions embed. */
  simSchemas: SimSchemas;
  /** Lessons the manifest names but that could not be read; the content check fails on these. */
  problems: string[];
}

const FENCE = /^\s{0,3}(`{3,}|~{3,})/;

/** Plain text of a heading: drop `{#id}`, inline tags, emphasis and code marks. */
function headingText(raw: string): string {
  return raw
    .replace(/\s*\\?\{#[A-Za-z][\w-]*\}\s*$/, "")
    .replace(/<[^>]+>/g, "")
    .replace(/[*_`]/g, "")
    .replace(/\$([^$]*)\$/g, "$1")
    .trim();
}

/** `##` sections with explicit ids, outside code fences, in document order. */
export function readSections(source: string): LessonSection[] {
  const sections: LessonSection[] = [];
  let fence: string | null = null;
  for (const line of source.split(/\r?\n/)) {
    const fenceMatch = FENCE.exec(line);
    if (fenceMatch) {
      fence = fence === null ? fenceMatch[1][0] : fence === fenceMatch[1][0] ? null : fence;
      continue;
    }
    if (fence !== null) continue;
    const match = /^\s{0,3}##\s+(.*?)\s*\\?\{#([A-Za-z][\w-]*)\}\s*$/.exec(line);
    if (match) sections.push({ id: match[2], title: headingText(match[1]) });
  }
  return sections;
}

/** Ids of the `<Check id="…">` questions in a lesson. */
export function readCheckIds(source: string): string[] {
  return [...source.matchAll(/<Check\b[^>]*?\bid=["']([^"']+)["']/g)].map((m) => m[1]);
}

function asString(value: FrontmatterValue | undefined): string {
  return typeof value === "string" ? value : value === undefined || value === null ? "" : String(value);
}

export interface CatalogInput {
  modules: readonly ManifestModule[];
  /** The MDX source of a lesson, or null when the file is missing. */
  readLesson: (moduleSlug: string, lessonSlug: string) => string | null;
  quizzes: readonly QuizDefinition[];
  simSchemas?: SimSchemas;
}

export function buildCatalog(input: CatalogInput): CourseCatalog {
  const quizzes = new Map(input.quizzes.map((quiz) => [quiz.id, quiz]));
  const lessons = new Map<string, LessonEntry>();
  const problems: string[] = [];
  const modules: ModuleEntry[] = input.modules.map((module, moduleIndex) => {
    const entries: LessonEntry[] = [];
    module.lessons.forEach((lessonSlug, lessonIndex) => {
      const source = input.readLesson(module.slug, lessonSlug);
      if (source === null) {
        problems.push(`Lesson ${module.slug}/${lessonSlug} is in the manifest but its file is missing.`);
        return;
      }
      const raw = extractFrontmatter(source);
      const fm = raw === null ? {} : parseFrontmatter(raw);
      const declaredQuiz = asString(fm.quiz);
      const quizId = quizzes.has(declaredQuiz)
        ? declaredQuiz
        : ([...quizzes.values()].find((quiz) => quiz.lessonSlug === lessonSlug)?.id ?? null);
      const entry: LessonEntry = {
        slug: lessonSlug,
        moduleSlug: module.slug,
        title: asString(fm.title) || lessonSlug,
        summary: asString(fm.summary),
        order: typeof fm.order === "number" ? fm.order : lessonIndex + 1,
        minutes: typeof fm.minutes === "number" ? fm.minutes : 0,
        objectives: Array.isArray(fm.objectives) ? fm.objectives.map((o) => asString(o)) : [],
        quizId,
        sections: readSections(source),
        checkIds: readCheckIds(source),
      };
      if (lessons.has(lessonSlug)) problems.push(`Lesson slug ${lessonSlug} is used twice; lesson slugs must be unique.`);
      lessons.set(lessonSlug, entry);
      entries.push(entry);
    });
    return { slug: module.slug, title: module.title, summary: module.summary, order: moduleIndex + 1, lessons: entries };
  });
  return { modules, lessons, quizzes, simSchemas: input.simSchemas ?? new Map(), problems };
}

function isQuizDefinition(value: unknown): value is QuizDefinition {
  if (!value || typeof value !== "object") return false;
  const v = value as Partial<QuizDefinition>;
  return typeof v.id === "string" && typeof v.lessonSlug === "string" && Array.isArray(v.questions);
}

/** Every quiz definition exported by a module, whether as an array, a record or single exports. */
export function collectQuizzes(namespace: Record<string, unknown>): QuizDefinition[] {
  const found = new Map<string, QuizDefinition>();
  const visit = (value: unknown, depth: number) => {
    if (isQuizDefinition(value)) found.set(value.id, value);
    else if (depth < 2 && Array.isArray(value)) value.forEach((v) => visit(v, depth + 1));
    else if (depth < 2 && value && typeof value === "object") Object.values(value).forEach((v) => visit(v, depth + 1));
  };
  Object.values(namespace).forEach((value) => visit(value, 0));
  return [...found.values()];
}

export function collectModules(namespace: Record<string, unknown>): ManifestModule[] {
  const candidate = Object.values(namespace).find(
    (value): value is ManifestModule[] =>
      Array.isArray(value) && value.every((m) => m && typeof m.slug === "string" && Array.isArray(m.lessons)),
  );
  return candidate ?? [];
}

/** Read a course from a content directory: manifest.ts, <module>/<lesson>.mdx, quizzes/index.ts. */
export async function loadCourseCatalog(contentDir: string): Promise<CourseCatalog> {
  const manifest = (await import(path.join(contentDir, "manifest.ts"))) as Record<string, unknown>;
  const quizIndex = path.join(contentDir, "quizzes", "index.ts");
  const quizzes = fs.existsSync(quizIndex) ? collectQuizzes((await import(quizIndex)) as Record<string, unknown>) : [];
  const simIds = quizzes.flatMap((quiz) => quiz.questions.flatMap((q) => (q.kind === "sim-task" ? [q.simulation] : [])));
  return buildCatalog({
    simSchemas: await loadSimSchemas(simIds),
    modules: collectModules(manifest),
    readLesson: (moduleSlug, lessonSlug) => {
      const file = path.join(contentDir, moduleSlug, `${lessonSlug}.mdx`);
      return fs.existsSync(file) ? fs.readFileSync(file, "utf8") : null;
    },
    quizzes,
  });
}
