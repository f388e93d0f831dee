import { labelClusters, spanningClusterIds, type RandomSource } from "../../metallurgy";
import { ANCHOR_REACH_LAYERS, FILM_BRIDGE_SITES, HALO_CR_FACTOR } from "./constants";

/** Site kinds on the drawn surface. */
export const SITE = { iron: 0, chromium: 1, carbide: 2 } as const;

export interface SlabInput {
  sizeSites: number;
  depthLayers: number;
  lattice: "bcc" | "sc";
  neighbours: 1 | 2;
  /** Cr atom fraction of the matrix. */
  crAtomFraction: number;
  carbideMask: Uint8Array;
  haloMask: Uint8Array;
  random: RandomSource;
  /** Layers below the surface within which a network site anchors the film (default ANCHOR_REACH_LAYERS). */
  anchorReachLayers?: number;
  /** Sites the film bridges from an anchored column (default FILM_BRIDGE_SITES). */
  bridgeSites?: number;
}

export interface SurfaceNetwork {
  /** SITE kind of each surface site (layer z = 0). */
  kind: Uint8Array;
  /** 1 where the surface site itself belongs to a spanning Cr cluster. */
  network: Uint8Array;
  /** 1 where the film can cover the site: within FILM_BRIDGE_SITES of a column anchored to the network. */
  protectedMask: Uint8Array;
  /** True when some Cr cluster spans the slab from one side to the other (along x or y). */
  connected: boolean;
  /** Fraction of all Cr sites in the slab that belong to spanning clusters. */
  networkShareOfCr: number;
}

/**
 * Builds the alloy as a 3-D slab (L × L × depth, z = 0 the surface) of random Cr sites, labels its Cr
 * clusters with the core's union-find, and derives which surface sites a passive film can reach:
 * the percolation picture of science-reference §1a (Cr must connect for a Cr–O–Cr network to form).
 * Carbide columns hold no free Cr; their halo holds less.
 */
export function buildSurfaceNetwork(input: SlabInput): SurfaceNetwork {
  const { sizeSites: L, depthLayers: h, random } = input;
  const area = L * L;
  const occupancy = new Uint8Array(area * h);
  const p = input.crAtomFraction;
  const pHalo = p * HALO_CR_FACTOR;
  for (let z = 0, i = 0; z < h; z++) {
    for (let s = 0; s < area; s++, i++) {
      if (input.carbideMask[s]) { occupancy[i] = 0; continue; }
      occupancy[i] = random() < (input.haloMask[s] ? pHalo : p) ? 1 : 0;
    }
  }
  const labels = labelClusters(occupancy, { lattice: input.lattice, neighbours: input.neighbours, size: [L, L, h] });
  const spanning = new Uint8Array(labels.count);
  for (const id of [...spanningClusterIds(labels, 0), ...spanningClusterIds(labels, 1)]) spanning[id] = 1;

  const kind = new Uint8Array(area);
  const network = new Uint8Array(area);
  const anchored = new Uint8Array(area);
  let crSites = 0;
  let networkSites = 0;
  for (let i = 0; i < occupancy.length; i++) {
    const id = labels.labels[i];
    if (id < 0) continue;
    crSites++;
    if (spanning[id]) networkSites++;
  }
  const reach = Math.min(h, input.anchorReachLayers ?? ANCHOR_REACH_LAYERS);
  for (let s = 0; s < area; s++) {
    kind[s] = input.carbideMask[s] ? SITE.carbide : occupancy[s] ? SITE.chromium : SITE.iron;
    const top = labels.labels[s];
    if (top >= 0 && spanning[top]) network[s] = 1;
    for (let z = 0; z < reach; z++) {
      const id = labels.labels[s + z * area];
      if (id >= 0 && spanning[id]) { anchored[s] = 1; break; }
    }
  }
  const protectedMask = dilate(anchored, L, input.bridgeSites ?? FILM_BRIDGE_SITES);
  for (let s = 0; s < area; s++) if (kind[s] === SITE.carbide) protectedMask[s] = 0;
  return {
    kind,
    network,
    protectedMask,
    connected: networkSites > 0,
    networkShareOfCr: crSites > 0 ? networkSites / crSites : 0,
  };
}

/** Square (Chebyshev) dilation of a binary L×L mask by `radius` sites. */
function dilate(mask: Uint8Array, L: number, radius: number): Uint8Array {
  const out = new Uint8Array(mask.length);
  for (let y = 0; y < L; y++) {
    for (let x = 0; x < L; x++) {
      if (!mask[x + L * y]) continue;
      for (let yy = Math.max(0, y - radius); yy <= Math.min(L - 1, y + radius); yy++) {
        for (let xx = Math.max(0, x - radius); xx <= Math.min(L - 1, x + radius); xx++) out[xx + L * yy] = 1;
      }
    }
  }
  return out;
}
