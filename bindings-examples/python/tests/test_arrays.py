"""Vectorised functions: bad elements become NaN with their status, shapes and units, and
every element equals the scalar API's (the same C call per element)."""
import numpy as np
import pytest

import gaskit
from gaskit import arrays

MODELS = ["ideal", "vdw", "rk", "srk", "pr"]
FLUIDS = ["N2", "CO2", "CH4=0.9, C2H6=0.06, N2=balance"]
# invented readings of a fictional cylinder-filling line, with bad rows mixed in
P = np.array([1e5, 2e7, 5e6, np.nan, -1e5, 1e5, 6e6, 3e5, 1e30, 2e5])
T = np.array([273.15, 293.15, 250, 300, 300, np.inf, 280, 320, 300, 0.0])
V = np.array([0.05, 0.05, 0.01, 0.05, 0.05, 0.05, 0.05, 0.05, 0.05, 0.05])


@pytest.mark.parametrize("model", MODELS)
@pytest.mark.parametrize("fluid", FLUIDS)
def test_bad_elements_nan_and_status(fluid, model):
    for r in (arrays.density(fluid, P, T, model=model), arrays.z(fluid, P, T, model=model),
              arrays.mass_flow(fluid, 1e-3, P, T, model=model),
              arrays.flow_to_reference(fluid, 1e-3, P, T, reference="iupac", model=model)):
        assert r.value.shape == P.shape and r.status.shape == P.shape
        assert np.all(np.isnan(r.value[~r.ok]))
        assert np.all(np.isfinite(r.value[r.ok]))
        assert list(r.status[[3, 4, 5, 9]]) == [2, 2, 2, 2]  # GK_ERR_DOMAIN
        assert r.ok[0] and r.ok[7]
        assert r.failed == np.count_nonzero(r.status)
    c = arrays.contents(fluid, V, P, T, reference="15C_101325Pa", model=model)
    assert np.all(np.isnan(c.amount[~c.ok])) and np.all(np.isnan(c.mass[~c.ok]))
    assert np.all(c.amount[c.ok] > 0)


@pytest.mark.parametrize("model", MODELS)
@pytest.mark.parametrize("fluid", FLUIDS)
def test_elements_equal_scalar_calls(fluid, model):
    rho = arrays.density(fluid, P, T, model=model)
    for i in range(P.size):
        if rho.status[i] == 0:
            assert rho.value[i] == gaskit.density(fluid, P[i], T[i], model=model)
        else:
            with pytest.raises(gaskit.GaskitError) as info:
                gaskit.density(fluid, P[i], T[i], model=model)
            assert info.value.status == rho.status[i]


def test_liquid_rows_in_contents():
    c = arrays.contents("CO2", V, P, T, reference="iupac", model="pr")
    assert c.status[6] == 4  # 60 bar, 280 K: liquid CO2, GK_ERR_RANGE
    zz = arrays.z("CO2", P, T, model="pr")
    assert zz.ok[6]  # Z itself is reported for the liquid root


def test_errors_raise_names_element_and_argument():
    with pytest.raises(gaskit.DomainError) as info:
        arrays.density("N2", P, T, errors="raise")
    assert info.value.index == 3 and info.value.argument == "p"
    with pytest.raises(gaskit.DomainError):
        arrays.density("N2", P, T).raise_for_status()
    ok = arrays.density("N2", P[:3], T[:3], errors="raise")
    assert ok.ok.all()
    with pytest.raises(gaskit.ArgumentError):
        arrays.density("N2", P, T, errors="ignore")


def test_whole_array_argument_errors_raise():
    with pytest.raises(gaskit.NotFoundError):
        arrays.density("N3", P, T)
    with pytest.raises(gaskit.ArgumentError):
        arrays.density("N2", P, T, model="tabular")
    with pytest.raises(gaskit.ArgumentError):
        arrays.density("N2", P, T[:3])  # does not broadcast


def test_broadcast_shapes_units_and_empty():
    p = np.linspace(1, 200, 12).reshape(3, 4)
    r = arrays.density("N2", p, 20.0, p_unit="bar", t_unit="degC")
    assert r.value.shape == (3, 4)
    assert r.value[2, 3] == pytest.approx(gaskit.density("N2", "200bar", "20degC"), rel=1e-12)
    g = arrays.density("N2", p, "20degC", p_unit="bar", unit="g/L")
    assert np.allclose(g.value, r.value, rtol=1e-12)
    e = arrays.density("N2", np.array([]), 300.0)
    assert e.value.shape == (0,) and e.status.shape == (0,)
    lists = arrays.z("N2", [1e5, 2e5], [300, 300])
    assert lists.ok.all()
    ints = arrays.z("N2", np.array([100000, 200000]), np.array([300, 300]))
    assert np.array_equal(ints.value, lists.value)


def test_flow_units_and_amount():
    q = arrays.flow_to_reference("air", [120.0, 0.0, -120.0], "3bar", "25degC",
                                 reference="0C_101325Pa", flow_unit="L/min", unit="L/min")
    assert q.ok.all() and q.value[1] == 0.0 and q.value[2] == -q.value[0]
    n = arrays.amount("N2", [50.0], [2150.0], [71.6], volume_unit="L", p_unit="psi",
                      t_unit="degF", model="ideal")
    pv = gaskit.quantity("2150psi", "pressure") * 0.05
    assert n.value[0] == pytest.approx(pv / (8.314462618 * gaskit.quantity("71.6degF",
                                                                          "temperature")),
                                       rel=2e-6 if gaskit.build_info().float_build else 1e-12)


def test_kij_changes_the_mixture():
    text = "CH4=0.9, CO2=0.1"
    f0 = gaskit.fluid(text)
    f1 = gaskit.fluid(text, kij=[[0, 0.1], [0.1, 0]])
    a = arrays.z(f0, 5e6, 250).value
    b = arrays.z(f1, 5e6, 250).value
    assert a != b
    with pytest.raises(gaskit.DomainError):
        gaskit.z(gaskit.fluid(text, kij=[[0, 2.0], [2.0, 0]]), 5e6, 250)
