import { createRandom } from "@shared/metallurgy";
import type { BaseField, VisibleField } from "@shared/sim/carbides";
import { CARBIDE_STYLE, MATRIX_COLOUR } from "./palette";

/** Below this radius (device px) a particle is stamped into the pixel buffer; above it, it is drawn as a vector disc. */
export const DETAIL_RADIUS_PX = 3;

function word(hex: string): number {
  const v = parseInt(hex.slice(1), 16);
  return ((255 << 24) | ((v & 255) << 16) | (((v >> 8) & 255) << 8) | ((v >> 16) & 255)) >>> 0;
}

/**
 * The matrix picture (faint martensite needles or ferrite grain lines), drawn once per state and size
 * into an offscreen canvas, returned as pixels to copy under every frame.
 */
export function matrixPixels(matrix: "annealed" | "hardened", sizeUm: number, sizePx: number): Uint32Array {
  const canvas = document.createElement("canvas");
  canvas.width = sizePx;
  canvas.height = sizePx;
  const c = canvas.getContext("2d")!;
  const scale = sizePx / sizeUm;
  c.fillStyle = matrix === "hardened" ? MATRIX_COLOUR.hardened : MATRIX_COLOUR.annealed;
  c.fillRect(0, 0, sizePx, sizePx);
  c.strokeStyle = matrix === "hardened" ? MATRIX_COLOUR.hardenedNeedle : MATRIX_COLOUR.annealedGrain;
  c.lineWidth = matrix === "hardened" ? Math.max(1, scale * 0.25) : 1;
  c.beginPath();
  const random = createRandom(matrix === "hardened" ? 17 : 29);
  if (matrix === "hardened") {
    const count = Math.round(sizeUm * sizeUm * 0.35);
    for (let k = 0; k < count; k++) {
      const x = random() * sizeUm, y = random() * sizeUm;
      const angle = [0.5, 1.55, 2.6][Math.floor(random() * 3)] + (random() - 0.5) * 0.2;
      const len = 0.8 + random() * 2.4;
      c.moveTo(x * scale, y * scale);
      c.lineTo((x + Math.cos(angle) * len) * scale, (y + Math.sin(angle) * len) * scale);
    }
  } else {
    const cell = 6;
    for (let gx = 0; gx < sizeUm; gx += cell) {
      for (let gy = 0; gy < sizeUm; gy += cell) {
        const x = gx + random() * cell, y = gy + random() * cell;
        c.moveTo(x * scale, y * scale);
        c.lineTo((x + cell * (0.6 + random() * 0.5)) * scale, (y + (random() - 0.5) * cell) * scale);
        c.moveTo(x * scale, y * scale);
        c.lineTo((x + (random() - 0.5) * cell) * scale, (y + cell * (0.6 + random() * 0.5)) * scale);
      }
    }
  }
  c.stroke();
  return new Uint32Array(c.getImageData(0, 0, sizePx, sizePx).data.buffer.slice(0));
}

/**
 * Stamps every small visible particle (radius below DETAIL_RADIUS_PX) into `pixels` as a solid disc in its
 * type's colour, wrapping round the periodic field. Returns how many were stamped. O(particles × r²).
 */
export function stampSmallParticles(pixels: Uint32Array, sizePx: number, base: BaseField, visible: VisibleField): number {
  const scale = sizePx / base.widthUm;
  const colours = base.types.map((t) => word(CARBIDE_STYLE[t].fill));
  let stamped = 0;
  for (let k = 0; k < visible.count; k++) {
    const r = visible.radiusUm[k] * scale;
    if (r >= DETAIL_RADIUS_PX) continue;
    const i = visible.index[k];
    const cx = base.xUm[i] * scale;
    const cy = base.yUm[i] * scale;
    const colour = colours[base.typeIndex[i]];
    const r2 = Math.max(0.25, r * r);
    const reach = Math.ceil(r);
    const x0 = Math.floor(cx), y0 = Math.floor(cy);
    for (let dy = -reach; dy <= reach; dy++) {
      const py = y0 + dy;
      const ddy = py + 0.5 - cy;
      const row = ((py % sizePx) + sizePx) % sizePx * sizePx;
      for (let dx = -reach; dx <= reach; dx++) {
        const px = x0 + dx;
        const ddx = px + 0.5 - cx;
        if (ddx * ddx + ddy * ddy > r2) continue;
        pixels[row + (((px % sizePx) + sizePx) % sizePx)] = colour;
      }
    }
    stamped++;
  }
  return stamped;
}
