/**
 * shalepoint: pore pressure and fracture gradient from well logs.
 *
 * One barrel for notebooks and scripts that want everything. Core modules can also be
 * imported (or copied) one file at a time; see DEVELOPERS.md.
 */
export * from "./errors.js";
export * from "./units/index.js";
export * from "./io/index.js";
export * from "./well/index.js";
export * from "./logs/index.js";
export * from "./stress/index.js";
export * from "./trend/index.js";
export * from "./porepressure/index.js";
export * from "./compartments/index.js";
export * from "./window/index.js";
export * from "./uncertainty/index.js";
export * from "./drilling/index.js";
export * from "./synthetic/index.js";
export * from "./present/index.js";
export * from "./formula/index.js";
export * from "./pipeline/index.js";
export * from "./study/index.js";
