"""Library statuses become exceptions with the status name and the argument at fault."""
import pytest

import gaskit
from gaskit import errors


@pytest.mark.parametrize("call,cls,name,argument", [
    (lambda: gaskit.density("N2", "-5bar", 300), gaskit.DomainError, "GK_ERR_DOMAIN", "p"),
    (lambda: gaskit.density("N2", 1e5, float("nan")), gaskit.DomainError, "GK_ERR_DOMAIN", "t"),
    (lambda: gaskit.contents("N2", 0.0, 1e5, 300, reference="iupac"), gaskit.DomainError,
     "GK_ERR_DOMAIN", "volume"),
    (lambda: gaskit.mass_flow("N2", float("inf"), 1e5, 300), gaskit.DomainError,
     "GK_ERR_DOMAIN", "flow"),
    (lambda: gaskit.dry_gas_pressure(2000, 300, 1.0), gaskit.NoSolutionError,
     "GK_ERR_NO_SOLUTION", "p, t"),
    (lambda: gaskit.contents("CO2", "50L", "60bar", 280, reference="iupac"), gaskit.RangeError,
     "GK_ERR_RANGE", "p, t"),
    (lambda: gaskit.density("N3", 1e5, 300), gaskit.NotFoundError, "GK_ERR_NOT_FOUND", "fluid"),
    (lambda: gaskit.density("N2=0.5, O2=0.2", 1e5, 300), gaskit.CompositionError,
     "GK_ERR_COMPOSITION", "fluid"),
    (lambda: gaskit.density("N2=abc, O2=balance", 1e5, 300), gaskit.ParseError, "GK_ERR_PARSE",
     "fluid"),
    (lambda: gaskit.density("N2", "200 furlongs", 300), gaskit.NotFoundError, "GK_ERR_NOT_FOUND",
     "p"),
    (lambda: gaskit.density("N2", "200", 300), gaskit.ParseError, "GK_ERR_PARSE", "p"),
    (lambda: gaskit.density("N2", 1e5, "300 L"), gaskit.ArgumentError, "GK_ERR_ARGUMENT", "t"),
    (lambda: gaskit.density("N2", 1e5, 300, model="tabular"), gaskit.ArgumentError,
     "GK_ERR_ARGUMENT", "model"),
])
def test_status_to_exception(call, cls, name, argument):
    with pytest.raises(cls) as info:
        call()
    e = info.value
    assert isinstance(e, gaskit.GaskitError)
    assert e.status_name == name
    assert gaskit.STATUS_NAMES[e.status] == name
    assert e.argument == argument
    assert name in str(e)


def test_builtin_bases():
    with pytest.raises(ValueError):
        gaskit.density("N2", -1.0, 300)
    with pytest.raises(LookupError):
        gaskit.gas("unobtainium")
    with pytest.raises(ArithmeticError):
        gaskit.contents("CO2", 0.05, 6e6, 280, reference="iupac")


def test_error_for_every_status():
    for status, name in enumerate(gaskit.STATUS_NAMES[1:], start=1):
        e = errors.error_for_status(status, argument="x", value=1.0, index=3)
        assert e.status == status and e.status_name == name
        assert "element 3" in str(e) and "argument x = 1.0" in str(e)
    e = errors.error_for_status(99)
    assert type(e) is gaskit.GaskitError and e.status == 99


def test_domain_error_carries_value():
    with pytest.raises(gaskit.DomainError) as info:
        gaskit.z("N2", 1e5, -3.0)
    assert info.value.value == -3.0 and info.value.index is None
