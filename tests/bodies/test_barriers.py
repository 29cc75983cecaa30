from __future__ import annotations

import numpy as np
import pytest
from hypothesis import given
from hypothesis import strategies as st

import masstransfer as mt
from masstransfer import bodies as br

MOL_PER_CM3_STP = 101325.0 / (8.314462618 * 273.15) * 1e-6


def test_barrer_in_si():
    # IUPAC membrane terminology (Koros et al. 1996): 1 barrer = 3.348e-16 mol/(m s Pa) (common practice)
    assert br.convert_permeability(1.0, "barrer") == pytest.approx(3.346e-16, rel=1e-3)
    assert br.convert_permeability(1.0, "cm3(STP) cm/(cm2 s cmHg)", "barrer") == pytest.approx(1e10)


def test_unit_table_by_hand():
    # each row by hand from its definition (cm^3(STP) = 4.4615e-5 mol; 1 atm = 101325 Pa; 1 mil = 25.4 um)
    cases = {
        "cm3(STP) mm/(m2 day atm)": MOL_PER_CM3_STP * 1e-3 / (86400 * 101325),
        "cm3(STP) um/(m2 day atm)": MOL_PER_CM3_STP * 1e-6 / (86400 * 101325),
        "cm3(STP) mil/(m2 day atm)": MOL_PER_CM3_STP * 25.4e-6 / (86400 * 101325),
        "cm3(STP) mil/(100 in2 day atm)": MOL_PER_CM3_STP * 25.4e-6 / (0.064516 * 86400 * 101325),
        "g(H2O) mm/(m2 day kPa)": 1e-3 / 0.01801528 * 1e-3 / (86400 * 1000),
    }
    for unit, si in cases.items():
        assert br.convert_permeability(1.0, unit) == pytest.approx(si, rel=1e-9), unit
    assert br.convert_permeance(1.0, "cm3(STP)/(100 in2 day atm)", "cm3(STP)/(m2 day atm)") == pytest.approx(
        1 / 0.064516, rel=1e-12
    )
    assert br.convert_flux(1.0, "g(H2O)/(m2 day)") == pytest.approx(1e-3 / 0.01801528 / 86400)


@pytest.mark.parametrize(
    ("polymer", "barrer", "trade_value", "source"),
    [
        # oxygen at about 23-25 C: permeability in barrer and in cm3(STP) mil/(100 in2 day atm), both as
        # tabulated in Massey, Permeability Properties of Plastics and Elastomers, 2nd ed. (2003)
        # (from memory)
        ("LDPE", 2.9, 480.0, "Massey 2nd ed. (from memory)"),
        ("PET", 0.03, 5.0, "Massey 2nd ed. (from memory)"),
        ("HDPE", 0.6, 100.0, "Massey 2nd ed. (from memory)"),
    ],
)
def test_published_packaging_values_agree_across_units(polymer, barrer, trade_value, source):
    got = br.convert_permeability(barrer, "barrer", "cm3(STP) mil/(100 in2 day atm)")
    assert got == pytest.approx(trade_value, rel=0.05), f"{polymer}: {source}"


def test_round_trip_every_unit():
    for table, conv in (
        (br.PERMEABILITY_UNITS, br.convert_permeability),
        (br.PERMEANCE_UNITS, br.convert_permeance),
        (br.FLUX_UNITS, br.convert_flux),
    ):
        for u in table:
            for v in table:
                assert conv(conv(2.5, u, v), v, u) == pytest.approx(2.5, rel=1e-12)


def test_unknown_unit_lists_accepted():
    with pytest.raises(mt.errors.UnknownMethodError, match="barrer"):
        br.convert_permeability(1.0, "barrers")


def test_series_resistances_and_interfaces():
    a = br.Layer(20e-6, D=1e-12, S=2e-4, name="A")
    b = br.Layer(40e-6, D=5e-13, S=1e-4, name="B")
    res = br.steady_flux([a, b], 2e4, 0.0)
    R = 20e-6 / 2e-16 + 40e-6 / 5e-17
    assert res.flux == pytest.approx(2e4 / R)
    # the same flux crosses each layer: D (c_in - c_out)/L
    for lay, (c1, c2) in zip((a, b), res.interface_concentrations, strict=True):
        assert lay.D * (c1 - c2) / lay.thickness == pytest.approx(res.flux, rel=1e-12)
    assert res.interface_pressures[0] == pytest.approx(2e4)
    # with gas films: R T / k added on each side
    film = br.steady_flux([a, b], 2e4, 0.0, k_high=1e-2, k_low=1e-3, T=300.0)
    assert 1 / film.permeance == pytest.approx(R + 8.314462618 * 300 * (1 / 1e-2 + 1 / 1e-3))


@given(
    st.lists(st.tuples(st.floats(1e-6, 1e-3), st.floats(1e-19, 1e-14)), min_size=1, max_size=5),
    st.tuples(st.floats(1e-6, 1e-3), st.floats(1e-19, 1e-14)),
)
def test_adding_a_layer_never_raises_the_flux(layers, extra):
    ls = [br.Layer(t, permeability=p) for t, p in layers]
    base = br.steady_flux(ls, 1e4).flux
    more = br.steady_flux([*ls, br.Layer(extra[0], permeability=extra[1])], 1e4).flux
    assert more <= base


def test_time_lag_and_permeation_curve():
    # Daynes (1920), Barrer (1939): theta = L^2 / (6 D); the asymptote of Q(t) crosses zero there
    L, D, c1 = 50e-6, 1e-12, 10.0
    assert br.time_lag(L, D) == pytest.approx(L**2 / (6 * D))
    t = np.linspace(0.0, 20 * br.time_lag(L, D), 400)
    Q = br.permeation_curve(t, L, D, c1)
    fit = br.fit_time_lag(t, Q)
    J, lag, slag = fit.flux, fit.lag, fit.lag_stderr
    assert pytest.approx(D * c1 / L, rel=1e-6) == J
    assert lag == pytest.approx(br.time_lag(L, D), rel=1e-5)
    D_est, _ = br.diffusivity_from_time_lag(L, lag, slag)
    assert D_est == pytest.approx(D, rel=1e-5)


def test_permeation_curve_short_and_long_forms_agree():
    L, D = 1.0, 1.0
    tau = np.array([0.09999999, 0.10000001])
    q = br.permeation_curve(tau, L, D, 1.0)
    assert q[0] == pytest.approx(q[1], rel=1e-6)


def test_arrhenius_with_a_reference_temperature():
    arr = mt.diffusivity.arrhenius_diffusivity
    assert arr(298.15, 3.0, 40e3, T_ref=298.15) == pytest.approx(3.0)
    assert arr(308.15, 1.0, 40e3, T_ref=298.15) == pytest.approx(
        np.exp(-40e3 / 8.314462618 * (1 / 308.15 - 1 / 298.15))
    )
    # a negative heat of solution lowers the solubility coefficient as T rises
    assert arr(308.15, 1.0, -20e3, T_ref=298.15) < 1.0
    with pytest.raises(mt.errors.InputValueError, match="Ea"):
        arr(308.15, 1.0, -20e3)  # without T_ref, Ea is an activation energy (>= 0)


def test_oxygen_ingress():
    pet = br.Layer(12e-6, permeability=0.03 * 3.346e-16, name="PET (invented values)")
    r = br.oxygen_ingress(0.05, [pet], np.array([0.0, 86400.0, 2 * 86400.0]), limit_mg=1.0)
    rate = 0.05 * 0.03 * 3.346e-16 / 12e-6 * 0.2095 * 101325
    assert r.rate == pytest.approx(rate, rel=1e-3)
    assert r.cumulative_mg == pytest.approx(rate * np.array([0, 1, 2]) * 86400 * 31998.8, rel=1e-3)
    assert r.time_to_limit == pytest.approx(1.0 / (rate * 31998.8), rel=1e-3)
    assert r.cumulative_ml_stp[1] == pytest.approx(rate * 86400 / MOL_PER_CM3_STP, rel=1e-3)


def test_bad_input():
    with pytest.raises(mt.errors.InputValueError, match="thickness"):
        br.Layer(0.0, permeability=1e-16)
    with pytest.raises(mt.errors.InputValueError, match="D and S"):
        br.Layer(1e-5, D=1e-12)
    with pytest.raises(mt.errors.InputValueError, match=r"^area="):
        br.oxygen_ingress(-1.0, [br.Layer(1e-5, permeability=1e-16)], 1.0)
    with pytest.raises(mt.errors.InputValueError, match=r"^t="):
        br.oxygen_ingress(1.0, [br.Layer(1e-5, permeability=1e-16)], -5.0)
    with pytest.raises(mt.errors.InputValueError, match=r"^D="):
        br.time_lag(1e-5, 0.0)
    with pytest.raises(mt.errors.InputValueError, match="empty"):
        br.steady_flux([], 1.0)
