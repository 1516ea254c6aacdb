/**
 * Uncertainty: seeded Monte Carlo of pore pressure, fracture pressure and the mud-weight
 * window, with exact type-7 quantiles (carried sorted or partitioned order, or selection) and a
 * table-driven exponential for the hot loop; depth parts that
 * join bit for bit (the multi-core runner lives in src/uncertainty-node).
 *
 * Results are estimates for trained engineers: calibrate them to measured data and have
 * them reviewed; local regulations and licensed practice govern.
 */
export * from "./xoshiro128Random.js";
export * from "./drawParameterSamples.js";
export * from "./drawCorrelatedPairs.js";
export * from "./quantilesType7.js";
export * from "./carriedOrderQuantiles.js";
export * from "./partitionedOrderQuantiles.js";
export * from "./tableExponential.js";
export * from "./simulatePressureUncertainty.js";
