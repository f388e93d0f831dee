import { PHASE, type EdgeState } from "@shared/sim/carbides";
import { AIR_COLOUR, CARBIDE_STYLE, MATRIX_COLOUR } from "./palette";

function word(hex: string): number {
  const v = parseInt(hex.slice(1), 16);
  return ((255 << 24) | ((v & 255) << 16) | (((v >> 8) & 255) << 8) | ((v >> 16) & 255)) >>> 0;
}

/** Whether a cell of a carbide type carries a pattern mark (the same patterns as the field, cell by cell). */
function marked(pattern: string, x: number, y: number): boolean {
  switch (pattern) {
    case "hatch": return (x + y) % 3 === 0;
    case "dots": return x % 2 === 0 && y % 2 === 0;
    case "cross": return x % 3 === 0 || y % 3 === 0;
    case "stipple": return (x + 2 * y) % 4 === 0;
    default: return false;
  }
}

/** Paints the edge grid (one pixel per cell) into a Uint32Array view of an ImageData. */
export function paintEdge(pixels: Uint32Array, e: EdgeState, hardened: boolean): void {
  const air = word(AIR_COLOUR);
  const matrix = word(hardened ? MATRIX_COLOUR.hardened : MATRIX_COLOUR.annealed);
  const fills = e.types.map((t) => word(CARBIDE_STYLE[t].fill));
  const marks = e.types.map((t) => word(CARBIDE_STYLE[t].mark));
  const patterns = e.types.map((t) => CARBIDE_STYLE[t].pattern);
  const n = e.size;
  for (let y = 0, j = 0; y < n; y++) {
    for (let x = 0; x < n; x++, j++) {
      const ph = e.phase[j];
      if (ph === PHASE.air) pixels[j] = air;
      else if (ph === PHASE.matrix) pixels[j] = matrix;
      else pixels[j] = marked(patterns[ph - 2], x, y) ? marks[ph - 2] : fills[ph - 2];
    }
  }
}
