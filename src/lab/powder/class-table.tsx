import type { PowderClasses } from "@shared/sim/powder/classes";
import { formatNumber, formatScientific } from "@shared/sim/alloy/format";
import { groupPowderWarnings } from "@shared/sim/powder/warnings";

/** Per size class: mass, cooling rate, freezing time and distance, λ2 and carbide size. */
export function ClassTable({ result }: { result: PowderClasses }) {
  // Every distinct warning once, the classes it applies to named (most repeat in every class).
  const warnings = groupPowderWarnings(
    result.warnings,
    result.classes.map((c) => ({ lowerUm: c.lowerM * 1e6, upperUm: c.upperM * 1e6, warnings: c.warnings })),
    (um) => formatNumber(um, 2),
  );
  return (
    <section aria-labelledby="powder-classes" className="rounded-md border border-bone-300 bg-white p-3">
      <h3 id="powder-classes" className="text-sm font-semibold text-soot-900">
        Dendrite arm spacing and carbide size per size class
      </h3>
      <p className="text-xs text-soot-600">
        λ2 from the cooling rate (a casting-data fit extrapolated far beyond its range, so read it as an order of magnitude); carbide size
        taken as 0.3 × λ2 (a model rule).
      </p>
      <p className="mt-1 text-xs font-semibold text-quench-700 sm:hidden" aria-hidden="true">
        Seven columns: scroll the table sideways →
      </p>
      {/* Focusable so the table can be scrolled sideways with the keyboard on a phone. */}
      <div className="mt-2 overflow-x-auto" tabIndex={0} role="region" aria-label="Size-class table (scrolls sideways)">
        <table className="w-full min-w-[36rem] border-collapse text-right text-sm tabular-nums">
          <thead>
            <tr className="border-b border-bone-300 text-xs text-soot-700">
              <th scope="col" className="py-1.5 pr-2 text-left font-semibold">Diameter, µm</th>
              <th scope="col" className="px-2 font-semibold">Mass, %</th>
              <th scope="col" className="px-2 font-semibold">Cooling, K/s</th>
              <th scope="col" className="px-2 font-semibold">Freezing, ms</th>
              <th scope="col" className="px-2 font-semibold">Solid at, cm</th>
              <th scope="col" className="px-2 font-semibold">λ2, µm</th>
              <th scope="col" className="pl-2 font-semibold">Carbides, µm</th>
            </tr>
          </thead>
          <tbody className="font-mono text-soot-900">
            {result.classes.map((c) => (
              <tr key={c.diameterM} className="border-b border-bone-200">
                <th scope="row" className="py-1 pr-2 text-left font-normal">
                  {formatNumber(c.lowerM * 1e6, 2)}–{formatNumber(c.upperM * 1e6, 2)}
                </th>
                <td className="px-2">{formatNumber(c.massFraction * 100, 2)}</td>
                <td className="px-2">{formatScientific(c.coolingRateKPerS, 2, true)}</td>
                <td className="px-2">{Number.isFinite(c.freezingTimeS) ? formatNumber(c.freezingTimeS * 1000, 2) : "—"}</td>
                <td className="px-2">{Number.isFinite(c.solidAtFallM) ? formatNumber(c.solidAtFallM * 100, 2) : "—"}</td>
                <td className="px-2">{c.armSpacingUm !== null ? formatNumber(c.armSpacingUm, 2) : "—"}</td>
                <td className="pl-2">{c.carbideSizeUm !== null ? formatNumber(c.carbideSizeUm, 2) : "—"}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {warnings.length > 0 ? (
        <div className="mt-3 border-t border-bone-200 pt-2">
          <h4 className="text-xs font-semibold text-soot-800">Model warnings ({warnings.length})</h4>
          <ul className="mt-1 list-disc space-y-1 pl-4 text-xs text-soot-700">
            {warnings.map((w) => (
              <li key={w.message}>
                {w.where ? <span className="font-semibold text-soot-800">{w.where.charAt(0).toUpperCase() + w.where.slice(1)}: </span> : null}
                {w.message}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
    </section>
  );
}
