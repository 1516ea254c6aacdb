export * from "./dExponent.js";
