#!/usr/bin/env bash
# Double-precision library and the test suite for 32-bit ARM Linux (armhf), run under qemu-arm:
# the same reference checks pass on a 32-bit target.
set -euo pipefail
cd "$(dirname "$0")/../.."
cmake -B build-armhf -DCMAKE_TOOLCHAIN_FILE="$PWD/cmake/arm-linux-gnueabihf.cmake" -DGASKIT_WERROR=ON \
      -DGASKIT_EXAMPLES=OFF
cmake --build build-armhf -j2
file build-armhf/tests/test_version
ctest --test-dir build-armhf --output-on-failure | tee build-armhf/ctest.txt
echo "summary: armhf under qemu-arm: $(grep -E 'tests passed' build-armhf/ctest.txt)"
