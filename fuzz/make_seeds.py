#!/usr/bin/env python3
"""Writes the seed corpus of the fuzz targets (fuzz/corpus/<target>/).

Text seeds are typical inputs; numeric seeds encode plausible readings (an invented bench:
a 20 MPa cylinder, a 5 bar line, room conditions) as raw little-endian doubles in the layout
fuzz_numeric.c reads (family byte, enum/gas bytes, then 8-byte reals), plus the special
values NaN, +-Inf, -0, a subnormal and the largest double. Run from the fuzz/ folder.
Inputs that once found a defect are kept beside them as corpus/<target>/regress-* (written by
libFuzzer, not by this script), so CI replays them on every run.
"""
import os
import struct

HERE = os.path.dirname(os.path.abspath(__file__))


def write(target, name, data):
    d = os.path.join(HERE, "corpus", target)
    os.makedirs(d, exist_ok=True)
    if isinstance(data, str):
        data = data.encode("utf-8")
    with open(os.path.join(d, name), "wb") as f:
        f.write(data)


UNITS = ["kPa", "MPa", "bar", "mbar", "hPa", "atm", "at", "Torr", "mmHg", "inHg", "psi", "K",
         "degC", "\u00b0C", "degF", "\u00b0F", "degR", "m3", "L", "mL", "ft3", "gal", "mol",
         "kmol", "lbmol", "g/mol", "kg/m3", "g/L", "m/s", "km/h", "kg", "g", "lb", "m3/h",
         "L/min", "mL/min", "kg/h", "Pa", "", " kPa", "kPa ", "KPA", "\u00b0", "deg"]
GASES = ["CO2", "carbon dioxide", "N2", "nitrogen", "O2", "Ar", "He", "H2", "CH4", "methane",
         "H2O", "NH3", "air", "", "co2", "C", "CO", "N", "carbon"]
MIXES = ["N2=0.7808, O2=0.2095, Ar=0.0097", "CO2=5%, N2=balance", "CO=50ppm, air=balance",
         "CH4=0.9,C2H6=0.05,N2=balance", "N2=1", "N2=0.5, O2=0.5", "O2=21%, N2=79%",
         "He=balance, O2=balance", "N2=0.5", "=0.5", "N2=", "N2=1e-3, Ar=balance",
         "N2=0.1,N2=0.9", "CO2=100%", "Ar=-0.1, N2=balance", "N2=1.5"]

for i, u in enumerate(UNITS):
    write("unit_parse", "u%02d" % i, u)
for i, g in enumerate(GASES):
    write("gas_find", "g%02d" % i, g)
for i, m in enumerate(MIXES):
    write("mixture_parse", "m%02d" % i, m)


def reals(*xs):
    return b"".join(struct.pack("<d", x) for x in xs)


nan, inf = float("nan"), float("inf")
SPECIAL = [nan, inf, -inf, -0.0, 5e-324, 1.7976931348623157e308]
# family byte, then the bytes each family reads before its reals (see fuzz_numeric.c)
seeds = [
    bytes([0, 2, 12]) + reals(250.0, 101325.0),            # units: kPa -> degC ...
    bytes([1]) + reals(101325.0, 273.15, 0.0224, 1.0, 0.028, 1.2, 2e5, 0.01, 300.0, 1.0),
    bytes([2]) + reals(288.15, 0.0289644, 0.032, 101325.0, 1.4),
    bytes([3]) + reals(0.1370, 3.87e-5, 1.0, 1e-3, 300.0, 2e6) + bytes([0]),
    bytes([4, 4, 0, 0]) + reals(2e7, 293.15, 1e-4),
    bytes([4, 3, 2, 5]) + reals(5e5, 250.0, 5e-5),
    bytes([5, 4, 0, 2, 0]) + reals(0.7) + bytes([1]) + reals(0.3) + bytes([0, 0]) + reals(*([0.0] * 16)) + reals(5e6, 300.0),
    bytes([6]) + reals(298.15, 101325.0, 0.5),
    bytes([7, 1, 4, 0]) + reals(2e7, 293.15, 101325.0, 288.15, 0.95, 1.0, 1e-3),
    bytes([8]) + reals(0.028) + bytes([4]) + reals(101325.0, 273.15, 2e5, 300.0, 5e6, 250.0, 1e3, 500.0),
]
for fam in range(9):
    seeds.append(bytes([fam, 1, 1, 1]) + reals(*(SPECIAL * 3)))
for i, s in enumerate(seeds):
    write("numeric", "n%02d" % i, s)
