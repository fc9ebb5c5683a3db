#!/bin/sh
# Instruction counts (valgrind callgrind, load-independent) per state of the Span-Wagner and
# Peng-Robinson paths of bench_models over the same 20000 states of each gas, and their ratio;
# then the hydrogen equation.
# Usage: bench/ir_models.sh BUILD_DIR [GAS ...]
# (build the bench_models target first: cmake --build BUILD_DIR --target bench_models)
set -e
dir=${1:-build}
[ $# -gt 0 ] && shift
gases=${*:-"N2 O2 Ar CH4 C2H6 C3H8 n-C4H10 CO2"}
out=$(mktemp /tmp/gk_ir.XXXXXX)
printf '%-8s %10s %10s %8s\n' gas "SW Ir" "PR Ir" SW/PR
for g in $gases H2; do
  valgrind --tool=callgrind --callgrind-out-file="$out" "$dir/bench/bench_models" --ir "$g" >/dev/null 2>&1
  callgrind_annotate --inclusive=yes "$out" 2>/dev/null |
    awk -v g="$g" '/pass_sw/ { sw = $1 } /pass_pr/ { pr = $1 } /pass_h2/ { h2 = $1 }
         END { gsub(",", "", sw); gsub(",", "", pr); gsub(",", "", h2);
               if (g == "H2") { printf "hydrogen equation: %.1f Ir per state\n", h2 / 20000 }
               else { printf "%-8s %10.1f %10.1f %8.2f\n", g, sw / 20000, pr / 20000, sw / pr } }'
done
rm -f "$out"
