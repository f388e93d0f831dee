import { defineQuiz } from "../../shared/quiz/definition";
import {
  andrewsMsC,
  equivalentTemperingHours,
  martensiteHardnessHrc,
  retainedAusteniteFraction,
  temperingParameter,
} from "../../shared/metallurgy";

export default defineQuiz({
  id: "iron-carbon-hardness-2",
  lessonSlug: "hardening-and-tempering",
  title: "Hardening and tempering",
  passFraction: 0.7,
  questions: [
    {
      id: "martensite-hardness",
      kind: "numeric",
      prompt:
        "Using the ASTM A255 initial-hardness polynomial, what is the as-quenched hardness of fully martensitic steel with {carbon} % carbon in solution?",
      params: { carbon: { min: 0.2, max: 0.7, step: 0.05 } },
      compute: ({ carbon }) => martensiteHardnessHrc(carbon),
      expression:
        "33.087 + 50.723 * carbon + 33.662 * carbon^2 - 2.7048 * carbon^3 - 107.02 * carbon^4 + 43.523 * carbon^5",
      unit: "HRC",
      tolerance: { abs: 0.5 },
      decimals: 1,
      explanation:
        "HRC = 33.087 + 50.723C + 33.662C² − 2.7048C³ − 107.02C⁴ + 43.523C⁵ with C the carbon in solution. It gives 44.4 HRC at 0.2 % C, 56.3 at 0.4 % and 64.6 at 0.6 %. The curve flattens above about 0.6 %: more carbon lowers Ms and leaves more soft retained austenite.",
    },
    {
      id: "andrews-ms",
      kind: "numeric",
      prompt:
        "A steel is quenched with {carbon} % C, {manganese} % Mn and {chromium} % Cr in solution in its austenite. Using the Andrews (1965) linear formula, what is its martensite-start temperature Ms?",
      params: {
        carbon: { min: 0.2, max: 0.6, step: 0.05 },
        manganese: { min: 0.3, max: 1.0, step: 0.05 },
        chromium: { min: 0, max: 1.5, step: 0.1 },
      },
      compute: ({ carbon, manganese, chromium }) => andrewsMsC({ C: carbon, Mn: manganese, Cr: chromium }),
      expression: "539 - 423 * carbon - 30.4 * manganese - 12.1 * chromium",
      unit: "degC",
      acceptedUnits: ["K"],
      tolerance: { abs: 1 },
      decimals: 1,
      explanation:
        "Ms = 539 − 423C − 30.4Mn − 17.7Ni − 12.1Cr − 7.5Mo (°C, mass % in solution). Carbon dominates: each 0.1 % C lowers Ms by 42 °C. Use the composition in solution in the austenite, not the bulk analysis, because carbon and chromium locked in undissolved carbides do not lower Ms.",
    },
    {
      id: "retained-austenite",
      kind: "numeric",
      prompt:
        "A steel with Ms = {ms} °C is quenched to {quench} °C. Using the Koistinen–Marburger equation with 0.011 per kelvin, what percentage of the structure is retained austenite?",
      params: { ms: { min: 150, max: 300, step: 5 }, quench: { min: -80, max: 40, step: 10 } },
      compute: ({ ms, quench }) => 100 * retainedAusteniteFraction(ms, quench),
      expression: "100 * exp(-0.011 * (ms - quench))",
      unit: "%",
      tolerance: { abs: 0.5 },
      decimals: 1,
      explanation:
        "Below Ms the martensite fraction is f_M = 1 − exp(−0.011(Ms − T)), so the retained austenite is exp(−0.011(Ms − T)). For Ms = 177.8 °C quenched to 20 °C that is 17.6 %; carried on to −80 °C it falls to 5.9 % — the idea behind cold treatment.",
    },
    {
      id: "tempering-parameter",
      kind: "numeric",
      prompt:
        "A blade is tempered at {temp} °C for {hours} hours. What is its Hollomon–Jaffe tempering parameter P = T_K·(20 + log10 t_h)?",
      params: { temp: { min: 150, max: 300, step: 10 }, hours: { min: 1, max: 4, step: 0.5 } },
      compute: ({ temp, hours }) => temperingParameter(temp, hours).value,
      expression: "(temp + 273.15) * (20 + log10(hours))",
      unit: "1",
      tolerance: { rel: 0.002 },
      decimals: 0,
      explanation:
        "Convert the temperature to kelvin and the time to hours, then P = T_K·(20 + log10 t). For 200 °C and 2 hours: 473.15 × 20.301 = 9605.4. Using minutes or °C gives a meaningless number: the constant 20 belongs with hours.",
    },
    {
      id: "equivalent-time",
      kind: "numeric",
      prompt:
        "A tempering step of {hours} hours at {temp} °C has to be moved to an oven that can only reach {temp} °C minus 20 °C. Using the Hollomon–Jaffe parameter with C = 20, how long must the blade stay in the cooler oven?",
      params: { temp: { min: 180, max: 260, step: 10 }, hours: { min: 1, max: 3, step: 0.5 } },
      compute: ({ temp, hours }) => equivalentTemperingHours(temperingParameter(temp, hours).value, temp - 20).value,
      expression: "10^((temp + 273.15) * (20 + log10(hours)) / (temp - 20 + 273.15) - 20)",
      unit: "h",
      acceptedUnits: ["min"],
      tolerance: { rel: 0.03 },
      decimals: 2,
      explanation:
        "First P = (T1 + 273.15)·(20 + log10 t1); then t2 = 10^(P/(T2 + 273.15) − 20). Twenty degrees lower costs a factor of roughly seven to eight in time in this range: 2 h at 200 °C becomes 15.7 h at 180 °C.",
    },
    {
      id: "cold-treatment",
      kind: "single",
      prompt: "What does a cold treatment (for example to −80 °C) right after the quench do, and what must follow it?",
      options: [
        { id: "ra-to-martensite", text: "It turns more retained austenite into martensite; the blade must then be tempered." },
        { id: "temper", text: "It tempers the martensite, so no further tempering is needed." },
        { id: "refine-carbides", text: "It dissolves carbides into the matrix; the blade must then be re-hardened." },
        { id: "relieve", text: "It relieves quenching stresses; nothing needs to follow." },
      ],
      answer: "ra-to-martensite",
      explanation:
        "Martensite keeps forming as the steel cools further below Ms, so continuing the quench below room temperature converts more of the retained austenite. The new martensite is untempered and brittle, so tempering must follow. Cold treatment is most useful for steels with a low Ms such as high-carbon stainless grades.",
    },
    {
      id: "hardenability",
      kind: "multiple",
      prompt: "Which of these increase a steel's hardenability — the depth to which a given quench hardens it? Select all that apply.",
      options: [
        { id: "mn", text: "Manganese dissolved in the austenite" },
        { id: "cr", text: "Chromium dissolved in the austenite" },
        { id: "mo", text: "Molybdenum dissolved in the austenite" },
        { id: "thin", text: "Grinding the blade thinner before hardening" },
        { id: "faster-quench", text: "Using a faster quenchant" },
      ],
      answers: ["mn", "cr", "mo"],
      explanation:
        "Hardenability is a property of the steel: alloying elements dissolved in austenite slow the formation of pearlite, so martensite forms deeper in a section (ASTM A255 multiplies the ideal critical diameter by a factor for each). A thinner blade or a faster quench changes how fast the part cools — they help it harden, but they do not change the steel's hardenability.",
      feedback: {
        thin: "A thinner section cools faster and hardens more easily, but the steel's hardenability is unchanged.",
        "faster-quench": "A faster quench changes the cooling, not the steel. Hardenability is a property of the composition and grain size.",
      },
    },
    {
      id: "hardness-plateau",
      kind: "single",
      prompt: "Why does as-quenched hardness stop rising (and can even fall) once carbon in solution passes about 0.7 %?",
      options: [
        { id: "ra", text: "More carbon lowers Ms, so more soft austenite is retained after the quench." },
        { id: "graphite", text: "The extra carbon forms graphite, which is soft." },
        { id: "ferrite", text: "The extra carbon turns martensite back into ferrite." },
        { id: "cementite", text: "Cementite is softer than martensite, and all extra carbon becomes cementite during the quench." },
      ],
      answer: "ra",
      explanation:
        "Each extra 0.01 % C in solution lowers Ms by about 4 °C (Andrews). With a lower Ms, the quench to room temperature leaves more austenite untransformed (Koistinen–Marburger). The martensite itself keeps getting harder, but the growing share of soft retained austenite offsets it.",
    },
  ],
});
