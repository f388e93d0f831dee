/**
 * The "mixing" control (0 = stagnant liquid ahead of the front, 1 = fully mixed) mapped onto
 * the solute boundary-layer thickness δ of the Burton–Prim–Slichter effective partition
 * coefficient used by the core's ingot solver, k_eff = k / (k + (1 − k)·exp(−V·δ/D_L)).
 * δ = δ_ref·(1 − m)/m: m = 1 gives δ = 0 (k_eff = k, strongest macrosegregation), m = 0 gives
 * δ = ∞ (k_eff = 1, the front freezes the liquid as it is), m = ½ gives the core's default δ.
 * The mapping is an [App] choice: real mixing depends on convection we do not model.
 */
import { INGOT_DEFAULTS } from "../../metallurgy/solidification/ingot-params";

export const REFERENCE_BOUNDARY_LAYER_M = INGOT_DEFAULTS.boundaryLayerM;

export function boundaryLayerForMixing(mixing: number): number {
  if (!(mixing >= 0 && mixing <= 1)) throw new RangeError(`mixing must be in [0, 1], got ${mixing}`);
  if (mixing === 0) return Infinity;
  return (REFERENCE_BOUNDARY_LAYER_M * (1 - mixing)) / mixing;
}

/** Plain words for the control's value, for labels and the live summary. */
export function describeMixing(mixing: number): string {
  if (mixing <= 0.05) return "stagnant liquid";
  if (mixing < 0.35) return "weakly stirred liquid";
  if (mixing < 0.7) return "partly mixed liquid";
  if (mixing < 0.95) return "well-stirred liquid";
  return "fully mixed liquid";
}
