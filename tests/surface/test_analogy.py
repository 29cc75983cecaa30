from __future__ import annotations

import math
import warnings

import numpy as np
import pytest
from hypothesis import given
from hypothesis import strategies as st

import masstransfer as mt
from masstransfer import surface as an


def test_chilton_colburn_by_hand():
    # Incropera & DeWitt 6th ed. Eq. 6.92 / Cengel & Ghajar ch. 14 (Chilton-Colburn):
    # k_c = h / (rho cp Le^(2/3)), with Le = Sc/Pr; air at 300 K, water vapour (Le about 0.85)
    h, rho, cp, Pr, Sc = 40.0, 1.1614, 1007.0, 0.707, 0.60
    expected = h / (rho * cp * (Sc / Pr) ** (2 / 3))
    assert mt.surface.mass_transfer_coefficient_from_heat(h, rho=rho, cp=cp, Pr=Pr, Sc=Sc) == pytest.approx(
        expected, rel=1e-14
    )


@given(
    h=st.floats(1e-3, 1e5),
    rho=st.floats(0.05, 2000.0),
    cp=st.floats(500.0, 5000.0),
    Pr=st.floats(0.5, 1e4),
    Sc=st.floats(0.2, 1e5),
    n=st.sampled_from([2 / 3, 0.6, 0.5]),
)
def test_round_trip_h_kc_h(h, rho, cp, Pr, Sc, n):
    with warnings.catch_warnings():  # the round trip holds outside the analogy's range too
        warnings.simplefilter("ignore", mt.errors.EnvelopeWarning)
        k = mt.surface.mass_transfer_coefficient_from_heat(h, rho=rho, cp=cp, Pr=Pr, Sc=Sc, exponent=n)
        back = mt.surface.heat_transfer_coefficient_from_mass(k, rho=rho, cp=cp, Pr=Pr, Sc=Sc, exponent=n)
    assert back == pytest.approx(h, rel=1e-12)


@given(h1=st.floats(0.1, 1e4), dh=st.floats(0.01, 1e3), Sc=st.floats(0.6, 1e3))
def test_kc_rises_with_h(h1, dh, Sc):
    kw = {"rho": 1.2, "cp": 1007.0, "Pr": 0.71, "Sc": Sc}
    assert mt.surface.mass_transfer_coefficient_from_heat(
        h1 + dh, **kw
    ) > mt.surface.mass_transfer_coefficient_from_heat(h1, **kw)


@given(Pr=st.floats(0.6, 60.0), h=st.floats(1.0, 1e3), rho=st.floats(0.1, 1e3), cp=st.floats(500.0, 5e3))
def test_lewis_relation_where_le_is_one(Pr, h, rho, cp):
    # Le = 1 (Sc = Pr): h = rho cp k_c exactly (the Lewis relation)
    k = mt.surface.mass_transfer_coefficient_from_heat(h, rho=rho, cp=cp, Pr=Pr, Sc=Pr)
    assert h / (rho * cp * k) == pytest.approx(1.0, rel=1e-12)
    assert an.lewis_relation(Pr, Pr) == pytest.approx(1.0)


def test_sherwood_nusselt_round_trip():
    sh = mt.surface.sherwood_from_nusselt(120.0, Pr=0.7, Sc=2.0)
    assert sh == pytest.approx(120.0 * (2.0 / 0.7) ** (1 / 3))
    assert mt.surface.nusselt_from_sherwood(sh, Pr=0.7, Sc=2.0) == pytest.approx(120.0, rel=1e-13)


def test_turbulent_duct_analogies():
    # Bird, Stewart & Lightfoot 2nd ed. Sections 13.4 and 14.3: all reduce to St = f/8 at Pr = 1
    f = 0.0185
    assert an.stanton_reynolds(f) == pytest.approx(f / 8)
    assert an.stanton_prandtl_taylor(f, 1.0) == pytest.approx(f / 8)
    assert an.stanton_von_karman(f, 1.0) == pytest.approx(f / 8)
    assert an.colburn_j_from_friction(f) == pytest.approx(f / 8)
    # against Gnielinski at Re 5e4, Pr 0.7: the analogies fall within 15 % (common practice)
    from masstransfer import surface

    Re, Pr = 5e4, 0.7
    fd = float(surface.darcy_friction_smooth(Re))
    nu_g = surface.correlation("duct-gnielinski").nusselt(Re=Re, Pr=Pr)
    for st_ in (an.stanton_prandtl_taylor(fd, Pr), an.stanton_von_karman(fd, Pr)):
        assert st_ * Re * Pr == pytest.approx(nu_g, rel=0.15)


def test_psychrometric_ratio_for_air_water_is_near_one():
    # Treybal 3rd ed. Section 7.1: about 1 for air-water (Lewis relation), from the analogy Le^(2/3)
    r = mt.mass_transfer_from_heat(30.0, "water", "air", 300.0)
    k_Y = r.k_y * 0.018015 * (0.02897 / 0.018015)  # kg/(m^2 s) per unit humidity ratio, dilute
    ratio = an.psychrometric_ratio(30.0, k_Y, 1007.0 + 1880.0 * 0.01)
    assert 0.85 < ratio < 1.05


def test_resolved_form_for_water_in_air():
    r = mt.mass_transfer_from_heat(35.0, "water", "air", 320.0, 101325.0)
    assert isinstance(r, mt.TransferCoefficients)
    assert r.Le == pytest.approx(r.Sc / r.Pr)
    assert r.k_c == pytest.approx(35.0 / (r.rho * r.cp * r.Le ** (2 / 3)))
    assert r.k_G == pytest.approx(r.k_c / (8.314462618 * 320.0))
    assert r.k_y == pytest.approx(r.k_c * 101325.0 / (8.314462618 * 320.0))
    # water vapour in air: Le about 0.85 (common practice)
    assert 0.8 < r.Le < 0.95
    assert "Chilton-Colburn" in r.method
    assert "fuller" in r.method


def test_resolved_form_in_a_liquid_and_over_arrays():
    T = np.array([290.0, 310.0, 330.0])
    r = mt.mass_transfer_from_heat(np.array([800.0, 900.0, 1000.0]), "oxygen", "water", T, phase="liquid")
    assert r.k_x == pytest.approx(np.asarray(r.k_c) * np.asarray(r.rho) / 0.01801528)
    assert np.all(np.asarray(r.Sc) > 100)
    assert r.k_G is None


def test_bad_input_names_argument():
    with pytest.raises(mt.errors.InputValueError, match=r"^h="):
        mt.surface.mass_transfer_coefficient_from_heat(-1.0, rho=1.0, cp=1000.0, Pr=0.7, Sc=0.6)
    for arg in ("rho", "cp", "Pr", "Sc"):
        kw = {"rho": 1.0, "cp": 1000.0, "Pr": 0.7, "Sc": 0.6, arg: 0.0}
        with pytest.raises(mt.errors.InputValueError, match=f"^{arg}="):
            mt.surface.mass_transfer_coefficient_from_heat(10.0, **kw)
    with pytest.raises(mt.errors.InputValueError, match=r"^k_c="):
        mt.surface.heat_transfer_coefficient_from_mass(-0.1, rho=1.0, cp=1000.0, Pr=0.7, Sc=0.6)
    with pytest.raises(mt.errors.OutOfRangeError):
        mt.mass_transfer_from_heat(500.0, "oxygen", "water", 700.0, phase="liquid")
    with pytest.raises(mt.errors.InputValueError, match="phase"):
        mt.mass_transfer_from_heat(5.0, "oxygen", "water", 300.0, phase="plasma")  # type: ignore[arg-type]


def test_zero_h_gives_zero_k():
    assert mt.surface.mass_transfer_coefficient_from_heat(0.0, rho=1.0, cp=1000.0, Pr=0.7, Sc=0.6) == 0.0
    assert math.isfinite(
        mt.surface.mass_transfer_coefficient_from_heat(1e-300, rho=1.0, cp=1e3, Pr=0.7, Sc=0.6)
    )


# --- declared domains of the friction analogies (no negative Stanton number) -------------------


@pytest.mark.parametrize("fn", [an.stanton_von_karman, an.stanton_prandtl_taylor])
@given(f=st.floats(1e-4, 10.0), Pr=st.floats(1e-3, 1e4))
def test_friction_analogies_are_positive_or_refuse(fn, f, Pr):
    # over the whole positive quadrant: a positive, finite Stanton number, or an error naming the inputs
    g = f / 8
    den = 1 + 5 * g**0.5 * (Pr - 1 + (math.log(1 + 5 / 6 * (Pr - 1)) if fn is an.stanton_von_karman else 0.0))
    if abs(den) < 1e-9:
        return  # at the sign change itself rounding decides
    if den < 0:  # the equation's own sign change (written out from the docstring's formula)
        with pytest.raises(mt.errors.InputValueError, match=r"f_darcy=.* with Pr="):
            fn(f, Pr)
        return
    St = fn(f, Pr)
    assert math.isfinite(St)
    assert St > 0.0


@pytest.mark.parametrize("fn", [an.stanton_von_karman, an.stanton_prandtl_taylor])
@given(f=st.floats(0.005, 0.1), Pr=st.floats(0.5, 1e3))
def test_friction_analogies_hold_over_turbulent_friction_factors(fn, f, Pr):
    # turbulent pipe flow (Moody chart: f_darcy from about 0.008 to 0.1, common practice), Pr >= 0.5
    St = fn(f, Pr)
    assert math.isfinite(St)
    assert St > 0.0


def test_friction_analogies_refuse_the_reported_sign_changes():
    # von Karman at f_darcy = 1 and Prandtl-Taylor at a large f with small Pr went negative
    with pytest.raises(mt.errors.InputValueError, match=r"f_darcy=1\.0 with Pr=0\.7"):
        an.stanton_von_karman(1.0, 0.7)
    with pytest.raises(mt.errors.InputValueError, match=r"f_darcy=0\.5 with Pr=0\.01"):
        an.stanton_prandtl_taylor(np.array([0.02, 0.5]), 0.01)


@pytest.mark.parametrize(
    ("Pr", "Sc", "name"), [(0.7, 0.2, "Sc=0.2"), (100.0, 1.0, "Pr=100.0"), (0.7, 5e3, "Sc=5000.0")]
)
def test_chilton_colburn_warns_outside_its_range(Pr, Sc, name):
    # j_H = f/2 for 0.6 < Pr < 60 and j_D = f/2 for 0.6 < Sc < 3000 (Incropera & DeWitt 6th ed.
    # Eqs. 6.70-6.71, from memory)
    kw = {"rho": 1.2, "cp": 1007.0, "Pr": Pr, "Sc": Sc}
    with pytest.warns(mt.errors.EnvelopeWarning, match=rf"Chilton-Colburn analogy: {name}.*0\.6 to"):
        an.mass_transfer_coefficient_from_heat(30.0, **kw)
    with pytest.warns(mt.errors.EnvelopeWarning, match="Chilton-Colburn"):
        an.heat_transfer_coefficient_from_mass(0.03, **kw)
    an.mass_transfer_coefficient_from_heat(30.0, rho=1.2, cp=1007.0, Pr=0.7, Sc=0.62)  # water in air: silent
