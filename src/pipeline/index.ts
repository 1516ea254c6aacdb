export * from "./predictPorePressure.js";
export * from "./predictStressWindow.js";
export * from "./incrementalPorePressure.js";
export * from "./growthRoom.js";
export * from "./incrementalStressWindow.js";
export * from "./predictCompartments.js";
export * from "./incrementalDrillingPorePressure.js";
