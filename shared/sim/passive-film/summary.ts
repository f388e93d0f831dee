import { passiveFilmThicknessNm } from "../../metallurgy";
import { scratchCounts } from "./scratch";
import { STATUS, type PassiveFilmState } from "./state";

export interface PassiveFilmSummary {
  timeS: number;
  freeCrMassPct: number;
  crAtomFraction: number;
  connected: boolean;
  /** Share of metal (non-carbide) surface sites the film can reach. */
  protectedFraction: number;
  filmFraction: number;
  rustFraction: number;
  bareFraction: number;
  /** Mean thickness of the film present (nm), by the core's direct-logarithmic law; null if no film. */
  meanFilmNm: number | null;
  /** Age (s) of the oldest film on the surface; null if no film. */
  oldestFilmAgeS: number | null;
  scratch: { total: number; film: number; rust: number; bare: number };
}

const AGE_BINS = 64;

/** Key numbers of the current state (cheap: one pass over the surface). */
export function summarise(state: PassiveFilmState): PassiveFilmSummary {
  const metal = state.counts.bare + state.counts.film + state.counts.rust;
  // Film ages binned on a log scale, then thickness per bin from the core law (one call per bin).
  const bins = new Float64Array(AGE_BINS);
  let oldest = -1;
  for (let i = 0; i < state.status.length; i++) {
    if (state.status[i] !== STATUS.film) continue;
    const age = Math.max(0, state.timeS - state.sinceS[i]);
    if (age > oldest) oldest = age;
    bins[Math.min(AGE_BINS - 1, Math.floor(Math.log2(1 + age) * 2))]++;
  }
  let meanFilmNm: number | null = null;
  if (state.counts.film > 0) {
    let sum = 0;
    for (let b = 0; b < AGE_BINS; b++) {
      if (bins[b] === 0) continue;
      const ageS = 2 ** ((b + 0.5) / 2) - 1;
      sum += bins[b] * passiveFilmThicknessNm(ageS, "direct-log");
    }
    meanFilmNm = sum / state.counts.film;
  }
  return {
    timeS: state.timeS,
    freeCrMassPct: state.balance.freeCrMassPct,
    crAtomFraction: state.balance.crAtomFraction,
    connected: state.connected,
    protectedFraction: state.protectedFraction,
    filmFraction: metal > 0 ? state.counts.film / metal : 0,
    rustFraction: metal > 0 ? state.counts.rust / metal : 0,
    bareFraction: metal > 0 ? state.counts.bare / metal : 0,
    meanFilmNm,
    oldestFilmAgeS: oldest >= 0 ? oldest : null,
    scratch: scratchCounts(state),
  };
}

const ENVIRONMENT_LABEL = { dry: "dry air", humid: "humid air", salt: "salt spray" } as const;

export function formatModelTime(timeS: number): string {
  if (timeS < 60) return `${timeS < 10 ? timeS.toFixed(1) : Math.round(timeS)} s`;
  if (timeS < 3600) return `${(timeS / 60).toFixed(1)} min`;
  if (timeS < 86400) return `${(timeS / 3600).toFixed(1)} h`;
  return `${(timeS / 86400).toFixed(1)} days`;
}

const pct = (f: number) => `${Math.round(f * 100)} %`;

/** A plain-language sentence set for the ARIA live region and the caption under the canvas. */
export function describe(state: PassiveFilmState, s: PassiveFilmSummary = summarise(state)): string {
  const p = state.params;
  const parts: string[] = [];
  parts.push(`Model time ${formatModelTime(s.timeS)} in ${ENVIRONMENT_LABEL[p.environment]}.`);
  const carbon = p.cMassPct > 0 ? `, ${p.cMassPct.toFixed(2)} % C as ${p.carbide}` : "";
  parts.push(
    state.balance.allChromiumBound
      ? `All ${p.crMassPct.toFixed(1)} % Cr is bound in carbide${carbon}: no free chromium is left.`
      : `${p.crMassPct.toFixed(1)} % Cr${carbon} leaves ${s.freeCrMassPct.toFixed(1)} % free Cr in the matrix (atom fraction ${s.crAtomFraction.toFixed(3)}).`,
  );
  parts.push(
    s.connected
      ? `The chromium network is connected: the film can cover ${pct(s.protectedFraction)} of the surface.`
      : "The chromium network is not connected: only isolated chromium islands can oxidise.",
  );
  parts.push(`Film ${pct(s.filmFraction)}, rust ${pct(s.rustFraction)}, bare metal ${pct(s.bareFraction)}.`);
  if (s.meanFilmNm !== null) parts.push(`Mean film thickness ${s.meanFilmNm.toFixed(2)} nm.`);
  if (s.scratch.total > 0) {
    parts.push(
      s.scratch.rust > 0
        ? `Rust has started in the scratch (${pct(s.scratch.rust / s.scratch.total)} of it).`
        : s.scratch.film === s.scratch.total
          ? "The scratch has healed."
          : `The scratch is ${pct(s.scratch.film / s.scratch.total)} re-filmed.`,
    );
  }
  return parts.join(" ");
}
