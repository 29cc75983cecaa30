"""Absorption with reaction: by-hand values, limits, regimes, invariants."""

from __future__ import annotations

import math
import warnings

import numpy as np
import pytest
from hypothesis import given
from hypothesis import strategies as st

from masstransfer import contactors as c
from masstransfer.errors import EnvelopeWarning, InputValueError, UnknownMethodError


def test_hatta_by_hand():
    assert c.hatta_number(10.0, 500.0, 1.8e-9, 1.0e-4) == pytest.approx(math.sqrt(10 * 500 * 1.8e-9) / 1e-4)


def test_no_reaction_gives_E_1():
    Ha = c.hatta_number(0.0, 500.0, 1.8e-9, 1.0e-4)
    assert Ha == 0.0
    for E in (
        c.enhancement_factor(Ha, 10.0),
        c.enhancement_film(Ha),
        c.enhancement_penetration(Ha),
        c.enhancement_surface_renewal(Ha),
    ):
        assert E == 1.0


def test_decoursey_by_hand():
    Ha, Ei = 5.0, 10.0
    direct = -(Ha**2) / (2 * (Ei - 1)) + math.sqrt(Ha**4 / (4 * (Ei - 1) ** 2) + Ei * Ha**2 / (Ei - 1) + 1)
    assert c.enhancement_factor(Ha, Ei) == pytest.approx(direct, rel=1e-12)


def test_Ha_much_above_E_inf_gives_E_inf():
    assert c.enhancement_factor(1e4, 20.0) == pytest.approx(20.0, rel=1e-3)
    assert c.enhancement_factor(1e7, 20.0) == pytest.approx(20.0, rel=1e-9)


def test_large_E_inf_gives_surface_renewal():
    # DeCoursey (1974): the approximation reduces to Danckwerts' sqrt(1 + Ha^2)
    Ha = np.array([0.1, 1.0, 3.0, 10.0])
    assert c.enhancement_factor(Ha, 1e9) == pytest.approx(np.sqrt(1 + Ha**2), rel=1e-6)


def test_E_inf_of_one_means_no_enhancement():
    assert c.enhancement_factor(5.0, 1.0) == 1.0
    with pytest.raises(InputValueError, match="E_inf"):
        c.enhancement_factor(5.0, 0.5)


def test_first_order_forms_by_hand_and_asymptotes():
    assert c.enhancement_film(2.0) == pytest.approx(2.0 / math.tanh(2.0), rel=1e-12)
    Ha = 2.0
    pen = Ha * (1 + math.pi / (8 * Ha**2)) * math.erf(2 * Ha / math.sqrt(math.pi))
    pen += 0.5 * math.exp(-4 * Ha**2 / math.pi)
    assert c.enhancement_penetration(Ha) == pytest.approx(pen, rel=1e-12)
    # Danckwerts (1970), Ch. 5: all three tend to Ha for a fast reaction
    for f in (c.enhancement_film, c.enhancement_penetration, c.enhancement_surface_renewal):
        assert f(50.0) == pytest.approx(50.0, rel=1e-3)
    # and are continuous through the small-Ha series
    for f in (c.enhancement_film, c.enhancement_penetration):
        assert f(np.array([0.99e-4, 1.01e-4, 0.99e-3, 1.01e-3])) == pytest.approx(
            1 + np.array([0.99e-4, 1.01e-4, 0.99e-3, 1.01e-3]) ** 2 / 3, rel=1e-7
        )


def test_film_penetration_and_renewal_agree_within_a_few_percent():
    # Danckwerts (1970), Ch. 5: the three models differ by a few per cent at most (from memory)
    Ha = np.geomspace(0.01, 100.0, 50)
    film, pen, ren = c.enhancement_film(Ha), c.enhancement_penetration(Ha), c.enhancement_surface_renewal(Ha)
    assert np.max(np.abs(pen / film - 1)) < 0.08
    assert np.max(np.abs(ren / film - 1)) < 0.12


def test_E_inf_by_hand():
    assert c.enhancement_instantaneous(1.8e-9, 1.2e-9, 500.0, 30.0, nu=2.0) == pytest.approx(
        1 + 1.2 / 1.8 * 500 / 60, rel=1e-12
    )
    r = math.sqrt(1.8 / 1.2)
    assert c.enhancement_instantaneous(1.8e-9, 1.2e-9, 500.0, 30.0, 2.0, "penetration") == pytest.approx(
        r + 500 / 60 / r, rel=1e-12
    )
    with pytest.raises(UnknownMethodError):
        c.enhancement_instantaneous(1.8e-9, 1.2e-9, 500.0, 30.0, 2.0, "surface")


@pytest.mark.parametrize(
    ("k2", "c_Ai", "regime", "warns"),
    [
        (1e-5, 30.0, "slow", False),
        (0.005, 30.0, "intermediate", True),
        (5.0, 3.0, "fast", False),
        (5.0, 30.0, "fast-depleting", True),
        (1e5, 30.0, "instantaneous", False),
    ],
)
def test_regime_named(k2, c_Ai, regime, warns):
    args = (k2, 1000.0, 1.8e-9, 1.2e-9, 1.0e-4, c_Ai)
    if warns:
        with pytest.warns(EnvelopeWarning):
            r = c.absorption_enhancement(*args)
        assert r.warnings
    else:
        r = c.absorption_enhancement(*args)
        assert r.warnings == ()
    assert r.regime == regime
    assert pytest.approx(c.enhancement_factor(r.hatta, r.E_inf)) == r.E


def test_regimes_for_arrays():
    with warnings.catch_warnings():
        warnings.simplefilter("ignore", EnvelopeWarning)
        r = c.absorption_enhancement(np.array([1e-5, 5.0, 1e5]), 1000.0, 1.8e-9, 1.2e-9, 1.0e-4, 3.0)
    assert r.regime == ("slow", "fast", "instantaneous")


@given(
    k2=st.floats(1e-6, 1e6),
    factor=st.floats(1.0, 100.0),
    c_B=st.floats(1.0, 5000.0),
    c_Ai=st.floats(0.1, 100.0),
)
def test_higher_rate_never_lowers_E(k2, factor, c_B, c_Ai):
    Ei = c.enhancement_instantaneous(1.8e-9, 1.2e-9, c_B, c_Ai, 1.0, "penetration")
    Ha1 = c.hatta_number(k2, c_B, 1.8e-9, 1e-4)
    Ha2 = c.hatta_number(k2 * factor, c_B, 1.8e-9, 1e-4)
    E1, E2 = c.enhancement_factor(Ha1, Ei), c.enhancement_factor(Ha2, Ei)
    assert E2 >= E1 * (1 - 1e-12)
    assert 1.0 <= E1 <= min(Ei, math.sqrt(1 + Ha1**2)) * (1 + 1e-12)
