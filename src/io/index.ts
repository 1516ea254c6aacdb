export * from "./lasTypes.js";
export * from "./readLas.js";
export * from "./writeLas.js";
export * from "./loadWell.js";
export * from "./csv.js";
export * from "./tables.js";
export * from "./trendFile.js";
export * from "./drillingData.js";
