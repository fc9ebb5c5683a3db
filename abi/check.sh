#!/usr/bin/env bash
# ABI check of libgaskit.so against the committed baseline abi/libgaskit.abi (libabigail).
#   abi/check.sh [build-dir]            compare (default build dir: build)
#   abi/check.sh --update [build-dir]   write a new baseline (only with a deliberate ABI change
#                                       or a new release: see docs/embedding.md, "Versioning")
# Fails on libabigail errors, on a change abidiff calls incompatible (a removed symbol), and on
# any removed or changed function or variable (a changed struct layout or enum shows up as a
# changed function; abidiff itself only calls that "possibly incompatible", exit bit 4).
# Added functions pass (a compatible minor release). Needs a -g build (the default
# RelWithDebInfo) of the double, shared library.
set -euo pipefail
cd "$(dirname "$0")/.."
update=0
if [ "${1:-}" = "--update" ]; then update=1; shift; fi
build=${1:-build}
so=$(readlink -f "$build/libgaskit.so")
baseline=abi/libgaskit.abi
current=$build/libgaskit.abi

grep -q 'GK_REAL_IS_FLOAT 0' "$build/include/gaskit/config.h" || {
  echo "abi/check.sh: $build is a float build; the baseline is of the double build"; exit 1; }
# Only the types reachable from the public headers count (private types dropped).
headers=$(mktemp -d)
trap 'rm -rf "$headers"' EXIT
mkdir -p "$headers/gaskit"
# the generated config.h of the build replaces the committed default configuration
cp include/gaskit/*.h "$headers/gaskit/"
cp "$build/include/gaskit/config.h" "$headers/gaskit/"
abidw --no-corpus-path --no-comp-dir-path --short-locs --drop-private-types \
      --headers-dir "$headers/gaskit" --out-file "$current" "$so"

if [ "$update" = 1 ]; then
  cp "$current" "$baseline"
  echo "abi/check.sh: baseline written: $baseline ($(grep -c '<elf-symbol ' "$baseline") symbols)"
  exit 0
fi
if [ ! -f "$baseline" ]; then
  echo "abi/check.sh: no baseline $baseline yet: nothing to compare (run abi/check.sh --update)"
  exit 0
fi
set +e
abidiff "$baseline" "$current" >"$build/abidiff.txt"
rc=$?
set -e
cat "$build/abidiff.txt"
if [ $((rc & 3)) -ne 0 ]; then echo "abidiff failed to run (exit $rc)"; exit 1; fi
if [ $((rc & 8)) -ne 0 ]; then echo "INCOMPATIBLE ABI change against $baseline"; exit 1; fi
# "Functions changes summary: 0 Removed, 1 Changed (2 filtered out), 3 Added functions"
bad=$( { grep -E 'changes summary:' "$build/abidiff.txt" || true; } \
      | { grep -Eo '[0-9]+ (Removed|Changed)' || true; } | awk '{s += $1} END {print s + 0}')
if [ "$bad" -ne 0 ]; then
  echo "INCOMPATIBLE ABI change against $baseline: $bad removed or changed functions/variables"
  exit 1
fi
added=$( { grep -E 'changes summary:' "$build/abidiff.txt" || true; } | { grep -Eo '[0-9]+ Added' || true; } | awk '{s += $1} END {print s + 0}')
echo "abi/check.sh: compatible with $baseline ($added added)"
