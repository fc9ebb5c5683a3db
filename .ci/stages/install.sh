#!/usr/bin/env bash
# Packaging and the default configuration:
# 1. the library compiles without CMake (no generated header): `cc -std=c99 -Iinclude -c` over
#    lib/*.c, double and with -DGK_REAL_IS_FLOAT=1, warning-free with the project's warning set;
# 2. gaskit installed into a scratch prefix: consumers through find_package(gaskit) (shared and
#    static targets) and pkg-config (relocated prefix); the exported targets name libm `m`, never
#    an absolute path; the installed config.h carries the built precision;
# 3. add_subdirectory(gaskit) in a consumer project (double and float) builds the static library
#    only: no shared library, tool, tests, examples, benchmark or fuzz targets.
set -euo pipefail
cd "$(dirname "$0")/../.."
warn=(-Wall -Wextra -Wpedantic -Wconversion -Wsign-conversion -Wshadow -Wdouble-promotion
      -Wstrict-prototypes -Wmissing-prototypes -Wcast-qual -Wfloat-equal -Werror)
scratch=$(mktemp -d)
trap 'rm -rf "$scratch"' EXIT

# 1. Without CMake (cc, and clang when installed).
nsrc=$(ls lib/*.c | wc -l)
compilers=(cc)
if command -v clang >/dev/null; then compilers+=(clang); fi
for compiler in "${compilers[@]}"; do
  for variant in "" "-DGK_REAL_IS_FLOAT=1"; do
    mkdir -p "$scratch/obj"
    # shellcheck disable=SC2086
    (cd "$scratch/obj" && $compiler -std=c99 "${warn[@]}" $variant -I"$OLDPWD/include" -c "$OLDPWD"/lib/*.c)
    rm -rf "$scratch/obj"
  done
done
echo "summary: install: <compiler> -std=c99 -Iinclude -c lib/*.c ($nsrc files) compiles warning-free without CMake with ${compilers[*]}, double and -DGK_REAL_IS_FLOAT=1"

# 2. Installed package.
[ -f build/CMakeCache.txt ] || cmake -B build -DGASKIT_WERROR=ON
cmake --build build -j2
prefix="$scratch/usr"
cmake --install build --prefix "$prefix"
targets=$(ls "$prefix"/lib/cmake/gaskit/gaskitTargets*.cmake)
if grep -nE '(/|\\)lib(m|mvec)[.0-9]*\.(so|a|dylib)' $targets; then
  echo "install: the exported CMake targets name libm by an absolute path (not relocatable)"; exit 1
fi
grep -q 'LINK_ONLY:m>' $targets || { echo "install: gaskit_static does not pass libm on to its consumers"; exit 1; }
built_float=$(grep -c '^#  define GK_REAL_IS_FLOAT 1' "$prefix/include/gaskit/config.h" || true)
[ "$built_float" = "$(grep -c 'GASKIT_SINGLE_PRECISION:BOOL=ON' build/CMakeCache.txt || true)" ] || {
  echo "install: the installed config.h does not carry the precision of the build"; exit 1; }
cmake -S tests/install -B build-install -DCMAKE_PREFIX_PATH="$prefix"
cmake --build build-install
LD_LIBRARY_PATH="$prefix/lib" build-install/consumer
build-install/consumer_static
export PKG_CONFIG_PATH="$prefix/lib/pkgconfig"
# shellcheck disable=SC2046
gcc -std=c99 tests/install/consumer.c $(pkg-config --cflags --libs gaskit) -o build-install/consumer_pc
LD_LIBRARY_PATH="$prefix/lib" build-install/consumer_pc
echo "summary: install: headers, libgaskit.a, libgaskit.so.0, gaskit.pc and the CMake package work from a scratch prefix: find_package (shared, static) and pkg-config consumers pass; libm exported by name"

# 2b. A static-only package (GASKIT_SHARED=OFF): gaskit::gaskit and gaskit::gaskit_static both exist.
cmake -B build-install-lib-static -DGASKIT_SHARED=OFF -DGASKIT_TESTS=OFF -DGASKIT_EXAMPLES=OFF \
      -DGASKIT_TOOLS=OFF -DGASKIT_WERROR=ON >/dev/null
cmake --build build-install-lib-static -j2
cmake --install build-install-lib-static --prefix "$scratch/static"
[ ! -e "$scratch/static/lib/libgaskit.so" ] || { echo "install: GASKIT_SHARED=OFF installed a shared library"; exit 1; }
rm -rf build-install-static
cmake -S tests/install -B build-install-static -DCMAKE_PREFIX_PATH="$scratch/static" >/dev/null
cmake --build build-install-static
build-install-static/consumer
build-install-static/consumer_static
echo "summary: install: a static-only package (GASKIT_SHARED=OFF) gives gaskit::gaskit and gaskit::gaskit_static; both consumers pass"

# 3. add_subdirectory.
for precision in OFF ON; do
  sub=build-install-sub-$precision
  rm -rf "$sub"
  cmake -S tests/install/subproject -B "$sub" -DGASKIT_SINGLE_PRECISION=$precision -DGASKIT_WERROR=ON >/dev/null
  cmake --build "$sub" -j2
  "$sub/consumer_sub"
  extra=$(find "$sub" -type f \( -name 'libgaskit.so*' -o -name gkq -o -name 'test_*' -o -name 'bench_*' \
                 -o -name 'fuzz_*' -o -name demo -o -name 'example*' \) -perm -u+x -print)
  extra="$extra$(find "$sub" -name 'libgaskit.so*' -print)"
  if [ -n "$extra" ]; then
    echo "install: add_subdirectory(gaskit) built more than the static library:"; echo "$extra"; exit 1
  fi
  [ -f "$sub/gaskit/libgaskit.a" ] || { echo "install: add_subdirectory(gaskit) built no libgaskit.a"; exit 1; }
done
echo "summary: install: add_subdirectory(gaskit) builds libgaskit.a only (double and float) and its consumer passes"
