#!/usr/bin/env python3
"""Cost of gaskit.arrays per element, beside the C batch call it wraps.

1. 10^6 densities of an invented fuel gas (the mixture of bench/bench_batch.c) under each
   model given (default Peng-Robinson; "pr,best" adds the reference-grade model) through
   gaskit.arrays.density, in ns per element; beside
   it the C batch call gk_fluid_density_batch timed by bench_batch (C, when --c-bench names the
   program) and the same C call made through ctypes without the package's wrapper.
2. The Python overhead per call: the time of gaskit.arrays.density at 1, 10^3, 10^4 and 10^6
   elements minus that of the bare C batch call on the same arrays - a constant, not a cost
   per element.

Figures are printed, never asserted. Usage:
    GASKIT_LIBRARY=build-rel/libgaskit.so python3 bench_numpy.py [--c-bench build-rel/bench/bench_batch]
        [--models pr,srk] [--n 1000000]
"""
import argparse
import os
import re
import subprocess
import sys
import time

sys.path.insert(0, os.path.join(os.path.dirname(os.path.abspath(__file__)), ".."))

import numpy as np  # noqa: E402

import gaskit  # noqa: E402
from gaskit._native import native  # noqa: E402

FUEL = "CH4=0.90, C2H6=0.05, C3H8=0.01, N2=0.025, CO2=0.015"  # invented, as bench_batch.c
# the labels bench_batch prints
LABELS = {gaskit.Model.PENG_ROBINSON: "Peng-Robinson", gaskit.Model.BEST: "Reference-grade"}


def best_of(fn, repeats):
    best = float("inf")
    for _ in range(repeats):
        t0 = time.perf_counter()
        fn()
        best = min(best, time.perf_counter() - t0)
    return best


def states(n, seed=7):
    """Invented readings of a fictional compressor-station log: 1-80 bar, -20 to 60 degC."""
    rng = np.random.default_rng(seed)
    dtype = np.float32 if gaskit.build_info().float_build else np.float64
    return (rng.uniform(1e5, 80e5, n).astype(dtype), rng.uniform(253.15, 333.15, n).astype(dtype))


def c_figures(path, n):
    """ns per element of bench_batch's mixture lines, by model name."""
    out = subprocess.run([path, str(n)], capture_output=True, text=True, check=True).stdout
    figures = {}
    for line in out.splitlines():
        m = re.match(r"^(.*?) density of a .*?: ([0-9.]+) ns per element", line)
        if m:
            figures[m.group(1)] = float(m.group(2))
    return figures, out


def main():
    ap = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    ap.add_argument("--n", type=int, default=1_000_000)
    ap.add_argument("--models", default="pr", help="comma-separated model names")
    ap.add_argument("--c-bench", help="path of bench/bench_batch (the C figures)")
    args = ap.parse_args()
    info = gaskit.build_info()
    print("gaskit %s from %s (%s)" % (info.version, info.path, info.dtype))
    fuel = gaskit.fluid(FUEL)
    c_ns = {}
    if args.c_bench:
        c_ns, _ = c_figures(args.c_bench, args.n)
    p, t = states(args.n)
    nat = native()
    for name in args.models.split(","):
        model = gaskit.model(name)
        try:
            r = gaskit.arrays.density(fuel, p, t, model=model)
        except gaskit.ArgumentError:
            print("%s: not in this library" % model.name)
            continue
        secs = best_of(lambda: gaskit.arrays.density(fuel, p, t, model=model), 3)
        out = np.empty_like(p)
        st = np.empty(p.size, dtype=np.intc)
        raw = best_of(lambda: nat.fluid_density_batch(int(model), fuel.struct, p.size,
                                                      p.ctypes.data, t.ctypes.data,
                                                      out.ctypes.data, st.ctypes.data), 3)
        label = LABELS.get(model, model.name.replace("_", "-").title())
        c_txt = next((" C batch (bench_batch) %.1f ns," % v for k, v in c_ns.items()
                      if k.lower() == label.lower()), "")
        print("%s density of a 5-component mixture, %d elements: Python gaskit.arrays %.1f ns "
              "per element,%s C batch through bare ctypes %.1f ns (%d ok)"
              % (label, args.n, 1e9 * secs / args.n, c_txt, 1e9 * raw / args.n,
                 int(r.ok.sum())))
    # overhead per call: the wrapper's time minus the bare C call's, at each size, alternated
    model = gaskit.model(args.models.split(",")[0])
    print("Python overhead per call (gaskit.arrays.density minus the bare C batch call through "
          "ctypes, best of alternated repeats):")
    for n in (1, 1000, 10_000, args.n):
        pn, tn = p[:n].copy(), t[:n].copy()
        on, sn = np.empty_like(pn), np.empty(n, dtype=np.intc)
        reps = max(5, min(3000, int(3e5 / max(n, 1))))
        best_w = best_c = float("inf")
        for _ in range(reps):
            best_w = min(best_w, best_of(lambda: gaskit.arrays.density(fuel, pn, tn,
                                                                       model=model), 1))
            best_c = min(best_c, best_of(lambda: nat.fluid_density_batch(
                int(model), fuel.struct, n, pn.ctypes.data, tn.ctypes.data, on.ctypes.data,
                sn.ctypes.data), 1))
        print("  %8d elements: gaskit.arrays %10.1f us, C batch %10.1f us, overhead %5.1f us "
              "per call (%.3f ns per element)"
              % (n, 1e6 * best_w, 1e6 * best_c, 1e6 * (best_w - best_c),
                 1e9 * (best_w - best_c) / n))

if __name__ == "__main__":
    main()
