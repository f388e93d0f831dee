import { requireInRange } from "../validate";

/**
 * Rockwell C → Vickers (HV) for non-austenitic steels, after ASTM E140 Table 1.
 * Rows 50–68 HRC are the values of science-reference §2.3, tagged there [Mem, check against E140];
 * rows 20–49 are added from memory [Mem] so the A255 curve (44 HRC at 0.2 % C) can be converted too.
 * A third-party code table citing E140-12b agrees at 68, 65, 60, 55, 50, 45 and 40 HRC. The primary
 * source is the ASTM E140 standard itself (paywalled; not checked here).
 */
export const HRC_TO_HV_TABLE: readonly (readonly [hrc: number, hv: number])[] = [
  [20, 238], [21, 243], [22, 248], [23, 254], [24, 260], [25, 266], [26, 272], [27, 279], [28, 286], [29, 294],
  [30, 302], [31, 310], [32, 318], [33, 327], [34, 336], [35, 345], [36, 354], [37, 363], [38, 372], [39, 382],
  [40, 392], [41, 402], [42, 412], [43, 423], [44, 434], [45, 446], [46, 458], [47, 471], [48, 484], [49, 498],
  [50, 513], [51, 528], [52, 544], [53, 560], [54, 577], [55, 595], [56, 613], [57, 633], [58, 653], [59, 674],
  [60, 697], [61, 720], [62, 746], [63, 772], [64, 800], [65, 832], [66, 865], [67, 900], [68, 940],
];

/** Provenance of each table row. */
export function hardnessConversionTag(hrc: number): string {
  return hrc >= 50 ? "[Mem] science-reference §2.3 (ASTM E140 Table 1)" : "[Mem] from memory (ASTM E140 Table 1)";
}

const HRC_MIN = HRC_TO_HV_TABLE[0][0];
const HRC_MAX = HRC_TO_HV_TABLE[HRC_TO_HV_TABLE.length - 1][0];
const HV_MIN = HRC_TO_HV_TABLE[0][1];
const HV_MAX = HRC_TO_HV_TABLE[HRC_TO_HV_TABLE.length - 1][1];

function interpolate(x: number, from: 0 | 1): number {
  const to = from === 0 ? 1 : 0;
  const t = HRC_TO_HV_TABLE;
  let i = 0;
  while (i < t.length - 2 && t[i + 1][from] < x) i++;
  const [a, b] = [t[i], t[i + 1]];
  return a[to] + ((x - a[from]) * (b[to] - a[to])) / (b[from] - a[from]);
}

/**
 * Vickers hardness (HV) from Rockwell C (20–68 HRC) by linear interpolation in HRC_TO_HV_TABLE
 * (ASTM E140 Table 1 values, [Mem]). Rejects values outside the table.
 */
export function hrcToHv(hrc: number): number {
  requireInRange("hrc", hrc, { min: HRC_MIN, max: HRC_MAX });
  return interpolate(hrc, 0);
}

/** Rockwell C from Vickers hardness (238–940 HV), the inverse interpolation of hrcToHv. */
export function hvToHrc(hv: number): number {
  requireInRange("hv", hv, { min: HV_MIN, max: HV_MAX });
  return interpolate(hv, 1);
}
