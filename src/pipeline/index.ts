export * from "./predictPorePressure.js";
