import { validateComposition, type Composition } from "../composition";
import { requireInRange, type WithWarnings } from "../validate";

/**
 * As-quenched martensite hardness (HRC) from carbon in solution (mass %), the ASTM A255 "initial hardness"
 * polynomial HRC = 33.087 + 50.723C + 33.662C² − 2.7048C³ − 107.02C⁴ + 43.523C⁵
 * [Checked: public reproduction of ASTM A255-10(2014)]; science-reference §2.3.
 * Calibrated for 0.1–0.7 % C; rejects C < 0 or > 1.0. See martensiteHardnessHrcWithWarnings.
 */
export function martensiteHardnessHrc(carbonMassPct: number): number {
  return martensiteHardnessHrcWithWarnings(carbonMassPct).value;
}

/** martensiteHardnessHrc plus a warning outside the 0.1–0.7 % C calibration range. */
export function martensiteHardnessHrcWithWarnings(carbonMassPct: number): WithWarnings<number> {
  const c = requireInRange("carbonMassPct", carbonMassPct, { min: 0, max: 1.0 });
  const warnings: string[] = [];
  if (c > 0.7) {
    warnings.push(`C = ${c} % is above 0.7 %: the A255 polynomial is not calibrated there; real hardness levels off as retained austenite grows.`);
  } else if (c < 0.1) {
    warnings.push(`C = ${c} % is below 0.1 %: outside the A255 polynomial's calibration range.`);
  }
  const value = 33.087 + c * (50.723 + c * (33.662 + c * (-2.7048 + c * (-107.02 + c * 43.523))));
  return { value, warnings };
}

/** Carbon above which as-quenched hardness is held constant by martensitePlateauHardnessHrc, mass %. */
export const MARTENSITE_PLATEAU_CARBON_MASS_PCT = 0.7;

/**
 * As-quenched hardness for any carbon in solution (0–2.11 %): the A255 polynomial up to 0.7 % C, held at its
 * 0.7 % value above. Measured as-quenched hardness levels off near 0.6–0.8 % C as retained austenite grows
 * (Krauss 1999, Mater. Sci. Eng. A 273–275, 40) [Pub, mem]; the polynomial itself turns down above 0.7 % and
 * would report a fully hardened 1 % C steel at about 51 HRC. Use this for high-carbon blade steels.
 */
export function martensitePlateauHardnessHrc(carbonMassPct: number): WithWarnings<number> {
  const c = requireInRange("carbonMassPct", carbonMassPct, { min: 0, max: 2.11 });
  if (c <= MARTENSITE_PLATEAU_CARBON_MASS_PCT) return martensiteHardnessHrcWithWarnings(c);
  const plateau = martensiteHardnessHrcWithWarnings(MARTENSITE_PLATEAU_CARBON_MASS_PCT).value;
  return {
    value: plateau,
    warnings: [
      `${c.toFixed(2)} % C in solution is above ${MARTENSITE_PLATEAU_CARBON_MASS_PCT} %: hardness is held at the ${MARTENSITE_PLATEAU_CARBON_MASS_PCT} % value, because real as-quenched hardness levels off there while retained austenite grows.`,
    ],
  };
}

/**
 * Martensite hardness (HV) from composition and cooling rate at 700 °C (°C/h), Maynier, Jungmann & Dollet
 * (1978): HV = 127 + 949C + 27Si + 11Mn + 8Ni + 16Cr + 21·log10(V_r) [Checked, several independent
 * implementations]; science-reference §2.3. Rejects V_r ≤ 0. See maynierHardnessHvWithWarnings.
 */
export function maynierHardnessHv(comp: Composition, coolingRateCPerH: number): number {
  return maynierHardnessHvWithWarnings(comp, coolingRateCPerH).value;
}

/** maynierHardnessHv plus a warning for C > 0.5 % (outside the equation's calibration). */
export function maynierHardnessHvWithWarnings(comp: Composition, coolingRateCPerH: number): WithWarnings<number> {
  const c = validateComposition(comp);
  const rate = requireInRange("coolingRateCPerH", coolingRateCPerH, { min: 0, minExclusive: true });
  const warnings: string[] = [];
  if (c.C > 0.5) warnings.push(`C = ${c.C} % is above 0.5 %: the Maynier equation is calibrated on lower-carbon steels.`);
  const value = 127 + 949 * c.C + 27 * c.Si + 11 * c.Mn + 8 * c.Ni + 16 * c.Cr + 21 * Math.log10(rate);
  return { value, warnings };
}
