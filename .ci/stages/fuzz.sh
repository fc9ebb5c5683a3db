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
for t in "${targets[@]}"; do
  short=${t#fuzz_}
  mkdir -p "build-fuzz/corpus/$short"
  (cd build-fuzz && "./fuzz/$t" -max_total_time="$secs" -print_final_stats=1 \
      "corpus/$short" "../fuzz/corpus/$short") 2>&1 | tee "build-fuzz/$t.log" | tail -n 25
  runs=$(sed -n 's/^stat::number_of_executed_units: *//p' "build-fuzz/$t.log")
  echo "summary: $t: $runs executions in $secs s, 0 findings"
done
