"""Transfer units and the column integrator: Colburn by hand, analytic = numerical, limits."""

from __future__ import annotations

import itertools
import math

import numpy as np
import pytest
from hypothesis import given
from hypothesis import strategies as st
from scipy.integrate import quad

from masstransfer import contactors as c
from masstransfer.errors import InputTypeError, InputValueError


def colburn(y1, y2, x2, m, A):
    ratio = (y1 - m * x2) / (y2 - m * x2)
    if A == 1.0:
        return ratio - 1.0
    return math.log((1 - 1 / A) * ratio + 1 / A) / (1 - 1 / A)


@pytest.mark.parametrize("A", [0.8, 1.0, 1.5, 3.0])
def test_colburn_by_hand(A):
    expected = colburn(0.02, 0.006, 0.0005, 1.2, A)
    assert c.transfer_units(0.02, 0.006, 0.0005, 1.2, A) == pytest.approx(expected, rel=1e-12)


def test_colburn_is_continuous_through_A_equal_1():
    A = 1.0 + np.array([-1e-3, -1e-8, 0.0, 1e-8, 1e-3])
    N = c.transfer_units(0.02, 0.001, 0.0, 1.2, A)
    assert N[2] == pytest.approx(19.0, rel=1e-12)  # (y1 - y2)/(y2 - m x2) at A = 1
    assert N[[1, 3]] == pytest.approx([19.0, 19.0], abs=1e-5)  # the series side of the switch
    assert N[[0, 4]] == pytest.approx([colburn(0.02, 0.001, 0.0, 1.2, a) for a in A[[0, 4]]], rel=1e-9)


def test_colburn_limit_of_large_A_is_ln_of_ratio():
    # pure gas-film control with y* = 0: N_OG = ln(y1/y2) (Treybal 3rd ed., Eq. 8.50 limit)
    assert c.transfer_units(0.02, 0.001, 0.0, 1.2, 1e9) == pytest.approx(math.log(20.0), rel=1e-6)


def test_stripping_mirror_image():
    x1, x2, y1, m, S = 0.01, 0.0005, 0.0001, 30.0, 2.0
    ratio = (x1 - y1 / m) / (x2 - y1 / m)
    expected = math.log((1 - 1 / S) * ratio + 1 / S) / (1 - 1 / S)
    assert c.stripping_transfer_units(x1, x2, y1, m, S) == pytest.approx(expected, rel=1e-12)


def test_pinch_and_infeasible_ends_raise():
    with pytest.raises(InputValueError, match="pinch"):
        c.transfer_units(0.02, 0.0001, 0.0, 1.2, 0.9)  # A < 1 cannot reach 99.5 % recovery
    with pytest.raises(InputValueError, match="m x_in"):
        c.transfer_units(0.02, 0.001, 0.001, 1.2, 1.5)
    with pytest.raises(InputValueError, match="pinch"):
        c.numerical_transfer_units(0.02, 0.0001, 0.0, 1.08, 1.2)
    with pytest.raises(InputValueError, match="pinch"):
        c.column_profile(0.02, 0.0, 20.0, 21.6, 40.0, 1.2, y_out=0.0001)


def test_htu_relations():
    assert c.transfer_unit_height(20.0, 40.0) == 0.5
    HG, HL, A = 0.4, 0.3, 1.5
    HOG, HOL = c.overall_gas_htu(HG, HL, A), c.overall_liquid_htu(HG, HL, A)
    assert pytest.approx(HG + HL / A) == HOG
    assert pytest.approx(A * HOG) == HOL  # N_OL H_OL = N_OG H_OG with N_OL = N_OG / A


@given(
    y_in=st.floats(0.005, 0.1),
    recovery=st.floats(0.5, 0.99),
    A=st.floats(1.05, 4.0),
    m=st.floats(0.2, 5.0),
)
def test_numerical_equals_analytic_for_dilute_straight_lines(y_in, recovery, A, m):
    y_out = y_in * (1 - recovery)
    analytic = c.transfer_units(y_in, y_out, 0.0, m, A)
    numeric = c.numerical_transfer_units(y_in, y_out, 0.0, A * m, m)
    assert numeric == pytest.approx(analytic, rel=1e-6)


@pytest.mark.parametrize("A", [0.9, 1.0, 1.5])
def test_integrator_sizing_equals_analytic(A):
    G, Kya, m = 20.0, 40.0, 1.2
    L = A * m * G
    y_out = 0.004 if A < 1 else 0.001
    p = c.column_profile(0.02, 0.0, G, L, Kya, m, y_out=y_out)
    N = c.transfer_units(0.02, y_out, 0.0, m, A)
    assert p.height == pytest.approx(N * G / Kya, rel=1e-6)
    assert pytest.approx(N, rel=1e-6) == p.N_OG
    # overall balance and the ends
    assert p.y[0] == pytest.approx(0.02, rel=1e-8)
    assert p.y[-1] == pytest.approx(y_out, rel=1e-8)
    assert p.x_out == pytest.approx((0.02 - y_out) * G / L, rel=1e-6)
    assert np.all(np.diff(p.y) < 0)


def test_integrator_rating_inverts_sizing():
    p = c.column_profile(0.02, 0.0001, 20.0, 36.0, 40.0, 1.2, height=3.0)
    N = c.transfer_units(0.02, p.y_out, 0.0001, 1.2, 1.5)
    assert pytest.approx(3.0, rel=1e-6) == N * 0.5
    assert p.z[0] == 0.0
    assert p.z[-1] == pytest.approx(3.0)


def test_concentrated_integrator_matches_an_independent_quadrature():
    y1, y2, x2, G, L, Kya, m = 0.3, 0.02, 0.0, 20.0, 40.0, 30.0, 0.8
    p = c.column_profile(y1, x2, G, L, Kya, m, y_out=y2, concentrated=True)
    Gi, Li = G * (1 - y1), L * (1 - x2)

    def x_of(y):
        X = (y / (1 - y) - y2 / (1 - y2)) * Gi / Li
        return X / (1 + X)

    def dz(y):  # Z = integral of G(y) (1-y)*lm dy / (K_y a (1-y)(y-y*)), G(y) = G'/(1-y)
        ys = m * x_of(y)
        lm = ((1 - ys) - (1 - y)) / math.log((1 - ys) / (1 - y))
        return Gi / (1 - y) * lm / (Kya * (1 - y) * (y - ys))

    Z, _ = quad(dz, y2, y1, epsrel=1e-12)
    assert p.height == pytest.approx(Z, rel=1e-6)
    # and the concentrated NTU quadrature agrees with its own definition
    N = c.numerical_transfer_units(y1, y2, x2, Li / Gi, m, concentrated=True)

    def dn(y):
        ys = m * x_of(y)
        lm = ((1 - ys) - (1 - y)) / math.log((1 - ys) / (1 - y))
        return lm / ((1 - y) * (y - ys))

    assert pytest.approx(quad(dn, y2, y1, epsrel=1e-12)[0], rel=1e-8) == N


def test_curved_equilibrium_and_temperature_rise():
    def henry(x, T):  # invented: solubility halves every 20 K
        return 1.2 * 2.0 ** ((T - 298.15) / 20.0) * x

    cold = c.column_profile(0.02, 0.0, 20.0, 36.0, 40.0, henry, y_out=0.001)
    hot = c.column_profile(0.02, 0.0, 20.0, 36.0, 40.0, henry, y_out=0.001, heat_of_absorption=4e4)
    assert cold.height == pytest.approx(
        c.column_profile(0.02, 0.0, 20.0, 36.0, 40.0, 1.2, y_out=0.001).height
    )
    assert hot.height > cold.height
    assert hot.T[0] > hot.T[-1] == pytest.approx(298.15)
    # temperature from the adiabatic balance at the bottom
    assert hot.T[0] == pytest.approx(298.15 + 4e4 * hot.x_out / 75.3, rel=1e-9)
    curved = c.numerical_transfer_units(0.02, 0.001, 0.0, 1.8, lambda x: 1.2 * x * (1 + 20 * x))
    assert curved > c.transfer_units(0.02, 0.001, 0.0, 1.2, 1.5)


def test_integrator_argument_errors():
    with pytest.raises(InputTypeError, match="exactly one"):
        c.column_profile(0.02, 0.0, 20.0, 36.0, 40.0, 1.2)
    with pytest.raises(InputValueError, match="stripping"):
        c.column_profile(0.001, 0.01, 20.0, 36.0, 40.0, 1.2, height=2.0)
    with pytest.raises(InputValueError, match="equilibrium returned"):
        c.numerical_transfer_units(0.02, 0.001, 0.0, 1.8, lambda x: -1.0)


@pytest.mark.parametrize("curved", [False, True], ids=["slope", "function"])
def test_film_transfer_units_give_the_same_height_as_the_overall(curved):
    # Z = N_G H_G = N_L H_L = N_OG H_OG for straight lines (Treybal 3rd ed., Ch. 8)
    G, L, m, kya, kxa = 20.0, 36.0, 1.2, 50.0, 2000.0
    eq = (lambda x: m * x) if curved else m
    NG = c.film_transfer_units(0.02, 0.001, 0.0, L / G, eq, kxa / kya)
    NL = c.film_transfer_units(0.02, 0.001, 0.0, L / G, eq, kxa / kya, phase="liquid")
    HG, HL, A = G / kya, L / kxa, L / (m * G)
    Z = c.transfer_units(0.02, 0.001, 0.0, m, A) * c.overall_gas_htu(HG, HL, A)
    assert pytest.approx(Z, rel=1e-6) == NG * HG
    assert pytest.approx(Z, rel=1e-6) == NL * HL


def test_film_units_tend_to_overall_when_the_liquid_film_vanishes():
    N = c.film_transfer_units(0.02, 0.001, 0.0, 1.8, 1.2, 1e9)
    assert pytest.approx(c.transfer_units(0.02, 0.001, 0.0, 1.2, 1.5), rel=1e-6) == N


# --- very small outlet fractions: the ln(1/y_out) tail ----------------------------------------

TINY_OUTLETS = [1e-3, 1e-30, 1e-60, 1e-100, 1e-200, 1e-300]


@pytest.mark.parametrize("y_out", TINY_OUTLETS)
@pytest.mark.parametrize("x_in", [0.0, 1e-305], ids=["clean-liquid", "trace-in-liquid"])
def test_numerical_units_follow_the_analytic_form_down_to_1e_300(y_out, x_in):
    # the Colburn form has the tail in closed form; the quadrature must reach it to 1e-6
    analytic = colburn(0.02, y_out, x_in, 1.2, 1.5)
    assert c.numerical_transfer_units(0.02, y_out, x_in, 1.8, 1.2) == pytest.approx(analytic, rel=1e-6)
    curve = c.numerical_transfer_units(0.02, y_out, x_in, 1.8, lambda x: 1.2 * x)
    assert curve == pytest.approx(analytic, rel=1e-6)


@pytest.mark.parametrize("y_out", [1e-60, 1e-300])
def test_film_units_reach_the_tail_too(y_out):
    N_OG = colburn(0.02, y_out, 0.0, 1.2, 1.5)
    assert c.film_transfer_units(0.02, y_out, 0.0, 1.8, 1.2, 1e9) == pytest.approx(N_OG, rel=1e-6)
    G, L, m, kya, kxa = 20.0, 36.0, 1.2, 50.0, 2000.0
    HG, HL, A = G / kya, L / kxa, L / (m * G)
    Z = N_OG * (HG + HL / A)  # Z = N_G H_G = N_L H_L = N_OG H_OG (Treybal 3rd ed., Ch. 8)
    for eq in (m, lambda x: m * x):
        assert c.film_transfer_units(0.02, y_out, 0.0, L / G, eq, kxa / kya) * HG == pytest.approx(
            Z, rel=1e-6
        )
        NL = c.film_transfer_units(0.02, y_out, 0.0, L / G, eq, kxa / kya, phase="liquid")
        assert pytest.approx(Z, rel=1e-6) == NL * HL


def test_concentrated_units_reach_the_tail_decade_by_decade():
    # independent: the textbook integrand in y itself, one quadrature per decade of y
    y1, y2, m, LG = 0.02, 1e-300, 1.2, 1.8

    def dn(y):
        X = (y / (1 - y) - y2 / (1 - y2)) / LG
        ys = m * X / (1 + X)
        one_minus = 1 - y
        lm = (y - ys) / math.log1p((y - ys) / one_minus) if y > 1e-8 else one_minus  # log mean
        return lm / (one_minus * (y - ys))

    edges = np.geomspace(y2, y1, 303)
    expected = sum(quad(dn, a, b, epsrel=1e-12)[0] for a, b in itertools.pairwise(edges))
    got = c.numerical_transfer_units(y1, y2, 0.0, LG, m, concentrated=True)
    assert got == pytest.approx(expected, rel=1e-6)


@pytest.mark.parametrize("y_out", [1e-20, 1e-60, 1e-300])
def test_integrator_sizes_and_rates_down_to_1e_300(y_out):
    G, L, Kya, m = 20.0, 36.0, 40.0, 1.2
    p = c.column_profile(0.02, 0.0, G, L, Kya, m, y_out=y_out)
    assert pytest.approx(colburn(0.02, y_out, 0.0, m, L / (m * G)), rel=1e-6) == p.N_OG
    if y_out > 1e-300:  # rating at the exact 1e-300 height stands on the refusal limit below
        q = c.column_profile(0.02, 0.0, G, L, Kya, m, height=p.height)
        assert q.y_out == pytest.approx(y_out, rel=1e-6)


def test_outlets_below_the_normal_doubles_are_refused_by_name():
    with pytest.raises(InputValueError, match="y_out=1e-310"):
        c.numerical_transfer_units(0.02, 1e-310, 0.0, 1.8, 1.2)
    with pytest.raises(InputValueError, match="y_out=1e-310"):
        c.film_transfer_units(0.02, 1e-310, 0.0, 1.8, 1.2, 40.0)
    with pytest.raises(InputValueError, match="y_out=1e-310"):
        c.column_profile(0.02, 0.0, 20.0, 36.0, 40.0, 1.2, y_out=1e-310)
    with pytest.raises(InputValueError, match=r"height=.*far taller"):
        c.column_profile(0.02, 0.0, 20.0, 36.0, 40.0, 1.2, height=2500.0)


def test_an_outlet_at_equilibrium_with_the_feed_liquid_is_refused_as_such():
    with pytest.raises(InputValueError, match="infinite height"):
        c.numerical_transfer_units(0.02, 0.0, 0.0, 1.8, 1.2)


def test_an_outlet_unresolvably_close_to_equilibrium_is_refused_naming_y_out():
    # y_out - y* = 1e-17 against y* = 1.2e-3: the difference is below double precision, and
    # the count would come out 0.03 % high with a quadrature warning from outside the library
    with pytest.raises(InputValueError, match=r"y_out=.*cannot be\s+resolved"):
        c.numerical_transfer_units(0.02, 0.0012 + 1e-17, 0.001, 1.8, 1.2)
