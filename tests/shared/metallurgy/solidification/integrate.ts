/**
 * Test helper: ∫₀^f g(f') df' for solid-fraction integrands that steepen towards f' = 1.
 * Substitutes f' = 1 − e^(−u) (df' = e^(−u) du), which makes Scheil-type integrands smooth,
 * then applies composite 8-point Gauss–Legendre on 400 panels (error far below 1e-12 here).
 */
const NODES = [-0.9602898564975363, -0.7966664774136267, -0.5255324099163290, -0.1834346424956498, 0.1834346424956498, 0.5255324099163290, 0.7966664774136267, 0.9602898564975363];
const WEIGHTS = [0.1012285362903763, 0.2223810344533745, 0.3137066458778873, 0.3626837833783620, 0.3626837833783620, 0.3137066458778873, 0.2223810344533745, 0.1012285362903763];

export function integrateOverSolidFraction(g: (f: number) => number, upperSolidFraction: number, panels = 400): number {
  const uMax = -Math.log1p(-upperSolidFraction);
  const h = uMax / panels;
  let sum = 0;
  for (let p = 0; p < panels; p++) {
    const mid = (p + 0.5) * h;
    for (let j = 0; j < NODES.length; j++) {
      const u = mid + 0.5 * h * NODES[j];
      sum += WEIGHTS[j] * g(-Math.expm1(-u)) * Math.exp(-u);
    }
  }
  return 0.5 * h * sum;
}

/** Plain composite 8-point Gauss–Legendre on [a, b]. */
export function integrate(g: (x: number) => number, a: number, b: number, panels = 400): number {
  const h = (b - a) / panels;
  let sum = 0;
  for (let p = 0; p < panels; p++) {
    const mid = a + (p + 0.5) * h;
    for (let j = 0; j < NODES.length; j++) sum += WEIGHTS[j] * g(mid + 0.5 * h * NODES[j]);
  }
  return 0.5 * h * sum;
}
