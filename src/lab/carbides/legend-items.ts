import { CARBIDE_DATA, type CarbideType } from "@shared/metallurgy";
import type { LegendItem } from "@/lab/shared-ui/legend";
import { AIR_COLOUR, CARBIDE_STYLE, MATRIX_COLOUR } from "./palette";

/** Key entries for the carbide types present, with formula and typical hardness. */
export function carbideLegend(types: readonly CarbideType[], matrix: "annealed" | "hardened", withAir: boolean): LegendItem[] {
  const items: LegendItem[] = types.map((t) => ({
    key: t,
    label: `${CARBIDE_STYLE[t].name} (${t})`,
    detail: `${CARBIDE_DATA[t].formula}, about ${CARBIDE_DATA[t].typicalHv} HV`,
    swatch: { fill: CARBIDE_STYLE[t].fill, stroke: CARBIDE_STYLE[t].mark, pattern: CARBIDE_STYLE[t].pattern, patternColor: CARBIDE_STYLE[t].mark, shape: "circle" },
  }));
  items.push({
    key: "matrix",
    label: matrix === "hardened" ? "Martensite matrix" : "Annealed matrix (ferrite)",
    detail: matrix === "hardened" ? "dark, with needle texture" : "dark, with grain lines",
    swatch: { fill: matrix === "hardened" ? MATRIX_COLOUR.hardened : MATRIX_COLOUR.annealed, stroke: "#6b625a", pattern: "hatch", patternColor: MATRIX_COLOUR.hardenedNeedle },
  });
  if (withAir) {
    items.push({ key: "air", label: "Air (worn away)", detail: "pale", swatch: { fill: AIR_COLOUR, stroke: "#6b625a" } });
    items.push({ key: "profile", label: "Edge as sharpened", detail: "dashed line", swatch: { fill: "#9a3e08", shape: "line", dashed: true } });
  }
  return items;
}
