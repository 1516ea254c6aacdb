export * from "./inspectInputFile.js";
