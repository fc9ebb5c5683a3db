#!/usr/bin/env bash
# MISRA C:2012 (with Amendments 1 and 2, as cppcheck 2.10's misra addon checks it) over lib/ in
# both precisions. Any finding that the deviation record does not cover fails the stage. The
# record is docs/misra-deviations.md; the permits it grants are read from the machine-readable
# .ci/misra/deviations.txt (check.py fails if the two disagree). Rule categories come from
# .ci/misra/rule-categories.txt (rule numbers, categories and gaskit's own one-line summaries;
# the guidelines' text is not reproduced). Takes about 30 s on one core.
set -euo pipefail
cd "$(dirname "$0")/../.."
t0=$SECONDS
out=build-misra
mkdir -p "$out"
files=()
for prec in 0 1; do
  cppcheck --std=c99 --language=c --addon=.ci/misra/misra.json --quiet \
    --suppress=missingIncludeSystem \
    --template='{file}:{line}:{column}: {id} {message}' \
    -DGK_BUILDING_LIBRARY -DGK_REAL_IS_FLOAT="$prec" -Iinclude -Ilib lib/ 2>"$out/findings-p$prec.txt"
  files+=("$out/findings-p$prec.txt")
done
python3 .ci/misra/check.py .ci/misra/rule-categories.txt .ci/misra/deviations.txt \
  docs/misra-deviations.md "$((SECONDS - t0))" "${files[@]}"
