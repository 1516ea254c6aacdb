/**
 * Shale volume from the gamma-ray index: linear, Larionov tertiary and Larionov older rocks.
 */
import { gammaRayIndex } from "./gammaRayIndex.js";

/** Relations from gamma-ray index to shale volume. */
export type VshaleModel = "linear" | "larionovTertiary" | "larionovOlder";

/**
 * Larionov (1969) shale volume for tertiary (unconsolidated, young) rocks:
 * Vsh = 0.083·(2^(3.7·IGR) − 1). Larionov 1969, *Borehole radiometry*, Nedra, Moscow
 * (from memory). Gives 0.9957 (not 1) at IGR = 1, as published; no renormalisation.
 * @param igr gamma-ray index, [0, 1]; typical 0.5.
 * @returns Vsh, fraction.
 * @example vshaleLarionovTertiary(0.5) // 0.2162
 */
export function vshaleLarionovTertiary(igr: number): number {
  return 0.083 * (Math.pow(2, 3.7 * igr) - 1);
}

/**
 * Larionov (1969) shale volume for older (consolidated, pre-tertiary) rocks:
 * Vsh = 0.33·(2^(2·IGR) − 1). Larionov 1969, *Borehole radiometry*, Nedra, Moscow (from
 * memory). Gives 0.99 at IGR = 1, as published.
 * @param igr gamma-ray index, [0, 1]; typical 0.5.
 * @returns Vsh, fraction.
 * @example vshaleLarionovOlder(0.5) // 0.33
 */
export function vshaleLarionovOlder(igr: number): number {
  return 0.33 * (Math.pow(2, 2 * igr) - 1);
}

/**
 * Shale volume from gamma ray: IGR = (GR − GRsand)/(GRshale − GRsand) clipped to [0, 1],
 * then Vsh = IGR (linear), {@link vshaleLarionovTertiary} or {@link vshaleLarionovOlder}.
 * Quillon Basin sediments are young: "larionovTertiary" is the usual choice there.
 * NaN carries through.
 *
 * @param grApi gamma ray, API; typical 20–150.
 * @param grSandApi clean-sand line, API; typical 30–50.
 * @param grShaleApi shale line, API; typical 100–140.
 * @param model {@link VshaleModel}.
 * @returns Vsh, fraction, new array.
 * @throws ShalepointError E_RANGE from {@link gammaRayIndex}.
 * @example vshaleFromGammaRay({ grApi: new Float64Array([75]), grSandApi: 30, grShaleApi: 120, model: "larionovTertiary" }) // [0.2162]
 */
export function vshaleFromGammaRay(args: {
  grApi: ArrayLike<number>;
  grSandApi: number;
  grShaleApi: number;
  model: VshaleModel;
}): Float64Array {
  const igr = gammaRayIndex(args);
  if (args.model === "linear") return igr;
  const f = args.model === "larionovTertiary" ? vshaleLarionovTertiary : vshaleLarionovOlder;
  for (let i = 0; i < igr.length; i++) igr[i] = f(igr[i]);
  return igr;
}
