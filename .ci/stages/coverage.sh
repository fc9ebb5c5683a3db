#!/usr/bin/env bash
# Line and branch coverage of lib/ by the test suite (gcc --coverage, gcovr). Fails below
# lines 95 % / branches 85 % (GASKIT_COVERAGE_ENFORCE=0 only reports).
set -euo pipefail
cd "$(dirname "$0")/../.."
cmake -B build-cov -DGASKIT_COVERAGE=ON -DGASKIT_SHARED=OFF -DGASKIT_EXAMPLES=OFF -DCMAKE_BUILD_TYPE=Debug
cmake --build build-cov -j2
find build-cov -name '*.gcda' -delete
ctest --test-dir build-cov --output-on-failure
enforce=()
if [ "${GASKIT_COVERAGE_ENFORCE:-1}" = 1 ]; then
  enforce=(--fail-under-line 95 --fail-under-branch 85)
fi
gcovr -r . --filter 'lib/' --exclude-unreachable-branches --exclude-throw-branches \
      --print-summary --txt build-cov/coverage.txt --html-details build-cov/coverage.html \
      "${enforce[@]}" build-cov | tee build-cov/summary.txt
cat build-cov/coverage.txt
lines=$(sed -n 's/^lines: *\([0-9.]*%\).*/\1/p' build-cov/summary.txt)
branches=$(sed -n 's/^branches: *\([0-9.]*%\).*/\1/p' build-cov/summary.txt)
echo "summary: coverage of lib/: lines $lines, branches $branches (goal >= 95 % / >= 85 %); report build-cov/coverage.html"
