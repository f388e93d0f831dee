import { HowComputed } from "@/lab/shared-ui/how-computed";

/** Model, assumptions and sources of the passive-film simulation, in our own words. */
export function PassiveFilmHowComputed() {
  return (
    <HowComputed>
      <h3>The alloy</h3>
      <p>
        The steel is a random solid solution of iron and chromium. Each site of a 256 × 256 surface, and of the layers
        beneath it, is chromium with a probability equal to the chromium atom fraction of the matrix. Carbon is assumed
        to form the chosen chromium carbide (pure Cr<sub>23</sub>C<sub>6</sub> or Cr<sub>7</sub>C<sub>3</sub>, the worst
        case); the chromium it binds is taken away before the fraction is computed, and the carbide is drawn as discs
        whose area share equals their volume share. Around each disc a ring of sites holds only a third of the average
        chromium: an illustration that depletion next to carbides is local and worse than the average, not a computed
        profile.
      </p>
      <h3>The network</h3>
      <p>
        Two chromium sites are connected when they are neighbours in the chosen shells of a body-centred cubic (or,
        as the alternative model, simple cubic) lattice. The simulation labels all connected clusters in a slab 24
        layers deep (bulk-like) or 3 layers deep (thin layer) and asks whether one of them runs from one side of the
        slab to the other. This is the percolation picture of passivity: a protective Cr–O–Cr oxide can only form as a
        continuous sheet if the chromium beneath it is connected. The film then covers every surface site within two
        sites of a column that reaches the network within six layers. Where the network does not connect, only
        isolated chromium islands oxidise and the iron between them stays bare.
      </p>
      <h3>Time, rust and scratches</h3>
      <p>
        Film thickness follows a logarithmic growth law: fast at first, then levelling off at 1–3 nm. Rust is a
        cartoon with illustrative rates: in humid air or salt spray, bare iron rusts after an induction time and rust
        spreads to bare neighbours and undercuts film islands that are not anchored to the network; salt shortens the
        induction time and speeds both steps; dry air does not rust. A scratch removes film and rust; the alloy beneath
        is unchanged, so on a connected network the film grows back within seconds of model time.
      </p>
      <h3>What the model leaves out</h3>
      <p>
        Short-range order, molybdenum, nickel and nitrogen, the film&apos;s chemistry and structure, pitting, and the
        finite size of the sample (a deeper or wider slab would move the threshold a little). The standards define
        stainless steel as at least 10.5 % Cr and at most 1.2 % C; in practice about 12–13 % is needed, and which
        neighbour shells matter is an open question. The spanning curve is computed on smaller lattices (a 32³ cube,
        or a 64 × 64 × 3 slab) with 60 random samples per point.
      </p>
      <h3>Sources</h3>
      <ul>
        <li>EN 10088-1, Stainless steels — list of stainless steels (definition: ≥ 10.5 % Cr, ≤ 1.2 % C).</li>
        <li>Sieradzki and Newman (1986), J. Electrochem. Soc. 133, 1979 — percolation model of passivation (from memory).</li>
        <li>Xu, Wang, Lv and Deng (2014), Front. Phys. 9, 113 — site-percolation thresholds of cubic lattices.</li>
        <li>Kurzawski and Malarz (2012), Rep. Math. Phys. 70, 163 — thresholds with second neighbours.</li>
        <li>Olsson and Landolt (2003), Electrochim. Acta 48, 1093 — passive films are 1–3 nm thick.</li>
        <li>Cabrera and Mott (1949), Rep. Prog. Phys. 12, 163 — logarithmic laws of low-temperature oxidation.</li>
        <li>Rates of film spread and rust, the halo and the slab sizes are choices of this simulation, not published values.</li>
      </ul>
    </HowComputed>
  );
}
