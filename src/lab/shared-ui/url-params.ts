/**
 * Reads simulation parameters from the page's URL search string, so `/lab/passive-film?crMassPct=9`
 * opens at 9 % Cr. Values that look like numbers become numbers; `true`/`false` become booleans;
 * only the keys in `allowed` are read; keys listed in `strings` stay strings (e.g. a grade id "1095").
 * The simulation's zod schema validates the result.
 */
export function readSearchParams(search: string, allowed: readonly string[], strings: readonly string[] = []): Record<string, unknown> {
  const params = new URLSearchParams(search);
  const out: Record<string, unknown> = {};
  for (const key of allowed) {
    const raw = params.get(key);
    if (raw === null || raw === "") continue;
    if (strings.includes(key)) out[key] = raw;
    else if (/^-?\d+(\.\d+)?$/.test(raw)) out[key] = Number(raw);
    else if (raw === "true" || raw === "false") out[key] = raw === "true";
    else out[key] = raw;
  }
  return out;
}

/** The current window's search string, or "" outside a browser (e.g. in tests or when embedded). */
export function currentSearch(): string {
  return typeof window === "undefined" ? "" : window.location.search;
}
