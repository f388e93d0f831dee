import type { IngotRun } from "@shared/sim/ingot/run";
import { formatDuration, formatMassPct, formatNumber } from "@shared/sim/alloy/format";

/** Freezing range from the composition and the freezing time against Chvorinov's rule. */
export function FreezingPanel({ run }: { run: IngotRun }) {
  const range = run.liquidusC - run.solidusC;
  const ratio = run.totalTimeS / run.chvorinov.sandRuleTimeS;
  return (
    <section aria-labelledby="ingot-freezing" className="rounded-md border border-bone-300 bg-white p-4">
      <h3 id="ingot-freezing" className="font-display text-lg font-semibold text-soot-900">
        Freezing range and freezing time
      </h3>
      <dl className="mt-3 grid grid-cols-2 gap-x-4 gap-y-2 text-sm @lg:grid-cols-4">
        <Fact term="Liquidus" value={`${Math.round(run.liquidusC)} °C`} />
        <Fact term="Solidus (equilibrium)" value={`${Math.round(run.solidusC)} °C`} />
        <Fact term="Freezing range" value={`${Math.round(range)} °C`} />
        <Fact term="Poured at" value={`${Math.round(run.pourTempC)} °C`} />
        <Fact term="Model: fully solid after" value={formatDuration(run.totalTimeS)} />
        <Fact term="Chvorinov, sand, B = 2 min/cm²" value={formatDuration(run.chvorinov.sandRuleTimeS)} />
        <Fact term="Model ÷ Chvorinov" value={`${formatNumber(ratio, 2)}×`} />
        <Fact term="B that matches the model" value={`${formatNumber(run.chvorinov.equivalentConstantMinPerCm2, 2)} min/cm²`} />
      </dl>
      <p className="mt-3 text-sm leading-relaxed text-soot-700">
        A wide freezing range means a deep mushy zone, long local freezing times and more room for solute to collect between the dendrite
        arms. {run.sim.mould === "sand" ? "For a sand mould Chvorinov's rule and the model should be of the same order; " : "Chvorinov's constant here is the sand value, so a metal or water-cooled mould freezes faster than the rule says; "}
        the modulus of a long round ingot is R/2 = {formatNumber(run.chvorinov.modulusCm)} cm.
      </p>
      {run.warnings.length > 0 ? (
        <div className="mt-3 rounded-sm border border-temper-bronze/60 bg-bone-100 px-3 py-2 text-sm text-soot-800">
          <p className="font-semibold">Calibration warnings</p>
          <ul className="mt-1 list-disc space-y-0.5 pl-5">
            {run.warnings.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
        </div>
      ) : null}
    </section>
  );
}

function Fact({ term, value }: { term: string; value: string }) {
  return (
    <div>
      <dt className="text-xs text-soot-600">{term}</dt>
      <dd className="font-mono text-base font-semibold tabular-nums text-soot-900">{value}</dd>
    </div>
  );
}

/** Where coarse primary carbides are expected and why high-vanadium steels go the powder route. */
export function CarbidePanel({ run }: { run: IngotRun }) {
  const n = run.cells;
  const flagged = run.final.carbideRisk.map((r, i) => ({ r, i })).filter((x) => x.r !== "none");
  const first = flagged[0];
  const sizes = flagged.map((x) => run.final.carbideSizeUm[x.i]).filter((s) => s > 0);
  const vNominal = run.nominalMassPct.V ?? 0;
  const kinds = new Set(flagged.map((x) => x.r));
  const mc = kinds.has("MC") || kinds.has("both");
  const eut = kinds.has("eutectic") || kinds.has("both");
  return (
    <section aria-labelledby="ingot-carbides" className="rounded-md border border-bone-300 bg-white p-4">
      <h3 id="ingot-carbides" className="font-display text-lg font-semibold text-soot-900">
        Coarse primary carbides
      </h3>
      <p className="mt-2 text-sm leading-relaxed text-soot-800">
        {first ? (
          <>
            Expected from {Math.round(run.positionM[first.i] * 1000)} mm below the surface
            {flagged.length === n - first.i ? " to the centre" : " in parts of the section"} ({Math.round((100 * flagged.length) / n)} % of the
            rings): {mc ? "primary vanadium carbide (MC)" : ""}
            {mc && eut ? " and " : ""}
            {eut ? "a carbide eutectic" : ""}, roughly {formatNumber(Math.min(...sizes), 2)}–{formatNumber(Math.max(...sizes), 2)} µm across
            (0.3 × λ2). They are drawn as dark angular marks in the section.
          </>
        ) : (
          <>None expected by the last-liquid rule for this alloy and ingot.</>
        )}
      </p>
      <p className="mt-2 text-sm leading-relaxed text-soot-700">
        Vanadium and carbon both stay in the liquid as the dendrites grow, so the last liquid between the arms can be several times richer
        than the melt ({vNominal > 0 ? `here up to ${formatMassPct(Math.max(...Array.from(run.final.lastLiquidMassPct.V ?? [0]).slice(0, n - 1)))} V from ${formatMassPct(vNominal)}` : "this alloy has no vanadium"}).
        Carbides that form from that liquid grow as large as the space between the arms allows, and in a big, slowly frozen ingot that space
        is hundreds of micrometres. Forging breaks such networks only partly. Atomising the melt into droplets freezes each one in
        milliseconds with arm spacings of a few micrometres, so the same composition gives fine, evenly spread carbides: this is why
        high-vanadium grades are made by the powder route.
      </p>
      <aside className="mt-3 rounded-sm border-l-4 border-temper-bronze bg-bone-100 px-3 py-2 text-sm text-soot-800">
        <p className="eyebrow text-[0.65rem] text-soot-700">Common practice, no published source</p>
        <p className="mt-1">
          Above roughly 4–5 % vanadium, conventional ingot casting becomes a problem, and such steels are made by powder metallurgy (or
          spray forming).
        </p>
      </aside>
    </section>
  );
}
