#!/usr/bin/env python3
"""gaskit from Python with ctypes only (no third-party packages).

Shows: loading libgaskit.so, detecting a float build with gk_build_flags, passing the
quantity structs by value, reading results through pointers, the batch call over arrays with
per-element statuses, and turning a status into text. Asserts published values and exits
non-zero on any mismatch.

Usage: python3 gaskit_ctypes.py [path/to/libgaskit.so]   (default: ctypes.util.find_library)
"""
import ctypes
import ctypes.util
import math
import os
import sys

path = sys.argv[1] if len(sys.argv) > 1 else (os.environ.get("GASKIT_LIB")
                                               or ctypes.util.find_library("gaskit"))
if not path:
    sys.exit("libgaskit not found: pass its path")
gk = ctypes.CDLL(path)

# ------------------------------------------------------------------ the build we loaded
GK_BUILD_FLOAT = 0x1
gk.gk_build_flags.restype = ctypes.c_uint
gk.gk_build_flags.argtypes = []
gk.gk_version.restype = ctypes.c_char_p
gk.gk_version.argtypes = []
gk.gk_status_string.restype = ctypes.c_char_p
gk.gk_status_string.argtypes = [ctypes.c_int]

is_float = bool(gk.gk_build_flags() & GK_BUILD_FLOAT)
real = ctypes.c_float if is_float else ctypes.c_double
# Relative tolerance a result can be held to: about 7 digits in float, 9 printed digits in double.
REL = 2e-6 if is_float else 1e-9
print("gaskit %s, gk_real is %s" % (gk.gk_version().decode(), "float" if is_float else "double"))


def quantity(name, field):
    """A one-field quantity struct such as gk_pressure { gk_real pa; }."""
    return type(name, (ctypes.Structure,), {"_fields_": [(field, real)]})


Pressure = quantity("gk_pressure", "pa")
Temperature = quantity("gk_temperature", "k")
MolarVolume = quantity("gk_molar_volume", "m3_per_mol")
MolarMass = quantity("gk_molar_mass", "kg_per_mol")
Density = quantity("gk_density", "kg_per_m3")

GK_OK, GK_ERR_DOMAIN = 0, 2
# gk_status is a C enum: int-sized on the hosted ABIs (x86-64, AArch64, armhf Linux, Windows);
# only bare-metal ARM EABI uses short enums (see docs/embedding.md).
status_t = ctypes.c_int

gk.gk_ideal_molar_volume.restype = status_t
gk.gk_ideal_molar_volume.argtypes = [Pressure, Temperature, ctypes.POINTER(MolarVolume)]
gk.gk_ideal_density.restype = status_t
gk.gk_ideal_density.argtypes = [Pressure, Temperature, MolarMass, ctypes.POINTER(Density)]
gk.gk_ideal_density_batch.restype = ctypes.c_size_t
gk.gk_ideal_density_batch.argtypes = [ctypes.c_size_t, ctypes.POINTER(real), ctypes.POINTER(real),
                                      MolarMass, ctypes.POINTER(real), ctypes.POINTER(status_t)]

failures = 0


def check(what, got, expected, rel):
    global failures
    err = abs(got - expected) / abs(expected)
    ok = err <= rel
    print("%-58s %.10g (published %.10g, rel. error %.1e) %s"
          % (what, got, expected, err, "ok" if ok else "FAILED"))
    if not ok:
        failures += 1


def text(status):
    return gk.gk_status_string(status).decode()


# ------------------------------------------------------------------ structs by value
vm = MolarVolume(-1.0)
s = gk.gk_ideal_molar_volume(Pressure(101325.0), Temperature(273.15), ctypes.byref(vm))
if s != GK_OK:
    sys.exit("gk_ideal_molar_volume: " + text(s))
# CODATA 2018: molar volume of an ideal gas at 273.15 K and 101.325 kPa.
check("ideal molar volume at 273.15 K, 101.325 kPa (m3/mol)", vm.m3_per_mol, 22.41396954e-3, REL)
s = gk.gk_ideal_molar_volume(Pressure(100000.0), Temperature(273.15), ctypes.byref(vm))
# CODATA 2018: the same at 273.15 K and 100 kPa.
check("ideal molar volume at 273.15 K, 100 kPa (m3/mol)", vm.m3_per_mol, 22.71095464e-3, REL)

# An error leaves the output alone and names itself.
vm.m3_per_mol = -1.0
s = gk.gk_ideal_molar_volume(Pressure(101325.0), Temperature(-5.0), ctypes.byref(vm))
print("T = -5 K gives status %d (%s); output untouched: %s" % (s, text(s), vm.m3_per_mol == -1.0))
if s != GK_ERR_DOMAIN or vm.m3_per_mol != -1.0:
    failures += 1

# ------------------------------------------------------------------ batch over arrays
# ISO 2533 sea level (288.15 K, 101325 Pa, M = 28.9644 g/mol): 1.2250 kg/m3. ISO 2533 uses
# R* = 8.31432 J/(mol K), CODATA R differs by about 2e-5, and 1.2250 is rounded: tolerance 1e-4.
n = 4
p = (real * n)(101325.0, 101325.0, 101325.0, 0.0)
t = (real * n)(288.15, 288.15, -1.0, 288.15)
out = (real * n)()
st = (status_t * n)()
ok = gk.gk_ideal_density_batch(n, p, t, MolarMass(0.0289644), out, st)
print("batch: %d of %d elements ok; statuses %s" % (ok, n, [text(x) for x in st]))
check("batch: air density at ISO 2533 sea level (kg/m3)", out[0], 1.2250, 1e-4)
if ok != 2 or st[2] != GK_ERR_DOMAIN or st[3] != GK_ERR_DOMAIN or not math.isnan(out[2]):
    print("batch: failed elements not reported as NaN + GK_ERR_DOMAIN: FAILED")
    failures += 1

# ------------------------------------------------------------------ mass flow
# gk_flow_to_mass (gk_mass_flow is the name of the mass-flow type, not of a function).
class Gas(ctypes.Structure):
    """The leading fields of gk_gas (enough to read the molar mass)."""
    _fields_ = [("name", ctypes.c_char_p), ("formula", ctypes.c_char_p), ("molar_mass", real)]


class Fluid(ctypes.Structure):
    _fields_ = [("gas", ctypes.POINTER(Gas)), ("mixture", ctypes.c_void_p),
                ("kij", ctypes.c_void_p)]


VolumeFlow = quantity("gk_volume_flow", "m3_per_s")
MassFlow = quantity("gk_mass_flow", "kg_per_s")
GK_EOS_IDEAL = 0
gk.gk_gas_find.restype = status_t
gk.gk_gas_find.argtypes = [ctypes.c_char_p, ctypes.POINTER(ctypes.POINTER(Gas))]
gk.gk_flow_to_mass.restype = status_t
gk.gk_flow_to_mass.argtypes = [ctypes.c_int, Fluid, VolumeFlow, Pressure, Temperature,
                               ctypes.POINTER(MassFlow)]
n2 = ctypes.POINTER(Gas)()
if gk.gk_gas_find(b"N2", ctypes.byref(n2)) != GK_OK:
    sys.exit("gk_gas_find(N2) failed")
w1 = MassFlow(-1.0)
args = (GK_EOS_IDEAL, Fluid(n2, None, None), VolumeFlow(1e-3), Pressure(101325.0), Temperature(273.15))
s1 = gk.gk_flow_to_mass(*args, ctypes.byref(w1))
# 1 L/s at 0 degC, 101.325 kPa is 1e-3 / 22.41396954e-3 mol/s (CODATA 2018 molar volume)
check("gk_flow_to_mass: 1 L/s of N2 at 0 degC, 101.325 kPa, ideal (kg/s)", w1.kg_per_s,
      1e-3 / 22.41396954e-3 * n2.contents.molar_mass, REL)
if s1 != GK_OK:
    print("gk_flow_to_mass: status %d: FAILED" % s1)
    failures += 1

if failures:
    print("%d check(s) FAILED" % failures)
    sys.exit(1)
print("all checks passed")
