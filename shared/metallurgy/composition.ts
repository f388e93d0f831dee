import { InputError } from "./errors";

/** Elements the core knows, by chemical symbol. Iron is the balance. */
export const ELEMENTS = ["C", "Cr", "V", "W", "Mo", "Mn", "Si", "Ni", "N", "Cu", "P", "S"] as const;
export type Element = (typeof ELEMENTS)[number];

/** An alloy composition in mass percent; missing elements are zero, iron is the balance. */
export type Composition = Partial<Record<Element, number>>;

/** Molar masses in g/mol (IUPAC standard atomic weights, conventional values). */
export const MOLAR_MASS_G_PER_MOL = {
  Fe: 55.845,
  C: 12.011,
  Cr: 51.9961,
  V: 50.9415,
  W: 183.84,
  Mo: 95.95,
  Mn: 54.938,
  Si: 28.085,
  Ni: 58.693,
  N: 14.007,
  Cu: 63.546,
  P: 30.974,
  S: 32.06,
} as const;

/** Mass percent of an element, zero when absent. */
export function massPct(comp: Composition, element: Element): number {
  return comp[element] ?? 0;
}

/** Iron balance in mass percent. */
export function ironMassPct(comp: Composition): number {
  return 100 - ELEMENTS.reduce((sum, el) => sum + massPct(comp, el), 0);
}

/**
 * Rejects compositions with unknown keys, negative or non-finite amounts, or a sum above 100 %.
 * Returns a copy with every known element present (zeros filled in).
 */
export function validateComposition(comp: Composition, parameter = "composition"): Required<Composition> {
  if (comp === null || typeof comp !== "object") throw new InputError(parameter, comp, "an object of mass percents");
  const out = {} as Required<Composition>;
  for (const key of Object.keys(comp)) {
    if (!(ELEMENTS as readonly string[]).includes(key)) {
      throw new InputError(`${parameter}.${key}`, comp[key as Element], `a known element (${ELEMENTS.join(", ")})`);
    }
  }
  let sum = 0;
  for (const el of ELEMENTS) {
    const v = comp[el] ?? 0;
    if (typeof v !== "number" || !Number.isFinite(v) || v < 0 || v > 100) {
      throw new InputError(`${parameter}.${el}`, v, "a finite mass percent from 0 to 100");
    }
    out[el] = v;
    sum += v;
  }
  if (sum > 100 + 1e-9) throw new InputError(`${parameter} (sum)`, sum, "a total of at most 100 mass %");
  return out;
}
