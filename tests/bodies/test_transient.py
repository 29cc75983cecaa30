from __future__ import annotations

import math

import numpy as np
import pytest
from hypothesis import given
from hypothesis import strategies as st
from scipy import integrate

import masstransfer as mt
from masstransfer import bodies as tr
from masstransfer.bodies import _transient

SHAPES = list(tr.SHAPES)


def test_half_time_rule_for_a_sheet():
    # Crank, The Mathematics of Diffusion 2nd ed.: D = 0.049 L^2 / t_half for a sheet of thickness L
    # (from memory); here found by solving M_t/M_inf = 1/2
    L, D = 1e-3, 1e-11
    t_half = tr.half_time("slab", D, L / 2)
    assert D * t_half / L**2 == pytest.approx(0.049, abs=0.0005)
    assert D * t_half / L**2 == pytest.approx(0.04919, rel=2e-4)  # Crank Section 10.6 (from memory)


def test_sphere_half_time():
    # Crank 2nd ed. Eq. 6.21 short-time form solved by hand: 6 sqrt(T/pi) - 3T = 1/2 -> T = 0.030547
    s = (6 / math.sqrt(math.pi) - math.sqrt(36 / math.pi - 6)) / 6
    assert tr.half_time("sphere", 1.0, 1.0) == pytest.approx(s * s, rel=1e-6)


@pytest.mark.parametrize("shape", SHAPES)
def test_series_and_short_time_forms_agree(shape, monkeypatch):
    T = np.array([1e-4, 1e-3, 0.003, 0.006, 0.009])
    short = _transient._uptake_constant_surface(shape, T)
    monkeypatch.setitem(_transient._SHORT_TIME, shape, 0.0)
    series = _transient._uptake_constant_surface(shape, T)
    assert short == pytest.approx(series, abs=1e-9)


def test_plane_sheet_series_by_hand():
    # Crank Eq. 4.18 written out with 200 terms at Dt/l^2 = 0.3
    T = 0.3
    n = np.arange(200)
    expected = 1 - np.sum(8 / ((2 * n + 1) ** 2 * np.pi**2) * np.exp(-((2 * n + 1) ** 2) * np.pi**2 * T / 4))
    assert tr.fractional_uptake("slab", T, 1.0, 1.0) == pytest.approx(expected, abs=1e-13)


def test_sphere_series_by_hand():
    # Crank Eq. 6.20 with 200 terms at Dt/a^2 = 0.1
    T = 0.1
    n = np.arange(1, 201)
    expected = 1 - 6 / np.pi**2 * np.sum(np.exp(-(n**2) * np.pi**2 * T) / n**2)
    assert tr.fractional_uptake("sphere", T, 1.0, 1.0) == pytest.approx(expected, abs=1e-13)


@pytest.mark.parametrize("shape", SHAPES)
def test_large_biot_recovers_constant_surface(shape):
    T = np.array([0.005, 0.02, 0.1, 0.4, 1.0])
    a = tr.fractional_uptake(shape, T, 1.0, 1.0)
    b = tr.fractional_uptake(shape, T, 1.0, 1.0, biot=1e7)
    assert b == pytest.approx(a, abs=1e-4)


@pytest.mark.parametrize("shape", SHAPES)
@pytest.mark.parametrize("biot", [None, 0.5, 5.0])
@pytest.mark.parametrize("T", [0.02, 0.08, 0.3])
def test_uptake_equals_integral_of_profile(shape, biot, T):
    # conservation: M_t/M_inf = volume average of the profile (slab: int c dX; cylinder: 2 int c X dX;
    # sphere: 3 int c X^2 dX)
    weight = {"slab": lambda x: 1.0, "cylinder": lambda x: 2 * x, "sphere": lambda x: 3 * x * x}[shape]
    X = np.linspace(0.0, 1.0, 4001)
    c = np.asarray(tr.concentration_profile(shape, X, T, 1.0, 1.0, biot=biot))
    avg = integrate.simpson(c * np.array([weight(x) for x in X]), x=X)
    assert avg == pytest.approx(tr.fractional_uptake(shape, T, 1.0, 1.0, biot=biot), abs=2e-6)


def test_small_biot_is_surface_controlled():
    # Bi -> 0: uniform inside, M_t/M_inf = 1 - exp(-nu Bi T), nu = 1, 2, 3 (lumped, Crank 4.3.5 limit)
    for shape, nu in (("slab", 1), ("cylinder", 2), ("sphere", 3)):
        T = 2.0
        got = tr.fractional_uptake(shape, T, 1.0, 1.0, biot=1e-4)
        assert got == pytest.approx(1 - math.exp(-nu * 1e-4 * T), rel=2e-4)


@given(
    shape=st.sampled_from(SHAPES),
    biot=st.sampled_from([None, 0.1, 2.0, 50.0]),
    t=st.lists(st.floats(0.0, 5.0), min_size=2, max_size=12),
)
def test_uptake_monotone_from_zero_to_one(shape, biot, t):
    T = np.sort(np.array(t))
    f = np.asarray(tr.fractional_uptake(shape, T, 1.0, 1.0, biot=biot))
    assert np.all(np.diff(f) >= -1e-12)
    assert np.all((f >= 0) & (f <= 1))
    assert tr.fractional_uptake(shape, 0.0, 1.0, 1.0, biot=biot) == 0.0
    assert tr.fractional_uptake(shape, 50.0, 1.0, 1.0, biot=biot) == pytest.approx(1.0, abs=1e-6)


@given(shape=st.sampled_from(SHAPES), t=st.lists(st.floats(1e-6, 3.0), min_size=1, max_size=6))
def test_scalar_and_array_agree(shape, t):
    arr = tr.fractional_uptake(shape, np.array(t), 1.0, 1.0)
    for ti, v in zip(t, np.atleast_1d(arr), strict=True):
        assert tr.fractional_uptake(shape, ti, 1.0, 1.0) == pytest.approx(v, abs=1e-13)


def test_release_equals_uptake():
    t = np.array([10.0, 100.0, 1000.0])
    assert np.array_equal(
        tr.fractional_release("cylinder", t, 1e-9, 1e-3, 2.0),
        tr.fractional_uptake("cylinder", t, 1e-9, 1e-3, 2.0),
    )


def test_carburising_example():
    # Callister, Materials Science and Engineering: 0.25 wt% C steel, surface held at 1.20 wt% C,
    # 0.80 wt% reached at 0.5 mm with D = 1.6e-11 m^2/s after about 7.1 h (from memory)
    from scipy.optimize import brentq

    def c_at(t):
        return tr.semi_infinite_concentration(0.5e-3, t, 1.6e-11, 1.20, 0.25) - 0.80

    t = brentq(c_at, 3600.0, 50 * 3600.0)
    assert t / 3600 == pytest.approx(7.1, abs=0.1)


def test_semi_infinite_with_resistance_limits():
    x = np.linspace(0.0, 1e-3, 11)
    big_k = tr.semi_infinite_concentration(x, 1e4, 1e-10, 1.0, 0.0, k=1e3)
    assert big_k == pytest.approx(tr.semi_infinite_concentration(x, 1e4, 1e-10, 1.0, 0.0), abs=1e-6)
    # weak surface transfer: the surface value grows as 2 h sqrt(D t / pi), h = k/D (leading term)
    small_k = tr.semi_infinite_concentration(0.0, 1e4, 1e-10, 1.0, 0.0, k=1e-12)
    assert small_k == pytest.approx(2 * (1e-12 / 1e-10) * math.sqrt(1e-10 * 1e4 / math.pi), rel=1e-4)
    # uptake = integral of the profile (conservation)
    xs = np.linspace(0, 2e-2, 200001)  # 20 penetration depths
    for k in (None, 1e-7):
        c = tr.semi_infinite_concentration(xs, 1e4, 1e-10, 1.0, 0.0, k=k)
        assert integrate.simpson(c, x=xs) == pytest.approx(
            tr.semi_infinite_uptake(1e4, 1e-10, 1.0, 0.0, k=k), rel=1e-6
        )


def test_fit_diffusivity_recovers_d_with_noise():
    rng = np.random.default_rng(7)
    t = np.geomspace(60.0, 2e5, 25)
    f = np.asarray(tr.fractional_uptake("sphere", t, 3e-12, 0.4e-3)) + rng.normal(0, 0.005, t.size)
    fit = tr.fit_diffusivity("sphere", t, f, 0.4e-3)
    assert pytest.approx(3e-12, rel=0.05) == fit.D
    assert 0 < fit.stderr < 0.05 * fit.D
    assert abs(fit.D - 3e-12) < 4 * fit.stderr
    assert fit.D_half_time == pytest.approx(3e-12, rel=0.3)


def test_bad_input():
    with pytest.raises(mt.errors.UnknownMethodError, match="cube"):
        tr.fractional_uptake("cube", 1.0, 1e-9, 1e-3)
    with pytest.raises(mt.errors.InputValueError, match=r"^t="):
        tr.fractional_uptake("slab", -1.0, 1e-9, 1e-3)
    with pytest.raises(mt.errors.InputValueError, match=r"^D="):
        tr.fractional_uptake("slab", 1.0, 0.0, 1e-3)
    with pytest.raises(mt.errors.InputValueError, match=r"^size="):
        tr.fractional_uptake("slab", 1.0, 1e-9, -1e-3)
    with pytest.raises(mt.errors.InputValueError, match="biot"):
        tr.fractional_uptake("slab", 1.0, 1e-9, 1e-3, biot=-2.0)
    with pytest.raises(mt.errors.InputValueError, match="position"):
        tr.concentration_profile("slab", 2e-3, 1.0, 1e-9, 1e-3)


# --- profiles at very short times (fixed Talbot inversion of the Laplace-domain solution) ----


def _sphere_images(r, T):
    # Crank (1975), The Mathematics of Diffusion, 2nd ed., Eq. (6.19): the sphere's exact
    # image-series solution for a constant surface, fast-converging at short times
    from scipy.special import erfc

    rt = 2 * np.sqrt(T)
    return sum(erfc(((2 * n + 1) - r) / rt) - erfc(((2 * n + 1) + r) / rt) for n in range(6)) / r


@pytest.mark.parametrize("T", [1e-10, 1e-7, 1e-5, 5e-4])
def test_sphere_profile_at_short_times_matches_crank_images(T):
    r = np.array([1e-6, 0.3, 0.9, 1 - 3 * np.sqrt(T), 1 - np.sqrt(T), 1 - 0.1 * np.sqrt(T), 1.0])
    got = tr.concentration_profile("sphere", r, T, 1.0, 1.0)
    np.testing.assert_allclose(got, _sphere_images(r, T), rtol=1e-9, atol=1e-12)
    assert got[0] == 0.0  # the centre has seen nothing yet


@pytest.mark.parametrize("shape", tr.SHAPES)
def test_surface_value_with_resistance_at_short_times(shape):
    # a thin penetration layer sees a plane surface: the semi-infinite solution with a surface
    # resistance, c_s/c_inf = 1 - exp(B^2 T) erfc(B sqrt(T)) (Carslaw & Jaeger 1959, Conduction of
    # Heat in Solids, 2nd ed., sec. 2.7), curvature corrections being of order sqrt(T)
    from scipy.special import erfcx

    T, B = 1e-10, 10.0
    got = tr.concentration_profile(shape, 1.0, T, 1.0, 1.0, biot=B)
    expected = 1 - erfcx(B * math.sqrt(T))
    assert got == pytest.approx(expected, rel=1e-4)


@pytest.mark.parametrize("shape", tr.SHAPES)
@pytest.mark.parametrize("biot", [None, 0.3, 5.0, 200.0])
@pytest.mark.parametrize("T", [1e-3, 0.01, 0.3])
def test_talbot_inversion_agrees_with_series(shape, biot, T):
    X = np.linspace(0.0, 1.0, 21)
    series = _transient._profile(shape, X, np.full(X.shape, T), biot)
    inverted = _transient._talbot_profile(shape, X, np.full(X.shape, T), biot)
    np.testing.assert_allclose(inverted, series, atol=1e-10)


@pytest.mark.parametrize("shape", tr.SHAPES)
def test_profile_continuous_across_the_short_time_switch(shape):
    x = np.linspace(0.0, 1.0, 11)
    T0 = _transient._PROFILE_SHORT_TIME
    below = tr.concentration_profile(shape, x, T0 * (1 - 1e-9), 1.0, 1.0, biot=3.0)
    above = tr.concentration_profile(shape, x, T0, 1.0, 1.0, biot=3.0)
    np.testing.assert_allclose(below, above, atol=1e-9)


@pytest.mark.parametrize("biot", [0.0, -1.0, 1e-300, 1e300, float("nan")])
def test_profile_rejects_a_bad_biot_number(biot):
    with pytest.raises(mt.errors.InputValueError, match="biot"):
        tr.concentration_profile("sphere", 0.5e-3, 10.0, 1e-9, 1e-3, biot=biot)


@pytest.mark.parametrize("shape", tr.SHAPES)
@pytest.mark.parametrize("T", [1e-300, 1e-20, 1e-14, 1e-12, 1e-10])
def test_uptake_with_resistance_at_tiny_times_is_surface_controlled(shape, T):
    # early times: M/M_inf = nu Bi T (1 - 4 Bi sqrt(T) / (3 sqrt(pi)) + ...), nu = A a / V
    # (Crank 1975, 2nd ed., sec. 4.3.5, expanding Eq. (4.44) for a plane sheet; curvature
    # enters at relative order sqrt(T))
    nu = {"slab": 1.0, "cylinder": 2.0, "sphere": 3.0}[shape]
    Bi = 2.0
    expected = nu * Bi * T * (1 - 4 * Bi * math.sqrt(T) / (3 * math.sqrt(math.pi)))
    assert tr.fractional_uptake(shape, T, 1.0, 1.0, biot=Bi) == pytest.approx(expected, rel=1e-5)


@pytest.mark.parametrize("shape", tr.SHAPES)
@pytest.mark.parametrize("biot", [None, 0.5, 10.0])
def test_uptake_inversion_agrees_with_series(shape, biot):
    T = np.array([1e-3, 1e-2, 0.1, 1.0])
    if biot is None:
        series = _transient._uptake_constant_surface(shape, T)
    else:
        series = _transient._uptake_surface_resistance_series(shape, T, biot)
    inverted = _transient._talbot(lambda s, rows: _transient._laplace_uptake(shape, s, biot), T)
    np.testing.assert_allclose(inverted, series, atol=1e-12)
