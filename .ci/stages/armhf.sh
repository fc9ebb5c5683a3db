#!/usr/bin/env bash
# Double-precision library and the test suite for 32-bit ARM Linux (armhf), run under qemu-arm:
# the same reference checks pass on a 32-bit target.
set -euo pipefail
cd "$(dirname "$0")/../.."
cmake -B build-armhf -DCMAKE_TOOLCHAIN_FILE="$PWD/cmake/arm-linux-gnueabihf.cmake" -DGASKIT_WERROR=ON \
      -DGASKIT_EXAMPLES=OFF
cmake --build build-armhf -j2
arm-linux-gnueabihf-readelf -h build-armhf/tests/test_version | grep -E "Class|Machine"
# The CMocka suites (test_*) run under qemu-arm through CMAKE_CROSSCOMPILING_EMULATOR. The gkq
# command-line tests start the binary from a shell script, which would need binfmt_misc
# (not available in containers), so they are left to the native stages.
ctest --test-dir build-armhf --output-on-failure -R '^test_' | tee build-armhf/ctest.txt
echo "summary: armhf under qemu-arm: $(grep -E 'tests passed' build-armhf/ctest.txt)"

# The same sweep as the float stage, double on armhf against double on the host.
[ -f build/libgaskit.a ] || { cmake -B build -DGASKIT_WERROR=ON && cmake --build build -j2 --target gaskit_static; }
gcc -std=c99 -O2 -Ibuild/include -Iinclude bindings-examples/firmware/float_accuracy.c \
    build/libgaskit.a -lm -o build/float_accuracy
build/float_accuracy >build/float_accuracy.txt
arm-linux-gnueabihf-gcc -std=c99 -O2 -Ibuild-armhf/include -Iinclude \
    bindings-examples/firmware/float_accuracy.c build-armhf/libgaskit.a -lm -o build-armhf/float_accuracy
qemu-arm build-armhf/float_accuracy >build-armhf/float_accuracy.txt
python3 bindings-examples/firmware/float_accuracy.py build/float_accuracy.txt build-armhf/float_accuracy.txt \
  | tee build-armhf/compare.md
echo "summary: armhf vs x86-64 (double, same sweep): $(sed -n 's/^overall: //p' build-armhf/compare.md)"
