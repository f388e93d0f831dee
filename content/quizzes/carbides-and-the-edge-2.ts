import { defineQuiz } from "../../shared/quiz/definition";
import { andrewsMsC, coarseningRateRatio, lswMeanRadius } from "../../shared/metallurgy";

/** Activation energy for diffusion of vanadium in austenite, J/mol (radiotracer data, science-reference §2.5). */
const Q_VANADIUM_J_PER_MOL = 272_400;

export default defineQuiz({
  id: "carbides-and-the-edge-2",
  lessonSlug: "tool-steels-and-toughness",
  title: "Tool steels, carbide growth and the toughness trade",
  passFraction: 0.7,
  questions: [
    {
      id: "lsw-radius",
      kind: "numeric",
      prompt:
        "Carbides with a mean radius of {r0} µm coarsen by the LSW law with a rate constant of 0.01 µm³/h. What is their mean radius after {hours} hours?",
      params: { r0: { min: 0.3, max: 1.0, step: 0.1 }, hours: { min: 50, max: 1000, step: 50 } },
      compute: ({ r0, hours }) => lswMeanRadius(r0, 0.01, hours),
      expression: "cbrt(r0^3 + 0.01 * hours)",
      unit: "um",
      acceptedUnits: ["nm", "mm"],
      tolerance: { rel: 0.01 },
      decimals: 3,
      explanation:
        "LSW: r̄³ − r̄₀³ = k·t, so r̄ = (r̄₀³ + k·t)^(1/3). From 0.5 µm, 100 h gives 1.04 µm and 1000 h gives 2.16 µm: ten times the time, about twice the size, once the starting size is forgotten.",
    },
    {
      id: "rate-ratio",
      kind: "numeric",
      prompt:
        "Vanadium-controlled coarsening has an activation energy of 272.4 kJ/mol. By what factor is the rate constant k = k₀·exp(−Q/RT) larger at {temp} °C than at {temp} °C minus 50 °C?",
      params: { temp: { min: 1000, max: 1200, step: 10 } },
      compute: ({ temp }) => coarseningRateRatio(Q_VANADIUM_J_PER_MOL, temp, temp - 50),
      expression: "exp(-272400 / 8.314462618 * (1 / (temp + 273.15) - 1 / (temp - 50 + 273.15)))",
      unit: "1",
      tolerance: { rel: 0.01 },
      decimals: 3,
      explanation:
        "k(T)/k(T_ref) = exp[−(Q/R)·(1/T − 1/T_ref)] with temperatures in kelvin. Fifty degrees near 1000–1200 °C multiplies the coarsening rate by roughly 2–3; a hundred degrees by 5–7. Long soaks and repeated high heats coarsen carbides far more than extra time at a lower temperature.",
    },
    {
      id: "stable-carbide",
      kind: "single",
      prompt: "Which carbide hardly dissolves at normal hardening temperatures, so that raising the temperature changes its amount very little?",
      options: [
        { id: "mc", text: "MC (vanadium carbide)" },
        { id: "m3c", text: "M3C (cementite)" },
        { id: "m23c6", text: "M23C6" },
        { id: "m7c3", text: "M7C3" },
      ],
      answer: "mc",
      explanation:
        "MC is the most stable carbide in blade steels. Cementite dissolves as the steel crosses Acm; chromium carbides dissolve progressively with temperature; vanadium carbide stays, pinning grain boundaries and resisting wear. That is why a few tenths of a percent of vanadium refine the grain.",
    },
    {
      id: "chipping",
      kind: "multiple",
      prompt: "For a long blade that takes heavy impacts, which of these make chipping and breakage more likely? Select all that apply.",
      options: [
        { id: "volume", text: "A larger volume fraction of carbide" },
        { id: "size", text: "Larger carbides" },
        { id: "hardness", text: "A harder, less tempered matrix" },
        { id: "temper-higher", text: "Tempering at a higher temperature" },
        { id: "fine-grain", text: "A fine austenite grain size" },
      ],
      answers: ["volume", "size", "hardness"],
      explanation:
        "Cracks start at large carbides and link up more easily when carbides are close together; a very hard matrix does not yield to blunt a crack tip. Tempering higher and keeping grains fine both raise toughness. This is why long blades use low-carbide spring steels at moderate hardness.",
      feedback: {
        "temper-higher": "Tempering higher lowers hardness and raises toughness: it makes chipping less likely.",
        "fine-grain": "Fine grains raise toughness.",
      },
    },
    {
      id: "secondary-hardening",
      kind: "single",
      prompt: "What causes secondary hardening when a high-speed steel such as M2 is tempered near 500–600 °C?",
      options: [
        { id: "precipitates", text: "Very fine carbides of molybdenum, tungsten and vanadium precipitate in the martensite." },
        { id: "coarsening", text: "The primary carbides coarsen and become harder." },
        { id: "ms", text: "The martensite-start temperature rises above the tempering temperature." },
        { id: "oxide", text: "A hard oxide layer grows on the surface." },
      ],
      answer: "precipitates",
      explanation:
        "Near 500–600 °C the substitutional alloying atoms become mobile enough to form nanometre-scale M2C and MC precipitates, which harden the matrix more than the loss of carbon softened it. Retained austenite also transforms on cooling, which is why such steels are tempered two or three times.",
    },
    {
      id: "tungsten-equivalent",
      kind: "single",
      prompt: "The allocation model uses the 'tungsten equivalent' W + 2·Mo. Why does molybdenum count double?",
      options: [
        { id: "atoms", text: "A molybdenum atom weighs about half as much as a tungsten atom, so each percent of Mo supplies about twice as many atoms." },
        { id: "hardness", text: "Molybdenum carbide is twice as hard as tungsten carbide." },
        { id: "price", text: "Molybdenum costs half as much as tungsten." },
        { id: "melting", text: "Molybdenum melts at half the temperature of tungsten." },
      ],
      answer: "atoms",
      explanation:
        "Molar masses: Mo 95.95 g/mol, W 183.84 g/mol. Carbide formation and solid-solution effects go by atoms, so 1 % Mo does roughly what 2 % W does. High-speed steels can therefore substitute molybdenum for much of their tungsten.",
    },
    {
      id: "stainless-ms",
      kind: "numeric",
      prompt:
        "After hardening, a high-carbon stainless blade has {carbon} % C, {chromium} % Cr, 0.5 % Mn and 0.5 % Mo in solution. What Ms does the Andrews linear formula give (knowing the chromium is far outside its calibration)?",
      params: { carbon: { min: 0.4, max: 0.6, step: 0.02 }, chromium: { min: 10, max: 16, step: 0.5 } },
      compute: ({ carbon, chromium }) => andrewsMsC({ C: carbon, Cr: chromium, Mn: 0.5, Mo: 0.5 }),
      expression: "539 - 423 * carbon - 30.4 * 0.5 - 12.1 * chromium - 7.5 * 0.5",
      unit: "degC",
      acceptedUnits: ["K"],
      tolerance: { abs: 1 },
      decimals: 1,
      explanation:
        "Ms = 539 − 423C − 30.4Mn − 12.1Cr − 7.5Mo with the contents in solution. Fifteen percent chromium alone lowers Ms by about 180 °C, so Ms lands near or below 100 °C and a lot of austenite is retained at room temperature. The number is a trend (Andrews fitted steels with under about 5 % Cr), but it is the reason schedules for high-carbon stainless steels often include cold treatment.",
    },
  ],
});
