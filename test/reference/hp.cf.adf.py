"""Reference values for the trend/cycle engine (src/analyse/cycle), computed with statsmodels and scipy.

Run by hand from the repository root (Debian's python3 with python3-statsmodels 0.13.5 and python3-scipy):

    LD_LIBRARY_PATH=/usr/lib/x86_64-linux-gnu/blas:/usr/lib/x86_64-linux-gnu/lapack \
        /usr/bin/python3 test/reference/hp.cf.adf.py

(The LD_LIBRARY_PATH is only needed where Debian's BLAS alternatives are not configured.)
Writes hp.json, cf.json, bk.json and adf.json beside this script. Each JSON keeps the calls that made it.

Data: statsmodels' bundled datasets.
- macrodata: US quarterly macro series 1959Q1-2009Q3, from FRED (Federal Reserve Economic Data, Federal Reserve
  Bank of St. Louis) via statsmodels.datasets.macrodata; realgdp is real GDP, infl the inflation rate.
- elnino: monthly sea surface temperature, Nino 1+2 region, 1950-2010, NOAA ERSST.V3B, via
  statsmodels.datasets.elnino (used as a positive monthly series).
"""
import json
import os
import platform

import numpy as np
import scipy
import scipy.special
import scipy.stats
import statsmodels
import statsmodels.datasets.elnino as elnino_data
import statsmodels.datasets.macrodata as macro_data
from statsmodels.tsa.filters.bk_filter import bkfilter
from statsmodels.tsa.filters.cf_filter import cffilter
from statsmodels.tsa.filters.hp_filter import hpfilter
from statsmodels.tsa.stattools import adfuller, kpss

HERE = os.path.dirname(os.path.abspath(__file__))
VERSIONS = {
    "python": platform.python_version(),
    "statsmodels": statsmodels.__version__,
    "scipy": scipy.__version__,
    "numpy": np.__version__,
}

macro = macro_data.load_pandas().data
realgdp = macro["realgdp"].to_numpy(dtype=float)
loggdp = np.log(realgdp)
infl = macro["infl"].to_numpy(dtype=float)
elnino = elnino_data.load_pandas().data.iloc[:, 1:].to_numpy(dtype=float).ravel()
elnino = elnino[~np.isnan(elnino)]

SERIES = {
    "realgdp": (realgdp, "statsmodels.datasets.macrodata realgdp (FRED), quarterly 1959Q1-2009Q3"),
    "loggdp": (loggdp, "log of statsmodels.datasets.macrodata realgdp (FRED)"),
    "infl": (infl, "statsmodels.datasets.macrodata infl (FRED), quarterly"),
    "elnino": (elnino, "statsmodels.datasets.elnino (NOAA ERSST.V3B Nino 1+2), monthly 1950-2010, row-major"),
}


def series(name):
    values, source = SERIES[name]
    return {"name": name, "source": source, "values": values.tolist()}


def write(name, payload):
    payload = {"versions": VERSIONS, **payload}
    with open(os.path.join(HERE, name), "w") as f:
        json.dump(payload, f, indent=1)
        f.write("\n")


hp_cases = []
for name, lam in [("realgdp", 1600), ("loggdp", 1600), ("elnino", 129600)]:
    _, trend = hpfilter(SERIES[name][0], lamb=lam)
    hp_cases.append({"series": series(name), "call": f"hpfilter({name}, lamb={lam})", "lambda": lam,
                     "trend": np.asarray(trend).tolist()})
write("hp.json", {"cases": hp_cases})

cf_cases = []
for name, low, high, drift in [("loggdp", 6, 32, True), ("infl", 6, 32, True), ("elnino", 18, 96, True),
                               ("infl", 6, 32, False)]:
    cycle, _ = cffilter(SERIES[name][0], low=low, high=high, drift=drift)
    cf_cases.append({"series": series(name), "call": f"cffilter({name}, low={low}, high={high}, drift={drift})",
                     "low": low, "high": high, "drift": drift, "cycle": np.asarray(cycle).tolist()})
write("cf.json", {"cases": cf_cases})

bk_cases = []
for name, low, high, k in [("loggdp", 6, 32, 12), ("elnino", 18, 96, 36)]:
    cycle = bkfilter(SERIES[name][0], low=low, high=high, K=k)
    bk_cases.append({"series": series(name), "call": f"bkfilter({name}, low={low}, high={high}, K={k})",
                     "low": low, "high": high, "k": k, "cycle": np.asarray(cycle).tolist(),
                     "note": "statsmodels drops K points at each end; the cycle here covers indices K..n-K-1"})
write("bk.json", {"cases": bk_cases})

adf_cases = []
for name in ["loggdp", "infl", "elnino"]:
    for differenced in [False, True]:
        x = SERIES[name][0]
        x = np.diff(x) if differenced else x
        stat, p, lags, nobs, crit, _ = adfuller(x, regression="c", autolag="AIC")
        kstat, kp, klags, _ = kpss(x, regression="c", nlags="auto")
        adf_cases.append({"series": series(name), "differenced": differenced,
                          "call": f"adfuller({'diff(' + name + ')' if differenced else name}, regression='c', autolag='AIC')"
                                  f"; kpss(..., regression='c', nlags='auto')",
                          "adf": {"statistic": stat, "pValue": p, "lags": lags, "nobs": nobs, "critical": crit},
                          "kpss": {"statistic": kstat, "pValue": kp, "lags": klags}})
dist = {
    "fCdf": [{"x": x, "d1": d1, "d2": d2, "value": scipy.stats.f.cdf(x, d1, d2),
              "call": f"scipy.stats.f.cdf({x}, {d1}, {d2})"}
             for x, d1, d2 in [(0.5, 5, 7), (1.0, 10, 10), (2.3, 20, 30), (4.0, 3, 50), (0.1, 40, 40), (8.0, 66, 66)]],
    "incompleteBeta": [{"x": x, "a": a, "b": b, "value": scipy.special.betainc(a, b, x),
                        "call": f"scipy.special.betainc({a}, {b}, {x})"}
                       for x, a, b in [(0.5, 2, 3), (0.1, 0.5, 0.5), (0.9, 30, 2), (0.3, 100, 200), (0.999, 1.5, 4)]],
    "normalCdf": [{"x": x, "value": scipy.stats.norm.cdf(x), "call": f"scipy.stats.norm.cdf({x})"}
                  for x in [-8.0, -3.2, -1.0, 0.0, 0.4, 1.959963984540054, 3.7]],
}
write("adf.json", {"cases": adf_cases, "distributions": dist})
