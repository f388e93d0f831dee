/**
 * THE component registry for lessons: every tag a lesson may use (see tags.ts for the
 * contract and content/AUTHORING.md for authors) plus the styled Markdown elements.
 * Lesson pages pass `mdxComponents` to the compiled MDX.
 */
import type { MDXComponents } from "mdx/types";
// KaTeX's stylesheet and fonts ship with the app (no CDN): $…$ and $$…$$ in lessons and <Formula>.
import "katex/dist/katex.min.css";
import "./lesson.css";
import { Caution, CommonPractice, Note } from "./callouts";
import { Check } from "./check";
import { Figure } from "./figure";
import { Formula } from "./formula";
import { H2, H3, LessonLink, LessonTable } from "./prose-elements";
import { Quiz } from "./quiz-block";
import { Simulation } from "./simulation";
import { Sources } from "./sources";
import type { MdxTagName } from "./tags";
import { Term } from "./term";

export const registeredTags = {
  Simulation,
  Note,
  Caution,
  CommonPractice,
  Figure,
  Formula,
  Term,
  Check,
  Quiz,
  Sources,
} satisfies Record<MdxTagName, unknown>;

export const mdxComponents: MDXComponents = {
  ...registeredTags,
  h2: H2,
  h3: H3,
  a: LessonLink,
  table: LessonTable,
};
