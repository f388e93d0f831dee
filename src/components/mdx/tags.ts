/**
 * The lesson tag contract: every tag a lesson may use, with its attributes.
 * Pure data, shared by the component registry (components.tsx) and the content
 * check (tests/content), so the two cannot disagree about what is allowed.
 */

export interface TagSpec {
  required: readonly string[];
  optional: readonly string[];
  /** Whether the tag wraps content (`<Note>…</Note>`) or stands alone (`<Quiz />`). */
  children: "required" | "optional" | "none";
}

export const MDX_TAGS = {
  Simulation: { required: ["id"], optional: ["preset", "task", "title"], children: "none" },
  Note: { required: [], optional: ["title"], children: "required" },
  Caution: { required: [], optional: ["title"], children: "required" },
  CommonPractice: { required: [], optional: ["title"], children: "required" },
  Figure: { required: ["id"], optional: ["caption"], children: "none" },
  Formula: { required: ["tex"], optional: ["label"], children: "none" },
  Term: { required: ["id"], optional: [], children: "required" },
  Check: { required: ["id", "question", "options", "answer"], optional: ["explain"], children: "none" },
  Quiz: { required: [], optional: [], children: "none" },
  Sources: { required: [], optional: [], children: "required" },
} as const satisfies Record<string, TagSpec>;

export type MdxTagName = keyof typeof MDX_TAGS;

export const MDX_TAG_NAMES = Object.keys(MDX_TAGS) as MdxTagName[];

/** Built-in figures, each drawn from the science core. */
export const FIGURE_IDS = [
  "iron-carbon-diagram",
  "spanning-curve",
  "scheil-curve",
  "hardness-vs-carbon",
  "tempering-parameter",
  "cooling-rate-vs-diameter",
  "carbide-hardness",
] as const;
export type FigureId = (typeof FIGURE_IDS)[number];

export function isFigureId(value: string): value is FigureId {
  return (FIGURE_IDS as readonly string[]).includes(value);
}
