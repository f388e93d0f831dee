import { describe, expect, it } from "vitest";
import { parsePassiveFilmParams, PASSIVE_FILM_DEFAULTS } from "@shared/sim/passive-film";

describe("passive-film params (contract with content/AUTHORING.md)", () => {
  it("fills every AUTHORING.md parameter with a default", () => {
    expect(Object.keys(PASSIVE_FILM_DEFAULTS).sort()).toEqual(
      ["carbide", "cMassPct", "connectivity", "crMassPct", "environment", "lattice", "neighbours", "seed", "view"].sort(),
    );
  });

  it("accepts the presets a lesson may pass", () => {
    const p = parsePassiveFilmParams({ crMassPct: 9, cMassPct: 0.3, carbide: "M7C3", neighbours: 1, connectivity: "thin-layer", environment: "salt", seed: 42, view: "spanning" });
    expect(p).toMatchObject({ crMassPct: 9, carbide: "M7C3", neighbours: 1, connectivity: "thin-layer", environment: "salt", seed: 42, view: "spanning" });
    expect(parsePassiveFilmParams({ crMassPct: 9 }).environment).toBe("humid");
  });

  it("rejects out-of-range values, unknown options and misspelt names", () => {
    expect(() => parsePassiveFilmParams({ crMassPct: 31 })).toThrow();
    expect(() => parsePassiveFilmParams({ cMassPct: 1.3 })).toThrow();
    expect(() => parsePassiveFilmParams({ neighbours: 3 })).toThrow();
    expect(() => parsePassiveFilmParams({ environment: "rain" })).toThrow();
    expect(() => parsePassiveFilmParams({ seed: 1.5 })).toThrow();
    expect(() => parsePassiveFilmParams({ crMasPct: 9 })).toThrow();
  });
});
