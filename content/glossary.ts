/**
 * Glossary of the Grain & Edge course. Every `<Term id="…">` in a lesson must have an entry here;
 * the content check fails on a missing id. Definitions are short, self-contained and written for
 * a learner who has not read the lesson yet.
 */
export const GLOSSARY: Record<string, { term: string; definition: string }> = {
  "atom-fraction": {
    term: "atom fraction",
    definition:
      "The share of atoms in an alloy that belong to one element, counted by number rather than by mass. Chromium atoms are lighter than iron atoms, so 12 mass % Cr is about 12.8 atom %.",
  },
  austenite: {
    term: "austenite (γ-iron)",
    definition:
      "The face-centred cubic form of iron, stable in plain steels above about 727–912 °C. It can dissolve up to about 2.1 % carbon; hardening starts by turning the steel into austenite.",
  },
  "austenitic-stainless": {
    term: "austenitic stainless steel",
    definition:
      "Stainless steel whose matrix stays face-centred cubic austenite at room temperature, usually thanks to nickel (for example 304, 316). Very corrosion-resistant and tough, but it cannot be hardened by quenching.",
  },
  austenitizing: {
    term: "austenitizing",
    definition:
      "Heating steel into the austenite region and holding it there so that carbon (and some alloy carbide) dissolves, as the first step of hardening.",
  },
  "back-diffusion": {
    term: "back-diffusion",
    definition:
      "Diffusion of solute in the already-frozen solid during solidification, from the enriched interface back into the dendrite. Fast for carbon, very slow for chromium and vanadium.",
  },
  "biot-number": {
    term: "Biot number",
    definition:
      "A dimensionless ratio of the resistance to heat flow inside a body to the resistance at its surface. Below about 0.1 the body can be treated as having one uniform temperature.",
  },
  carbide: {
    term: "carbide",
    definition:
      "A hard compound of carbon with metals (iron, chromium, vanadium, molybdenum, tungsten) that forms particles in steel. Named by the metal-to-carbon ratio: M3C, M23C6, M7C3, M6C, MC.",
  },
  "casting-modulus": {
    term: "casting modulus",
    definition:
      "The volume of a casting divided by its cooling surface area (V/A). By Chvorinov's rule the freezing time grows roughly with its square.",
  },
  cementite: {
    term: "cementite (Fe₃C)",
    definition:
      "Iron carbide, Fe₃C, with about 6.7 % carbon. Hard (roughly 800–1100 HV) and brittle; the carbide of plain carbon steels and a component of pearlite.",
  },
  "cold-treatment": {
    term: "cold treatment",
    definition:
      "Continuing the quench below room temperature (for example to about −80 °C or −196 °C) so that more retained austenite turns into martensite. Must be followed by tempering.",
  },
  dendrite: {
    term: "dendrite",
    definition:
      "A tree-like crystal that grows into a melt, with a trunk and side arms. Solute-rich liquid is trapped between the arms and freezes last, leaving segregation and carbides there.",
  },
  "edge-retention-index": {
    term: "edge-retention index (ERI)",
    definition:
      "The app's model number for a steel's resistance to abrasive wear by quartz-like grit, relative to a plain 700 HV matrix. A relative index, not a lifetime; it ignores toughness and edge geometry.",
  },
  eutectoid: {
    term: "eutectoid",
    definition:
      "The composition (about 0.76–0.77 % C) and temperature (727 °C) at which austenite turns entirely into pearlite on slow cooling. Steels with less carbon are hypoeutectoid, with more hypereutectoid.",
  },
  ferrite: {
    term: "ferrite (α-iron)",
    definition:
      "The body-centred cubic form of iron stable at room temperature. It dissolves very little carbon (at most about 0.02 %) and is soft and magnetic.",
  },
  flux: {
    term: "flux",
    definition:
      "A substance such as borax spread on steel at welding heat. It melts, dissolves iron oxide into a fluid slag and shields the surface from air, so a hammer blow can press clean metal together.",
  },
  "forge-welding": {
    term: "forge welding",
    definition:
      "Joining pieces of steel in the solid state by heating them to near white heat and pressing them together with hammer or press. It works only if the surface oxide is removed or dissolved.",
  },
  "freezing-range": {
    term: "freezing range",
    definition:
      "The temperature interval between liquidus and solidus over which an alloy is part solid, part liquid. It widens with carbon and alloying; high-carbon alloy steels can approach 100 °C.",
  },
  "gas-atomisation": {
    term: "gas atomisation",
    definition:
      "Breaking a stream of molten metal into droplets with high-velocity jets of gas (nitrogen or argon for tool steels). The droplets freeze in flight into powder.",
  },
  hardenability: {
    term: "hardenability",
    definition:
      "How deep a steel hardens to martensite under a given quench — not how hard it gets. Raised by manganese, chromium, molybdenum and other elements dissolved in austenite.",
  },
  "hot-isostatic-pressing": {
    term: "hot isostatic pressing (HIP)",
    definition:
      "Consolidating powder sealed in a can by heating it while hot gas presses equally from all sides (typically 100–200 MPa and 1100–1150 °C for tool steels), until the pores close.",
  },
  "ideal-critical-diameter": {
    term: "ideal critical diameter (D_I)",
    definition:
      "Grossmann's measure of hardenability: the diameter of a round bar whose centre just reaches 50 % martensite under an ideal, infinitely fast quench. ASTM A255 computes it from composition.",
  },
  interstitial: {
    term: "interstitial solute",
    definition:
      "A small atom, such as carbon or nitrogen, that sits in the gaps between the iron atoms rather than replacing one. Interstitials diffuse far faster than substitutional atoms like chromium.",
  },
  "lever-rule": {
    term: "lever rule",
    definition:
      "A mass balance that gives the fractions of two coexisting phases from their compositions and the overall composition: each phase's fraction is proportional to the opposite arm of the tie line.",
  },
  liquidus: {
    term: "liquidus",
    definition: "The temperature at which the first solid appears when an alloy cools from the melt.",
  },
  "log-normal": {
    term: "log-normal distribution",
    definition:
      "A distribution in which the logarithm of the size is normally distributed. Described by a median and a geometric standard deviation; atomised powders are close to it.",
  },
  m23c6: {
    term: "M23C6 carbide",
    definition:
      "A chromium-rich cubic carbide, ideally Cr₂₃C₆, typical of annealed stainless steels with a high chromium-to-carbon ratio. Each gram of carbon in it can take about 16.6 g of chromium.",
  },
  m7c3: {
    term: "M7C3 carbide",
    definition:
      "A chromium-rich carbide, ideally Cr₇C₃ (about 1300–1800 HV), typical of D2 and 440C. Each gram of carbon in it can take about 10.1 g of chromium.",
  },
  macrosegregation: {
    term: "macrosegregation",
    definition:
      "Differences in composition over centimetres to metres in a casting, caused by enriched liquid flowing in the mushy zone. Heat treatment cannot remove it.",
  },
  martensite: {
    term: "martensite",
    definition:
      "The hard phase formed when austenite is cooled too fast for carbon to escape: a strained, body-centred tetragonal crystal supersaturated with carbon. Its hardness depends mainly on dissolved carbon.",
  },
  "martensitic-stainless": {
    term: "martensitic stainless steel",
    definition:
      "Stainless steel with enough carbon and no significant nickel, so that it forms martensite on quenching (for example 420, 440C). The family used for stainless blades.",
  },
  "mc-carbide": {
    term: "MC carbide",
    definition:
      "A carbide with one metal atom per carbon atom, mainly vanadium carbide (about 2500–3000 HV). The hardest common carbide in blade steels, and the most stable at hardening temperatures.",
  },
  "ms-temperature": {
    term: "martensite-start temperature (Ms)",
    definition:
      "The temperature at which martensite begins to form on cooling. Every common alloying element in solution lowers it, carbon most of all.",
  },
  normalising: {
    term: "normalising",
    definition:
      "Heating steel just into the austenite region and cooling it in still air, to replace a coarse or uneven structure (for example after forging) with a fine, even one.",
  },
  "ostwald-ripening": {
    term: "Ostwald ripening (coarsening)",
    definition:
      "Growth of large particles at the expense of small ones at high temperature, driven by interfacial energy. The mean size grows roughly with the cube root of time (LSW law).",
  },
  "partition-coefficient": {
    term: "partition coefficient (k)",
    definition:
      "The ratio of an element's concentration in the solid to that in the liquid at a freezing interface. Below 1, the solid rejects the element into the liquid.",
  },
  "passive-film": {
    term: "passive film",
    definition:
      "The continuous chromium-rich oxide layer, about 1–3 nm thick, that forms on stainless steel in air or water and slows corrosion to a very low rate. It heals when scratched if oxygen is present.",
  },
  passivity: {
    term: "passivity",
    definition:
      "The state of a metal protected by a thin, dense surface oxide, so that it corrodes far more slowly than its chemistry alone would suggest.",
  },
  patina: {
    term: "patina",
    definition:
      "A thin, dark layer of iron oxides and sulphides that forms on carbon steel used with food or forced with mild acids. It slows rusting somewhat but does not heal like a passive film.",
  },
  pearlite: {
    term: "pearlite",
    definition:
      "A structure of thin alternating plates of ferrite and cementite formed from austenite at the eutectoid. Finer plates, formed at lower temperatures, are harder.",
  },
  percolation: {
    term: "percolation",
    definition:
      "The study of how randomly occupied sites on a lattice connect. Above a critical occupancy a cluster spanning the whole lattice appears abruptly.",
  },
  "percolation-threshold": {
    term: "percolation threshold (p_c)",
    definition:
      "The site occupancy at which a spanning cluster first appears on an infinite lattice. Its value depends on the lattice, the neighbours counted as connected and the dimension.",
  },
  pitting: {
    term: "pitting",
    definition:
      "Localised corrosion in which chloride breaks the passive film at a weak spot and a small, deep hole grows while the surface around it stays bright.",
  },
  pren: {
    term: "pitting resistance equivalent number (PREN)",
    definition:
      "A ranking index of resistance to chloride pitting from composition: Cr + 3.3(Mo + 0.5W) + 16N in mass %. It ranks grades within a family; it is not a corrosion rate.",
  },
  "retained-austenite": {
    term: "retained austenite",
    definition:
      "Austenite that does not turn into martensite during the quench because the quench stops too close to Ms. Soft and unstable; reduced by cold treatment and tempering.",
  },
  "scheil-equation": {
    term: "Scheil–Gulliver equation",
    definition:
      "The solidification limit with no diffusion in the solid and a well-mixed liquid: the solid forming has composition k·C0·(1 − f_s)^(k−1), and the last liquid becomes strongly enriched.",
  },
  "secondary-arm-spacing": {
    term: "secondary dendrite arm spacing (λ₂)",
    definition:
      "The distance between neighbouring side arms of a dendrite. It shrinks as the cooling rate rises and sets the scale of microsegregation and interdendritic carbides.",
  },
  "secondary-hardening": {
    term: "secondary hardening",
    definition:
      "A rise in hardness when high-alloy steels (such as M2) are tempered near 500–600 °C, caused by very fine precipitates of molybdenum, tungsten and vanadium carbides.",
  },
  sensitisation: {
    term: "sensitisation",
    definition:
      "Loss of corrosion resistance along grain boundaries of stainless steel when chromium carbides precipitate there and deplete the adjacent metal of chromium.",
  },
  "sharpening-effort-index": {
    term: "sharpening-effort index (SEI)",
    definition:
      "The app's model number for how hard a steel is to abrade with a given stone (aluminium oxide, silicon carbide, cBN, diamond), relative to a plain 700 HV matrix. A relative index, not a time.",
  },
  solidus: {
    term: "solidus",
    definition: "The temperature at which the last liquid disappears when an alloy freezes (in equilibrium).",
  },
  "spanning-cluster": {
    term: "spanning cluster",
    definition:
      "A connected group of occupied lattice sites that reaches from one side of the region to the other. In the passive-film model, a spanning chromium cluster lets the oxide film hold together.",
  },
  "tap-density": {
    term: "tap density",
    definition:
      "The density of a powder after tapping or vibrating its container, as a fraction of solid density — typically about 0.62–0.68 for atomised steel powder.",
  },
  tempering: {
    term: "tempering",
    definition:
      "Reheating hardened steel to a moderate temperature so that carbon leaves the martensite as fine carbides and stresses relax: hardness falls a little, toughness rises a lot.",
  },
  "tempering-parameter": {
    term: "tempering parameter (Hollomon–Jaffe)",
    definition:
      "P = T(C + log10 t), with T in kelvin, t in hours and C about 20. Treatments with equal P give about the same tempered hardness, so time can be traded for temperature.",
  },
  toughness: {
    term: "toughness",
    definition:
      "Resistance to the growth of cracks: the energy a material absorbs before it breaks. In blade steels it usually falls as hardness and carbide volume rise.",
  },
  "vickers-hardness": {
    term: "Vickers hardness (HV)",
    definition:
      "Hardness measured by pressing a diamond pyramid into the surface, given in kgf/mm². Used for carbides and abrasives because it spans soft metals to diamond on one scale.",
  },
};
