"""Loading: build flags, float-build detection, version and library errors."""
import os
import subprocess
import sys

import numpy as np
import pytest

import gaskit
from gaskit import _native

HERE = os.path.dirname(os.path.dirname(os.path.abspath(__file__)))


def test_build_info_matches_flags():
    info = gaskit.build_info()
    lib = gaskit.load().lib
    assert info.float_build == bool(lib.gk_build_flags() & _native.GK_BUILD_FLOAT)
    assert info.version == lib.gk_version().decode()
    assert info.version.split(".")[0] == str(_native.EXPECTED_MAJOR)
    r = gaskit.arrays.z("N2", [1e5], [300.0])
    assert r.value.dtype == (np.float32 if info.float_build else np.float64)


def _run(env_lib, code):
    env = dict(os.environ, GASKIT_LIBRARY=env_lib, PYTHONPATH=HERE)
    return subprocess.run([sys.executable, "-c", code], env=env, capture_output=True, text=True)


def test_missing_library_is_a_clear_error():
    r = _run("/nonexistent/libgaskit.so", "import gaskit; gaskit.density('N2', 1e5, 300)")
    assert r.returncode != 0
    assert "LibraryError" in r.stderr and "libgaskit not found" in r.stderr


def test_a_library_that_is_not_gaskit():
    import ctypes.util
    libm = ctypes.util.find_library("m")
    if not libm:
        pytest.skip("no libm to try")
    r = _run(libm, "import gaskit; gaskit.build_info()")
    assert r.returncode != 0 and "is not libgaskit" in r.stderr


def test_version_check(monkeypatch):
    lib = gaskit.load()
    for other in ("1.0.0", "0.1.0", "0.3.0"):  # 0.x: exactly the minor version (ABI)
        monkeypatch.setattr(lib, "version", other)
        with pytest.raises(gaskit.LibraryError, match="needs libgaskit 0.2"):
            lib._check_version([])
    monkeypatch.setattr(lib, "version", "0.2.1")
    lib._check_version([])  # a patch release fits
    monkeypatch.setattr(lib, "version", "0.2.0")
    monkeypatch.setattr(lib, "flags", 0x80)
    with pytest.raises(gaskit.LibraryError, match="build flags"):
        lib._check_version([])
    monkeypatch.setattr(lib, "flags", 0)
    with pytest.raises(gaskit.LibraryError, match="lacks gk_fluid_z_batch"):
        lib._check_version(["gk_fluid_z_batch"])


FLOAT_LIB = os.environ.get("GASKIT_FLOAT_LIBRARY")


@pytest.mark.skipif(not FLOAT_LIB, reason="GASKIT_FLOAT_LIBRARY (a float build) not given")
def test_float_build_detected():
    code = ("import gaskit, numpy as np\n"
            "i = gaskit.build_info(); assert i.float_build and i.dtype == 'float32', i\n"
            "r = gaskit.arrays.density('N2', np.array([2e7]), np.array([293.15]))\n"
            "assert r.value.dtype == np.float32\n"
            "print(repr(float(r.value[0])))\n")
    r = _run(FLOAT_LIB, code)
    assert r.returncode == 0, r.stderr
    single = float(r.stdout.strip())
    double = gaskit.density("N2", 2e7, 293.15)
    assert single == pytest.approx(double, rel=2e-5)
