export * from "./lasTypes.js";
