from __future__ import annotations

import math

import numpy as np
import pytest

import masstransfer as mt


@pytest.mark.parametrize("bad", [float("nan"), float("inf"), -1.0, 0.0])
@pytest.mark.parametrize("arg", ["T", "P"])
def test_bad_state_names_argument_value_and_fix(arg, bad):
    kwargs = {"T": 300.0, "P": 101325.0, arg: bad}
    with pytest.raises(mt.errors.InputValueError) as info:
        mt.gas_diffusivity("water", "air", **kwargs)
    msg = str(info.value)
    assert msg.startswith(f"{arg}=")
    assert "pass" in msg
    assert isinstance(info.value, ValueError)
    assert isinstance(info.value, mt.MassTransferError)


def test_bad_entry_in_array_is_reported():
    with pytest.raises(mt.errors.InputValueError, match="array of shape \\(3,\\)"):
        mt.gas_diffusivity("water", "air", np.array([300.0, math.nan, 310.0]))


def test_mismatched_shapes():
    with pytest.raises(mt.errors.InputShapeError, match="broadcast"):
        mt.gas_diffusivity("water", "air", np.ones(3) * 300, np.ones(4) * 1e5)


def test_unknown_species_and_method():
    with pytest.raises(mt.errors.UnknownSpeciesError):
        mt.gas_diffusivity("no-such-compound-q", "air", 300.0)
    with pytest.raises(mt.errors.UnknownMethodError, match="did you mean 'fuller'"):
        mt.gas_diffusivity("water", "air", 300.0, method="fulller")
    with pytest.raises(mt.errors.UnknownMethodError, match="wilke-chang"):
        mt.liquid_diffusivity("benzene", "water", 300.0, method="nope")


def test_missing_constant_names_method_and_fix():
    lonely = mt.Species(name="oligomer (invented)", molar_mass=0.3)
    with pytest.raises(mt.errors.MissingConstantError, match=r"sigma.*Chapman-Enskog.*replace"):
        mt.gas_diffusivity(lonely, "air", 300.0, method="chapman-enskog")
    with pytest.raises(mt.errors.MissingConstantError, match="fuller_volume"):
        mt.gas_diffusivity(lonely, "air", 300.0)
    with pytest.raises(mt.errors.MissingConstantError, match="Vb"):
        mt.liquid_diffusivity(lonely, "water", 300.0)


def test_wrong_types_are_type_errors_of_the_family():
    for bad in ("300", [300.0, "hot"], ["300"], None, 300.0 + 0j, True, np.array([True])):
        with pytest.raises(mt.errors.InputTypeError, match=r"not a number|not real numbers") as err:
            mt.gas_diffusivity("water", "air", bad)  # type: ignore[arg-type]
        assert isinstance(err.value, TypeError)
        assert isinstance(err.value, mt.MassTransferError)
        assert "T" in str(err.value)


def test_masked_array_is_refused_not_unmasked():
    T = np.ma.array([300.0, 1e9], mask=[False, True])
    with pytest.raises(mt.errors.InputTypeError, match="masked"):
        mt.diffusivity.fuller(T, 1e5, 0.018, 0.029, 13.1, 19.7)


def test_internal_bug_surfaces_as_itself(monkeypatch):
    """A broken helper inside the library is not dressed up as an input error."""
    from masstransfer.surface import _conventions

    def broken(*args: object, **kwargs: object) -> float:
        raise AttributeError("internal helper is broken")

    monkeypatch.setattr(_conventions, "check_positive", broken)
    with pytest.raises(AttributeError, match="internal helper is broken") as err:
        mt.surface.ky_from_kc(0.01, T=300.0, P=1e5)
    assert not isinstance(err.value, mt.MassTransferError)
    assert err.traceback[-1].name == "broken"  # the traceback reaches the helper itself


def test_overflow_is_an_input_error_chained_and_named():
    with pytest.raises(mt.errors.InputValueError, match=r"not finite|overflow") as err:
        mt.surface.grashof_thermal(L=1e59, beta=1e50, dT=1.0, nu=1e-45)
    assert "L=1e+59 is the most extreme input" in str(err.value)
    with pytest.raises(mt.errors.InputTypeError):
        mt.gas_diffusivity(42, "air", 300.0)  # type: ignore[arg-type]


def test_molar_mass_in_grams_is_caught():
    with pytest.raises(mt.errors.InputValueError, match="kg/mol"):
        mt.diffusivity.fuller(300.0, 1e5, 32.0, 28.0, 16.3, 18.5)


def test_empty_array_gives_empty_result():
    out = mt.gas_diffusivity("water", "air", np.array([]))
    assert isinstance(out, np.ndarray)
    assert out.shape == (0,)


def test_hand_built_species_works_with_fuller():
    s = mt.Species(name="siloxane (invented)", molar_mass=0.2964, fuller_volume=250.0)
    d = mt.gas_diffusivity(s, "air", 300.0)
    assert 1e-6 < d < 1e-5


def test_a_keyword_the_function_does_not_take_is_refused_in_the_family():
    from masstransfer import surface
    from masstransfer.errors import InputTypeError

    # graetz's diameter was once called D, which means a diffusivity everywhere else
    with pytest.raises(InputTypeError, match=r"graetz\(\).*it takes \(Re, Pr, diameter, x\)"):
        surface.graetz(Re=100.0, Pr=0.7, D=0.01, x=1.0)
