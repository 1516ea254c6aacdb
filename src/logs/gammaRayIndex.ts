/**
 * Gamma-ray index: where a GR reading sits between clean sand and shale.
 */
import { ShalepointError } from "../errors.js";

/**
 * Gamma-ray index IGR = (GR − GRsand)/(GRshale − GRsand), clipped to [0, 1].
 *
 * Standard definition (Larionov 1969, *Borehole radiometry*, Nedra, Moscow — from memory;
 * also in every log-analysis text). Readings cleaner than the sand line give 0, hotter than
 * the shale line give 1. NaN carries through.
 *
 * @param grApi gamma ray, API; typical 20–150.
 * @param grSandApi clean-sand line, API; typical 30–50.
 * @param grShaleApi shale line, API, > grSandApi; typical 100–140.
 * @returns IGR, dimensionless in [0, 1], new array.
 * @throws ShalepointError E_RANGE unless grShaleApi > grSandApi (both finite).
 * @example gammaRayIndex({ grApi: new Float64Array([30, 75, 120, 150]), grSandApi: 30, grShaleApi: 120 }) // [0, 0.5, 1, 1]
 */
export function gammaRayIndex(args: { grApi: ArrayLike<number>; grSandApi: number; grShaleApi: number }): Float64Array {
  const { grApi, grSandApi, grShaleApi } = args;
  if (!(Number.isFinite(grSandApi) && Number.isFinite(grShaleApi) && grShaleApi > grSandApi)) {
    throw new ShalepointError("E_RANGE", "the shale GR line must be above the sand GR line", {
      param: "grShaleApi", value: grShaleApi, unit: "API", allowed: `> grSandApi (${grSandApi})`,
    });
  }
  const span = grShaleApi - grSandApi;
  const out = new Float64Array(grApi.length);
  for (let i = 0; i < out.length; i++) {
    const g = (grApi[i] - grSandApi) / span;
    out[i] = g < 0 ? 0 : g > 1 ? 1 : g; // NaN falls through both tests and stays NaN
  }
  return out;
}
