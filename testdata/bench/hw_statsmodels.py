"""Additive Holt-Winters with statsmodels' default fit, timed.

    python3 hw_statsmodels.py SERIES.f64 SEASON REPEATS

Fits ExponentialSmoothing(y, trend="add", seasonal="add",
seasonal_periods=SEASON).fit() (the library's defaults: initial states
estimated together with the smoothing constants) REPEATS times. Prints one
JSON object: {"seconds": [...], "sse": ..., "alpha": ..., "beta": ...,
"gamma": ..., "statsmodels": "version"}.
"""
import json
import sys
import time
import warnings

import numpy as np
import statsmodels
from statsmodels.tsa.holtwinters import ExponentialSmoothing


def main():
    path, season, reps = sys.argv[1], int(sys.argv[2]), int(sys.argv[3])
    y = np.fromfile(path, dtype="<f8")
    seconds = []
    fit = None
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        for _ in range(reps):
            t0 = time.perf_counter()
            fit = ExponentialSmoothing(y, trend="add", seasonal="add", seasonal_periods=season).fit()
            seconds.append(time.perf_counter() - t0)
    p = fit.params
    print(json.dumps({
        "seconds": seconds,
        "sse": float(fit.sse),
        "alpha": float(p["smoothing_level"]),
        "beta": float(p["smoothing_trend"]),
        "gamma": float(p["smoothing_seasonal"]),
        "statsmodels": statsmodels.__version__,
    }))


main()
