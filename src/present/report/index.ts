export * from "./reportTypes.js";
export * from "./formatReportNumber.js";
export * from "./reportFigures.js";
export * from "./reportSections.js";
export * from "./renderStudyReport.js";
export * from "./renderChartPng.js";
