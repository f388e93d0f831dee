/** Ingot solidification and segregation (science-reference §3). */
export * from "./erf";
export * from "./partition-data";
export * from "./solid-diffusion";
export * from "./lever-rule";
export * from "./scheil";
export * from "./back-diffusion";
export * from "./effective-partition";
export * from "./liquidus-solidus";
export * from "./iron-carbon-binary";
export * from "./arm-spacing";
export * from "./chvorinov";
export * from "./neumann";
export * from "./conduction-stability";
export * from "./ingot-params";
export * from "./ingot";
