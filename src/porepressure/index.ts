/**
 * Pore pressure from shale logs: Eaton (1975), Bowers (1995) with unloading, equivalent
 * depth (Foster & Whalen 1966), and their calibration to measured pressures.
 *
 * Every method returns { ppPsi, flags, warnings }; flag bits are the PP_FLAG_* constants.
 * Results are estimates for trained engineers: calibrate them to measured data and have
 * them reviewed; local regulations and licensed practice govern.
 */
export {
  PP_FLAG_MISSING_INPUT,
  PP_FLAG_CLIPPED_AT_OVERBURDEN,
  PP_FLAG_BELOW_HYDROSTATIC,
  PP_FLAG_CLIPPED_AT_HYDROSTATIC,
  PP_FLAG_NO_EQUIVALENT_DEPTH,
  PP_FLAG_OUTSIDE_CALIBRATION,
  PP_FLAG_UNLOADING_BRANCH,
  PP_FLAG_WARNING_CODES,
  describePorePressureFlags,
  type PorePressureResult,
  type PorePressureLimitOptions,
  type DepthRangeFt,
} from "./porePressureFlags.js";
export {
  EATON_SONIC_EXPONENT,
  EATON_RESISTIVITY_EXPONENT,
  EATON_DEXPONENT_EXPONENT,
  eatonPorePressure,
  eatonRatio,
  eatonSonicPorePressure,
  eatonResistivityPorePressure,
  eatonDexponentPorePressure,
  type EatonLog,
  type EatonStressInputs,
} from "./eaton.js";
export {
  BOWERS_DEFAULT_V0_FT_PER_S,
  requireBowersParameters,
  bowersVirginVelocity,
  bowersVirginEffectiveStress,
  bowersSigmaMax,
  bowersUnloadingVelocity,
  bowersUnloadingEffectiveStress,
  type BowersParameters,
} from "./bowersCurves.js";
export {
  bowersPorePressure,
  type BowersUnloadingZone,
  type BowersPorePressureResult,
} from "./bowersPorePressure.js";
export { bowersCrossplot, type BowersCrossplotData, type BowersCurveSamples } from "./bowersCrossplot.js";
export {
  equivalentDepthPorePressure,
  type EquivalentDepthTrend,
  type EquivalentDepthResult,
} from "./equivalentDepth.js";
export { velocityFromSlownessLog } from "./velocityFromSlowness.js";
export {
  porePressureMisfitTable,
  type PressureObservation,
  type MisfitRow,
  type MisfitTable,
} from "./misfitTable.js";
export { calibrateEatonExponent, type EatonCalibration } from "./calibrateEaton.js";
export { calibrateBowers, type BowersCalibration } from "./calibrateBowers.js";
export { fitBowersCrossplot, type BowersCrossplotFit } from "./fitBowersCrossplot.js";
