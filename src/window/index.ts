export type { WindowFinding } from "./windowFindings.js";
export * from "./mudWeightWindow.js";
export * from "./casingPoints.js";
export * from "./casingPlanCheck.js";
