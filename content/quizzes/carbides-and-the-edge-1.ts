import { defineQuiz } from "../../shared/quiz/definition";
import {
  allocateCarbides,
  dissolvedFractionsForAustenitizing,
  edgeRetentionIndex,
  hardenedState,
  sharpeningEffortIndex,
  wearPhasesFromCarbides,
  type AbrasiveKey,
  type Composition,
} from "../../shared/metallurgy";
import { compositionFromSpec, fmt, readChoice, readNumber } from "./support/sim-params";

/** Matrix hardness assumed by the task (about 62 HRC), so the indices depend only on the carbides. */
const MATRIX_HV = 750;
const MIN_ERI = 5;
const MAX_SEI = 2;

/** The simulation's abrasive names mapped to the core's abrasive keys. */
const STONES: Record<"alumina" | "silicon-carbide" | "diamond", AbrasiveKey> = {
  alumina: "aluminium-oxide",
  "silicon-carbide": "silicon-carbide",
  diamond: "diamond",
};

/** Carbon bound as MC by a given vanadium content, read from the allocation model. */
function carbonInMc(vanadiumMassPct: number): number {
  const mc = allocateCarbides({ C: 2.5, V: vanadiumMassPct }).phases.find((p) => p.type === "MC");
  return mc ? mc.elements.C : 0;
}

function twoPhase(fraction: number, carbideHv: number) {
  return [
    { volumeFraction: 1 - fraction, hardnessHv: MATRIX_HV },
    { volumeFraction: fraction, hardnessHv: carbideHv },
  ];
}

export default defineQuiz({
  id: "carbides-and-the-edge-1",
  lessonSlug: "carbides-and-abrasives",
  title: "Carbide types, hardness and the stones that cut them",
  passFraction: 0.7,
  questions: [
    {
      id: "hardness-order",
      kind: "single",
      prompt: "Which ranking, from softest to hardest, is right for carbides in blade steels?",
      options: [
        { id: "right", text: "Cementite (M3C) < chromium carbides (M23C6, M7C3) < M6C < vanadium carbide (MC)" },
        { id: "mc-soft", text: "Vanadium carbide (MC) < cementite < M7C3 < M6C" },
        { id: "cr-hardest", text: "Cementite < MC < M6C < M7C3" },
        { id: "matrix", text: "Chromium carbides < martensite matrix < cementite < MC" },
      ],
      answer: "right",
      explanation:
        "Typical values: cementite 800–1100 HV, M23C6 about 1000–1200, M7C3 about 1300–1800, M6C about 1500–1800, MC (VC) about 2500–3000. Even the hardest martensite matrix (about 650–870 HV) is softer than every carbide. The exact numbers scatter; the order is robust.",
    },
    {
      id: "carbon-in-mc",
      kind: "numeric",
      prompt:
        "A steel contains {vanadium} % V and plenty of carbon. How much carbon (mass % of the alloy) does its vanadium bind as MC of composition V₈C₇ (0.875 C per V atom)? (M_C = 12.011, M_V = 50.9415 g/mol)",
      params: { vanadium: { min: 1, max: 10, step: 0.25 } },
      compute: ({ vanadium }) => carbonInMc(vanadium),
      expression: "vanadium * 0.875 * 12.011 / 50.9415",
      unit: "wt%",
      tolerance: { abs: 0.01 },
      decimals: 3,
      explanation:
        "Moles of V = V/50.9415; carbon atoms = 0.875 per V atom; mass of C = 0.875 × 12.011 × V/50.9415 = 0.2063 × V. So 10 % V binds about 2.06 % C — which is why A11-type steels carry about 2.45 % C: most of it is locked in vanadium carbide before chromium gets any.",
    },
    {
      id: "eri-two-phase",
      kind: "numeric",
      prompt:
        "A hardened steel has a 750 HV martensite matrix and {fraction} volume fraction of a chromium carbide of 1500 HV. Using the app's model (H0 = 700 HV, G = 10, scratch ratio 1.2, band 0.8–1.2), what is its edge-retention index against quartz (1100 HV)?",
      params: { fraction: { min: 0.05, max: 0.2, step: 0.01 } },
      compute: ({ fraction }) => edgeRetentionIndex(twoPhase(fraction, 1500), { abrasive: "quartz" }),
      expression: "(1 - fraction) * 750 / 700 + fraction * 1500 / 700 * 10",
      unit: "1",
      tolerance: { rel: 0.01 },
      decimals: 3,
      explanation:
        "Quartz (1100 HV) is more than 1.2 times harder than the matrix (ratio 1.47), so the matrix gets g = 1 and contributes (1 − f)·750/700. It is less than 0.8 times the carbide (ratio 0.73), so the carbide gets the full gain G = 10: f·1500/700·10. With f = 0.15 the index is 4.13 — a relative number, not a lifetime.",
    },
    {
      id: "sei-alumina",
      kind: "numeric",
      prompt:
        "A steel has a 750 HV matrix and {fraction} volume fraction of vanadium carbide at 2800 HV. With the same model, what is its sharpening-effort index on an aluminium-oxide stone (2000 HV)?",
      params: { fraction: { min: 0.02, max: 0.2, step: 0.01 } },
      compute: ({ fraction }) => sharpeningEffortIndex(twoPhase(fraction, 2800), "aluminium-oxide"),
      expression: "(1 - fraction) * 750 / 700 + fraction * 2800 / 700 * 10",
      unit: "1",
      tolerance: { rel: 0.01 },
      decimals: 3,
      explanation:
        "Aluminium oxide at 2000 HV is only 0.71 times as hard as vanadium carbide, so the carbides are not scratched and get G = 10 — exactly as they resist quartz in use. The matrix is cut (ratio 2.67). On diamond (9000 HV) every phase is cut and the index drops to about 1.3–1.6: the reason high-vanadium steels are sharpened on diamond.",
    },
    {
      id: "cut-vc",
      kind: "multiple",
      prompt: "Which abrasives are at least 1.2 times harder than vanadium carbide (about 2800 HV), so that they cut it efficiently? Select all that apply.",
      options: [
        { id: "diamond", text: "Diamond (about 8000–10000 HV)" },
        { id: "cbn", text: "Cubic boron nitride (about 4500 HV)" },
        { id: "sic", text: "Silicon carbide (about 2600 HV)" },
        { id: "alumina", text: "Aluminium oxide (about 2000 HV)" },
        { id: "quartz", text: "Quartz (about 1100 HV)" },
      ],
      answers: ["diamond", "cbn"],
      explanation:
        "1.2 × 2800 = 3360 HV. Only cBN and diamond exceed it. Silicon carbide (ratio 0.93) is in the blend band and cuts slowly; aluminium oxide (0.71) and quartz (0.39) do not cut vanadium carbide at all in this model.",
      feedback: {
        sic: "Silicon carbide is about 0.93 times as hard as VC: inside the 0.8–1.2 band, so it cuts slowly, not efficiently.",
      },
    },
    {
      id: "index-meaning",
      kind: "single",
      prompt: "Steel X has an edge-retention index of 4 and steel Y of 1. What does that mean?",
      options: [
        { id: "relative", text: "In this model, against quartz grit, X resists abrasive wear about four times as much as a plain 700 HV matrix; it says nothing about toughness or chipping." },
        { id: "lifetime", text: "A knife of X stays sharp exactly four times as long as a knife of Y." },
        { id: "hardness", text: "X is four times harder than Y on the Vickers scale." },
        { id: "toughness", text: "X is four times tougher than Y." },
      ],
      answer: "relative",
      explanation:
        "The indices are relative model numbers: wear resistance against a given abrasive compared with a single 700 HV phase. They ignore carbide pull-out, carbide size, edge geometry, toughness and corrosion. They explain trends — not lifetimes.",
    },
    {
      id: "stone-task",
      kind: "sim-task",
      prompt:
        "In the carbide simulation, choose a grade (or composition), harden it, set the austenitizing temperature and choose a sharpening abrasive so that — with the matrix taken as 750 HV — the edge-retention index against quartz is at least 5 and the sharpening-effort index on your chosen abrasive is at most 2. Submit the simulation's settings.",
      simulation: "carbides",
      initial: { grade: "1095", state: "hardened", view: "sharpen", abrasive: "alumina" },
      check: (submitted) => {
        const state = readChoice(submitted, "state", ["annealed", "hardened"] as const, "hardened");
        const abrasive = readChoice(submitted, "abrasive", ["alumina", "silicon-carbide", "diamond"] as const, "alumina");
        const tempC = readNumber(submitted, "austenitizingTempC", 1050, { min: 760, max: 1200 });
        const named = compositionFromSpec(submitted);
        if (!named || state === null || abrasive === null || tempC === null) {
          return { correct: false, detail: "The submitted settings could not be read (grade or composition, state, abrasive, austenitizing temperature)." };
        }
        if (state !== "hardened") return { correct: false, detail: "The task is about a hardened blade: set the state to hardened." };
        const comp: Composition = named.composition;
        let eri: number;
        let sei: number;
        let carbideVol: number;
        try {
          const dissolved = dissolvedFractionsForAustenitizing(comp, tempC).dissolvedFraction;
          const hardened = hardenedState(comp, { dissolvedFraction: dissolved });
          const phases = wearPhasesFromCarbides(hardened, MATRIX_HV);
          carbideVol = hardened.totalCarbideVolumePct;
          eri = edgeRetentionIndex(phases, { abrasive: "quartz" });
          sei = sharpeningEffortIndex(phases, STONES[abrasive]);
        } catch {
          return { correct: false, detail: `The carbide model rejects ${named.name} at ${tempC} °C.` };
        }
        const correct = eri >= MIN_ERI && sei <= MAX_SEI;
        return {
          correct,
          detail:
            `${named.name} hardened from ${fmt(tempC, 0)} °C keeps ${fmt(carbideVol, 1)} vol % carbide: edge-retention index ${fmt(eri)}, sharpening-effort index on ${abrasive} ${fmt(sei)}. ` +
            (correct
              ? "The carbides resist quartz in use, and the stone is hard enough to cut them."
              : eri < MIN_ERI
                ? `The edge-retention index needs to reach ${MIN_ERI}: more, or harder, carbide.`
                : `The sharpening effort must be at most ${MAX_SEI}: choose an abrasive hard enough to cut these carbides.`),
        };
      },
      exampleSolution: { grade: "A11", state: "hardened", austenitizingTempC: 1050, coarseningHours: 0, view: "sharpen", abrasive: "diamond" },
      explanation:
        "Only a steel with a lot of very hard carbide reaches an edge-retention index of 5 against quartz — in practice a vanadium-rich grade such as A11 (about 15 vol % MC). Those same carbides defeat aluminium oxide, so the sharpening effort stays high on alumina; diamond cuts them and brings the index down to about 1.5. The grade sets the edge; the stone decides how hard it is to restore.",
    },
  ],
});
