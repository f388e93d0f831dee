/**
 * Turns a page's URL search string into raw input for a simulation's zod schema, so
 * `/lab/ingot?grade=1095&sizeMm=300` opens at grade "1095" and 300 mm.
 *
 * Why the schema decides: a URL value is always text, and guessing by its look turned the grade id
 * "1095" into the number 1095, which the schema then rejected. Here a key becomes a number only
 * when its field takes numbers, a boolean only when it takes booleans, and stays text otherwise
 * (strings, enums, grade ids). Values that do not read as the field's type are passed on as text,
 * so the schema reports them by name. Pure: no DOM.
 */
import type { z } from "zod";

type FieldKind = "number" | "boolean" | "string";

/** Zod 4 keeps each schema's definition on `_zod.def`; only the parts read here are typed. */
interface SchemaDef {
  type: string;
  innerType?: z.ZodType;
  in?: z.ZodType;
  options?: readonly z.ZodType[];
  values?: readonly unknown[];
}

const defOf = (schema: z.ZodType): SchemaDef => (schema as unknown as { _zod: { def: SchemaDef } })._zod.def;

/** What a URL value of this field should become; wrappers (optional, default, pipe...) are looked through. */
export function fieldKind(schema: z.ZodType): FieldKind {
  const def = defOf(schema);
  switch (def.type) {
    case "number":
    case "int":
      return "number";
    case "boolean":
      return "boolean";
    case "optional":
    case "default":
    case "prefault":
    case "nullable":
    case "readonly":
    case "catch":
    case "nonoptional":
      return def.innerType ? fieldKind(def.innerType) : "string";
    case "pipe":
      return def.in ? fieldKind(def.in) : "string";
    case "literal": {
      const values = def.values ?? [];
      if (values.length > 0 && values.every((v) => typeof v === "number")) return "number";
      if (values.length > 0 && values.every((v) => typeof v === "boolean")) return "boolean";
      return "string";
    }
    case "union": {
      // e.g. neighbours: 1 | 2. Only a union whose every option is numeric (or boolean) converts.
      const kinds = new Set((def.options ?? []).map(fieldKind));
      return kinds.size === 1 ? [...kinds][0] : "string";
    }
    default:
      return "string";
  }
}

const NUMBER_TEXT = /^-?\d+(\.\d+)?$/;

/**
 * The search string's values for the keys of `schema` (an object schema), each converted to the
 * type its field takes. Keys the schema does not name are ignored; empty values are left out so
 * the defaults apply.
 */
export function searchParamsToInput(search: string | URLSearchParams, schema: { shape: Record<string, z.ZodType> }): Record<string, unknown> {
  const params = typeof search === "string" ? new URLSearchParams(search) : search;
  const out: Record<string, unknown> = {};
  for (const [key, field] of Object.entries(schema.shape)) {
    const raw = params.get(key);
    if (raw === null || raw === "") continue;
    const kind = fieldKind(field);
    if (kind === "number" && NUMBER_TEXT.test(raw)) out[key] = Number(raw);
    else if (kind === "boolean" && (raw === "true" || raw === "false")) out[key] = raw === "true";
    else out[key] = raw;
  }
  return out;
}
