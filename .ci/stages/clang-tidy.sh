#!/usr/bin/env bash
# clang-tidy with the committed .clang-tidy over lib/*.c; any finding is an error.
# The compile database comes from a clang configure (no build needed).
set -euo pipefail
cd "$(dirname "$0")/../.."
cmake -B build-tidy -DCMAKE_C_COMPILER=clang -DCMAKE_EXPORT_COMPILE_COMMANDS=ON \
      -DGASKIT_TESTS=OFF -DGASKIT_EXAMPLES=OFF >/dev/null
clang-tidy -p build-tidy --quiet --warnings-as-errors='*' lib/*.c
echo "summary: clang-tidy $(clang-tidy --version | sed -n 's/.*version \([0-9.]*\).*/\1/p' | head -1): $(ls lib/*.c | wc -l) files, 0 findings"
