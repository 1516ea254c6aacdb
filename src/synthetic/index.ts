/**
 * Synthetic demo wells of the fictional Quillon Basin: a seeded, deterministic forward model
 * from a designed truth to LAS 2.0 logs and CSV tables (`npm run demo-logs` writes demo-logs/).
 *
 * ## Truth design (all invented)
 * - Offshore, air gap 82 ft, seawater 1.03 g/cc; brine gradient 0.445 psi/ft (Quillon A-1,
 *   A-2ST) and 0.440 psi/ft (Marten B-1), stated in each LAS ~P `HYDG` item and truth.json.
 * - Pressure story in TVDSS: hydrostatic → top of overpressure (8,800 / 8,880 / 7,900 ft) →
 *   disequilibrium compaction (σ grows only 0.05–0.06 psi/ft) → upper shale seal with a
 *   pressure ramp → compartment on the brine gradient at elevated pressure (A-1: gas sand,
 *   contact 11,580 ft TVDSS) → lower seal with a regression to hydrostatic + 700–900 psi →
 *   (Marten B-1) unloading below 12,300 ft, σ falling 1 psi/ft with σmax held.
 * - Overburden: seawater column, then ∫ρb g dz solved downward (truthProfile.ts); porosity
 *   φ0·exp(−σmax/σc) per lithology; Shmin by Eaton (1969) with a stated Poisson's ratio.
 * - Logs (syntheticLogs.ts): Bowers (1995) shale sonic (A 10, B 0.75, U 3.5), Eaton-(1975)-
 *   consistent shale resistivity (exponent 1.2), sand velocity and Archie resistivity, then
 *   noise, spikes, washouts, null gaps and a late-starting density log from the seed.
 * The truth files are for tests only; prediction code never reads them.
 *
 * Caution: demo data only; any result from it is an estimate for trained engineers, to be
 * calibrated to measured data and reviewed; local regulations and licensed practice govern.
 */
export * from "./seededRandom.js";
export * from "./demoWellDesigns.js";
export * from "./truthProfile.js";
export * from "./demoTrajectory.js";
export * from "./syntheticLogs.js";
export * from "./demoFiles.js";
