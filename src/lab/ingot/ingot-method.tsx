import { HowComputed } from "@/lab/shared-ui/how-computed";
import { MOULD_HEAT_TRANSFER_W_PER_M2K } from "@shared/metallurgy/solidification/ingot-params";
import { MC_LAST_LIQUID_V_THRESHOLD_MASS_PCT, EUTECTIC_CARBON_DROP_PER_CR, CARBIDE_SIZE_PER_ARM_SPACING } from "@shared/sim/ingot/carbide-risk";
import { POUR_SUPERHEAT_C, INGOT_CELLS } from "@shared/sim/ingot/run";

/** "How this is computed" for the ingot simulation: model, assumptions, sources. */
export function IngotMethod() {
  return (
    <HowComputed>
      <h3>Heat flow and freezing</h3>
      <p>
        The ingot is a long round bar, so heat flows only along the radius. The science core solves the conduction equation on{" "}
        {INGOT_CELLS} rings from the mould wall to the centre with an explicit finite-volume scheme, taking the largest time step that
        stays stable. Latent heat is handled with the enthalpy method: each ring carries its heat content, and between liquidus and
        solidus the released heat is spread linearly over the freezing range. The melt is poured {POUR_SUPERHEAT_C} °C above its
        liquidus. The mould is an illustrative heat-transfer coefficient at the ingot surface: sand {MOULD_HEAT_TRANSFER_W_PER_M2K.sand},
        cast-iron {MOULD_HEAT_TRANSFER_W_PER_M2K.metal} and water-cooled copper {MOULD_HEAT_TRANSFER_W_PER_M2K["water-cooled"]} W/m²K
        (teaching values, not measurements). The solver was checked against the error-function solution without latent heat and
        against the Neumann solution of the Stefan problem.
      </p>
      <p>
        The liquidus comes from a linear formula used in steelmaking (1536 °C minus a fixed depression per percent of each element);
        the solidus from the same slopes divided by each element&rsquo;s partition coefficient. Both are calibrated on low-alloy
        steels: for tool steels with more than 1 % C or 5 % Cr they are extrapolations, and the page says so.
      </p>
      <h3>Segregation on two scales</h3>
      <p>
        <strong>Across the ingot (macrosegregation).</strong> The remaining liquid is treated as one well-mixed pool. Solid that forms
        takes up <em>k</em>
        <sub>eff</sub> times the pool&rsquo;s composition, and the solute it rejects enriches the pool, so the centre, which freezes last,
        ends richer than the wall. The effective partition coefficient has the Burton–Prim–Slichter form, <em>k</em>
        <sub>eff</sub> = <em>k</em> / (<em>k</em> + (1 − <em>k</em>)·exp(−<em>V</em>δ/<em>D</em>)), where <em>V</em> is the speed of
        the front, <em>D</em> the diffusivity of the solute in the liquid and δ the thickness of the unmixed layer ahead of the front. The
        mixing control sets δ: fully mixed (δ = 0) gives the equilibrium <em>k</em> and the strongest centre enrichment; stagnant (δ → ∞)
        gives <em>k</em>
        <sub>eff</sub> = 1 and no macrosegregation. Fast freezing pushes <em>k</em>
        <sub>eff</sub> towards 1 too, which is why a small water-cooled ingot shows almost none.
      </p>
      <p>
        <strong>Between dendrite arms (microsegregation).</strong> When a ring is solid, its local freezing time and cooling rate give
        the secondary dendrite arm spacing λ2 (a fit to casting data), and the diffusion distance λ2/2 with the solid diffusivity gives
        a Fourier number for back-diffusion (Brody–Flemings with the Clyne–Kurz correction). Carbon diffuses fast and stays close to
        equilibrium; chromium, vanadium and molybdenum barely move in the solid and follow Scheil&rsquo;s equation. The composition of
        the liquid at 95 % solid is the &ldquo;last liquid&rdquo; plotted below.
      </p>
      <p>
        The λ2 fit was made on steels up to about 1 % C; above that its carbon term bends down sharply, so the carbon term is held at its
        1 % C value, both in the chart and in the back-diffusion estimate (our choice, flagged on the page).
      </p>
      <h3>Coarse primary carbides</h3>
      <p>
        Where the last liquid holds at least {MC_LAST_LIQUID_V_THRESHOLD_MASS_PCT} % V we mark primary vanadium carbide (MC); where its
        carbon reaches 4.3 % C minus {EUTECTIC_CARBON_DROP_PER_CR} % per percent of chromium in that liquid we mark a carbide eutectic.
        Both thresholds are our own rough teaching rules, not published limits, and W–Mo carbides of high-speed steels are not covered.
        Their size is taken as {CARBIDE_SIZE_PER_ARM_SPACING} × λ2, a rule that keeps the ratio between cast and powder steels right.
      </p>
      <h3>Chvorinov&rsquo;s rule</h3>
      <p>
        Chvorinov found that a casting&rsquo;s freezing time grows with the square of its volume-to-surface ratio (the modulus):
        t = B·(V/A)². For a long round ingot V/A = R/2. The comparison uses B = 2 min/cm² for steel in sand, an illustrative value. The
        rule holds when the mould&rsquo;s own slow heating limits the heat flow (sand); a fixed surface coefficient, as in this solver,
        tends towards t ∝ M for large ingots.
      </p>
      <h3>What the model leaves out</h3>
      <p>
        Fluid flow and settling of crystals, shrinkage and the air gap at the mould wall, the difference between solid and liquid
        properties, δ-ferrite and peritectic reactions, and any carbide that would cap the liquid&rsquo;s enrichment earlier. The one cap
        kept is the iron–carbon eutectic: once the liquid reaches 4.3 % C, what is left freezes at its own composition. Chromium,
        vanadium and molybdenum lower that limit in real steels, so the centre&rsquo;s enrichment is an upper bound.
      </p>
      <h3>Sources</h3>
      <ul>
        <li>Burton, Prim &amp; Slichter (1953), J. Chem. Phys. 21, 1987 — effective partition coefficient (recalled, not re-checked).</li>
        <li>Scheil (1942); Brody &amp; Flemings (1966), Trans. AIME 236, 615; Clyne &amp; Kurz (1981), Metall. Trans. A 12, 965 — microsegregation.</li>
        <li>Won &amp; Thomas (2001), Metall. Mater. Trans. A 32, 1755 — partition coefficients, λ2 fit, carbon diffusivity.</li>
        <li>Chvorinov (1940) — freezing time rule; Incropera &amp; DeWitt, Fundamentals of Heat and Mass Transfer — stability of explicit schemes.</li>
        <li>That conventional ingots become a problem above roughly 4–5 % V is a trade rule of thumb (common practice, no published source).</li>
      </ul>
    </HowComputed>
  );
}
