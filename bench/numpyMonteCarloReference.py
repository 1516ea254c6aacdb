"""numpy reference for the Monte Carlo benchmark (bench-only tooling).

Usage:
    node bench/exportMonteCarloCase.mjs <dir>        # writes the case and shalepoint's draws/results
    python3 bench/numpyMonteCarloReference.py <dir> [--runs 5] [--warmup 1] [--chunk 1000]
        [--quantiles sort|percentile]

The same Monte Carlo as shalepoint's simulatePressureUncertainty on the benchmark case
(bench/benchOptions.mjs monteCarloInput: 1,000 realisations, the generated 40,000-sample
Quillon BENCH-1 well, invented data), written as a clean vectorised numpy script: the
realisations are the columns of a (depths x realisations) block, a block of `--chunk`
depths at a time (the whole 40,000 x 1,000 matrix would take 320 MB per array). It uses
shalepoint's own draws (exported), so the two results can be compared value for value.

Per block, each line one numpy expression over the whole block:
  trend       ln(dtm + exp(a_r + b_r z)), the exponential-to-matrix sonic trend of the
              realisation's segment (Zhang 2011, Earth-Science Reviews 108:50-63, form
              from memory)
  Eaton       Pp = Sv_r - (Sv_r - Ph) (dtn/dt)^n_r, clipped at Sv_r, Sv_r = f_r Sv
              (Eaton 1975, SPE-5544)
  fracture    Shmin = Pp + k_r max(Sv_r - Pp, 0), k = nu/(1 - nu) (Eaton 1969, JPT
              21(10):1353-1360)
  statistics  type-7 P10/P50/P90 (Hyndman & Fan 1996, as shalepoint; numpy's "linear"):
              by default np.sort(axis=1) and the two order statistics around each rank
              (numpy's vectorised sort measured 6x faster here than the partition inside
              np.percentile); --quantiles percentile uses np.percentile(..., axis=1);
              mean, standard deviation (ddof 1)
Prints one JSON line: depths, realisations, chunk, medianMs, minMs, p25Ms, p75Ms, runs,
and agreement: the largest relative difference from shalepoint's results per output.

Results are estimates for trained engineers: calibrate them to measured data and have them
reviewed; local regulations and licensed practice govern. This script exists to time the
computation, not to predict pressure.
"""

import argparse
import json
import os
import time

import numpy as np


def load(d, name):
    return np.fromfile(os.path.join(d, name), dtype="<f8")


def type7(values, probs, method):
    """Type-7 quantiles of each row: shape (len(probs), rows)."""
    if method == "percentile":
        return np.percentile(values, [100 * p for p in probs], axis=1)
    s = np.sort(values, axis=1)
    h = (values.shape[1] - 1) * np.asarray(probs)
    j = np.floor(h).astype(int)
    g = h - j
    j1 = np.minimum(j + 1, values.shape[1] - 1)
    return (s[:, j] + g * (s[:, j1] - s[:, j])).T


def simulate(case, chunk, method):
    """P10/P50/P90 of pore and fracture pressure, mean and std of pore pressure, per depth."""
    tvd, bml, sv, ph, obs = case["tvd"], case["bml"], case["sv"], case["ph"], case["obs"]
    f, n, nu = case["f"], case["n"], case["nu"]
    seg_a, seg_b, tops, dtm = case["seg_a"], case["seg_b"], case["tops"], case["dtm"]
    k = nu / (1 - nu)
    depths = tvd.size
    out = {key: np.full(depths, np.nan) for key in ("ppP10Psi", "ppP50Psi", "ppP90Psi", "fracP10Psi", "fracP50Psi", "fracP90Psi", "ppMeanPsi", "ppStdPsi")}
    valid = np.isfinite(sv) & np.isfinite(ph) & np.isfinite(tvd) & np.isfinite(obs) & (obs > 0) & np.isfinite(bml) & (bml >= 0)
    seg = np.clip(np.searchsorted(tops, bml, side="right") - 1, 0, len(tops) - 1)
    for s in range(0, depths, chunk):
        idx = s + np.flatnonzero(valid[s : s + chunk])
        if idx.size == 0:
            continue
        z = bml[idx][:, None]
        g = seg[idx]
        a = seg_a[g]  # (depths, realisations)
        b = seg_b[g]
        lnTrend = np.log(dtm[g][:, None] + np.exp(a + b * z))
        ratioN = np.exp(n[None, :] * (lnTrend - np.log(obs[idx])[:, None]))
        svr = sv[idx][:, None] * f[None, :]
        pp = np.minimum(svr - (svr - ph[idx][:, None]) * ratioN, svr)
        fr = pp + k[None, :] * np.maximum(svr - pp, 0)
        qp = type7(pp, (0.1, 0.5, 0.9), method)
        qf = type7(fr, (0.1, 0.5, 0.9), method)
        out["ppP10Psi"][idx], out["ppP50Psi"][idx], out["ppP90Psi"][idx] = qp
        out["fracP10Psi"][idx], out["fracP50Psi"][idx], out["fracP90Psi"][idx] = qf
        out["ppMeanPsi"][idx] = pp.mean(axis=1)
        out["ppStdPsi"][idx] = pp.std(axis=1, ddof=1)
    return out


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("dir")
    ap.add_argument("--runs", type=int, default=5)
    ap.add_argument("--warmup", type=int, default=1)
    ap.add_argument("--chunk", type=int, default=1000)
    ap.add_argument("--quantiles", choices=("sort", "percentile"), default="sort")
    args = ap.parse_args()
    d = args.dir
    with open(os.path.join(d, "meta.json")) as fh:
        meta = json.load(fh)
    draws = {x["name"]: load(d, x["file"]) for x in meta["draws"]}
    segs = meta["trend"]["segments"]
    case = {key: load(d, meta["files"][key]) for key in ("tvd", "bml", "sv", "ph", "obs")}
    case["f"] = draws["overburdenFactor"]
    case["n"] = draws["eatonExponent"]
    case["nu"] = draws["poissonRatio"]
    case["seg_a"] = np.stack([draws[f"trendIntercept[{i}]"] for i in range(len(segs))])
    case["seg_b"] = np.stack([draws[f"trendSlope[{i}]"] for i in range(len(segs))])
    case["tops"] = np.array([s["topBmlFt"] for s in segs])
    case["dtm"] = np.array([s["dtMatrixUsPerFt"] for s in segs])

    for _ in range(args.warmup):
        simulate(case, args.chunk, args.quantiles)
    times = []
    for _ in range(args.runs):
        t0 = time.perf_counter()
        out = simulate(case, args.chunk, args.quantiles)
        times.append((time.perf_counter() - t0) * 1000)

    agreement = {}
    for key, file in meta["results"].items():
        ref = load(d, file)
        both = np.isfinite(ref) & np.isfinite(out[key])
        rel = np.abs(out[key][both] - ref[both]) / np.maximum(np.abs(ref[both]), 1e-300)
        agreement[key] = {"maxRelDiff": float(rel.max()) if rel.size else None, "onlyOneFinite": int(np.sum(np.isfinite(ref) != np.isfinite(out[key])))}
    t = np.array(times)
    print(json.dumps({
        "depths": int(case["tvd"].size), "realisations": int(case["n"].size), "chunk": args.chunk, "quantiles": args.quantiles, "numpy": np.__version__,
        "medianMs": float(np.median(t)), "minMs": float(t.min()), "p25Ms": float(np.percentile(t, 25)), "p75Ms": float(np.percentile(t, 75)),
        "runs": args.runs, "agreement": agreement,
    }))


if __name__ == "__main__":
    main()
