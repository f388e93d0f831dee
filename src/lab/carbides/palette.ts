import type { CarbideType } from "@shared/metallurgy";
import type { SwatchPattern } from "@/lab/shared-ui/swatch";

export interface CarbideStyle {
  fill: string;
  /** Lighter tint for the pattern marks and the outline. */
  mark: string;
  pattern: SwatchPattern;
  /** Short name for the key. */
  name: string;
}

/**
 * One fill and one pattern per carbide type. The fills sit at mid lightness, so each differs by 3:1 or more
 * from the dark matrix and from the pale air of the edge view; the pattern tells types apart without colour.
 */
export const CARBIDE_STYLE: Record<CarbideType, CarbideStyle> = {
  MC: { fill: "#858179", mark: "#f4f1ea", pattern: "none", name: "Vanadium carbide" },
  M7C3: { fill: "#c8742c", mark: "#ffe0bd", pattern: "hatch", name: "Chromium carbide M₇C₃" },
  M6C: { fill: "#9a6cc0", mark: "#eadcf7", pattern: "dots", name: "Tungsten–molybdenum carbide" },
  M23C6: { fill: "#3f8fc0", mark: "#d6ecfa", pattern: "cross", name: "Chromium carbide M₂₃C₆" },
  M3C: { fill: "#9a812c", mark: "#f6ecc4", pattern: "stipple", name: "Iron carbide (cementite)" },
};

export const MATRIX_COLOUR = { hardened: "#2b2723", hardenedNeedle: "#3a342e", annealed: "#3a352f", annealedGrain: "#4d463e" } as const;
export const AIR_COLOUR = "#f3efe7";
