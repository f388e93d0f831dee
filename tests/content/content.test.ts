/**
 * The content check over the real course in content/: fails on unknown tags, missing
 * frontmatter, broken internal links, simulation presets the simulation rejects,
 * unknown glossary terms and quizzes whose answer key the grader marks wrong.
 * tests/content/rules.test.ts proves each rule catches its error on fixtures.
 */
import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { buildCatalog, loadCourseCatalog } from "../../server/services/lessons/catalog";
import { checkCourse, formatProblems, loadCourse } from "./lib/course";
import { parseLesson } from "./lib/parse";

const CONTENT_DIR = path.resolve(import.meta.dirname, "../../content");

describe("course content (content/)", () => {
  it("passes every content rule", async () => {
    const course = await loadCourse(CONTENT_DIR);
    expect(course.modules.length, "content/manifest.ts lists no modules").toBeGreaterThan(0);
    const problems = await checkCourse(course);
    expect(problems, `\n${formatProblems(problems)}\n`).toEqual([]);
  });

  it("is read by the server the same way: every lesson, its sections (by the ids the page renders) and its quiz", async () => {
    const catalog = await loadCourseCatalog(CONTENT_DIR);
    expect(catalog.problems).toEqual([]);
    for (const module of catalog.modules) {
      for (const lesson of module.lessons) {
        const source = fs.readFileSync(path.join(CONTENT_DIR, module.slug, `${lesson.slug}.mdx`), "utf8");
        const rendered = parseLesson(source).headings.filter((h) => h.depth === 2).map((h) => h.id);
        expect(lesson.sections.map((s) => s.id), `${lesson.slug} sections`).toEqual(rendered);
        expect(lesson.quizId, `${lesson.slug} quiz`).not.toBeNull();
      }
    }
    expect(buildCatalog).toBeTypeOf("function");
  });
});
