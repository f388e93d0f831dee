/**
 * The three comparison slots: a colour and a shape each, so an alloy is recognised in charts
 * and tables without relying on colour (all colours ≥ 4.5:1 on white).
 */
export const SLOTS = [
  { colour: "#c2500b", light: "#ffd4b0", shape: "square", symbol: "■", label: "first" },
  { colour: "#2d6488", light: "#c7dcea", shape: "circle", symbol: "●", label: "second" },
  { colour: "#7d4f8f", light: "#e7d8ee", shape: "triangle", symbol: "▲", label: "third" },
] as const;

export type Slot = (typeof SLOTS)[number];
