/** Heat-treatment support: tempering parameter, Fe–C diagram, critical temperatures, hardenability (science-reference §5). */
export * from "./tempering-parameter";
export * from "./iron-carbon-diagram";
export * from "./critical-temperatures";
export * from "./grossmann";
