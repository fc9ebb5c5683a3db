"""Loading libgaskit and declaring the C functions the package calls (private module).

The library is looked for, in this order:

1. the path given to :func:`gaskit.load` before the first call;
2. the environment variable ``GASKIT_LIBRARY`` (a file path);
3. a ``libgaskit.so*`` (``libgaskit.dylib``, ``gaskit.dll``) placed next to this package;
4. the dynamic loader's usual search path (``LD_LIBRARY_PATH``, the ldconfig cache, ...),
   as ``libgaskit.so.0.2`` (the SONAME of 0.2) and through :func:`ctypes.util.find_library`.

After loading, ``gk_version()`` and ``gk_build_flags()`` are checked against what this package
was written for; a mismatch raises :class:`gaskit.LibraryError` naming the file and the reason.
"""

import ctypes
import ctypes.util
import glob
import os
import sys
import threading

# The C library this package was written for, and the build-flag bits it understands. In the
# 0.x series a minor release may change the ABI (the SONAME is libgaskit.so.0.MINOR), so a 0.x
# library must have exactly this minor version; from 1.0 on, the same major and at least this
# minor.
EXPECTED_MAJOR = 0
EXPECTED_MINOR = 2
PACKAGE_VERSION = "0.2.0"
GK_BUILD_FLOAT = 0x1
KNOWN_FLAGS = GK_BUILD_FLOAT

# gk_status values (base.h), in enum order.
STATUS_NAMES = (
    "GK_OK",
    "GK_ERR_ARGUMENT",
    "GK_ERR_DOMAIN",
    "GK_ERR_NO_SOLUTION",
    "GK_ERR_RANGE",
    "GK_ERR_NOT_FOUND",
    "GK_ERR_COMPOSITION",
    "GK_ERR_PARSE",
)

# GK_MIXTURE_MAX of mixture.h.
MIXTURE_MAX = 16

# The C functions every supported library exports (checked after loading).
REQUIRED_SYMBOLS = (
    "gk_version", "gk_build_flags", "gk_status_string", "gk_unit_parse", "gk_convert",
    "gk_gas_find", "gk_gas_count", "gk_gas_at", "gk_mixture_parse", "gk_mixture_molar_mass",
    "gk_reference_get", "gk_eos_solve", "gk_mixture_eos_solve", "gk_water_vapour_pressure",
    "gk_dry_gas_pressure", "gk_ideal_density_batch", "gk_fluid_density_batch",
    "gk_fluid_z_batch", "gk_vessel_contents_batch", "gk_flow_to_reference_batch",
    "gk_flow_to_mass_batch", "gk_dry_gas_pressure_batch",
)


class LibraryError(ImportError):
    """libgaskit was not found, or is not a version or build this package can use."""


class Native:
    """The loaded library with its ctypes declarations (one per process, see :func:`native`)."""

    def __init__(self, path):
        try:
            self.lib = ctypes.CDLL(path)
        except OSError as exc:
            raise LibraryError("cannot load libgaskit from %r: %s" % (path, exc)) from None
        self.path = getattr(self.lib, "_name", path)
        missing = [s for s in REQUIRED_SYMBOLS if not hasattr(self.lib, s)]
        lib = self.lib
        if "gk_version" in missing or "gk_build_flags" in missing:
            raise LibraryError("%s is not libgaskit (no gk_version/gk_build_flags)" % self.path)
        lib.gk_version.restype = ctypes.c_char_p
        lib.gk_version.argtypes = []
        lib.gk_build_flags.restype = ctypes.c_uint
        lib.gk_build_flags.argtypes = []
        self.version = lib.gk_version().decode("ascii")
        self.flags = int(lib.gk_build_flags())
        self._check_version(missing)
        self.is_float = bool(self.flags & GK_BUILD_FLOAT)
        self.real = ctypes.c_float if self.is_float else ctypes.c_double
        self._declare()

    def _check_version(self, missing):
        try:
            major, minor = (int(x) for x in self.version.split(".")[:2])
        except ValueError:
            raise LibraryError("%s reports an unreadable version %r"
                               % (self.path, self.version)) from None
        fits = major == EXPECTED_MAJOR and (minor == EXPECTED_MINOR if major == 0
                                            else minor >= EXPECTED_MINOR)
        if not fits:
            raise LibraryError(
                "%s is libgaskit %s; this package (gaskit %s) needs libgaskit %d.%d: install "
                "the library and the package from the same source tree"
                % (self.path, self.version, PACKAGE_VERSION, EXPECTED_MAJOR, EXPECTED_MINOR))
        if self.flags & ~KNOWN_FLAGS:
            raise LibraryError("%s (libgaskit %s) has build flags 0x%x that this package does "
                               "not know (it knows 0x%x): update the package"
                               % (self.path, self.version, self.flags, KNOWN_FLAGS))
        if missing:
            raise LibraryError("%s (libgaskit %s) lacks %s: build the library from the same "
                               "source tree as this package"
                               % (self.path, self.version, ", ".join(missing)))

    def _declare(self):
        real = self.real
        lib = self.lib
        c_int, c_size, c_char_p = ctypes.c_int, ctypes.c_size_t, ctypes.c_char_p
        preal, pint = ctypes.POINTER(real), ctypes.POINTER(c_int)
        status = c_int  # gk_status: an int-sized enum on every hosted ABI

        class Gas(ctypes.Structure):
            _fields_ = [("name", c_char_p), ("formula", c_char_p), ("molar_mass", real),
                        ("critical_temperature", real), ("critical_pressure", real),
                        ("acentric_factor", real), ("vdw_a", real), ("vdw_b", real),
                        ("heat_capacity_ratio", real), ("collision_diameter", real)]

        class Mixture(ctypes.Structure):
            _fields_ = [("count", c_size), ("gas", ctypes.POINTER(Gas) * MIXTURE_MAX),
                        ("mole_fraction", real * MIXTURE_MAX)]

        class Fluid(ctypes.Structure):
            _fields_ = [("gas", ctypes.POINTER(Gas)), ("mixture", ctypes.POINTER(Mixture)),
                        ("kij", preal)]

        class Reference(ctypes.Structure):
            _fields_ = [("p", real), ("t", real)]

        class EosResult(ctypes.Structure):
            # gk_eos_result; "model" (the model that served) is the last field of libraries
            # with the reference-grade models. The spare tail keeps a later, longer struct
            # from being written past this buffer.
            _fields_ = [("z", real), ("molar_volume", real), ("fugacity_coefficient", real),
                        ("root_count", c_int), ("z_roots", real * 3), ("branch", c_int),
                        ("model", c_int), ("_spare", ctypes.c_double * 4)]

        self.Gas, self.Mixture, self.Fluid = Gas, Mixture, Fluid
        self.Reference, self.EosResult = Reference, EosResult
        pgas = ctypes.POINTER(Gas)

        def fn(name, restype, *argtypes):
            f = getattr(lib, name)
            f.restype = restype
            f.argtypes = list(argtypes)
            return f

        self.status_string = fn("gk_status_string", c_char_p, c_int)
        self.unit_parse = fn("gk_unit_parse", status, c_char_p, pint)
        self.convert = fn("gk_convert", status, real, c_int, c_int, preal)
        self.gas_find = fn("gk_gas_find", status, c_char_p, ctypes.POINTER(pgas))
        self.gas_count = fn("gk_gas_count", c_size)
        self.gas_at = fn("gk_gas_at", pgas, c_size)
        self.mixture_parse = fn("gk_mixture_parse", status, c_char_p, ctypes.POINTER(Mixture))
        self.mixture_molar_mass = fn("gk_mixture_molar_mass", status, ctypes.POINTER(Mixture),
                                     preal)
        self.reference_get = fn("gk_reference_get", status, c_int, ctypes.POINTER(Reference))
        self.eos_solve = fn("gk_eos_solve", status, c_int, pgas, real, real, c_int,
                            ctypes.POINTER(EosResult))
        self.mixture_eos_solve = fn("gk_mixture_eos_solve", status, c_int,
                                    ctypes.POINTER(Mixture), preal, real, real, c_int,
                                    ctypes.POINTER(EosResult))
        self.water_vapour_pressure = fn("gk_water_vapour_pressure", status, real, preal)
        self.dry_gas_pressure = fn("gk_dry_gas_pressure", status, real, real, real, preal)
        # Batch calls: arrays are passed as raw addresses (c_void_p) so that numpy arrays go
        # in without a conversion per call.
        vp = ctypes.c_void_p
        self.ideal_density_batch = fn("gk_ideal_density_batch", c_size, c_size, vp, vp, real,
                                      vp, vp)
        self.fluid_density_batch = fn("gk_fluid_density_batch", c_size, c_int, Fluid, c_size, vp,
                                      vp, vp, vp)
        self.fluid_z_batch = fn("gk_fluid_z_batch", c_size, c_int, Fluid, c_size, vp, vp, vp, vp)
        self.vessel_contents_batch = fn("gk_vessel_contents_batch", c_size, c_int, Fluid,
                                        Reference, c_size, vp, vp, vp, vp, vp, vp, vp)
        self.flow_to_reference_batch = fn("gk_flow_to_reference_batch", c_size, c_int, Fluid,
                                          Reference, c_size, vp, vp, vp, vp, vp)
        self.flow_to_mass_batch = fn("gk_flow_to_mass_batch", c_size, c_int, Fluid, c_size, vp,
                                     vp, vp, vp, vp)
        self.dry_gas_pressure_batch = fn("gk_dry_gas_pressure_batch", c_size, c_size, vp, vp, vp,
                                         vp, vp)
        # Optional: models added after 0.1 (reference-grade equations), probed by value.
        self.model_count = None


def _candidates():
    env = os.environ.get("GASKIT_LIBRARY")
    if env:
        yield env
        return
    here = os.path.dirname(os.path.abspath(__file__))
    for pattern in ("libgaskit.so*", "libgaskit*.dylib", "gaskit.dll"):
        for path in sorted(glob.glob(os.path.join(here, pattern))):
            yield path
    if sys.platform == "darwin":
        yield "libgaskit.%d.dylib" % EXPECTED_MAJOR
    elif sys.platform == "win32":
        yield "gaskit.dll"
    else:
        yield "libgaskit.so.%d.%d" % (EXPECTED_MAJOR, EXPECTED_MINOR)  # the SONAME of 0.x
        yield "libgaskit.so.%d" % EXPECTED_MAJOR
    found = ctypes.util.find_library("gaskit")
    if found:
        yield found


_lock = threading.Lock()
_native = None
_explicit_path = None


def load(path=None):
    """Loads libgaskit (from ``path`` if given) and returns the :class:`Native` wrapper.

    Called implicitly by the first computation. Calling it again with another path after the
    library is loaded raises :class:`LibraryError` (one library per process).
    """
    global _native, _explicit_path
    with _lock:
        if _native is not None:
            if path is not None and os.path.realpath(path) != os.path.realpath(_native.path):
                raise LibraryError("libgaskit is already loaded from %s" % _native.path)
            return _native
        if path is not None:
            _explicit_path = path
            _native = Native(path)
            return _native
        errors = []
        for cand in _candidates():
            try:
                _native = Native(cand)
                return _native
            except LibraryError as exc:
                # a library that loads but does not fit is reported at once, not skipped
                if os.path.exists(cand) or "cannot load" not in str(exc):
                    raise
                errors.append(str(exc))
        raise LibraryError(
            "libgaskit not found. Build and install the C library (cmake --install), or set "
            "GASKIT_LIBRARY=/path/to/libgaskit.so, or copy libgaskit.so next to the gaskit "
            "package. Tried: " + "; ".join(errors))


def native():
    """The loaded library (loads it on first use)."""
    n = _native
    return n if n is not None else load()
