"""Psychrometric states: water in air against CoolProp, a solvent in nitrogen by its own relations."""

from __future__ import annotations

import numpy as np
import pytest

import masstransfer as mt
from masstransfer import humidity

CP = pytest.importorskip("CoolProp.CoolProp")

ATM = 101325.0
_STATES = [(283.15, 0.8), (293.15, 0.9), (303.15, 0.5), (323.15, 0.1), (343.15, 0.3), (353.15, 0.2)]


@pytest.mark.parametrize(("T", "rh"), _STATES, ids=[f"{t - 273.15:.0f}C-rh{r}" for t, r in _STATES])
def test_water_in_air_against_coolprop(T, rh):
    # Reference: CoolProp HAPropsSI (real humid air, ASHRAE RP-1485 / Hyland-Wexler model).
    # Ours is an ideal mixture without the enhancement factor (about 1.004 at 1 atm), so the
    # humidity ratio lies 0.3-0.7 % below; the dew point follows the vapour pressure alone.
    s = humidity.humid_gas_state("water", "air", T=T, P=ATM, relative_humidity=rh)
    W = CP.HAPropsSI("W", "T", T, "P", ATM, "R", rh)  # CoolProp HAPropsSI
    assert s.humidity_ratio == pytest.approx(W, rel=0.01)
    assert s.dew_point == pytest.approx(CP.HAPropsSI("D", "T", T, "P", ATM, "R", rh), abs=0.05)  # CoolProp
    H = CP.HAPropsSI("H", "T", T, "P", ATM, "R", rh)  # CoolProp HAPropsSI, dry air and liquid water at 0 C
    assert s.enthalpy == pytest.approx(H, rel=0.01, abs=300.0)
    # CoolProp's "B" is the thermodynamic (adiabatic-saturation) wet bulb
    assert s.adiabatic_saturation == pytest.approx(CP.HAPropsSI("B", "T", T, "P", ATM, "R", rh), abs=0.05)
    Vda = CP.HAPropsSI("Vda", "T", T, "P", ATM, "R", rh)  # CoolProp HAPropsSI, m^3 per kg dry air
    assert s.humid_volume == pytest.approx(Vda, rel=0.005)


def test_psychrometric_wet_bulb_is_the_wet_surface_temperature():
    s = humidity.humid_gas_state("water", "air", T=313.15, relative_humidity=0.3)
    assert s.wet_bulb == pytest.approx(mt.wet_bulb_temperature(313.15, 0.3), abs=1e-9)


@pytest.mark.parametrize(
    ("T", "Ws", "source"),
    [
        (293.15, 0.014758, "ASHRAE Handbook Fundamentals 2017, ch. 1, Table 2 (from memory)"),
        (303.15, 0.027329, "ASHRAE Handbook Fundamentals 2017, ch. 1, Table 2 (from memory)"),
    ],
)
def test_saturated_humidity_ratio_table(T, Ws, source):
    s = humidity.humid_gas_state("water", "air", T=T, relative_humidity=1.0)
    assert s.humidity_ratio == pytest.approx(Ws, rel=0.01), source


def test_every_humidity_keyword_gives_the_same_state():
    # own relations: the four measures describe one state (toluene in nitrogen, library properties)
    base = humidity.humid_gas_state("toluene", "nitrogen", T=330.0, y=0.03)
    for kw in ({"humidity_ratio": base.humidity_ratio}, {"relative_humidity": base.relative_humidity}):
        other = humidity.humid_gas_state("toluene", "nitrogen", T=330.0, **kw)
        assert other.y == pytest.approx(0.03, rel=1e-9)
    by_dew = humidity.humid_gas_state("toluene", "nitrogen", T=330.0, dew_point=base.dew_point)
    assert by_dew.y == pytest.approx(0.03, rel=1e-7)
    assert mt.liquid_model("toluene").vapor_pressure(base.dew_point) == pytest.approx(0.03 * ATM, rel=1e-8)


def test_solvent_in_nitrogen_wet_bulb_exceeds_adiabatic_saturation():
    # For organic vapours the psychrometric ratio is near 2, so the wet bulb lies above the
    # adiabatic-saturation temperature (Treybal, Mass-Transfer Operations, 3rd ed., Section 7.1;
    # from memory); for water in air the two nearly coincide.
    s = humidity.humid_gas_state("toluene", "nitrogen", T=330.0, y=0.02)
    assert s.wet_bulb > s.adiabatic_saturation + 2.0
    w = humidity.humid_gas_state("water", "air", T=330.0, y=0.02)
    assert abs(w.wet_bulb - w.adiabatic_saturation) < 1.5


def test_adiabatic_saturation_balance_and_enthalpy_slope():
    s = humidity.humid_gas_state("ethanol", "nitrogen", T=340.0, y=0.01)
    sat = humidity.humid_gas_state("ethanol", "nitrogen", T=s.adiabatic_saturation, relative_humidity=1.0)
    cp_liquid = mt.liquid_model("ethanol").heat_capacity(0.5 * (s.T_ref + sat.T))
    h_liquid = cp_liquid * (sat.T - s.T_ref)
    assert s.enthalpy + (sat.humidity_ratio - s.humidity_ratio) * h_liquid == pytest.approx(
        sat.enthalpy, rel=1e-3
    )
    up = humidity.humid_gas_state("ethanol", "nitrogen", T=340.5, humidity_ratio=s.humidity_ratio)
    assert (up.enthalpy - s.enthalpy) / 0.5 == pytest.approx(s.humid_heat, rel=1e-3)


def test_arrays_broadcast_and_match_scalars():
    T = np.array([300.0, 320.0, 340.0])
    s = humidity.humid_gas_state("water", "air", T=T, P=[1e5, 1.5e5, 2e5], relative_humidity=0.4)
    for i, Ti in enumerate(T):
        one = humidity.humid_gas_state("water", "air", T=Ti, P=[1e5, 1.5e5, 2e5][i], relative_humidity=0.4)
        assert s.humidity_ratio[i] == pytest.approx(one.humidity_ratio, rel=1e-12)
        assert s.dew_point[i] == pytest.approx(one.dew_point, rel=1e-12)


def test_numbers_in_conversions_round_trip():
    Y = humidity.humidity_ratio_from_y(0.02, 0.018015, 0.028965)
    assert pytest.approx(0.02 / 0.98 * 0.018015 / 0.028965) == Y
    assert humidity.y_from_humidity_ratio(Y, 0.018015, 0.028965) == pytest.approx(0.02)


def test_user_vapour_pressure_is_used_and_recorded():
    # an Antoine fit written by the user for water (constants invented for this test)
    def antoine(T):
        return 133.322 * 10 ** (8.07131 - 1730.63 / (T - 273.15 + 233.426))

    s = humidity.humid_gas_state("water", "air", T=303.15, relative_humidity=0.5, vapour_pressure=antoine)
    assert s.saturation_pressure == pytest.approx(antoine(303.15))
    assert s.user_supplied == ("vapour_pressure",)


def test_clear_errors():
    with pytest.raises(mt.errors.InputTypeError, match="exactly one humidity"):
        humidity.humid_gas_state("water", "air", T=300.0)
    with pytest.raises(mt.errors.InputTypeError, match="exactly one humidity"):
        humidity.humid_gas_state("water", "air", T=300.0, y=0.01, relative_humidity=0.5)
    with pytest.raises(mt.errors.InputValueError, match="saturation"):
        humidity.humid_gas_state("water", "air", T=300.0, y=0.2)
    with pytest.raises(mt.errors.InputValueError, match="dew_point"):
        humidity.humid_gas_state("water", "air", T=300.0, dew_point=310.0)
    with pytest.raises(mt.errors.InputValueError, match="evaporating liquid itself"):
        humidity.humid_gas_state("water", {"air": 0.9, "water": 0.1}, T=300.0, y=0.01)
    dry = humidity.humid_gas_state("water", "air", T=300.0, y=0.0)
    assert dry.humidity_ratio == 0.0
    with pytest.raises(mt.errors.OutOfRangeError, match="no dew point"):
        _ = dry.dew_point
