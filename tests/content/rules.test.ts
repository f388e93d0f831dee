/**
 * Proves each content rule catches its error: a valid fixture course passes, and each
 * broken fixture (tests/content/fixtures/broken*) is reported under the expected rule.
 */
import fs from "node:fs";
import path from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { collectQuizzes } from "../../server/services/lessons/catalog";
import { parseFrontmatter } from "../../server/services/lessons/frontmatter";
import { checkCourse, formatProblems, loadCourse, type LoadedCourse } from "./lib/course";
import type { Rule } from "./lib/types";

const FIXTURES = path.resolve(import.meta.dirname, "fixtures");
let base: LoadedCourse;

beforeAll(async () => {
  base = await loadCourse(path.join(FIXTURES, "course"));
});

/** The fixture course with lesson two replaced by a broken file. */
function withSecondLesson(source: string): LoadedCourse {
  return {
    ...base,
    lessons: base.lessons.map((lesson) => (lesson.lessonSlug === "second-lesson" ? { ...lesson, source } : lesson)),
  };
}

describe("content check rules", () => {
  it("passes the valid fixture course (every tag used once)", async () => {
    expect(base.lessons).toHaveLength(2);
    const problems = await checkCourse(base);
    expect(problems, formatProblems(problems)).toEqual([]);
  });

  const lessonCases: [file: string, rule: Rule, fragment: RegExp][] = [
    ["unknown-tag.mdx", "unknown-tag", /<Marquee>/],
    ["missing-frontmatter.mdx", "frontmatter", /summary/],
    ["broken-link.mdx", "broken-link", /no-such-lesson/],
    ["bad-preset.mdx", "bad-preset", /crMassPct/],
    ["unknown-simulation.mdx", "unknown-simulation", /warp-drive/],
    ["unknown-term.mdx", "unknown-term", /unobtainium/],
    ["unknown-figure.mdx", "unknown-figure", /phase-of-the-moon/],
    ["bad-check.mdx", "check", /index/],
    ["bad-formula.mdx", "formula", /KaTeX/],
    ["code.mdx", "no-code", /import or export/],
    ["heading-no-id.mdx", "heading-id", /stable id/],
    ["missing-caution.mdx", "safety-caution", /Caution/],
    ["no-quiz-block.mdx", "quiz-block", /<Quiz \/>/],
    ["tag-attributes.mdx", "tag-attributes", /needs the attribute “id”/],
    ["mdx-syntax.mdx", "mdx-syntax", /./],
  ];

  it.each(lessonCases)("%s is reported as %s", async (file, rule, fragment) => {
    const source = fs.readFileSync(path.join(FIXTURES, "broken", file), "utf8");
    const problems = await checkCourse(withSecondLesson(source));
    const matching = problems.filter((p) => p.rule === rule);
    expect(matching.length, formatProblems(problems)).toBeGreaterThan(0);
    expect(matching.some((p) => fragment.test(p.message)), formatProblems(matching)).toBe(true);
    // Only the broken lesson is blamed (links into it from lesson one may break with it).
    expect(problems.every((p) => p.where.includes("second-lesson") || p.message.includes("second-lesson")), formatProblems(problems)).toBe(true);
  });

  it("reports every broken link, in-page anchor and cross-lesson anchor", async () => {
    const source = fs.readFileSync(path.join(FIXTURES, "broken", "broken-link.mdx"), "utf8");
    const messages = (await checkCourse(withSecondLesson(source))).filter((p) => p.rule === "broken-link").map((p) => p.message);
    expect(messages.join("\n")).toMatch(/no-such-lesson/);
    expect(messages.join("\n")).toMatch(/#nowhere/);
    expect(messages.join("\n")).toMatch(/#missing-anchor/);
  });

  it("reports the unknown attribute and the missing frontmatter fields by name", async () => {
    const attrs = await checkCourse(withSecondLesson(fs.readFileSync(path.join(FIXTURES, "broken", "tag-attributes.mdx"), "utf8")));
    expect(attrs.some((p) => /colour/.test(p.message))).toBe(true);
    const fm = await checkCourse(withSecondLesson(fs.readFileSync(path.join(FIXTURES, "broken", "missing-frontmatter.mdx"), "utf8")));
    const fields = fm.filter((p) => p.rule === "frontmatter").map((p) => p.message).join("\n");
    for (const field of ["summary", "minutes", "objectives", "quiz"]) expect(fields).toContain(`“${field}”`);
  });

  const quizCases: [file: string, rule: Rule][] = [
    ["wrong-single-key.ts", "quiz-key"],
    ["nan-draw.ts", "quiz-key"],
    ["expression-drift.ts", "quiz-expression"],
    ["sim-example-fails.ts", "quiz-key"],
    ["sim-example-rejected.ts", "quiz-key"],
    ["bad-accepted-unit.ts", "quiz-definition"],
  ];

  it.each(quizCases)("quiz fixture %s is reported as %s", async (file, rule) => {
    const quizzes = collectQuizzes((await import(path.join(FIXTURES, "broken-quizzes", file))) as Record<string, unknown>);
    expect(quizzes).toHaveLength(1);
    const course: LoadedCourse = {
      ...base,
      quizFiles: [...base.quizFiles, { fileId: file.replace(/\.ts$/, ""), quizzes }],
      indexQuizzes: [...(base.indexQuizzes ?? []), ...quizzes],
    };
    const problems = await checkCourse(course);
    expect(problems.length, "the broken quiz passed").toBeGreaterThan(0);
    expect(problems.every((p) => p.rule === rule && p.where === `quiz ${quizzes[0].id}`), formatProblems(problems)).toBe(true);
  });

  it("flags a quiz file that is not exported from the index, and a file name that differs from the id", async () => {
    const quizzes = collectQuizzes((await import(path.join(FIXTURES, "course", "quizzes", "fixture-quiz-2.ts"))) as Record<string, unknown>);
    const problems = await checkCourse({ ...base, quizFiles: [...base.quizFiles, { fileId: "renamed", quizzes }] });
    expect(problems.map((p) => p.message).join("\n")).toMatch(/must match its file name/);
    const orphan = await checkCourse({ ...base, indexQuizzes: base.indexQuizzes!.filter((q) => q.id !== "fixture-quiz-2") });
    expect(orphan.map((p) => p.message).join("\n")).toMatch(/not exported from quizzes\/index.ts/);
  });

  it("the server's frontmatter reader handles quotes, comments, lists and folded text", () => {
    const fm = parseFrontmatter(
      [
        'title: "A title: with a colon # not a comment"',
        "summary: >-",
        "  Two lines",
        "  folded.",
        "module: why-stainless   # a comment",
        "order: 2",
        "minutes: 12.5",
        "objectives:",
        "  - First",
        "  - 'It''s second'",
        "quiz: q-1",
      ].join("\n"),
    );
    expect(fm).toEqual({
      title: "A title: with a colon # not a comment",
      summary: "Two lines folded.",
      module: "why-stainless",
      order: 2,
      minutes: 12.5,
      objectives: ["First", "It's second"],
      quiz: "q-1",
    });
  });
});
