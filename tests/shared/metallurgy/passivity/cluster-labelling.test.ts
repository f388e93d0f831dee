import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { InputError } from "@shared/metallurgy/errors";
import {
  createClusterWorkspace,
  LATTICE_FACE,
  hasSpanningCluster,
  labelClusters,
  largestClusterId,
  neighbourOffsets,
  spanningClusterIds,
  type LatticeType,
} from "@shared/metallurgy/passivity";

/** Plain breadth-first labelling, numbering clusters in scan order of their first site: the oracle. */
function referenceLabels(occ: Uint8Array, lattice: LatticeType, nb: 1 | 2, [nx, ny, nz]: number[]) {
  const offsets = neighbourOffsets(lattice, nb);
  const labels = new Int32Array(occ.length).fill(-1);
  const sizes: number[] = [];
  const faces: number[] = [];
  for (let s = 0; s < occ.length; s++) {
    if (!occ[s] || labels[s] >= 0) continue;
    const id = sizes.length;
    const stack = [s];
    labels[s] = id;
    let size = 0;
    let f = 0;
    while (stack.length) {
      const i = stack.pop()!;
      size++;
      const x = i % nx, y = Math.floor(i / nx) % ny, z = Math.floor(i / (nx * ny));
      f |= (x === 0 ? LATTICE_FACE.xMin : 0) | (x === nx - 1 ? LATTICE_FACE.xMax : 0) | (y === 0 ? LATTICE_FACE.yMin : 0) | (y === ny - 1 ? LATTICE_FACE.yMax : 0);
      f |= (z === 0 ? LATTICE_FACE.zMin : 0) | (z === nz - 1 ? LATTICE_FACE.zMax : 0);
      for (const [dx, dy, dz] of offsets) {
        const xx = x + dx, yy = y + dy, zz = z + dz;
        if (xx < 0 || yy < 0 || zz < 0 || xx >= nx || yy >= ny || zz >= nz) continue;
        const j = xx + nx * (yy + ny * zz);
        if (occ[j] && labels[j] < 0) { labels[j] = id; stack.push(j); }
      }
    }
    sizes.push(size);
    faces.push(f);
  }
  return { labels, sizes, faces };
}

const grid2d = (rows: string[]) => {
  // rows[y] is a string of '#' (occupied) and '.' (empty), x to the right
  const ny = rows.length, nx = rows[0].length;
  const occ = new Uint8Array(nx * ny);
  rows.forEach((row, y) => [...row].forEach((c, x) => (occ[x + nx * y] = c === "#" ? 1 : 0)));
  return { occ, size: [nx, ny] as const };
};

describe("labelClusters", () => {
  it("separates diagonal contacts on the square lattice unless 2NN are counted", () => {
    const { occ, size } = grid2d(["#.", ".#"]);
    expect(labelClusters(occ, { lattice: "square", neighbours: 1, size }).count).toBe(2);
    expect(labelClusters(occ, { lattice: "square", neighbours: 2, size }).count).toBe(1);
  });

  it("joins one diagonal on the triangular lattice (axial coordinates) but not the other", () => {
    // (0,1)–(1,0) are nearest neighbours (offset (1,−1)); (0,0)–(1,1) only second neighbours
    const anti = grid2d([".#", "#."]);
    const main = grid2d(["#.", ".#"]);
    expect(labelClusters(anti.occ, { lattice: "triangular", neighbours: 1, size: anti.size }).count).toBe(1);
    expect(labelClusters(main.occ, { lattice: "triangular", neighbours: 1, size: main.size }).count).toBe(2);
    expect(labelClusters(main.occ, { lattice: "triangular", neighbours: 2, size: main.size }).count).toBe(1);
  });

  it("joins the bcc body diagonal (1,1,1) as a nearest neighbour", () => {
    const occ = new Uint8Array(8);
    occ[0] = 1; // (0,0,0)
    occ[7] = 1; // (1,1,1)
    expect(labelClusters(occ, { lattice: "bcc", neighbours: 1, size: 2 }).count).toBe(1);
    expect(labelClusters(occ, { lattice: "sc", neighbours: 2, size: 2 }).count).toBe(2);
  });

  it("reports sizes, scan-order labels and touched faces", () => {
    const { occ, size } = grid2d([
      "##..#",
      ".#..#",
      ".##.#",
      "....#",
    ]);
    const r = labelClusters(occ, { lattice: "square", neighbours: 1, size });
    expect(r.count).toBe(2);
    expect(Array.from(r.sizes)).toEqual([5, 4]);
    expect(r.labels[0]).toBe(0);
    expect(r.labels[4]).toBe(1);
    expect(r.labels[2]).toBe(-1);
    expect(r.faces[0]).toBe(LATTICE_FACE.xMin | LATTICE_FACE.yMin | LATTICE_FACE.zMin | LATTICE_FACE.zMax);
    expect(r.faces[1] & (LATTICE_FACE.yMin | LATTICE_FACE.yMax)).toBe(LATTICE_FACE.yMin | LATTICE_FACE.yMax);
    expect(spanningClusterIds(r, 1)).toEqual([1]);
    expect(hasSpanningCluster(r, 0)).toBe(false);
    expect(largestClusterId(r)).toBe(0);
  });

  it("handles empty and full lattices", () => {
    const empty = labelClusters(new Uint8Array(64), { lattice: "sc", neighbours: 1, size: 4 });
    expect(empty.count).toBe(0);
    expect(largestClusterId(empty)).toBe(-1);
    expect(Array.from(empty.labels).every((l) => l === -1)).toBe(true);
    const full = labelClusters(new Uint8Array(64).fill(1), { lattice: "bcc", neighbours: 2, size: 4 });
    expect(full.count).toBe(1);
    expect(full.sizes[0]).toBe(64);
    expect(full.faces[0]).toBe(63);
  });

  it("matches a breadth-first reference on random lattices of every type and shape", () => {
    const lattices: LatticeType[] = ["square", "triangular", "sc", "bcc"];
    fc.assert(
      fc.property(
        fc.constantFrom(...lattices),
        fc.constantFrom<1 | 2>(1, 2),
        fc.integer({ min: 1, max: 70 }),
        fc.integer({ min: 1, max: 12 }),
        fc.integer({ min: 1, max: 8 }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.integer(),
        (lattice, nb, nx, ny, nz, p, seed) => {
          const dims = lattice === "square" || lattice === "triangular" ? [nx, ny, 1] : [nx, ny, nz];
          const n = dims[0] * dims[1] * dims[2];
          let s = seed >>> 0;
          const occ = new Uint8Array(n);
          for (let i = 0; i < n; i++) {
            s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
            occ[i] = s / 2 ** 32 < p ? 1 + (s % 200) : 0; // any non-zero byte counts as occupied
          }
          const size = lattice === "square" || lattice === "triangular" ? dims.slice(0, 2) : dims;
          const r = labelClusters(occ, { lattice, neighbours: nb, size });
          const ref = referenceLabels(occ, lattice, nb, dims);
          expect(r.count).toBe(ref.sizes.length);
          expect(Array.from(r.labels)).toEqual(Array.from(ref.labels));
          expect(Array.from(r.sizes)).toEqual(ref.sizes);
          expect(Array.from(r.faces)).toEqual(ref.faces);
        },
      ),
      { numRuns: 300 },
    );
  });

  it("reuses a workspace (also passed bare, the first signature) and can skip per-site labels", () => {
    const ws = createClusterWorkspace(64 * 64);
    const occ = new Uint8Array(32 * 32).map((_, i) => ((i * 2654435761) >>> 0) % 3 === 0 ? 1 : 0);
    const geometry = { lattice: "square" as const, neighbours: 1 as const, size: 32 };
    const fresh = labelClusters(occ, geometry);
    const reused = labelClusters(occ, geometry, { workspace: ws });
    expect(reused.labels.buffer).toBe(ws.labels.buffer); // a view: the next call overwrites it
    expect(Array.from(reused.labels)).toEqual(Array.from(fresh.labels));
    const bare = labelClusters(occ, geometry, ws);
    expect(Array.from(bare.labels)).toEqual(Array.from(fresh.labels));
    expect(Array.from(bare.sizes)).toEqual(Array.from(fresh.sizes));
    const skipped = labelClusters(occ, geometry, { workspace: ws, labelSites: false });
    expect(skipped.labels.length).toBe(0);
    expect(Array.from(skipped.faces)).toEqual(Array.from(fresh.faces));
  });

  it("rejects bad input with InputError", () => {
    const g = { lattice: "sc" as const, neighbours: 1 as const, size: 4 };
    expect(() => labelClusters(new Uint8Array(63), g)).toThrow(InputError);
    expect(() => labelClusters([1, 0] as never, g)).toThrow(InputError);
    expect(() => labelClusters(new Uint8Array(64), { ...g, lattice: "hcp" as never })).toThrow(InputError);
    expect(() => labelClusters(new Uint8Array(64), { ...g, neighbours: 3 as never })).toThrow(InputError);
    expect(() => labelClusters(new Uint8Array(64), { ...g, size: -4 })).toThrow(InputError);
    expect(() => labelClusters(new Uint8Array(64), g, { workspace: createClusterWorkspace(10) })).toThrow(InputError);
    expect(() => createClusterWorkspace(0)).toThrow(InputError);
  });
});
