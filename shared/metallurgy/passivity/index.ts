// Passive chromium-oxide film (science-reference §1).
export * from "./stainless-definition";
export * from "./chromium-atom-fraction";
export * from "./pren";
export * from "./chromium-in-carbide";
export * from "./film-growth";
export * from "./percolation-thresholds";
export * from "./lattice-neighbours";
export * from "./cluster-labelling";
export * from "./spanning-probability";
