import type { Mould } from "@shared/sim/ingot/params";

/** Canvas colours of the ingot view (theme tokens of src/styles/index.css where one fits). */
export const INGOT_COLOURS = {
  label: "#ebe3d5", // bone-200 on soot: 13:1
  split: "#a39a8f",
  hatch: "rgba(26,23,20,0.55)",
  front: "#fcfaf6",
  frontCasing: "rgba(15,13,11,0.85)",
  carbide: "#0f0d0b",
  carbideOutline: "#e3eef5",
  noElement: "#6b625a",
} as const;

export const MOULD_STYLE: Record<Mould, { label: string; fill: string; edge: string; texture: string }> = {
  sand: { label: "Sand mould", fill: "#c9b48a", edge: "#8a7550", texture: "#6e5b39" },
  metal: { label: "Cast-iron ingot mould", fill: "#6b625a", edge: "#38322c", texture: "#a39a8f" },
  "water-cooled": { label: "Water-cooled copper mould", fill: "#b87333", edge: "#72300b", texture: "#68a0c6" },
};
