/**
 * A synthetic photo for demo notebook entries: an etched test bar on bench paper, darker where
 * the steel hardened (the edge) and lighter at the spine, with a wavy transition, grinding
 * streaks and grain noise. Drawn pixel by pixel from a seeded random source, so it is the same
 * on every run and is no one's real photo. Encoded as PNG; the upload pipeline re-encodes it.
 */
import sharp from "sharp";
import { createRandom } from "../../../shared/metallurgy/random";

export interface EtchedBarOptions {
  seed: number;
  widthPx?: number;
  heightPx?: number;
  /** Where the hardened band ends, as a share of the bar's height from the edge (0..1). */
  hardenedShare?: number;
}

export async function etchedBarPng({ seed, widthPx = 640, heightPx = 240, hardenedShare = 0.45 }: EtchedBarOptions): Promise<Buffer> {
  const random = createRandom(seed);
  const px = Buffer.alloc(widthPx * heightPx * 3);
  const top = Math.round(heightPx * 0.2);
  const bottom = Math.round(heightPx * 0.8);
  const left = Math.round(widthPx * 0.04);
  const right = Math.round(widthPx * 0.96);
  const phase = random() * Math.PI * 2;
  // Grinding streaks: one brightness offset per row of the bar.
  const streaks = Array.from({ length: heightPx }, () => (random() - 0.5) * 10);
  for (let y = 0; y < heightPx; y += 1) {
    for (let x = 0; x < widthPx; x += 1) {
      const i = (y * widthPx + x) * 3;
      const grain = (random() - 0.5) * 12;
      if (y < top || y >= bottom || x < left || x >= right) {
        // Bench paper: warm light grey.
        px[i] = 212 + grain * 0.4;
        px[i + 1] = 204 + grain * 0.4;
        px[i + 2] = 190 + grain * 0.4;
        continue;
      }
      const fromEdge = (bottom - y) / (bottom - top); // 0 at the edge, 1 at the spine
      const line = hardenedShare + 0.06 * Math.sin(x / 37 + phase) + 0.03 * Math.sin(x / 11 + 2 * phase);
      const hardened = 1 / (1 + Math.exp((fromEdge - line) / 0.025)); // 1 in the hardened band
      const v = 150 - 70 * hardened + streaks[y] + grain;
      px[i] = Math.max(0, Math.min(255, v - 4 * hardened));
      px[i + 1] = Math.max(0, Math.min(255, v));
      px[i + 2] = Math.max(0, Math.min(255, v + 8 * hardened));
    }
  }
  return sharp(px, { raw: { width: widthPx, height: heightPx, channels: 3 } }).png({ compressionLevel: 9 }).toBuffer();
}
