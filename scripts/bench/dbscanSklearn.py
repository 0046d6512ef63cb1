#!/usr/bin/python3
"""Reference DBSCAN timing for scripts/bench-families.ts (not a fixture generator).

Usage: /usr/bin/python3 scripts/bench/dbscanSklearn.py POINTS.f64 EPS LABELS_OUT.i32
POINTS.f64: n x 3 little-endian float64 (velocity space, m/s). Runs
sklearn.cluster.DBSCAN(eps, min_samples=2) and writes the labels as int32; prints one JSON
line with the fit's wall time in seconds and the scikit-learn version.
"""
import json
import sys
import time

import numpy as np
import sklearn
from sklearn.cluster import DBSCAN

pts = np.fromfile(sys.argv[1], dtype='<f8').reshape(-1, 3)
eps = float(sys.argv[2])
t0 = time.perf_counter()
labels = DBSCAN(eps=eps, min_samples=2).fit(pts).labels_
seconds = time.perf_counter() - t0
labels.astype('<i4').tofile(sys.argv[3])
print(json.dumps({'seconds': seconds, 'version': sklearn.__version__}))
