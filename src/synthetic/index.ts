export * from "./seededRandom.js";
export * from "./demoWellDesigns.js";
export * from "./truthProfile.js";
export * from "./demoTrajectory.js";
export * from "./syntheticLogs.js";
export * from "./demoFiles.js";
