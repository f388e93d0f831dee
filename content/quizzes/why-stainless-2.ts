import { defineQuiz } from "../../shared/quiz/definition";
import { allocateCarbides, chromiumTiedInCarbide, InfeasibleError, pren } from "../../shared/metallurgy";
import { alloysFromSubmission, fmt } from "./support/sim-params";

const MIN_CARBON = 1.5;
const MIN_MATRIX_CR = 12;

/** Worst-case free Cr with all carbon in a pure chromium carbide (science-reference §1c). */
function freeCr(carbon: number, chromium: number, carbide: "M23C6" | "M7C3"): number {
  return chromiumTiedInCarbide({ C: carbon, Cr: chromium }, carbide).freeCrMassPct;
}

/** Is the 440C-type case with all carbon as pure Cr23C6 feasible? (It is not: it needs 17.84 % Cr.) */
function cr23c6FeasibleFor440C(): boolean {
  try {
    chromiumTiedInCarbide({ C: 1.075, Cr: 17 }, "M23C6");
    return true;
  } catch (err) {
    if (err instanceof InfeasibleError) return false;
    throw err;
  }
}

export default defineQuiz({
  id: "why-stainless-2",
  lessonSlug: "carbon-chromium-and-pitting",
  title: "Carbon, chromium carbides and pitting",
  passFraction: 0.7,
  questions: [
    {
      id: "free-cr-m7c3",
      kind: "numeric",
      prompt:
        "A martensitic stainless steel has {chromium} % Cr and {carbon} % C. In the worst case all the carbon sits in pure Cr₇C₃. How much chromium is left in the matrix, as mass % of the matrix (carbide mass removed)?",
      params: { chromium: { min: 12, max: 18, step: 0.5 }, carbon: { min: 0.1, max: 0.5, step: 0.05 } },
      compute: ({ chromium, carbon }) => freeCr(carbon, chromium, "M7C3"),
      expression: "100 * (chromium - carbon * 7 * 51.9961 / (3 * 12.011)) / (100 - carbon - carbon * 7 * 51.9961 / (3 * 12.011))",
      unit: "wt%",
      tolerance: { abs: 0.1 },
      decimals: 2,
      explanation:
        "Cr₇C₃ binds 7·51.996/(3·12.011) = 10.101 g of chromium per gram of carbon. Tied Cr = 10.101·C; carbide mass = C + tied Cr; free Cr = 100·(Cr − tied)/(100 − carbide mass). For 13 % Cr and 0.2 % C: 2.02 % tied, 11.23 % free.",
    },
    {
      id: "free-cr-m23c6",
      kind: "numeric",
      prompt:
        "An annealed stainless steel has {chromium} % Cr and {carbon} % C, all of the carbon in pure Cr₂₃C₆. How much chromium is left in the matrix, as mass % of the matrix?",
      params: { chromium: { min: 12, max: 18, step: 0.5 }, carbon: { min: 0.05, max: 0.3, step: 0.05 } },
      compute: ({ chromium, carbon }) => freeCr(carbon, chromium, "M23C6"),
      expression: "100 * (chromium - carbon * 23 * 51.9961 / (6 * 12.011)) / (100 - carbon - carbon * 23 * 51.9961 / (6 * 12.011))",
      unit: "wt%",
      tolerance: { abs: 0.1 },
      decimals: 2,
      explanation:
        "Cr₂₃C₆ binds 23·51.996/(6·12.011) = 16.595 g of chromium per gram of carbon — more than Cr₇C₃. For a 420-type steel with 13 % Cr and 0.20 % C, 3.32 % Cr is tied and only 10.03 % is left in the matrix: below the practical 12–13 %.",
    },
    {
      id: "pren",
      kind: "numeric",
      prompt:
        "Compute the PREN (nitrogen factor 16) of a stainless steel with {chromium} % Cr, {molybdenum} % Mo, {tungsten} % W and {nitrogen} % N.",
      params: {
        chromium: { min: 16, max: 26, step: 0.5 },
        molybdenum: { min: 0, max: 4, step: 0.25 },
        tungsten: { min: 0, max: 1, step: 0.1 },
        nitrogen: { min: 0, max: 0.3, step: 0.01 },
      },
      compute: ({ chromium, molybdenum, tungsten, nitrogen }) => pren({ Cr: chromium, Mo: molybdenum, W: tungsten, N: nitrogen }),
      expression: "chromium + 3.3 * (molybdenum + 0.5 * tungsten) + 16 * nitrogen",
      unit: "1",
      tolerance: { abs: 0.05 },
      decimals: 2,
      explanation:
        "PREN = Cr + 3.3·(Mo + 0.5·W) + 16·N (ISO 15156-3 / NACE MR0175). Molybdenum counts 3.3 times chromium and nitrogen 16 times. It is a ranking index within a family: 316 (about 26) resists chloride pitting better than 304 (about 20), but the number is not a corrosion rate.",
    },
    {
      id: "440c-m23c6",
      kind: "single",
      prompt: "For a 440C-type steel (17 % Cr, 1.075 % C), what happens if you assume all the carbon forms pure Cr₂₃C₆?",
      options: [
        { id: "infeasible", text: "It is impossible: that carbide would need about 17.8 % Cr, more than the steel contains." },
        { id: "ok", text: "About 11 % chromium is left in the matrix." },
        { id: "zero-c", text: "The carbon dissolves in ferrite instead, so all 17 % Cr stays free." },
        { id: "same", text: "The result is the same as for Cr₇C₃, because both are chromium carbides." },
      ],
      answer: cr23c6FeasibleFor440C() ? "ok" : "infeasible",
      explanation:
        "1.075 × 16.595 = 17.84 % Cr would be needed — more than 17 %. The app refuses the case rather than report negative chromium. As pure Cr₇C₃ the same carbon ties up 10.86 % Cr and leaves 6.97 % in the matrix; real carbides contain iron and leave more, but annealed 440C is still far from stainless in behaviour.",
    },
    {
      id: "pren-statements",
      kind: "multiple",
      prompt: "Which statements about PREN are correct? Select all that apply.",
      options: [
        { id: "ranking", text: "It ranks grades within a family by resistance to chloride pitting." },
        { id: "rate", text: "It gives the corrosion rate of a blade in millimetres per year." },
        { id: "bulk", text: "It uses the bulk composition and ignores chromium tied up in carbides." },
        { id: "mo", text: "One percent of molybdenum counts 3.3 times as much as one percent of chromium." },
        { id: "carbon", text: "Carbon raises the PREN because it hardens the steel." },
      ],
      answers: ["ranking", "bulk", "mo"],
      explanation:
        "PREN is a linear ranking index from composition; it is not a rate. Because it uses the bulk analysis it flatters high-carbon stainless steels, whose carbides hold much of the chromium; the app offers a 'matrix PREN' with free chromium as a teaching extension. Carbon is not in the formula, and in practice it lowers pitting resistance by tying up chromium.",
    },
    {
      id: "austenitic",
      kind: "single",
      prompt: "Why can an austenitic stainless steel such as 304 not be hardened by quenching?",
      options: [
        { id: "nickel", text: "Nickel keeps the matrix face-centred cubic austenite down to room temperature, so no martensite forms." },
        { id: "carbon", text: "It contains too much carbon, which prevents martensite." },
        { id: "chromium", text: "Chromium makes every steel too soft to harden." },
        { id: "film", text: "The passive film stops heat from leaving during the quench." },
      ],
      answer: "nickel",
      explanation:
        "With about 8–12 % nickel, austenite is stable all the way to room temperature, so there is no phase change on cooling and no martensite. Austenitic grades harden only by cold work. Blade stainless steels are martensitic: little nickel and enough carbon to form martensite.",
    },
    {
      id: "matrix-chromium-task",
      kind: "sim-task",
      prompt:
        "In the alloy explorer, keep a D2-like carbon content — at least 1.5 % C — and change the rest of the composition so that the annealed matrix keeps at least 12 % chromium according to the app's carbide allocation model (chromium carbides with their model iron content). Submit the explorer's settings; any one of your alloys may meet the task.",
      simulation: "alloy",
      initial: { alloys: [{ grade: "440C" }, { grade: "D2" }] },
      check: (submitted) => {
        const alloys = alloysFromSubmission(submitted);
        if (alloys.length === 0) return { correct: false, detail: "No alloy could be read from the submitted settings." };
        const lines: string[] = [];
        let correct = false;
        for (const alloy of alloys) {
          const carbon = alloy.composition.C ?? 0;
          let matrixCr: number;
          try {
            matrixCr = allocateCarbides(alloy.composition).matrix.chromiumMassPct;
          } catch {
            lines.push(`${alloy.name}: the allocation model rejects this composition.`);
            continue;
          }
          const ok = carbon >= MIN_CARBON && matrixCr >= MIN_MATRIX_CR;
          correct ||= ok;
          lines.push(`${alloy.name}: ${fmt(carbon)} % C, matrix Cr ${fmt(matrixCr)} %${ok ? " — meets the task" : ""}.`);
        }
        return {
          correct,
          detail:
            lines.join(" ") +
            (correct
              ? " More chromium (or less carbon) leaves enough chromium in the matrix for a passive film."
              : ` The task needs C ≥ ${MIN_CARBON} % and matrix Cr ≥ ${MIN_MATRIX_CR} % in the same alloy.`),
        };
      },
      exampleSolution: { alloys: [{ grade: "D2" }, { name: "D2 with more chromium", C: 1.55, Cr: 18, Mo: 0.8, V: 0.9, Mn: 0.35, Si: 0.35 }], coldTreatmentC: -80 },
      explanation:
        "With 1.55 % C and about 11–20 % Cr the model forms M7C3 (after a little MC takes carbon for vanadium). With its model share of 50 % chromium on the metal sites, M7C3 ties up about 5 % Cr for every 1 % C, so D2's 11.5 % leaves only about 5.5 % in the matrix. Raising chromium to about 17–18 % keeps 12 % free — which is, roughly, how high-carbon stainless blade steels are composed. Lowering carbon works too, but the task kept it high to show what carbon costs.",
    },
  ],
});
