import {
  chromiumAtomFraction,
  chromiumTiedInCarbide,
  InfeasibleError,
  type ChromiumTiedResult,
} from "../../metallurgy";
import type { PassiveFilmParams } from "./params";

export interface AlloyBalance {
  /** Cr left in the matrix after carbides form, mass % of the matrix. */
  freeCrMassPct: number;
  /** Cr atom fraction of the matrix = probability a lattice site is Cr. */
  crAtomFraction: number;
  /** Carbide mass, % of the alloy. */
  carbideMassPct: number;
  /** Cr bound in carbide, mass % of the alloy. */
  tiedCrMassPct: number;
  /** True when the carbon would need more Cr than the alloy has: all Cr is bound, none is free. */
  allChromiumBound: boolean;
}

/**
 * Free chromium of the matrix when all the alloy's carbon forms the chosen chromium carbide
 * (the core's chromiumTiedInCarbide, science-reference §1c, pure Cr carbide = worst case).
 * When the carbide would need more Cr than there is, the model says all Cr is bound (free Cr 0).
 */
export function alloyBalance(params: Pick<PassiveFilmParams, "crMassPct" | "cMassPct" | "carbide">): AlloyBalance {
  const comp = { Cr: params.crMassPct, C: params.cMassPct };
  let tied: ChromiumTiedResult;
  try {
    tied = chromiumTiedInCarbide(comp, params.carbide);
  } catch (err) {
    if (!(err instanceof InfeasibleError)) throw err;
    // Bind as much carbon as the chromium allows: find the carbon amount that uses up all Cr by bisection
    // on the core function, so the stoichiometry stays in one place.
    let lo = 0;
    let hi = params.cMassPct;
    for (let i = 0; i < 40; i++) {
      const mid = (lo + hi) / 2;
      try {
        chromiumTiedInCarbide(comp, params.carbide, { carbonInCarbideMassPct: mid });
        lo = mid;
      } catch {
        hi = mid;
      }
    }
    const bound = chromiumTiedInCarbide(comp, params.carbide, { carbonInCarbideMassPct: lo });
    return {
      freeCrMassPct: 0,
      crAtomFraction: 0,
      carbideMassPct: bound.carbideMassPct,
      tiedCrMassPct: params.crMassPct,
      allChromiumBound: true,
    };
  }
  const free = Math.min(100, tied.freeCrMassPct);
  return {
    freeCrMassPct: free,
    crAtomFraction: chromiumAtomFraction(free),
    carbideMassPct: tied.carbideMassPct,
    tiedCrMassPct: tied.tiedCrMassPct,
    allChromiumBound: false,
  };
}
