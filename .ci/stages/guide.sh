#!/usr/bin/env bash
# The gkq outputs pasted in docs/guide.md must be what gkq prints: each "$ gkq ..." line of the
# guide is run again (double build) and compared with the text below it. A changed output fails
# until the guide is regenerated with: sh tools/tests/regen_guide.sh build/tools/gkq
set -euo pipefail
cd "$(dirname "$0")/../.."
[ -f build/CMakeCache.txt ] || cmake -B build -DGASKIT_WERROR=ON
cmake --build build -j2 --target gkq
out=$(sh tools/tests/regen_guide.sh --check build/tools/gkq)
echo "summary: $out"
