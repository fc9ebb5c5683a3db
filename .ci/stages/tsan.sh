#!/usr/bin/env bash
# tests/test_threads.c under ThreadSanitizer (clang): threads call the solvers concurrently.
set -euo pipefail
cd "$(dirname "$0")/../.."
cmake -B build-tsan -DCMAKE_C_COMPILER=clang -DGASKIT_SANITIZE=thread -DGASKIT_SHARED=OFF \
      -DGASKIT_EXAMPLES=OFF -DGASKIT_WERROR=ON
cmake --build build-tsan -j2 --target test_threads
# Some kernels randomise mmap more than clang 14's TSan accepts; setarch -R turns ASLR off.
run=(); setarch "$(uname -m)" -R true 2>/dev/null && run=(setarch "$(uname -m)" -R)
TSAN_OPTIONS=halt_on_error=1 "${run[@]}" build-tsan/tests/test_threads
echo "summary: ThreadSanitizer: test_threads clean"
