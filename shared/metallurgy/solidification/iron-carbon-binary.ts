import { requireInRange } from "../validate";

/**
 * Key points of the Fe–C diagram used for the binary liquidus/solidus (ASM diagram values,
 * science-reference §3.3 [Mem]): pure Fe melts at 1538 °C; peritectic at 1495 °C with δ 0.09,
 * γ 0.17, L 0.53 % C; eutectic at 1148 °C with γ 2.11, L 4.30 % C.
 */
export const IRON_CARBON_LIQUIDUS_POINTS = Object.freeze({
  ironMeltingC: 1538,
  peritecticC: 1495,
  peritecticDeltaCarbonMassPct: 0.09,
  peritecticGammaCarbonMassPct: 0.17,
  peritecticLiquidCarbonMassPct: 0.53,
  eutecticC: 1148,
  eutecticGammaCarbonMassPct: 2.11,
  eutecticLiquidCarbonMassPct: 4.3,
});

const P = IRON_CARBON_LIQUIDUS_POINTS;
const LIQUIDUS_SLOPE_DELTA = (P.ironMeltingC - P.peritecticC) / P.peritecticLiquidCarbonMassPct; // 81.13 °C/%
const LIQUIDUS_SLOPE_GAMMA = (P.peritecticC - P.eutecticC) / (P.eutecticLiquidCarbonMassPct - P.peritecticLiquidCarbonMassPct); // 92.04
const SOLIDUS_SLOPE_DELTA = (P.ironMeltingC - P.peritecticC) / P.peritecticDeltaCarbonMassPct;
const SOLIDUS_SLOPE_GAMMA = (P.peritecticC - P.eutecticC) / (P.eutecticGammaCarbonMassPct - P.peritecticGammaCarbonMassPct); // 178.87

function checkCarbon(carbonMassPct: number): void {
  requireInRange("carbonMassPct", carbonMassPct, { min: 0, max: P.eutecticLiquidCarbonMassPct });
}

/**
 * Liquidus of binary Fe–C, °C, piecewise linear through the ASM points:
 * 1538 − 81.13C (C ≤ 0.53), 1495 − 92.04(C − 0.53) (0.53–4.30). Hyper-eutectic C is rejected.
 * Source: science-reference §3.3 [Mem points; Computed checks].
 */
export function ironCarbonLiquidusTempC(carbonMassPct: number): number {
  checkCarbon(carbonMassPct);
  if (carbonMassPct <= P.peritecticLiquidCarbonMassPct) return P.ironMeltingC - LIQUIDUS_SLOPE_DELTA * carbonMassPct;
  return P.peritecticC - LIQUIDUS_SLOPE_GAMMA * (carbonMassPct - P.peritecticLiquidCarbonMassPct);
}

/**
 * Solidus of binary Fe–C, °C: δ solidus up to 0.09 % C, the peritectic isotherm 1495 °C for
 * 0.09–0.17, the γ solidus 1495 − 178.87(C − 0.17) for 0.17–2.11, the eutectic 1148 °C above.
 * Source: science-reference §3.3.
 */
export function ironCarbonSolidusTempC(carbonMassPct: number): number {
  checkCarbon(carbonMassPct);
  if (carbonMassPct <= P.peritecticDeltaCarbonMassPct) return P.ironMeltingC - SOLIDUS_SLOPE_DELTA * carbonMassPct;
  if (carbonMassPct <= P.peritecticGammaCarbonMassPct) return P.peritecticC;
  if (carbonMassPct <= P.eutecticGammaCarbonMassPct) return P.peritecticC - SOLIDUS_SLOPE_GAMMA * (carbonMassPct - P.peritecticGammaCarbonMassPct);
  return P.eutecticC;
}

/** Freezing range of binary Fe–C, °C (liquidus − solidus). Source: science-reference §3.3. */
export function ironCarbonFreezingRangeC(carbonMassPct: number): number {
  return ironCarbonLiquidusTempC(carbonMassPct) - ironCarbonSolidusTempC(carbonMassPct);
}

/**
 * Effective partition coefficient of C between austenite and liquid implied by the binary
 * diagram slopes, k = m_liquidus/m_solidus ≈ 0.515 (dimensionless).
 * Source: science-reference §3.3 [Computed].
 */
export function ironCarbonEffectivePartitionCoefficient(): number {
  return LIQUIDUS_SLOPE_GAMMA / SOLIDUS_SLOPE_GAMMA;
}
