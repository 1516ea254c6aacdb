export * from "./compileCurveFormula.js";
