from __future__ import annotations

import numpy as np
import pytest

import masstransfer as mt

CP = pytest.importorskip("CoolProp.CoolProp")

_T_C = [10.0, 20.0, 30.0, 40.0, 50.0]
_RH = [0.1, 0.3, 0.5, 0.7, 0.9]


@pytest.mark.parametrize("T_c", _T_C)
@pytest.mark.parametrize("rh", _RH)
def test_wet_bulb_against_coolprop(T_c, rh):
    # Reference: CoolProp HAPropsSI('B', ...), the thermodynamic (adiabatic-saturation) wet bulb of
    # real humid air (Hyland & Wexler / ASHRAE RP-1485 model).
    #
    # Why the two differ: ours is the psychrometric wet bulb, the steady temperature of a wetted
    # surface where convected heat h (T - T_wb) pays for evaporation k_y (y_s - y) lambda. Its
    # depression T - T_wb scales with 1 / (psychrometric ratio), and the Chilton-Colburn analogy
    # sets that ratio to Le^(2/3) = (alpha/D)^(2/3), about 0.90 for water vapour in air. The
    # adiabatic-saturation temperature corresponds to a ratio of exactly 1 (the humid heat).
    # A ratio below 1 deepens the depression, so the psychrometric value lies below the
    # thermodynamic one by a fraction of the depression of order 1 - 0.9 (partly offset by the
    # humid heat exceeding the dry-air cp); here the gap is 1-6 %. With property and diffusivity
    # errors of a few per cent this justifies a tolerance of 7 % of the depression (plus 0.05 K
    # for the reference models), and the sign test below.
    T = T_c + 273.15
    ref = CP.HAPropsSI("B", "T", T, "P", 101325.0, "R", rh)
    ours = mt.wet_bulb_temperature(T, rh)
    depression = T - ref
    assert abs(ours - ref) <= 0.07 * depression + 0.05
    assert ours <= ref + 0.05


def test_saturated_air_wet_bulb_equals_dry_bulb():
    assert mt.wet_bulb_temperature(300.0, 1.0) == pytest.approx(300.0, abs=1e-9)


def test_arrays_and_monotonicity():
    T = np.full(5, 303.15)
    rh = np.linspace(0.1, 0.9, 5)
    wb = mt.wet_bulb_temperature(T, rh)
    assert np.all(np.diff(wb) > 0)
    for t, r, w in zip(T, rh, wb, strict=True):
        assert mt.wet_bulb_temperature(float(t), float(r)) == pytest.approx(w, abs=1e-9)


def test_other_liquids_evaporate_colder():
    # ethanol has a larger vapour pressure and a psychrometric ratio near 2 (Treybal 3rd ed. Section 7.1):
    # into dry air at 25 C its wet surface sits well below water's
    t_eth = mt.wet_surface_temperature("ethanol", "air", 298.15, 0.0)
    t_w = mt.wet_surface_temperature("water", "air", 298.15, 0.0)
    assert t_eth < t_w < 298.15


def test_bad_input():
    with pytest.raises(mt.errors.InputValueError, match="relative_humidity"):
        mt.wet_bulb_temperature(300.0, 1.5)
    with pytest.raises(mt.errors.InputValueError, match="relative_humidity"):
        mt.wet_bulb_temperature(300.0, -0.1)
    with pytest.raises(mt.errors.InputValueError, match=r"^T="):
        mt.wet_bulb_temperature(float("nan"), 0.5)
    with pytest.raises(mt.errors.OutOfRangeError, match="freeze"):
        mt.wet_bulb_temperature(276.0, 0.05)
