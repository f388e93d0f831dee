// Carbide population simulation: pure state logic (no DOM).
export * from "./params";
export * from "./constants";
export * from "./composition";
export * from "./population";
export * from "./indices";
export * from "./coarsening";
export * from "./field";
export * from "./edge-grid";
export * from "./edge-wear";
export * from "./edge-sharpen";
export * from "./edge-metrics";
export * from "./state";
export * from "./summary";
