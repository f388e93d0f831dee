import { InputError } from "../errors";
import { requireInRange, requireOneOf, type WithWarnings } from "../validate";

export type FilmGrowthLaw = "direct-log" | "inverse-log";

/** Direct-logarithmic law L = L0 + k·log10(1 + t/τ). */
export interface DirectLogParams {
  /** L0 in nm (default 1.0) [App]. */
  initialNm?: number;
  /** k in nm per decade of time (default 0.25) [App]; ≥ 0. */
  nmPerDecade?: number;
  /** τ in s (default 1) [App]; > 0. */
  tauS?: number;
}

/** Inverse-logarithmic (Cabrera–Mott type) law 1/L = A − B·ln t, t in s. */
export interface InverseLogParams {
  /** A in nm⁻¹ (default 1.0) [App]; > 0. */
  aPerNm?: number;
  /** B in nm⁻¹ (default 0.05) [App]; > 0. */
  bPerNm?: number;
}

export type FilmGrowthParams = DirectLogParams & InverseLogParams;

/** Illustrative defaults of science-reference §1b [App]: 1–3 nm from 1 s to about a year. */
export const FILM_GROWTH_DEFAULTS = {
  direct: { initialNm: 1.0, nmPerDecade: 0.25, tauS: 1 },
  inverse: { aPerNm: 1.0, bPerNm: 0.05 },
} as const;

/** Observed thickness of passive films on stainless steels, nm [Checked] (Olsson & Landolt 2003). */
export const PASSIVE_FILM_OBSERVED_RANGE_NM = { min: 1, max: 3 } as const;

/**
 * Passive-film thickness in nm after `timeS` seconds at room temperature.
 * 'direct-log': L = L0 + k·log10(1 + t/τ), t ≥ 0 (default for animation, no singularity).
 * 'inverse-log': 1/L = A − B·ln t, 0 < t < exp(A/B) (Cabrera–Mott type; singular at exp(A/B)).
 * Parameters are illustrative [App]; science-reference §1b. Throws InputError outside the valid ranges.
 */
export function passiveFilmThicknessNm(timeS: number, law: FilmGrowthLaw, params: FilmGrowthParams = {}): number {
  return passiveFilmThicknessWithWarnings(timeS, law, params).value;
}

/** passiveFilmThicknessNm plus a warning when the thickness leaves the observed 1–3 nm range. */
export function passiveFilmThicknessWithWarnings(
  timeS: number,
  law: FilmGrowthLaw,
  params: FilmGrowthParams = {},
): WithWarnings<number> {
  requireOneOf("law", law, ["direct-log", "inverse-log"] as const);
  let value: number;
  if (law === "direct-log") {
    const initialNm = requireInRange("initialNm", params.initialNm ?? FILM_GROWTH_DEFAULTS.direct.initialNm, { min: 0 });
    const k = requireInRange("nmPerDecade", params.nmPerDecade ?? FILM_GROWTH_DEFAULTS.direct.nmPerDecade, { min: 0 });
    const tau = requireInRange("tauS", params.tauS ?? FILM_GROWTH_DEFAULTS.direct.tauS, { min: 0, minExclusive: true });
    requireInRange("timeS", timeS, { min: 0 });
    value = initialNm + k * Math.log10(1 + timeS / tau);
  } else {
    const a = requireInRange("aPerNm", params.aPerNm ?? FILM_GROWTH_DEFAULTS.inverse.aPerNm, { min: 0, minExclusive: true });
    const b = requireInRange("bPerNm", params.bPerNm ?? FILM_GROWTH_DEFAULTS.inverse.bPerNm, { min: 0, minExclusive: true });
    const tMax = Math.exp(a / b);
    requireInRange("timeS", timeS, { min: 0, minExclusive: true });
    if (!(timeS < tMax)) throw new InputError("timeS", timeS, `> 0 and < exp(A/B) = ${tMax.toPrecision(4)} s (the inverse-log law is singular there)`);
    const inverse = a - b * Math.log(timeS);
    value = 1 / inverse;
  }
  const warnings: string[] = [];
  if (value < PASSIVE_FILM_OBSERVED_RANGE_NM.min || value > PASSIVE_FILM_OBSERVED_RANGE_NM.max) {
    warnings.push(`Film thickness ${value.toPrecision(4)} nm is outside the 1–3 nm observed for passive films on stainless steels.`);
  }
  return { value, warnings };
}
