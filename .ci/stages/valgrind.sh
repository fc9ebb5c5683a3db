#!/usr/bin/env bash
# Every test executable of the stage-1 build (build/) under valgrind memcheck: any error or
# leak fails. Builds build/ first if it is missing (stand-alone run).
set -euo pipefail
cd "$(dirname "$0")/../.."
[ -f build/CMakeCache.txt ] || cmake -B build -DGASKIT_WERROR=ON
cmake --build build -j2
n=0
for t in build/tests/test_*; do
  [ -x "$t" ] && [ -f "$t" ] || continue
  valgrind --quiet --error-exitcode=99 --leak-check=full --errors-for-leak-kinds=all \
           --track-origins=yes "$t"
  n=$((n + 1))
done
echo "summary: valgrind memcheck: $n test programs, 0 errors, 0 leaks"
