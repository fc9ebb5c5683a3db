"""gaskit for Python: gas properties for instrument data (densities, compressibility, vessel
contents, flows at reference conditions, wet-gas corrections) from the gaskit C library.

Quick start::

    import gaskit
    rho = gaskit.density("N2", "200bar", "15degC")             # kg/m3, Peng-Robinson
    c = gaskit.contents("CH4=0.9, C2H6=0.06, N2=balance", "50L", "180bar", "20degC",
                        reference="15C_101325Pa")               # Contents(amount, mass, ...)
    r = gaskit.arrays.density("N2", p_array, t_array, p_unit="bar", t_unit="degC")
    r.value, r.status                                           # numpy arrays

- Quantities: numbers in SI (Pa, K, m3, m3/s), or with a unit argument (``p_unit="bar"``), or
  text with the unit (``"200bar"``, ``"15 degC"``, ``"50L"``); pressures are absolute.
- Fluids: a gas name or formula ("N2", "carbon dioxide") or a composition text
  ("CO2=5%, N2=balance"); see :func:`fluid`.
- Models: :class:`Model` (default Peng-Robinson); reference conditions: :func:`reference`.
- Errors: the C library's statuses become exceptions (:mod:`gaskit.errors`) that carry the
  status name and the argument at fault.
- Arrays: :mod:`gaskit.arrays`, one C batch call per array, per-element statuses.

The shared library is found through ``GASKIT_LIBRARY``, next to the package, or the usual
search path (see :func:`load`); :func:`build_info` tells which one was loaded.

Safety: results are engineering estimates from the chosen model within its validity range
(see :class:`Model`); they do not replace pressure-equipment codes, gas suppliers' data,
custody-transfer standards or a competent engineer's judgement. Liquefied-gas cylinders are
weighed, not judged by pressure.
"""

import ctypes
from typing import NamedTuple, Optional

from . import _core, arrays, errors
from ._core import (DEFAULT_MODEL, BuildInfo, Fluid, Gas, Model, Reference, build_info, convert,
                    fluid, gas, gases, model, quantity, reference)
from ._native import STATUS_NAMES, LibraryError, load, native
from .errors import (ArgumentError, CompositionError, DomainError, GaskitError, NoSolutionError,
                     NotFoundError, ParseError, RangeError)

from ._native import PACKAGE_VERSION as __version__  # noqa: E402

__all__ = [
    "density", "z", "contents", "flow_to_reference", "mass_flow", "dry_gas_pressure",
    "vapour_pressure", "state", "State", "Contents", "Model", "Gas", "Fluid", "Reference",
    "fluid", "gas", "gases", "model", "reference", "quantity", "convert", "build_info",
    "BuildInfo", "load", "arrays", "errors", "STATUS_NAMES", "DEFAULT_MODEL", "GaskitError",
    "ArgumentError", "DomainError", "NoSolutionError", "RangeError", "NotFoundError",
    "CompositionError", "ParseError", "LibraryError",
]


class Contents(NamedTuple):
    """What a vessel holds."""
    amount: float            #: mol
    mass: float              #: kg
    reference_volume: float  #: m3 as free gas at the reference condition
    z: float                 #: compressibility factor in the vessel


class State(NamedTuple):
    """The solution of an equation of state at (p, t)."""
    z: float                     #: compressibility factor of the returned root
    molar_volume: float          #: m3/mol
    density: float               #: kg/m3
    fugacity_coefficient: float  #: of the returned root (of the mixture as a whole)
    roots: tuple                 #: every real root of Z above the covolume, ascending
    branch: str                  #: "gas", "liquid" or "supercritical" (a lone root above Tc)
    model: Optional[Model]       #: the model that served (with Model.BEST, the one it chose)


def _one(result):
    return float(result.value.reshape(-1)[0])


def density(fluid, p, t, *, model=DEFAULT_MODEL, unit=None):
    """Density of a gas or mixture at absolute pressure p and temperature t.

    Formula: rho = M / Vm = p M / (Z R T), with Z and Vm of the stable root of the model's
    equation of state (the ideal gas: Z = 1) and M the molar mass (for a mixture sum x_i M_i);
    R = 8.314462618 J/(mol K) (CODATA 2018).

    Units: p and t are numbers in Pa and K, or text such as "200bar", "15degC"; the result is in
    kg/m3, or in ``unit`` ("g/L", "lb/ft3", ...).

    Model: ``model`` is a :class:`Model` or a name ("ideal", "vdw", "rk", "srk", "pr"; default
    Peng-Robinson, 1976; a cubic model's mixture uses the van der Waals one-fluid mixing rules),
    or a reference-grade model ("sw" Span-Wagner, "hydrogen-equation", "best": the most
    accurate model the library has for the fluid) where the library has them.

    Validity: ideal gas about 1 % off for N2 at 20 bar, 4-5 % at 200 bar, 12 % for CO2 at
    20 bar; Peng-Robinson and Soave 1-3 % in gas density for simple gases at cylinder pressures,
    5-15 % for liquids; van der Waals qualitative only; Span-Wagner about 0.2 % in gas density
    for its eight gases and air, triple point to 600 K, up to 100 MPa (see :class:`Model`). Below the critical temperature the
    stable root may be a liquid (its density is returned); mixtures between dew and bubble
    point (two phases) are not detected. Engineering estimates: see the package README's safety
    notes before a result feeds a decision about pressure or a hazardous gas.

    Raises: DomainError (p or t not finite or not > 0; ``argument`` names it), NotFoundError /
    CompositionError / ParseError (the fluid), ArgumentError (the model), RangeError (overflow).
    C: gk_fluid_density_batch with one element.
    """
    return _one(arrays.density(fluid, p, t, model=model, unit=unit, errors="raise"))


def z(fluid, p, t, *, model=DEFAULT_MODEL):
    """Compressibility factor Z = p Vm / (R T) of a gas or mixture at (p, t): the stable root
    of the model (gas or liquid; no liquid check). Units, models and validity as
    :func:`density`. C: gk_fluid_z_batch."""
    return _one(arrays.z(fluid, p, t, model=model, errors="raise"))


def contents(fluid, volume, p, t, *, reference, model=DEFAULT_MODEL):
    """Contents of a vessel of internal volume ``volume`` at absolute pressure p and
    temperature t: :class:`Contents` (amount n = p V / (Z R T) in mol, mass n M in kg, the
    volume n Z_ref R T_ref / p_ref the gas takes at ``reference`` in m3, and Z).

    ``reference`` is a name ("0C_101325Pa", "15C_101325Pa", ...) or a (p, t) pair. A liquid
    stable state in the vessel raises RangeError: liquefied-gas containers (CO2, propane,
    ammonia below their critical temperature) are weighed. Models and validity as
    :func:`density`. C: gk_vessel_contents_batch.
    """
    c = arrays.contents(fluid, volume, p, t, reference=reference, model=model, errors="raise")
    amount = float(c.amount.reshape(-1)[0])
    zz = z(fluid, p, t, model=model)
    return Contents(amount, float(c.mass.reshape(-1)[0]),
                    float(c.reference_volume.reshape(-1)[0]), zz)


def flow_to_reference(fluid, flow, p, t, *, reference, model=DEFAULT_MODEL, unit=None):
    """Actual volume flow ``flow`` at (p, t) as volume flow at ``reference``:
    q_ref = q (p / p_ref)(T_ref / T)(Z_ref / Z), Z from the model at both conditions.

    ``flow`` in m3/s or text ("120 L/min", "35m3/h"); result in m3/s or ``unit``. Zero and
    reverse flow convert. A liquid stable state at either condition raises RangeError.
    Models and validity as :func:`density`. C: gk_flow_to_reference_batch.
    """
    return _one(arrays.flow_to_reference(fluid, flow, p, t, reference=reference, model=model,
                                         unit=unit, errors="raise"))


def mass_flow(fluid, flow, p, t, *, model=DEFAULT_MODEL, unit=None):
    """Mass flow of the actual volume flow ``flow`` at (p, t): w = q p M / (Z R T), in kg/s
    or ``unit`` ("kg/h", "g/min"). A liquid stable state raises RangeError. Models and
    validity as :func:`density`. C: gk_flow_to_mass_batch."""
    return _one(arrays.mass_flow(fluid, flow, p, t, model=model, unit=unit, errors="raise"))


def dry_gas_pressure(p, t, relative_humidity, *, unit=None):
    """Partial pressure of the dry gas in a wet gas: p_dry = p - RH p_ws(T), in Pa or ``unit``.

    p_ws is the vapour pressure of water (IAPWS-IF97, 273.16-647.096 K) or ice (IAPWS 2011,
    200-273.16 K; RH is then with respect to ice). RH is a fraction in [0, 1] (1 = gas
    collected over water). Raises NoSolutionError when the water partial pressure is not below
    p, RangeError outside the curves. C: gk_dry_gas_pressure_batch.
    """
    return _one(arrays.dry_gas_pressure(p, t, relative_humidity, unit=unit, errors="raise"))


def vapour_pressure(t, *, unit=None):
    """Saturation vapour pressure of water at t: over liquid water (IAPWS-IF97) at and above
    273.16 K, over ice (IAPWS 2011) below; 200 K to 647.096 K. In Pa or ``unit``."""
    n = native()
    tk = quantity(t, "temperature", argument="t")
    out = n.real(0.0)
    s = n.water_vapour_pressure(tk, ctypes.byref(out))
    if s != 0:
        raise errors.error_for_status(s, None, "t", tk)
    return float(out.value) if unit is None else convert(float(out.value), "Pa", unit)


def state(fluid, p, t, *, model=DEFAULT_MODEL, root="stable"):
    """Solves the model's equation of state at (p, t): :class:`State` with Z, the molar
    volume, the density, the fugacity coefficient, every real root and the branch returned.

    ``root``: "stable" (lower fugacity), "gas" (largest root) or "liquid" (smallest root).
    The cubic models have up to three real roots above the covolume below the critical
    temperature. C: gk_eos_solve / gk_mixture_eos_solve.
    """
    roots = {"stable": 0, "gas": 1, "liquid": 2}
    if root not in roots:
        raise ArgumentError('root is "stable", "gas" or "liquid"', "root", root)
    f = _core.fluid(fluid)
    mm = _core.model(model)
    m = int(mm)
    pa = quantity(p, "pressure", argument="p")
    tk = quantity(t, "temperature", argument="t")
    n = native()
    r = n.EosResult()
    r.model = -1  # stays -1 with a library whose result has no model field
    st = f.struct
    if f.is_mixture:
        s = n.mixture_eos_solve(m, st.mixture, st.kij, pa, tk, roots[root], ctypes.byref(r))
    else:
        s = n.eos_solve(m, st.gas, pa, tk, roots[root], ctypes.byref(r))
    if s == 1:
        raise ArgumentError("the loaded library has no model %s" % mm.name, "model", mm.name)
    if s != 0:
        raise _core.element_error(s, [("p", pa), ("t", tk)], None, "the state")
    vm = float(r.molar_volume)
    return State(float(r.z), vm, f.molar_mass / vm, float(r.fugacity_coefficient),
                 tuple(float(r.z_roots[i]) for i in range(r.root_count)),
                 {1: "gas", 2: "liquid", 3: "supercritical"}.get(int(r.branch), "gas"),
                 _core.model_or_none(int(r.model)) if r.model >= 0 else None)
