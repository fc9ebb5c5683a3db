#!/usr/bin/env bash
# Sound static analysis: Frama-C's EVA (Debian frama-c-base) over the drivers in tests/sound/,
# which call the public functions of lib/ with every input of their documented domains at once
# (finite reals over the whole range, every enum value and one past each end, every text up to a
# bounded length). Both precisions (double, float). Alarms that are false, with the argument why,
# are listed in tests/sound/explained.txt (and docs/safety-pipeline.md); any other alarm, and any
# assertion of a driver that EVA cannot prove (a GK_OK result is finite, ...), fails the stage.
# Floating-point policy: IEEE 754 as C99 Annex F; EVA's default -warn-special-float non-finite,
# so every operation that could yield an infinity or a NaN from the finite inputs is an alarm.
# Takes about 2.5 minutes on one core (GASKIT_SOUND_PRECISION, default 2, trades time for fewer
# imprecise alarms; each driver's time is printed). GASKIT_SOUND_DRIVERS="units cubic" runs a
# chosen set.
set -euo pipefail
cd "$(dirname "$0")/../.."
t_start=$SECONDS
precision=${GASKIT_SOUND_PRECISION:-2}
out=build-sound
mkdir -p "$out"
# driver:the lib/ files it needs:extra EVA options. The solvers (cubic) run under the Annex F
# policy (-warn-special-float none: an infinity or NaN inside an iteration is a value that the
# code must catch; the driver asserts that every returned root is finite); the others under the
# strict one (no operation may yield an infinity or NaN from finite inputs).
drivers=(
  "units:units.c:"
  "ideal:ideal.c kinetic.c reference.c:"
  "water:water.c:-eva-subdivide-non-linear 40"
  "cubic:cubic.c:-warn-special-float none"
  "number:number_parse.c:-eva-auto-loop-unroll 64"
  "parse:mixture.c gas.c number_parse.c:-eva-precision 1"
  "refgrade:helmholtz.c hydrogen.c gas.c:-eva-precision 1 -warn-special-float none"
  "state:eos.c eos_vdw.c fluid.c gas.c helmholtz.c hydrogen.c cubic.c mixture.c number_parse.c:-eva-precision 1 -warn-special-float none"
)
status=0
summary=()
for prec in 0 1; do
  gen=$out/p$prec
  mkdir -p "$gen"
  for d in "${drivers[@]}"; do
    name=${d%%:*}
    if [ -n "${GASKIT_SOUND_DRIVERS:-}" ] && ! [[ " $GASKIT_SOUND_DRIVERS " == *" $name "* ]]; then
      continue
    fi
    rest=${d#*:}
    opts=${rest#*:}
    srcs=()
    for f in ${rest%%:*}; do srcs+=("lib/$f"); done
    t0=$SECONDS
    csv=$gen/$name.csv
    frama-c -quiet -cpp-extra-args="-DGK_BUILDING_LIBRARY -DGK_REAL_IS_FLOAT=$prec -Iinclude -Ilib -Itests/sound" \
      "tests/sound/sound_$name.c" "${srcs[@]}" \
      -eva -eva-precision "$precision" -eva-no-show-progress $opts \
      -then -report-csv "$csv" >"$gen/$name.log" 2>&1 || { echo "frama-c failed on $name"; cat "$gen/$name.log"; exit 1; }
    line=$(python3 tests/sound/alarms.py "$csv" tests/sound/explained.txt "$name" "$([ $prec = 1 ] && echo float || echo double)" \
           "$((SECONDS - t0))") || status=1
    echo "$line"
    summary+=("$line")
  done
done
total=$(printf '%s\n' "${summary[@]}" | awk '{u += $3; e += $5} END {print u " unexplained, " e " explained"}')
echo "summary: Frama-C $(frama-c -version | cut -d' ' -f1) EVA (precision $precision unless a driver sets its own; strict non-finite policy, cubic, refgrade and state under Annex F), $((${#summary[@]} / 2)) drivers x 2 precisions: $total alarms in $((SECONDS - t_start)) s"
printf '%s\n' "${summary[@]}" | sed 's/^/summary:   /'
exit $status
