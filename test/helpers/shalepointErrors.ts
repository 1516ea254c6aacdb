/**
 * Expectation helpers for typed errors (src/errors.ts), shared by the test files that check
 * a stable error code. Test helper only.
 */
import { ShalepointError } from "../../src/errors.js";

/**
 * Run `fn` and return the ShalepointError it throws. Any other error is re-thrown and a call
 * that does not throw fails with "expected a ShalepointError", so the test fails either way.
 * @param fn the call expected to throw
 * @returns the thrown ShalepointError (read its code, param, value, line…)
 * @example errorOf(() => { throw new ShalepointError("E_RANGE", "x") }).code // "E_RANGE"
 */
export function errorOf(fn: () => unknown): ShalepointError {
  try {
    fn();
  } catch (e) {
    if (e instanceof ShalepointError) return e;
    throw e;
  }
  throw new Error("expected a ShalepointError");
}

/**
 * Run `fn` and return the code of the ShalepointError it throws: undefined when nothing is
 * thrown, "not a ShalepointError" for any other error.
 * @param fn the call to run
 * @returns the error code (e.g. "E_RANGE"), undefined, or "not a ShalepointError"
 * @example codeOf(() => 1) // undefined
 */
export function codeOf(fn: () => unknown): string | undefined {
  try {
    fn();
  } catch (e) {
    return e instanceof ShalepointError ? e.code : "not a ShalepointError";
  }
  return undefined;
}
