#!/usr/bin/env bash
# The test suite under AddressSanitizer + UndefinedBehaviorSanitizer (clang, double, warnings as
# errors: this is also the clang double-precision warning check). Any report aborts the test.
set -euo pipefail
cd "$(dirname "$0")/../.."
cmake -B build-asan -DCMAKE_C_COMPILER=clang -DGASKIT_SANITIZE=address,undefined -DGASKIT_WERROR=ON \
      -DCMAKE_BUILD_TYPE=Debug -DGASKIT_EXAMPLES=OFF
cmake --build build-asan -j2
ASAN_OPTIONS=detect_leaks=1:abort_on_error=1:strict_string_checks=1 \
UBSAN_OPTIONS=print_stacktrace=1:halt_on_error=1 \
  ctest --test-dir build-asan --output-on-failure
