import { defineQuiz } from "../../shared/quiz/definition";
import { dropletCooling, hipLinearShrinkage, lognormalFractionFiner } from "../../shared/metallurgy";
import { fmt, readChoice, readNumber } from "./support/sim-params";

/** Conditions the cooling questions state: droplet at 1500 °C in gas at 300 K (film 1036.65 K). */
const DROPLET_TEMP_K = 1773.15;
const GAS_TEMP_K = 300;
const TARGET_RATE_K_PER_S = 1e5;

function coolingRate(gas: "N2" | "Ar", diameterUm: number, velocityMPerS: number): number {
  return dropletCooling({
    gas,
    diameterM: diameterUm * 1e-6,
    relativeVelocityMPerS: velocityMPerS,
    dropletTempK: DROPLET_TEMP_K,
    gasTempK: GAS_TEMP_K,
  }).coolingRateKPerS;
}

export default defineQuiz({
  id: "powder-route-1",
  lessonSlug: "atomise-and-press",
  title: "Atomising, cooling and pressing",
  passFraction: 0.7,
  questions: [
    {
      id: "fraction-finer",
      kind: "numeric",
      prompt:
        "A gas-atomised powder is log-normal with a mass-median diameter of {d50} µm and a geometric standard deviation of {sg}. What percentage of its mass is finer than {d} µm?",
      params: { d50: { min: 40, max: 150, step: 10 }, sg: { min: 1.6, max: 2.4, step: 0.1 }, d: { min: 20, max: 200, step: 10 } },
      compute: ({ d50, sg, d }) => 100 * lognormalFractionFiner(d * 1e-6, d50 * 1e-6, sg),
      expression: "50 * (1 + erf(log(d / d50) / log(sg) / sqrt(2)))",
      unit: "%",
      tolerance: { abs: 0.5 },
      decimals: 1,
      explanation:
        "F(d) = Φ(ln(d/D50)/ln σg), with Φ the standard normal cumulative distribution (Φ(z) = ½[1 + erf(z/√2)]). For D50 = 80 µm and σg = 2.0, 45 µm gives z = −0.83 and F = 0.203: about a fifth of the mass is finer than 45 µm.",
    },
    {
      id: "cooling-rate",
      kind: "numeric",
      prompt:
        "A {diameter} µm steel droplet at 1500 °C moves at {velocity} m/s relative to nitrogen at 300 K. At the film temperature (1036.65 K) nitrogen has ρ = 0.3292 kg/m³, k = 0.0671 W/(m·K), µ = 4.253 × 10⁻⁵ Pa·s and Pr = 0.745. With the Ranz–Marshall correlation and liquid steel ρc = 7000 × 800 J/(m³·K), what is the droplet's cooling rate?",
      params: { diameter: { min: 20, max: 200, step: 10 }, velocity: { min: 10, max: 100, step: 10 } },
      compute: ({ diameter, velocity }) => coolingRate("N2", diameter, velocity),
      unit: "K/s",
      tolerance: { rel: 0.03 },
      decimals: 0,
      explanation:
        "Re = ρ_g·v·d/µ_g; Nu = 2 + 0.6·Re^½·Pr^⅓; h = Nu·k_g/d; dT/dt = 6h(T_d − T_g)/(ρc·d) with T_d − T_g = 1473.15 K. For 50 µm at 20 m/s: Re 7.74, Nu 3.51, h ≈ 4715 W/(m²·K), about 1.49 × 10⁵ K/s. Smaller droplets cool much faster, because they have more surface per volume and a higher h.",
    },
    {
      id: "shrinkage",
      kind: "numeric",
      prompt:
        "A HIP can is filled with powder at a tap density of {d0} (relative to solid) and pressed to full density. Assuming equal shrinkage in all directions, what is the linear shrinkage?",
      params: { d0: { min: 0.6, max: 0.7, step: 0.01 } },
      compute: ({ d0 }) => 100 * hipLinearShrinkage(d0),
      expression: "100 * (1 - d0^(1/3))",
      unit: "%",
      tolerance: { abs: 0.1 },
      decimals: 2,
      explanation:
        "Mass is conserved, so volume scales by D0 and each length by D0^(1/3). Linear shrinkage = 1 − D0^(1/3): 15.7 % from 0.60, 13.4 % from 0.65, 11.2 % from 0.70. The can must be designed for it.",
    },
    {
      id: "nitrogen-vs-argon",
      kind: "single",
      prompt: "At the same droplet size and relative velocity, why does nitrogen cool a steel droplet faster than argon?",
      options: [
        { id: "conductivity", text: "Its thermal conductivity at the film temperature is about 1.5 times argon's, so the heat-transfer coefficient is higher." },
        { id: "density", text: "Nitrogen is denser than argon, so it carries more heat." },
        { id: "reaction", text: "Nitrogen reacts endothermically with the steel and absorbs heat." },
        { id: "colder", text: "Nitrogen leaves the nozzle colder than argon." },
      ],
      answer: "conductivity",
      explanation:
        "h = Nu·k_g/d. The Nusselt numbers of the two gases are similar (argon's Reynolds number is even a little higher), but nitrogen's conductivity is 0.067 W/(m·K) against argon's 0.045 at about 1037 K. A 50 µm droplet at 20 m/s cools at 1.49 × 10⁵ K/s in nitrogen and 9.9 × 10⁴ K/s in argon. Argon is chosen when nitrogen pick-up must be avoided.",
      feedback: {
        density: "Argon is in fact denser than nitrogen (about 0.47 against 0.33 kg/m³ at the film temperature).",
      },
    },
    {
      id: "hip-conditions",
      kind: "single",
      prompt: "Which conditions are typical for hot isostatic pressing of tool-steel powder?",
      options: [
        { id: "typical", text: "About 100–200 MPa gas pressure at 1100–1150 °C for 2–4 hours" },
        { id: "cold", text: "About 1000 MPa at room temperature for a few seconds" },
        { id: "low", text: "About 1 MPa at 600 °C for 30 minutes" },
        { id: "melt", text: "Atmospheric pressure above the melting point" },
      ],
      answer: "typical",
      explanation:
        "At 1100–1150 °C the powder is austenite with a yield strength of only about 20–50 MPa, so 100–200 MPa of hot argon deforms the particles at their contacts and closes the pores; creep and diffusion during the hold close the rest. (Typical conditions are common practice and from memory.)",
    },
    {
      id: "powder-trade",
      kind: "multiple",
      prompt: "Which statements about high-vanadium powder steels compared with ingot-made steels are true? Select all that apply.",
      options: [
        { id: "fine", text: "Their carbides are much finer and more evenly spread." },
        { id: "tough", text: "At equal carbide volume they are tougher, with no coarse carbide networks or banding." },
        { id: "vanadium", text: "They can carry about 10 % vanadium, which an ingot could not." },
        { id: "grind", text: "They are slow to grind and sharpen with aluminium-oxide abrasives." },
        { id: "cheap", text: "They are cheaper to make, because they skip casting." },
      ],
      answers: ["fine", "tough", "vanadium", "grind"],
      explanation:
        "Each droplet freezes in milliseconds, so segregation and carbide growth are confined to tens of micrometres: carbides of about 0.5–3 µm instead of 10–40 µm. That allows 10 % vanadium and better toughness. The price is paid twice: atomising, canning and HIP cost more than an ingot, and the vanadium carbides defeat aluminium-oxide belts and stones.",
      feedback: { cheap: "Atomising, canning and HIP add steps, gas, energy and equipment: powder steels cost more." },
    },
    {
      id: "argon-task",
      kind: "sim-task",
      prompt:
        "In the powder simulation, atomise with argon and choose the median droplet diameter and gas velocity so that a droplet of the median size, at 1500 °C in 300 K argon and moving at the gas velocity you set relative to the gas, cools at least at 100 000 K/s. Submit the simulation's settings.",
      simulation: "powder",
      initial: { grade: "A11", medianDiameterUm: 80, geometricStdDev: 2, gas: "N2", gasVelocityMPerS: 100 },
      check: (submitted) => {
        const gas = readChoice(submitted, "gas", ["N2", "Ar"] as const, "N2");
        const diameterUm = readNumber(submitted, "medianDiameterUm", 80, { min: 10, max: 300 });
        const velocity = readNumber(submitted, "gasVelocityMPerS", 100, { min: 0, max: 300 });
        if (gas === null || diameterUm === null || velocity === null) {
          return { correct: false, detail: "The submitted settings are incomplete or outside the simulation's ranges." };
        }
        const rate = coolingRate(gas, diameterUm, velocity);
        if (gas !== "Ar") {
          return { correct: false, detail: `With nitrogen the median droplet would cool at ${rate.toExponential(2)} K/s, but the task asks for argon, the slower-cooling gas.` };
        }
        const correct = rate >= TARGET_RATE_K_PER_S;
        return {
          correct,
          detail:
            `A ${fmt(diameterUm, 0)} µm droplet at ${fmt(velocity, 0)} m/s in argon cools at ${rate.toExponential(2)} K/s. ` +
            (correct ? "Fast enough: small droplets and high gas velocity make up for argon's lower conductivity." : "Too slow: make the droplets smaller or the gas faster."),
        };
      },
      exampleSolution: { grade: "A11", medianDiameterUm: 40, geometricStdDev: 2, gas: "Ar", gasVelocityMPerS: 100, superheatC: 150, undercoolingK: 50 },
      explanation:
        "In argon a 50 µm droplet at 20 m/s just misses 10⁵ K/s (9.9 × 10⁴). Halving the droplet size roughly triples the rate, and raising the relative velocity raises the Reynolds number and h. Droplet size is the stronger lever: the cooling rate falls roughly as 1/d^1.5 to 1/d².",
    },
  ],
});
