/**
 * Node edge of the uncertainty module: the Monte Carlo on several cores (worker threads).
 * Not re-exported from the package barrel, so browser bundles never meet node:worker_threads;
 * from Node, import dist/uncertainty-node/index.js by path (a package "exports" entry for
 * this folder would make it importable by name).
 *
 * Results are estimates for trained engineers: calibrate them to measured data and have
 * them reviewed; local regulations and licensed practice govern.
 */
export * from "./simulatePressureUncertaintyParallel.js";
