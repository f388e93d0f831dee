/** Parse a lesson exactly as the build does (same syntax extensions, same heading ids). */
import { createProcessor } from "@mdx-js/mdx";
import remarkFrontmatter from "remark-frontmatter";
import remarkGfm from "remark-gfm";
import remarkMath from "remark-math";
import { assignHeadingIds, escapeHeadingIds, type HeadingInfo } from "../../../src/components/mdx/pipeline/heading-ids";

export interface MdastNode {
  type: string;
  name?: string | null;
  value?: unknown;
  url?: string;
  depth?: number;
  attributes?: MdastNode[];
  children?: MdastNode[];
  data?: Record<string, unknown>;
  position?: { start: { line: number } };
}

export interface ParsedLesson {
  tree: MdastNode;
  headings: HeadingInfo[];
}

const processor = createProcessor({ remarkPlugins: [remarkFrontmatter, remarkGfm, remarkMath] });

/** Throws a VFileMessage-like error with a line number on MDX syntax errors. */
export function parseLesson(source: string): ParsedLesson {
  const tree = processor.parse(escapeHeadingIds(source)) as unknown as MdastNode;
  const headings = assignHeadingIds(tree as never);
  return { tree, headings };
}

export function walk(node: MdastNode, visit: (node: MdastNode, parent: MdastNode | null) => void, parent: MdastNode | null = null): void {
  visit(node, parent);
  for (const child of node.children ?? []) walk(child, visit, node);
}

export function lineOf(node: MdastNode): number | undefined {
  return node.position?.start.line;
}
