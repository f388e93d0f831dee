import type { AbrasiveKey, CarbideType } from "../../metallurgy";

/** The grades the simulation offers as presets (issue 4 list), named by SAE/AISI designations. */
export const CARBIDE_PRESET_GRADES = ["1095", "52100", "O1", "420", "440C", "D2", "M2", "A11"] as const;

/**
 * Usual hardening (austenitizing) temperatures of the preset grades, °C. [Trade] common practice, no
 * source; mid-points of the ranges in common heat-treatment tables, recalled (from memory). M2 is capped at
 * the slider's 1200 °C (its usual range reaches about 1220 °C).
 */
export const TYPICAL_AUSTENITIZING_TEMP_C: Record<string, number> = {
  "1095": 800,
  "1080": 815,
  "5160": 845,
  "52100": 845,
  O1: 815,
  L6: 830,
  "420": 1010,
  "440C": 1050,
  D2: 1020,
  M2: 1200,
  A11: 1120,
  "304": 1050,
  "316": 1050,
};
export const DEFAULT_AUSTENITIZING_TEMP_C = 1000;

/** Spheroidize-annealed matrix (ferrite) hardness, HV. [Mem] typical 180–220 HV; a model choice [App]. */
export const ANNEALED_MATRIX_HV = 200;

/**
 * Carbon in solution above which martensite hardness is held constant: the A255 polynomial is calibrated
 * to 0.7 % C and real hardness levels off there as retained austenite grows (science-reference §2.3). [App]
 */
export const MARTENSITE_CARBON_CAP_MASS_PCT = 0.7;

/**
 * Mean section radius of each carbide type before coarsening, µm. [App] illustrative values in the range of
 * published micrographs (fine spheroidized cementite; coarse primary M7C3 of ledeburitic steels).
 */
export const INITIAL_MEAN_RADIUS_UM: Record<CarbideType, number> = {
  M3C: 0.25,
  M23C6: 0.35,
  M7C3: 1.1,
  M6C: 0.6,
  MC: 0.5,
};

/** Metal whose diffusion in austenite controls the coarsening of each carbide (the slowest solute). */
export const COARSENING_SOLUTE: Record<CarbideType, "V" | "Cr" | "Mo"> = {
  M3C: "Cr",
  M23C6: "Cr",
  M7C3: "Cr",
  M6C: "Mo",
  MC: "V",
};

/** LSW rate constant of a Cr-controlled carbide at 1000 °C, µm³/h. [App] the reference's example value (§2.5 check 2). */
export const LSW_RATE_AT_1000C_UM3_PER_H = 0.01;

/** The stone abrasives of the simulation, mapped to the core's abrasive keys. */
export const STONE_ABRASIVE: Record<"alumina" | "silicon-carbide" | "diamond", AbrasiveKey> = {
  alumina: "aluminium-oxide",
  "silicon-carbide": "silicon-carbide",
  diamond: "diamond",
};

/** The plain-carbon reference steel of the index charts. */
export const REFERENCE_GRADE = "1095";
