"""Packed columns: each equation evaluated by hand, the packing table, the ratings, invariants."""

from __future__ import annotations

import dataclasses
import math
import warnings

import numpy as np
import pytest
from hypothesis import given
from hypothesis import strategies as st

import masstransfer as mt
from masstransfer import contactors as c
from masstransfer.errors import EnvelopeWarning, InputValueError, MissingConstantError, UnknownMethodError

G = 9.80665
R = 8.31446261815324
WATER = {"rho_L": 998.0, "mu_L": 1.0e-3}


def test_onda_wetted_area_by_hand():
    a, sc, s, Lm, mu, rho = 112.6, 0.075, 0.072, 5.0, 1.0e-3, 998.0
    Re, Fr, We = Lm / (a * mu), Lm**2 * a / (rho**2 * G), Lm**2 / (rho * s * a)
    expected = a * (1 - math.exp(-1.45 * (sc / s) ** 0.75 * Re**0.1 * Fr**-0.05 * We**0.2))
    assert c.onda_wetted_area(a, sc, s, Lm, mu, rho) == pytest.approx(expected, rel=1e-12)


def test_onda_k_L_by_hand():
    Lm, aw, mu, rho, D, a, dp = 5.0, 60.0, 1.0e-3, 998.0, 1.9e-9, 112.6, 0.05
    expected = 0.0051 * (Lm / (aw * mu)) ** (2 / 3) * (mu / (rho * D)) ** -0.5 * (a * dp) ** 0.4
    expected /= (rho / (mu * G)) ** (1 / 3)
    assert c.onda_k_L(Lm, aw, mu, rho, D, a, dp) == pytest.approx(expected, rel=1e-12)


@pytest.mark.parametrize(("dp", "C"), [(0.05, 5.23), (0.0127, 2.0)], ids=["large-5.23", "small-2.0"])
def test_onda_k_G_by_hand_with_the_size_constant(dp, C):
    Gm, a, mu, rho, D, T = 1.8, 112.6, 1.8e-5, 1.2, 1.6e-5, 298.15
    group = C * (Gm / (a * mu)) ** 0.7 * (mu / (rho * D)) ** (1 / 3) * (a * dp) ** -2.0
    assert c.onda_k_G(Gm, a, mu, rho, D, dp, T) == pytest.approx(group * a * D / (R * T), rel=1e-12)


def test_billet_schultes_by_hand():
    uL, uV, a, eps, CL, CV, Ch = 0.005, 1.5, 112.6, 0.951, 1.192, 0.41, 0.784
    rho, mu, D = 998.0, 1.0e-3, 1.9e-9
    rV, muV, DV, T = 1.2, 1.8e-5, 1.6e-5, 298.15
    dh = 4 * eps / a
    kL = CL * (G * rho / mu) ** (1 / 6) * (D / dh) ** 0.5 * (uL / a) ** (1 / 3)
    assert c.billet_schultes_k_L(uL, a, eps, CL, rho, mu, D) == pytest.approx(kL, rel=1e-12)
    # the same k_L in the hold-up form: C_L 12^(1/6) (u_L/h_L)^(1/2) (D/d_h)^(1/2), h_L without a_h/a
    h0 = (12 * mu * a**2 * uL / (G * rho)) ** (1 / 3)
    assert kL == pytest.approx(CL * 12 ** (1 / 6) * (uL / h0) ** 0.5 * (D / dh) ** 0.5, rel=1e-12)
    ReL, FrL = uL * rho / (a * mu), uL**2 * a / G
    ah = 0.85 * Ch * ReL**0.25 * FrL**0.1  # Re_L = 8.9 >= 5
    hL = h0 * ah ** (2 / 3)
    assert c.billet_schultes_holdup(uL, a, Ch, rho, mu) == pytest.approx(hL, rel=1e-12)
    kc = CV / math.sqrt(eps - hL) * math.sqrt(a / dh) * DV * (uV * rV / (a * muV)) ** 0.75
    kc *= (muV / (rV * DV)) ** (1 / 3)
    got = c.billet_schultes_k_G(uV, uL, a, eps, CV, Ch, rV, muV, DV, rho, mu, T)
    assert got == pytest.approx(kc / (R * T), rel=1e-12)


def test_billet_schultes_holdup_low_reynolds_branch():
    uL, a, Ch, rho, mu = 0.0005, 112.6, 0.784, 998.0, 1.0e-3  # Re_L = 4.4 < 5
    ReL, FrL = uL * rho / (a * mu), uL**2 * a / G
    assert ReL < 5
    hL = (12 * mu * a**2 * uL / (G * rho)) ** (1 / 3) * (Ch * ReL**0.15 * FrL**0.1) ** (2 / 3)
    assert c.billet_schultes_holdup(uL, a, Ch, rho, mu) == pytest.approx(hL, rel=1e-12)


def test_billet_schultes_area_by_hand():
    uL, a, eps, rho, mu, s = 0.005, 112.6, 0.951, 998.0, 1.0e-3, 0.072
    dh = 4 * eps / a
    ratio = 1.5 * (a * dh) ** -0.5 * (uL * dh * rho / mu) ** -0.2 * (uL**2 * rho * dh / s) ** 0.75
    ratio *= (uL**2 / (G * dh)) ** -0.45
    assert c.billet_schultes_area(uL, a, eps, rho, mu, s) == pytest.approx(a * ratio, rel=1e-12)


def test_loading_velocity_by_hand_and_both_flow_branches():
    a, eps, CS, rL, rV, mL, mV = 112.6, 0.951, 2.725, 998.0, 1.2, 1.0e-3, 1.8e-5
    for uL, uV in ((0.005, 2.5), (0.05, 0.5)):
        film = 12 * mL * uL / (G * rL)
        flow = uL * rL / (uV * rV) * math.sqrt(rV / rL)
        n, C = (-0.326, CS) if flow <= 0.4 else (-0.723, 0.695 * CS * (mL / mV) ** 0.1588)
        bracket = eps / a ** (1 / 6) - a**0.5 * film ** (1 / 3)
        expected = C * (flow * (mL / mV) ** 0.4) ** n * bracket * film ** (1 / 6) * math.sqrt(rL / rV)
        got = c.billet_schultes_loading_velocity(uL, uV, a, eps, CS, rL, rV, mL, mV)
        assert got == pytest.approx(expected, rel=1e-12)


def test_loading_point_of_50mm_metal_pall_rings_is_plausible():
    # air-water loading F-factors of 50 mm metal Pall rings lie near 2-2.5 Pa^0.5 at moderate
    # liquid loads (Billet, Packed Towers, VCH 1995, loading diagrams; from memory)
    uS = c.billet_schultes_loading_velocity(0.005, 2.0, 112.6, 0.951, 2.725, 998.0, 1.2, 1.0e-3, 1.8e-5)
    assert 1.7 < uS * math.sqrt(1.2) < 2.8


def test_bravo_rocha_fair_by_hand():
    uV, uL, eps, S, B, h, th = 1.5, 0.003, 0.9, 0.0089, 0.0127, 0.0064, 60.0
    rV, muV, DV, rL, muL, DL, T = 1.2, 1.8e-5, 1.6e-5, 998.0, 1.0e-3, 1.9e-9, 298.15
    P = (4 * S + 2 * B) / (B * h)
    gamma = rL * uL / P
    ULe = 3 * gamma / (2 * rL) * (rL**2 * G / (3 * muL * gamma)) ** (1 / 3)
    UVe = uV / (eps * math.sin(math.radians(th)))
    assert c.bravo_rocha_fair_k_L(uL, eps, S, B, h, th, rL, muL, DL) == pytest.approx(
        2 * math.sqrt(DL * ULe / (math.pi * S)), rel=1e-12
    )
    Re = S * rV * (UVe + ULe) / muV
    kc = 0.0338 * Re**0.8 * (muV / (rV * DV)) ** 0.333 * DV / S
    got = c.bravo_rocha_fair_k_G(uV, uL, eps, S, B, h, th, rV, muV, DV, rL, muL, T)
    assert got == pytest.approx(kc / (R * T), rel=1e-12)


def test_onda_envelope_warns_and_bad_theta_raises():
    with pytest.warns(EnvelopeWarning, match="sigma_c/sigma"):
        c.onda_wetted_area(112.6, 0.075, 0.02, 5.0, 1.0e-3, 998.0)
    with pytest.raises(InputValueError, match="theta"):
        c.bravo_rocha_fair_k_L(0.003, 0.9, 0.0089, 0.0127, 0.0064, 95.0, 998.0, 1.0e-3, 1.9e-9)
    with pytest.raises(InputValueError, match="void_fraction"):
        c.billet_schultes_k_L(0.005, 112.6, 1.2, 1.192, 998.0, 1.0e-3, 1.9e-9)


def test_every_packing_row_names_its_source_and_is_physical():
    assert len(c.PACKINGS) >= 6
    for name, p in c.PACKINGS.items():
        assert p.name == name
        assert "(" in p.source
        assert "from memory" in p.source or "Table" in p.source
        assert 0.5 < p.void_fraction < 1.0
        assert 50.0 < p.a < 600.0
        assert 0.02 < p.sigma_c < 0.08
        assert p.kind in ("random", "structured")
        if p.kind == "structured":
            assert None not in (p.S, p.B, p.h, p.theta)
    assert {p.kind for p in c.PACKINGS.values()} == {"random", "structured"}


def test_packing_lookup_errors():
    with pytest.raises(UnknownMethodError, match="pall-ring-metal-50"):
        c.packing("pall ring")
    with pytest.raises(MissingConstantError, match=r"dataclasses\.replace"):
        c.packing("raschig-ring-ceramic-13").need("C_L", "Billet & Schultes")


PROPS = {
    "T": 298.15,
    "rho_V": 1.2,
    "mu_V": 1.8e-5,
    "D_V": 1.6e-5,
    "rho_L": 998.0,
    "mu_L": 1.0e-3,
    "D_L": 1.9e-9,
    "sigma": 0.072,
}


@pytest.mark.parametrize(
    ("name", "method"),
    [
        ("pall-ring-metal-50", "billet-schultes"),
        ("pall-ring-metal-50", "onda"),
        ("raschig-ring-ceramic-13", "onda"),
        ("gauze-bx", "bravo-rocha-fair"),
        ("mellapak-250y", "bravo-rocha-fair"),
    ],
)
def test_packed_column_assembles_the_right_equations(name, method):
    p = c.packing(name)
    r = c.packed_column(p, 1.0, 0.004, **PROPS, method=method)
    assert r.method == method
    assert r.k_L_a == pytest.approx(r.k_L * r.a_e, rel=1e-12)
    assert r.k_G_a == pytest.approx(r.k_G * r.a_e, rel=1e-12)
    if method == "onda":
        assert r.a_e == pytest.approx(c.onda_wetted_area(p.a, p.sigma_c, 0.072, 0.004 * 998.0, 1e-3, 998.0))
    if method == "bravo-rocha-fair":
        assert r.a_e == p.a
    assert (r.loading_fraction is None) == (p.C_S is None)


def test_packed_column_warns_near_loading_and_records_it():
    with pytest.warns(EnvelopeWarning, match="loading point"):
        r = c.packed_column("pall-ring-metal-50", 2.2, 0.005, **PROPS)
    assert r.loading_fraction > 0.8
    assert any("loading point" in w for w in r.warnings)


def test_missing_constant_for_a_method():
    with pytest.raises(MissingConstantError, match="C_L"):
        c.packed_column("raschig-ring-ceramic-13", 1.0, 0.004, **PROPS)
    with pytest.raises(MissingConstantError, match="S"):
        c.packed_column("pall-ring-metal-25", 1.0, 0.004, **PROPS, method="bravo-rocha-fair")


def test_rate_packing_fetches_the_properties_it_uses():
    r = c.rate_packing("ammonia", "air", "water", "pall-ring-metal-50", 298.15, 1.2, 0.005)
    used = r.inputs
    assert used["rho_V"] == pytest.approx(mt.gas_model("air").density(298.15))
    assert used["mu_L"] == pytest.approx(mt.liquid_model("water").viscosity(298.15))
    assert used["D_V"] == pytest.approx(mt.gas_diffusivity("ammonia", "air", 298.15))
    assert used["D_L"] == pytest.approx(mt.liquid_diffusivity("ammonia", "water", 298.15))
    # IAPWS (2014) release on the surface tension of ordinary water: 71.97 mN/m at 25 C
    assert used["sigma"] == pytest.approx(0.07197, abs=2e-5)
    again = c.packed_column("pall-ring-metal-50", 1.2, 0.005, **{k: used[k] for k in PROPS})
    assert again.k_G_a == pytest.approx(r.k_G_a, rel=1e-12)


def test_ammonia_absorption_in_pall_rings_gives_a_plausible_gas_film_htu():
    # H_G of 0.2-0.6 m for 25-50 mm rings in air-water service (common practice)
    r = c.rate_packing("ammonia", "air", "water", "pall-ring-metal-50", 298.15, 1.2, 0.005)
    G_molar = 1.2 * mt.gas_model("air").density(298.15) / mt.species("air").molar_mass
    H_G = c.transfer_unit_height(G_molar, r.k_G_a * 101325.0)
    assert 0.15 < H_G < 0.8


def test_water_surface_tension_at_20C():
    # IAPWS (2014) release on the surface tension of ordinary water: 72.74 mN/m at 20 C
    assert mt.liquid_model("water").surface_tension(293.15) == pytest.approx(0.07274, abs=3e-5)


def test_arrays_match_scalars():
    uL = np.array([0.002, 0.005, 0.01])
    arr = c.billet_schultes_area(uL, 112.6, 0.951, 998.0, 1e-3, 0.072)
    assert arr == pytest.approx(
        [c.billet_schultes_area(float(u), 112.6, 0.951, 998.0, 1e-3, 0.072) for u in uL]
    )


@given(
    a=st.floats(80.0, 400.0),
    factor=st.floats(1.01, 2.0),
    uV=st.floats(0.3, 1.5),
    uL=st.floats(0.001, 0.01),
)
def test_more_packing_area_never_lowers_k_G_a(a, factor, uV, uL):
    def bs(area: float) -> float:
        kG = c.billet_schultes_k_G(uV, uL, area, 0.95, 0.41, 0.784, 1.2, 1.8e-5, 1.6e-5, 998.0, 1e-3, 298.0)
        return kG * c.billet_schultes_area(uL, area, 0.95, 998.0, 1e-3, 0.072)

    def onda(area: float) -> float:  # geometrically similar packings: a d_p held at 5.6
        size = 5.6 / area
        aw = c.onda_wetted_area(area, 0.075, 0.072, uL * 998.0, 1e-3, 998.0)
        return c.onda_k_G(uV * 1.2, area, 1.8e-5, 1.2, 1.6e-5, size, 298.0) * aw

    with warnings.catch_warnings():
        warnings.simplefilter("ignore", EnvelopeWarning)
        assert bs(a * factor) >= bs(a)
        if (5.6 / a >= 0.015) == (5.6 / (a * factor) >= 0.015):  # same Onda constant
            assert onda(a * factor) >= onda(a)


def test_replace_builds_a_user_packing():
    mine = dataclasses.replace(c.packing("raschig-ring-ceramic-13"), name="mine", C_L=1.2, C_V=0.4, C_h=0.6)
    r = c.packed_column(mine, 0.8, 0.004, **PROPS)
    assert r.packing == "mine"
