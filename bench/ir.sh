#!/bin/sh
# Instruction counts (valgrind callgrind, load-independent) of one pass of each path of the
# benchmark over the same 20000 states: gaskit (gk_eos_solve) and the GSL-based path.
# Usage: bench/ir.sh BUILD_DIR [model 0..3, default 3 = Peng-Robinson] [low]
# (build the bench_eos target first: cmake --build BUILD_DIR --target bench_eos; needs valgrind)
set -e
dir=${1:-build}
model=${2:-3}
out=$(mktemp /tmp/gk_ir.XXXXXX)
valgrind --tool=callgrind --callgrind-out-file="$out" "$dir/bench/bench_eos" --ir "$model" $3 >/dev/null 2>&1
callgrind_annotate --inclusive=yes "$out" 2>/dev/null |
  awk '/pass_gaskit/ { gk = $1 } /pass_gsl/ { gs = $1 }
       END { gsub(",", "", gk); gsub(",", "", gs);
             printf "Ir per call: gaskit %.1f  GSL %.1f  ratio %.3f\n", gk / 20000, gs / 20000, gk / gs }'
rm -f "$out"
