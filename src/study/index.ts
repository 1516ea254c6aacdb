export * from "./config.js";
export * from "./readInputFile.js";
export * from "./packageVersion.js";
export * from "./runStudy.js";
export * from "./writeStudyOutputs.js";
