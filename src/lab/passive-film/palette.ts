/**
 * Colours of the surface picture. Chosen so the three states a learner must tell apart differ in
 * lightness by at least 3:1 (bare metal dark, rust mid, film light), and rust also carries a stipple
 * texture and carbides an outline, so colour is never the only cue.
 */
export const SURFACE_COLOURS = {
  bareIron: "#1f2226",
  bareChromium: "#26292e",
  filmIron: "#e8f0f6",
  filmChromium: "#d5e3ee",
  rust: "#c2521c",
  rustDark: "#93380c",
  carbide: "#8560b0",
  carbideOutline: "#eadcf7",
  halo: "#d9c2ef",
  haloDark: "#5b2f7a",
  scratch: "#ffb078",
  // "Chromium network" view
  networkIron: "#1f2226",
  isolatedChromium: "#7d858e",
  networkChromium: "#fff1c9",
} as const;

/** "#rrggbb" → a little-endian RGBA word for a Uint32Array view of ImageData. */
export function rgbaWord(hex: string): number {
  const v = parseInt(hex.slice(1), 16);
  const r = (v >> 16) & 255;
  const g = (v >> 8) & 255;
  const b = v & 255;
  return ((255 << 24) | (b << 16) | (g << 8) | r) >>> 0;
}
