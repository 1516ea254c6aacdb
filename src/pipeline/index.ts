export * from "./predictPorePressure.js";
export * from "./predictStressWindow.js";
