import { InputError } from "../errors";
import { createRandom, normalDeviate, type RandomSource } from "../random";
import { requireInRange, requireInteger, requireOneOf, requirePositive } from "../validate";
import { sampleLswScaledRadius } from "./lsw-coarsening";

export type CarbideSizeModel = "lognormal" | "lsw";

export interface CarbideFieldPhase {
  /** Carbide type or any label the view colours by. */
  type: string;
  /** Volume fraction 0–1 (= expected area fraction of a plane section, Delesse's principle). */
  volumeFraction: number;
  /** Mean radius of this phase's section circles, µm; defaults to the field's meanRadiusUm. */
  meanRadiusUm?: number;
}

export interface CarbideFieldOptions {
  phases: readonly CarbideFieldPhase[];
  /** Field size in µm: width and height, or areaUm2 for a square field. */
  widthUm?: number;
  heightUm?: number;
  areaUm2?: number;
  seed: number;
  /** 'lognormal' (closer to real carbide populations) or 'lsw' (the LSW steady-state distribution). */
  sizeModel: CarbideSizeModel;
  /** Mean radius of the section circles, µm (> 0). */
  meanRadiusUm: number;
  /** Geometric standard deviation of the log-normal radii; default 1.5 [App]. Range 1–3. */
  geometricStdDev?: number;
  /** Upper bound on particle count; default 20 000. */
  maxParticles?: number;
}

export interface CarbideParticle {
  type: string;
  xUm: number;
  yUm: number;
  radiusUm: number;
}

export interface CarbideField {
  widthUm: number;
  heightUm: number;
  /** Non-overlapping circles on a periodic (wrap-around) field; a view draws wrapped copies at the edges. */
  particles: CarbideParticle[];
  /** Drawn area fraction per type (Σ πr² / field area). */
  areaFractionByType: Record<string, number>;
  /** Requested fraction per type (the volume fractions). */
  targetAreaFractionByType: Record<string, number>;
  warnings: string[];
}

const MAX_TOTAL_FRACTION = 0.6; // random sequential addition of disks jams near 0.55 (monodisperse)
const PLACEMENT_ATTEMPTS = 200;

function drawRadius(random: RandomSource, model: CarbideSizeModel, meanUm: number, sigmaLn: number, maxUm: number): number {
  for (let i = 0; i < 100; i++) {
    const r =
      model === "lsw"
        ? meanUm * sampleLswScaledRadius(random)
        : meanUm * Math.exp(sigmaLn * normalDeviate(random) - (sigmaLn * sigmaLn) / 2); // mean = meanUm
    if (r > 0 && r <= maxUm) return r;
  }
  return Math.min(meanUm, maxUm);
}

/**
 * Seeded plane section of a carbide population for the carbide simulation: circles (section radii drawn
 * from a log-normal or the LSW distribution) placed at random without overlap on a periodic field until
 * each type covers its volume fraction of the area — stereology: area fraction = volume fraction
 * (Delesse). Radii above a quarter of the field are redrawn. Deterministic for a seed.
 */
export function sampleCarbideField(opts: CarbideFieldOptions): CarbideField {
  if (!opts || !Array.isArray(opts.phases)) throw new InputError("phases", opts?.phases, "a list of { type, volumeFraction }");
  let width: number;
  let height: number;
  if (opts.areaUm2 !== undefined) {
    width = height = Math.sqrt(requireInRange("areaUm2", opts.areaUm2, { min: 1, max: 1e8 }));
  } else {
    width = requireInRange("widthUm", opts.widthUm as number, { min: 1, max: 1e4 });
    height = requireInRange("heightUm", opts.heightUm as number, { min: 1, max: 1e4 });
  }
  const model = requireOneOf("sizeModel", opts.sizeModel, ["lognormal", "lsw"] as const);
  const meanRadius = requirePositive("meanRadiusUm", opts.meanRadiusUm);
  const gsd = requireInRange("geometricStdDev", opts.geometricStdDev ?? 1.5, { min: 1, max: 3 });
  const maxParticles = requireInteger("maxParticles", opts.maxParticles ?? 20_000, { min: 1, max: 200_000 });
  requireInRange("seed", opts.seed, {});
  const sigmaLn = Math.log(gsd);
  const area = width * height;
  const maxRadius = Math.min(width, height) / 4;
  const warnings: string[] = [];

  let total = 0;
  opts.phases.forEach((p, i) => {
    requireInRange(`phases[${i}].volumeFraction`, p?.volumeFraction, { min: 0, max: 1 });
    if (p.meanRadiusUm !== undefined) requirePositive(`phases[${i}].meanRadiusUm`, p.meanRadiusUm);
    total += p.volumeFraction;
  });
  if (total > MAX_TOTAL_FRACTION) throw new InputError("phases (total volumeFraction)", total, `at most ${MAX_TOTAL_FRACTION} (non-overlapping particles jam above it)`);

  // Expected particle count: area / (π·E[r²]), E[r²] = mean²·gsd-factor (log-normal) or ≈ 1.05·mean² (LSW).
  const secondMomentFactor = model === "lsw" ? 1.05 : Math.exp(sigmaLn * sigmaLn);
  let expected = 0;
  for (const p of opts.phases) {
    const r = p.meanRadiusUm ?? meanRadius;
    expected += (p.volumeFraction * area) / (Math.PI * r * r * secondMomentFactor);
    if (r > Math.min(width, height) / 20) warnings.push(`${p.type}: mean radius ${r} µm is large for the field; few particles, large sampling error.`);
  }
  if (expected > maxParticles) {
    throw new InputError("meanRadiusUm", meanRadius, `large enough for at most ${maxParticles} particles (this field would need about ${Math.round(expected)})`);
  }

  const random = createRandom(opts.seed);
  // Draw radii per phase until its target area is reached (stop at the count nearest the target).
  const drafts: { type: string; r: number }[] = [];
  const target: Record<string, number> = {};
  for (const p of opts.phases) {
    target[p.type] = (target[p.type] ?? 0) + p.volumeFraction;
    const goal = p.volumeFraction * area;
    const mean = p.meanRadiusUm ?? meanRadius;
    let sum = 0;
    while (sum < goal) {
      const r = drawRadius(random, model, mean, sigmaLn, maxRadius);
      const a = Math.PI * r * r;
      if (sum + a - goal > goal - sum) break;
      drafts.push({ type: p.type, r });
      sum += a;
    }
  }
  // Largest first: random sequential addition packs better and rarely fails.
  drafts.sort((a, b) => b.r - a.r);

  const particles: CarbideParticle[] = [];
  const drawnArea: Record<string, number> = {};
  for (const t of Object.keys(target)) drawnArea[t] = 0;
  const grid = new SpatialGrid(width, height, drafts.length > 0 ? 2 * drafts[0].r : 1);
  let failed = 0;
  for (const d of drafts) {
    let placed = false;
    for (let attempt = 0; attempt < PLACEMENT_ATTEMPTS && !placed; attempt++) {
      const x = random() * width;
      const y = random() * height;
      if (grid.fits(x, y, d.r, particles)) {
        grid.add(particles.length, x, y);
        particles.push({ type: d.type, xUm: x, yUm: y, radiusUm: d.r });
        drawnArea[d.type] += Math.PI * d.r * d.r;
        placed = true;
      }
    }
    if (!placed) failed++;
  }
  if (failed > 0) warnings.push(`${failed} particle(s) found no free place; the drawn area fraction is below the target.`);
  const areaFractionByType: Record<string, number> = {};
  for (const t of Object.keys(drawnArea)) areaFractionByType[t] = drawnArea[t] / area;
  return { widthUm: width, heightUm: height, particles, areaFractionByType, targetAreaFractionByType: target, warnings };
}

/** Uniform grid over a periodic field for overlap tests; cell size ≥ the largest diameter. */
class SpatialGrid {
  private readonly nx: number;
  private readonly ny: number;
  private readonly cellW: number;
  private readonly cellH: number;
  private readonly cells: number[][];

  constructor(
    private readonly width: number,
    private readonly height: number,
    minCell: number,
  ) {
    this.nx = Math.max(1, Math.min(512, Math.floor(width / minCell)));
    this.ny = Math.max(1, Math.min(512, Math.floor(height / minCell)));
    this.cellW = width / this.nx;
    this.cellH = height / this.ny;
    this.cells = Array.from({ length: this.nx * this.ny }, () => []);
  }

  add(index: number, x: number, y: number): void {
    this.cells[this.cellOf(x, y)].push(index);
  }

  fits(x: number, y: number, r: number, particles: readonly CarbideParticle[]): boolean {
    const cx = Math.min(this.nx - 1, Math.floor(x / this.cellW));
    const cy = Math.min(this.ny - 1, Math.floor(y / this.cellH));
    const reachX = Math.min(this.nx, 3);
    const reachY = Math.min(this.ny, 3);
    for (let i = 0; i < reachX; i++) {
      const gx = (cx - 1 + i + this.nx) % this.nx;
      for (let j = 0; j < reachY; j++) {
        const gy = (cy - 1 + j + this.ny) % this.ny;
        for (const k of this.cells[gx + this.nx * gy]) {
          const p = particles[k];
          let dx = Math.abs(p.xUm - x);
          let dy = Math.abs(p.yUm - y);
          dx = Math.min(dx, this.width - dx);
          dy = Math.min(dy, this.height - dy);
          const reach = p.radiusUm + r;
          if (dx * dx + dy * dy < reach * reach) return false;
        }
      }
    }
    return true;
  }

  private cellOf(x: number, y: number): number {
    const cx = Math.min(this.nx - 1, Math.floor(x / this.cellW));
    const cy = Math.min(this.ny - 1, Math.floor(y / this.cellH));
    return cx + this.nx * cy;
  }
}
