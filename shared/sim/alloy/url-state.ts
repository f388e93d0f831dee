/**
 * The alloy explorer's state in the URL, so a comparison can be shared as a link:
 *   ?a=440C&a=D2&a=My%20steel_C1.2_Cr14_V2&cold=-196
 * A value without "_" is a grade preset id; otherwise the first "_"-separated part is the
 * alloy's name (with "%" and "_" escaped as %25 and %5F) and each further part is an element symbol
 * followed by its mass %. `cold` is written only when it differs from the default.
 * Decoding never throws: entries that do not parse are dropped and reported.
 */
import { ALLOY_ELEMENTS, MAX_ALLOYS, paramsSchema, type AlloyElement, type AlloyParams, type AlloySpec, alloySpecSchema, isGradeSpec } from "./params";

export const ALLOY_KEY = "a";
export const COLD_KEY = "cold";
export const AUSTENITIZING_KEY = "aus";

export function encodeAlloySpec(spec: AlloySpec): string {
  if (isGradeSpec(spec)) return spec.grade;
  const parts = [encodeName(spec.name)];
  for (const el of ALLOY_ELEMENTS) {
    const v = spec[el];
    if (typeof v === "number" && v > 0) parts.push(`${el}${formatNumber(v)}`);
  }
  // A trailing "_" keeps a custom alloy with no alloying elements distinct from a grade id.
  return parts.length === 1 ? `${parts[0]}_` : parts.join("_");
}

export function decodeAlloySpec(value: string): AlloySpec | null {
  if (!value.includes("_")) {
    const parsed = alloySpecSchema.safeParse({ grade: value });
    return parsed.success ? parsed.data : null;
  }
  const [rawName, ...tokens] = value.split("_");
  const spec: Record<string, unknown> = { name: decodeName(rawName) };
  for (const token of tokens) {
    if (token === "") continue;
    const match = /^([A-Z][a-z]?)(\d+(?:\.\d+)?)$/.exec(token);
    if (!match || !(ALLOY_ELEMENTS as readonly string[]).includes(match[1])) return null;
    spec[match[1] as AlloyElement] = Number(match[2]);
  }
  const parsed = alloySpecSchema.safeParse(spec);
  return parsed.success ? parsed.data : null;
}

export function encodeAlloyParams(params: AlloyParams): string {
  const search = new URLSearchParams();
  for (const spec of params.alloys) search.append(ALLOY_KEY, encodeAlloySpec(spec));
  const defaults = paramsSchema.parse({});
  if (params.coldTreatmentC !== defaults.coldTreatmentC) search.set(COLD_KEY, formatNumber(params.coldTreatmentC));
  if (params.austenitizingTempC !== undefined) search.set(AUSTENITIZING_KEY, formatNumber(params.austenitizingTempC));
  return search.toString();
}

/** The query of an explorer link that opens these alloys (the first MAX_ALLOYS) at default settings. */
export function alloyLinkQuery(specs: readonly AlloySpec[]): string {
  const search = new URLSearchParams();
  for (const spec of specs.slice(0, MAX_ALLOYS)) search.append(ALLOY_KEY, encodeAlloySpec(spec));
  return search.toString();
}

export interface DecodedAlloyState {
  /** Null when the URL holds no alloy state at all (use the embedding preset or defaults). */
  params: AlloyParams | null;
  /** Human-readable notes about entries that were dropped. */
  problems: string[];
}

export function decodeAlloyParams(search: string | URLSearchParams): DecodedAlloyState {
  const query = typeof search === "string" ? new URLSearchParams(search) : search;
  const values = query.getAll(ALLOY_KEY);
  const coldRaw = query.get(COLD_KEY);
  const ausRaw = query.get(AUSTENITIZING_KEY);
  if (values.length === 0 && coldRaw === null && ausRaw === null) return { params: null, problems: [] };

  const problems: string[] = [];
  const alloys: AlloySpec[] = [];
  for (const value of values) {
    if (alloys.length >= MAX_ALLOYS) {
      problems.push(`Only ${MAX_ALLOYS} alloys can be compared; "${value}" was left out.`);
      continue;
    }
    const spec = decodeAlloySpec(value);
    if (spec) alloys.push(spec);
    else problems.push(`The alloy "${value}" in the link could not be read and was left out.`);
  }
  const candidate: Record<string, unknown> = {};
  if (alloys.length > 0) candidate.alloys = alloys;
  if (coldRaw !== null) {
    const cold = Number(coldRaw);
    if (Number.isFinite(cold)) candidate.coldTreatmentC = cold;
    else problems.push(`The cold-treatment temperature "${coldRaw}" could not be read.`);
  }
  if (ausRaw !== null) {
    const aus = Number(ausRaw);
    if (Number.isFinite(aus)) candidate.austenitizingTempC = aus;
    else problems.push(`The hardening temperature "${ausRaw}" could not be read.`);
  }
  // Every alloy was validated on its own; only the two temperatures can still be out of range.
  for (const [key, message] of [
    ["coldTreatmentC", "The cold-treatment temperature in the link is outside −196 to 0 °C and was reset."],
    ["austenitizingTempC", "The hardening temperature in the link is outside 760–1250 °C; typical temperatures are used."],
  ] as const) {
    if (key in candidate && !paramsSchema.safeParse({ [key]: candidate[key] }).success) {
      delete candidate[key];
      problems.push(message);
    }
  }
  return { params: paramsSchema.parse(candidate), problems };
}

/** Shortest exact decimal for a slider value (at most 3 decimals; steps are ≥ 0.01). */
export function formatNumber(v: number): string {
  return String(Number(v.toFixed(3)));
}

// Only "%" and "_" need escaping inside a value; URLSearchParams encodes the rest.
function encodeName(name: string): string {
  return name.replace(/[%_]/g, (c) => (c === "%" ? "%25" : "%5F"));
}

function decodeName(raw: string): string {
  return raw.replace(/%(25|5F)/gi, (m) => (m === "%25" ? "%" : "_"));
}
