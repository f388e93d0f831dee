/**
 * Colour scales for hot steel and for composition maps, as CSS colour strings.
 * incandescence(): the glow of steel by temperature (dark below ~500 °C, dull red, cherry,
 * orange, yellow, near-white for liquid), so the canvas reads like the forge. Values are
 * interpolated in sRGB between hand-picked stops; decorative accuracy only.
 * segregationColour(): depleted → quench blue, nominal → bone, enriched → ember, on a log scale
 * of the ratio to the nominal composition (0.5× … 2×, clamped).
 */
type Stop = readonly [value: number, r: number, g: number, b: number];

const GLOW: readonly Stop[] = [
  [20, 0x1f, 0x1b, 0x18],
  [450, 0x2e, 0x25, 0x20],
  [600, 0x55, 0x1c, 0x12],
  [750, 0x84, 0x1f, 0x0e],
  [900, 0xb8, 0x2a, 0x0c],
  [1050, 0xe0, 0x4b, 0x10],
  [1200, 0xf5, 0x7d, 0x1f],
  [1350, 0xff, 0xad, 0x45],
  [1450, 0xff, 0xd6, 0x7c],
  [1550, 0xff, 0xf2, 0xcf],
];

const SEGREGATION: readonly Stop[] = [
  [-1, 0x18, 0x37, 0x4c],
  [-0.5, 0x3f, 0x7e, 0xa6],
  [-0.15, 0xa9, 0xc9, 0xde],
  [0, 0xeb, 0xe3, 0xd5],
  [0.15, 0xff, 0xc6, 0x9a],
  [0.5, 0xf2, 0x6d, 0x1d],
  [1, 0x72, 0x30, 0x0b],
];

function interpolate(stops: readonly Stop[], value: number): [number, number, number] {
  if (!(value > stops[0][0])) return [stops[0][1], stops[0][2], stops[0][3]];
  for (let i = 1; i < stops.length; i++) {
    const b = stops[i];
    if (value <= b[0]) {
      const a = stops[i - 1];
      const w = (value - a[0]) / (b[0] - a[0]);
      return [a[1] + w * (b[1] - a[1]), a[2] + w * (b[2] - a[2]), a[3] + w * (b[3] - a[3])];
    }
  }
  const last = stops[stops.length - 1];
  return [last[1], last[2], last[3]];
}

function css([r, g, b]: [number, number, number]): string {
  return `rgb(${Math.round(r)},${Math.round(g)},${Math.round(b)})`;
}

export function incandescence(tempC: number): string {
  return css(interpolate(GLOW, tempC));
}

/** Relative luminance-based choice of a readable text colour on top of a glow colour. */
export function textOnGlow(tempC: number): string {
  const [r, g, b] = interpolate(GLOW, tempC);
  const lum = 0.2126 * r + 0.7152 * g + 0.0722 * b;
  return lum > 140 ? "#1a1714" : "#fcfaf6";
}

/** ratio = local / nominal composition; log2 scale clamped to 0.5×–2×. */
export function segregationColour(ratio: number): string {
  const x = ratio > 0 ? Math.log2(ratio) : -1;
  return css(interpolate(SEGREGATION, Math.max(-1, Math.min(1, x))));
}

/** CSS linear-gradient of a scale for HTML legends (left = low). */
export function glowGradient(minC: number, maxC: number, steps = 12): string {
  const parts: string[] = [];
  for (let i = 0; i <= steps; i++) {
    const t = minC + ((maxC - minC) * i) / steps;
    parts.push(`${incandescence(t)} ${((100 * i) / steps).toFixed(1)}%`);
  }
  return `linear-gradient(90deg, ${parts.join(", ")})`;
}

export function segregationGradient(steps = 12): string {
  const parts: string[] = [];
  for (let i = 0; i <= steps; i++) {
    const ratio = 2 ** (-1 + (2 * i) / steps);
    parts.push(`${segregationColour(ratio)} ${((100 * i) / steps).toFixed(1)}%`);
  }
  return `linear-gradient(90deg, ${parts.join(", ")})`;
}
