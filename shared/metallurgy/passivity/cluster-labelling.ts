import { InputError } from "../errors";
import { requireOneOf } from "../validate";
import { LATTICE_TYPES, neighbourOffsets, resolveDimensions, type LatticeType } from "./lattice-neighbours";

/** Bit flags of the six faces of the box; a cluster's `faces` entry ORs the faces it touches. */
export const LATTICE_FACE = { xMin: 1, xMax: 2, yMin: 4, yMax: 8, zMin: 16, zMax: 32 } as const;

export interface LatticeGeometry {
  lattice: LatticeType;
  /** 1 = nearest neighbours; 2 = nearest + second-nearest (see neighbourOffsets). */
  neighbours: 1 | 2;
  /** Edge length L of a square/cubic box, or explicit [nx, ny] / [nx, ny, nz] (e.g. a thin film [64, 64, 3]). */
  size: number | readonly number[];
}

export interface LabelOptions {
  /** Reusable buffers (see createClusterWorkspace); without one, fresh arrays are allocated. */
  workspace?: ClusterWorkspace;
  /** Write the per-site `labels` array (default true). Spanning tests only need sizes and faces. */
  labelSites?: boolean;
}

/** Reusable typed-array buffers so a simulation can relabel every frame without allocating. */
export interface ClusterWorkspace {
  /** Largest number of sites the workspace can label. */
  readonly capacity: number;
  /** Per site: run index (scratch), then the cluster id. */
  readonly labels: Int32Array;
  /** Run edges: run a spans x in [edges[2a], edges[2a + 1]) of its row. */
  readonly edges: Int32Array;
  readonly runParent: Int32Array;
  readonly runLabel: Int32Array;
  readonly rowFirstRun: Int32Array;
  /** Occupancy bits, 32 sites per word, rows padded to whole words. */
  readonly bits: Int32Array;
  readonly sizes: Int32Array;
  readonly faces: Uint8Array;
}

export interface ClusterLabels {
  /** [nx, ny, nz]; site index = x + nx·(y + ny·z); nz = 1 in 2-D. */
  dims: [number, number, number];
  /**
   * Cluster id per site (0 … count − 1), −1 for an empty site; clusters are numbered in scan order of their
   * first site. Empty (length 0) when labelSites is false. A view into the workspace when one is given.
   */
  labels: Int32Array;
  /** Number of clusters. */
  count: number;
  /** Sites per cluster, indexed by cluster id (length count). */
  sizes: Int32Array;
  /** LATTICE_FACE bit mask per cluster (length count): which box faces the cluster touches. */
  faces: Uint8Array;
}

/**
 * Allocates buffers for labelling lattices of up to `siteCount` sites. Rows are packed in 32-bit words,
 * so a workspace fits any shape of that many sites whose rows are at least 32 sites long; shorter rows
 * may need a larger workspace (labelClusters checks and says so).
 */
export function createClusterWorkspace(siteCount: number): ClusterWorkspace {
  if (!Number.isInteger(siteCount) || siteCount < 1) throw new InputError("siteCount", siteCount, "an integer ≥ 1");
  return {
    capacity: siteCount,
    labels: new Int32Array(siteCount),
    edges: new Int32Array(2 * siteCount + 2),
    runParent: new Int32Array(siteCount + 1),
    runLabel: new Int32Array(siteCount + 1),
    rowFirstRun: new Int32Array(siteCount + 1),
    bits: new Int32Array(siteCount),
    sizes: new Int32Array(siteCount),
    faces: new Uint8Array(siteCount),
  };
}

function isWorkspace(x: LabelOptions | ClusterWorkspace): x is ClusterWorkspace {
  return typeof (x as ClusterWorkspace).capacity === "number" && (x as ClusterWorkspace).runParent instanceof Int32Array;
}

/**
 * Backward neighbour offsets (to rows already scanned) as flat typed arrays. `mode` 0 joins every contact
 * segment; when the same neighbour row is also linked with dx = 0, a dx = −1 link (mode 1) or dx = +1 link
 * (mode 2) can only add run pairs that touch end to end, so only those are joined.
 */
interface RowLinks {
  dx: Int32Array;
  dy: Int32Array;
  dz: Int32Array;
  mode: Int32Array;
}

const linkCache = new Map<string, RowLinks>();

function rowLinks(lattice: LatticeType, neighbours: 1 | 2): RowLinks {
  const key = `${lattice}/${neighbours}`;
  const cached = linkCache.get(key);
  if (cached) return cached;
  const offsets = neighbourOffsets(lattice, neighbours);
  // Runs along x rely on ±e1 being a neighbour, which holds for every supported lattice.
  if (!offsets.some(([dx, dy, dz]) => dx === 1 && dy === 0 && dz === 0)) throw new Error(`lattice ${lattice} has no ±x neighbour`);
  const back = offsets.filter(([, dy, dz]) => dz < 0 || (dz === 0 && dy < 0));
  const hasStraight = (dy: number, dz: number) => back.some((o) => o[0] === 0 && o[1] === dy && o[2] === dz);
  const links = {
    dx: Int32Array.from(back, (o) => o[0]),
    dy: Int32Array.from(back, (o) => o[1]),
    dz: Int32Array.from(back, (o) => o[2]),
    mode: Int32Array.from(back, ([dx, dy, dz]) => (dx === -1 && hasStraight(dy, dz) ? 1 : dx === 1 && hasStraight(dy, dz) ? 2 : 0)),
  };
  linkCache.set(key, links);
  return links;
}

/** Root of run i with path halving (union-find). */
function find(parent: Int32Array, i: number): number {
  while (parent[i] !== i) {
    const gp = parent[parent[i]];
    parent[i] = gp;
    i = gp;
  }
  return i;
}

/**
 * Labels connected clusters of occupied sites (occupancy ≠ 0) on a 2-D or 3-D lattice with open boundaries.
 *
 * Algorithm (Hoshen–Kopelman family, on runs): (1) one branch-free pass finds the runs of occupied sites
 * along x, stores each site's run index and packs the row into 32-bit words; (2) for every backward
 * neighbour offset, the overlap of a row with the shifted neighbour row is a word AND, and each maximal
 * segment of that overlap is one (run, run) contact, joined by union-find (path halving; a root is the
 * smallest run index); (3) clusters are numbered in scan order with their sizes and the box faces they
 * touch; (4) optionally the per-site labels. Typed arrays only, no per-site objects; pass a workspace to
 * avoid allocation entirely. Used for the percolation model of passivity (science-reference §1a).
 */
export function labelClusters(
  occupancy: Uint8Array,
  geometry: LatticeGeometry,
  optionsOrWorkspace: LabelOptions | ClusterWorkspace = {},
): ClusterLabels {
  // A bare workspace as third argument is accepted too (the first published signature).
  const options: LabelOptions = isWorkspace(optionsOrWorkspace) ? { workspace: optionsOrWorkspace } : optionsOrWorkspace;
  requireOneOf("lattice", geometry?.lattice, LATTICE_TYPES);
  requireOneOf("neighbours", geometry.neighbours, [1, 2] as const);
  const dims = resolveDimensions(geometry.lattice, geometry.size);
  const links = rowLinks(geometry.lattice, geometry.neighbours);
  const [nx, ny, nz] = dims;
  const n = nx * ny * nz;
  if (!(occupancy instanceof Uint8Array) || occupancy.length !== n) {
    throw new InputError("occupancy", occupancy?.length, `a Uint8Array of exactly ${n} sites (${nx}×${ny}×${nz})`);
  }
  const words = Math.ceil(nx / 32);
  const rows = ny * nz;
  const ws = options.workspace ?? createClusterWorkspace(Math.max(n, rows * words));
  if (ws.capacity < n || ws.bits.length < rows * words) {
    throw new InputError("workspace.capacity", ws.capacity, `at least ${Math.max(n, rows * words)} sites for a ${nx}×${ny}×${nz} lattice`);
  }
  findRuns(occupancy, nx, rows, words, ws);
  joinRuns(nx, ny, nz, words, links, ws);
  const count = numberClusters(nx, ny, nz, ws);
  const labelSites = options.labelSites ?? true;
  const labels = ws.labels.subarray(0, labelSites ? n : 0);
  if (labelSites) {
    // Empty sites hold the sentinel run index n, whose label is −1.
    const { runLabel } = ws;
    runLabel[n] = -1;
    for (let i = 0; i < n; i++) labels[i] = runLabel[labels[i]];
  }
  return { dims, labels, count, sizes: ws.sizes.subarray(0, count), faces: ws.faces.subarray(0, count) };
}

/**
 * Pass 1, branch-free: run edges (an edge is written at every site and kept only where occupancy changes),
 * each site's run index (sentinel n for empty sites) and the rows packed into 32-bit words.
 */
function findRuns(occupancy: Uint8Array, nx: number, rows: number, words: number, ws: ClusterWorkspace): void {
  const { edges, labels: runOf, runParent, rowFirstRun, bits } = ws;
  const sentinel = occupancy.length;
  let e = 0;
  for (let r = 0, base = 0; r < rows; r++, base += nx) {
    rowFirstRun[r] = e >> 1;
    let prev = 0;
    for (let j = 0; j < words; j++) {
      const x0 = j << 5;
      const x1 = Math.min(nx, x0 + 32);
      let word = 0;
      for (let x = x0, i = base + x0; x < x1; x++, i++) {
        const o = (occupancy[i] + 255) >> 8; // 1 for any non-zero byte
        edges[e] = x;
        e += o ^ prev;
        runOf[i] = (((e - 1) >> 1) & -o) | (sentinel & (o - 1));
        word |= o << (x - x0);
        prev = o;
      }
      bits[r * words + j] = word;
    }
    edges[e] = nx;
    e += prev;
  }
  const runs = e >> 1;
  rowFirstRun[rows] = runs;
  for (let a = 0; a < runs; a++) runParent[a] = a;
}

/** Word j of a packed row shifted so that bit x holds the row's site x + dx (zeros beyond the row). */
function shiftedWord(bits: Int32Array, rowWord: number, j: number, words: number, dx: number): number {
  if (dx === 0) return bits[rowWord + j];
  if (dx > 0) return (bits[rowWord + j] >>> dx) | (j + 1 < words ? bits[rowWord + j + 1] << (32 - dx) : 0);
  const s = -dx;
  return (bits[rowWord + j] << s) | (j > 0 ? bits[rowWord + j - 1] >>> (32 - s) : 0);
}

/** Pass 2: joins runs that touch through each backward neighbour offset, one union per new run pair. */
function joinRuns(nx: number, ny: number, nz: number, words: number, links: RowLinks, ws: ClusterWorkspace): void {
  const { labels: runOf, runParent, bits } = ws;
  const nLinks = links.dx.length;
  for (let z = 0; z < nz; z++) {
    for (let y = 0; y < ny; y++) {
      const r = y + ny * z;
      const baseA = r * nx;
      const wordA = r * words;
      for (let l = 0; l < nLinks; l++) {
        const yy = y + links.dy[l];
        const zz = z + links.dz[l];
        if (yy < 0 || yy >= ny || zz < 0 || zz >= nz) continue;
        const dx = links.dx[l];
        const mode = links.mode[l];
        const rb = yy + ny * zz;
        const baseB = rb * nx + dx;
        const wordB = rb * words;
        let carry = 0;
        for (let j = 0; j < words; j++) {
          const a = bits[wordA + j];
          const shifted = shiftedWord(bits, wordB, j, words, dx);
          let joins: number;
          if (mode === 0) {
            // A maximal segment of contacts lies in one run of each row: join once, at the segment start.
            const contact = a & shifted;
            joins = contact & ~((contact << 1) | carry);
            carry = contact >>> 31;
          } else if (mode === 1) {
            // dx = −1 beside dx = 0: new pairs only where a run of A starts right after a run of B ends.
            const aStarts = a & ~((a << 1) | (j > 0 ? bits[wordA + j - 1] >>> 31 : 0));
            joins = aStarts & shifted & ~bits[wordB + j];
          } else {
            // dx = +1 beside dx = 0: new pairs only where a run of A ends right before a run of B starts.
            const aEnds = a & ~((a >>> 1) | (j + 1 < words ? bits[wordA + j + 1] << 31 : 0));
            joins = aEnds & shifted & ~bits[wordB + j];
          }
          while (joins !== 0) {
            const x = (j << 5) + 31 - Math.clz32(joins & -joins);
            joins &= joins - 1;
            const ra = find(runParent, runOf[baseA + x]);
            const rbRoot = find(runParent, runOf[baseB + x]);
            if (rbRoot < ra) runParent[ra] = rbRoot;
            else if (ra < rbRoot) runParent[rbRoot] = ra;
          }
        }
      }
    }
  }
}

/** Pass 3: numbers clusters in scan order (a root is the smallest run index of its cluster); sizes and faces. */
function numberClusters(nx: number, ny: number, nz: number, ws: ClusterWorkspace): number {
  const { edges, runParent, runLabel, rowFirstRun, sizes, faces } = ws;
  let count = 0;
  for (let z = 0, r = 0; z < nz; z++) {
    const fz = (z === 0 ? LATTICE_FACE.zMin : 0) | (z === nz - 1 ? LATTICE_FACE.zMax : 0);
    for (let y = 0; y < ny; y++, r++) {
      const fyz = fz | (y === 0 ? LATTICE_FACE.yMin : 0) | (y === ny - 1 ? LATTICE_FACE.yMax : 0);
      for (let a = rowFirstRun[r], last = rowFirstRun[r + 1]; a < last; a++) {
        const root = find(runParent, a);
        let id: number;
        if (root === a) {
          id = count++;
          sizes[id] = 0;
          faces[id] = 0;
        } else id = runLabel[root];
        runLabel[a] = id;
        const start = edges[2 * a];
        const end = edges[2 * a + 1];
        sizes[id] += end - start;
        faces[id] |= fyz | (start === 0 ? LATTICE_FACE.xMin : 0) | (end === nx ? LATTICE_FACE.xMax : 0);
      }
    }
  }
  return count;
}

/** LATTICE_FACE bits of the two faces normal to an axis (0 = x, 1 = y, 2 = z). */
export function axisFaces(axis: 0 | 1 | 2): number {
  return axis === 0 ? LATTICE_FACE.xMin | LATTICE_FACE.xMax : axis === 1 ? LATTICE_FACE.yMin | LATTICE_FACE.yMax : LATTICE_FACE.zMin | LATTICE_FACE.zMax;
}

/** Ids of clusters that touch both faces normal to `axis` (spanning clusters), in label order. */
export function spanningClusterIds(result: ClusterLabels, axis: 0 | 1 | 2): number[] {
  const both = axisFaces(axis);
  const ids: number[] = [];
  for (let c = 0; c < result.count; c++) if ((result.faces[c] & both) === both) ids.push(c);
  return ids;
}

/** True when some cluster connects the two faces normal to `axis`. */
export function hasSpanningCluster(result: ClusterLabels, axis: 0 | 1 | 2): boolean {
  const both = axisFaces(axis);
  for (let c = 0; c < result.count; c++) if ((result.faces[c] & both) === both) return true;
  return false;
}

/** Id of the largest cluster, or −1 when the lattice is empty. */
export function largestClusterId(result: ClusterLabels): number {
  let best = -1;
  let bestSize = 0;
  for (let c = 0; c < result.count; c++) {
    if (result.sizes[c] > bestSize) {
      bestSize = result.sizes[c];
      best = c;
    }
  }
  return best;
}
