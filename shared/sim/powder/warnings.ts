/**
 * The powder model's warnings, once each. Every size class carries its own warnings, and most
 * repeat from class to class, often with only a number changed ("Cooling rate 1.32e+6 °C/s is
 * above…", "…8.60e+5 °C/s…"). Listing them per class buried the few distinct messages, and
 * cutting the list short hid some. Here warnings that differ only in their numbers become one
 * line, the changing numbers given as a range, with the size classes it applies to.
 */

export interface WarnedClass {
  lowerUm: number;
  upperUm: number;
  warnings: readonly string[];
}

export interface GroupedWarning {
  /** The message, with numbers that change between classes shown as "low–high". */
  message: string;
  /** Indices of the size classes it applies to, ascending (empty for a warning about the whole melt). */
  classIndices: number[];
  /** Where it applies, e.g. "all 14 size classes" or "size classes 4–26 µm and 90–400 µm" ("" for the melt). */
  where: string;
}

// A number as the models write it: 1095, 0.01, 8.60e+5, 1.32e+6 (a leading "−" stays outside the token).
const NUMBER = /\d+(?:\.\d+)?(?:e[+-]?\d+)?/gi;

/** Distinct warnings: first the melt's (`overall`), then the classes', in the order they first appear. */
export function groupPowderWarnings(overall: readonly string[], classes: readonly WarnedClass[], formatUm: (um: number) => string = String): GroupedWarning[] {
  const out: GroupedWarning[] = [...new Set(overall)].map((message) => ({ message, classIndices: [], where: "" }));
  const groups = new Map<string, { messages: string[]; classIndices: number[] }>();
  classes.forEach((cls, index) => {
    for (const message of new Set(cls.warnings)) {
      const key = message.replace(NUMBER, "#");
      const group = groups.get(key) ?? { messages: [], classIndices: [] };
      group.messages.push(message);
      if (group.classIndices.at(-1) !== index) group.classIndices.push(index);
      groups.set(key, group);
    }
  });
  for (const { messages, classIndices } of groups.values()) {
    const message = mergeNumbers(messages);
    if (out.some((w) => w.message === message)) continue; // already said about the whole melt
    out.push({ message, classIndices, where: describeClasses(classIndices, classes, formatUm) });
  }
  return out;
}

/** Messages of one shape; each number that differs between them becomes "smallest–largest" (as written). */
export function mergeNumbers(messages: readonly string[]): string {
  const first = messages[0] ?? "";
  const tokens = messages.map((m) => m.match(NUMBER) ?? []);
  let position = 0;
  return first.replace(NUMBER, (token) => {
    const values = tokens.map((t) => t[position]).filter((t): t is string => t !== undefined);
    position += 1;
    if (values.every((v) => v === token)) return token;
    const sorted = [...values].sort((a, b) => Number(a) - Number(b));
    return `${sorted[0]}–${sorted[sorted.length - 1]}`;
  });
}

/** Runs of neighbouring classes as diameter spans, or "all N size classes". */
export function describeClasses(indices: readonly number[], classes: readonly WarnedClass[], formatUm: (um: number) => string = String): string {
  if (indices.length === 0) return "";
  if (indices.length === classes.length) return classes.length === 1 ? "the one size class" : `all ${classes.length} size classes`;
  const runs: [number, number][] = [];
  for (const i of indices) {
    const last = runs.at(-1);
    if (last && i === last[1] + 1) last[1] = i;
    else runs.push([i, i]);
  }
  const spans = runs.map(([a, b]) => `${formatUm(classes[a].lowerUm)}–${formatUm(classes[b].upperUm)} µm`);
  const list = spans.length === 1 ? spans[0] : `${spans.slice(0, -1).join(", ")} and ${spans[spans.length - 1]}`;
  return `${indices.length === 1 ? "size class" : "size classes"} ${list} (${indices.length} of ${classes.length})`;
}
