import { defineQuiz } from "../../shared/quiz/definition";
import { a3TempC, acmTempC, austeniteCarbonOnAcmMassPct, eutectoidPhaseFractions } from "../../shared/metallurgy";

export default defineQuiz({
  id: "iron-carbon-hardness-1",
  lessonSlug: "iron-and-carbon",
  title: "Iron, carbon and the phases of steel",
  passFraction: 0.7,
  questions: [
    {
      id: "carbon-capacity",
      kind: "single",
      prompt: "Which form of iron can dissolve up to about 2.1 % carbon?",
      options: [
        { id: "ferrite", text: "Ferrite (body-centred cubic α-iron)" },
        { id: "austenite", text: "Austenite (face-centred cubic γ-iron)" },
        { id: "cementite", text: "Cementite (Fe₃C)" },
        { id: "pearlite", text: "Pearlite" },
      ],
      answer: "austenite",
      explanation:
        "Austenite's largest interstices are roomy enough to take carbon atoms with modest strain, so it dissolves up to about 2.1 % C (2.11 % at 1148 °C on the ASM diagram, 2.14 % at 1147 °C in the textbook data). Ferrite holds at most about 0.022 %. Cementite is a compound with a fixed 6.7 % C, and pearlite is a mixture of ferrite and cementite, not a solution.",
      feedback: {
        ferrite: "Ferrite's interstices are small and awkwardly shaped: it holds at most about 0.022 % C.",
        cementite: "Cementite is a compound with a fixed composition (about 6.7 % C), not a phase that dissolves carbon.",
        pearlite: "Pearlite is a two-phase mixture of ferrite and cementite plates.",
      },
    },
    {
      id: "pearlite-fraction",
      kind: "numeric",
      prompt:
        "A plain carbon steel with {carbon} % C is cooled slowly to just below 727 °C. Using the textbook points (ferrite 0.022 % C, eutectoid 0.76 % C), what percentage of its mass is pearlite?",
      params: { carbon: { min: 0.2, max: 0.7, step: 0.05 } },
      compute: ({ carbon }) => 100 * eutectoidPhaseFractions(carbon, "callister").pearlite,
      expression: "100 * (carbon - 0.022) / (0.76 - 0.022)",
      unit: "%",
      tolerance: { abs: 0.5 },
      decimals: 1,
      explanation:
        "Take the tie line just below 727 °C from proeutectoid ferrite (0.022 % C) to the eutectoid austenite that becomes pearlite (0.76 % C). The lever rule gives pearlite = (C − 0.022)/(0.76 − 0.022); the rest is proeutectoid ferrite. For 0.35 % C that is 0.444, or 44.4 %.",
    },
    {
      id: "total-cementite",
      kind: "numeric",
      prompt:
        "A hypereutectoid steel with {carbon} % C is slowly cooled to just below 727 °C. Using the textbook points (ferrite 0.022 % C, cementite 6.70 % C), what percentage of its mass is cementite in total, counting the plates inside the pearlite?",
      params: { carbon: { min: 0.8, max: 1.4, step: 0.05 } },
      compute: ({ carbon }) => 100 * eutectoidPhaseFractions(carbon, "callister").totalCementite,
      expression: "100 * (carbon - 0.022) / (6.70 - 0.022)",
      unit: "%",
      tolerance: { abs: 0.3 },
      decimals: 2,
      explanation:
        "For total cementite the tie line runs from ferrite (0.022 % C) to cementite (6.70 % C): fraction = (C − 0.022)/(6.70 − 0.022). For 0.95 % C this gives 0.139, about 14 % of the mass — most of it inside the pearlite, only 3.2 % as proeutectoid cementite on the grain boundaries.",
    },
    {
      id: "acm-temperature",
      kind: "numeric",
      prompt:
        "Using the straight-line approximation Acm ≈ 727 + 314.18 × (C − 0.77), at what temperature has a steel with {carbon} % C dissolved all of its cementite?",
      params: { carbon: { min: 0.8, max: 1.5, step: 0.05 } },
      compute: ({ carbon }) => acmTempC(carbon),
      expression: "727 + 314.18 * (carbon - 0.77)",
      unit: "degC",
      acceptedUnits: ["K", "degF"],
      tolerance: { abs: 2 },
      decimals: 0,
      explanation:
        "The Acm line runs from the eutectoid (0.77 % C, 727 °C) to the greatest solubility of carbon in austenite (2.11 % C, 1148 °C) on the ASM diagram. A straight line between those points has a slope of 314.18 °C per % C. The real line curves slightly, so treat the answer as good to about ±15 °C.",
    },
    {
      id: "carbon-in-austenite",
      kind: "numeric",
      prompt:
        "A hypereutectoid blade steel (more carbon than the Acm line allows at this temperature) is held at {temp} °C, between A1 and Acm. Using the straight-line Acm, how much carbon does its austenite hold, in mass %?",
      params: { temp: { min: 740, max: 820, step: 10 } },
      compute: ({ temp }) => austeniteCarbonOnAcmMassPct(temp),
      expression: "0.77 + (temp - 727) / 314.18",
      unit: "wt%",
      tolerance: { abs: 0.01 },
      decimals: 3,
      explanation:
        "Between A1 and Acm the austenite is in equilibrium with cementite, so its carbon content is read off the Acm line at that temperature, not from the steel's overall carbon: C_γ = 0.77 + (T − 727)/314.18. At 760 °C that is 0.875 %; the steel's extra carbon stays in undissolved cementite.",
    },
    {
      id: "a3-temperature",
      kind: "numeric",
      prompt: "Using the Andrews fit A3 ≈ 910 − 203√C, above what temperature is a plain carbon steel with {carbon} % C entirely austenite?",
      params: { carbon: { min: 0.1, max: 0.7, step: 0.05 } },
      compute: ({ carbon }) => a3TempC(carbon),
      expression: "910 - 203 * sqrt(carbon)",
      unit: "degC",
      acceptedUnits: ["K", "degF"],
      tolerance: { abs: 2 },
      decimals: 0,
      explanation:
        "A3 falls from 910–912 °C for pure iron to 727 °C at the eutectoid. The Andrews (1965) fit 910 − 203√C (quoted from memory) gives 819 °C at 0.2 % C and 782 °C at 0.4 % C. Real heating lags a little above this line (Ac3), more so at fast heating rates.",
    },
    {
      id: "diagram-statements",
      kind: "multiple",
      prompt: "Which statements about the iron–carbon diagram are true? Select all that apply.",
      options: [
        { id: "equilibrium", text: "It shows the phases that are stable if you wait long enough (equilibrium)." },
        { id: "martensite", text: "Martensite appears on it as the phase stable below about 200 °C." },
        { id: "datasets", text: "Two respected data sets differ by about 0.01 % C or 1 °C because the lines are measured, not derived." },
        { id: "above-acm", text: "Above the Acm line a hypereutectoid steel is entirely austenite." },
        { id: "ferrite-077", text: "Ferrite can dissolve 0.77 % carbon at 727 °C." },
      ],
      answers: ["equilibrium", "datasets", "above-acm"],
      explanation:
        "The diagram is an equilibrium map, measured by many laboratories, so the textbook and ASM values differ slightly (0.76 vs 0.77 % C at the eutectoid, 1147 vs 1148 °C at the eutectic). Above Acm all cementite has dissolved. Martensite is not an equilibrium phase and does not appear on it, and ferrite holds only about 0.022 % C at 727 °C — 0.77 % is the eutectoid composition of austenite.",
      feedback: {
        martensite: "Martensite forms only when austenite is cooled too fast for carbon to diffuse; it is not an equilibrium phase.",
        "ferrite-077": "0.77 % C is the eutectoid composition of austenite. Ferrite holds at most about 0.022 %.",
      },
    },
  ],
});
