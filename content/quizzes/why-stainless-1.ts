import { defineQuiz } from "../../shared/quiz/definition";
import {
  chromiumAtomFraction,
  chromiumMassPctFromAtomFraction,
  chromiumTiedInCarbide,
  InfeasibleError,
  isStainless,
  passiveFilmThicknessNm,
  percolationThreshold,
} from "../../shared/metallurgy";
import { fmt, readChoice, readNumber } from "./support/sim-params";

/** Margin above p_c the task asks for, so a finite lattice reliably shows a spanning network. */
const MARGIN = 0.01;
const MIN_CARBON = 0.3;

/** Free-Cr atom fraction of the matrix for the passive-film simulation's alloy (pure Cr carbide, worst case). */
function freeChromium(crMassPct: number, cMassPct: number, carbide: "M23C6" | "M7C3"): { freeCr: number; x: number } {
  try {
    const { freeCrMassPct } = chromiumTiedInCarbide({ Cr: crMassPct, C: cMassPct }, carbide);
    const freeCr = Math.min(100, freeCrMassPct);
    return { freeCr, x: chromiumAtomFraction(freeCr) };
  } catch (err) {
    if (err instanceof InfeasibleError) return { freeCr: 0, x: 0 };
    throw err;
  }
}

const bccNearestTwo = percolationThreshold("bcc", 2)!;

export default defineQuiz({
  id: "why-stainless-1",
  lessonSlug: "the-passive-film",
  title: "The chromium-oxide film",
  passFraction: 0.7,
  questions: [
    {
      id: "definition",
      kind: "single",
      prompt: "How does EN 10088-1 define a stainless steel?",
      options: [
        { id: "en", text: "At least 10.5 % chromium and at most 1.2 % carbon by mass" },
        { id: "trade", text: "At least 12–13 % chromium, whatever the carbon" },
        { id: "nickel", text: "At least 8 % nickel and 18 % chromium" },
        { id: "test", text: "Any steel that passes a salt-spray test for 24 hours" },
      ],
      answer: "en",
      explanation:
        "The standard defines stainless steel by composition alone: Cr ≥ 10.5 % and C ≤ 1.2 %. It is a catalogue definition, not a performance promise. The 12–13 % figure is trade practice for blades, and 18/8 describes one austenitic family (304).",
    },
    {
      id: "which-are-stainless",
      kind: "multiple",
      prompt: "Which of these compositions meet the EN 10088-1 definition of stainless steel? Select all that apply.",
      options: [
        { id: "a", text: "10.5 % Cr, 0.08 % C" },
        { id: "b", text: "10.4 % Cr, 0.05 % C" },
        { id: "c", text: "17.0 % Cr, 1.20 % C" },
        { id: "d", text: "17.0 % Cr, 1.25 % C" },
        { id: "e", text: "13.0 % Cr, 0.30 % C" },
      ],
      answers: (
        [
          ["a", { Cr: 10.5, C: 0.08 }],
          ["b", { Cr: 10.4, C: 0.05 }],
          ["c", { Cr: 17.0, C: 1.2 }],
          ["d", { Cr: 17.0, C: 1.25 }],
          ["e", { Cr: 13.0, C: 0.3 }],
        ] as const
      )
        .filter(([, comp]) => isStainless(comp))
        .map(([id]) => id),
      explanation:
        "Both limits must hold: Cr ≥ 10.5 and C ≤ 1.2. 10.4 % Cr misses the chromium limit by 0.1; 1.25 % C exceeds the carbon limit even with 17 % Cr. The limits are inclusive, so 10.5 % Cr and 1.20 % C both qualify.",
    },
    {
      id: "atom-fraction",
      kind: "numeric",
      prompt: "A binary iron–chromium alloy contains {cr} mass % chromium. What is its chromium atom fraction? (M_Cr = 51.996 g/mol, M_Fe = 55.845 g/mol)",
      params: { cr: { min: 9, max: 20, step: 0.5 } },
      compute: ({ cr }) => chromiumAtomFraction(cr),
      expression: "(cr / 51.9961) / (cr / 51.9961 + (100 - cr) / 55.845)",
      unit: "1",
      tolerance: { abs: 0.001 },
      decimals: 4,
      explanation:
        "Convert masses to moles: x = (w/M_Cr)/(w/M_Cr + (100 − w)/M_Fe). Chromium atoms are lighter than iron atoms, so the atom fraction is a little higher than the mass fraction: 10.5 % Cr is 0.1119, 12 % is 0.1277.",
    },
    {
      id: "threshold-mass",
      kind: "numeric",
      prompt:
        "The site-percolation threshold of the bcc lattice counting first and second neighbours is about p_c = 0.175. What chromium content (mass %) of a binary Fe–Cr alloy has that atom fraction?",
      compute: () => chromiumMassPctFromAtomFraction(bccNearestTwo.pc),
      unit: "wt%",
      tolerance: { abs: 0.1 },
      decimals: 2,
      explanation:
        "Invert the conversion: w = 100·x·M_Cr/(x·M_Cr + (1 − x)·M_Fe) = 16.5 %. That is above the 12–13 % practice and well above the 10.5 % definition; the simple cubic model with two shells gives 12.9 %. Which shells are right is an open question — these are competing model choices.",
    },
    {
      id: "film-thickness",
      kind: "numeric",
      prompt:
        "Using the app's illustrative direct-logarithmic law L = 1.0 + 0.25·log10(1 + t/1 s) nm, how thick is the passive film {hours} hours after a fresh surface meets air?",
      params: { hours: { min: 1, max: 48, step: 1 } },
      compute: ({ hours }) => passiveFilmThicknessNm(hours * 3600, "direct-log"),
      expression: "1.0 + 0.25 * log10(1 + hours * 3600)",
      unit: "nm",
      tolerance: { abs: 0.01 },
      decimals: 3,
      explanation:
        "Convert to seconds first: t = hours × 3600. Each tenfold increase in time adds only 0.25 nm, so the film sits in the measured 1–3 nm range from seconds to a year (1.89 nm after an hour, 2.23 nm after a day). The parameters are illustrative app choices, not a fit to any grade.",
    },
    {
      id: "open-question",
      kind: "single",
      prompt: "Which statement about the percolation model of the stainless threshold is best supported by the evidence in the lesson?",
      options: [
        {
          id: "open",
          text: "It explains why the threshold is sharp, but which neighbour shells count as connected is not settled; bcc with two shells (≈16.5 %) and simple cubic with two shells (≈12.9 %) are competing choices.",
        },
        { id: "surface", text: "A purely two-dimensional surface model with first neighbours reproduces the observed 12–13 % exactly." },
        { id: "bcc-nn", text: "The bcc lattice with first neighbours only (≈23 %) is the accepted model." },
        { id: "disproved", text: "Percolation has been disproved; the threshold is set only by the standard." },
      ],
      answer: "open",
      explanation:
        "Only three-dimensional models with extended neighbour shells land near the observed range; 2-D surface models give over 50 % Cr and bcc first neighbours 23 %. Observations range from 12–13 % (practice) to 17–18 % (graded films), and a 2021 theory adds the depth dissolved before passivation. The app therefore treats the shells as a model choice.",
    },
    {
      id: "spanning-task",
      kind: "sim-task",
      prompt:
        "In the passive-film simulation, with bulk connectivity and at least 0.3 % carbon in the alloy, set chromium (and the other controls as you like) so that the chromium left free in the matrix has an atom fraction at least 0.01 above the percolation threshold of the lattice and neighbour shells you have chosen. Submit the simulation's settings.",
      simulation: "passive-film",
      initial: { crMassPct: 13, cMassPct: 0.3, carbide: "M7C3", neighbours: 2, connectivity: "bulk", view: "spanning", seed: 7 },
      check: (submitted) => {
        const cr = readNumber(submitted, "crMassPct", 13, { min: 0, max: 30 });
        const c = readNumber(submitted, "cMassPct", 0.05, { min: 0, max: 1.2 });
        const carbide = readChoice(submitted, "carbide", ["M23C6", "M7C3"] as const, "M23C6");
        const neighbours = readChoice(submitted, "neighbours", [1, 2] as const, 2);
        const lattice = readChoice(submitted, "lattice", ["bcc", "sc"] as const, "bcc");
        const connectivity = readChoice(submitted, "connectivity", ["bulk", "thin-layer"] as const, "bulk");
        if (cr === null || c === null || carbide === null || neighbours === null || lattice === null || connectivity === null) {
          return { correct: false, detail: "The submitted settings are incomplete or outside the simulation's ranges." };
        }
        if (c < MIN_CARBON) {
          return { correct: false, detail: `The task asks for at least ${MIN_CARBON} % carbon; you submitted ${fmt(c)} %. Carbon is what makes the task interesting: it ties chromium up in carbide.` };
        }
        if (connectivity !== "bulk") {
          return { correct: false, detail: "The task asks for bulk connectivity. (A thin layer needs more chromium still — the threshold rises as the layer thins.)" };
        }
        const pc = percolationThreshold(lattice, neighbours)!.pc;
        const { freeCr, x } = freeChromium(cr, c, carbide);
        const needed = pc + MARGIN;
        const correct = x >= needed;
        return {
          correct,
          detail:
            `${fmt(cr, 1)} % Cr with ${fmt(c)} % C as pure ${carbide} leaves ${fmt(freeCr)} % free Cr in the matrix, an atom fraction of ${fmt(x, 4)}. ` +
            `The ${lattice} lattice with ${neighbours === 1 ? "first neighbours" : "first and second neighbours"} has p_c = ${fmt(pc, 4)}, so the task needs at least ${fmt(needed, 4)}. ` +
            (correct ? "The chromium network spans: a protective film can hold together." : "Not enough: raise chromium, lower carbon or choose a carbide that ties up less chromium."),
        };
      },
      exampleSolution: { crMassPct: 24, cMassPct: 0.3, carbide: "M7C3", neighbours: 2, lattice: "bcc", connectivity: "bulk", environment: "humid", seed: 7, view: "spanning" },
      explanation:
        "Carbon in pure Cr₇C₃ ties up about 10 times its mass of chromium (16.6 times as Cr₂₃C₆), so with 0.3 % C you need roughly 3 % more chromium than in a carbon-free alloy. With bcc and two shells (p_c ≈ 0.175, about 16.5 % Cr in the matrix) plus the 0.01 margin, about 21 % bulk chromium is needed as M7C3. The same logic explains why high-carbon stainless blades need more than the trade's 12–13 %.",
    },
  ],
});
