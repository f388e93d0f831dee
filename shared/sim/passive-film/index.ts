// Passive chromium-oxide film simulation: pure state and step logic (no DOM).
export * from "./params";
export * from "./constants";
export * from "./alloy";
export * from "./carbide-area";
export * from "./carbide-particles";
export * from "./lattice";
export * from "./state";
export * from "./step";
export * from "./scratch";
export * from "./summary";
export * from "./spanning";
