export * from "./trendTypes.js";
export * from "./sonicExponentialTrend.js";
export * from "./sonicLogLinearTrend.js";
export * from "./resistivityLogLinearTrend.js";
export * from "./fitStraightLine.js";
export * from "./fitStraightLineHuber.js";
export * from "./fitCompactionTrend.js";
export * from "./evaluateCompactionTrend.js";
