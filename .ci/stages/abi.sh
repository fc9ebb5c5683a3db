#!/usr/bin/env bash
# Shared library interface: SONAME, exported symbols (only gk_), and abidiff against the
# committed ABI baseline abi/libgaskit.abi. Uses the stage-1 build (build/).
set -euo pipefail
cd "$(dirname "$0")/../.."
[ -f build/CMakeCache.txt ] || cmake -B build -DGASKIT_WERROR=ON
cmake --build build -j2 --target gaskit_shared
major=$(sed -n 's/^#define GK_VERSION_MAJOR \([0-9]*\).*/\1/p' include/gaskit/base.h)
minor=$(sed -n 's/^#define GK_VERSION_MINOR \([0-9]*\).*/\1/p' include/gaskit/base.h)
# libgaskit.so.MAJOR; in the 0.x series, where a minor release may change the ABI, .0.MINOR
expected=libgaskit.so.$major
[ "$major" != 0 ] || expected=libgaskit.so.0.$minor
soname=$(readelf -d build/libgaskit.so | sed -n 's/.*Library soname: \[\(.*\)\]/\1/p')
[ "$soname" = "$expected" ] || { echo "SONAME $soname, expected $expected"; exit 1; }
exports=$(nm -D --defined-only build/libgaskit.so | awk '{print $NF}')
others=$(echo "$exports" | grep -Ev '^gk_[a-z0-9][a-z0-9_]*(@@?GASKIT_[0-9.]+)?$|^GASKIT_[0-9.]+$' || true)
[ -z "$others" ] || { echo "exported symbols outside gk_: $others"; exit 1; }
count=$(echo "$exports" | grep -c '^gk_')
bash abi/check.sh build | tee build/abi-check.txt
verdict=$(tail -n 1 build/abi-check.txt)
echo "summary: SONAME $soname; $count exported symbols, all gk_ (version node GASKIT_0); ${verdict#abi/check.sh: }"
