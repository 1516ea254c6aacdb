"""numpy reference for the pore-pressure pipeline benchmark (bench-only tooling).

Usage:
    node bench/exportBenchWell.mjs 200000 <dir>      # writes the well and shalepoint's results
    python3 bench/numpyReference.py <dir> [--runs 15] [--warmup 3]

Runs, vectorised in numpy (scipy where it is the natural tool), the same stages that
shalepoint's predictPorePressure runs with the bench options (bench/benchOptions.mjs) on
the generated Quillon BENCH-1 well (invented data), times the whole chain (file reading
excluded) with time.perf_counter (warm-up runs, then the median of the timed runs), and
prints one JSON line: samples, medianMs, minMs, stagesMs (median per stage), and agreement
(per curve, the largest absolute difference from shalepoint's result over the samples where
both are finite, with the count of samples where only one of the two is finite).

Stages, each as in the shalepoint module named beside it:
  despike     Hampel identifier, 11-sample centred window truncated at the ends, NaN
              skipped, spike when |x - med| > 3 * 1.4826 * MAD, replaced by the window
              median; on DT, RHOB, resistivity (pipeline) and GR (shale picking despikes
              GR too)                                                 (logs/despikeLog.ts)
  badHole     caliper - bit size > 1 in                               (logs/flagBadHole.ts)
  overburden  water column; near-mudline power-law average density (Traugott 1997, as
              reproduced in Zhang 2019 eqs. 6.4-6.6) above the first density sample;
              density log, with Gardner (1974) rho = 0.23 V^0.25 from sonic over bad hole
              and missing density, linear fill where neither exists; cumulative trapezoid
              (Zoback 2007 eq. 1.6)                                   (stress/overburden.ts)
  hydrostatic 0.445 psi/ft from sea level                             (stress/hydrostatic.ts)
  shalePoints GR >= 80 API, beds thinner than 10 ft dropped (thickness between the
              midpoints to the neighbouring samples), one point per 20-ft TVD window:
              middle shale sample, NaN-skipping medians of DT and resistivity
                                                                      (logs/pickShalePoints.ts)
  shaleLines  linear interpolation between shale points, NaN outside them and across gaps
              wider than 1000 ft                                      (logs/interpolateShaleLine.ts)
  trendFits   Huber IRLS (c = 1.345, scale = MAD/0.6745, convergence when the line moves
              less than 1e-12 of the y range at both ends) on the shale points 1000-4500 ft
              below mudline: ln(dt - 65) = a + b z and ln(R) = a + b z
                                                                      (trend/fitCompactionTrend.ts,
                                                                       trend/fitStraightLineHuber.ts)
  trendEval   dt = 65 + (dt0 - 65) exp(-c z), R = R0 exp(g z), z >= 0 below mudline
                                                                      (trend/evaluateCompactionTrend.ts)
  eatonSonic / eatonResistivity
              Eaton (1975): Pp = Sv - (Sv - Ph) r^n, r = trend/dt (n 3) or R/trend (n 1.2),
              clipped to Sv, flag bits as porePressureFlags.ts        (porepressure/eaton.ts)
  bowers      Bowers (1995) virgin curve V = 5000 + A sigma^B, A 10, B 0.75, on the DT
              shale line; V < V0 gives Pp = Sv; clipped to Sv         (porepressure/bowersPorePressure.ts)
  equivalentDepth
              Foster & Whalen (1966) on the DT shale line against the sampled sonic trend:
              faster than the trend gives Ph, else Ze by inverse interpolation of the
              (monotonic) trend, Pp = Sv(Z) - (Sv(Ze) - Ph(Ze)), clipped to Sv
                                                                      (porepressure/equivalentDepth.ts)
Loops over samples: none. Python loops, each step vectorised over all samples or points:
the 11 window offsets of the despike MAD count, the Huber iterations (about 10 per fit) and
the unbridged shale-line gaps (none in the bench well); the ~400 shale-point medians are one
sort of a padded (points x widest window) matrix per curve.
--plain-despike swaps the despike for the textbook form (sort the window matrix for the
median, sort the deviations again for the MAD): same values, slower.

Results are estimates for trained engineers: calibrate them to measured data and have them
reviewed; local regulations and licensed practice govern. This script exists to time the
stages, not to predict pressure.
"""

import argparse
import json
import os
import sys
import time

import numpy as np
from numpy.lib.stride_tricks import sliding_window_view
from scipy.integrate import cumulative_trapezoid
from scipy.ndimage import median_filter

# Unit factors, as in src/units/index.ts.
G_M_PER_S2 = 9.80665
PASCALS_PER_PSI = 0.45359237 * G_M_PER_S2 / (0.0254 * 0.0254)
PSI_PER_FT_PER_GCC = 1000 * G_M_PER_S2 * 0.3048 / PASCALS_PER_PSI
PSI_PER_FT_PER_PPG = 12 / 231
PPG_PER_GCC = 1000 * 231 * 0.0254**3 / 0.45359237
MAD_TO_SIGMA = 1.482602218505602
HUBER_C = 1.345
NORMAL_MAD_FACTOR = 0.6744897501960817


# ---------------------------------------------------------------------------------------
# stages


def despike_hampel(x, window=11, threshold=3.0):
    """Hampel identifier on a centred window (truncated at the ends, NaN skipped).

    Median: scipy.ndimage.median_filter on the log with NaN set to 0, kept only where the
    window holds `window` finite values; the few other windows (ends of the log, edges of
    NaN gaps) take the median of their sorted finite values (mean of the two middle ones
    for an even count). MAD test without a second sort: for an odd count m,
    |x - med| > c*MAD exactly when more than m//2 deviations d = |x_j - med| satisfy
    c*d < |x - med| (MAD is the middle deviation), so the deviations are only counted,
    one window offset at a time (a loop over the 11 offsets, each vectorised over all
    samples). Windows with an even count sort their deviations for the MAD.
    """
    h = (window - 1) // 2
    n = x.size
    padded = np.pad(x, h, constant_values=np.nan)
    csum = np.concatenate(([0], np.cumsum(~np.isnan(padded))))
    m = csum[window:] - csum[:-window]  # finite values per window
    med = median_filter(np.nan_to_num(x, nan=0.0), size=window, mode="nearest")
    part = np.flatnonzero(m < window)
    if part.size:
        s = np.sort(sliding_window_view(padded, window)[part], axis=1)  # NaN last
        mp = m[part]
        k = np.arange(part.size)
        with np.errstate(invalid="ignore"):
            med[part] = 0.5 * (s[k, np.maximum((mp - 1) // 2, 0)] + s[k, mp // 2])
    r = np.abs(x - med)
    c = threshold * MAD_TO_SIGMA
    below = np.zeros(n, dtype=np.int16)
    d = np.empty(n)
    hit = np.empty(n, dtype=bool)
    with np.errstate(invalid="ignore"):
        for j in range(window):  # window offsets, not samples
            np.subtract(padded[j : j + n], med, out=d)
            np.abs(d, out=d)
            d *= c
            np.less(d, r, out=hit)  # NaN deviations never count
            below += hit
    spike = (m & 1 == 1) & (below > (m >> 1))
    even = np.flatnonzero((m & 1 == 0) & (m > 0))
    if even.size:
        dev = np.sort(np.abs(sliding_window_view(padded, window)[even] - med[even, None]), axis=1)
        he = m[even] >> 1
        k = np.arange(even.size)
        mad = 0.5 * (dev[k, he - 1] + dev[k, he])
        spike[even] = r[even] > np.maximum(c * mad, 0.0)
    spike &= ~np.isnan(x)
    return np.where(spike, med, x)


def despike_hampel_plain(x, window=11, threshold=3.0):
    """Hampel identifier, textbook form: sorted window matrix for the median, a second sort
    of the deviations for the MAD (NaN sorted last, counts per window from the NaN mask)."""
    h = (window - 1) // 2
    n = x.size
    padded = np.pad(x, h, constant_values=np.nan)
    s = np.sort(sliding_window_view(padded, window), axis=1)
    m = np.count_nonzero(~np.isnan(s), axis=1)
    k = np.arange(n)
    lo = np.maximum((m - 1) // 2, 0)
    hi = m // 2
    with np.errstate(invalid="ignore"):
        med = 0.5 * (s[k, lo] + s[k, hi])
        dev = np.sort(np.abs(s - med[:, None]), axis=1)
        mad = 0.5 * (dev[k, lo] + dev[k, hi])
        spike = np.abs(x - med) > threshold * MAD_TO_SIGMA * mad
    return np.where(spike, med, x)


def power_law_average_ppg(bml):
    return 16.3 + (bml / 3125.0) ** 0.6


def overburden(tvd, datums, rhob, dt, bad_hole):
    rt = datums["rtElevationFt"]
    wd = datums["waterDepthFt"]
    sea_tvd = rt
    mudline = rt + wd
    n = tvd.size
    sv_mudline = datums["seawaterDensityGcc"] * PSI_PER_FT_PER_GCC * wd
    sv = np.zeros(n)
    sed = tvd >= mudline
    water = ~sed & (tvd > sea_tvd)
    sv[water] = datums["seawaterDensityGcc"] * PSI_PER_FT_PER_GCC * (tvd[water] - sea_tvd)
    i_sed = int(np.argmax(sed)) if sed.any() else n
    good_rho = np.isfinite(rhob) & (rhob > 0)
    i_top = i_sed + int(np.argmax(good_rho[i_sed:])) if good_rho[i_sed:].any() else n
    with np.errstate(divide="ignore", invalid="ignore"):
        gardner = np.where(np.isfinite(dt) & (dt > 0), 0.23 * (1e6 / dt) ** 0.25, np.nan)
    rho = np.where(good_rho & (bad_hole == 0), rhob, gardner)
    rho[:i_top] = np.nan  # above the density log: power law (default near-mudline fill)
    known = np.isfinite(rho)
    known[:i_sed] = False
    i_anchor = int(np.argmax(known)) if known.any() else n
    if i_anchor >= n:
        return sv
    above = np.arange(i_sed, i_anchor)
    d = tvd[above] - mudline
    sv[above] = sv_mudline + power_law_average_ppg(d) * d * PSI_PER_FT_PER_PPG
    # Pending samples below the anchor: linear in depth between known samples, the last
    # value held below the last one (np.interp holds the end values).
    pend = ~known
    pend[:i_anchor] = False
    if pend.any():
        k = np.flatnonzero(known)
        rho[pend] = np.interp(tvd[pend], tvd[k], rho[k])
    d0 = tvd[i_anchor] - mudline
    sv0 = sv_mudline + (power_law_average_ppg(d0) * d0 * PSI_PER_FT_PER_PPG if d0 > 0 else 0.0)
    seg = slice(i_anchor, n)
    sv[seg] = sv0 + cumulative_trapezoid(rho[seg] * PSI_PER_FT_PER_GCC, tvd[seg], initial=0.0)
    return sv


def hydrostatic(tvd, datums, gradient):
    return gradient * np.maximum(tvd - datums["rtElevationFt"], 0.0)


def shale_points(tvd, gr, curves, cutoff_api, min_bed_ft, window_ft):
    n = tvd.size
    shale = (gr >= cutoff_api) & ~np.isnan(tvd)
    # Beds (runs of shale): thickness between the midpoints to the neighbouring samples.
    edges = np.diff(np.concatenate(([0], shale.view(np.int8), [0])))
    starts = np.flatnonzero(edges == 1)
    ends = np.flatnonzero(edges == -1) - 1
    mid = 0.5 * (tvd[:-1] + tvd[1:])
    top = np.where(starts > 0, mid[np.maximum(starts - 1, 0)], tvd[starts])
    base = np.where(ends < n - 1, mid[np.minimum(ends, n - 2)], tvd[ends])
    thin = base - top < min_bed_ft
    run_id = np.cumsum(edges[:-1] == 1) - 1  # bed index of each shale sample
    members = np.flatnonzero(shale & ~thin[np.maximum(run_id, 0)])
    # One point per TVD window: groups of consecutive shale samples with the same key.
    key = np.floor(tvd[members] / window_ft)
    gstart = np.concatenate(([0], np.flatnonzero(np.diff(key) != 0) + 1))
    count = np.diff(np.concatenate((gstart, [members.size])))
    rep = members[gstart + (count - 1) // 2]
    # Medians by group: a (points x widest) matrix padded with NaN, sorted once per curve.
    p = gstart.size
    width = int(count.max())
    col = np.arange(members.size) - np.repeat(gstart, count)
    row = np.repeat(np.arange(p), count)
    values = {}
    for name, v in curves.items():
        mat = np.full((p, width), np.nan)
        mat[row, col] = v[members]
        mat.sort(axis=1)
        mfin = np.count_nonzero(~np.isnan(mat), axis=1)
        r = np.arange(p)
        with np.errstate(invalid="ignore"):
            med = 0.5 * (mat[r, np.maximum((mfin - 1) // 2, 0)] + mat[r, np.maximum(mfin // 2, 0)])
        med[mfin == 0] = np.nan
        values[name] = med
    return {"tvd": tvd[rep], "values": values, "isShale": shale}


def shale_line(point_tvd, point_values, tvd, max_gap_ft):
    """np.interp between the valid points; NaN outside them and inside wide gaps (tvd sorted)."""
    ok = np.isfinite(point_tvd) & np.isfinite(point_values)
    zs = point_tvd[ok]
    vs = point_values[ok]
    out = np.interp(tvd, zs, vs, left=np.nan, right=np.nan)
    wide = np.flatnonzero(np.diff(zs) > max_gap_ft)
    starts = np.searchsorted(tvd, zs[wide], side="right")
    ends = np.searchsorted(tvd, zs[wide + 1], side="left")
    for a, b in zip(starts, ends):  # the few unbridged gaps, not samples
        out[a:b] = np.nan
    return out


def fit_line(x, y, w):
    sw = w.sum()
    xm = (w * x).sum() / sw
    ym = (w * y).sum() / sw
    dx = x - xm
    slope = (w * dx * (y - ym)).sum() / (w * dx * dx).sum()
    return ym - slope * xm, slope


def fit_line_huber(x, y, max_iter=100):
    w = np.ones_like(x)
    a, b = fit_line(x, y, w)
    tol = 1e-12 * max(y.max() - y.min(), 5e-324)
    x_min, x_max = x.min(), x.max()
    for _ in range(max_iter):  # a few iterations, each vectorised over the points
        r = y - a - b * x
        scale = np.median(np.abs(r - np.median(r))) / NORMAL_MAD_FACTOR
        s = max(scale, tol)
        ar = np.abs(r)
        with np.errstate(divide="ignore"):
            w = np.where(ar <= HUBER_C * s, 1.0, HUBER_C * s / ar)
        a2, b2 = fit_line(x, y, w)
        move_top = abs(a2 + b2 * x_min - (a + b * x_min))
        move_base = abs(a2 + b2 * x_max - (a + b * x_max))
        a, b = a2, b2
        if move_top <= tol and move_base <= tol:
            break
    return a, b


def fit_trend(kind, point_bml, point_values, interval, dt_matrix=None):
    z, v = point_bml, point_values
    use = (z >= interval["topBmlFt"]) & (z <= interval["baseBmlFt"]) & np.isfinite(v) & (v > 0)
    if kind == "sonicExponential":
        use &= v > dt_matrix
        a, b = fit_line_huber(z[use], np.log(v[use] - dt_matrix))
        return {"dtMatrixUsPerFt": dt_matrix, "dtMudlineUsPerFt": dt_matrix + np.exp(a), "decayPerFt": -b}
    a, b = fit_line_huber(z[use], np.log(v[use]))
    return {"r0OhmM": np.exp(a), "growthPerFt": b}


def eval_trend(kind, params, bml):
    ok = bml >= 0
    if kind == "sonicExponential":
        c1 = params["dtMudlineUsPerFt"] - params["dtMatrixUsPerFt"]
        v = params["dtMatrixUsPerFt"] + c1 * np.exp(-params["decayPerFt"] * bml)
    else:
        v = params["r0OhmM"] * np.exp(params["growthPerFt"] * bml)
    return np.where(ok, v, np.nan)


# Pore-pressure flag bits, as in src/porepressure/porePressureFlags.ts.
MISSING, CLIPPED_AT_SV, BELOW_HYDROSTATIC, RAISED_TO_HYDROSTATIC, NO_EQUIVALENT_DEPTH = 1, 2, 4, 8, 16


def finish(raw, sv, ph, flags):
    """Clip to Sv and flag, as finishPorePressure: NaN -> missing (unless no equivalent
    depth), above Sv -> Sv (flag 2), below hydrostatic -> kept (flag 4)."""
    with np.errstate(invalid="ignore"):
        nan = np.isnan(raw) | ((flags & (MISSING | NO_EQUIVALENT_DEPTH)) != 0)
        clip = raw > sv
        pp = np.where(clip, sv, raw)
        below = pp < ph
    pp[nan] = np.nan
    flags = flags | np.where(nan & ((flags & NO_EQUIVALENT_DEPTH) == 0), MISSING, 0).astype(np.uint8)
    flags |= np.where(~nan & clip, CLIPPED_AT_SV, 0).astype(np.uint8)
    flags |= np.where(~nan & below, BELOW_HYDROSTATIC, 0).astype(np.uint8)
    return pp, flags


def eaton(sv, ph, ratio, exponent):
    raw = sv - (sv - ph) * ratio**exponent  # NaN in any input stays NaN
    return finish(raw, sv, ph, np.zeros(raw.size, dtype=np.uint8))


def eaton_ratio(observed, trend, sonic):
    with np.errstate(invalid="ignore"):
        ok = (observed > 0) & (trend > 0)
    return np.where(ok, trend / observed if sonic else observed / trend, np.nan)


def bowers(sv, ph, dt_line, a, b, v0=5000.0):
    with np.errstate(divide="ignore", invalid="ignore"):
        v = np.where(dt_line > 0, 1e6 / dt_line, np.nan)
        sigma = ((v - v0) / a) ** (1.0 / b)
        slow = v < v0  # no effective stress on the curve: Pp = Sv, flagged
    raw = np.where(slow, sv, sv - sigma)
    missing = ~(np.isfinite(sv) & np.isfinite(v) & np.isfinite(ph))
    flags = np.where(missing, MISSING, np.where(slow, CLIPPED_AT_SV, 0)).astype(np.uint8)
    return finish(raw, sv, ph, flags)


def equivalent_depth(tvd, sv, ph, observed, trend, first, search_top):
    """Ze on the trend sampled at tvd[first:] (strictly monotonic there, checked)."""
    t = trend[first:]
    t_tvd = tvd[first:]
    sgn = np.sign(t[-1] - t[0])
    if not (np.all(np.diff(t_tvd) > 0) and np.all(np.diff(t) * sgn > 0)):
        raise ValueError("equivalent depth needs a strictly monotonic trend")
    t_top = np.interp(search_top, t_tvd, t)
    tz = trend.copy()  # the trend at each sample's own depth (it is sampled there)
    tz[:first] = np.nan
    x = observed
    missing = ~(np.isfinite(tvd) & np.isfinite(x) & np.isfinite(sv) & np.isfinite(ph))
    with np.errstate(invalid="ignore"):
        off_trend = ~missing & (~np.isfinite(tz) | (tvd < search_top))
        d = (x - tz) * sgn
        normal = ~missing & ~off_trend & (d >= 0)
        beyond = ~missing & ~off_trend & ~normal & ((x - t_top) * sgn < 0)
    # Inverse interpolation of the trend: depth as a function of the trend value.
    inc, inc_z = (t, t_tvd) if sgn > 0 else (t[::-1], t_tvd[::-1])
    ze = np.clip(np.interp(x, inc, inc_z), search_top, tvd)
    sigma_e = np.interp(ze, tvd, sv) - np.interp(ze, tvd, ph)
    raw = np.where(normal, ph, sv - sigma_e)
    flags = (
        np.where(missing, MISSING, 0)
        | np.where(off_trend | beyond, NO_EQUIVALENT_DEPTH, 0)
        | np.where(normal & (d > 0), RAISED_TO_HYDROSTATIC, 0)
    ).astype(np.uint8)
    return finish(raw, sv, ph, flags)


# ---------------------------------------------------------------------------------------
# the chain


def run_pipeline(well, meta, clock, despike=despike_hampel):
    """All stages in order; clock(name) closes the stage that just ran."""
    opt = meta["options"]
    datums = meta["datums"]
    tvd = well["tvd"]
    mudline = datums["rtElevationFt"] + datums["waterDepthFt"]
    bml = tvd - mudline
    clock("depthReference")

    dt = despike(well["dt"])
    rhob = despike(well["rhob"])
    res = despike(well["res"])
    gr = despike(well["gr"])
    clock("despike")

    bad_hole = (well["cali"] - well["bs"]) > 1.0
    clock("badHole")

    sv = overburden(tvd, datums, rhob, dt, bad_hole)
    clock("overburden")

    ph = hydrostatic(tvd, datums, opt["hydrostaticGradientPsiPerFt"])
    clock("hydrostatic")

    pts = shale_points(tvd, gr, {"dt": dt, "res": res}, opt["shale"]["criterion"]["cutoffApi"], 10.0, 20.0)
    clock("shalePoints")

    line_dt = shale_line(pts["tvd"], pts["values"]["dt"], tvd, 1000.0)
    line_res = shale_line(pts["tvd"], pts["values"]["res"], tvd, 1000.0)
    clock("shaleLines")

    point_bml = pts["tvd"] - mudline
    sseg = opt["sonicTrend"]["segments"][0]
    rseg = opt["resistivityTrend"]["segments"][0]
    sonic_params = fit_trend("sonicExponential", point_bml, pts["values"]["dt"], sseg["intervals"][0], sseg["dtMatrixUsPerFt"])
    res_params = fit_trend("resistivityLogLinear", point_bml, pts["values"]["res"], rseg["intervals"][0])
    clock("trendFits")

    sonic_trend = eval_trend("sonicExponential", sonic_params, bml)
    res_trend = eval_trend("resistivityLogLinear", res_params, bml)
    clock("trendEval")

    pp_es, fl_es = eaton(sv, ph, eaton_ratio(line_dt, sonic_trend, True), 3.0)
    clock("eatonSonic")
    pp_er, fl_er = eaton(sv, ph, eaton_ratio(line_res, res_trend, False), 1.2)
    clock("eatonResistivity")
    pp_b, fl_b = bowers(sv, ph, line_dt, opt["bowers"]["a"], opt["bowers"]["b"])
    clock("bowers")

    first = int(np.argmax(np.isfinite(sonic_trend) & (bml > 0)))
    pp_ed, fl_ed = equivalent_depth(tvd, sv, ph, line_dt, sonic_trend, first, max(mudline, tvd[first]))
    clock("equivalentDepth")

    return {
        "grClean": gr, "dtClean": dt, "rhobClean": rhob, "resClean": res, "sv": sv, "hydrostatic": ph,
        "shaleLineDt": line_dt, "shaleLineRes": line_res, "sonicTrend": sonic_trend,
        "resistivityTrend": res_trend, "eatonSonicPp": pp_es, "eatonResistivityPp": pp_er,
        "bowersPp": pp_b, "equivalentDepthPp": pp_ed,
        "_flags": {"eatonSonic": fl_es, "eatonResistivity": fl_er, "bowers": fl_b, "equivalentDepth": fl_ed},
        "_params": {"sonic": sonic_params, "res": res_params, "points": int(pts["tvd"].size)},
    }


def read_f64(folder, name):
    return np.fromfile(os.path.join(folder, name), dtype="<f8")


def main():
    ap = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    ap.add_argument("folder")
    ap.add_argument("--runs", type=int, default=15)
    ap.add_argument("--warmup", type=int, default=3)
    ap.add_argument("--plain-despike", action="store_true", help="textbook Hampel (two sorts of the window matrix)")
    args = ap.parse_args()
    with open(os.path.join(args.folder, "meta.json")) as f:
        meta = json.load(f)
    well = {k: read_f64(args.folder, v) for k, v in meta["files"].items()}

    totals = []
    stages = {}
    result = None
    for run in range(args.warmup + args.runs):
        marks = []
        t0 = time.perf_counter()
        last = [t0]

        def clock(name):
            now = time.perf_counter()
            marks.append((name, now - last[0]))
            last[0] = now

        result = run_pipeline(well, meta, clock, despike_hampel_plain if args.plain_despike else despike_hampel)
        total = time.perf_counter() - t0
        if run >= args.warmup:
            totals.append(total * 1e3)
            for name, dt in marks:
                stages.setdefault(name, []).append(dt * 1e3)

    agreement = {}
    for name, fname in meta["shalepoint"]["results"].items():
        ref = read_f64(args.folder, fname)
        ours = result[name]
        both = np.isfinite(ref) & np.isfinite(ours)
        agreement[name] = {
            "maxAbsDiff": float(np.max(np.abs(ours[both] - ref[both]))) if both.any() else None,
            "onlyOneFinite": int(np.count_nonzero(np.isfinite(ref) != np.isfinite(ours))),
        }
    for name, fname in meta["shalepoint"]["flags"].items():
        ref = np.fromfile(os.path.join(args.folder, fname), dtype=np.uint8)
        agreement[name + "Flags"] = {"samplesDiffering": int(np.count_nonzero(ref != result["_flags"][name]))}
    sp = meta["shalepoint"]
    p = result["_params"]
    agreement["trendParams"] = {
        "shalePoints": [p["points"], sp["shalePointCount"]],
        "sonicDecayRelDiff": float(abs(p["sonic"]["decayPerFt"] / sp["sonicTrendParams"]["decayPerFt"] - 1)),
        "sonicMudlineRelDiff": float(abs(p["sonic"]["dtMudlineUsPerFt"] / sp["sonicTrendParams"]["dtMudlineUsPerFt"] - 1)),
        "resR0RelDiff": float(abs(p["res"]["r0OhmM"] / sp["resistivityTrendParams"]["r0OhmM"] - 1)),
        "resGrowthRelDiff": float(abs(p["res"]["growthPerFt"] / sp["resistivityTrendParams"]["growthPerFt"] - 1)),
    }
    out = {
        "samples": meta["samples"],
        "medianMs": round(float(np.median(totals)), 3),
        "minMs": round(float(np.min(totals)), 3),
        "p25Ms": round(float(np.percentile(totals, 25)), 3),
        "p75Ms": round(float(np.percentile(totals, 75)), 3),
        "runs": args.runs,
        "despike": "plain (two sorts)" if args.plain_despike else "median filter + MAD count",
        "stagesMs": {k: round(float(np.median(v)), 3) for k, v in stages.items()},
        "agreement": agreement,
        "numpy": np.__version__,
        "python": sys.version.split()[0],
    }
    print(json.dumps(out))


if __name__ == "__main__":
    main()
