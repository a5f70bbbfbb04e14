"""Trailing moving-average sweep with numpy cumulative sums.

The same computation as Quillcast's window sweep: for every width w in
FROM..TO, the one-step forecast of period t is the mean of the w values
before it, scored on the training periods w..TRAIN-1 by MAE and RMSE.

    python3 sweep_numpy.py SERIES.f64 TRAIN FROM TO REPEATS

SERIES.f64 holds little-endian float64 values. Prints one JSON object:
{"seconds": [...one per repeat...], "mae": [...], "rmse": [...],
 "numpy": "version"}.
"""
import json
import sys
import time

import numpy as np


def sweep(y, train, lo, hi):
    c = np.concatenate(([0.0], np.cumsum(y[:train])))
    mae, rmse = [], []
    for w in range(lo, hi + 1):
        f = (c[w:train] - c[: train - w]) / w
        e = y[w:train] - f
        mae.append(float(np.mean(np.abs(e))))
        rmse.append(float(np.sqrt(np.mean(e * e))))
    return mae, rmse


def main():
    path, train, lo, hi, reps = sys.argv[1], *map(int, sys.argv[2:6])
    y = np.fromfile(path, dtype="<f8")
    seconds = []
    for _ in range(reps):
        t0 = time.perf_counter()
        mae, rmse = sweep(y, train, lo, hi)
        seconds.append(time.perf_counter() - t0)
    print(json.dumps({"seconds": seconds, "mae": mae, "rmse": rmse, "numpy": np.__version__}))


main()
