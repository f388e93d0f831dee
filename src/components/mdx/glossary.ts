/**
 * The glossary behind <Term>: content/glossary.ts, read whatever its exact export shape
 * (an array of entries with `id`, or a record keyed by id). Loaded through a glob so a
 * course without a glossary still builds.
 */
export interface GlossaryEntry {
  id: string;
  term: string;
  definition: string;
}

const modules = import.meta.glob<Record<string, unknown>>("/content/glossary.ts", { eager: true });

function text(entry: Record<string, unknown>, keys: string[]): string | null {
  for (const key of keys) if (typeof entry[key] === "string" && entry[key]) return entry[key] as string;
  return null;
}

function toEntry(id: string, value: unknown): GlossaryEntry | null {
  if (!value || typeof value !== "object") return typeof value === "string" ? { id, term: id, definition: value } : null;
  const entry = value as Record<string, unknown>;
  const definition = text(entry, ["definition", "short", "text", "description", "body"]);
  if (!definition) return null;
  return { id: text(entry, ["id"]) ?? id, term: text(entry, ["term", "title", "name", "label"]) ?? id, definition };
}

function collect(): Map<string, GlossaryEntry> {
  const entries = new Map<string, GlossaryEntry>();
  for (const namespace of Object.values(modules)) {
    for (const value of Object.values(namespace)) {
      if (Array.isArray(value)) {
        for (const item of value) {
          const entry = item && typeof item === "object" && typeof (item as { id?: unknown }).id === "string" ? toEntry((item as { id: string }).id, item) : null;
          if (entry) entries.set(entry.id, entry);
        }
      } else if (value && typeof value === "object") {
        for (const [key, item] of Object.entries(value)) {
          const entry = toEntry(key, item);
          if (entry) entries.set(entry.id, entry);
        }
      }
    }
  }
  return entries;
}

let cache: Map<string, GlossaryEntry> | null = null;

export function glossaryEntry(id: string): GlossaryEntry | undefined {
  cache ??= collect();
  return cache.get(id);
}
