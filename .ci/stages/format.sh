#!/usr/bin/env bash
# One formatter: clang-format 14 with the committed .clang-format must leave lib/, include/ and
# tools/ unchanged (data tables sit between "clang-format off/on" markers). Braces on every
# if/for/while body (MISRA C:2012 rule 15.6) are checked by clang-tidy's
# readability-braces-around-statements in the clang-tidy stage. Takes a few seconds.
set -euo pipefail
cd "$(dirname "$0")/../.."
shopt -s nullglob
files=(lib/*.c lib/*.h include/gaskit/*.h tools/*.c tools/*.h)
clang-format --dry-run --Werror "${files[@]}"
echo "summary: clang-format $(clang-format --version | sed -n 's/.*version \([0-9.]*\).*/\1/p'): ${#files[@]} files, no change"
