/** The alloy explorer's text for the ARIA live region: the key figures of each alloy. Pure. */
import { formatMassPct, formatNumber } from "./format";
import type { AlloyReport } from "./report";

export function describeComparison(reports: readonly AlloyReport[]): string {
  const names = reports.map((r) => r.alloy.name);
  const head = reports.length === 1 ? `Exploring ${names[0]}.` : `Comparing ${names.slice(0, -1).join(", ")} and ${names[names.length - 1]}.`;
  return [head, ...reports.map(describeOne)].join(" ");
}

function describeOne(r: AlloyReport): string {
  const n = r.numbers;
  const comp = r.alloy.composition;
  const parts = [`${r.alloy.name} (${formatMassPct(comp.C ?? 0)} C, ${formatMassPct(comp.Cr ?? 0)} Cr, ${formatMassPct(comp.V ?? 0)} V):`];
  parts.push(r.figures.stainless.value === "Yes" ? "stainless by the standard" : "not stainless by the standard");
  if (n.freeChromiumHardened !== null) parts.push(`free Cr ${formatMassPct(n.freeChromiumHardened)} after hardening at ${r.austenitizingTempC} °C`);
  if (n.prenBulk !== null) parts.push(`PREN ${formatNumber(n.prenBulk, 3)}${n.prenMatrix !== null ? ` (matrix ${formatNumber(n.prenMatrix, 3)})` : ""}`);
  if (n.totalCarbideVolumePct) parts.push(`${formatNumber(n.totalCarbideVolumePct.hardened, 2)} vol% carbides`);
  if (n.hardnessHrc !== null) parts.push(`${formatNumber(n.hardnessHrc, 3)} HRC`);
  if (n.retainedAusteniteRoom !== null) parts.push(`${formatNumber(n.retainedAusteniteRoom * 100, 2)} % retained austenite`);
  if (n.edgeRetention !== null) parts.push(`edge-retention index ${formatNumber(n.edgeRetention, 3)}`);
  if (r.error) parts.push(`some figures not computed: ${r.error}`);
  return `${parts[0]} ${parts.slice(1).join(", ")}.`;
}
