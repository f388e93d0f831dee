import type { z } from "zod";
import { searchParamsToInput } from "@shared/sim/url-input";

/**
 * Reads simulation parameters from the page's URL search string, so `/lab/passive-film?crMassPct=9`
 * opens at 9 % Cr. Each value takes the type of its field in the simulation's schema (numbers
 * for number fields, text for grade ids such as "1095"); the schema then validates the result.
 */
export function readSearchParams(search: string, schema: { shape: Record<string, z.ZodType> }): Record<string, unknown> {
  return searchParamsToInput(search, schema);
}

/** The current window's search string, or "" outside a browser (e.g. in tests or when embedded). */
export function currentSearch(): string {
  return typeof window === "undefined" ? "" : window.location.search;
}
