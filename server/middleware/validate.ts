import type { RequestHandler } from "express";
import type { ZodType } from "zod";
import { HttpError } from "../errors";

type Part = "body" | "query" | "params";
export type Schemas = Partial<Record<Part, ZodType>>;

/**
 * Validate request parts with zod (allow-list: unknown keys are stripped by z.object) and replace
 * them with the parsed values. On failure: 400 `validation_failed` with `fields`, keyed by the
 * field's dotted path (the same keys as z.flattenError for top-level fields); a problem with the
 * part as a whole is keyed by the part name ("body", "query", "params").
 *
 * Handlers then read `req.body as z.infer<typeof schema>` (or `req.query`, `req.params`).
 */
export function validate(schemas: Schemas): RequestHandler {
  return (req, _res, next) => {
    const fields: Record<string, string[]> = {};
    const parsed: Partial<Record<Part, unknown>> = {};
    for (const part of ["params", "query", "body"] as const) {
      const schema = schemas[part];
      if (!schema) continue;
      // Express 5 leaves req.body undefined when no body was sent; treat that as {} so the
      // response names the missing fields rather than "expected object".
      const input = part === "body" ? (req.body ?? {}) : req[part];
      const result = schema.safeParse(input);
      if (result.success) {
        parsed[part] = result.data;
        continue;
      }
      for (const issue of result.error.issues) {
        const key = issue.path.length > 0 ? issue.path.map(String).join(".") : part;
        (fields[key] ??= []).push(issue.message);
      }
    }
    if (Object.keys(fields).length > 0) {
      throw new HttpError(400, "validation_failed", "Some fields are missing or invalid.", fields);
    }
    if ("body" in parsed) req.body = parsed.body;
    if ("params" in parsed) req.params = parsed.params as typeof req.params;
    // Express 5 defines req.query as a getter; shadow it on this request object.
    if ("query" in parsed) Object.defineProperty(req, "query", { value: parsed.query, writable: true, configurable: true });
    next();
  };
}
