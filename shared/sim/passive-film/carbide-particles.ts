import type { RandomSource } from "../../metallurgy";
import { CARBIDE_RADIUS_SITES, HALO_WIDTH_SITES } from "./constants";

export interface CarbideParticle {
  /** Centre in surface-site coordinates. */
  x: number;
  y: number;
  radiusSites: number;
}

export interface CarbideLayout {
  particles: CarbideParticle[];
  /** 1 where a surface column is carbide (the particle runs through the slab). */
  carbideMask: Uint8Array;
  /** 1 in the Cr-depleted ring around each particle. */
  haloMask: Uint8Array;
  /** Fraction of surface sites that are carbide (the drawn area fraction). */
  drawnAreaFraction: number;
}

/**
 * Places non-overlapping disc-shaped carbide particles on an L×L surface until their area reaches
 * `areaFraction`, and marks a depleted halo of HALO_WIDTH_SITES around each. Seeded via `random`.
 */
export function layoutCarbides(sizeSites: number, areaFraction: number, random: RandomSource): CarbideLayout {
  const n = sizeSites * sizeSites;
  const carbideMask = new Uint8Array(n);
  const haloMask = new Uint8Array(n);
  const particles: CarbideParticle[] = [];
  const target = Math.max(0, Math.min(0.5, areaFraction)) * n;
  let area = 0;
  let attempts = 0;
  while (area < target && attempts < 20_000) {
    attempts++;
    const radius = CARBIDE_RADIUS_SITES.min + random() * (CARBIDE_RADIUS_SITES.max - CARBIDE_RADIUS_SITES.min);
    const margin = radius + 1;
    const x = margin + random() * (sizeSites - 2 * margin);
    const y = margin + random() * (sizeSites - 2 * margin);
    // Keep a gap of one halo between particles, so halos stay readable (relaxed after many failures).
    const gap = attempts < 5000 ? HALO_WIDTH_SITES : 0.5;
    if (particles.some((p) => Math.hypot(p.x - x, p.y - y) < p.radiusSites + radius + gap)) continue;
    particles.push({ x, y, radiusSites: radius });
    area += stamp(carbideMask, haloMask, sizeSites, x, y, radius);
  }
  // Halo never overlays a carbide site.
  for (let i = 0; i < n; i++) if (carbideMask[i]) haloMask[i] = 0;
  return { particles, carbideMask, haloMask, drawnAreaFraction: countOnes(carbideMask) / n };
}

/** Marks the disc and its halo; returns the number of newly marked carbide sites. */
function stamp(carbide: Uint8Array, halo: Uint8Array, size: number, cx: number, cy: number, r: number): number {
  const outer = r + HALO_WIDTH_SITES;
  let added = 0;
  for (let y = Math.max(0, Math.floor(cy - outer)); y <= Math.min(size - 1, Math.ceil(cy + outer)); y++) {
    for (let x = Math.max(0, Math.floor(cx - outer)); x <= Math.min(size - 1, Math.ceil(cx + outer)); x++) {
      const d = Math.hypot(x + 0.5 - cx, y + 0.5 - cy);
      const i = x + size * y;
      if (d <= r) {
        if (!carbide[i]) added++;
        carbide[i] = 1;
      } else if (d <= outer) halo[i] = 1;
    }
  }
  return added;
}

function countOnes(a: Uint8Array): number {
  let c = 0;
  for (let i = 0; i < a.length; i++) c += a[i];
  return c;
}
