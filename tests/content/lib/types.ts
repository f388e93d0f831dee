import type { ZodType } from "zod";
import type { QuizDefinition } from "../../../shared/quiz/definition";
import type { ManifestModule } from "../../../server/services/lessons/catalog";

export type Rule =
  | "mdx-syntax"
  | "frontmatter"
  | "frontmatter-parser"
  | "no-code"
  | "unknown-tag"
  | "tag-attributes"
  | "heading-id"
  | "broken-link"
  | "unknown-figure"
  | "unknown-simulation"
  | "bad-preset"
  | "unknown-term"
  | "check"
  | "formula"
  | "quiz-block"
  | "lesson-structure"
  | "safety-caution"
  | "manifest"
  | "quiz-definition"
  | "quiz-key"
  | "quiz-expression";

export interface Problem {
  /** Lesson file (module/lesson.mdx) or quiz id. */
  where: string;
  rule: Rule;
  message: string;
  line?: number;
}

export interface CourseContext {
  modules: readonly ManifestModule[];
  /** Heading ids of every lesson, by lesson slug (for `/learn/…#anchor` links). */
  headingIds: Map<string, Set<string>>;
  quizzes: Map<string, QuizDefinition>;
  glossaryIds: Set<string>;
  simIds: Set<string>;
  simSchemas: Map<string, ZodType>;
}
