/**
 * Model constants of the passive-film simulation. All are [App] choices (science-reference §0): illustrative
 * rates and sizes picked so the animation shows the percolation argument clearly, not fitted to any steel.
 */

/** Sites along each edge of the drawn surface. */
export const SURFACE_SIZE = 256;

/** Depth of the 3-D slab, in atomic layers, over which the chromium network may connect. */
export const SLAB_DEPTH_LAYERS = { bulk: 24, "thin-layer": 3 } as const;

/** A surface column is anchored when a network site lies within this many layers of the surface. */
export const ANCHOR_REACH_LAYERS = 6;

/** The film bridges iron sites up to this many sites (Chebyshev distance) from an anchored column. */
export const FILM_BRIDGE_SITES = 2;

/** Rate (1/s) at which a bare chromium site oxidises. */
export const CR_OXIDATION_PER_S = 12;

/** Rate (1/s, per filmed neighbour) at which the film spreads over an anchored bare site. */
export const FILM_SPREAD_PER_S = 4;

export interface CorrosionRates {
  /** Bare iron must be exposed this long before rust can start (induction time). */
  inductionS: number;
  /** Rust nucleation rate per eligible bare site. */
  nucleationPerS: number;
  /** Rust spread rate per rusted neighbour onto a bare site. */
  spreadPerS: number;
  /** Rate per rusted neighbour at which rust undercuts an unanchored film island. */
  undercutPerS: number;
}

/** Environment severity: chloride (salt spray) shortens induction and speeds attack. Dry air does not rust. */
export const CORROSION_RATES: Record<"dry" | "humid" | "salt", CorrosionRates> = {
  dry: { inductionS: Infinity, nucleationPerS: 0, spreadPerS: 0, undercutPerS: 0 },
  humid: { inductionS: 20, nucleationPerS: 2e-4, spreadPerS: 0.4, undercutPerS: 0.02 },
  salt: { inductionS: 4, nucleationPerS: 1.5e-3, spreadPerS: 1.6, undercutPerS: 0.12 },
};

/** Carbide particles on the surface: radius range in sites, and the Cr-depleted halo around each. */
export const CARBIDE_RADIUS_SITES = { min: 2.5, max: 6 } as const;
export const HALO_WIDTH_SITES = 3;
/** Cr probability in the halo relative to the matrix: a local depletion, worse than the average. */
export const HALO_CR_FACTOR = 0.35;

/** Scratch half-width in sites. */
export const SCRATCH_RADIUS_SITES = 2.5;
