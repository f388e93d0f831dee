/**
 * Every figure the alloy explorer shows for one alloy, each with how it was computed, its
 * source and the calibration warnings of the core functions that produced it. All physics is
 * in shared/metallurgy; this file picks the inputs (annealed or hardened state, which carbon
 * and chromium), catches out-of-range inputs and words the result. Cheap: well under a
 * millisecond per alloy, so it runs on every slider move.
 */
import type { Composition } from "../../metallurgy/composition";
import { InfeasibleError, InputError } from "../../metallurgy/errors";
import { isStainless, STAINLESS_LIMITS } from "../../metallurgy/passivity/stainless-definition";
import { prenWithWarnings } from "../../metallurgy/passivity/pren";
import { allocateCarbides, type CarbideAllocation } from "../../metallurgy/carbides/carbide-allocation";
import { hardenedState, type HardenedState } from "../../metallurgy/carbides/hardened-state";
import { dissolvedFractionsForAustenitizing } from "../../metallurgy/carbides/austenitizing-dissolution";
import { edgeRetentionIndex, sharpeningEffortIndex, wearPhasesFromCarbides } from "../../metallurgy/carbides/wear-index";
import type { CarbideType } from "../../metallurgy/carbides/carbide-data";
import { martensitePlateauHardnessHrc } from "../../metallurgy/hardening/martensite-hardness";
import { hrcToHv } from "../../metallurgy/hardening/hardness-conversion";
import { andrewsMsWithWarnings, retainedAusteniteFraction } from "../../metallurgy/hardening/martensite-start";
import { liquidusTempC, solidusTempC } from "../../metallurgy/solidification/liquidus-solidus";
import { backDiffusionLiquidComposition, fourierNumber } from "../../metallurgy/solidification/back-diffusion";
import { PARTITION_DATA } from "../../metallurgy/solidification/partition-data";
import { soluteDiffusivityInSolidM2PerS } from "../../metallurgy/solidification/solid-diffusion";
import { idealCriticalDiameterIn } from "../../metallurgy/heat-treatment/grossmann";
import { displayArmSpacingUm } from "../ingot/arm-spacing";
import { formatMassPct, formatNumber } from "./format";
import { typicalAustenitizingTempC } from "./austenitizing";
import type { ResolvedAlloy } from "./params";

export type FigureId =
  | "stainless"
  | "free-chromium"
  | "pren"
  | "carbides"
  | "hardness"
  | "ms-retained-austenite"
  | "wear-indices"
  | "freezing"
  | "ideal-diameter";

export type FigureStatus = "ok" | "warning" | "outside";

export interface Figure {
  id: FigureId;
  /** The headline value, formatted with its unit. */
  value: string;
  /** Secondary lines (e.g. the matrix value, the value after a cold treatment). */
  details: string[];
  /** Calibration warnings and reasons a value could not be computed. */
  warnings: string[];
  status: FigureStatus;
}

export interface FigureInfo {
  title: string;
  method: string;
  source: string;
}

/** How each figure is computed and where the model comes from, in our own words. */
export const FIGURE_INFO: Record<FigureId, FigureInfo> = {
  stainless: {
    title: "Stainless by the standard's definition",
    method: "At least 10.5 % Cr and at most 1.2 % C, read from the bulk composition. A definition, not a test of corrosion behaviour.",
    source: "EN 10088-1 (definition of stainless steel).",
  },
  "free-chromium": {
    title: "Chromium free in the matrix",
    method:
      "Carbon is given to carbide formers in order of affinity (V as MC, then W and Mo as M6C, then Cr carbides by the Cr:C ratio, then cementite) — the annealed limit. For the hardened state a temperature-dependent share of each carbide dissolves back into austenite. Free Cr is what is left in the matrix, per cent of the matrix.",
    source: "Mass balance with carbide stoichiometry (allocation model CARB-1 of this app; the dissolution windows are app heuristics).",
  },
  pren: {
    title: "Pitting resistance equivalent number",
    method: "PREN = Cr + 3.3·(Mo + 0.5·W) + 16·N. Bulk uses the whole composition; matrix uses the Cr, Mo, W and N left in solution after hardening. A ranking index within one family, not a corrosion rate.",
    source: "ISO 15156-3 / NACE MR0175 (W-inclusive form); the matrix version is a teaching extension.",
  },
  carbides: {
    title: "Carbide types and volume fractions",
    method: "The same allocation as for free chromium, with volumes from the carbides' densities against a 7.85 g/cm³ matrix: annealed (near equilibrium) and after hardening (undissolved carbides).",
    source: "Allocation model CARB-1 (app); carbide densities from handbook values recalled in the science reference.",
  },
  hardness: {
    title: "As-quenched hardness (martensite)",
    method:
      "Hardness of fully martensitic steel from the carbon dissolved in austenite at the hardening temperature (the ASTM A255 initial-hardness polynomial, held at its 0.7 % C value above 0.7 % C, where measured hardness levels off). Retained austenite and undissolved carbides are not in this number. For cementite steels the dissolved carbon comes from the binary iron–carbon Acm line: chromium's effect is not modelled, so 52100 comes out like a plain-carbon steel of equal carbon, although its chromium-enriched cementite dissolves more slowly. For high-speed steels the carbide dissolution is an uncalibrated app heuristic that leaves too little carbon in solution, and secondary hardening on tempering is not modelled, so the value reads low.",
    source: "ASTM A255 initial-hardness polynomial (calibrated 0.1–0.7 % C); plateau above 0.7 % C after Krauss (1999).",
  },
  "ms-retained-austenite": {
    title: "Martensite start and retained austenite",
    method: "Ms from the linear Andrews formula with the C, Mn, Ni, Cr and Mo in solution; the fraction of austenite left after cooling to room temperature (20 °C) and after the cold treatment from the Koistinen–Marburger equation f = exp(−0.011·(Ms − T)).",
    source: "Andrews (1965), J. Iron Steel Inst. 203, 721; Koistinen & Marburger (1959), Acta Metall. 7, 59.",
  },
  "wear-indices": {
    title: "Edge-retention and sharpening-effort indices",
    method: "Each phase (matrix and undissolved carbides) resists abrasion in proportion to its hardness and volume fraction, and much more when the abrasive is not harder than it. Edge retention uses quartz (the grit met in cutting); sharpening effort uses an aluminium-oxide or diamond stone. 1 = a plain 700 HV matrix. Model indices, not lifetimes.",
    source: "Khruschov (1974), Wear 28, 69 (additive phases); J. Tribol. 132 (2010) 034502 (hardness ratio 1.2); gain and band are app choices.",
  },
  freezing: {
    title: "Freezing range and the last liquid, ingot against powder",
    method: "Liquidus from a linear steelmaking formula, solidus from the same slopes over the partition coefficients. The last liquid at 95 % solid with back-diffusion (Brody–Flemings with the Clyne–Kurz correction), for a slowly cooled ingot (0.2 °C/s, like the middle of a 500 mm ingot) and for a 80 µm powder droplet (10⁵ °C/s).",
    source: "Liquidus formula of steelworks practice; Won & Thomas (2001) data and arm-spacing fit; Clyne & Kurz (1981).",
  },
  "ideal-diameter": {
    title: "Ideal critical diameter (hardenability)",
    method: "Grossmann's DI: the diameter of a bar that hardens to 50 % martensite at its centre in an ideal quench, as the product of a factor per element (grain size 7). Only defined inside the factor ranges, so most tool and stainless steels are out of scope.",
    source: "ASTM A255 multiplying factors.",
  },
};

/** Cooling rates of the ingot and powder cases of the "freezing" figure, °C/s [App]. */
export const INGOT_COOLING_RATE_C_PER_S = 0.2;
export const POWDER_COOLING_RATE_C_PER_S = 1e5;
export const ROOM_TEMP_C = 20;

export interface AlloyReportOptions {
  /** Hardening temperature, °C; null = the typical temperature for the alloy's family. */
  austenitizingTempC: number | null;
  coldTreatmentC: number;
}

export interface CarbideBar {
  type: CarbideType;
  annealedVolumePct: number;
  hardenedVolumePct: number;
}

export interface AlloyReport {
  alloy: ResolvedAlloy;
  austenitizingTempC: number;
  austenitizingFamily: string | null;
  figures: Record<FigureId, Figure>;
  /** Numbers for the comparison charts (null where not computed). */
  numbers: {
    carbides: CarbideBar[];
    totalCarbideVolumePct: { annealed: number; hardened: number } | null;
    hardnessHrc: number | null;
    msC: number | null;
    retainedAusteniteRoom: number | null;
    retainedAusteniteCold: number | null;
    edgeRetention: number | null;
    sharpeningAlumina: number | null;
    sharpeningDiamond: number | null;
    prenBulk: number | null;
    prenMatrix: number | null;
    freeChromiumAnnealed: number | null;
    freeChromiumHardened: number | null;
  };
  /** Any error that stopped the carbide-based figures (the alloy is outside the model). */
  error: string | null;
}

export function alloyReport(alloy: ResolvedAlloy, options: AlloyReportOptions): AlloyReport {
  const comp = alloy.composition;
  const auto = options.austenitizingTempC === null ? typicalAustenitizingTempC(comp) : null;
  const tempC = options.austenitizingTempC ?? auto!.tempC;
  const numbers: AlloyReport["numbers"] = {
    carbides: [],
    totalCarbideVolumePct: null,
    hardnessHrc: null,
    msC: null,
    retainedAusteniteRoom: null,
    retainedAusteniteCold: null,
    edgeRetention: null,
    sharpeningAlumina: null,
    sharpeningDiamond: null,
    prenBulk: null,
    prenMatrix: null,
    freeChromiumAnnealed: null,
    freeChromiumHardened: null,
  };

  let annealed: CarbideAllocation | null = null;
  let hardened: HardenedState | null = null;
  let dissolutionWarnings: string[] = [];
  let error: string | null = null;
  try {
    annealed = allocateCarbides(comp);
    const dissolution = dissolvedFractionsForAustenitizing(comp, tempC);
    dissolutionWarnings = dissolution.warnings.filter((w) => !annealed!.warnings.includes(w));
    hardened = hardenedState(comp, { dissolvedFraction: dissolution.dissolvedFraction });
  } catch (e) {
    error = describeError(e);
  }

  const figures = {} as Record<FigureId, Figure>;
  figures.stainless = stainlessFigure(comp);
  figures["free-chromium"] = guard("free-chromium", error, () => {
    numbers.freeChromiumAnnealed = annealed!.matrix.chromiumMassPct;
    numbers.freeChromiumHardened = hardened!.solution.chromiumMassPct;
    return {
      value: formatMassPct(hardened!.solution.chromiumMassPct),
      details: [`after hardening at ${tempC} °C`, `annealed matrix: ${formatMassPct(annealed!.matrix.chromiumMassPct)}`, `bulk: ${formatMassPct(comp.Cr ?? 0)}`],
      warnings: [...annealed!.warnings, ...dissolutionWarnings],
    };
  });
  figures.pren = guard("pren", null, () => {
    const bulk = prenWithWarnings(comp);
    numbers.prenBulk = bulk.value;
    const details = ["bulk composition"];
    const warnings = [...bulk.warnings];
    if (hardened) {
      const matrix = prenWithWarnings(restrictToCore(hardened.solution.composition));
      numbers.prenMatrix = matrix.value;
      details.push(`matrix after hardening: ${formatNumber(matrix.value, 3)}`);
    } else if (error) warnings.push(`Matrix value not computed: ${error}`);
    return { value: formatNumber(bulk.value, 3), details, warnings };
  });
  figures.carbides = guard("carbides", error, () => {
    const types = new Set<CarbideType>([...annealed!.phases.map((p) => p.type), ...hardened!.phases.map((p) => p.type)]);
    numbers.carbides = [...types].map((type) => ({
      type,
      annealedVolumePct: annealed!.phases.find((p) => p.type === type)?.volumePct ?? 0,
      hardenedVolumePct: hardened!.phases.find((p) => p.type === type)?.volumePct ?? 0,
    }));
    numbers.totalCarbideVolumePct = { annealed: annealed!.totalCarbideVolumePct, hardened: hardened!.totalCarbideVolumePct };
    const list = numbers.carbides
      .filter((b) => b.annealedVolumePct > 0.005)
      .map((b) => `${b.type} ${formatNumber(b.annealedVolumePct, 2)} → ${formatNumber(b.hardenedVolumePct, 2)} vol%`);
    return {
      value: numbers.carbides.length === 0 ? "none" : `${formatNumber(hardened!.totalCarbideVolumePct, 2)} vol% after hardening`,
      details: [`annealed ${formatNumber(annealed!.totalCarbideVolumePct, 2)} vol%`, ...list],
      warnings: [...annealed!.warnings],
    };
  });
  figures.hardness = guard("hardness", error, () => {
    const carbon = hardened!.solution.carbonMassPct;
    const h = martensitePlateauHardnessHrc(carbon);
    numbers.hardnessHrc = h.value;
    // The carbon in solution comes from the dissolution step, so its limits (Cr and Acm, high-speed steels) apply here too.
    const warnings = [...new Set([...h.warnings, ...dissolutionWarnings])];
    return { value: `${formatNumber(h.value, 3)} HRC`, details: [`${formatMassPct(carbon)} C in solution at ${tempC} °C`, `≈ ${Math.round(hrcToHv(Math.min(68, Math.max(20, h.value))))} HV`], warnings };
  });
  figures["ms-retained-austenite"] = guard("ms-retained-austenite", error, () => {
    const ms = andrewsMsWithWarnings(restrictToCore(hardened!.solution.composition));
    numbers.msC = ms.value;
    const room = retainedAusteniteFraction(ms.value, ROOM_TEMP_C);
    const cold = retainedAusteniteFraction(ms.value, options.coldTreatmentC);
    numbers.retainedAusteniteRoom = room;
    numbers.retainedAusteniteCold = cold;
    return {
      value: `Ms ${Math.round(ms.value)} °C`,
      details: [`retained austenite at ${ROOM_TEMP_C} °C: ${formatNumber(room * 100, 2)} %`, `after cooling to ${options.coldTreatmentC} °C: ${formatNumber(cold * 100, 2)} %`],
      warnings: ms.warnings,
    };
  });
  figures["wear-indices"] = guard("wear-indices", error, () => {
    const hrc = martensitePlateauHardnessHrc(hardened!.solution.carbonMassPct).value;
    const matrixHv = hrcToHv(Math.min(68, Math.max(20, hrc)));
    const phases = wearPhasesFromCarbides(hardened!, matrixHv);
    const eri = edgeRetentionIndex(phases);
    const seiAlumina = sharpeningEffortIndex(phases, "aluminium-oxide");
    const seiDiamond = sharpeningEffortIndex(phases, "diamond");
    numbers.edgeRetention = eri;
    numbers.sharpeningAlumina = seiAlumina;
    numbers.sharpeningDiamond = seiDiamond;
    return {
      value: `edge ${formatNumber(eri, 3)}`,
      details: [`sharpening on aluminium oxide ${formatNumber(seiAlumina, 3)}`, `on diamond ${formatNumber(seiDiamond, 3)}`, `matrix taken as ${Math.round(matrixHv)} HV`],
      warnings: ["Model indices relative to a plain 700 HV matrix, not lifetimes; they say nothing about toughness."],
    };
  });
  figures.freezing = guard("freezing", null, () => freezingFigure(comp));
  figures["ideal-diameter"] = idealDiameterFigure(comp);

  return { alloy, austenitizingTempC: tempC, austenitizingFamily: auto?.family ?? null, figures, numbers, error };
}

function stainlessFigure(comp: Composition): Figure {
  const yes = isStainless(comp);
  const cr = comp.Cr ?? 0;
  const c = comp.C ?? 0;
  const reasons: string[] = [];
  if (cr < STAINLESS_LIMITS.minChromiumMassPct) reasons.push(`Cr ${formatMassPct(cr)} is below 10.5 %`);
  if (c > STAINLESS_LIMITS.maxCarbonMassPct) reasons.push(`C ${formatMassPct(c)} is above 1.2 %`);
  return {
    id: "stainless",
    value: yes ? "Yes" : "No",
    details: yes ? [`Cr ${formatMassPct(cr)} ≥ 10.5 % and C ${formatMassPct(c)} ≤ 1.2 %`, "in practice about 12–13 % free Cr is needed (common practice)"] : reasons,
    warnings: [],
    status: "ok",
  };
}

function freezingFigure(comp: Composition): Omit<Figure, "id" | "status"> {
  const tl = liquidusTempC(comp);
  const ts = solidusTempC(comp);
  const range = tl.value - ts.value;
  const midC = Math.min(1600, Math.max(500, 0.5 * (tl.value + ts.value)));
  const details = [`liquidus ${Math.round(tl.value)} °C, solidus ${Math.round(ts.value)} °C`];
  const warnings = [...new Set([...tl.warnings, ...ts.warnings])];
  for (const [label, rate] of [
    ["ingot", INGOT_COOLING_RATE_C_PER_S],
    ["powder", POWDER_COOLING_RATE_C_PER_S],
  ] as const) {
    const lambda = displayArmSpacingUm(rate, comp.C ?? 0);
    const tf = range > 0 ? range / rate : 0;
    const parts: string[] = [];
    for (const el of ["V", "C"] as const) {
      const c0 = comp[el] ?? 0;
      const datum = PARTITION_DATA[el];
      if (!(c0 > 0) || !datum) continue;
      const alpha = lambda && tf > 0 ? fourierNumber(soluteDiffusivityInSolidM2PerS(el, midC), tf, lambda.valueUm) : 0;
      const last = backDiffusionLiquidComposition(c0, datum.kGamma, 0.95, alpha);
      parts.push(`${el} ${formatMassPct(last)} (${formatNumber(last / c0, 2)}×)`);
    }
    details.push(
      `${label}: last liquid ${parts.length ? parts.join(", ") : "—"}${lambda ? `, over ${formatNumber(lambda.valueUm / 2, 2)} µm (half λ2)` : ""}`,
    );
    if (lambda) warnings.push(...lambda.warnings.filter((w) => !warnings.includes(w)));
  }
  return { value: `${Math.round(range)} °C`, details, warnings };
}

function idealDiameterFigure(comp: Composition): Figure {
  try {
    const di = idealCriticalDiameterIn(comp);
    return {
      id: "ideal-diameter",
      value: `${formatNumber(di.value, 3)} in (${Math.round(di.valueMm)} mm)`,
      details: ["grain size No. 7, ideal quench"],
      warnings: di.warnings,
      status: di.warnings.length ? "warning" : "ok",
    };
  } catch (e) {
    return { id: "ideal-diameter", value: "outside the method's range", details: [], warnings: [describeError(e)], status: "outside" };
  }
}

function guard(id: FigureId, upstreamError: string | null, compute: () => Omit<Figure, "id" | "status">): Figure {
  if (upstreamError) return { id, value: "not computed", details: [], warnings: [upstreamError], status: "outside" };
  try {
    const f = compute();
    return { id, ...f, status: f.warnings.length ? "warning" : "ok" };
  } catch (e) {
    return { id, value: "outside the model's range", details: [], warnings: [describeError(e)], status: "outside" };
  }
}

/** Keep only the elements of the core's Composition (hardenedState returns all of them, zeros included). */
function restrictToCore(comp: Composition): Composition {
  return Object.fromEntries(Object.entries(comp).filter(([, v]) => typeof v === "number" && v > 0)) as Composition;
}

function describeError(e: unknown): string {
  if (e instanceof InputError) return `Input outside the model: ${e.message}.`;
  if (e instanceof InfeasibleError) return e.message;
  return e instanceof Error ? e.message : String(e);
}
