#!/usr/bin/env python3
"""Compares float_accuracy.c's output of the double and the float build.

Usage: float_accuracy.py reference.txt other.txt
(double vs float build; also used for x86-64 vs 32-bit ARM double builds)
Per function: cases compared, largest and median relative difference of the float result
from the double one, and status disagreements (a state near a model's edge can fall on
either side in float). Prints a Markdown table (docs/embedding.md).
"""
import statistics
import sys


def load(path):
    rows = {}
    for line in open(path):
        fn, case, status, value = line.rstrip("\n").split("\t")
        rows[(fn, case)] = (int(status), float(value))
    return rows


d, f = load(sys.argv[1]), load(sys.argv[2])
per = {}
for key, (sd, vd) in d.items():
    fn = key[0]
    e = per.setdefault(fn, {"n": 0, "errs": [], "status": 0, "worst": None})
    sf, vf = f.get(key, (None, 0.0))
    if sf != sd:
        e["status"] += 1
        continue
    if sd != 0 or vd == 0.0:
        continue
    err = abs(vf - vd) / abs(vd)
    e["n"] += 1
    e["errs"].append(err)
    if e["worst"] is None or err > e["worst"][0]:
        e["worst"] = (err, key[1])

print("| function | cases | max rel. diff | median | status differs |")
print("|---|---:|---:|---:|---:|")
for fn in sorted(per):
    e = per[fn]
    if not e["errs"]:
        print("| %s | 0 | - | - | %d |" % (fn, e["status"]))
        continue
    print("| %s | %d | %.1e | %.1e | %d |" % (fn, e["n"], max(e["errs"]),
                                            statistics.median(e["errs"]), e["status"]))

overall = max(((max(e["errs"]), fn) for fn, e in per.items() if e["errs"]), default=(0.0, "-"))
print("overall: %d results, largest relative difference %.1e (%s), status differs in %d"
      % (len(d), overall[0], overall[1], sum(e["status"] for e in per.values())))
