import { HowComputed } from "@/lab/shared-ui/how-computed";
import { GAS_TEMP_K, MELT_STREAM_SPEED_M_PER_S, REPORT_SOLID_FRACTION } from "@shared/sim/powder/classes";
import { TAP_DENSITY, YIELD_AT_1150_MPA, YIELD_DOUBLING_PER_C } from "@shared/sim/powder/hip-model";
import { REFERENCE_INGOT } from "@shared/sim/powder/comparison";

/** "How this is computed" for the powder simulation. */
export function PowderMethod() {
  return (
    <HowComputed>
      <h3>Droplet sizes</h3>
      <p>
        Gas-atomised powders follow a log-normal distribution closely. It is fixed by two numbers: the mass median D50 (half the mass is
        in finer droplets) and the geometric spread σg = D84/D50. The powder is split into 14 classes of equal width on a log scale; the
        mass in each is the difference of the cumulative distribution at its edges. Because most droplets are small and carry little
        mass, the median by count is far below the median by mass (Hatch–Choate relations). The animation draws droplets in proportion
        to mass.
      </p>
      <h3>Flight and cooling of a droplet</h3>
      <p>
        A droplet is so small and conducts so well that it is taken to be at one temperature (the Biot number is checked). Heat leaves by
        convection: the Nusselt number follows the Ranz–Marshall correlation Nu = 2 + 0.6·Re<sup>½</sup>·Pr<sup>⅓</sup>, with the gas
        properties of nitrogen or argon at the film temperature (from the NIST reference equations, tabulated every 100 K), plus a little
        radiation. The melt stream leaves the nozzle at {MELT_STREAM_SPEED_M_PER_S} m/s; the jet drags the droplets towards the gas
        velocity (Schiller–Naumann drag), so their speed relative to the gas — and with it the cooling — falls as they go. The gas is at
        room temperature ({GAS_TEMP_K} K); in a real tower it warms up.
      </p>
      <p>
        Each droplet cools as a liquid from the liquidus plus the superheat down to the nucleation undercooling below the liquidus. Then
        it recalesces: the first crystals release latent heat and bring it back to the liquidus; the rest freezes at that temperature,
        then the solid cools. The cooling rate used for the dendrite arm spacing is the mean rate of the liquid from the nozzle to
        nucleation. Small droplets cool at up to millions of kelvin per second and freeze within centimetres; large ones take tens of
        milliseconds and fall a metre or more.
      </p>
      <h3>Structure inside a droplet</h3>
      <p>
        The secondary dendrite arm spacing λ2 comes from a fit to steel castings (Won &amp; Thomas), used here far above the cooling
        rates it was fitted on, so it is an order of magnitude, not a measurement; above 1 % C its carbon term is held at 1 % (our
        choice). Carbides that form from the last liquid are taken to be 0.3 × λ2 across, a rule that reproduces the usual contrast of
        about 0.5–3 µm in powder steels and tens of µm in ingots. The last liquid at {Math.round(REPORT_SOLID_FRACTION * 100)} % solid is
        computed with back-diffusion over half the arm spacing during the droplet&rsquo;s freezing time (Brody–Flemings with the
        Clyne–Kurz correction).
      </p>
      <h3>Ingot for comparison</h3>
      <p>
        The same composition is frozen as a {REFERENCE_INGOT.sizeMm} mm round ingot in a cast-iron mould by the ingot model of this
        laboratory (heat conduction with latent heat, macrosegregation with a Burton–Prim–Slichter effective partition coefficient,
        microsegregation as above), and read at mid-radius.
      </p>
      <h3>Hot isostatic pressing</h3>
      <p>
        The powder is sealed in a steel can at a tap density of {TAP_DENSITY} and pressed by hot gas from all sides. While the pores are
        connected, the contacts between particles yield until the pressure is carried (D = [(1 − D0)·P/(1.3σ<sub>y</sub>) + D0³]
        <sup>⅓</sup>); once the density passes 0.9 the pores are isolated and collapse (D = 1 − exp(−3P/2σ<sub>y</sub>)). This is the
        plastic-yielding part of the HIP-map approach; creep and diffusion, which close the last porosity over the hours at temperature,
        are not modelled. The hot yield strength is taken as {YIELD_AT_1150_MPA} MPa at 1150 °C, doubling every {YIELD_DOUBLING_PER_C} °C
        lower — a teaching curve, not data. The can shrinks equally in every direction: linear shrinkage = 1 − (D0/D)<sup>⅓</sup>,
        about 14 % from 0.64 to full density.
      </p>
      <h3>Sources</h3>
      <ul>
        <li>Ranz &amp; Marshall (1952), Chem. Eng. Prog. 48 — droplet heat transfer (recalled); Schiller &amp; Naumann (1933) — drag (recalled).</li>
        <li>Lemmon &amp; Jacobsen (2004), Span et al. (2000) — nitrogen and argon properties, evaluated with CoolProp.</li>
        <li>&ldquo;Atomisation techniques for the formation of metal powders&rdquo;, Woodhead (2013) — log-normal powders, D50 and σg.</li>
        <li>Won &amp; Thomas (2001), Metall. Mater. Trans. A 32, 1755 — arm spacing fit and partition data.</li>
        <li>Helle, Easterling &amp; Ashby (1985), Acta Metall. 33, 2163 — HIP maps (constants recalled, not re-checked).</li>
        <li>Typical HIP of tool-steel powder, 100–200 MPa and 1100–1150 °C for 2–4 h — common practice.</li>
      </ul>
    </HowComputed>
  );
}
