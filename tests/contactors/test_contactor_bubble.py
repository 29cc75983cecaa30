"""Bubble columns and stirred tanks: by-hand values, catalogue reuse, envelopes."""

from __future__ import annotations

import math

import numpy as np
import pytest

from masstransfer import contactors as c
from masstransfer import surface
from masstransfer.errors import EnvelopeWarning, InputTypeError

G = 9.80665


def test_akita_yoshida_holdup_solves_its_equation():
    uG, Dc, rho, mu, s = 0.05, 0.3, 998.0, 1.0e-3, 0.072
    for ionic, C in ((False, 0.20), (True, 0.25)):
        eps = c.akita_yoshida_holdup(uG, Dc, rho, mu, s, electrolyte=ionic)
        rhs = (
            C
            * (G * Dc**2 * rho / s) ** 0.125
            * (G * Dc**3 / (mu / rho) ** 2) ** (1 / 12)
            * uG
            / math.sqrt(G * Dc)
        )
        assert eps / (1 - eps) ** 4 == pytest.approx(rhs, rel=1e-12)


def test_akita_yoshida_kla_by_hand():
    uG, Dc, rho, mu, s, D = 0.05, 0.3, 998.0, 1.0e-3, 0.072, 2e-9
    eps = 0.12
    Bo, Ga, Sc = G * Dc**2 * rho / s, G * Dc**3 / (mu / rho) ** 2, mu / (rho * D)
    expected = 0.6 * Sc**0.5 * Bo**0.62 * Ga**0.31 * eps**1.1 * D / Dc**2
    assert c.akita_yoshida_kla(uG, Dc, rho, mu, s, D, holdup=eps) == pytest.approx(expected, rel=1e-12)


def test_air_water_bubble_column_is_in_the_usual_range():
    # air-water, 5 cm/s: hold-up of roughly 0.1-0.2 and k_L a of roughly 0.02-0.06 1/s
    # (Deckwer, Bubble Column Reactors, Wiley 1992, Ch. 5 and 8; from memory)
    r = c.rate_bubble_column("oxygen", "water", 298.15, 0.05, 0.3)
    assert 0.08 < r.holdup < 0.2
    assert 0.015 < r.k_L_a < 0.06


def test_holdup_rises_with_gas_rate_and_warns_outside_envelope():
    uG = np.linspace(0.01, 0.3, 20)
    eps = c.akita_yoshida_holdup(uG, 0.3, 998.0, 1e-3, 0.072)
    assert np.all(np.diff(eps) > 0)
    with pytest.warns(EnvelopeWarning, match="diameter"):
        c.akita_yoshida_holdup(0.05, 2.0, 998.0, 1e-3, 0.072)
    with pytest.raises(InputTypeError, match="electrolyte"):
        c.akita_yoshida_holdup(0.05, 0.3, 998.0, 1e-3, 0.072, electrolyte="yes")


def test_vant_riet_by_hand_and_envelope():
    assert c.vant_riet_kla(1000.0, 0.01) == pytest.approx(0.026 * 1000**0.4 * 0.01**0.5, rel=1e-12)
    assert c.vant_riet_kla(1000.0, 0.01, coalescing=False) == pytest.approx(
        0.002 * 1000**0.7 * 0.01**0.2, rel=1e-12
    )
    # ionic (non-coalescing) media give the higher k_L a at the same power (van't Riet 1979)
    assert c.vant_riet_kla(2000.0, 0.01, coalescing=False) > c.vant_riet_kla(2000.0, 0.01)
    with pytest.warns(EnvelopeWarning, match="power_per_volume"):
        c.vant_riet_kla(100.0, 0.01)


def test_calderbank_reuses_the_catalogue_records():
    d, D, rho, mu, rG = np.array([0.001, 0.004]), 2e-9, 998.0, 1.0e-3, 1.2
    Ar = surface.archimedes(d, rho, rG, mu)
    Sc = mu / (rho * D)
    small = surface.correlation("stirred-vessel-calderbank-small-bubbles").sherwood(Ar=Ar[0], Sc=Sc)
    large = surface.correlation("stirred-vessel-calderbank-large-bubbles").sherwood(Ar=Ar[1], Sc=Sc)
    got = c.calderbank_bubble_k_L(d, D, rho, mu, rG)
    assert got == pytest.approx([small * D / d[0], large * D / d[1]], rel=1e-12)
    # by hand: k_L Sc^(1/2) = 0.42 (delta_rho mu g / rho^2)^(1/3) (Calderbank & Moo-Young 1961)
    assert got[1] == pytest.approx(0.42 * ((rho - rG) * mu * G / rho**2) ** (1 / 3) * Sc**-0.5, rel=1e-12)
    # bubbles of a few mm in water: k_L of 2-5e-4 m/s (common practice)
    assert 2e-4 < got[1] < 5e-4


def test_sano_by_hand():
    e, d, nu, D = 0.5, 2e-4, 1e-6, 1e-9
    Sh = 2 + 0.4 * (e * d**4 / nu**3) ** 0.25 * (nu / D) ** (1 / 3)
    assert c.sano_particle_k_L(e, d, nu, D) == pytest.approx(Sh * D / d, rel=1e-12)
    # tiny particles in still liquid: Sh -> 2
    assert c.sano_particle_k_L(1e-12, 1e-6, 1e-6, 1e-9) == pytest.approx(2 * 1e-9 / 1e-6, rel=1e-3)
