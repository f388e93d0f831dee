/**
 * `npm run bench`: per-call / per-step cost of the science-core hot paths the simulations run
 * every animation frame. Hand-rolled harness (documented in bench/README.md): warm-up, automatic
 * batching of fast calls, many timed samples, median with p10–p90 spread, fraction of a 16.7 ms
 * frame. Results are merged into bench/results.json under "machine" and "core".
 */
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import { cpus, loadavg } from "node:os";
import { fileURLToPath } from "node:url";
import {
  allocateCarbides,
  createClusterWorkspace,
  createIngot,
  createRandom,
  dropletCooling,
  labelClusters,
  sampleDropletDiametersM,
  stepIngot,
  type ClusterWorkspace,
  type LatticeGeometry,
} from "../shared/metallurgy";

const FRAME_MS = 1000 / 60; // 16.7 ms at 60 frames per second
const BUDGET_MS = 4; // per-frame goal of issue #3

interface CaseOptions {
  /** Warm-up time before sampling (lets the JIT optimise), ms. */
  warmupMs?: number;
  /** Minimum number of timed samples. */
  minSamples?: number;
  /** Minimum total sampling time, ms. */
  minTimeMs?: number;
  /** Upper bound on samples. */
  maxSamples?: number;
  /** Target duration of one sample; fast calls are batched to reach it, ms. */
  targetSampleMs?: number;
}

export interface CaseResult {
  medianMs: number;
  p10Ms: number;
  p90Ms: number;
  frameFraction: number;
  samples: number;
  /** Calls per timed sample (sample time ÷ batch = per-call time). */
  batch: number;
}

// Results of every call feed this sink so the JIT cannot drop the work as dead code.
let sink = 0;

function quantile(sorted: number[], q: number): number {
  const pos = (sorted.length - 1) * q;
  const lo = Math.floor(pos);
  const hi = Math.ceil(pos);
  return sorted[lo] + (sorted[hi] - sorted[lo]) * (pos - lo);
}

function measure(fn: () => number, opts: CaseOptions = {}): CaseResult {
  const { warmupMs = 300, minSamples = 100, minTimeMs = 1500, maxSamples = 5000, targetSampleMs = 0.5 } = opts;
  // Warm-up: at least 10 calls and warmupMs of running.
  let calls = 0;
  const warmStart = performance.now();
  while (calls < 10 || performance.now() - warmStart < warmupMs) {
    sink += fn();
    calls++;
  }
  const perCallEstimate = (performance.now() - warmStart) / calls;
  const batch = Math.max(1, Math.ceil(targetSampleMs / Math.max(perCallEstimate, 1e-6)));
  const samples: number[] = [];
  const start = performance.now();
  while (samples.length < maxSamples && (samples.length < minSamples || performance.now() - start < minTimeMs)) {
    const t0 = performance.now();
    for (let b = 0; b < batch; b++) sink += fn();
    samples.push((performance.now() - t0) / batch);
  }
  samples.sort((a, b) => a - b);
  const medianMs = quantile(samples, 0.5);
  return {
    medianMs,
    p10Ms: quantile(samples, 0.1),
    p90Ms: quantile(samples, 0.9),
    frameFraction: medianMs / FRAME_MS,
    samples: samples.length,
    batch,
  };
}

// ---- cases --------------------------------------------------------------------------------

function labellingCase(geometry: LatticeGeometry, siteCount: number, crFraction: number, seed: number): () => number {
  const random = createRandom(seed);
  const occupancy = new Uint8Array(siteCount);
  for (let i = 0; i < siteCount; i++) occupancy[i] = random() < crFraction ? 1 : 0;
  const workspace: ClusterWorkspace = createClusterWorkspace(siteCount);
  return () => labelClusters(occupancy, geometry, { workspace }).count;
}

function ingotStepCase(): () => number {
  // 0.1 m slab, 400 nodes, metal mould, five tracked solutes; advanced into the mushy stage first.
  const state = createIngot({
    halfThicknessM: 0.1,
    cells: 400,
    pourTempC: 1520,
    composition: { C: 1.0, Cr: 1.5, V: 0.3, Mn: 0.4, Si: 0.3 },
    wall: { type: "mould", mould: "metal" },
  });
  const dt = 0.9 * state.maxStableDtS;
  for (let i = 0; i < 20000; i++) stepIngot(state, dt);
  return () => {
    stepIngot(state, dt);
    return state.tempC[200];
  };
}

function carbideCase(): () => number {
  const d2 = { C: 1.55, Cr: 11.5, Mo: 0.8, V: 0.9 }; // D2-type, science-reference §2.2 check 5
  return () => allocateCarbides(d2).phases.length;
}

function dropletCase(): () => number {
  const diameters = sampleDropletDiametersM(10000, 80e-6, 2, createRandom(2024));
  for (let i = 0; i < diameters.length; i++) diameters[i] = Math.min(1e-3, Math.max(1e-6, diameters[i]));
  return () => {
    let s = 0;
    for (let i = 0; i < diameters.length; i++) {
      s += dropletCooling({ gas: "N2", diameterM: diameters[i], relativeVelocityMPerS: 20, dropletTempK: 1773.15, gasTempK: 300 }).coolingRateKPerS;
    }
    return s;
  };
}

const CASES: { name: string; description: string; perFrame: boolean; make: () => () => number; opts?: CaseOptions }[] = [
  {
    name: "labelClusters_square_256x256",
    description: "cluster labelling, 256×256 square lattice, NN, p = 0.60, workspace reused",
    perFrame: true,
    make: () => labellingCase({ lattice: "square", neighbours: 1, size: 256 }, 256 * 256, 0.6, 1),
  },
  {
    name: "labelClusters_bcc_64cubed",
    description: "cluster labelling, 64³ bcc lattice, NN+2NN, p = 0.18, workspace reused",
    perFrame: true,
    make: () => labellingCase({ lattice: "bcc", neighbours: 2, size: 64 }, 64 ** 3, 0.18, 2),
  },
  {
    name: "ingotStep_400cells",
    description: "one explicit ingot step, 400 nodes, 5 tracked solutes, mushy stage",
    perFrame: true,
    make: ingotStepCase,
  },
  {
    name: "allocateCarbides_D2",
    description: "one carbide allocation (CARB-1), D2-type composition",
    perFrame: true,
    make: carbideCase,
  },
  {
    name: "dropletCooling_x10000",
    description: "10,000 droplet-cooling evaluations (log-normal diameters, N2, 20 m/s)",
    perFrame: true,
    make: dropletCase,
  },
];

function fmt(ms: number): string {
  return ms >= 1 ? ms.toFixed(3) : ms >= 0.001 ? ms.toFixed(4) : ms.toExponential(2);
}

async function main(): Promise<void> {
  const only = process.argv.slice(2);
  const core: Record<string, CaseResult & { description: string }> = {};
  console.log(`Grain & Edge science-core bench — node ${process.version}, ${cpus().length} CPUs (${cpus()[0]?.model ?? "unknown"})`);
  const load = loadavg()[0];
  console.log(`frame = ${FRAME_MS.toFixed(1)} ms, per-frame goal ≤ ${BUDGET_MS} ms median, 1-min load average ${load.toFixed(2)}`);
  if (load > cpus().length) console.log("warning: the machine is busy (load > CPUs); medians are inflated — rerun when idle.");
  console.log("");
  console.log("case".padEnd(32) + "median ms".padStart(12) + "p10–p90 ms".padStart(24) + "frame".padStart(9) + "samples".padStart(9) + "  goal");
  for (const c of CASES) {
    if (only.length > 0 && !only.includes(c.name)) continue;
    let fn: () => number;
    try {
      fn = c.make();
    } catch (err) {
      console.log(`${c.name.padEnd(32)} skipped: ${(err as Error).message}`);
      continue;
    }
    const r = measure(fn, c.opts);
    core[c.name] = { ...r, description: c.description };
    const spread = `${fmt(r.p10Ms)}–${fmt(r.p90Ms)}`;
    const goal = c.perFrame ? (r.medianMs <= BUDGET_MS ? "ok" : "OVER") : "";
    console.log(
      c.name.padEnd(32) + fmt(r.medianMs).padStart(12) + spread.padStart(24) + `${(r.frameFraction * 100).toFixed(2)}%`.padStart(9) + String(r.samples).padStart(9) + `  ${goal}`,
    );
  }

  const path = fileURLToPath(new URL("./results.json", import.meta.url));
  let existing: Record<string, unknown> = {};
  if (existsSync(path)) {
    try {
      existing = JSON.parse(readFileSync(path, "utf8")) as Record<string, unknown>;
    } catch {
      console.warn("bench/results.json was not valid JSON; rewriting it.");
    }
  }
  const previousCore = (existing.core as Record<string, unknown> | undefined) ?? {};
  const merged = {
    ...existing,
    machine: {
      node: process.version,
      cpus: cpus().length,
      cpuModel: cpus()[0]?.model ?? "unknown",
      date: new Date().toISOString(),
      loadAverage1Min: Number(load.toFixed(2)),
    },
    core: { ...previousCore, ...core },
  };
  writeFileSync(path, JSON.stringify(merged, null, 2) + "\n");
  console.log(`\nwrote ${path} (sink ${sink > 0 ? "+" : "-"})`);
}

await main();
