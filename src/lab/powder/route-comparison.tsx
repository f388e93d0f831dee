import { useMemo } from "react";
import { allocateCarbides } from "@shared/metallurgy/carbides/carbide-allocation";
import type { Composition } from "@shared/metallurgy/composition";
import type { RouteComparison, RouteFigures } from "@shared/sim/powder/comparison";
import { REFERENCE_INGOT } from "@shared/sim/powder/comparison";
import { formatMassPct, formatNumber, formatScientific } from "@shared/sim/alloy/format";
import { MicroField } from "./micro-field";

interface RouteComparisonProps {
  composition: Composition;
  comparison: RouteComparison | null;
  /** True while the comparison ingot for the current composition is being computed. */
  updating: boolean;
  widthPx: number;
}

/** The same steel as an ingot and as powder: figures, a sketch of the carbides, and what it means. */
export function RouteComparisonPanel({ composition, comparison, updating, widthPx }: RouteComparisonProps) {
  const carbideVolume = useMemo(() => {
    try {
      return allocateCarbides(composition).totalCarbideVolumePct / 100;
    } catch {
      return 0.1;
    }
  }, [composition]);
  const fieldPx = Math.max(140, Math.min(260, Math.floor((widthPx - 48) / 2)));
  return (
    <section aria-labelledby="powder-vs-ingot" className="rounded-md border border-bone-300 bg-white p-4">
      <h3 id="powder-vs-ingot" className="font-display text-lg font-semibold text-soot-900">
        The same steel as an ingot and as powder
      </h3>
      {!comparison ? (
        <p className="mt-2 text-sm text-soot-700" role="status">
          Computing the comparison ingot…
        </p>
      ) : (
        <div className={updating ? "opacity-60" : undefined}>
          <p className="mt-1 text-xs text-soot-600">
            Ingot: {REFERENCE_INGOT.sizeMm} mm round in a cast-iron mould, at mid-radius, from the ingot model. Powder: the class holding the
            mass median. Carbide volume from the carbide allocation of the core ({formatNumber(carbideVolume * 100, 2)} % in the annealed
            state).{updating ? " Updating for the new composition…" : ""}
          </p>
          <div className="mt-3 grid grid-cols-2 gap-4">
            <RouteColumn title="Ingot" figures={comparison.ingot} />
            <RouteColumn title="Powder" figures={comparison.powder} />
            <MicroField
              kind="network"
              volumeFraction={carbideVolume}
              carbideSizeUm={comparison.ingot.carbideSizeMaxUm ?? 20}
              armSpacingUm={comparison.ingot.armSpacingUm ?? 200}
              sizePx={fieldPx}
              label={`Sketch of the ingot's carbides in a 100 µm field: plates about ${formatNumber(comparison.ingot.carbideSizeMaxUm ?? 0, 2)} µm long along dendrite-cell boundaries about ${formatNumber(comparison.ingot.armSpacingUm ?? 0, 2)} µm apart.`}
            />
            <MicroField
              kind="dispersed"
              volumeFraction={carbideVolume}
              carbideSizeUm={comparison.powder.carbideSizeUm ?? 1}
              armSpacingUm={comparison.powder.armSpacingUm ?? 2}
              sizePx={fieldPx}
              label={`Sketch of the powder steel's carbides in the same 100 µm field: evenly spread particles about ${formatNumber(comparison.powder.carbideSizeUm ?? 0, 2)} µm across.`}
            />
          </div>
          <p className="mt-3 text-sm leading-relaxed text-soot-800">
            The powder&rsquo;s structure is {comparison.refinement ? `about ${Math.round(comparison.refinement)} times` : "much"} finer. The
            last liquid between the dendrite arms is enriched in both routes
            {comparison.ingot.lastLiquidV !== null && comparison.powder.lastLiquidV !== null
              ? ` (${formatMassPct(comparison.ingot.lastLiquidV)} V in the ingot, ${formatMassPct(comparison.powder.lastLiquidV)} in the powder)`
              : ""}
            , but in the powder that liquid sits in pockets a micrometre or two apart and every particle has the melt&rsquo;s composition,
            while the ingot also segregates from wall to centre
            {comparison.ingot.macroSpreadV ? ` (vanadium varies ${formatNumber(comparison.ingot.macroSpreadV, 2)}-fold across it)` : ""}.
          </p>
          <ul className="mt-2 list-disc space-y-1 pl-5 text-sm leading-relaxed text-soot-800">
            <li>
              <strong>Grinding:</strong> large, hard carbides stand proud and resist the abrasive, so the wheel or stone slows down and can
              tear them out; fine carbides are cut with the matrix more evenly.
            </li>
            <li>
              <strong>Polishing:</strong> coarse carbides leave relief and pits around them; a powder steel takes a finer, more uniform
              finish.
            </li>
            <li>
              <strong>Toughness:</strong> a network of coarse carbides gives a crack an easy path, worst across the forging direction; the
              fine, even dispersion of powder steel tolerates much more before a crack runs, at the same carbide volume.
            </li>
          </ul>
        </div>
      )}
    </section>
  );
}

function RouteColumn({ title, figures }: { title: string; figures: RouteFigures }) {
  return (
    <div>
      <p className="eyebrow text-[0.65rem] text-soot-700">{title}</p>
      <dl className="mt-1 space-y-1 text-sm">
        <Row term="Cooling rate" value={`${formatScientific(figures.coolingRateKPerS)} K/s`} />
        <Row term="Dendrite arm spacing" value={figures.armSpacingUm !== null ? `${formatNumber(figures.armSpacingUm, 2)} µm` : "—"} />
        <Row
          term="Carbide size (typical–largest)"
          value={figures.carbideSizeUm !== null ? `${formatNumber(figures.carbideSizeUm, 2)}–${formatNumber(figures.carbideSizeMaxUm ?? figures.carbideSizeUm, 2)} µm` : "—"}
        />
        <Row term="V spread across the product" value={figures.macroSpreadV !== null ? `${formatNumber(figures.macroSpreadV, 2)}×` : "—"} />
      </dl>
    </div>
  );
}

function Row({ term, value }: { term: string; value: string }) {
  return (
    <div>
      <dt className="text-xs text-soot-600">{term}</dt>
      <dd className="font-mono font-semibold tabular-nums text-soot-900">{value}</dd>
    </div>
  );
}
