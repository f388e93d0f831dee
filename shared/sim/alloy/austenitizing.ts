/**
 * The austenitizing (hardening) temperature the alloy explorer assumes for an alloy when the
 * learner has not set one: a typical value for the family the composition belongs to. These are
 * round numbers inside the ranges commonly used for each family (common practice, no published
 * source); the UI says so and lets the learner set one temperature for all alloys instead.
 */
import type { Composition } from "../../metallurgy/composition";

export const AUSTENITIZING_RANGE_C = { min: 760, max: 1250 } as const;

export interface AusteniteChoice {
  tempC: number;
  family: string;
}

export function typicalAustenitizingTempC(comp: Composition): AusteniteChoice {
  const c = comp.C ?? 0;
  const cr = comp.Cr ?? 0;
  const v = comp.V ?? 0;
  const tungstenEquivalent = (comp.W ?? 0) + 2 * (comp.Mo ?? 0);
  if (tungstenEquivalent >= 8 && cr >= 3) return { tempC: 1190, family: "high-speed steel" };
  if (cr >= 10.5 && (comp.Ni ?? 0) >= 6) return { tempC: 1050, family: "austenitic stainless (not hardenable by quenching)" };
  if (cr >= 10.5 && c <= 1.2) return { tempC: 1050, family: "martensitic stainless steel" };
  if (cr >= 10.5) return { tempC: 1020, family: "high-chromium cold-work tool steel" };
  if (v >= 4) return { tempC: 1120, family: "high-vanadium tool steel" };
  if (cr >= 4 || tungstenEquivalent >= 2) return { tempC: 1010, family: "alloyed tool steel" };
  if (c >= 0.9) return { tempC: 800, family: "high-carbon steel" };
  return { tempC: 830, family: "carbon or low-alloy steel" };
}
