// Martensite matrix hardness, hardness conversion, Ms and retained austenite (science-reference §2.3–2.4).
export * from "./martensite-hardness";
export * from "./hardness-conversion";
export * from "./martensite-start";
