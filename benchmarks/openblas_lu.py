#!/usr/bin/env python3
"""The machine's limit for the factorization: OpenBLAS's LU with partial pivoting (LAPACK dgetrf through
SciPy's lu_factor) on random n x n matrices of the sizes SystemBenchmark uses, timed here in the same run as
the JMH benchmarks; then, given JMH's JSON result, the side-by-side table of EJML's, the tiled LU's and
OpenBLAS's rates. Run by benchmarks/run.sh when python3 with NumPy and SciPy is present.

    python3 benchmarks/openblas_lu.py [jmh-result.json]

Timing: a warm-up call, then calls until about a second has passed (at least 3); the median time per call.
The call includes SciPy's copy of the row-major array into column order, as the Java side's times include a
copy of the matrix. OpenBLAS is timed with its default thread count (every core) and, in a child process
with OPENBLAS_NUM_THREADS=1, on one thread; the machine's limit is the faster of the two at each size (on a
loaded machine OpenBLAS's threads wait for each other and the one-thread figure is the faster).
"""
import json
import os
import subprocess
import statistics
import sys
import time

import numpy as np
import scipy
import scipy.linalg

SIZES = [256, 512, 1000, 2000]


def time_lu(n, rng):
    a = rng.standard_normal((n, n))
    scipy.linalg.lu_factor(a, check_finite=False)
    times = []
    start = time.perf_counter()
    while len(times) < 3 or time.perf_counter() - start < 1.0:
        t0 = time.perf_counter()
        scipy.linalg.lu_factor(a, check_finite=False)
        times.append(time.perf_counter() - t0)
    return statistics.median(times)


def jmh_times(path):
    """Wall seconds per call of the SystemBenchmark LU benchmarks, by (benchmark, n)."""
    scale = {"ns/op": 1e-9, "us/op": 1e-6, "ms/op": 1e-3, "s/op": 1.0}
    out = {}
    with open(path) as f:
        for r in json.load(f):
            name = r["benchmark"].rsplit(".", 1)[-1]
            if ".SystemBenchmark." in r["benchmark"] and "unknowns" in r.get("params", {}):
                m = r["primaryMetric"]
                out[(name, int(r["params"]["unknowns"]))] = m["score"] * scale[m["scoreUnit"]]
    return out


def main():
    if len(sys.argv) > 1 and sys.argv[1] == "--times-only":
        rng = np.random.default_rng(18)
        print(json.dumps({n: time_lu(n, rng) for n in SIZES}))
        return
    env = dict(os.environ, OPENBLAS_NUM_THREADS="1")
    one = {int(k): v for k, v in json.loads(subprocess.run([sys.executable, __file__, "--times-only"], env=env,
                                                           check=True, capture_output=True, text=True).stdout).items()}
    rng = np.random.default_rng(18)
    config = ""
    try:
        info = np.show_config(mode="dicts")
        blas = info.get("Build Dependencies", {}).get("blas", {})
        config = f"{blas.get('name', '?')} {blas.get('version', '')}".strip()
    except Exception:  # older NumPy: no dict mode
        config = "BLAS as NumPy was built with"
    limit = {n: time_lu(n, rng) for n in SIZES}
    print(f"OpenBLAS LU (scipy.linalg.lu_factor, NumPy {np.__version__}, SciPy {scipy.__version__}, {config})")
    jmh = jmh_times(sys.argv[1]) if len(sys.argv) > 1 else {}
    flops = {n: 2.0 / 3.0 * n ** 3 for n in SIZES}

    def cell(t, n):
        return f"{t * 1e3:8.2f} {flops[n] / t * 1e-9:6.2f}" if t else f"{'-':>8} {'-':>6}"

    print("  LU: ms per call and GFLOP/s = (2/3 n^3) / time, all measured in this run")
    print(f"  {'n':>5} | {'EJML':^15} | {'tiled, 1 thread':^15} | {'tiled, 2 threads':^16} | {'OpenBLAS, 1 thr':^15} |"
          f" {'OpenBLAS, all':^15} | tiled (best) time / OpenBLAS (best) time")
    for n in SIZES:
        e = jmh.get(("luEjml", n))
        t1 = jmh.get(("luTiled1", n))
        t2 = jmh.get(("luTiled2", n))
        best = min(one[n], limit[n])
        tiled = min(t for t in (t1, t2) if t) if (t1 or t2) else None
        ratio = f"{tiled / best:5.2f}x ({'within' if tiled / best <= 3 else 'NOT within'} 3x)" if tiled else "-"
        print(f"  {n:5d} | {cell(e, n)} | {cell(t1, n)} | {cell(t2, n)}  | {cell(one[n], n)} | {cell(limit[n], n)} | {ratio}")


if __name__ == "__main__":
    main()
