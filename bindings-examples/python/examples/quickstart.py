#!/usr/bin/env python3
"""The Python snippet of the README (between the markers), then checks of its results against
published values. Run: GASKIT_LIBRARY=build/libgaskit.so python3 examples/quickstart.py"""
import math
import os
import sys

sys.path.insert(0, os.path.join(os.path.dirname(os.path.abspath(__file__)), ".."))

# --- snippet begin
import numpy as np
import gaskit

# A nitrogen cylinder on the bench of a fictional calibration lab (Peng-Robinson by default;
# "best" is the most accurate model the library has for the gas: Span-Wagner for nitrogen)
rho = gaskit.density("N2", "200bar", "15degC")                     # kg/m3
rho_best = gaskit.density("N2", "200bar", "15degC", model="best")
c = gaskit.contents("N2", "50L", "200bar", "15degC", reference="0C_101325Pa", model="best")
print(f"N2 at 200 bar, 15 degC: {rho:.2f} kg/m3 (Peng-Robinson), {rho_best:.2f} kg/m3 "
      f"(reference-grade); a 50 L cylinder holds {c.mass:.2f} kg = {c.reference_volume:.2f} m3 "
      f"at 0 degC, 101.325 kPa (Z = {c.z:.4f})")

# A log of an invented fuel-gas meter: one C batch call per array, one status per row
fuel = gaskit.fluid("CH4=0.92, C2H6=0.04, N2=0.02, CO2=balance")
p_bar = np.array([31.2, 30.8, -1.0, 29.9])                         # row 2 is a bad reading
t_c = np.array([12.5, 13.1, 13.0, 12.2])
q = gaskit.arrays.flow_to_reference(fuel, 85.0, p_bar, t_c, reference="15C_101325Pa",
                                    flow_unit="m3/h", p_unit="bar", t_unit="degC", unit="m3/h")
print("flow at 15 degC, 101.325 kPa (m3/h):", np.round(q.value, 1), list(q.status_names()))

try:
    gaskit.density("N2", "-5bar", "15degC")
except gaskit.DomainError as e:
    print("rejected:", e.status_name, "argument", e.argument)
# --- snippet end

# Checks (a failure exits non-zero)
VM0 = 22.41396954e-3  # CODATA 2018: ideal-gas molar volume at 273.15 K, 101.325 kPa
float_build = gaskit.build_info().float_build
ideal = gaskit.density("N2", "1atm", "0degC", model="ideal")
assert math.isclose(ideal, gaskit.gas("N2").molar_mass / VM0, rel_tol=2e-6 if float_build else 1e-9)
assert list(q.status) == [0, 0, 2, 0] and math.isnan(q.value[2])
assert 0 < c.mass < 20 and 0.9 < c.z < 1.1
assert abs(rho / rho_best - 1) < 0.05  # Peng-Robinson within a few percent of the reference
print("quickstart: checks passed (%s)" % (gaskit.build_info(),))
