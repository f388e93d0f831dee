import { createRandom, sampleCarbideField, type CarbideType } from "../../metallurgy";
import { INITIAL_MEAN_RADIUS_UM } from "./constants";

/** The largest total area fraction the field draws (non-overlapping discs jam above ≈ 0.55). */
export const MAX_FIELD_AREA_FRACTION = 0.5;

/**
 * The annealed carbide population of a plane section, sampled once per steel and seed by the core's
 * sampleCarbideField (non-overlapping discs on a periodic field, area fraction = volume fraction).
 * Each particle also gets a random priority: hardening and coarsening keep particles in priority order,
 * so the picture changes smoothly as temperature or time change.
 */
export interface BaseField {
  widthUm: number;
  heightUm: number;
  count: number;
  xUm: Float64Array;
  yUm: Float64Array;
  /** Radius before coarsening, µm. */
  radiusUm: Float64Array;
  /** Index into `types`. */
  typeIndex: Uint8Array;
  types: CarbideType[];
  /** Particle indices in priority order. */
  order: Int32Array;
  /** Requested area fraction per type (0–1) of the annealed steel (after any scaling). */
  annealedFraction: Partial<Record<CarbideType, number>>;
  warnings: string[];
}

export interface BaseFieldInput {
  annealed: readonly { type: CarbideType; volumePct: number }[];
  fieldUm: number;
  seed: number;
  sizeModel: "lognormal" | "lsw";
}

export function sampleBaseField(input: BaseFieldInput): BaseField {
  const warnings: string[] = [];
  const present = input.annealed.filter((p) => p.volumePct > 0);
  const total = present.reduce((s, p) => s + p.volumePct / 100, 0);
  const scale = total > MAX_FIELD_AREA_FRACTION ? MAX_FIELD_AREA_FRACTION / total : 1;
  if (scale < 1) warnings.push(`The carbides fill ${(total * 100).toFixed(0)} % of the volume; the field draws them at ${(MAX_FIELD_AREA_FRACTION * 100).toFixed(0)} %.`);
  const field = sampleCarbideField({
    phases: present.map((p) => ({ type: p.type, volumeFraction: (p.volumePct / 100) * scale, meanRadiusUm: INITIAL_MEAN_RADIUS_UM[p.type] })),
    widthUm: input.fieldUm,
    heightUm: input.fieldUm,
    seed: input.seed,
    sizeModel: input.sizeModel,
    meanRadiusUm: 0.5,
    maxParticles: 60_000,
  });
  warnings.push(...field.warnings);
  const types = present.map((p) => p.type);
  const n = field.particles.length;
  const xUm = new Float64Array(n), yUm = new Float64Array(n), radiusUm = new Float64Array(n);
  const typeIndex = new Uint8Array(n);
  field.particles.forEach((p, i) => {
    xUm[i] = p.xUm; yUm[i] = p.yUm; radiusUm[i] = p.radiusUm;
    typeIndex[i] = types.indexOf(p.type as CarbideType);
  });
  const random = createRandom((input.seed ^ 0x2545f491) >>> 0);
  const priority = Array.from({ length: n }, () => random());
  const order = Int32Array.from(Array.from({ length: n }, (_, i) => i).sort((a, b) => priority[a] - priority[b]));
  const annealedFraction: Partial<Record<CarbideType, number>> = {};
  for (const p of present) annealedFraction[p.type] = (p.volumePct / 100) * scale;
  return { widthUm: field.widthUm, heightUm: field.heightUm, count: n, xUm, yUm, radiusUm, typeIndex, types, order, annealedFraction, warnings };
}

/** The particles drawn at one moment: which ones, and how large. */
export interface VisibleField {
  count: number;
  /** Indices into the base field. */
  index: Int32Array;
  radiusUm: Float64Array;
  /** Drawn area fraction per type (0–1). */
  areaFraction: Partial<Record<CarbideType, number>>;
  /** Target area fraction per type (0–1). */
  targetFraction: Partial<Record<CarbideType, number>>;
}

/**
 * Chooses the particles to draw for target area fractions (e.g. the carbides left after austenitizing) and
 * growth factors (coarsening): particles are taken in priority order, each grown by its type's factor,
 * skipped if it would overlap one already taken (periodic field) or overshoot its type's target by more
 * than half its own area. Deterministic; O(N) with a uniform grid.
 */
export function selectVisible(
  base: BaseField,
  targetFraction: Partial<Record<CarbideType, number>>,
  growth: Partial<Record<CarbideType, number>>,
): VisibleField {
  const { widthUm: W, heightUm: H, count } = base;
  const area = W * H;
  const g = base.types.map((t) => growth[t] ?? 1);
  const goal = base.types.map((t) => Math.max(0, targetFraction[t] ?? 0) * area);
  const got = base.types.map(() => 0);
  let maxR = 0;
  for (let i = 0; i < count; i++) maxR = Math.max(maxR, base.radiusUm[i] * g[base.typeIndex[i]]);
  const nx = Math.max(1, Math.min(256, Math.floor(W / Math.max(2 * maxR, 1e-6))));
  const ny = Math.max(1, Math.min(256, Math.floor(H / Math.max(2 * maxR, 1e-6))));
  const cellW = W / nx, cellH = H / ny;
  const ws = workspace(count, nx * ny);
  const head = ws.head.fill(-1, 0, nx * ny);
  const { next, chosenRadius } = ws;
  // The returned arrays are fresh: a caller may keep an earlier selection.
  const index = new Int32Array(count);
  const radius = new Float64Array(count);
  let n = 0;

  for (let k = 0; k < count; k++) {
    const i = base.order[k];
    const t = base.typeIndex[i];
    const r = base.radiusUm[i] * g[t];
    const a = Math.PI * r * r;
    if (got[t] + a - goal[t] > a / 2) continue;
    const x = base.xUm[i], y = base.yUm[i];
    const cx = Math.min(nx - 1, Math.floor(x / cellW));
    const cy = Math.min(ny - 1, Math.floor(y / cellH));
    let free = true;
    for (let dy = -1; dy <= 1 && free; dy++) {
      const gy = (cy + dy + ny) % ny;
      for (let dx = -1; dx <= 1 && free; dx++) {
        const gx = (cx + dx + nx) % nx;
        for (let j = head[gx + nx * gy]; j >= 0; j = next[j]) {
          let ddx = Math.abs(base.xUm[j] - x);
          let ddy = Math.abs(base.yUm[j] - y);
          ddx = Math.min(ddx, W - ddx);
          ddy = Math.min(ddy, H - ddy);
          const reach = chosenRadius[j] + r;
          if (ddx * ddx + ddy * ddy < reach * reach) { free = false; break; }
        }
      }
    }
    if (!free) continue;
    const c = cx + nx * cy;
    next[i] = head[c];
    head[c] = i;
    chosenRadius[i] = r;
    index[n] = i;
    radius[n] = r;
    n++;
    got[t] += a;
  }
  const areaFraction: Partial<Record<CarbideType, number>> = {};
  const target: Partial<Record<CarbideType, number>> = {};
  base.types.forEach((t, j) => { areaFraction[t] = got[j] / area; target[t] = goal[j] / area; });
  return { count: n, index: index.subarray(0, n), radiusUm: radius.subarray(0, n), areaFraction, targetFraction: target };
}

let shared = { head: new Int32Array(0), next: new Int32Array(0), chosenRadius: new Float64Array(0) };

/** Scratch buffers of selectVisible, reused between calls (it runs every animation frame). */
function workspace(count: number, cells: number) {
  if (shared.next.length < count) shared = { ...shared, next: new Int32Array(count), chosenRadius: new Float64Array(count) };
  if (shared.head.length < cells) shared = { ...shared, head: new Int32Array(cells) };
  return shared;
}
