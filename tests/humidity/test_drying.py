"""Drying time: constant-rate period, falling-rate period by diffusion, the drying curve."""

from __future__ import annotations

import math

import numpy as np
import pytest

import masstransfer as mt
from masstransfer import humidity

_BASE = {"size": 0.01, "dry_density": 1400.0, "D": 1e-9, "X_initial": 0.4, "X_critical": 0.2}


def test_constant_rate_period_by_hand():
    r = humidity.drying_time(1e-4, shape="slab", X_final=0.05, **_BASE)
    # kg dry solid per m^2 of face (slab dried on both faces: half-thickness x density)
    assert r.t_constant == pytest.approx(1400.0 * 0.01 * (0.4 - 0.2) / 1e-4, rel=1e-12)


@pytest.mark.parametrize(
    ("shape", "one_term"),
    [
        # first term of the series for release from a slab and a sphere with the surface at
        # equilibrium (Crank, The Mathematics of Diffusion, 2nd ed., Eqs. 4.18 and 6.20; the
        # slab form is the falling-rate drying time of Geankoplis, 4th ed., Eq. 9.10-7, and
        # Treybal, 3rd ed., Eq. 12.22; from memory)
        ("slab", lambda a, D, E: 4 * a * a / (math.pi**2 * D) * math.log(8 / (math.pi**2 * E))),
        ("sphere", lambda a, D, E: a * a / (math.pi**2 * D) * math.log(6 / (math.pi**2 * E))),
    ],
)
def test_falling_rate_period_against_the_one_term_series(shape, one_term):
    # deep into the falling period the first term alone holds: the second changes the time by
    # less than 1e-4 here
    r = humidity.drying_time(1e-4, shape=shape, X_final=0.01, **_BASE)
    E = 0.01 / 0.2  # unaccomplished fraction of the free moisture
    assert r.t_falling == pytest.approx(one_term(0.01, 1e-9, E), rel=1e-4)


def test_falling_time_is_the_inverse_of_the_release_curve():
    r = humidity.drying_time(2e-4, shape="cylinder", X_final=0.08, X_equilibrium=0.02, **_BASE)
    released = mt.bodies.fractional_release("cylinder", r.t_falling, 1e-9, 0.01)
    assert released == pytest.approx((0.2 - 0.08) / (0.2 - 0.02), rel=1e-9)


def test_drying_curve_is_continuous_monotone_and_ends_where_asked():
    r = humidity.drying_time(1e-4, shape="slab", X_final=0.05, points=200, **_BASE)
    X = r.curve_moisture
    assert X[0] == pytest.approx(0.4)
    assert X[-1] == pytest.approx(0.05, rel=1e-9)
    assert np.all(np.diff(X) < 0)
    k = np.searchsorted(r.curve_time, r.t_constant)
    assert X[k - 1] >= 0.2 - 1e-9 >= X[k] - 1e-3
    assert r.curve_time[-1] == pytest.approx(r.t_total)


def test_evaporation_result_feeds_the_constant_rate():
    ev = humidity.evaporation_rate("water", "air", T=343.15, h=30.0, relative_humidity=0.05)
    r = humidity.drying_time(ev, shape="slab", X_final=0.05, **_BASE)
    assert r.constant_rate == pytest.approx(ev.mass_flux)


def test_final_above_critical_and_start_below_critical():
    only_const = humidity.drying_time(1e-4, shape="slab", X_final=0.3, **_BASE)
    assert only_const.t_falling == 0.0
    assert only_const.t_total == pytest.approx(1400.0 * 0.01 * 0.1 / 1e-4)
    wet_below = humidity.drying_time(1e-4, shape="sphere", **{**_BASE, "X_initial": 0.15}, X_final=0.05)
    assert wet_below.t_constant == 0.0
    assert wet_below.t_falling > 0


def test_arrays_broadcast():
    r = humidity.drying_time([1e-4, 2e-4, 4e-4], shape="slab", X_final=0.05, **_BASE)
    assert r.t_constant.shape == (3,)
    assert r.curve_moisture.shape == (3, 60)
    assert r.t_falling[0] == pytest.approx(r.t_falling[2])


def test_clear_errors():
    with pytest.raises(mt.errors.InputValueError, match="X_equilibrium < X_final < X_initial"):
        humidity.drying_time(1e-4, shape="slab", X_final=0.5, **_BASE)
    with pytest.raises(mt.errors.UnknownMethodError, match="shape"):
        humidity.drying_time(1e-4, shape="cube", X_final=0.05, **_BASE)
    with pytest.raises(mt.errors.InputValueError, match="points"):
        humidity.drying_time(1e-4, shape="slab", X_final=0.05, points=1, **_BASE)


def test_surface_resistance_slows_the_falling_period():
    free = humidity.drying_time(1e-4, shape="slab", X_final=0.05, **_BASE)
    resisted = humidity.drying_time(1e-4, shape="slab", X_final=0.05, biot=2.0, **_BASE)
    assert resisted.t_falling > free.t_falling
    released = mt.bodies.fractional_release("slab", resisted.t_falling, 1e-9, 0.01, biot=2.0)
    assert released == pytest.approx((0.2 - 0.05) / 0.2, rel=1e-9)
