/**
 * The simulation lab's table of contents. Each entry's `load` is a dynamic
 * import, so a simulation's code (and konva) is fetched only when it is opened.
 */
import type { ComponentType } from "react";

export interface SimulationEntry {
  title: string;
  /** One or two sentences, shown in the lab index and above the simulation. */
  summary: string;
  /** The topics the simulation covers, as short tags. */
  topics: readonly string[];
  load: () => Promise<{ default: ComponentType }>;
}

export const SIMULATIONS = {
  "passive-film": {
    title: "Passive film",
    summary:
      "Chromium and iron atoms on a steel surface meet air and water: an oxide film grows along connected chromium, and rust starts where the network breaks.",
    topics: ["corrosion", "chromium", "percolation"],
    load: () => import("./passive-film"),
  },
  carbides: {
    title: "Carbide population",
    summary:
      "A micrograph-like field of carbides in hardened steel for standard grades, with coarsening, edge wear by quartz grit and sharpening time on different stones.",
    topics: ["carbides", "edge retention", "sharpening"],
    load: () => import("./carbides"),
  },
  ingot: {
    title: "Ingot freezing",
    summary:
      "An ingot freezing from the mould wall inward: the temperature field, the mushy zone, solute pushed ahead of the front and the segregation left behind.",
    topics: ["solidification", "segregation"],
    load: () => import("./ingot"),
  },
  powder: {
    title: "Gas-atomised powder",
    summary:
      "A melt stream broken into droplets by a gas jet: droplet size sets the cooling rate, the dendrite spacing and the carbide size; then hot isostatic pressing.",
    topics: ["powder metallurgy", "cooling rate", "HIP"],
    load: () => import("./powder"),
  },
  alloy: {
    title: "Alloy explorer",
    summary:
      "Set the percentages of carbon, chromium, vanadium, tungsten, molybdenum and more, and compare up to three alloys side by side.",
    topics: ["composition", "hardness", "stainless"],
    load: () => import("./alloy"),
  },
} as const satisfies Record<string, SimulationEntry>;

export type SimulationId = keyof typeof SIMULATIONS;

export const SIMULATION_IDS = Object.keys(SIMULATIONS) as SimulationId[];

export function isSimulationId(value: string | undefined): value is SimulationId {
  return value !== undefined && Object.hasOwn(SIMULATIONS, value);
}
