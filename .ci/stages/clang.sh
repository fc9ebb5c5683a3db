#!/usr/bin/env bash
# clang, single precision, -std=c99 and the full warning set as errors (the ASan stage is the
# clang double build), then the test suite.
set -euo pipefail
cd "$(dirname "$0")/../.."
cmake -B build-clang-f -DCMAKE_C_COMPILER=clang -DGASKIT_SINGLE_PRECISION=ON -DGASKIT_WERROR=ON
cmake --build build-clang-f -j2
ctest --test-dir build-clang-f --output-on-failure
