#!/usr/bin/env python3
"""Stack report of the cross-built library from gcc's -fstack-usage (.su) and
-fcallgraph-info=su (.ci) files.

Usage: stack_report.py <dir with the library's .su/.ci files> [goal_bytes]

Prints the largest own frame of any public (gk_) function and the worst-case stack of any
public function including the library functions it calls (longest call chain inside the
library; calls into libm/libc are listed but their frames are not known here). Exits 1 if a
frame is dynamic (a VLA or alloca), the call graph has a cycle (recursion) or the worst case is
above goal_bytes.
"""
import glob
import os
import re
import sys

root = sys.argv[1]
goal = int(sys.argv[2]) if len(sys.argv) > 2 else 256

frames = {}      # call-graph node -> bytes ("file:function" for static functions)
kinds = {}       # function -> static / dynamic / dynamic,bounded (from the .su files)
for su in glob.glob(os.path.join(root, "**", "*.su"), recursive=True):
    for line in open(su):
        parts = line.rstrip("\n").split("\t")
        if len(parts) != 3:
            continue
        kinds[parts[0].rsplit(":", 1)[-1]] = parts[2]

# The call graphs name static functions "file:function"; their nodes carry the frame size.
edges = {}
external = set()
for ci in glob.glob(os.path.join(root, "**", "*.ci"), recursive=True):
    text = open(ci).read()
    for m in re.finditer(r'node: \{ title: "([^"]+)" label: "[^"]*\\n(\d+) bytes \(([a-z,]+)\)"', text):
        frames[m.group(1)] = max(frames.get(m.group(1), 0), int(m.group(2)))
        kinds[m.group(1)] = m.group(3)
    for m in re.finditer(r'edge: \{ sourcename: "([^"]+)" targetname: "([^"]+)"', text):
        edges.setdefault(m.group(1), set()).add(m.group(2))

bad = [f for f, k in kinds.items() if k.startswith("dynamic")]
status = 0
if bad:
    print("dynamic stack frames (VLA or alloca):", ", ".join(sorted(bad)))
    status = 1

worst = {}


def depth(fn, path):
    """Worst-case stack of fn and the library functions below it."""
    if fn in path:
        raise RecursionError(" -> ".join(path + [fn]))
    if fn in worst:
        return worst[fn]
    best, chain = 0, []
    for callee in edges.get(fn, ()):
        if callee not in frames:
            external.add(callee)
            continue
        d, c = depth(callee, path + [fn])
        if d > best:
            best, chain = d, c
    worst[fn] = (frames.get(fn, 0) + best, [fn] + chain)
    return worst[fn]


# Public: external gk_ functions; gk__ names are internal (hidden, shared between modules).
public = sorted(f for f in frames if f.startswith("gk_") and not f.startswith("gk__") and ":" not in f)
try:
    for f in public:
        depth(f, [])
except RecursionError as e:
    print("recursion in the library:", e)
    sys.exit(1)

if not public:
    print("no public functions found under", root)
    sys.exit(1)
def short(fn):
    return fn.rsplit(":", 1)[-1]


own = max(public, key=lambda f: frames[f])
deep = max(public, key=lambda f: worst[f][0])
print("summary: stack: largest own frame of a public function: %d bytes (%s)" % (frames[own], own))
print("summary: stack: worst case with library callees: %d bytes (%s) %s goal <= %d bytes"
      % (worst[deep][0], " -> ".join(short(f) for f in worst[deep][1]),
         "within" if worst[deep][0] <= goal else "ABOVE", goal))
print("stack: libm/libc callees (frames not included):", ", ".join(sorted(external)) or "none")
print("stack: per public function (own frame / worst case):")
for f in public:
    print("  %-36s %5d %5d" % (f, frames[f], worst[f][0]))
if worst[deep][0] > goal:
    status = 1
sys.exit(status)
