import { InputError } from "../errors";
import { requireInteger, requireOneOf } from "../validate";

export type Lattice2D = "square" | "triangular";
export type Lattice3D = "sc" | "bcc";
export type LatticeType = Lattice2D | Lattice3D;
export const LATTICE_TYPES: readonly LatticeType[] = ["square", "triangular", "sc", "bcc"];

/** A neighbour offset (dx, dy, dz) in lattice (for bcc: primitive) coordinates; dz = 0 in 2-D. */
export type LatticeOffset = readonly [number, number, number];

const plusMinus = (vs: LatticeOffset[]): LatticeOffset[] => vs.flatMap((v) => [v, [-v[0], -v[1], -v[2]] as LatticeOffset]);

/**
 * Neighbour shells per lattice. Coordinates are the integer cell indices of the occupancy grid.
 * - square: NN ±e1, ±e2; 2NN the four diagonals (z = 4 / 8).
 * - triangular (axial coordinates, basis a1 = (1,0), a2 = (½,√3/2)): NN ±(1,0), ±(0,1), ±(−1,1);
 *   2NN (distance √3) ±(1,1), ±(−1,2), ±(2,−1) (z = 6 / 12).
 * - sc: NN ±e1, ±e2, ±e3; 2NN the 12 face diagonals (z = 6 / 18).
 * - bcc in primitive coordinates as science-reference §1a check 4 describes: NN ±e1, ±e2, ±e3, ±(1,1,1);
 *   2NN ±(0,1,1), ±(1,0,1), ±(1,1,0) (z = 8 / 14).
 */
const SHELLS: Record<LatticeType, { first: LatticeOffset[]; second: LatticeOffset[] }> = {
  square: { first: plusMinus([[1, 0, 0], [0, 1, 0]]), second: plusMinus([[1, 1, 0], [1, -1, 0]]) },
  triangular: { first: plusMinus([[1, 0, 0], [0, 1, 0], [-1, 1, 0]]), second: plusMinus([[1, 1, 0], [-1, 2, 0], [2, -1, 0]]) },
  sc: {
    first: plusMinus([[1, 0, 0], [0, 1, 0], [0, 0, 1]]),
    second: plusMinus([[1, 1, 0], [1, -1, 0], [1, 0, 1], [1, 0, -1], [0, 1, 1], [0, 1, -1]]),
  },
  bcc: { first: plusMinus([[1, 0, 0], [0, 1, 0], [0, 0, 1], [1, 1, 1]]), second: plusMinus([[0, 1, 1], [1, 0, 1], [1, 1, 0]]) },
};

/** Dimension (2 or 3) of a lattice type. */
export function latticeDimension(lattice: LatticeType): 2 | 3 {
  return lattice === "square" || lattice === "triangular" ? 2 : 3;
}

/** All neighbour offsets of a lattice for the given shells (1 = NN, 2 = NN + 2NN). */
export function neighbourOffsets(lattice: LatticeType, neighbours: 1 | 2): LatticeOffset[] {
  requireOneOf("lattice", lattice, LATTICE_TYPES);
  requireOneOf("neighbours", neighbours, [1, 2] as const);
  const s = SHELLS[lattice];
  return neighbours === 1 ? [...s.first] : [...s.first, ...s.second];
}

/** Largest lattice the labeller accepts (sites). */
export const MAX_LATTICE_SITES = 1 << 24;

/**
 * Resolves a size (edge length L for a square/cubic box, or explicit dimensions) to [nx, ny, nz]
 * (nz = 1 in 2-D). Throws InputError for non-integer, non-positive or too-large sizes.
 */
export function resolveDimensions(lattice: LatticeType, size: number | readonly number[]): [number, number, number] {
  const dim = latticeDimension(lattice);
  let dims: number[];
  if (typeof size === "number") dims = Array(dim).fill(size);
  else if (Array.isArray(size) && size.length === dim) dims = [...size];
  else throw new InputError("size", size, `an integer edge length or ${dim} integer dimensions`);
  dims.forEach((n, i) => requireInteger(`size[${i}]`, n, { min: 1 }));
  const [nx, ny, nz = 1] = dims;
  if (nx * ny * nz > MAX_LATTICE_SITES) throw new InputError("size", size, `at most ${MAX_LATTICE_SITES} sites`);
  return [nx, ny, nz];
}
