#!/usr/bin/env bash
# Installs gaskit into a scratch prefix and builds consumers against it three ways:
# find_package(gaskit) with the shared and the static target, and pkg-config (relocated prefix).
set -euo pipefail
cd "$(dirname "$0")/../.."
[ -f build/CMakeCache.txt ] || cmake -B build -DGASKIT_WERROR=ON
cmake --build build -j2
prefix=$(mktemp -d)
trap 'rm -rf "$prefix"' EXIT
cmake --install build --prefix "$prefix/usr"
cmake -S tests/install -B build-install -DCMAKE_PREFIX_PATH="$prefix/usr"
cmake --build build-install
LD_LIBRARY_PATH="$prefix/usr/lib" build-install/consumer
build-install/consumer_static
export PKG_CONFIG_PATH="$prefix/usr/lib/pkgconfig"
# shellcheck disable=SC2046
gcc -std=c99 tests/install/consumer.c $(pkg-config --cflags --libs gaskit) -o build-install/consumer_pc
LD_LIBRARY_PATH="$prefix/usr/lib" build-install/consumer_pc
echo "summary: install: headers, libgaskit.a, libgaskit.so.0, gaskit.pc and the CMake package work from $(basename "$prefix")/usr: find_package (shared, static) and pkg-config consumers pass"
