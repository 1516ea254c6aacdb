export * from "./dExponent.js";
export * from "./smoothDcInShale.js";
export * from "./dcNormalTrend.js";
export * from "./mudWeightMargin.js";
