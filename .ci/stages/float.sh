#!/usr/bin/env bash
# Single-precision build (gk_real = float) and the whole test suite, gcc, warnings as errors.
set -euo pipefail
cd "$(dirname "$0")/../.."
cmake -B build-f -DGASKIT_SINGLE_PRECISION=ON -DGASKIT_WERROR=ON
cmake --build build-f -j2
ctest --test-dir build-f --output-on-failure

# Float accuracy: the main functions over a sweep of typical states, float build against double
# build (bindings-examples/firmware/float_accuracy.c; the table is in docs/embedding.md).
[ -f build/libgaskit.a ] || { cmake -B build -DGASKIT_WERROR=ON && cmake --build build -j2 --target gaskit_static; }
for b in build build-f; do
  gcc -std=c99 -O2 -I"$b/include" -Iinclude bindings-examples/firmware/float_accuracy.c \
      "$b/libgaskit.a" -lm -o "$b/float_accuracy"
  "$b/float_accuracy" >"$b/float_accuracy.txt"
done
python3 bindings-examples/firmware/float_accuracy.py build/float_accuracy.txt build-f/float_accuracy.txt \
  | tee build-f/float_accuracy.md
worst=$(awk -F'|' 'NR > 2 && $4 !~ /^ *- *$/ {gsub(/ /, "", $4); print $4, $2}' build-f/float_accuracy.md \
        | sort -g | tail -n 1)
differs=$(awk -F'|' 'NR > 2 {s += $6} END {print s + 0}' build-f/float_accuracy.md)
echo "summary: float vs double over $(wc -l <build/float_accuracy.txt) results: largest relative difference $worst; status differs in $differs cases (table: build-f/float_accuracy.md)"
