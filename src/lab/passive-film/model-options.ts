import type { PassiveFilmParams } from "@shared/sim/passive-film";

/** Lattice + neighbour shells, offered as one choice: the "neighbour model". */
export const NEIGHBOUR_MODELS = [
  { value: "bcc-2", label: "bcc, 1st + 2nd neighbours (14)", lattice: "bcc", neighbours: 2 },
  { value: "bcc-1", label: "bcc, 1st neighbours only (8)", lattice: "bcc", neighbours: 1 },
  { value: "sc-2", label: "Simple cubic, 1st + 2nd (18)", lattice: "sc", neighbours: 2 },
  { value: "sc-1", label: "Simple cubic, 1st only (6)", lattice: "sc", neighbours: 1 },
] as const satisfies readonly { value: string; label: string; lattice: PassiveFilmParams["lattice"]; neighbours: 1 | 2 }[];

export type NeighbourModelId = (typeof NEIGHBOUR_MODELS)[number]["value"];

export function neighbourModelId(p: Pick<PassiveFilmParams, "lattice" | "neighbours">): NeighbourModelId {
  return `${p.lattice}-${p.neighbours}` as NeighbourModelId;
}

export function neighbourModelLabel(p: Pick<PassiveFilmParams, "lattice" | "neighbours" | "connectivity">): string {
  const m = NEIGHBOUR_MODELS.find((x) => x.value === neighbourModelId(p));
  return `${m?.label ?? ""}, ${p.connectivity === "bulk" ? "bulk-like" : "thin layer"}`;
}

export const SPEEDS = [0.25, 1, 4, 16, 64, 256] as const;

export function formatSpeed(speed: number): string {
  return `${speed} model s per s`;
}
