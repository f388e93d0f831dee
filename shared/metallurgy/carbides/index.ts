// Carbide populations, coarsening and wear indices (science-reference §2.1, 2.2, 2.5, 2.6).
export * from "./carbide-data";
export * from "./carbide-allocation";
export * from "./hardened-state";
export * from "./austenitizing-dissolution";
export * from "./lsw-coarsening";
export * from "./solute-diffusion";
export * from "./wear-index";
export * from "./carbide-field";
