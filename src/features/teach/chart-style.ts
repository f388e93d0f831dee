/** recharts styling from the theme tokens (SVG attributes need literal colours). */
export const CHART = {
  ink: "#1a1714",
  axis: "#38322c",
  grid: "#ebe3d5",
  quench: "#2d6488",
  quenchLight: "#97bfd9",
  ember: "#c2500b",
  emberLight: "#ffb078",
  success: "#2f6b3a",
  danger: "#a3261c",
  straw: "#e3c26b",
} as const;

export const TICK = { fontSize: 11, fill: CHART.axis } as const;
