#!/bin/sh
# Regenerates the guide's plots from the library's own output.
#
#   sh docs/plots/make_plots.sh [BUILD_DIR]      (default BUILD_DIR: build)
#
# Needs a configured and built gaskit (BUILD_DIR/libgaskit.a, BUILD_DIR/include), a C compiler
# and gnuplot (Debian: gnuplot-nox). Writes docs/plots/*.png; commit them with the change that
# moved them. Not part of the test run.
set -eu
HERE=$(cd "$(dirname "$0")" && pwd)
ROOT=$(cd "$HERE/../.." && pwd)
BUILD=${1:-build}
case "$BUILD" in /*) ;; *) BUILD="$ROOT/$BUILD" ;; esac
CC=${CC:-cc}
TMP=$(mktemp -d)
trap 'rm -rf "$TMP"' EXIT

[ -f "$BUILD/libgaskit.a" ] || { echo "build gaskit first: cmake -B build && cmake --build build"; exit 1; }
"$CC" -std=c99 -O2 -I "$BUILD/include" -I "$ROOT/include" "$HERE/plotdata.c" "$BUILD/libgaskit.a" -lm \
    -o "$TMP/plotdata"

"$TMP/plotdata" z N2 293.15 1 400 >"$TMP/n2.dat" 2>"$TMP/n2.err"
"$TMP/plotdata" z CO2 313.15 1 200 >"$TMP/co2.dat" 2>"$TMP/co2.err"
"$TMP/plotdata" isotherm CO2 280 >"$TMP/iso.dat"
"$TMP/plotdata" roots CO2 280 50 >"$TMP/roots.dat"

cat >"$TMP/plots.gp" <<EOF
set terminal pngcairo size 900,600 font "DejaVu Sans,12" linewidth 2
set datafile missing "?"
set grid lc rgb "#dddddd" lw 1
set key top left box opaque

set output "$HERE/z_nitrogen.png"
set title "Nitrogen at 20 degC: compressibility factor by model (gaskit)"
set xlabel "absolute pressure, bar"
set ylabel "Z = p Vm / (R T)"
set xrange [0:400]
plot "$TMP/n2.dat" using 1:2 with lines dt 2 lc rgb "black" title "ideal gas", \
     "" using 1:3 with lines lc rgb "#b2182b" title "van der Waals", \
     "" using 1:4 with lines lc rgb "#ef8a62" title "Redlich-Kwong", \
     "" using 1:5 with lines lc rgb "#2166ac" title "Soave-Redlich-Kwong", \
     "" using 1:6 with lines lc rgb "#1b7837" title "Peng-Robinson", \
     "" using 1:7 with lines lw 2 lc rgb "black" title "reference: Span-Wagner (2003)"

set output "$HERE/z_carbon_dioxide.png"
set title "Carbon dioxide at 40 degC (just above Tc = 31 degC): Z by model (gaskit)"
set key bottom left box opaque
set xrange [0:200]
set yrange [0.2:1.05]
plot "$TMP/co2.dat" using 1:2 with lines dt 2 lc rgb "black" title "ideal gas", \
     "" using 1:3 with lines lc rgb "#b2182b" title "van der Waals", \
     "" using 1:4 with lines lc rgb "#ef8a62" title "Redlich-Kwong", \
     "" using 1:5 with lines lc rgb "#2166ac" title "Soave-Redlich-Kwong", \
     "" using 1:6 with lines lc rgb "#1b7837" title "Peng-Robinson", \
     "" using 1:7 with lines lw 2 lc rgb "black" title "reference: Span-Wagner (2003)"

set output "$HERE/vdw_isotherm.png"
set title "Van der Waals isotherm of carbon dioxide at 280 K and its three roots at 50 bar (gaskit)"
set xlabel "molar volume, L/mol"
set ylabel "pressure, bar"
set key top right box opaque
set xrange [0:1.2]
set yrange [0:120]
plot "$TMP/iso.dat" using 1:2 with lines lc rgb "#2166ac" title "p(Vm), van der Waals, 280 K", \
     50 with lines dt 2 lc rgb "#888888" title "p = 50 bar", \
     "$TMP/roots.dat" using 1:2 every ::0::0 with points pt 7 ps 2 lc rgb "#1b7837" title "liquid root (smallest)", \
     "" using 1:2 every ::1::1 with points pt 6 ps 2 lc rgb "#b2182b" title "middle root (unstable, never returned)", \
     "" using 1:2 every ::2::2 with points pt 5 ps 2 lc rgb "#ef8a62" title "gas root (largest)"
EOF
gnuplot "$TMP/plots.gp"
echo "wrote $HERE/z_nitrogen.png $HERE/z_carbon_dioxide.png $HERE/vdw_isotherm.png"
