#!/usr/bin/env bash
# The Python package gaskit (bindings-examples/python) as a user installs it, with Debian's
# interpreter /usr/bin/python3 (python3-numpy, python3-pytest, python3-dask,
# python3-distributed, python3-pandas, python3-setuptools, python3-pip, python3-venv):
#  1. a Release build of the shared library and the batch benchmark (build-python/);
#  2. `pip install --no-build-isolation` of the package into a scratch virtual environment
#     that sees Debian's packages (--system-site-packages), so no package index is needed;
#  3. pytest from outside the source tree (the installed package), against the double and the
#     float build (float-build detection); exit status 5 (no test collected) is a failure;
#  4. the README's Python snippet, taken from bindings-examples/python/README.md;
#  5. the figures: gk_ideal_density_batch against a bare loop, Peng-Robinson and reference-grade
#     mixture densities from C and from Python (10^6), the Python overhead per call, and the Dask example on a
#     small log (1 and 2 worker processes). Figures are printed, never asserted.
set -euo pipefail
cd "$(dirname "$0")/../.."
root=$PWD
py=/usr/bin/python3
out=$root/build-python
rows=${GASKIT_FLEET_ROWS:-1000000}

cmake -B "$out" -DCMAKE_BUILD_TYPE=Release -DGASKIT_TESTS=OFF -DGASKIT_EXAMPLES=OFF
cmake --build "$out" -j2 --target gaskit_shared bench_batch
cmake -B "$out-f" -DCMAKE_BUILD_TYPE=Release -DGASKIT_SINGLE_PRECISION=ON -DGASKIT_TESTS=OFF \
      -DGASKIT_EXAMPLES=OFF
cmake --build "$out-f" -j2 --target gaskit_shared

# 2. install into a scratch environment (Debian's numpy/dask seen through system site packages)
venv=$out/venv
rm -rf "$venv"
"$py" -m venv --system-site-packages "$venv"
# (from a copy: setuptools writes build/ and *.egg-info beside the sources it installs)
rm -rf "$out/pkg-src" && cp -r "$root/bindings-examples/python" "$out/pkg-src"
"$venv/bin/python" -m pip install --quiet --no-build-isolation --no-index --no-deps \
    "$out/pkg-src"
"$venv/bin/python" -c "import gaskit, sys; assert 'site-packages' in gaskit.__file__, gaskit.__file__"

# 3. pytest against the installed package, from a directory outside the source tree
export GASKIT_LIBRARY=$out/libgaskit.so
export GASKIT_FLOAT_LIBRARY=$out-f/libgaskit.so
rm -rf "$out/pytests" && cp -r "$root/bindings-examples/python/tests" "$out/pytests"
run_pytest() {
  local rc=0
  (cd "$out" && "$venv/bin/python" -m pytest -q -p no:cacheprovider pytests "$@") || rc=$?
  if [ "$rc" -eq 5 ]; then echo "pytest collected no test"; return 1; fi
  return "$rc"
}
run_pytest | tee "$out/pytest.txt"
GASKIT_LIBRARY=$GASKIT_FLOAT_LIBRARY run_pytest | tee "$out/pytest-float.txt"

# 4. the README's snippet, as a user would paste it
awk '/^```python$/ { on = 1; next } /^```$/ { if (on) exit } on' \
    "$root/bindings-examples/python/README.md" > "$out/readme_snippet.py"
test -s "$out/readme_snippet.py"
(cd "$out" && "$venv/bin/python" readme_snippet.py)

# 5. figures
"$out/bench/bench_batch" | tee "$out/bench_batch.txt"
"$venv/bin/python" "$root/bindings-examples/python/examples/bench_numpy.py" \
    --c-bench "$out/bench/bench_batch" --models pr,best | tee "$out/bench_numpy.txt"
timeout 300 "$venv/bin/python" "$root/bindings-examples/python/examples/fleet_logs.py" \
    --rows "$rows" --partitions 8 --workers 2 | tee "$out/fleet.txt"

passed=$(grep -Eo '[0-9]+ passed' "$out/pytest.txt" | tail -n 1)
passed_f=$(grep -Eo '[0-9]+ passed' "$out/pytest-float.txt" | tail -n 1)
ratio=$(awk '/^ideal density, +1000000 /{for (i = 1; i <= NF; ++i) if ($i == "(ratio") {print $(i + 1); exit}}' "$out/bench_batch.txt" | tr -d '),')
figure() {  # "Python x ns, C y ns per element" of one model's line of bench_numpy.py
  { grep -m1 "^$1 density" "$out/bench_numpy.txt" || true; } |
    sed -E 's/.*gaskit.arrays ([0-9.]+) ns.*C batch \(bench_batch\) ([0-9.]+) ns.*/Python \1 ns, C \2 ns per element/'
}
pr_py=$(figure Peng-Robinson)
ref_py=$(figure Reference-grade)
w1=$(awk '/^1 worker/ {print $(NF - 4)}' "$out/fleet.txt")
wn=$(awk '/^2 workers/ {print $(NF - 4)}' "$out/fleet.txt")
echo "summary: python: pytest $passed (double), $passed_f (float build); README snippet ran"
echo "summary: python: gk_ideal_density_batch / bare loop at 10^6: $ratio (goal <= 1.5)"
echo "summary: python: 10^6 mixture densities, Peng-Robinson: $pr_py; reference-grade (GK_EOS_BEST): ${ref_py:-not in this library}"
echo "summary: python: Dask fleet log, $rows rows: $w1 rows/s with 1 worker, $wn with 2"
