import { describe, expect, it } from "vitest";
import {
  initialState,
  parsePassiveFilmParams,
  scratch,
  scratchCounts,
  setEnvironment,
  step,
  summarise,
  STATUS,
  type PassiveFilmParamsInput,
  type PassiveFilmState,
} from "@shared/sim/passive-film";

function run(state: PassiveFilmState, seconds: number, dtS = 0.25): PassiveFilmState {
  for (let t = 0; t < seconds - 1e-9; t += dtS) step(state, dtS);
  return state;
}

const surface = (input: PassiveFilmParamsInput) => initialState(parsePassiveFilmParams({ cMassPct: 0, ...input }), { sizeSites: 128 });

// Thresholds below: bcc NN+2NN p_c ≈ 0.175 (≈ 16.5 wt% Cr), science-reference §1a [Mem, Computed check];
// the drawn slab is finite, so the test stays well clear of it on both sides.
describe("passive film on a connected chromium network", () => {
  it("is connected at 24 % Cr and the film covers almost the whole surface", () => {
    const s = run(surface({ crMassPct: 24, environment: "humid", seed: 3 }), 10);
    expect(s.connected).toBe(true);
    expect(summarise(s).filmFraction).toBeGreaterThan(0.95);
  });

  it("heals a scratch within seconds of model time and no rust starts in it", () => {
    const s = run(surface({ crMassPct: 24, environment: "salt", seed: 3 }), 5);
    const cut = scratch(s, { x: 5, y: 64 }, { x: 123, y: 64 });
    expect(cut).toBeGreaterThan(400);
    expect(scratchCounts(s).film).toBe(0);
    run(s, 3);
    const inScratch = scratchCounts(s);
    expect(inScratch.rust).toBe(0);
    expect(inScratch.film / inScratch.total).toBeGreaterThan(0.97);
  });
});

describe("passive film on a disconnected chromium network", () => {
  it("is not connected at 9 % Cr", () => {
    expect(surface({ crMassPct: 9, seed: 3 }).connected).toBe(false);
  });

  it("rusts: rust starts in a scratch in humid air", () => {
    const s = surface({ crMassPct: 9, environment: "humid", seed: 3 });
    run(s, 2);
    scratch(s, { x: 5, y: 64 }, { x: 123, y: 64 });
    run(s, 90, 0.5);
    expect(scratchCounts(s).rust).toBeGreaterThan(0);
    expect(summarise(s).rustFraction).toBeGreaterThan(0.5);
  });

  it("only isolated chromium islands carry film; iron stays bare in dry air and never rusts", () => {
    const s = run(surface({ crMassPct: 9, environment: "dry", seed: 3 }), 60, 0.5);
    const sum = summarise(s);
    expect(sum.rustFraction).toBe(0);
    // Film only on the Cr sites (≈ 9 % atom fraction), no spreading over iron.
    expect(sum.filmFraction).toBeLessThan(0.12);
    for (let i = 0; i < s.status.length; i++) if (s.status[i] === STATUS.film) expect(s.kind[i]).toBe(1);
  });
});

describe("environment", () => {
  it("salt spray attacks faster than humid air, which attacks while dry air does not", () => {
    const rustAfter = (environment: "dry" | "humid" | "salt") => summarise(run(surface({ crMassPct: 5, environment, seed: 11 }), 30, 0.5)).rustFraction;
    const dry = rustAfter("dry");
    const humid = rustAfter("humid");
    const salt = rustAfter("salt");
    expect(dry).toBe(0);
    expect(humid).toBeGreaterThan(0);
    expect(salt).toBeGreaterThan(humid * 2);
  });

  it("switching a dry surface to salt spray starts rust on the exposed iron", () => {
    const s = run(surface({ crMassPct: 5, environment: "dry", seed: 2 }), 10, 0.5);
    expect(s.counts.rust).toBe(0);
    setEnvironment(s, "salt");
    run(s, 30, 0.5);
    expect(s.counts.rust).toBeGreaterThan(0);
  });
});

describe("determinism and bookkeeping", () => {
  it("replays exactly from the same seed and differs for another seed", () => {
    const a = run(surface({ crMassPct: 12, environment: "salt", seed: 5 }), 20, 0.5);
    const b = run(surface({ crMassPct: 12, environment: "salt", seed: 5 }), 20, 0.5);
    const c = run(surface({ crMassPct: 12, environment: "salt", seed: 6 }), 20, 0.5);
    expect(Buffer.from(a.status).equals(Buffer.from(b.status))).toBe(true);
    expect(Buffer.from(a.status).equals(Buffer.from(c.status))).toBe(false);
  });

  it("keeps the status counts equal to a recount, and reports changed sites", () => {
    const s = surface({ crMassPct: 14, environment: "salt", seed: 8 });
    step(s, 0.5);
    expect(s.changedCount).toBeGreaterThan(0);
    run(s, 30, 0.5);
    const recount = [0, 0, 0, 0];
    for (const st of s.status) recount[st]++;
    expect([s.counts.bare, s.counts.film, s.counts.rust, s.counts.carbide]).toEqual(recount);
  });

  it("carbon removes chromium: more carbon leaves a sparser network and draws carbide particles", () => {
    const clean = initialState(parsePassiveFilmParams({ crMassPct: 20, cMassPct: 0, seed: 4 }), { sizeSites: 128 });
    const dirty = initialState(parsePassiveFilmParams({ crMassPct: 20, cMassPct: 0.4, seed: 4 }), { sizeSites: 128 });
    expect(dirty.balance.crAtomFraction).toBeLessThan(clean.balance.crAtomFraction);
    expect(dirty.particles.length).toBeGreaterThan(0);
    expect(dirty.counts.carbide).toBeGreaterThan(0);
    expect(clean.counts.carbide).toBe(0);
    expect(dirty.networkShareOfCr).toBeLessThan(clean.networkShareOfCr);
  });

  it("thin-layer connectivity needs more chromium than bulk", () => {
    expect(surface({ crMassPct: 22, connectivity: "bulk", seed: 1 }).connected).toBe(true);
    expect(surface({ crMassPct: 22, connectivity: "thin-layer", seed: 1 }).connected).toBe(false);
  });
});
