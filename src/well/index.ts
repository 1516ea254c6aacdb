export * from "./types.js";
export * from "./depthReference.js";
export * from "./minimumCurvature.js";
export * from "./surveyPathAtMd.js";
export * from "./depthReferenceArrays.js";
export * from "./resampleToTvdStep.js";
