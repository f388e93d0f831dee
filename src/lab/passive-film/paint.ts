import { SITE, STATUS, type PassiveFilmState } from "@shared/sim/passive-film";
import { rgbaWord, SURFACE_COLOURS as C } from "./palette";

export type DisplayMode = "surface" | "network";

const W = {
  bareIron: rgbaWord(C.bareIron),
  bareChromium: rgbaWord(C.bareChromium),
  filmIron: rgbaWord(C.filmIron),
  filmChromium: rgbaWord(C.filmChromium),
  rust: rgbaWord(C.rust),
  rustDark: rgbaWord(C.rustDark),
  carbide: rgbaWord(C.carbide),
  networkIron: rgbaWord(C.networkIron),
  isolatedChromium: rgbaWord(C.isolatedChromium),
  networkChromium: rgbaWord(C.networkChromium),
};

/** Colour of one site; rust alternates two shades in a checker so it reads as a texture. */
function siteWord(state: PassiveFilmState, i: number, mode: DisplayMode): number {
  const kind = state.kind[i];
  if (kind === SITE.carbide) return W.carbide;
  if (mode === "network") {
    if (kind === SITE.iron) return W.networkIron;
    return state.network[i] ? W.networkChromium : W.isolatedChromium;
  }
  const st = state.status[i];
  if (st === STATUS.rust) {
    const x = i % state.sizeSites;
    const y = (i - x) / state.sizeSites;
    return (x + y) % 2 === 0 ? W.rust : W.rustDark;
  }
  if (st === STATUS.film) return kind === SITE.chromium ? W.filmChromium : W.filmIron;
  return kind === SITE.chromium ? W.bareChromium : W.bareIron;
}

/** Paints every site into `pixels` (a Uint32Array view of an L×L ImageData). */
export function paintAll(pixels: Uint32Array, state: PassiveFilmState, mode: DisplayMode): void {
  for (let i = 0; i < state.status.length; i++) pixels[i] = siteWord(state, i, mode);
}

export interface DirtyRect {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** Paints only the sites listed in `state.changed`; returns the bounding box that changed (null if none). */
export function paintChanged(pixels: Uint32Array, state: PassiveFilmState, mode: DisplayMode): DirtyRect | null {
  if (state.changedCount === 0) return null;
  const L = state.sizeSites;
  let minX = L, minY = L, maxX = -1, maxY = -1;
  for (let k = 0; k < state.changedCount; k++) {
    const i = state.changed[k];
    pixels[i] = siteWord(state, i, mode);
    const x = i % L;
    const y = (i - x) / L;
    if (x < minX) minX = x;
    if (x > maxX) maxX = x;
    if (y < minY) minY = y;
    if (y > maxY) maxY = y;
  }
  return { x: minX, y: minY, width: maxX - minX + 1, height: maxY - minY + 1 };
}
