import { MOLAR_MASS_G_PER_MOL as M } from "../composition";

/** Carbide types of the allocation model CARB-1 (science-reference §2.2). */
export type CarbideType = "MC" | "M6C" | "M7C3" | "M23C6" | "M3C";
export const CARBIDE_TYPES: readonly CarbideType[] = ["MC", "M6C", "M7C3", "M23C6", "M3C"];

/** Every carbide in the data table: the CARB-1 types plus M2C and WC. */
export type CarbideDataKey = CarbideType | "M2C" | "WC";

export interface CarbideData {
  key: CarbideDataKey;
  formula: string;
  /** Steels where it is typical. */
  typicalIn: string;
  structure: string;
  /** Vickers hardness range (HV) reported in the literature. */
  hvRange: readonly [number, number];
  /** A single value for models and charts, inside hvRange [App] unless noted. */
  typicalHv: number;
  /** Hardness of the pure compound where a checked value exists (HV). */
  pureHv?: number;
  densityGPerCm3: number;
  densityRangeGPerCm3?: readonly [number, number];
  /** Molar volume per formula unit as counted by CARB-1 (MC: per V atom). */
  molarVolumeCm3PerMol: number;
  tags: { hardness: string; density: string; molarVolume: string };
}

/**
 * Carbide data of science-reference §2.1. Hardness ranges and densities carry the reference's tags;
 * `typicalHv` is an app choice inside the range (MC 2800 and M7C3 1500 are the values of the §2.6 checks).
 * Molar volumes are the reference's [Computed] pure-carbide values used by CARB-1 step 4.
 */
export const CARBIDE_DATA: Readonly<Record<CarbideDataKey, CarbideData>> = {
  M3C: {
    key: "M3C", formula: "(Fe,Cr)3C", typicalIn: "carbon and low-alloy steels (cementite)", structure: "orthorhombic",
    hvRange: [800, 1100], typicalHv: 950, densityGPerCm3: 7.69, molarVolumeCm3PerMol: 23.35,
    tags: { hardness: "[Mem]; large scatter noted in ISIJ Int. 62 (2022) 1313 [Checked]; typical [App]", density: "[Mem]", molarVolume: "[Computed]" },
  },
  M23C6: {
    key: "M23C6", formula: "(Cr,Fe)23C6", typicalIn: "stainless steels, annealed", structure: "cubic",
    hvRange: [1000, 1200], typicalHv: 1100, pureHv: 976, densityGPerCm3: 6.97, molarVolumeCm3PerMol: 181.92,
    tags: { hardness: "pure Cr23C6 976 [Checked]; range [Mem]; typical [App]", density: "[Mem]", molarVolume: "[Computed]" },
  },
  M7C3: {
    key: "M7C3", formula: "(Cr,Fe)7C3", typicalIn: "12 % Cr cold-work and ledeburitic stainless steels", structure: "hexagonal/orthorhombic",
    hvRange: [1300, 1800], typicalHv: 1500, pureHv: 1336, densityGPerCm3: 6.92, molarVolumeCm3PerMol: 57.8,
    tags: { hardness: "pure Cr7C3 1336 [Checked]; range [Mem]; typical [App]", density: "[Mem]", molarVolume: "[Computed]" },
  },
  M6C: {
    key: "M6C", formula: "Fe3(W,Mo)3C", typicalIn: "high-speed steels", structure: "cubic (a ≈ 11.1 Å)",
    hvRange: [1500, 1800], typicalHv: 1650, densityGPerCm3: 14.2, densityRangeGPerCm3: [9.1, 14.2], molarVolumeCm3PerMol: 51.47,
    tags: { hardness: "[Mem]; typical [App]", density: "[Computed] from a and Z = 16 (Mo 9.1 – W 14.2); lattice parameter [Mem]", molarVolume: "[Computed]" },
  },
  M2C: {
    key: "M2C", formula: "Mo2C / W2C", typicalIn: "tempered high-speed steels (secondary hardening)", structure: "hexagonal",
    hvRange: [1800, 2500], typicalHv: 2000, pureHv: 2498, densityGPerCm3: 9.15,
    molarVolumeCm3PerMol: (2 * M.Mo + M.C) / 9.15,
    tags: { hardness: "Mo2C 2498 [Checked] PMC table; range [Mem]; typical [App]", density: "[Mem]", molarVolume: "[Computed] Mo2C mass / density" },
  },
  MC: {
    key: "MC", formula: "VC (often VC0.88, V8C7)", typicalIn: "vanadium-alloyed tool and powder steels", structure: "NaCl (cubic)",
    hvRange: [2500, 3000], typicalHv: 2800, pureHv: 2763, densityGPerCm3: 5.77, molarVolumeCm3PerMol: 10.91,
    tags: { hardness: "VC 2763 [Checked] PMC table; range [Mem]; typical [App]", density: "[Checked]", molarVolume: "[Computed] per V atom" },
  },
  WC: {
    key: "WC", formula: "WC", typicalIn: "hardmetals (not in steels)", structure: "hexagonal",
    hvRange: [2200, 2400], typicalHv: 2300, densityGPerCm3: 15.63, molarVolumeCm3PerMol: (M.W + M.C) / 15.63,
    tags: { hardness: "≈22 GPa [Checked]", density: "[Checked]", molarVolume: "[Computed] mass / density" },
  },
};

/** Martensite matrix of hardened blade steels (58–66 HRC), science-reference §2.1. */
export const MARTENSITE_MATRIX_DATA = {
  hvRange: [650, 870] as const,
  densityRangeGPerCm3: [7.8, 7.85] as const,
  tag: "hardness via §2.3; density [Mem]",
} as const;

export type AbrasiveKey = "quartz" | "aluminium-oxide" | "silicon-carbide" | "cbn" | "diamond";

export interface AbrasiveData {
  key: AbrasiveKey;
  name: string;
  hvRange: readonly [number, number];
  /** Value used by the wear indices (science-reference §2.6 checks). */
  typicalHv: number;
  tag: string;
}

/**
 * Abrasives for the edge-retention (quartz, met in cutting) and sharpening-effort (stone) indices,
 * science-reference §2.1; typical values are those of the §2.6 check table.
 */
export const ABRASIVES: Readonly<Record<AbrasiveKey, AbrasiveData>> = {
  quartz: { key: "quartz", name: "quartz / silica", hvRange: [1000, 1200], typicalHv: 1100, tag: "[Mem]" },
  "aluminium-oxide": { key: "aluminium-oxide", name: "aluminium oxide", hvRange: [1800, 2300], typicalHv: 2000, tag: "[Mem]" },
  "silicon-carbide": { key: "silicon-carbide", name: "silicon carbide", hvRange: [2500, 2800], typicalHv: 2600, tag: "2600 [Checked] PMC table; range [Mem]" },
  cbn: { key: "cbn", name: "cubic boron nitride", hvRange: [4500, 4500], typicalHv: 4500, tag: "[Mem]" },
  diamond: { key: "diamond", name: "diamond", hvRange: [8000, 10000], typicalHv: 9000, tag: "[Mem]" },
};

/**
 * Stoichiometric constants [Computed] from IUPAC molar masses (science-reference §2.1):
 * C in Fe3C 6.690 wt%; V/C in VC 4.241; C bound per 1 % V 0.2358 (VC) / 0.2063 (VC0.875);
 * Cr/C in Cr23C6 16.595 and Cr7C3 10.101; Fe/C in Fe3C 13.948.
 */
export const CARBIDE_STOICHIOMETRY = {
  carbonInCementiteMassPct: (100 * M.C) / (3 * M.Fe + M.C),
  vanadiumToCarbonMassRatioVC: M.V / M.C,
  carbonPerVanadiumVC: M.C / M.V,
  carbonPerVanadiumVC0875: (0.875 * M.C) / M.V,
  chromiumToCarbonCr23C6: (23 * M.Cr) / (6 * M.C),
  chromiumToCarbonCr7C3: (7 * M.Cr) / (3 * M.C),
  ironToCarbonFe3C: (3 * M.Fe) / M.C,
} as const;
