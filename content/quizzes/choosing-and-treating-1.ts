import { defineQuiz } from "../../shared/quiz/definition";
import {
  allocateCarbides,
  equivalentTemperingHours,
  isStainless,
  pren,
  soluteDiffusivityInSolidM2PerS,
  temperingConstantForCarbon,
  temperingParameter,
} from "../../shared/metallurgy";
import { alloysFromSubmission, fmt } from "./support/sim-params";

const MIN_CARBON = 0.6;
const MIN_MATRIX_CR = 12;
const MIN_PREN = 18;

/** Equivalent time at T − 20 °C for a 2-hour temper at T, with the carbon-dependent Hollomon–Jaffe constant. */
function equivalentHoursWithCarbonConstant(carbon: number, tempC: number): number {
  const constant = temperingConstantForCarbon(carbon);
  const p = temperingParameter(tempC, 2, constant).value;
  return equivalentTemperingHours(p, tempC - 20, constant).value;
}

export default defineQuiz({
  id: "choosing-and-treating-1",
  lessonSlug: "steel-for-the-job",
  title: "Choosing and treating a steel for the job",
  passFraction: 0.7,
  questions: [
    {
      id: "long-blade",
      kind: "single",
      prompt: "Which choice suits a 50 cm orchard blade that will be swung hard into brambles and branches?",
      options: [
        { id: "spring", text: "A low-carbide spring steel such as 5160, tempered to the mid-50s HRC" },
        { id: "a11", text: "A11 at 63 HRC, for the highest edge-retention index" },
        { id: "440c", text: "440C at 60 HRC, so that it never rusts" },
        { id: "d2", text: "D2 at 61 HRC, for its large volume of chromium carbide" },
      ],
      answer: "spring",
      explanation:
        "A long blade is loaded by impact and bending, so toughness comes first: few, small carbides and a moderately hard matrix. A11, D2 and 440C carry 13–21 % carbide by volume and would chip or break at high hardness. Corrosion is handled with oil and a sheath that drains.",
    },
    {
      id: "layer-count",
      kind: "numeric",
      prompt:
        "A pattern-welded billet starts as a stack of {layers} layers. It is drawn out, cut into 4 pieces and restacked, {restacks} times in all. How many layers does it have at the end?",
      params: { layers: { min: 5, max: 15, step: 2 }, restacks: { min: 2, max: 4, step: 1 } },
      compute: ({ layers, restacks }) => layers * 4 ** restacks,
      expression: "layers * 4^restacks",
      unit: "1",
      tolerance: { abs: 0.5 },
      decimals: 0,
      explanation:
        "Each cut-and-restack into 4 pieces multiplies the layer count by 4, so the count grows geometrically: n = n0·4^r. Seven layers restacked three times gives 448; fifteen layers restacked four times gives 3840.",
    },
    {
      id: "carbon-diffusion",
      kind: "numeric",
      prompt:
        "A pattern-welded billet spends {minutes} minutes at {temp} °C. Using the diffusion coefficient of carbon in austenite from the course's data (D = 0.0761 cm²/s × exp(−32160 cal/mol / RT)), what is the characteristic diffusion distance √(D·t) of carbon, in micrometres?",
      params: { minutes: { min: 5, max: 30, step: 5 }, temp: { min: 1000, max: 1200, step: 50 } },
      compute: ({ minutes, temp }) => Math.sqrt(soluteDiffusivityInSolidM2PerS("C", temp, "gamma") * minutes * 60) * 1e6,
      unit: "um",
      acceptedUnits: ["mm"],
      tolerance: { rel: 0.03 },
      decimals: 0,
      explanation:
        "At 1100 °C carbon diffuses in austenite with D ≈ 5.8 × 10⁻¹¹ m²/s, so ten minutes gives √(D·t) ≈ 190 µm — far more than the thickness of a layer in a billet of a few hundred layers. Chromium moves only about 2.7 µm in the same time. Carbon evens out between layers; nickel and chromium stay put and keep the pattern.",
    },
    {
      id: "tempering-carbon-constant",
      kind: "numeric",
      prompt:
        "A {carbon} % C steel is to be tempered for 2 hours at {temp} °C, but the only free oven runs 20 °C cooler. Using the Hollomon–Jaffe parameter with the carbon-dependent constant C = 21.3 − 5.8 × (% C), how many hours are needed in the cooler oven?",
      params: { carbon: { min: 0.6, max: 1.0, step: 0.1 }, temp: { min: 200, max: 260, step: 20 } },
      compute: ({ carbon, temp }) => equivalentHoursWithCarbonConstant(carbon, temp),
      expression: "10^((temp + 273.15) * (21.3 - 5.8 * carbon + log10(2)) / (temp - 20 + 273.15) - (21.3 - 5.8 * carbon))",
      unit: "h",
      acceptedUnits: ["min"],
      tolerance: { rel: 0.03 },
      decimals: 2,
      explanation:
        "With C = 21.3 − 5.8·(% C), P = T1·(C + log10 2) and t2 = 10^(P/T2 − C), temperatures in kelvin. A smaller constant (higher carbon) makes the trade between temperature and time a little gentler than with C = 20, but twenty degrees still costs a large factor in time.",
    },
    {
      id: "stainless-welding",
      kind: "multiple",
      prompt: "Why is stainless steel much harder to forge-weld at an open forge than a plain carbon steel? Select all that apply.",
      options: [
        { id: "refractory", text: "Its chromium oxide melts only around 2400 °C, far above forge temperatures." },
        { id: "flux", text: "Ordinary fluxes such as borax dissolve chromium oxide poorly." },
        { id: "reforms", text: "The chromium-rich oxide re-forms almost instantly wherever the hot surface meets air." },
        { id: "no-carbon", text: "Stainless steels contain no carbon, and carbon is needed for atoms to bond." },
        { id: "nickel", text: "All stainless steels contain nickel, which stops iron atoms from bonding." },
      ],
      answers: ["refractory", "flux", "reforms"],
      explanation:
        "Forge welding needs clean metal to meet clean metal. Iron's scale (mainly FeO) melts near 1370 °C and dissolves in borax into a runny slag that the hammer squeezes out. Chromium's oxide is refractory, dissolves poorly in flux and re-forms at once — the same film that protects a stainless blade in the kitchen. Stainless laminates are made with air kept out (sealed cans, vacuum, HIP).",
      feedback: {
        "no-carbon": "Many stainless steels contain carbon (440C has about 1 %), and carbon is not what makes atoms bond.",
        nickel: "Martensitic blade stainless steels contain little or no nickel.",
      },
    },
    {
      id: "carbon-vs-nickel",
      kind: "single",
      prompt: "In a pattern-welded billet of a plain high-carbon steel and a nickel-bearing steel, carbon evens out between the layers while nickel stays put. Why?",
      options: [
        { id: "interstitial", text: "Carbon is an interstitial solute and diffuses far faster than substitutional atoms like nickel and chromium." },
        { id: "melting", text: "Nickel melts at a higher temperature than carbon." },
        { id: "magnetic", text: "Nickel is magnetic and is held in place by the iron." },
        { id: "flux", text: "The flux dissolves carbon but not nickel." },
      ],
      answer: "interstitial",
      explanation:
        "Carbon hops between iron atoms; nickel and chromium have to exchange places with iron atoms, which is thousands of times slower. After many welding heats the carbon is almost uniform (so the blade's hardness follows the average carbon), while the nickel-rich layers keep their identity and stay bright in the etch.",
    },
    {
      id: "kitchen-steel-task",
      kind: "sim-task",
      prompt:
        "In the alloy explorer, design a kitchen steel: one alloy that is stainless by the EN 10088-1 definition, has at least 0.6 % carbon, keeps at least 12 % chromium in the annealed matrix according to the app's carbide allocation model, and has a PREN (bulk composition, nitrogen factor 16) of at least 18. Submit the explorer's settings.",
      simulation: "alloy",
      initial: { alloys: [{ grade: "1080" }, { grade: "52100" }, { name: "Heat CF-2291", C: 0.7, Cr: 13.5, Mo: 0.3, Mn: 0.6, Si: 0.4 }] },
      check: (submitted) => {
        const alloys = alloysFromSubmission(submitted);
        if (alloys.length === 0) return { correct: false, detail: "No alloy could be read from the submitted settings." };
        const lines: string[] = [];
        let correct = false;
        for (const alloy of alloys) {
          try {
            const carbon = alloy.composition.C ?? 0;
            const stainless = isStainless(alloy.composition);
            const matrixCr = allocateCarbides(alloy.composition).matrix.chromiumMassPct;
            const index = pren(alloy.composition);
            const ok = stainless && carbon >= MIN_CARBON && matrixCr >= MIN_MATRIX_CR && index >= MIN_PREN;
            correct ||= ok;
            lines.push(
              `${alloy.name}: ${stainless ? "stainless" : "not stainless"} by definition, ${fmt(carbon)} % C, matrix Cr ${fmt(matrixCr)} %, PREN ${fmt(index, 1)}${ok ? " — meets every requirement" : ""}.`,
            );
          } catch {
            lines.push(`${alloy.name}: the science core rejects this composition.`);
          }
        }
        return {
          correct,
          detail:
            lines.join(" ") +
            (correct ? "" : ` Needed in one alloy: stainless, C ≥ ${MIN_CARBON} %, matrix Cr ≥ ${MIN_MATRIX_CR} %, PREN ≥ ${MIN_PREN}.`),
        };
      },
      exampleSolution: { alloys: [{ grade: "1080" }, { grade: "52100" }, { name: "Kitchen design", C: 0.6, Cr: 18, Mo: 0.5, Mn: 0.5, Si: 0.4 }], coldTreatmentC: -80 },
      explanation:
        "Carbon gives hardness but takes chromium into carbide — about 11.6 % Cr per 1 % C as the model's M23C6. With 0.6 % C, roughly 18 % bulk chromium keeps 12 % in the matrix, and half a percent of molybdenum adds 1.65 to the PREN without being tied up (it forms no carbide of its own in this model unless W + 2Mo reaches 4). The invented heat CF-2291 falls short on every count except the definition.",
    },
  ],
});
