import { ALLOCATION_DEFAULTS, CARBIDE_DATA } from "../../metallurgy";

/**
 * Area fraction of the surface to draw as carbide for a carbide mass % of the alloy. On a random section
 * the area fraction equals the volume fraction (Delesse's principle); volume fraction = mass fraction ×
 * matrix density / carbide density, with the core's carbide and matrix densities (science-reference §2.1–2.2).
 */
export function carbideAreaFraction(carbideMassPct: number, carbide: "M23C6" | "M7C3"): number {
  const massFraction = carbideMassPct / 100;
  const carbideVolume = massFraction / CARBIDE_DATA[carbide].densityGPerCm3;
  const matrixVolume = (1 - massFraction) / ALLOCATION_DEFAULTS.matrixDensityGPerCm3;
  return carbideVolume / (carbideVolume + matrixVolume);
}
