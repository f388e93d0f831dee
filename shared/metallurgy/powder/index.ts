/** Gas-atomised powder: size distribution, gas properties, droplet cooling, HIP (science-reference §4). */
export * from "./lognormal";
export * from "./gas-properties";
export * from "./droplet-cooling";
export * from "./droplet-flight";
export * from "./hip";
