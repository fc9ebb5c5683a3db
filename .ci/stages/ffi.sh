#!/usr/bin/env bash
# Foreign callers: Python (the gaskit package's README snippet), C++17, Rust (rustc) and Go (cgo)
# examples against the shared library of the stage-1 build (build/, reconfigured with
# GASKIT_FFI_EXAMPLES=ON: the library is not rebuilt). Then the Python snippet once more against
# the float build (build-f/) to show that gk_build_flags lets it adapt. The package's pytest
# suite and benchmarks are the python stage (.ci/stages/python.sh).
set -euo pipefail
cd "$(dirname "$0")/../.."
[ -d "${HOME:-/nonexistent}/.cargo/bin" ] && export PATH="$PATH:$HOME/.cargo/bin"
cmake -B build -DGASKIT_WERROR=ON -DGASKIT_FFI_EXAMPLES=ON
cmake --build build -j2
ctest --test-dir build --output-on-failure -V -L ffi | tee build/ffi.txt
ran=$(grep -cE 'Test +#[0-9]+: example_[a-z]+ .*Passed' build/ffi.txt || true)
if [ "$ran" -ne 4 ]; then
  echo "expected 4 example tests (python, cpp, rust, go), $ran passed"; exit 1
fi
if [ -f build-f/libgaskit.so ] || { cmake -B build-f -DGASKIT_SINGLE_PRECISION=ON -DGASKIT_WERROR=ON \
     && cmake --build build-f -j2 --target gaskit_shared; }; then
  GASKIT_LIBRARY=build-f/libgaskit.so /usr/bin/python3 bindings-examples/python/examples/quickstart.py
fi
echo "summary: foreign callers: python (gaskit package), C++17, rust, go (cgo) passed; python also against the float build"
