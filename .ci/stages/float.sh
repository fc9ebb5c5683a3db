#!/usr/bin/env bash
# Single-precision build (gk_real = float) and the whole test suite, gcc, warnings as errors.
set -euo pipefail
cd "$(dirname "$0")/../.."
cmake -B build-f -DGASKIT_SINGLE_PRECISION=ON -DGASKIT_WERROR=ON
cmake --build build-f -j2
ctest --test-dir build-f --output-on-failure
