/**
 * Units of shalepoint.
 *
 * ## The internal unit system (declared once, here)
 * Every core module works in these units and nothing else; conversion happens only at the
 * edges (reading files, showing results).
 *
 * | quantity            | internal unit            | id        |
 * | ------------------- | ------------------------ | --------- |
 * | depth, length       | foot                     | `ft`      |
 * | pressure, stress    | pound-force per sq. inch | `psi`     |
 * | pressure gradient   | psi per foot             | `psi/ft`  |
 * | density             | gram per cubic centimetre| `g/cc`    |
 * | slowness            | microsecond per foot     | `us/ft`   |
 * | velocity            | foot per second          | `ft/s`    |
 * | resistivity         | ohm metre                | `ohm.m`   |
 * | gamma ray           | API unit                 | `API`     |
 * | hole size / caliper | inch                     | `in`      |
 * | angle               | degree                   | `deg`     |
 *
 * Equivalent mud weight (EMW) is a pressure gradient; it is shown in ppg (or sg) but
 * carried inside as psi/ft.
 *
 * ## Sources of the factors
 * - 1 ft = 0.3048 m exactly (international foot, 1959).
 * - 1 psi = 6894.757 Pa (NIST SP 811, 2008, App. B — value quoted from memory;
 *   derived here exactly from 1 lbf = 4.4482216152605 N and 1 in = 0.0254 m).
 * - 1 US gal = 231 in³ exactly, so 1 ppg of fluid exerts 12/231 psi/ft.
 * - 1 lb = 0.45359237 kg exactly; 1 US gal = 3.785411784 L exactly.
 * - standard gravity g = 9.80665 m/s² (CGPM 1901).
 *
 * This file has no imports.
 */

/** Standard gravity, m/s² (exact by definition). */
export const STANDARD_GRAVITY_M_PER_S2 = 9.80665;
/** Metres per foot (exact). */
export const METRES_PER_FOOT = 0.3048;
/** Metres per inch (exact). */
export const METRES_PER_INCH = 0.0254;
/** Newtons per pound-force (exact: 0.45359237 kg × 9.80665 m/s²). */
export const NEWTONS_PER_LBF = 0.45359237 * STANDARD_GRAVITY_M_PER_S2;
/** Pascals per psi: 1 lbf / (0.0254 m)² ≈ 6894.757. */
export const PASCALS_PER_PSI = NEWTONS_PER_LBF / (METRES_PER_INCH * METRES_PER_INCH);
/** Cubic metres per US gallon (exact: 231 in³). */
export const CUBIC_METRES_PER_US_GALLON = 231 * METRES_PER_INCH ** 3;
/** Pounds-mass per US gallon per g/cc ≈ 8.345404. */
export const PPG_PER_GCC = 1000 * CUBIC_METRES_PER_US_GALLON / 0.45359237;
/** psi/ft exerted by a fluid of 1 ppg: 12/231 ≈ 0.051948 (field rounding 0.052). */
export const PSI_PER_FT_PER_PPG = 12 / 231;
/** psi/ft exerted by a fluid of 1 g/cc: ρ·g ≈ 0.43353 (field rounding 0.433). */
export const PSI_PER_FT_PER_GCC = (1000 * STANDARD_GRAVITY_M_PER_S2 * METRES_PER_FOOT) / PASCALS_PER_PSI;
/** kPa/m per psi/ft ≈ 22.6206. */
export const KPA_PER_M_PER_PSI_PER_FT = PASCALS_PER_PSI / 1000 / METRES_PER_FOOT;

/** Physical quantities shalepoint knows. */
export type Quantity =
  | "depth"
  | "pressure"
  | "gradient"
  | "density"
  | "slowness"
  | "velocity"
  | "resistivity"
  | "gammaRay"
  | "length"
  | "angle"
  | "dimensionless"
  | "rate"
  | "rotary"
  | "force"
  | "gas";

/** Every unit id shalepoint accepts. Linear units only: internal = value × factor. */
export const UNITS = {
  // depth
  ft: { quantity: "depth", factor: 1, label: "ft" },
  m: { quantity: "depth", factor: 1 / METRES_PER_FOOT, label: "m" },
  // pressure
  psi: { quantity: "pressure", factor: 1, label: "psi" },
  kPa: { quantity: "pressure", factor: 1000 / PASCALS_PER_PSI, label: "kPa" },
  MPa: { quantity: "pressure", factor: 1e6 / PASCALS_PER_PSI, label: "MPa" },
  bar: { quantity: "pressure", factor: 1e5 / PASCALS_PER_PSI, label: "bar" },
  // gradient / equivalent mud weight
  "psi/ft": { quantity: "gradient", factor: 1, label: "psi/ft" },
  "kPa/m": { quantity: "gradient", factor: 1 / KPA_PER_M_PER_PSI_PER_FT, label: "kPa/m" },
  "MPa/km": { quantity: "gradient", factor: 1 / KPA_PER_M_PER_PSI_PER_FT, label: "MPa/km" },
  ppg: { quantity: "gradient", factor: PSI_PER_FT_PER_PPG, label: "ppg" },
  sg: { quantity: "gradient", factor: PSI_PER_FT_PER_GCC, label: "sg" },
  // density
  "g/cc": { quantity: "density", factor: 1, label: "g/cc" },
  "kg/m3": { quantity: "density", factor: 1 / 1000, label: "kg/m³" },
  "lbm/gal": { quantity: "density", factor: 1 / PPG_PER_GCC, label: "ppg" },
  // slowness
  "us/ft": { quantity: "slowness", factor: 1, label: "µs/ft" },
  "us/m": { quantity: "slowness", factor: METRES_PER_FOOT, label: "µs/m" },
  // velocity
  "ft/s": { quantity: "velocity", factor: 1, label: "ft/s" },
  "m/s": { quantity: "velocity", factor: 1 / METRES_PER_FOOT, label: "m/s" },
  // resistivity
  "ohm.m": { quantity: "resistivity", factor: 1, label: "ohm·m" },
  // gamma ray
  API: { quantity: "gammaRay", factor: 1, label: "API" },
  // length (hole size, caliper, bit)
  in: { quantity: "length", factor: 1, label: "in" },
  mm: { quantity: "length", factor: 1 / 25.4, label: "mm" },
  // angle
  deg: { quantity: "angle", factor: 1, label: "°" },
  // dimensionless (fractions, ratios, flags)
  "1": { quantity: "dimensionless", factor: 1, label: "" },
  "%": { quantity: "dimensionless", factor: 0.01, label: "%" },
  // drilling data
  "ft/h": { quantity: "rate", factor: 1, label: "ft/h" },
  "m/h": { quantity: "rate", factor: 1 / METRES_PER_FOOT, label: "m/h" },
  rpm: { quantity: "rotary", factor: 1, label: "rpm" },
  lbf: { quantity: "force", factor: 1, label: "lbf" },
  klbf: { quantity: "force", factor: 1000, label: "klbf" },
  kN: { quantity: "force", factor: 1000 / NEWTONS_PER_LBF, label: "kN" },
  tonne: { quantity: "force", factor: (1000 * STANDARD_GRAVITY_M_PER_S2) / NEWTONS_PER_LBF, label: "t" },
  unit: { quantity: "gas", factor: 1, label: "units" },
} as const satisfies Record<string, { quantity: Quantity; factor: number; label: string }>;

/** A unit id, e.g. `"ft"` or `"kPa/m"`. */
export type UnitId = keyof typeof UNITS;

/** The internal unit of each quantity. */
export const INTERNAL_UNIT: Record<Quantity, UnitId> = {
  depth: "ft",
  pressure: "psi",
  gradient: "psi/ft",
  density: "g/cc",
  slowness: "us/ft",
  velocity: "ft/s",
  resistivity: "ohm.m",
  gammaRay: "API",
  length: "in",
  angle: "deg",
  dimensionless: "1",
  rate: "ft/h",
  rotary: "rpm",
  force: "lbf",
  gas: "unit",
};

/** True when `id` names a known unit. */
export function isUnitId(id: string): id is UnitId {
  return Object.prototype.hasOwnProperty.call(UNITS, id);
}

/** The quantity a unit measures. */
export function quantityOf(unit: UnitId): Quantity {
  return UNITS[unit].quantity;
}

/**
 * Factor that takes a value in `from` to `to` (value_to = value_from × factor).
 * @throws Error when the two units measure different quantities.
 * @example conversionFactor("m", "ft") // 3.280839895013123
 */
export function conversionFactor(from: UnitId, to: UnitId): number {
  const a = UNITS[from];
  const b = UNITS[to];
  if (a.quantity !== b.quantity) {
    throw new Error(`cannot convert ${from} (${a.quantity}) to ${to} (${b.quantity})`);
  }
  return a.factor / b.factor;
}

/** Convert one value between units of the same quantity. @example convert(1, "MPa", "psi") // 145.0377 */
export function convert(value: number, from: UnitId, to: UnitId): number {
  return from === to ? value : value * conversionFactor(from, to);
}

/** Convert an array into a new Float64Array (input untouched; NaN stays NaN). */
export function convertArray(values: ArrayLike<number>, from: UnitId, to: UnitId): Float64Array {
  const k = conversionFactor(from, to);
  const out = new Float64Array(values.length);
  for (let i = 0; i < values.length; i++) out[i] = values[i] * k;
  return out;
}

/** Convert to the internal unit of the unit's quantity. */
export function toInternal(value: number, from: UnitId): number {
  return value * UNITS[from].factor;
}

/** Convert from the internal unit of `to`'s quantity to `to`. */
export function fromInternal(value: number, to: UnitId): number {
  return value / UNITS[to].factor;
}

// ---- named conversions, by direction -------------------------------------------------

/** feet → metres (exact). */
export const feetToMetres = (ft: number): number => ft * METRES_PER_FOOT;
/** metres → feet (exact). */
export const metresToFeet = (m: number): number => m / METRES_PER_FOOT;
/** psi → MPa. */
export const psiToMpa = (psi: number): number => (psi * PASCALS_PER_PSI) / 1e6;
/** MPa → psi. */
export const mpaToPsi = (mpa: number): number => (mpa * 1e6) / PASCALS_PER_PSI;
/** psi → kPa. */
export const psiToKpa = (psi: number): number => (psi * PASCALS_PER_PSI) / 1e3;
/** kPa → psi. */
export const kpaToPsi = (kpa: number): number => (kpa * 1e3) / PASCALS_PER_PSI;
/** psi/ft → ppg (equivalent mud weight). */
export const psiPerFtToPpg = (g: number): number => g / PSI_PER_FT_PER_PPG;
/** ppg → psi/ft. */
export const ppgToPsiPerFt = (ppg: number): number => ppg * PSI_PER_FT_PER_PPG;
/** g/cc (or sg) → psi/ft. */
export const gccToPsiPerFt = (gcc: number): number => gcc * PSI_PER_FT_PER_GCC;
/** psi/ft → g/cc (or sg). */
export const psiPerFtToGcc = (g: number): number => g / PSI_PER_FT_PER_GCC;
/** g/cc → ppg. */
export const gccToPpg = (gcc: number): number => gcc * PPG_PER_GCC;
/** ppg → g/cc. */
export const ppgToGcc = (ppg: number): number => ppg / PPG_PER_GCC;

/**
 * Slowness (µs/ft) → velocity (ft/s): V = 10⁶ / Δt. NaN and non-positive slowness give NaN.
 * @example slownessToVelocity(100) // 10000
 */
export function slownessToVelocity(dtUsPerFt: number): number {
  return dtUsPerFt > 0 ? 1e6 / dtUsPerFt : NaN;
}

/** Velocity (ft/s) → slowness (µs/ft): Δt = 10⁶ / V. */
export function velocityToSlowness(vFtPerS: number): number {
  return vFtPerS > 0 ? 1e6 / vFtPerS : NaN;
}

/**
 * Pressure at a depth → equivalent mud weight, ppg: EMW = P / (D · 12/231).
 * @param pressurePsi pressure, psi
 * @param depthFt true vertical depth below the rotary table, ft (> 0)
 * @returns EMW in ppg (NaN at depth ≤ 0)
 * @example pressureToEmwPpg(6234, 10000) // ≈ 12.00
 */
export function pressureToEmwPpg(pressurePsi: number, depthFt: number): number {
  return depthFt > 0 ? pressurePsi / (depthFt * PSI_PER_FT_PER_PPG) : NaN;
}

/** Equivalent mud weight (ppg) at a depth → pressure (psi). */
export function emwPpgToPressure(emwPpg: number, depthFt: number): number {
  return emwPpg * PSI_PER_FT_PER_PPG * depthFt;
}

// ---- LAS unit strings ------------------------------------------------------------------

/**
 * Unit strings as they occur in LAS files, upper-cased, mapped to unit ids. Lookup is
 * case-insensitive. A string not in this table is never guessed: {@link parseLasUnit}
 * returns `undefined` and the reader raises an error naming the curve.
 */
export const LAS_UNIT_ALIASES: Readonly<Record<string, UnitId>> = {
  F: "ft", FT: "ft", FEET: "ft", FOOT: "ft", "FT.": "ft",
  M: "m", METER: "m", METERS: "m", METRE: "m", METRES: "m",
  PSI: "psi", PSIA: "psi", PSIG: "psi", KPA: "kPa", MPA: "MPa", BAR: "bar",
  "PSI/FT": "psi/ft", "KPA/M": "kPa/m", "MPA/KM": "MPa/km", PPG: "ppg", "LB/GAL": "ppg", SG: "sg",
  "G/C3": "g/cc", "G/CC": "g/cc", "G/CM3": "g/cc", "GM/CC": "g/cc", "GR/CC": "g/cc", "G/CM^3": "g/cc",
  "K/M3": "kg/m3", "KG/M3": "kg/m3", "KG/M^3": "kg/m3", "LBM/GAL": "lbm/gal",
  "US/F": "us/ft", "US/FT": "us/ft", "USEC/FT": "us/ft", "US/FOOT": "us/ft",
  "US/M": "us/m", "USEC/M": "us/m",
  "F/S": "ft/s", "FT/S": "ft/s", "FT/SEC": "ft/s", "M/S": "m/s", "M/SEC": "m/s",
  OHMM: "ohm.m", "OHM.M": "ohm.m", "OHM-M": "ohm.m", "OHM M": "ohm.m", OHM_M: "ohm.m", "OHMS.M": "ohm.m",
  GAPI: "API", API: "API", "API-GR": "API",
  IN: "in", INCH: "in", INCHES: "in", MM: "mm",
  DEG: "deg", DEGREE: "deg", DEGREES: "deg",
  "V/V": "1", FRAC: "1", DEC: "1", "": "1", "%": "%", PU: "%", "P.U.": "%",
  "FT/H": "ft/h", "FT/HR": "ft/h", "F/HR": "ft/h", "F/H": "ft/h", "M/H": "m/h", "M/HR": "m/h",
  RPM: "rpm", LBF: "lbf", KLBF: "klbf", KLB: "klbf", KN: "kN", T: "tonne",
  UNITS: "unit", UNIT: "unit",
};

/**
 * Map a unit string from a file to a unit id, or `undefined` when unknown (never a guess).
 * @example parseLasUnit("US/F") // "us/ft"
 */
export function parseLasUnit(raw: string): UnitId | undefined {
  const key = raw.trim().toUpperCase();
  return Object.prototype.hasOwnProperty.call(LAS_UNIT_ALIASES, key) ? LAS_UNIT_ALIASES[key] : undefined;
}

/** The LAS unit string shalepoint writes for each unit id. */
export const LAS_UNIT_OUT: Readonly<Record<UnitId, string>> = {
  ft: "F", m: "M", psi: "PSI", kPa: "KPA", MPa: "MPA", bar: "BAR",
  "psi/ft": "PSI/FT", "kPa/m": "KPA/M", "MPa/km": "MPA/KM", ppg: "PPG", sg: "SG",
  "g/cc": "G/C3", "kg/m3": "K/M3", "lbm/gal": "LBM/GAL",
  "us/ft": "US/F", "us/m": "US/M", "ft/s": "F/S", "m/s": "M/S",
  "ohm.m": "OHMM", API: "GAPI", in: "IN", mm: "MM", deg: "DEG", "1": "", "%": "%",
  "ft/h": "F/HR", "m/h": "M/HR", rpm: "RPM", lbf: "LBF", klbf: "KLBF", kN: "KN", tonne: "T", unit: "UNITS",
};
