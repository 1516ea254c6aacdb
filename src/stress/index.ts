export {};
export * from "./gardnerDensity.js";
export * from "./nearMudlineDensity.js";
export * from "./overburden.js";
export * from "./hydrostatic.js";
