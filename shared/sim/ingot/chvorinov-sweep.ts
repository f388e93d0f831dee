/**
 * Freezing time against casting modulus for the chosen mould and alloy, from the core's
 * ingot solver at a series of ingot diameters, beside Chvorinov's rule t = B·M² with the
 * illustrative sand constant. On log–log axes Chvorinov's rule is a line of slope 2; a
 * constant-h mould (the solver's wall model) gives a slope nearer 1 for large ingots, because
 * the interface, not the sand, then limits the heat flow.
 */
import { chvorinovTimeMin, SAND_MOULD_CONSTANT_MIN_PER_CM2 } from "../../metallurgy/solidification/chvorinov";
import type { ResolvedIngotSimParams } from "./params";
import { runIngot } from "./run";

export const SWEEP_SIZES_MM = [50, 100, 200, 400, 800, 1500] as const;
/** Coarser grid than the animation: the total time is converged to < 1 % at 30 nodes. */
const SWEEP_CELLS = 30;

export interface SweepPoint {
  sizeMm: number;
  modulusCm: number;
  modelTimeMin: number;
  chvorinovSandTimeMin: number;
}

export function chvorinovSweep(sim: ResolvedIngotSimParams): SweepPoint[] {
  return SWEEP_SIZES_MM.map((sizeMm) => {
    const run = runIngot({ ...sim, sizeMm }, SWEEP_CELLS, { solutes: false });
    const modulusCm = sizeMm / 10 / 4; // R/2 for a long round bar, with R = d/2
    const rule = chvorinovTimeMin({ volumeCm3: modulusCm, areaCm2: 1, mouldConstantMinPerCm2: SAND_MOULD_CONSTANT_MIN_PER_CM2 });
    return { sizeMm, modulusCm, modelTimeMin: run.totalTimeS / 60, chvorinovSandTimeMin: rule.value };
  });
}
