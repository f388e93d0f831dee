/**
 * Stable heading ids for lessons: `## The film heals itself {#film-heals}`.
 * MDX reads `{…}` as a JavaScript expression, so the id cannot reach the parser as
 * written. `escapeHeadingIds` turns it into literal text (`\{#film-heals}`) before
 * MDX parses the file, and `remarkHeadingIds` then moves it onto the heading as its id.
 * Headings without an explicit id get one from their text.
 * Runs at build time (vite.config.ts) and in the content check; no DOM, no Node APIs.
 */

const HEADING_WITH_ID = /^(\s{0,3}#{1,6}\s.*?)\s*\{#([A-Za-z][\w-]*)\}\s*$/;
const FENCE = /^\s{0,3}(`{3,}|~{3,})/;

export function escapeHeadingIds(source: string): string {
  let fence: string | null = null;
  return source
    .split("\n")
    .map((line) => {
      const fenceMatch = FENCE.exec(line);
      if (fenceMatch) {
        const marker = fenceMatch[1][0];
        if (fence === null) fence = marker;
        else if (fence === marker) fence = null;
        return line;
      }
      if (fence !== null) return line;
      const match = HEADING_WITH_ID.exec(line);
      return match ? `${match[1]} \\{#${match[2]}}` : line;
    })
    .join("\n");
}

interface MdNode {
  type: string;
  value?: string;
  depth?: number;
  children?: MdNode[];
  data?: { hProperties?: Record<string, unknown>; [key: string]: unknown };
}

export function nodeText(node: MdNode): string {
  if (typeof node.value === "string") return node.value;
  return (node.children ?? []).map(nodeText).join("");
}

export function slugify(text: string): string {
  return (
    text
      .toLowerCase()
      .normalize("NFKD")
      .replace(/[\u0300-\u036f]/g, "")
      .replace(/[^a-z0-9]+/g, "-")
      .replace(/^-+|-+$/g, "") || "section"
  );
}

const TRAILING_ID = /\s*\{#([A-Za-z][\w-]*)\}\s*$/;

/** Remove a trailing `{#id}` from a heading's text; returns the id if there was one. */
export function takeExplicitId(heading: MdNode): string | null {
  const children = heading.children ?? [];
  const last = children[children.length - 1];
  if (!last || last.type !== "text" || typeof last.value !== "string") return null;
  const match = TRAILING_ID.exec(last.value);
  if (!match) return null;
  last.value = last.value.slice(0, match.index);
  if (last.value === "") children.pop();
  return match[1];
}

function walk(node: MdNode, visit: (node: MdNode) => void): void {
  visit(node);
  for (const child of node.children ?? []) walk(child, visit);
}

export interface HeadingInfo {
  depth: number;
  id: string;
  /** Whether the author wrote `{#id}` (otherwise the id is a slug of the text). */
  explicit: boolean;
  text: string;
  node: MdNode;
}

/** Give every heading in a tree its id (explicit `{#id}` or a unique slug); returns them in order. */
export function assignHeadingIds(tree: MdNode): HeadingInfo[] {
  const used = new Set<string>();
  const headings: HeadingInfo[] = [];
  walk(tree, (node) => {
    if (node.type !== "heading") return;
    const explicit = takeExplicitId(node);
    let id = explicit ?? slugify(nodeText(node));
    if (!explicit) for (let n = 2; used.has(id); n += 1) id = `${id.replace(/-\d+$/, "")}-${n}`;
    used.add(id);
    node.data = { ...node.data, hProperties: { ...node.data?.hProperties, id } };
    headings.push({ depth: node.depth ?? 0, id, explicit: explicit !== null, text: nodeText(node).trim(), node });
  });
  return headings;
}

/** remark plugin: set `id` on every heading (explicit `{#id}` or a slug of its text). */
export function remarkHeadingIds() {
  return (tree: MdNode) => {
    assignHeadingIds(tree);
  };
}

/** Vite plugin that escapes heading ids in .mdx files before @mdx-js/rollup parses them. */
export function mdxHeadingIdsPlugin() {
  return {
    name: "grain-edge-mdx-heading-ids",
    enforce: "pre" as const,
    transform(code: string, id: string) {
      if (!id.split("?")[0].endsWith(".mdx")) return null;
      return { code: escapeHeadingIds(code), map: null };
    },
  };
}
