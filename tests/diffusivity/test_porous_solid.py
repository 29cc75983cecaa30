from __future__ import annotations

import numpy as np
import pytest

import masstransfer as mt


def test_knudsen_by_hand():
    # D_K = d/3 sqrt(8RT/(pi M)), by hand for O2 in 10 nm pores at 300 K
    expected = 10e-9 / 3 * np.sqrt(8 * 8.314462618 * 300.0 / (np.pi * 0.032))
    assert mt.diffusivity.knudsen_diffusivity(300.0, 10e-9, 0.032) == pytest.approx(expected)


def test_knudsen_textbook_value():
    # Satterfield (1970), Mass Transfer in Heterogeneous Catalysis, Eq. 1.8 in cgs form:
    # D_K = 9700 r sqrt(T/M) cm^2/s with r in cm (from memory)
    r_cm = 5e-7
    assert mt.diffusivity.knudsen_diffusivity(300.0, 2 * r_cm / 100, 0.032) == pytest.approx(
        9700 * r_cm * np.sqrt(300.0 / 32.0) * 1e-4, rel=0.01
    )


def test_bosanquet_limits():
    assert mt.diffusivity.bosanquet(1e-5, 1e3) == pytest.approx(1e-5, rel=1e-6)
    assert mt.diffusivity.bosanquet(1e3, 1e-7) == pytest.approx(1e-7, rel=1e-6)


def test_effective_diffusivity():
    assert mt.diffusivity.effective_diffusivity(1e-6, 0.4, 4.0) == pytest.approx(1e-7)
    with pytest.raises(mt.errors.InputValueError, match="porosity"):
        mt.diffusivity.effective_diffusivity(1e-6, 1.5, 4.0)
    with pytest.raises(mt.errors.InputValueError, match="tortuosity"):
        mt.diffusivity.effective_diffusivity(1e-6, 0.4, 0.5)


def test_arrhenius_carbon_in_iron():
    # Callister, Materials Science and Engineering, Table 5.2: C in gamma-Fe, D0 = 2.3e-5 m^2/s,
    # Qd = 148 kJ/mol; at 900 C (1173 K) D = 5.9e-12 m^2/s (from memory)
    assert mt.diffusivity.arrhenius_diffusivity(1173.0, 2.3e-5, 148e3) == pytest.approx(5.9e-12, rel=0.06)


def test_arrhenius_fit_round_trip():
    T = np.array([900.0, 1000.0, 1100.0, 1200.0])
    D = mt.diffusivity.arrhenius_diffusivity(T, 2.3e-5, 148e3)
    fit = mt.diffusivity.arrhenius_parameters(T, D)
    assert pytest.approx(2.3e-5, rel=1e-8) == fit.D0
    assert fit.Ea == pytest.approx(148e3, rel=1e-8)
    assert fit.n_points == 4
    assert fit.Ea_stderr == pytest.approx(0.0, abs=1e-3)  # exact data: no scatter


def test_arrhenius_fit_standard_error_against_a_by_hand_regression():
    # noisy invented data; the standard error of the slope of ln D on 1/T by the textbook formula
    # s_b = sqrt(SSE/(n-2) / Sxx)
    T = np.array([900.0, 1000.0, 1100.0, 1200.0, 1300.0])
    D = mt.diffusivity.arrhenius_diffusivity(T, 2.3e-5, 148e3) * np.array([1.05, 0.97, 1.02, 0.96, 1.03])
    fit = mt.diffusivity.arrhenius_parameters(T, D)
    x, y = 1 / T, np.log(D)
    b, a = np.polyfit(x, y, 1)
    sse = float(np.sum((y - (a + b * x)) ** 2))
    sxx = float(np.sum((x - x.mean()) ** 2))
    assert fit.Ea_stderr == pytest.approx(8.314462618 * np.sqrt(sse / 3 / sxx), rel=1e-9)
    assert mt.diffusivity.arrhenius_parameters(T[:2], D[:2]).Ea_stderr is None


def test_orders_of_magnitude_by_phase():
    # common practice: gases about 1e-5 m^2/s (1e-6 to 1e-4), liquids about 1e-9,
    # solids 1e-12 and far lower, down to about 1e-21 for metals in metals
    gas = mt.gas_diffusivity("toluene", "air", 298.15)
    assert 1e-6 < gas < 1e-4
    assert 1e-6 < mt.gas_diffusivity("hydrogen", "helium", 298.15) < 1e-3
    liq = mt.liquid_diffusivity("ethanol", "water", 298.15)
    assert 1e-10 < liq < 1e-8
    # a metal in a metal near room temperature (Callister Table 5.2: Cu in Cu, D0 7.8e-5 m^2/s,
    # Qd 211 kJ/mol; from memory) lies near or below the 1e-21 end of the scale
    cu = mt.diffusivity.arrhenius_diffusivity(500.0, 7.8e-5, 211e3)
    assert cu < 1e-21
    assert gas / liq > 1e3
