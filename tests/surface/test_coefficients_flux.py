from __future__ import annotations

import numpy as np
import pytest
from hypothesis import given
from hypothesis import strategies as st

import masstransfer as mt
from masstransfer import surface as co
from masstransfer import surface as fx

R = 8.314462618


def test_treybal_illustration_2_1_oxygen_through_stagnant_co():
    # Treybal, Mass-Transfer Operations 3rd ed., Illustration 2.1: 0 C, 1e5 Pa, p_A 13000 -> 6500 Pa
    # across 2 mm, D = 1.87e-5 m^2/s; N_A = 2.97e-5 kmol/(m^2 s)
    N = fx.stagnant_film_flux(1.87e-5, 273.15, 1e5, 13000.0, 6500.0, 0.002)
    assert pytest.approx(2.97e-2, rel=3e-3) == N  # mol/(m^2 s)
    # the same by the log-mean form of Treybal Eq. 2.25
    p_bm = co.log_mean(1e5 - 6500.0, 1e5 - 13000.0)
    assert pytest.approx(1.87e-5 * 1e5 / (R * 273.15 * 0.002 * p_bm) * 6500.0, rel=1e-10) == N
    # equimolar counter-diffusion through the same film carries p_BM/P times the stagnant-film flux
    # (Treybal 3rd ed. Eqs. 2.25 and 2.30)
    eq = fx.equimolar_flux(1.87e-5, 273.15, 13000.0, 6500.0, 0.002)
    assert eq == pytest.approx(N * p_bm / 1e5, rel=1e-10)


def test_fick_flux_and_linear_profile():
    J = fx.fick_flux(2e-9, 40.0, 10.0, 0.5e-3)
    assert pytest.approx(2e-9 * 30.0 / 0.5e-3) == J
    x = np.linspace(0.0, 0.5e-3, 11)
    c = fx.fick_profile(x, 40.0, 10.0, 0.5e-3)
    assert np.allclose(np.diff(c), np.diff(c)[0])
    # the flux from the profile's slope equals Fick's law
    assert -2e-9 * (c[-1] - c[0]) / 0.5e-3 == pytest.approx(J)
    with pytest.raises(mt.errors.InputValueError, match="thickness"):
        fx.fick_flux(2e-9, 40.0, 10.0, 0.0)


@given(k=st.floats(1e-6, 10.0), T=st.floats(200.0, 1500.0), P=st.floats(1e3, 1e7), c=st.floats(1.0, 6e4))
def test_conversions_round_trip(k, T, P, c):
    assert co.kc_from_kG(co.kG_from_kc(k, T), T) == pytest.approx(k, rel=1e-12)
    assert co.kc_from_ky(co.ky_from_kc(k, T, P), T, P) == pytest.approx(k, rel=1e-12)
    assert co.kL_from_kx(co.kx_from_kL(k, c), c) == pytest.approx(k, rel=1e-12)
    assert co.k_from_F(co.F_from_k(k, 0.7), 0.7) == pytest.approx(k, rel=1e-12)
    assert co.molar_basis_from_mass(co.mass_basis_from_molar(k, 0.029), 0.029) == pytest.approx(k, rel=1e-12)


def test_conventions_give_the_same_flux():
    # N_A = k_c dc = k_G dp = k_y dy (Treybal 3rd ed. Table 3.1)
    k_c, T, P, dy = 0.02, 320.0, 101325.0, 0.01
    dp, dc = dy * P, dy * P / (R * T)
    assert k_c * dc == pytest.approx(co.kG_from_kc(k_c, T) * dp)
    assert k_c * dc == pytest.approx(co.ky_from_kc(k_c, T, P) * dy)


@given(phi=st.floats(-1e-3, 1e-3))
def test_high_flux_correction_tends_to_one(phi):
    assert fx.high_flux_correction(phi) == pytest.approx(1.0, abs=1e-3)


def test_high_flux_correction_values_and_rate():
    # film theory, Bird, Stewart & Lightfoot 2nd ed. Eq. 22.8-23: theta = phi/(e^phi - 1)
    assert fx.high_flux_correction(1.0) == pytest.approx(1.0 / (np.e - 1.0))
    assert fx.high_flux_correction(0.0) == 1.0
    assert fx.high_flux_correction(-1.0) > 1.0
    # the stagnant-carrier rate reduces to F*dy at low concentrations
    assert fx.high_flux_rate(2.0, 1e-6, 0.0) == pytest.approx(2.0e-6, rel=1e-5)
    # and equals the log form exactly (Treybal Eq. 3.1 with N_A/N = 1)
    assert fx.high_flux_rate(2.0, 0.3, 0.05) == pytest.approx(2.0 * np.log(0.95 / 0.7))
    # film theory (Bird, Stewart & Lightfoot 2nd ed. Section 22.8): N_A - y_s N = F theta(N/F) (y_s - y_b),
    # with N = N_A for a stagnant carrier; the log form and the corrected coefficient agree exactly
    N = fx.high_flux_rate(2.0, 0.3, 0.05)
    assert pytest.approx(2.0 * fx.high_flux_correction(N / 2.0) * (0.3 - 0.05), rel=1e-12) == N * (1 - 0.3)
    with pytest.raises(mt.errors.InputValueError):
        fx.high_flux_rate(2.0, 1.2, 0.0)


def test_ackermann_correction():
    assert fx.ackermann_correction(0.0, 34.0, 30.0) == 1.0
    assert fx.ackermann_correction(0.05, 34.0, 30.0) == pytest.approx(
        fx.high_flux_correction(0.05 * 34.0 / 30.0)
    )


def test_two_film_overall_coefficients():
    # Treybal 3rd ed. Eqs. 5.11-5.12; by hand
    ky, kx, m = 1.2, 3.0, 25.0
    Ky = co.overall_gas_coefficient(ky, kx, m)
    Kx = co.overall_liquid_coefficient(ky, kx, m)
    assert 1 / Ky == pytest.approx(1 / ky + m / kx)
    assert 1 / Kx == pytest.approx(1 / (m * ky) + 1 / kx)
    assert Kx == pytest.approx(m * Ky)  # same resistance, two bases


def test_henry_constants_from_thermo_tables():
    from masstransfer.substances import henry_constant

    # Sander (2015), Atmos. Chem. Phys. 15, 4399: O2 in water at 298.15 K, Hcp about 1.3e-5 mol/(m^3 Pa);
    # on the mole-fraction scale H = c_water / Hcp = 55345/1.3e-5 = 4.26e9 Pa
    assert henry_constant("oxygen", "water", 298.15) == pytest.approx(55345 / 1.3e-5, rel=0.05)
    # CO2: Hcp about 3.3e-4 mol/(m^3 Pa) (Sander 2015) -> 1.68e8 Pa
    assert henry_constant("carbon dioxide", "water", 298.15) == pytest.approx(55345 / 3.3e-4, rel=0.06)
    # solubility falls as T rises
    H = henry_constant("oxygen", "water", np.array([283.15, 298.15, 313.15]))
    assert np.all(np.diff(H) > 0)
    with pytest.raises(mt.errors.MissingConstantError):
        henry_constant("oxygen", "n-hexadecane", 298.15)


def test_log_mean():
    assert co.log_mean(2.0, 1.0) == pytest.approx(1.0 / np.log(2.0))
    assert co.log_mean(1.0, 1.0) == 1.0
    assert co.log_mean(1.0 + 1e-9, 1.0) == pytest.approx(1.0 + 5e-10, rel=1e-12)
