"""Vectorised gaskit: the same quantities over numpy arrays, one C batch call per array.

Every function here takes array-likes (numpy arrays, lists, scalars; they are broadcast
together), numbers in SI unless a unit argument names another unit (``p_unit="bar"``,
``t_unit="degC"``, ...), and returns a small named tuple of numpy arrays of the broadcast shape
plus ``status``, an int array holding the C library's status of each element (0 = GK_OK; see
:data:`gaskit.STATUS_NAMES`). A failed element is NaN in every result array and keeps its
status; the rest of the array is computed as usual. Pass ``errors="raise"`` to get instead the
exception of the first failed element (with its index and the argument at fault).

The work per element is done in C (``batch.h``: gk_fluid_density_batch, gk_fluid_z_batch,
gk_vessel_contents_batch, gk_flow_to_reference_batch, gk_flow_to_mass_batch,
gk_dry_gas_pressure_batch, gk_ideal_density_batch); Python's share is a fixed cost per call
(converting and checking the arguments, a few microseconds), not per element. The C library
releases nothing to Python in between, and ctypes releases the GIL during the call, so
threads (and Dask's threaded scheduler) run batch calls in parallel.

Arrays are float64, or float32 when the loaded library is a float build
(:func:`gaskit.build_info`); other dtypes are converted on the way in.

Results are engineering estimates from the chosen model: see :class:`gaskit.Model` for each
model's validity and the package README's safety notes.
"""

from typing import NamedTuple

import numpy as np

from . import _core
from . import errors as _errors
from ._native import native, STATUS_NAMES

__all__ = ["ArrayResult", "ContentsArrays", "density", "z", "contents", "amount",
           "flow_to_reference", "mass_flow", "dry_gas_pressure", "ideal_density"]


class ArrayResult(NamedTuple):
    """``value``: the results (NaN where an element failed); ``status``: per-element status."""
    value: np.ndarray
    status: np.ndarray

    @property
    def ok(self):
        """Boolean mask of the elements computed (status GK_OK)."""
        return self.status == 0

    @property
    def failed(self):
        """Number of failed elements."""
        return int(np.count_nonzero(self.status))

    def status_names(self):
        """The C names of the statuses, as an array of str."""
        return np.asarray(STATUS_NAMES, dtype=object)[np.clip(self.status, 0, 7)]

    def raise_for_status(self):
        """Raises the exception of the first failed element, if any; returns self otherwise."""
        _raise_first(self.status, None)
        return self


class ContentsArrays(NamedTuple):
    """Vessel contents per element: ``amount`` (mol), ``mass`` (kg), ``reference_volume``
    (m3 at the reference condition), ``status``."""
    amount: np.ndarray
    mass: np.ndarray
    reference_volume: np.ndarray
    status: np.ndarray

    @property
    def ok(self):
        """Boolean mask of the elements computed (status GK_OK)."""
        return self.status == 0

    @property
    def failed(self):
        """Number of failed elements."""
        return int(np.count_nonzero(self.status))

    def raise_for_status(self):
        """Raises the exception of the first failed element, if any; returns self otherwise."""
        _raise_first(self.status, None)
        return self


def _dtype():
    return np.float32 if native().is_float else np.float64


def _inputs(specs):
    """Converts and broadcasts (name, value, unit, dimension) inputs: contiguous 1-D arrays of
    the library's dtype, and the broadcast shape."""
    dtype = _dtype()
    raw = []
    for name, value, unit, dim in specs:
        if isinstance(value, str):
            if dim is None:
                raise _errors.ArgumentError("a number is wanted", name, value)
            if unit is not None:
                raise _errors.ArgumentError("the text carries its own unit; give no %s_unit"
                                            % name, name, value)
            raw.append(np.float64(_core.quantity(value, dim, argument=name)))
            continue
        a = np.asarray(value)
        if a.dtype.kind not in "fiub":
            raise _errors.ArgumentError("numbers are wanted (a %s array was given)" % a.dtype,
                                        name, None)
        if unit is not None:
            offset, scale = _core.unit_affine(unit, dim, name + "_unit")
            a = a.astype(np.float64)
            a = (a + offset) * scale if offset else a * scale
        raw.append(a)
    try:
        shape = np.broadcast_shapes(*[np.shape(a) for a in raw])
    except ValueError:
        raise _errors.ArgumentError("the arrays do not broadcast together: "
                                    + ", ".join("%s %s" % (s[0], np.shape(a))
                                                for s, a in zip(specs, raw)),
                                    None, None) from None
    out = []
    for a in raw:
        a = np.asarray(a, dtype=dtype)
        if a.shape != shape:
            a = np.broadcast_to(a, shape)
        out.append(np.ascontiguousarray(a).reshape(-1))
    return out, shape


def _empty(n):
    return np.empty(n, dtype=_dtype())


def _out_unit(values, unit, dimension):
    if unit is None:
        return values
    offset, scale = _core.unit_affine(unit, dimension, "unit")
    return values / scale - offset


def _raise_first(status, named, what=None):
    bad = np.flatnonzero(status)
    if bad.size == 0:
        return
    i = int(bad[0])
    s = int(status.reshape(-1)[i])
    index = i if np.ndim(status) > 0 else None  # a scalar call has no element index
    if named is None:
        raise _errors.error_for_status(s, None, None, None, index)
    inputs = [(k, v.reshape(-1)[i]) for k, v in named]
    raise _core.element_error(s, inputs, index, what)


def _finish(result, errors, named, what, model=None):
    st = result.status
    if model is not None and st.size and int(st.flat[0]) == 1 and np.all(st == 1):
        # Every element GK_ERR_ARGUMENT: the arrays are never NULL from here and the fluid was
        # checked, so the library does not know the model (one built without it, or older).
        raise _errors.ArgumentError("the loaded library has no model %s" % model.name, "model",
                                    model.name)
    if errors == "raise":
        _raise_first(result.status, named, what)
    elif errors != "nan":
        raise _errors.ArgumentError('errors is "nan" or "raise"', "errors", errors)
    return result


def _fluid_model(fluid, model):
    return _core.fluid(fluid), _core.model(model)


def density(fluid, p, t, *, model=_core.DEFAULT_MODEL, p_unit=None, t_unit=None, unit=None,
            errors="nan"):
    """Density of a gas or mixture over arrays: rho = M / Vm = p M / (Z R T).

    Vm is the molar volume of the stable root of ``model`` at (p, t) (a liquid root where the
    model's stable state is liquid), M the molar mass (of the mixture, sum x_i M_i).
    C: gk_fluid_density_batch.

    Parameters: ``fluid`` (name, formula, composition text or :class:`gaskit.Fluid`); ``p``
    absolute pressure, ``t`` temperature (arrays, SI unless ``p_unit``/``t_unit``);
    ``model`` (:class:`gaskit.Model` or name, default Peng-Robinson); ``unit`` of the result
    (default kg/m3); ``errors`` "nan" (default) or "raise".
    Returns :class:`ArrayResult` (value, status).
    """
    f, m = _fluid_model(fluid, model)
    (pa, tk), shape = _inputs([("p", p, p_unit, "pressure"), ("t", t, t_unit, "temperature")])
    n = pa.size
    out, st = _empty(n), np.empty(n, dtype=np.intc)
    native().fluid_density_batch(int(m), f.struct, n, pa.ctypes.data, tk.ctypes.data,
                                 out.ctypes.data, st.ctypes.data)
    r = ArrayResult(_out_unit(out, unit, "density").reshape(shape), st.reshape(shape))
    return _finish(r, errors, [("p", pa), ("t", tk)], "the density", m)


def z(fluid, p, t, *, model=_core.DEFAULT_MODEL, p_unit=None, t_unit=None, errors="nan"):
    """Compressibility factor Z = p Vm / (R T) of the stable root of ``model`` over arrays
    (gas or liquid root, no liquid check). C: gk_fluid_z_batch. Arguments as :func:`density`.
    Returns :class:`ArrayResult`.
    """
    f, m = _fluid_model(fluid, model)
    (pa, tk), shape = _inputs([("p", p, p_unit, "pressure"), ("t", t, t_unit, "temperature")])
    n = pa.size
    out, st = _empty(n), np.empty(n, dtype=np.intc)
    native().fluid_z_batch(int(m), f.struct, n, pa.ctypes.data, tk.ctypes.data, out.ctypes.data,
                           st.ctypes.data)
    return _finish(ArrayResult(out.reshape(shape), st.reshape(shape)), errors,
                   [("p", pa), ("t", tk)], "Z", m)


def contents(fluid, volume, p, t, *, reference, model=_core.DEFAULT_MODEL, volume_unit=None,
             p_unit=None, t_unit=None, errors="nan"):
    """Contents of vessels over arrays: amount n = p V / (Z R T) (mol), mass n M (kg), and the
    volume n Z_ref R T_ref / p_ref the gas takes at ``reference`` (m3).

    A liquid stable state in the vessel (liquefied-gas cylinders: CO2, propane, ... below their
    critical temperature) fails its element with GK_ERR_RANGE: such containers are weighed.
    C: gk_vessel_contents_batch. ``reference``: a name such as "0C_101325Pa" or a (p, t) pair
    (see :func:`gaskit.reference`). Returns :class:`ContentsArrays`.
    """
    f, m = _fluid_model(fluid, model)
    ref = _core.reference(reference)
    (v, pa, tk), shape = _inputs([("volume", volume, volume_unit, "volume"),
                                  ("p", p, p_unit, "pressure"),
                                  ("t", t, t_unit, "temperature")])
    nat = native()
    n = pa.size
    amt, mass, vref = _empty(n), _empty(n), _empty(n)
    st = np.empty(n, dtype=np.intc)
    nat.vessel_contents_batch(int(m), f.struct, nat.Reference(ref.p, ref.t), n, v.ctypes.data,
                              pa.ctypes.data, tk.ctypes.data, amt.ctypes.data,
                              mass.ctypes.data, vref.ctypes.data, st.ctypes.data)
    r = ContentsArrays(amt.reshape(shape), mass.reshape(shape), vref.reshape(shape),
                       st.reshape(shape))
    return _finish(r, errors, [("volume", v), ("p", pa), ("t", tk)], "the vessel contents", m)


def amount(fluid, volume, p, t, *, model=_core.DEFAULT_MODEL, volume_unit=None, p_unit=None,
           t_unit=None, errors="nan"):
    """Amount of gas in vessels over arrays, n = p V / (Z R T) in mol (the ``amount`` of
    :func:`contents`, at the reference condition 0 degC, 101.325 kPa, which only decides the
    liquid check there). Returns :class:`ArrayResult`."""
    c = contents(fluid, volume, p, t, reference="0C_101325Pa", model=model,
                 volume_unit=volume_unit, p_unit=p_unit, t_unit=t_unit, errors=errors)
    return ArrayResult(c.amount, c.status)


def flow_to_reference(fluid, flow, p, t, *, reference, model=_core.DEFAULT_MODEL,
                      flow_unit=None, p_unit=None, t_unit=None, unit=None, errors="nan"):
    """Actual volume flows at (p, t) as volume flows at a reference condition, over arrays:
    q_ref = q (p / p_ref)(T_ref / T)(Z_ref / Z), Z from ``model`` at both conditions.

    Any finite flow converts (zero and reverse flow too). A liquid stable state at either
    condition fails with GK_ERR_RANGE. C: gk_flow_to_reference_batch. Result in m3/s unless
    ``unit`` (e.g. "m3/h"). Returns :class:`ArrayResult`.
    """
    f, m = _fluid_model(fluid, model)
    ref = _core.reference(reference)
    (q, pa, tk), shape = _inputs([("flow", flow, flow_unit, "volume flow"),
                                  ("p", p, p_unit, "pressure"),
                                  ("t", t, t_unit, "temperature")])
    nat = native()
    n = pa.size
    out, st = _empty(n), np.empty(n, dtype=np.intc)
    nat.flow_to_reference_batch(int(m), f.struct, nat.Reference(ref.p, ref.t), n, q.ctypes.data,
                                pa.ctypes.data, tk.ctypes.data, out.ctypes.data,
                                st.ctypes.data)
    r = ArrayResult(_out_unit(out, unit, "volume flow").reshape(shape), st.reshape(shape))
    return _finish(r, errors, [("flow", q), ("p", pa), ("t", tk)], "the reference flow", m)


def mass_flow(fluid, flow, p, t, *, model=_core.DEFAULT_MODEL, flow_unit=None, p_unit=None,
              t_unit=None, unit=None, errors="nan"):
    """Mass flows of actual volume flows at (p, t), over arrays: w = q p M / (Z R T).

    A liquid stable state fails with GK_ERR_RANGE. C: gk_flow_to_mass_batch. Result in kg/s
    unless ``unit`` (e.g. "kg/h"). Returns :class:`ArrayResult`.
    """
    f, m = _fluid_model(fluid, model)
    (q, pa, tk), shape = _inputs([("flow", flow, flow_unit, "volume flow"),
                                  ("p", p, p_unit, "pressure"),
                                  ("t", t, t_unit, "temperature")])
    n = pa.size
    out, st = _empty(n), np.empty(n, dtype=np.intc)
    native().flow_to_mass_batch(int(m), f.struct, n, q.ctypes.data, pa.ctypes.data, tk.ctypes.data,
                                out.ctypes.data, st.ctypes.data)
    r = ArrayResult(_out_unit(out, unit, "mass flow").reshape(shape), st.reshape(shape))
    return _finish(r, errors, [("flow", q), ("p", pa), ("t", tk)], "the mass flow", m)


def dry_gas_pressure(p, t, relative_humidity, *, p_unit=None, t_unit=None, unit=None,
                     errors="nan"):
    """Wet-gas correction over arrays: partial pressure of the dry gas p_dry = p - RH p_ws(T).

    p_ws: vapour pressure of water, IAPWS-IF97 (273.16 ... 647.096 K), over ice below 273.16 K
    (IAPWS 2011, down to 200 K; RH there is with respect to ice). ``relative_humidity`` is a
    fraction in [0, 1]. The enhancement factor (about 1.004 near ambient) is neglected.
    C: gk_dry_gas_pressure_batch. Returns :class:`ArrayResult` (Pa unless ``unit``).
    """
    (pa, tk, rh), shape = _inputs([("p", p, p_unit, "pressure"),
                                   ("t", t, t_unit, "temperature"),
                                   ("relative_humidity", relative_humidity, None, None)])
    n = pa.size
    out, st = _empty(n), np.empty(n, dtype=np.intc)
    native().dry_gas_pressure_batch(n, pa.ctypes.data, tk.ctypes.data, rh.ctypes.data,
                                    out.ctypes.data, st.ctypes.data)
    r = ArrayResult(_out_unit(out, unit, "pressure").reshape(shape), st.reshape(shape))
    return _finish(r, errors, [("p", pa), ("t", tk), ("relative_humidity", rh)],
                   "the dry-gas pressure")


def ideal_density(molar_mass, p, t, *, p_unit=None, t_unit=None, errors="nan"):
    """Ideal-gas density over arrays, rho = p M / (R T) in kg/m3, with the molar mass M in
    kg/mol (one value for the whole array). C: gk_ideal_density_batch (a vectorised loop, bit
    for bit the scalar gk_ideal_density). Returns :class:`ArrayResult`."""
    (pa, tk), shape = _inputs([("p", p, p_unit, "pressure"), ("t", t, t_unit, "temperature")])
    nat = native()
    n = pa.size
    out, st = _empty(n), np.empty(n, dtype=np.intc)
    nat.ideal_density_batch(n, pa.ctypes.data, tk.ctypes.data, float(molar_mass),
                            out.ctypes.data, st.ctypes.data)
    return _finish(ArrayResult(out.reshape(shape), st.reshape(shape)), errors,
                   [("p", pa), ("t", tk)], "the density")
