import { requireInRange, requireNonNegative, requirePositive } from "../validate";
import { erf } from "./erf";

const SQRT_PI = Math.sqrt(Math.PI);

/**
 * Root λ of the one-phase Stefan (Neumann) problem, λ·e^(λ²)·erf(λ) = St/√π (dimensionless).
 * The solid shell grows as s = 2λ√(αt). Solved by safeguarded Newton iteration on a bracket
 * (the left side rises monotonically from 0), to full double precision.
 * Valid St: 0 < St ≤ 1e6. Example: St 1 → λ 0.620063.
 * Source: Neumann solution, e.g. Carslaw & Jaeger [Pub, mem]; science-reference §3.6 check 1.
 */
export function neumannLambda(stefanNumber: number): number {
  requireInRange("stefanNumber", stefanNumber, { min: 0, max: 1e6, minExclusive: true });
  const target = stefanNumber / SQRT_PI;
  const f = (x: number) => x * Math.exp(x * x) * erf(x) - target;
  let lo = 0;
  let hi = 1;
  while (f(hi) < 0) {
    lo = hi;
    hi *= 2;
  }
  // Small-St start: λ ≈ √(St/2); otherwise the bracket midpoint.
  let x = Math.min(Math.max(Math.sqrt(stefanNumber / 2), lo), hi);
  for (let i = 0; i < 200; i++) {
    const ex = Math.exp(x * x);
    const fx = x * ex * erf(x) - target;
    if (fx === 0) return x;
    if (fx < 0) lo = x;
    else hi = x;
    const dfx = ex * erf(x) * (1 + 2 * x * x) + (2 * x) / SQRT_PI;
    let next = x - fx / dfx;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(next - x) <= 1e-16 * Math.max(1, Math.abs(x)) || hi - lo <= 1e-16 * hi) return next;
    x = next;
  }
  return x;
}

/**
 * Stefan number St = c·(T_m − T_w)/L_f (dimensionless): sensible heat of the solid shell
 * relative to the latent heat. Rejects c ≤ 0, L_f ≤ 0 and T_w ≥ T_m.
 * Source: science-reference §3.6.
 */
export function stefanNumber(heatCapacityJPerKgK: number, meltTempC: number, wallTempC: number, latentHeatJPerKg: number): number {
  requirePositive("heatCapacityJPerKgK", heatCapacityJPerKgK);
  requirePositive("latentHeatJPerKg", latentHeatJPerKg);
  requireInRange("meltTempC", meltTempC);
  requireInRange("wallTempC", wallTempC, { max: meltTempC, maxExclusive: true });
  return (heatCapacityJPerKgK * (meltTempC - wallTempC)) / latentHeatJPerKg;
}

/**
 * Neumann solid shell thickness s = 2λ√(αt), metres (α = thermal diffusivity of the solid, m²/s;
 * t in s). Source: science-reference §3.6 oracle (b).
 */
export function neumannShellThicknessM(lambda: number, diffusivityM2PerS: number, timeS: number): number {
  requireNonNegative("lambda", lambda);
  requirePositive("diffusivityM2PerS", diffusivityM2PerS);
  requireNonNegative("timeS", timeS);
  return 2 * lambda * Math.sqrt(diffusivityM2PerS * timeS);
}
