import { HowComputed } from "@/lab/shared-ui/how-computed";

/** The explorer's overview of its models; each figure also carries its own method and source. */
export function AlloyMethod() {
  return (
    <HowComputed title="How the explorer computes, and where it stops">
      <p>
        Every number comes from the science core of this app, with the composition you set (mass per cent, iron the balance). Each figure
        above opens its own method and source; a mark beside a value says whether the inputs lie inside the model&rsquo;s calibration
        (✓), outside it (!) or outside its range altogether (×).
      </p>
      <h3>The chain of models</h3>
      <ol>
        <li>
          <strong>Carbides, annealed.</strong> Carbon goes to carbide formers in order of affinity — vanadium (MC), then tungsten and
          molybdenum (M6C) in high-speed steels, then chromium (M7C3 or M23C6, chosen by the Cr:C ratio), then iron (cementite). This is
          the near-equilibrium limit and is exact as a mass balance; real carbides hold mixed metals.
        </li>
        <li>
          <strong>Hardening.</strong> At the hardening temperature part of each carbide dissolves (cementite by the Fe–C diagram&rsquo;s
          Acm line; alloy carbides by temperature windows that are our own rough choice). What dissolves sets the carbon, chromium and
          molybdenum in the austenite.
        </li>
        <li>
          <strong>Martensite.</strong> The carbon in solution gives the as-quenched hardness; the elements in solution give Ms and, below
          it, how much austenite stays untransformed at room temperature and after a cold treatment.
        </li>
        <li>
          <strong>Wear.</strong> Matrix and carbides resist abrasion by hardness and volume; an abrasive barely scratches a phase that is
          not harder than it. Quartz grit stands for cutting; aluminium oxide and diamond for stones.
        </li>
        <li>
          <strong>Corrosion figures.</strong> The standard&rsquo;s stainless definition, PREN of the bulk and of the matrix, and the
          chromium left free after carbides form. In practice a blade needs about 12–13 % free chromium to behave as stainless (common
          practice); grain-boundary depletion near carbides is worse than these averages.
        </li>
        <li>
          <strong>Casting.</strong> Freezing range from linear liquidus and solidus formulas, and the last liquid at 95 % solid for a slow
          ingot and a fast powder droplet. Both end enriched; the difference is the distance over which it happens (half the dendrite arm
          spacing), which sets how large carbides from that liquid can grow.
        </li>
        <li>
          <strong>Hardenability.</strong> Grossmann&rsquo;s ideal critical diameter from the ASTM A255 factors, only inside their ranges
          (low-alloy steels up to 0.9 % C).
        </li>
      </ol>
      <h3>Not modelled</h3>
      <p>
        Tempering, grain size, nitrides other than in MC, silicon and manganese in carbides, kinetics of dissolution, toughness and
        corrosion rates. The indices rank alloys; they do not predict a blade&rsquo;s life.
      </p>
      <h3>Sources</h3>
      <ul>
        <li>EN 10088-1 — definition of stainless steel; ISO 15156-3 / NACE MR0175 — PREN.</li>
        <li>Andrews (1965), J. Iron Steel Inst. 203, 721 — Ms; Koistinen &amp; Marburger (1959), Acta Metall. 7, 59 — retained austenite.</li>
        <li>ASTM A255 — initial-hardness polynomial and hardenability factors.</li>
        <li>Khruschov (1974), Wear 28, 69; J. Tribol. 132 (2010) 034502 — abrasive wear by phase hardness.</li>
        <li>Won &amp; Thomas (2001), Metall. Mater. Trans. A 32, 1755; Clyne &amp; Kurz (1981), Metall. Trans. A 12, 965 — segregation.</li>
      </ul>
    </HowComputed>
  );
}
