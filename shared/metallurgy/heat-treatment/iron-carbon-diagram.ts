import { InputError } from "../errors";
import { requireInRange } from "../validate";

/** Fe–C diagram data set: Callister's textbook values or the ASM diagram. */
export type IronCarbonDataset = "callister" | "asm";

/** A point of the Fe–C diagram: carbon in mass %, temperature in °C. */
export interface CompositionTemperature {
  readonly carbonMassPct: number;
  readonly tempC: number;
}

/** Key points of one Fe–C data set (mass % C, °C). */
export interface IronCarbonPoints {
  readonly eutectoid: CompositionTemperature;
  readonly eutectic: CompositionTemperature;
  /** Maximum solubility of C in austenite (at the eutectic temperature). */
  readonly maxCarbonInAustenite: CompositionTemperature;
  /** Maximum solubility of C in ferrite (at the eutectoid temperature). */
  readonly maxCarbonInFerrite: CompositionTemperature;
  /** Carbon content of cementite, mass %. */
  readonly cementiteCarbonMassPct: number;
  readonly peritectic: CompositionTemperature;
  /** Pure iron: α→γ, γ→δ and melting temperatures, °C. */
  readonly alphaToGammaC: number;
  readonly gammaToDeltaC: number;
  readonly meltingC: number;
  readonly source: string;
}

/**
 * Key points of the Fe–Fe3C diagram in two data sets (science-reference §5.2).
 * Callister (textbook) [Checked, via pages quoting them]; ASM diagram [Checked], with the
 * ferrite solubility 0.0218 % and the peritectic 1495 °C [Mem]. Cementite stoichiometric
 * C = 6.69 % [Computed]; the data sets round to 6.70 and 6.67.
 */
export const IRON_CARBON_POINTS: Readonly<Record<IronCarbonDataset, IronCarbonPoints>> = Object.freeze({
  callister: Object.freeze({
    eutectoid: { carbonMassPct: 0.76, tempC: 727 },
    eutectic: { carbonMassPct: 4.3, tempC: 1147 },
    maxCarbonInAustenite: { carbonMassPct: 2.14, tempC: 1147 },
    maxCarbonInFerrite: { carbonMassPct: 0.022, tempC: 727 },
    cementiteCarbonMassPct: 6.7,
    peritectic: { carbonMassPct: 0.17, tempC: 1493 },
    alphaToGammaC: 912,
    gammaToDeltaC: 1394,
    meltingC: 1538,
    source: "Callister, Materials Science and Engineering: An Introduction [Checked, via pages quoting the values]",
  }),
  asm: Object.freeze({
    eutectoid: { carbonMassPct: 0.77, tempC: 727 },
    eutectic: { carbonMassPct: 4.3, tempC: 1148 },
    maxCarbonInAustenite: { carbonMassPct: 2.11, tempC: 1148 },
    maxCarbonInFerrite: { carbonMassPct: 0.0218, tempC: 727 },
    cementiteCarbonMassPct: 6.67,
    peritectic: { carbonMassPct: 0.17, tempC: 1495 },
    alphaToGammaC: 912,
    gammaToDeltaC: 1394,
    meltingC: 1538,
    source: "ASM Fe–C diagram [Checked]; 0.0218 % C in ferrite and peritectic 1495 °C [Mem]",
  }),
});

/** The key points of a data set; rejects unknown data-set names. Source: IRON_CARBON_POINTS. */
export function ironCarbonPoints(dataset: IronCarbonDataset): IronCarbonPoints {
  const points = IRON_CARBON_POINTS[dataset];
  if (!points) throw new InputError("dataset", dataset, "one of callister, asm");
  return points;
}

/** Mass fractions of the constituents just below the eutectoid temperature (lever rule). */
export interface EutectoidPhaseFractions {
  /** Pearlite (eutectoid constituent). */
  pearlite: number;
  /** Proeutectoid ferrite (hypoeutectoid steels). */
  proeutectoidFerrite: number;
  /** Proeutectoid cementite (hypereutectoid; includes eutectic cementite above the austenite limit). */
  proeutectoidCementite: number;
  /** All ferrite (proeutectoid + in pearlite). */
  totalFerrite: number;
  /** All cementite (proeutectoid + in pearlite). */
  totalCementite: number;
  warnings: string[];
}

/**
 * Lever-rule mass fractions just below the eutectoid temperature for an Fe–C alloy:
 * pearlite = (C − C_α)/(C_e − C_α) (hypo) or (C_cem − C)/(C_cem − C_e) (hyper);
 * total Fe3C = (C − C_α)/(C_cem − C_α). Below the ferrite solubility all is ferrite.
 * Example (Callister): 0.35 % C → pearlite 0.4444, proeutectoid α 0.5556, Fe3C 0.0491.
 * Rejects C < 0 or above the data set's cementite C; warns in the cast-iron range.
 * Source: science-reference §5.2 [Computed checks].
 */
export function eutectoidPhaseFractions(carbonMassPct: number, dataset: IronCarbonDataset = "callister"): EutectoidPhaseFractions {
  const pts = ironCarbonPoints(dataset);
  const cCem = pts.cementiteCarbonMassPct;
  const c = requireInRange("carbonMassPct", carbonMassPct, { min: 0, max: cCem });
  const cAlpha = pts.maxCarbonInFerrite.carbonMassPct;
  const cE = pts.eutectoid.carbonMassPct;
  const warnings: string[] = [];
  if (c > pts.maxCarbonInAustenite.carbonMassPct) {
    warnings.push(`C = ${c} % is in the cast-iron range (above ${pts.maxCarbonInAustenite.carbonMassPct} %): the "proeutectoid" cementite includes eutectic cementite.`);
  }
  const totalCementite = c <= cAlpha ? 0 : (c - cAlpha) / (cCem - cAlpha);
  let pearlite: number;
  let proeutectoidFerrite = 0;
  let proeutectoidCementite = 0;
  if (c <= cAlpha) {
    pearlite = 0;
    proeutectoidFerrite = 1;
  } else if (c <= cE) {
    pearlite = (c - cAlpha) / (cE - cAlpha);
    proeutectoidFerrite = 1 - pearlite;
  } else {
    pearlite = (cCem - c) / (cCem - cE);
    proeutectoidCementite = 1 - pearlite;
  }
  return { pearlite, proeutectoidFerrite, proeutectoidCementite, totalFerrite: 1 - totalCementite, totalCementite, warnings };
}
