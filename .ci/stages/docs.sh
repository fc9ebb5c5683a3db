#!/usr/bin/env bash
# Doxygen HTML of the public API and the guide pages; Doxyfile.in sets WARN_AS_ERROR, so any
# warning fails the stage. Also runs the README's main-job command (the demo).
set -euo pipefail
cd "$(dirname "$0")/../.."
[ -f build/CMakeCache.txt ] || cmake -B build -DGASKIT_WERROR=ON
cmake --build build --target docs
pages=$(find build/docs/html -name '*.html' | wc -l)
echo "summary: doxygen $(doxygen --version): $pages HTML pages, 0 warnings"
cmake --build build --target demo > build/demo.txt
grep -q 'All calculations completed' build/demo.txt
echo "summary: demo: $(wc -l < build/demo.txt) report lines, every step completed"
