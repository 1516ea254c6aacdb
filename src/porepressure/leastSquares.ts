/**
 * Small nonlinear least-squares solvers for the calibrations in this folder.
 *
 * - Golden-section search for one bounded parameter (Kiefer, J., 1953, "Sequential minimax
 *   search for a maximum", Proceedings of the American Mathematical Society 4(3):502–506).
 * - Levenberg–Marquardt for two or three bounded parameters (Levenberg, K., 1944, Quarterly
 *   of Applied Mathematics 2(2):164–168; Marquardt, D.W., 1963, Journal of the Society for
 *   Industrial and Applied Mathematics 11(2):431–441, with Marquardt's diagonal scaling),
 *   bounds kept by projection.
 * - Parameter covariance from the Jacobian at the solution: C = s²(JᵀJ)⁻¹,
 *   s² = Σr²/(m − p) (residuals already weighted by √w).
 *
 * Not exported from the package: internal to porepressure/. Imports: ../errors.js.
 */
import { ShalepointError } from "../errors.js";

/** Result of a least-squares solve. */
export interface LeastSquaresSolution {
  params: Float64Array;
  /** Standard error of each parameter (NaN when m = p or JᵀJ is singular). */
  standardErrors: Float64Array;
  /** Weighted sum of squared residuals at the solution. */
  sse: number;
  iterations: number;
  converged: boolean;
  /** True for each parameter that ended on a bound. */
  atBound: boolean[];
}

/** Solve the small dense system M x = rhs by Gaussian elimination with partial pivoting; null if singular. */
export function solveSmall(mat: number[][], rhs: number[]): number[] | null {
  const p = rhs.length;
  const a = mat.map((row, i) => [...row, rhs[i]]);
  for (let c = 0; c < p; c++) {
    let piv = c;
    for (let r = c + 1; r < p; r++) if (Math.abs(a[r][c]) > Math.abs(a[piv][c])) piv = r;
    if (!(Math.abs(a[piv][c]) > 0)) return null;
    [a[c], a[piv]] = [a[piv], a[c]];
    for (let r = c + 1; r < p; r++) {
      const f = a[r][c] / a[c][c];
      for (let k = c; k <= p; k++) a[r][k] -= f * a[c][k];
    }
  }
  const x = new Array<number>(p).fill(0);
  for (let r = p - 1; r >= 0; r--) {
    let s = a[r][p];
    for (let k = r + 1; k < p; k++) s -= a[r][k] * x[k];
    x[r] = s / a[r][r];
  }
  return x;
}

/** Inverse of a small symmetric positive-definite matrix by column solves; null if singular. */
export function invertSmall(mat: number[][]): number[][] | null {
  const p = mat.length;
  const inv: number[][] = Array.from({ length: p }, () => new Array<number>(p).fill(0));
  for (let c = 0; c < p; c++) {
    const e = new Array<number>(p).fill(0);
    e[c] = 1;
    const x = solveSmall(mat, e);
    if (x === null) return null;
    for (let r = 0; r < p; r++) inv[r][c] = x[r];
  }
  return inv;
}

function sumSq(r: Float64Array): number {
  let s = 0;
  for (let i = 0; i < r.length; i++) s += r[i] * r[i];
  return s;
}

/** Forward/central-difference Jacobian of residuals, rows = residuals. */
export function numericJacobian(
  residuals: (p: Float64Array) => Float64Array,
  p: Float64Array,
  lower: Float64Array,
  upper: Float64Array,
): number[][] {
  const r0 = residuals(p);
  const m = r0.length;
  const J: number[][] = Array.from({ length: m }, () => new Array<number>(p.length).fill(0));
  for (let j = 0; j < p.length; j++) {
    const h = 1e-6 * Math.max(Math.abs(p[j]), 1e-3);
    const up = Float64Array.from(p);
    const dn = Float64Array.from(p);
    let span = 0;
    if (p[j] + h <= upper[j]) {
      up[j] = p[j] + h;
      span += h;
    }
    if (p[j] - h >= lower[j]) {
      dn[j] = p[j] - h;
      span += h;
    }
    if (span === 0) continue;
    const ru = residuals(up);
    const rd = residuals(dn);
    for (let i = 0; i < m; i++) J[i][j] = (ru[i] - rd[i]) / span;
  }
  return J;
}

/** Covariance-based standard errors from a Jacobian and SSE. */
export function standardErrorsFromJacobian(J: number[][], sse: number, nParams: number): Float64Array {
  const m = J.length;
  const se = new Float64Array(nParams).fill(NaN);
  if (m <= nParams) return se;
  const jtj: number[][] = Array.from({ length: nParams }, () => new Array<number>(nParams).fill(0));
  for (let i = 0; i < m; i++) {
    for (let a = 0; a < nParams; a++) for (let b = 0; b < nParams; b++) jtj[a][b] += J[i][a] * J[i][b];
  }
  const inv = invertSmall(jtj);
  if (inv === null) return se;
  const s2 = sse / (m - nParams);
  for (let a = 0; a < nParams; a++) se[a] = inv[a][a] >= 0 ? Math.sqrt(s2 * inv[a][a]) : NaN;
  return se;
}

/**
 * Levenberg–Marquardt with bounds by projection.
 *
 * Minimises Σ r_i(p)² where `residuals` returns the weighted residuals √w_i (model − data).
 * Stops when the relative drop in SSE is below 1e-15, the step is below 1e-12 relative,
 * or after `maxIterations` (default 200).
 *
 * @throws ShalepointError E_RANGE when the initial point gives non-finite residuals
 */
export function levenbergMarquardt(problem: {
  residuals: (p: Float64Array) => Float64Array;
  initial: Float64Array;
  lower: Float64Array;
  upper: Float64Array;
  maxIterations?: number;
}): LeastSquaresSolution {
  const { residuals, lower, upper } = problem;
  const np = problem.initial.length;
  const clamp = (q: Float64Array): Float64Array => {
    const c = Float64Array.from(q);
    for (let j = 0; j < np; j++) c[j] = Math.min(upper[j], Math.max(lower[j], c[j]));
    return c;
  };
  let p = clamp(problem.initial);
  let r = residuals(p);
  let sse = sumSq(r);
  if (!Number.isFinite(sse)) {
    throw new ShalepointError("E_RANGE", "the starting parameters give no finite prediction at the measured points", {
      param: "initial",
      value: Array.from(p),
      hint: "Give starting values closer to the data (e.g. from the crossplot fit).",
    });
  }
  let lambda = 1e-3;
  let converged = false;
  let it = 0;
  const maxIt = problem.maxIterations ?? 200;
  for (; it < maxIt && !converged; it++) {
    const J = numericJacobian(residuals, p, lower, upper);
    const jtj: number[][] = Array.from({ length: np }, () => new Array<number>(np).fill(0));
    const g = new Array<number>(np).fill(0);
    for (let i = 0; i < r.length; i++) {
      for (let a = 0; a < np; a++) {
        g[a] += J[i][a] * r[i];
        for (let b = 0; b < np; b++) jtj[a][b] += J[i][a] * J[i][b];
      }
    }
    let improved = false;
    while (lambda < 1e16) {
      const mat = jtj.map((row, a) => row.map((v, b) => (a === b ? v + lambda * Math.max(v, 1e-300) : v)));
      const step = solveSmall(mat, g.map((v) => -v));
      if (step === null) {
        lambda *= 10;
        continue;
      }
      const trial = clamp(Float64Array.from(p.map((v, j) => v + step[j])));
      const rt = residuals(trial);
      const sset = sumSq(rt);
      if (Number.isFinite(sset) && sset <= sse) {
        let rel = 0;
        for (let j = 0; j < np; j++) rel = Math.max(rel, Math.abs(trial[j] - p[j]) / Math.max(Math.abs(p[j]), 1e-12));
        const drop = sse - sset;
        p = trial;
        r = rt;
        sse = sset;
        lambda = Math.max(lambda / 10, 1e-12);
        improved = true;
        if (drop <= 1e-15 * Math.max(sse, 1e-300) || rel < 1e-12) converged = true;
        break;
      }
      lambda *= 10;
    }
    if (!improved) {
      converged = true; // no downhill step exists at machine precision: a (local) minimum
    }
  }
  const J = numericJacobian(residuals, p, lower, upper);
  return {
    params: p,
    standardErrors: standardErrorsFromJacobian(J, sse, np),
    sse,
    iterations: it,
    converged,
    atBound: Array.from(p, (v, j) => v <= lower[j] || v >= upper[j]),
  };
}

/**
 * Golden-section minimisation of a one-parameter function on [lo, hi], to an interval
 * width of `tol` (default 1e-10 × (hi − lo)).
 * @returns the minimising x and f(x)
 */
export function goldenSectionMinimize(
  f: (x: number) => number,
  lo: number,
  hi: number,
  tol = 1e-10 * (hi - lo),
): { x: number; fx: number; iterations: number } {
  const invPhi = (Math.sqrt(5) - 1) / 2;
  let a = lo;
  let b = hi;
  let c = b - invPhi * (b - a);
  let d = a + invPhi * (b - a);
  let fc = f(c);
  let fd = f(d);
  let it = 0;
  while (b - a > tol && it < 500) {
    if (fc < fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - invPhi * (b - a);
      fc = f(c);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + invPhi * (b - a);
      fd = f(d);
    }
    it++;
  }
  // Compare the bracket ends too, so a minimum on a bound is found.
  const cands: Array<[number, number]> = [
    [(a + b) / 2, f((a + b) / 2)],
    [lo, f(lo)],
    [hi, f(hi)],
  ];
  let best = cands[0];
  for (const cnd of cands) if (cnd[1] < best[1]) best = cnd;
  return { x: best[0], fx: best[1], iterations: it };
}
