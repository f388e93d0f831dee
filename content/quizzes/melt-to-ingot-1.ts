import { defineQuiz } from "../../shared/quiz/definition";
import {
  chvorinovTimeMin,
  ironCarbonSolidusTempC,
  leverSolidComposition,
  scheilLiquidComposition,
  secondaryArmSpacingUm,
} from "../../shared/metallurgy";

export default defineQuiz({
  id: "melt-to-ingot-1",
  lessonSlug: "freezing-and-segregation",
  title: "Freezing range, partitioning and segregation",
  passFraction: 0.7,
  questions: [
    {
      id: "scheil-liquid",
      kind: "numeric",
      prompt:
        "A steel with {c0} % C freezes with a partition coefficient k = 0.34. Under the Scheil–Gulliver assumptions (no diffusion in the solid, well-mixed liquid), what is the carbon content of the remaining liquid when the solid fraction is {fs}?",
      params: { c0: { min: 0.5, max: 1.5, step: 0.1 }, fs: { min: 0.5, max: 0.9, step: 0.05 } },
      compute: ({ c0, fs }) => scheilLiquidComposition(c0, 0.34, fs),
      expression: "c0 * (1 - fs)^(0.34 - 1)",
      unit: "wt%",
      tolerance: { rel: 0.01 },
      decimals: 3,
      explanation:
        "C_L = C0·(1 − f_s)^(k − 1). For C0 = 1 % and f_s = 0.9 this is 4.57 %: the last liquid is more than four times richer than the average. For carbon this overstates segregation (carbon diffuses back in the solid), but for chromium, vanadium and molybdenum it is close to the truth.",
    },
    {
      id: "lever-solid",
      kind: "numeric",
      prompt:
        "A steel with {c0} % Cr freezes under equilibrium (lever-rule) conditions with k = 0.86 for chromium. What is the chromium content of the solid forming at the interface at solid fraction {fs}?",
      params: { c0: { min: 8, max: 14, step: 0.5 }, fs: { min: 0.1, max: 0.9, step: 0.1 } },
      compute: ({ c0, fs }) => leverSolidComposition(c0, 0.86, fs),
      expression: "0.86 * c0 / (1 - (1 - 0.86) * fs)",
      unit: "wt%",
      tolerance: { rel: 0.005 },
      decimals: 3,
      explanation:
        "Lever rule: C_s* = k·C0/(1 − (1 − k)·f_s). With complete diffusion the whole solid shares this composition at each moment and ends uniform at C0. For 12 % Cr at f_s = 0.9 it is 11.81 %, against 14.25 % under Scheil.",
    },
    {
      id: "chvorinov-cube",
      kind: "numeric",
      prompt:
        "A steel cube with {edge} cm edges freezes in a sand mould. Using Chvorinov's rule with B = 2 min/cm² and n = 2, how long does it take to freeze?",
      params: { edge: { min: 5, max: 50, step: 5 } },
      compute: ({ edge }) => chvorinovTimeMin({ volumeCm3: edge ** 3, areaCm2: 6 * edge ** 2, mouldConstantMinPerCm2: 2, exponent: 2 }).value,
      expression: "2 * (edge / 6)^2",
      unit: "min",
      acceptedUnits: ["h", "s"],
      tolerance: { rel: 0.01 },
      decimals: 2,
      explanation:
        "For a cube V/A = a³/(6a²) = a/6, so t_f = B·(a/6)². A 10 cm cube takes 5.6 min; a 50 cm cube 139 min. Ten times the size means a hundred times the time — and slower cooling, coarser dendrites and more segregation.",
    },
    {
      id: "arm-spacing",
      kind: "numeric",
      prompt:
        "Using the Won and Thomas fit λ₂ = 143.9·CR^(−0.3616)·C^(0.5501 − 1.996C) µm (for C above 0.15 %), what is the secondary dendrite arm spacing of a {carbon} % C steel cooled at {rate} °C/s?",
      params: { carbon: { min: 0.2, max: 1.0, step: 0.1 }, rate: { min: 0.1, max: 10, step: 0.1 } },
      compute: ({ carbon, rate }) => secondaryArmSpacingUm(rate, carbon).value,
      expression: "143.9 * rate^(-0.3616) * carbon^(0.5501 - 1.996 * carbon)",
      unit: "um",
      acceptedUnits: ["mm"],
      tolerance: { rel: 0.01 },
      decimals: 1,
      explanation:
        "Faster cooling gives finer dendrites: ten times the cooling rate shrinks λ₂ by 10^0.3616 ≈ 2.3. For 1 % C, 1 °C/s gives 144 µm and 0.1 °C/s gives 331 µm. The carbon dependence is not monotonic, so always evaluate the whole formula.",
    },
    {
      id: "solidus",
      kind: "numeric",
      prompt:
        "Using the app's straight-line austenite solidus for binary Fe–C, from the peritectic (0.17 % C, 1495 °C) to the eutectic (2.11 % C, 1148 °C), at what temperature does the last liquid of a {carbon} % C steel freeze under equilibrium?",
      params: { carbon: { min: 0.2, max: 2.0, step: 0.1 } },
      compute: ({ carbon }) => ironCarbonSolidusTempC(carbon),
      expression: "1495 - (1495 - 1148) / (2.11 - 0.17) * (carbon - 0.17)",
      unit: "degC",
      acceptedUnits: ["K"],
      tolerance: { abs: 1 },
      decimals: 1,
      explanation:
        "The austenite solidus falls from the peritectic (1495 °C at 0.17 % C) to the eutectic (1148 °C at 2.11 % C). The liquidus falls much less steeply, so the freezing range widens with carbon: about 61 °C at 0.5 % C, 105 °C at 1.0 % C and 149 °C at 1.5 % C.",
    },
    {
      id: "why-carbon-evens",
      kind: "single",
      prompt: "During the freezing of a tool-steel ingot, carbon nearly follows the lever rule while vanadium and chromium follow Scheil. Why?",
      options: [
        { id: "interstitial", text: "Carbon is an interstitial and diffuses thousands of times faster in the solid, so its back-diffusion Fourier number is large." },
        { id: "k", text: "Carbon has a partition coefficient above 1." },
        { id: "evaporates", text: "Carbon leaves the ingot as gas during freezing." },
        { id: "liquid", text: "Vanadium and chromium cannot dissolve in the liquid." },
      ],
      answer: "interstitial",
      explanation:
        "The Fourier number α = D_s·t_f/L² compares diffusion in the solid with the freezing time and arm spacing. In the worked example α ≈ 8.5 for carbon (nearly lever rule) but about 0.01 for chromium and 0.0035 for vanadium (Scheil). The carbide formers are exactly the elements that cannot even themselves out.",
    },
    {
      id: "bigger-ingot",
      kind: "multiple",
      prompt: "Compared with a small, fast-frozen casting of the same steel, what happens in a very large ingot? Select all that apply.",
      options: [
        { id: "longer", text: "It takes much longer to freeze." },
        { id: "coarser", text: "Its dendrite arm spacing is coarser." },
        { id: "macro", text: "Enriched liquid can flow and leave macrosegregation over centimetres." },
        { id: "finer", text: "Its interdendritic carbides are finer." },
        { id: "less-v", text: "Its last liquid is poorer in vanadium." },
      ],
      answers: ["longer", "coarser", "macro"],
      explanation:
        "Chvorinov's square law makes large ingots freeze slowly; slow cooling coarsens the dendrites; and the enriched liquid has time to flow in the mushy zone. The last liquid is richer in vanadium and carbon, and its carbides coarser — the reason very high vanadium needs the powder route.",
    },
    {
      id: "vanadium-limit",
      kind: "single",
      prompt: "Roughly above what vanadium content does conventional ingot casting of tool steels become problematic, according to trade practice?",
      options: [
        { id: "v45", text: "About 4–5 % V" },
        { id: "v1", text: "About 0.5–1 % V" },
        { id: "v12", text: "About 12–14 % V" },
        { id: "v25", text: "About 25 % V" },
      ],
      answer: "v45",
      explanation:
        "Above roughly 4–5 % V, ingots develop coarse primary and eutectic MC networks in the last liquid that forging cannot break up. Steels with about 10–14 % V are made by powder metallurgy. This is common practice, not a published limit.",
    },
  ],
});
