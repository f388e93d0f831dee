import { HowComputed } from "@/lab/shared-ui/how-computed";

/** Models, assumptions and sources of the carbide simulation, in our own words. */
export function CarbidesHowComputed() {
  return (
    <HowComputed>
      <h3>Which carbides, and how much</h3>
      <p>
        Carbon and the carbide-forming metals are shared out in order of how strongly they bind: vanadium first (MC),
        then tungsten and molybdenum in high-speed-type steels (M<sub>6</sub>C), then chromium, whose carbide type
        follows the ratio of chromium to the carbon left (cementite, M<sub>7</sub>C<sub>3</sub> or M<sub>23</sub>C<sub>6</sub>);
        carbon still left forms iron carbide. This gives the annealed, near-equilibrium amounts; volumes follow from
        the molar volume of each carbide. On hardening, part of each carbide dissolves: for cementite from the
        iron–carbon diagram at the austenitizing temperature, for alloy carbides from simple temperature windows that
        this app chose (labelled as a model, not data). The carbon left in solution sets the hardness of the
        martensite (the ASTM A255 polynomial, held constant above 0.7 % C where real hardness levels off).
      </p>
      <h3>The field</h3>
      <p>
        The picture is a plane section 60 µm wide. Particles are discs placed at random without overlapping until each
        type covers its volume share of the area (on a random section, area share equals volume share). Sizes follow a
        log-normal or the Lifshitz–Slyozov–Wagner distribution around a typical radius per type that this app chose.
        Holding at temperature coarsens the carbides: the mean radius follows r̄³ = r̄₀³ + k·t, with k proportional to the
        diffusion coefficient in austenite of the slowest metal of each carbide (vanadium for MC, molybdenum for M₆C,
        chromium otherwise). As they grow, fewer particles are kept so that the area share stays right.
      </p>
      <h3>Edge wear and sharpening</h3>
      <p>
        Each phase resists an abrasive in proportion to its hardness, and ten times more when the abrasive is not at least
        about 1.2 times harder than it (it then cannot scratch it). The edge-retention index sums this over the phases
        against quartz; the sharpening-effort index does the same against the stone. Both are relative model numbers
        (1 = a single phase of 700 HV), not lifetimes or times. The edge view applies the same resistances cell by cell to
        a 40° edge on a 0.125 µm grid: quartz-loaded stock presses on the tip and wears what it touches, so soft matrix
        recedes and hard carbides stand proud. The sharpening view grinds both bevels on the chosen stone until the
        edge is as narrow as when new, and counts model strokes (a 20 µm section). Carbides are assumed to stay anchored (no pull-out);
        toughness, chipping, edge geometry and corrosion are left out.
      </p>
      <h3>Sources</h3>
      <ul>
        <li>Khruschov (1974), Wear 28, 69 — wear resistance of multiphase materials adds over the phases.</li>
        <li>J. Tribol. 132 (2010) 034502 — an abrasive scratches a phase only if it is about 1.2 times harder.</li>
        <li>Lifshitz and Slyozov (1961), J. Phys. Chem. Solids 19, 35; Wagner (1961), Z. Elektrochem. 65, 581 — coarsening (from memory).</li>
        <li>ASTM A255 — hardness of martensite against carbon; ASTM E140 — hardness conversion (values from memory).</li>
        <li>Carbide hardness and density: published tables summarised in the app&apos;s science reference; several values from memory.</li>
        <li>Typical hardening temperatures of the presets: common practice, no published source.</li>
        <li>Particle sizes, dissolution windows, wear doses and the 40° edge are choices of this simulation.</li>
      </ul>
      <p>
        <strong>Safety:</strong> grinding and sharpening make fine metal and abrasive dust, and hardening involves hot
        metal and quench oil. Follow local codes, the manufacturers&apos; safety data sheets and qualified supervision.
      </p>
    </HowComputed>
  );
}
