#!/usr/bin/env bash
# libFuzzer targets (clang, ASan+UBSan) from the committed seed corpus fuzz/corpus/<target>/,
# each for GASKIT_FUZZ_SECONDS (default 20) seconds. New inputs go to build-fuzz/corpus/, the
# committed corpus is not changed. A finding leaves build-fuzz/crash-* and fails the stage.
set -euo pipefail
cd "$(dirname "$0")/../.."
secs=${GASKIT_FUZZ_SECONDS:-20}
cmake -B build-fuzz -DCMAKE_C_COMPILER=clang -DGASKIT_FUZZ=ON -DGASKIT_SANITIZE=address,undefined \
      -DGASKIT_TESTS=OFF -DGASKIT_SHARED=OFF -DGASKIT_EXAMPLES=OFF -DGASKIT_WERROR=ON
cmake --build build-fuzz -j2
read -r -a targets <build-fuzz/fuzz/targets.txt
failed=0
for t in "${targets[@]}"; do
  short=${t#fuzz_}
  mkdir -p "build-fuzz/corpus/$short"
  rc=0
  (cd build-fuzz && "./fuzz/$t" -max_total_time="$secs" -print_final_stats=1 \
      "corpus/$short" "../fuzz/corpus/$short") >"build-fuzz/$t.log" 2>&1 || rc=$?
  tail -n 25 "build-fuzz/$t.log"
  runs=$(sed -n 's/^stat::number_of_executed_units: *//p' "build-fuzz/$t.log")
  if [ "$rc" -ne 0 ]; then
    failed=1
    echo "summary: $t: FINDING: $(grep -m1 -E 'gaskit fuzz finding|ERROR: |runtime error' "build-fuzz/$t.log")"
    echo "summary:   input saved as $(grep -m1 -o 'crash-[0-9a-f]*' "build-fuzz/$t.log" || echo '?') in build-fuzz/"
  else
    echo "summary: $t: $runs executions in $secs s, 0 findings"
  fi
done
exit $failed
