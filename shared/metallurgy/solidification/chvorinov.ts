import { requirePositive, type WithWarnings } from "../validate";

/** Inputs of chvorinovTimeMin (cm-based units, as the mould constant). */
export interface ChvorinovInput {
  /** Casting volume, cm³. */
  volumeCm3: number;
  /** Cooling surface area, cm². */
  areaCm2: number;
  /** Mould constant B, min/cm² (for n = 2); default 2 min/cm² for steel in sand [App, illustrative]. */
  mouldConstantMinPerCm2?: number;
  /** Exponent n, default 2; warns outside 1.5–2. */
  exponent?: number;
}

/** Illustrative mould constant for steel in a sand mould, min/cm² [App]. */
export const SAND_MOULD_CONSTANT_MIN_PER_CM2 = 2;

/**
 * Chvorinov's rule: solidification time t_f = B·(V/A)^n, minutes, with the casting modulus
 * V/A in cm. Rejects V, A, B, n ≤ 0; warns when n lies outside 1.5–2.
 * Example: B 2 min/cm², 10 cm cube → 5.556 min.
 * Source: Chvorinov (1940) [Checked]; science-reference §3.6 checks 5–6.
 */
export function chvorinovTimeMin(input: ChvorinovInput): WithWarnings<number> {
  const volume = requirePositive("volumeCm3", input.volumeCm3);
  const area = requirePositive("areaCm2", input.areaCm2);
  const b = requirePositive("mouldConstantMinPerCm2", input.mouldConstantMinPerCm2 ?? SAND_MOULD_CONSTANT_MIN_PER_CM2);
  const n = requirePositive("exponent", input.exponent ?? 2);
  const warnings: string[] = [];
  if (n < 1.5 || n > 2) warnings.push(`Exponent n = ${n} is outside the usual 1.5–2 range of Chvorinov's rule.`);
  return { value: b * Math.pow(volume / area, n), warnings };
}
