/**
 * Checks one lesson file against the authoring contract (content/AUTHORING.md):
 * frontmatter, tags and their attributes, links, simulation presets, glossary terms,
 * check questions, TeX, the quiz block and the safety cautions.
 */
import katex from "katex";
import YAML from "yaml";
import { z } from "zod";
import { FIGURE_IDS, MDX_TAGS, type TagSpec } from "../../../src/components/mdx/tags";
import { extractFrontmatter, parseFrontmatter } from "../../../server/services/lessons/frontmatter";
import { NotStaticError, staticValue } from "./estree-value";
import { lineOf, parseLesson, walk, type MdastNode, type ParsedLesson } from "./parse";
import type { CourseContext, Problem, Rule } from "./types";

export interface LessonFile {
  moduleSlug: string;
  lessonSlug: string;
  source: string;
}

export const frontmatterSchema = z.object({
  title: z.string().min(1),
  summary: z.string().min(1),
  module: z.string().min(1),
  order: z.number().int().min(1),
  minutes: z.number().positive().max(240),
  objectives: z.array(z.string().min(1)).min(1),
  quiz: z.string().min(1),
});

/** Words that mean the lesson touches a hazard, so it must carry a <Caution>. */
const HAZARD_WORDS =
  /\b(forg(?:e|es|ed|ing)|quench(?:ed|es|ing|ant)?|grind(?:s|ing|er)?|grinding dust|etch(?:ed|es|ing|ant|ants)?|acids?|hot metal|molten|melt shop)\b/i;

const INTERNAL_PATHS = new Set(["/", "/learn", "/learn/modules", "/lab"]);

interface TagUse {
  name: string;
  node: MdastNode;
  attributes: Record<string, unknown>;
}

/** Parse-time and text-only checks that do not need the rest of the course; returns the parse for the second pass. */
export function parseLessonFile(file: LessonFile, problems: Problem[]): ParsedLesson | null {
  const where = `${file.moduleSlug}/${file.lessonSlug}.mdx`;
  try {
    return parseLesson(file.source);
  } catch (error) {
    const e = error as { message?: string; line?: number; place?: { line?: number } };
    problems.push({ where, rule: "mdx-syntax", message: e.message ?? String(error), line: e.line ?? e.place?.line });
    return null;
  }
}

export function checkLesson(file: LessonFile, parsed: ParsedLesson, context: CourseContext): Problem[] {
  const where = `${file.moduleSlug}/${file.lessonSlug}.mdx`;
  const problems: Problem[] = [];
  const add = (rule: Rule, message: string, node?: MdastNode) => problems.push({ where, rule, message, line: node ? lineOf(node) : undefined });

  // ---------- frontmatter ----------
  const rawFrontmatter = extractFrontmatter(file.source);
  let frontmatter: z.infer<typeof frontmatterSchema> | null = null;
  if (rawFrontmatter === null) {
    add("frontmatter", "The lesson has no frontmatter (--- … --- at the top).");
  } else {
    let data: unknown;
    try {
      data = YAML.parse(rawFrontmatter);
    } catch (error) {
      add("frontmatter", `The frontmatter is not valid YAML: ${(error as Error).message}`);
    }
    const result = frontmatterSchema.safeParse(data ?? {});
    if (result.success) frontmatter = result.data;
    else {
      for (const issue of result.error.issues) {
        add("frontmatter", `Frontmatter field “${issue.path.join(".") || "(root)"}”: ${issue.message}`);
      }
    }
    // The server reads frontmatter with its own small parser; it must read the same thing.
    try {
      const serverView = parseFrontmatter(rawFrontmatter);
      if (data && JSON.stringify(normalise(serverView)) !== JSON.stringify(normalise(data))) {
        add("frontmatter-parser", "The server's frontmatter reader reads this frontmatter differently from YAML; simplify it (plain scalars, quoted strings, `- item` lists).");
      }
    } catch (error) {
      add("frontmatter-parser", `The server cannot read this frontmatter: ${(error as Error).message}`);
    }
  }
  if (frontmatter) {
    if (frontmatter.module !== file.moduleSlug) add("frontmatter", `Frontmatter module “${frontmatter.module}” does not match the folder “${file.moduleSlug}”.`);
    const module = context.modules.find((m) => m.slug === file.moduleSlug);
    const index = module?.lessons.indexOf(file.lessonSlug) ?? -1;
    if (!module || index < 0) add("manifest", `The manifest does not list ${where}.`);
    else if (frontmatter.order !== index + 1) add("frontmatter", `Frontmatter order ${frontmatter.order} does not match position ${index + 1} in the manifest.`);
  }

  // ---------- headings ----------
  const seen = new Set<string>();
  for (const heading of parsed.headings) {
    if (heading.depth === 2 && !heading.explicit) add("heading-id", `Section “${heading.text}” has no stable id; write it as \`## ${heading.text} {#some-id}\`.`, heading.node as MdastNode);
    if (seen.has(heading.id)) add("heading-id", `Heading id “${heading.id}” is used twice.`, heading.node as MdastNode);
    seen.add(heading.id);
  }

  // ---------- tags, code, links, math ----------
  const tags: TagUse[] = [];
  let text = "";
  walk(parsed.tree, (node) => {
    switch (node.type) {
      case "mdxjsEsm":
        add("no-code", "Lessons may not import or export anything; use the registered tags.", node);
        break;
      case "mdxFlowExpression":
      case "mdxTextExpression":
        if (!/^\s*\/\*[\s\S]*\*\/\s*$/.test(String(node.value ?? ""))) add("no-code", `JavaScript expressions are not allowed in lessons: {${String(node.value)}}`, node);
        break;
      case "mdxJsxFlowElement":
      case "mdxJsxTextElement": {
        const use = readTag(node, add);
        if (use) tags.push(use);
        break;
      }
      case "link":
      case "definition":
        checkLink(node.url ?? "", file.lessonSlug, context, (message) => add("broken-link", message, node));
        break;
      case "math":
      case "inlineMath":
        checkTex(String(node.value ?? ""), node.type === "math", (message) => add("formula", message, node));
        break;
      case "text":
        text += ` ${String(node.value ?? "")}`;
        break;
    }
  });

  const checkIds = new Set<string>();
  for (const { name, node, attributes } of tags) {
    switch (name) {
      case "Simulation": {
        const id = attributes.id;
        if (typeof id !== "string" || !context.simIds.has(id)) {
          add("unknown-simulation", `Unknown simulation “${String(id)}” (known: ${[...context.simIds].join(", ")}).`, node);
          break;
        }
        if (attributes.task !== undefined && typeof attributes.task !== "string") add("tag-attributes", "Simulation task must be text.", node);
        const schema = context.simSchemas.get(id);
        if (!schema) add("bad-preset", `Simulation “${id}” has no paramsSchema (shared/sim/${id}/params.ts), so its preset cannot be checked.`, node);
        else {
          const result = schema.safeParse(attributes.preset ?? {});
          if (!result.success) {
            const issue = result.error.issues[0];
            add("bad-preset", `The “${id}” simulation rejects this preset: ${issue.path.join(".") || "preset"}: ${issue.message}`, node);
          }
        }
        break;
      }
      case "Figure":
        if (!FIGURE_IDS.includes(attributes.id as never)) add("unknown-figure", `Unknown figure “${String(attributes.id)}” (known: ${FIGURE_IDS.join(", ")}).`, node);
        break;
      case "Formula":
        if (typeof attributes.tex !== "string") add("tag-attributes", "Formula tex must be text.", node);
        else checkTex(attributes.tex, true, (message) => add("formula", message, node));
        break;
      case "Term":
        if (typeof attributes.id !== "string" || !context.glossaryIds.has(attributes.id)) add("unknown-term", `Glossary term “${String(attributes.id)}” is not in content/glossary.ts.`, node);
        break;
      case "Check": {
        const { id, question, options, answer, explain } = attributes;
        if (typeof id !== "string" || !/^[A-Za-z][\w-]*$/.test(id)) add("check", "Check id must be a simple identifier.", node);
        else if (checkIds.has(id)) add("check", `Check id “${id}” is used twice.`, node);
        else checkIds.add(id);
        if (typeof question !== "string" || !question.trim()) add("check", "Check question must be text.", node);
        if (!Array.isArray(options) || options.length < 2 || !options.every((o) => typeof o === "string" && o.trim())) add("check", "Check options must be a list of at least two texts.", node);
        else if (typeof answer !== "number" || !Number.isInteger(answer) || answer < 0 || answer >= options.length) add("check", `Check answer must be the index (0–${options.length - 1}) of the right option.`, node);
        if (explain !== undefined && typeof explain !== "string") add("check", "Check explain must be text.", node);
        break;
      }
    }
  }

  // ---------- quiz block and structure ----------
  const quizBlocks = tags.filter((t) => t.name === "Quiz");
  if (frontmatter) {
    const quiz = context.quizzes.get(frontmatter.quiz);
    if (!quiz) add("quiz-block", `Frontmatter quiz “${frontmatter.quiz}” has no content/quizzes/${frontmatter.quiz}.ts.`);
    else if (quiz.lessonSlug !== file.lessonSlug) add("quiz-block", `Quiz “${quiz.id}” says it ends lesson “${quiz.lessonSlug}”, not “${file.lessonSlug}”.`);
    if (quizBlocks.length !== 1) add("quiz-block", `The lesson must contain exactly one <Quiz /> (found ${quizBlocks.length}).`);
  }
  if (!tags.some((t) => t.name === "Sources")) add("lesson-structure", "The lesson has no <Sources> list.");
  if (!tags.some((t) => t.name === "Simulation" && typeof t.attributes.task === "string" && t.attributes.task.trim())) {
    add("lesson-structure", "The lesson embeds no <Simulation> with a guided task.");
  }
  const hazard = HAZARD_WORDS.exec(text);
  if (hazard && !tags.some((t) => t.name === "Caution")) {
    add("safety-caution", `The lesson mentions “${hazard[0]}” but has no <Caution> deferring to local codes, data sheets and licensed practice.`);
  }
  return problems;
}

function normalise(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(normalise);
  if (value && typeof value === "object") {
    return Object.fromEntries(Object.entries(value).sort(([a], [b]) => a.localeCompare(b)).map(([k, v]) => [k, normalise(v)]));
  }
  return typeof value === "string" ? value.trimEnd() : value;
}

function readTag(node: MdastNode, add: (rule: Rule, message: string, node?: MdastNode) => void): TagUse | null {
  const name = node.name ?? "";
  if (!name) {
    add("unknown-tag", "Fragments (<>…</>) are not registered tags.", node);
    return null;
  }
  if (!Object.hasOwn(MDX_TAGS, name)) {
    add("unknown-tag", `Unknown tag <${name}> (registered: ${Object.keys(MDX_TAGS).join(", ")}).`, node);
    return null;
  }
  const spec: TagSpec = MDX_TAGS[name as keyof typeof MDX_TAGS];
  const attributes: Record<string, unknown> = {};
  for (const attribute of node.attributes ?? []) {
    if (attribute.type !== "mdxJsxAttribute") {
      add("no-code", `<${name}> uses a spread attribute; write each attribute out.`, node);
      continue;
    }
    const attrName = String(attribute.name);
    if (!spec.required.includes(attrName as never) && !spec.optional.includes(attrName as never)) {
      add("tag-attributes", `<${name}> has no attribute “${attrName}” (allowed: ${[...spec.required, ...spec.optional].join(", ") || "none"}).`, node);
    }
    const value = attribute.value as null | string | { type: string; value: string; data?: { estree?: unknown } };
    if (value === null || value === undefined) attributes[attrName] = true;
    else if (typeof value === "string") attributes[attrName] = value;
    else {
      try {
        attributes[attrName] = staticValue(value.data?.estree as never);
      } catch (error) {
        const message = error instanceof NotStaticError ? error.message : String(error);
        add("no-code", `<${name} ${attrName}={…}> must be a plain value (${message}).`, node);
      }
    }
  }
  for (const required of spec.required) {
    if (!(required in attributes)) add("tag-attributes", `<${name}> needs the attribute “${required}”.`, node);
  }
  const hasChildren = (node.children ?? []).length > 0;
  if (spec.children === "required" && !hasChildren) add("tag-attributes", `<${name}> must wrap some content.`, node);
  if (spec.children === "none" && hasChildren) add("tag-attributes", `<${name} /> takes no content; close it with />.`, node);
  return { name, node, attributes };
}

function checkTex(tex: string, displayMode: boolean, report: (message: string) => void): void {
  try {
    katex.renderToString(tex, { displayMode, throwOnError: true, strict: "error" });
  } catch (error) {
    report(`KaTeX cannot render “${tex}”: ${(error as Error).message}`);
  }
}

export function checkLink(url: string, lessonSlug: string, context: CourseContext, report: (message: string) => void): void {
  if (/^(https?:|mailto:)/i.test(url)) return;
  const [pathPart, anchor] = url.split("#", 2) as [string, string | undefined];
  if (pathPart === "") {
    if (!anchor || !context.headingIds.get(lessonSlug)?.has(anchor)) report(`Link “${url}” points to no heading in this lesson.`);
    return;
  }
  if (!pathPart.startsWith("/")) {
    report(`Link “${url}” is relative; use /learn/<module>/<lesson> or #section.`);
    return;
  }
  const clean = pathPart.replace(/\/$/, "") || "/";
  if (INTERNAL_PATHS.has(clean) && !anchor) return;
  const lab = /^\/lab\/([^/]+)$/.exec(clean);
  if (lab) {
    if (!context.simIds.has(lab[1])) report(`Link “${url}” names an unknown simulation.`);
    return;
  }
  const learn = /^\/learn\/([^/]+)\/([^/]+)$/.exec(clean);
  if (!learn) {
    report(`Link “${url}” is not a page of the app.`);
    return;
  }
  const [, moduleSlug, targetLesson] = learn;
  const module = context.modules.find((m) => m.slug === moduleSlug);
  if (!module || !module.lessons.includes(targetLesson)) {
    report(`Link “${url}” points to a lesson that is not in the manifest.`);
    return;
  }
  const ids = context.headingIds.get(targetLesson);
  if (!ids) {
    report(`Link “${url}” points to a lesson whose file is missing or could not be parsed.`);
    return;
  }
  if (anchor && !ids.has(anchor)) report(`Link “${url}”: lesson ${targetLesson} has no heading #${anchor}.`);
}
