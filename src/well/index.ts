export * from "./types.js";
export * from "./depthReference.js";
