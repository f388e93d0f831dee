/**
 * Grain & Edge science core: pure functions of metallurgy, shared by the browser
 * simulations, the server's quiz grading and the tests. No DOM, no React, no I/O.
 */
export * from "./errors";
export * from "./validate";
export * from "./random";
export * from "./composition";
export * from "./grades";
export * from "./passivity";
export * from "./carbides";
export * from "./hardening";
export * from "./solidification";
export * from "./powder";
export * from "./heat-treatment";
