/**
 * Window length for rolling filters, given in samples or in feet of a regularly sampled log.
 */
import { ShalepointError } from "../errors.js";

/**
 * A centred rolling window: either a number of samples, or a length in ft together with
 * the log's sample step in ft. Either way it becomes an odd number of samples ≥ 1.
 */
export type SampleWindow = { samples: number } | { lengthFt: number; stepFt: number };

/**
 * Number of samples of a centred window: `samples` as given (must be odd), or
 * round(lengthFt/stepFt) made odd by adding 1 when even, at least 1.
 *
 * @param window {@link SampleWindow}; typical { samples: 11 } or { lengthFt: 5, stepFt: 0.5 }.
 * @returns odd window length in samples.
 * @throws ShalepointError E_RANGE for an even, non-integer or < 1 sample count, or a
 *   non-positive length or step.
 * @example windowSampleCount({ lengthFt: 5, stepFt: 0.5 }) // 11
 */
export function windowSampleCount(window: SampleWindow): number {
  if ("samples" in window) {
    const w = window.samples;
    if (!(Number.isInteger(w) && w >= 1 && w % 2 === 1)) {
      throw new ShalepointError("E_RANGE", "window must be an odd whole number of samples ≥ 1", {
        param: "window.samples", value: w, allowed: "1, 3, 5, …", hint: "A centred window needs an odd length.",
      });
    }
    return w;
  }
  const { lengthFt, stepFt } = window;
  if (!(lengthFt > 0 && Number.isFinite(lengthFt))) {
    throw new ShalepointError("E_RANGE", "window length must be > 0", { param: "window.lengthFt", value: lengthFt, unit: "ft", allowed: "> 0" });
  }
  if (!(stepFt > 0 && Number.isFinite(stepFt))) {
    throw new ShalepointError("E_RANGE", "sample step must be > 0", { param: "window.stepFt", value: stepFt, unit: "ft", allowed: "> 0" });
  }
  const w = Math.max(1, Math.round(lengthFt / stepFt));
  return w % 2 === 1 ? w : w + 1;
}
