export * from "./changePointsPelt.js";
export * from "./segmentPressureProfile.js";
export * from "./classifyPressureCompartments.js";
export * from "./identifyFluidFromGradient.js";
export * from "./fitPressureSystems.js";
export * from "./centroidSandPressure.js";
