/**
 * Parameter schemas of the simulations a sim-task question can embed, keyed by
 * simulation id (the ids of src/lab/registry.ts). Submitted simulation states are
 * parsed with these before a question's `check` sees them. Loaded from
 * shared/sim/<id>/params.ts (server code may not import src/).
 */
import type { ZodType } from "zod";

export type SimSchemas = ReadonlyMap<string, ZodType>;

function isZodType(value: unknown): value is ZodType {
  return !!value && typeof value === "object" && typeof (value as ZodType).safeParse === "function";
}

/** `paramsSchema`, or failing that the one export named like `…ParamsSchema`. */
export function pickParamsSchema(namespace: Record<string, unknown>): ZodType | null {
  if (isZodType(namespace.paramsSchema)) return namespace.paramsSchema;
  const named = Object.entries(namespace).filter(([name, value]) => /ParamsSchema$/.test(name) && isZodType(value));
  return named.length === 1 ? (named[0][1] as ZodType) : null;
}

const cache = new Map<string, ZodType | null>();

/** The parameter schema of simulation `id`, or null when it has none. */
export async function loadSimParamSchema(id: string): Promise<ZodType | null> {
  if (!/^[a-z][a-z0-9-]*$/.test(id)) return null;
  if (cache.has(id)) return cache.get(id) ?? null;
  let schema: ZodType | null = null;
  try {
    schema = pickParamsSchema((await import(`../../shared/sim/${id}/params.ts`)) as Record<string, unknown>);
  } catch {
    schema = null;
  }
  cache.set(id, schema);
  return schema;
}

export async function loadSimSchemas(ids: Iterable<string>): Promise<Map<string, ZodType>> {
  const schemas = new Map<string, ZodType>();
  for (const id of new Set(ids)) {
    const schema = await loadSimParamSchema(id);
    if (schema) schemas.set(id, schema);
  }
  return schemas;
}
