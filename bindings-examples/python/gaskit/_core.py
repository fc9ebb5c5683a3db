"""Quantities, models, reference conditions and fluids: the shared machinery of the package
(private module; the public names are re-exported by :mod:`gaskit`)."""

import ctypes
import enum
import functools
import math
import re
from dataclasses import dataclass
from typing import NamedTuple, Optional, Tuple

from . import errors
from ._native import native, STATUS_NAMES

__all__ = [
    "Model", "Gas", "Fluid", "Reference", "fluid", "gas", "gases", "model", "reference",
    "quantity", "convert", "build_info", "BuildInfo", "DEFAULT_MODEL", "STATUS_NAMES",
]


# ------------------------------------------------------------------ build information

class BuildInfo(NamedTuple):
    """Which library was loaded: its file, its version, and whether ``gk_real`` is float."""
    path: str
    version: str
    float_build: bool
    dtype: str  #: numpy dtype of the arrays the batch calls take ("float64" or "float32")


def build_info():
    """The loaded library: path, version, float build or not, and the numpy dtype it uses.

    A float build (``-DGASKIT_SINGLE_PRECISION=ON``, ``gk_build_flags() & GK_BUILD_FLOAT``)
    computes in binary32: about 7 significant digits; arrays are converted to float32 on the
    way in and results come back as float32.
    """
    n = native()
    return BuildInfo(n.path, n.version, n.is_float, "float32" if n.is_float else "float64")


# ------------------------------------------------------------------ models

class Model(enum.IntEnum):
    """Equation-of-state models (the values are the C library's ``gk_eos``).

    ====================== ============================================= ======================
    member                 accepted names                                use it for
    ====================== ============================================= ======================
    IDEAL                  "ideal"                                       low pressure, T >> Tc
    VAN_DER_WAALS          "vdw", "van-der-waals"                        qualitative estimates
    REDLICH_KWONG          "rk", "redlich-kwong"                         simple gases
    SOAVE_REDLICH_KWONG    "srk", "soave", "soave-redlich-kwong"         gases and vapours
    PENG_ROBINSON          "pr", "peng-robinson" (the default)           gases, hydrocarbons
    SPAN_WAGNER            "sw", "span-wagner"                           reference-grade
    BEST                   "best", "reference"                           the best model there is
    HYDROGEN               "hydrogen-equation"                           hydrogen, reference-grade
    ====================== ============================================= ======================

    Validity (see the C library's README): the ideal gas is about 1 % off for N2 at 20 bar and
    4-5 % at 200 bar; the cubic models are a few percent off in gas density for simple gases
    (Peng-Robinson N2 at 200 bar: Z 1.022 against about 1.04 measured), worse for polar gases
    and liquids (5-15 %).

    The reference-grade models (libraries built with them, GK_REFERENCE_MODELS):
    SPAN_WAGNER, the technical equations of Span and Wagner (Int. J. Thermophys. 24, 2003) for
    N2, O2, Ar, CH4, C2H6, C3H8, n-C4H10, CO2, air and mixtures of those (multi-fluid form
    without departure functions: dry air within 0.005 %, other mixtures of unlike molecules of
    the order of a percent at high pressure), from the triple point to 600 K and 100 MPa,
    about 0.2 % in gas density (the authors' stated uncertainty); other gases raise
    NotFoundError, states outside the range RangeError. HYDROGEN, the hydrogen density equation
    of Lemmon, Huber and Leachman (J. Res. NIST 113, 2008), 200-1000 K, up to 200 MPa. BEST
    takes Span-Wagner where it covers the fluid, the hydrogen equation for hydrogen, and
    Peng-Robinson otherwise (:func:`gaskit.state` reports the model that served).
    """
    IDEAL = 0
    VAN_DER_WAALS = 1
    REDLICH_KWONG = 2
    SOAVE_REDLICH_KWONG = 3
    PENG_ROBINSON = 4
    SPAN_WAGNER = 5
    BEST = 6
    HYDROGEN = 7


_MODEL_NAMES = {
    "ideal": Model.IDEAL,
    "vdw": Model.VAN_DER_WAALS, "van-der-waals": Model.VAN_DER_WAALS,
    "rk": Model.REDLICH_KWONG, "redlich-kwong": Model.REDLICH_KWONG,
    "srk": Model.SOAVE_REDLICH_KWONG, "soave": Model.SOAVE_REDLICH_KWONG,
    "soave-redlich-kwong": Model.SOAVE_REDLICH_KWONG,
    "pr": Model.PENG_ROBINSON, "peng-robinson": Model.PENG_ROBINSON,
    "sw": Model.SPAN_WAGNER, "span-wagner": Model.SPAN_WAGNER,
    "best": Model.BEST, "reference": Model.BEST,
    "hydrogen-equation": Model.HYDROGEN,
}

DEFAULT_MODEL = Model.PENG_ROBINSON


def model_or_none(value):
    """The :class:`Model` with that value, or None for a value this package does not know."""
    try:
        return Model(value)
    except ValueError:
        return None


def model(spec):
    """A :class:`Model` from a member, its int value, or a name such as ``"pr"`` or
    ``"Peng-Robinson"`` (case, spaces and underscores do not matter)."""
    if isinstance(spec, Model):
        return spec
    if isinstance(spec, str):
        key = re.sub(r"[\s_]+", "-", spec.strip().lower())
        if key in _MODEL_NAMES:
            return _MODEL_NAMES[key]
        raise errors.ArgumentError("unknown model %r; known: %s"
                                   % (spec, ", ".join(sorted(_MODEL_NAMES))), "model", spec)
    try:
        return Model(int(spec))
    except (ValueError, TypeError):
        raise errors.ArgumentError("unknown model %r" % (spec,), "model", spec) from None


# ------------------------------------------------------------------ units and quantities

# The SI unit of each dimension the package takes or returns.
_SI = {
    "pressure": "Pa", "temperature": "K", "volume": "m3", "volume flow": "m3/s",
    "density": "kg/m3", "amount": "mol", "mass": "kg", "mass flow": "kg/s",
    "molar mass": "kg/mol", "molar volume": "m3/mol",
}

_NUMBER_UNIT = re.compile(r"^\s*([+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?)\s*(.*?)\s*$")


@functools.lru_cache(maxsize=256)
def _unit_id(symbol, argument):
    n = native()
    out = ctypes.c_int(-1)
    s = n.unit_parse(symbol.encode("utf-8"), ctypes.byref(out))
    if s != 0:
        raise errors.error_for_status(s, "unknown unit %r" % symbol, argument, symbol)
    return out.value


def _convert1(value, frm, to, argument, dimension, shown=None):
    n = native()
    out = n.real(0.0)
    s = n.convert(value, frm, to, ctypes.byref(out))
    if s != 0:
        shown = value if shown is None else shown
        if s == 1:  # GK_ERR_ARGUMENT: another dimension
            raise errors.ArgumentError("a %s is wanted here" % dimension, argument, shown)
        raise errors.error_for_status(s, None, argument, shown)
    return float(out.value)


@functools.lru_cache(maxsize=256)
def unit_affine(unit, dimension, argument="unit"):
    """(offset, scale) with SI = (value + offset) * scale for a unit of the dimension: the form
    of the C library's conversion (offsets only for degC and degF); array conversions use it and
    agree with the scalar gk_convert to the last bit or two."""
    to = _unit_id(_SI[dimension], argument)
    frm = _unit_id(unit, argument)
    if dimension == "temperature":
        # the size of a degree: kelvin and degC 1, degF and degR 5/9 K (NIST SP 811 B.9)
        one = _convert1(1.0, frm, to, argument, dimension) - _convert1(0.0, frm, to, argument,
                                                                       dimension)
        scale = 1.0 if abs(one - 1.0) < 1e-9 else 5.0 / 9.0
        return _convert1(0.0, frm, to, argument, dimension) / scale, scale
    return 0.0, _convert1(1.0, frm, to, argument, dimension)


def quantity(value, dimension, unit=None, argument="value"):
    """A quantity in SI as a float.

    ``value`` is a number (in ``unit``, or in SI when ``unit`` is None) or a text with its unit
    such as ``"200bar"``, ``"15 degC"``, ``"50L"`` or ``"1.2e5 Pa"``. Units are the C library's
    symbols (NIST SP 811 factors): Pa hPa kPa MPa bar mbar atm at Torr mmHg inHg psi | K degC
    degF degR | m3 L mL ft3 in3 gal | mol mmol kmol lbmol | kg g lb | m3/s m3/h L/min mL/min
    ft3/min | kg/s kg/h g/min lb/h | kg/m3 g/L g/cm3 lb/ft3. Pressures are absolute.
    ``dimension`` is one of "pressure", "temperature", "volume", "volume flow", "density",
    "amount", "mass", "mass flow".
    """
    if dimension not in _SI:
        raise errors.ArgumentError("unknown dimension %r" % (dimension,), "dimension", dimension)
    if isinstance(value, str):
        m = _NUMBER_UNIT.match(value)
        if not m or not m.group(2):
            raise errors.ParseError("a number and a unit are wanted, e.g. \"200bar\"",
                                    argument, value)
        if unit is not None:
            raise errors.ArgumentError("the text carries its own unit; give no unit argument",
                                       argument, value)
        number, unit = float(m.group(1)), m.group(2)
    else:
        try:
            number = float(value)
        except (TypeError, ValueError):
            raise errors.ArgumentError("a number or a text such as \"200bar\" is wanted",
                                       argument, value) from None
        if unit is None:
            return number
    to = _unit_id(_SI[dimension], argument)
    return _convert1(number, _unit_id(unit, argument), to, argument, dimension, value)


def convert(value, from_unit, to_unit):
    """Converts a number between two units of one dimension (``gk_convert``): temperatures as
    temperatures (with the scales' offsets), everything else by the NIST SP 811 factor."""
    return _convert1(float(value), _unit_id(from_unit, "from_unit"),
                     _unit_id(to_unit, "to_unit"), "value", "quantity of the same dimension")


# ------------------------------------------------------------------ reference conditions

class Reference(NamedTuple):
    """A reference (standard, normal) condition: absolute pressure in Pa, temperature in K."""
    p: float
    t: float


_REFERENCE_IDS = {
    "0C_101325Pa": 0, "din1343": 0, "normal": 0,
    "0C_100kPa": 1, "iupac": 1,
    "15C_101325Pa": 2, "iso13443": 2,
    "20C_101325Pa": 3,
    "25C_101325Pa": 4,
    "60F_14.696psi": 5,
}


def reference(spec):
    """A :class:`Reference` from a name or a (p, t) pair of quantities.

    Names: "0C_101325Pa" (also "din1343", "normal": DIN 1343), "0C_100kPa" ("iupac": IUPAC
    since 1982), "15C_101325Pa" ("iso13443": ISO 13443, natural gas), "20C_101325Pa",
    "25C_101325Pa", "60F_14.696psi" (U.S. gas industry). A pair: ``("1atm", "15degC")``.
    """
    if isinstance(spec, Reference):
        return spec
    if isinstance(spec, str):
        key = spec.strip()
        rid = _REFERENCE_IDS.get(key, _REFERENCE_IDS.get(key.lower()))
        if rid is None:
            raise errors.NotFoundError("unknown reference condition %r; known: %s"
                                       % (spec, ", ".join(_REFERENCE_IDS)), "reference", spec)
        n = native()
        out = n.Reference()
        s = n.reference_get(rid, ctypes.byref(out))
        if s != 0:
            raise errors.error_for_status(s, None, "reference", spec)
        return Reference(float(out.p), float(out.t))
    try:
        p, t = spec
    except (TypeError, ValueError):
        raise errors.ArgumentError("a reference is a name or a (p, t) pair", "reference",
                                   spec) from None
    return Reference(quantity(p, "pressure", argument="reference"),
                     quantity(t, "temperature", argument="reference"))


# ------------------------------------------------------------------ gases and fluids

@dataclass(frozen=True)
class Gas:
    """A gas of the built-in table (values in SI)."""
    name: str
    formula: str
    molar_mass: float            #: kg/mol
    critical_temperature: float  #: K
    critical_pressure: float     #: Pa
    acentric_factor: float

    @classmethod
    def _from_struct(cls, g):
        return cls(g.name.decode("utf-8"), g.formula.decode("utf-8"), float(g.molar_mass),
                   float(g.critical_temperature), float(g.critical_pressure),
                   float(g.acentric_factor))


def _gas_pointer(name, argument="fluid"):
    n = native()
    ptr = ctypes.POINTER(n.Gas)()
    s = n.gas_find(name.encode("utf-8"), ctypes.byref(ptr))
    if s != 0:
        raise errors.error_for_status(s, "no gas named %r in the gas table" % name, argument,
                                      name)
    return ptr


def gas(name):
    """The :class:`Gas` of the built-in table with that formula, name or alias ("N2",
    "nitrogen", "R-134a")."""
    return Gas._from_struct(_gas_pointer(name, "name").contents)


def gases():
    """Every gas of the built-in table, in table order."""
    n = native()
    return [Gas._from_struct(n.gas_at(i).contents) for i in range(n.gas_count())]


class Fluid:
    """A gas or a mixture, ready for the C library (build it with :func:`fluid`).

    Attributes: ``text`` (as given), ``components`` (list of (Gas, mole fraction)),
    ``molar_mass`` (kg/mol), ``kij`` (interaction parameters or None), ``is_mixture``.
    """

    def __init__(self, text, struct, keep, components, molar_mass, kij, is_mixture):
        self.text = text
        self.struct = struct
        self._keep = keep  # the ctypes objects the struct points into
        self.components = components
        self.molar_mass = molar_mass
        self.kij = kij
        self.is_mixture = is_mixture

    def __repr__(self):
        return "gaskit.fluid(%r)" % (self.text,)


def _mixture_from_text(text):
    n = native()
    mix = n.Mixture()
    s = n.mixture_parse(text.encode("utf-8"), ctypes.byref(mix))
    if s != 0:
        raise errors.error_for_status(s, None, "fluid", text)
    return mix


def fluid(spec, kij=None):
    """A :class:`Fluid` from a gas name or formula ("N2", "carbon dioxide"), a composition text
    ("CH4=0.9, C2H6=5%, N2=balance", the syntax of the C library's gk_mixture_parse: fractions,
    percent, ppm, one balance), a dict of names to mole fractions, or a Fluid (returned as is).

    ``kij``: for a mixture, binary interaction parameters as a square nested sequence (count x
    count, symmetric, zero diagonal, each in [-1, 1]); None for all zero.
    """
    if isinstance(spec, Fluid):
        if kij is not None:
            raise errors.ArgumentError("give kij when the fluid is built", "kij", kij)
        return spec
    if isinstance(spec, dict):
        spec = ", ".join("%s=%r" % (k, float(v)) for k, v in spec.items())
    if not isinstance(spec, str):
        raise errors.ArgumentError("a gas name, a composition text or a Fluid is wanted",
                                   "fluid", spec)
    if kij is None:
        return _fluid_cached(spec)
    return _build_fluid(spec, tuple(tuple(float(x) for x in row) for row in kij))


@functools.lru_cache(maxsize=128)
def _fluid_cached(spec):
    return _build_fluid(spec, None)


def _build_fluid(spec, kij):
    n = native()
    if "=" not in spec:
        ptr = _gas_pointer(spec.strip())
        if kij is not None:
            raise errors.ArgumentError("kij applies to mixtures only", "kij", kij)
        g = Gas._from_struct(ptr.contents)
        struct = n.Fluid(ptr, None, None)
        return Fluid(spec, struct, (ptr,), [(g, 1.0)], g.molar_mass, None, False)
    mix = _mixture_from_text(spec)
    count = int(mix.count)
    kij_arr = None
    if kij is not None:
        if len(kij) != count or any(len(row) != count for row in kij):
            raise errors.ArgumentError("kij must be %d x %d" % (count, count), "kij", kij)
        kij_arr = (n.real * (count * count))(*[x for row in kij for x in row])
    struct = n.Fluid(None, ctypes.pointer(mix),
                     ctypes.cast(kij_arr, ctypes.POINTER(n.real)) if kij_arr else None)
    mm = n.real(0.0)
    s = n.mixture_molar_mass(ctypes.byref(mix), ctypes.byref(mm))
    if s != 0:
        raise errors.error_for_status(s, None, "fluid", spec)
    comps = [(Gas._from_struct(mix.gas[i].contents), float(mix.mole_fraction[i]))
             for i in range(count)]
    return Fluid(spec, struct, (mix, kij_arr), comps, float(mm.value), kij, True)


# ------------------------------------------------------------------ blame

def blame(status, named_inputs, positive=("p", "t", "volume")):
    """(argument, value) at fault for a failed status, as far as the inputs tell.

    ``named_inputs`` is a sequence of (name, value) in SI. GK_ERR_DOMAIN: the first input that
    is not finite, or not > 0 for those that must be. GK_ERR_COMPOSITION, GK_ERR_NOT_FOUND,
    GK_ERR_PARSE: the fluid. Otherwise (a result out of range, a liquid state): the state (p, t).
    """
    if status == 2:
        for name, value in named_inputs:
            v = float(value)
            if not math.isfinite(v) or (name in positive and not v > 0.0):
                return name, v
            if name == "relative_humidity" and not 0.0 <= v <= 1.0:
                return name, v
        return "fluid", None
    if status in (5, 6, 7):
        return "fluid", None
    if status == 1:
        return "model", None
    state = [(k, float(v)) for k, v in named_inputs if k in ("p", "t")]
    return ("p, t", tuple(v for _, v in state)) if state else (None, None)


def element_error(status, named_inputs, index=None, what=None):
    """The exception for one failed element (status, and the inputs at that element)."""
    arg, val = blame(status, named_inputs)
    message = None
    if status == 4 and what:
        message = ("%s is outside the model's range here: a liquid stable state (the state "
                   "of a liquefied gas does not follow from pressure), or a result that "
                   "overflows" % what)
    return errors.error_for_status(status, message, arg, val, index)


Quantity = Tuple[float, str]
OptionalUnit = Optional[str]
