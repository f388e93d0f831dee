import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { isSimulationId, SIMULATION_IDS, SIMULATIONS } from "@/lab/registry";

describe("simulation registry", () => {
  it("lists the five simulations, each with a title, a summary and its own folder", () => {
    expect(SIMULATION_IDS).toEqual(["passive-film", "carbides", "ingot", "powder", "alloy"]);
    for (const id of SIMULATION_IDS) {
      expect(SIMULATIONS[id].title.length).toBeGreaterThan(3);
      expect(SIMULATIONS[id].summary.length).toBeGreaterThan(40);
      // Each entry's dynamic import points at src/lab/<id>/index.tsx.
      expect(fs.existsSync(path.join(__dirname, "../../../src/lab", id, "index.tsx")), id).toBe(true);
    }
  });

  it("recognises only registered ids (not inherited object keys)", () => {
    expect(isSimulationId("carbides")).toBe(true);
    expect(isSimulationId("toString")).toBe(false);
    expect(isSimulationId("__proto__")).toBe(false);
    expect(isSimulationId(undefined)).toBe(false);
  });
});
