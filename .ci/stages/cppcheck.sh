#!/usr/bin/env bash
# cppcheck over lib/ (both precisions); any finding fails. Suppressions, each with its reason:
#  - missingIncludeSystem: cppcheck is not given the system headers (it needs no libc model).
#  - unusedFunction is not enabled: lib/ is a library, its public functions have no callers here.
set -euo pipefail
cd "$(dirname "$0")/../.."
for prec in 0 1; do
  gen=build-cppcheck/p$prec
  mkdir -p "$gen/gaskit"
  sed "s/@GK_REAL_IS_FLOAT@/$prec/" include/gaskit/config.h.in >"$gen/gaskit/config.h"
  cppcheck --std=c99 --language=c --enable=warning,style,performance,portability \
    --error-exitcode=1 --inline-suppr --quiet \
    --suppress=missingIncludeSystem \
    -DGK_BUILDING_LIBRARY -Iinclude -I"$gen" -Ilib lib/
done
echo "summary: cppcheck $(cppcheck --version | cut -d' ' -f2): $(ls lib/*.c | wc -l) files x 2 precisions, 0 findings"
