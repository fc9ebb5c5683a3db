#!/usr/bin/env bash
# clang, single precision, -std=c99 and the full warning set as errors (the ASan stage is the
# clang double build), then the test suite; then the same with the reference-grade models left
# out (GASKIT_REFERENCE_MODELS=OFF, the configuration a firmware without them uses). About 30 s.
set -euo pipefail
cd "$(dirname "$0")/../.."
cmake -B build-clang-f -DCMAKE_C_COMPILER=clang -DGASKIT_SINGLE_PRECISION=ON -DGASKIT_WERROR=ON
cmake --build build-clang-f -j2
ctest --test-dir build-clang-f --output-on-failure
cmake -B build-clang-nomodels -DCMAKE_C_COMPILER=clang -DGASKIT_SINGLE_PRECISION=ON \
      -DGASKIT_REFERENCE_MODELS=OFF -DGASKIT_WERROR=ON
cmake --build build-clang-nomodels -j2
ctest --test-dir build-clang-nomodels --output-on-failure
echo "summary: clang $(clang --version | sed -n 's/.*version \([0-9.]*\).*/\1/p' | head -1): float build, and float without the reference-grade models, every test passed"
