import type { LegendItem } from "@/lab/shared-ui/legend";
import { SURFACE_COLOURS as C } from "./palette";

export const SURFACE_LEGEND: readonly LegendItem[] = [
  { key: "film", label: "Passive film", detail: "pale glaze; Cr sites a shade darker", swatch: { fill: C.filmIron, stroke: "#6b625a", pattern: "dots", patternColor: C.filmChromium } },
  { key: "bare", label: "Bare metal", detail: "dark; exposed iron and chromium", swatch: { fill: C.bareIron, stroke: "#6b625a" } },
  { key: "rust", label: "Rust", detail: "orange, stippled", swatch: { fill: C.rust, pattern: "stipple", patternColor: C.rustDark, stroke: "#6b625a" } },
  { key: "carbide", label: "Chromium carbide", detail: "outlined disc", swatch: { fill: C.carbide, stroke: C.carbideOutline, shape: "circle" } },
  { key: "halo", label: "Cr-depleted halo", detail: "dashed ring round a carbide", swatch: { fill: "#ffffff", pattern: "dashed-ring", patternColor: C.haloDark, shape: "circle" } },
  { key: "scratch", label: "Scratch path", detail: "dashed line", swatch: { fill: "#c2500b", shape: "line", dashed: true } },
];

export const NETWORK_LEGEND: readonly LegendItem[] = [
  { key: "network", label: "Cr in the connected network", detail: "near-white", swatch: { fill: C.networkChromium, stroke: "#6b625a" } },
  { key: "isolated", label: "Cr in isolated clusters", detail: "mid grey", swatch: { fill: C.isolatedChromium, stroke: "#6b625a" } },
  { key: "iron", label: "Iron", detail: "dark", swatch: { fill: C.networkIron, stroke: "#6b625a" } },
  { key: "carbide", label: "Chromium carbide", detail: "outlined disc", swatch: { fill: C.carbide, stroke: C.carbideOutline, shape: "circle" } },
];
