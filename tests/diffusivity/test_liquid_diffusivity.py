from __future__ import annotations

import numpy as np
import pytest
from hypothesis import given
from hypothesis import strategies as st
from validation_data import LIQUID_SYSTEMS

import masstransfer as mt
from masstransfer.diffusivity._liquid import VISCOUS_SOLVENT_LIMIT


def test_wilke_chang_ethylbenzene_in_water():
    # Poling, Prausnitz & O'Connell 5th ed., ch. 11: ethylbenzene in water at 293 K,
    # measured 0.81e-5 cm^2/s (from memory)
    D = mt.liquid_diffusivity("ethylbenzene", "water", 293.0, method="wilke-chang")
    assert pytest.approx(0.81e-9, rel=0.10) == D


def test_wilke_chang_by_hand():
    # Wilke & Chang (1955) equation evaluated by hand: 7.4e-8*(2.6*18.015)**0.5*298/(0.89*74**0.6)
    expected_cgs = 7.4e-8 * (2.6 * 18.015) ** 0.5 * 298.0 / (0.89 * 74.0**0.6)
    assert mt.diffusivity.wilke_chang(298.0, 0.89e-3, 0.018015, 74e-6, 2.6) == pytest.approx(
        expected_cgs * 1e-4
    )


def test_hayduk_minhas_aqueous_by_hand():
    # Hayduk & Minhas (1982) aqueous form, by hand for V_A = 96 cm^3/mol, 0.89 cP, 298 K
    eps = 9.58 / 96.0 - 1.12
    expected_cgs = 1.25e-8 * (96.0**-0.19 - 0.292) * 298.0**1.52 * 0.89**eps
    assert mt.diffusivity.hayduk_minhas_aqueous(298.0, 0.89e-3, 96e-6) == pytest.approx(expected_cgs * 1e-4)


def test_tyn_calus_by_hand():
    # Tyn & Calus (1975), by hand: V_A 74, V_B 96 cm^3/mol, parachors 161.6 and 206.0, 0.6 cP
    expected_cgs = 8.93e-8 * (74.0 / 96.0**2) ** (1 / 6) * (206.0 / 161.6) ** 0.6 * 298.0 / 0.6
    got = mt.diffusivity.tyn_calus(298.0, 0.6e-3, 74e-6, 96e-6, 161.6 / 5.623413e6, 206.0 / 5.623413e6)
    assert got == pytest.approx(expected_cgs * 1e-4, rel=1e-6)


def test_stokes_einstein_for_a_particle():
    # k_B T / (6 pi mu r), by hand, for a 50 nm radius sphere in water at 298.15 K
    expected = 1.380649e-23 * 298.15 / (6 * np.pi * 0.89e-3 * 50e-9)
    assert mt.diffusivity.stokes_einstein(298.15, 0.89e-3, 50e-9) == pytest.approx(expected)
    assert mt.diffusivity.stokes_einstein(298.15, 0.89e-3, 50e-9, boundary="slip") == pytest.approx(
        expected * 1.5
    )


_IDS = [f"{a}-in-{b}-{T:g}K" for a, b, T, *_ in LIQUID_SYSTEMS]
#: One-row limits are about three times each method's published average error (dissolved
#: hydrogen, far below every correlation's fitting range, is the widest row).
_ROW_LIMIT = {"wilke-chang": 0.55, "hayduk-minhas": 0.55, "tyn-calus": 0.55}
#: Wilke-Chang with an organic acid as solute in an organic solvent: the equation carries no
#: rule for the acid's association (Tyn-Calus treats it as a dimer), and it is 27-33 % high for
#: acetic and benzoic acid in benzene and acetone and 69 % high for acetic acid in ethyl acetate
#: (Benitez Table A.2).  The rows stay in the averages.
_ACIDS = {"acetic acid", "benzoic acid"}
_ACID_ROW_LIMIT = {"wilke-chang": 0.75}
_AAD_LIMIT = {"wilke-chang": 0.22, "hayduk-minhas": 0.16, "tyn-calus": 0.14}
_METHODS = list(_ROW_LIMIT)


def _beyond_range(solvent: str, T: float) -> bool:
    """Solvent more viscous than the correlations were fitted on (they warn there)."""
    return bool(mt.liquid_model(solvent).viscosity(T) > VISCOUS_SOLVENT_LIMIT)


#: Rows whose solvent lies beyond the 20 mPa s the correlations were fitted on (Poling et al.
#: 2001, Section 11-10: not for viscous solvents): oxygen in 1,2-propanediol (Nogami & Kato
#: 1962) and water in glycerol (D'Errico et al. 2004).  Every method is 78-89 % low on them:
#: its D ~ 1/viscosity overstates the effect of viscosity on a small solute, whose measured
#: diffusivity falls more slowly (about as viscosity^-2/3, Hiss & Cussler, AIChE J. 19(4), 1973,
#: doi 10.1002/aic.690190404, abstract).  That is the finding, not a tolerance: the test
#: asserts that the user is warned, that the estimate is low, and that it stays within a factor
#: of 10 (the band the rows show now), so a change that moves these rows is seen.  The rows stay
#: in the README tables.
_BEYOND_RANGE_FACTOR = 10.0
#: Solutes whose molar volume at the boiling point comes from a liquid model at a boiling point
#: that no evaluated table measures (urea decomposes before it boils): every method warns.
_UNMEASURED_TB = {"urea"}
_UNMEASURED_TB_FILTER = "ignore:.*no evaluated table measures:masstransfer.errors.EnvelopeWarning"


@pytest.mark.parametrize("method", _METHODS)
@pytest.mark.parametrize(("solute", "solvent", "T", "measured", "group", "source"), LIQUID_SYSTEMS, ids=_IDS)
def test_against_measured_systems(method, solute, solvent, T, measured, group, source):
    limit = _ROW_LIMIT[method]
    if _beyond_range(solvent, T):
        with pytest.warns(mt.errors.EnvelopeWarning, match="viscous"):  # the user is told
            D = mt.liquid_diffusivity(solute, solvent, T, method=method)
        assert measured / _BEYOND_RANGE_FACTOR < D < measured, source
        return
    if solute in _UNMEASURED_TB:
        with pytest.warns(mt.errors.EnvelopeWarning, match="no evaluated table measures"):
            D = mt.liquid_diffusivity(solute, solvent, T, method=method)
    elif solute in _ACIDS and solvent != "water" and method in _ACID_ROW_LIMIT:
        limit = _ACID_ROW_LIMIT[method]
        with pytest.warns(mt.errors.EnvelopeWarning, match="carboxylic acid"):  # the user is told
            D = mt.liquid_diffusivity(solute, solvent, T, method=method)
    else:
        D = mt.liquid_diffusivity(solute, solvent, T, method=method)
    assert pytest.approx(measured, rel=limit) == D, source


@pytest.mark.filterwarnings("ignore:wilke-chang for .*carboxylic acid:masstransfer.errors.EnvelopeWarning")
@pytest.mark.filterwarnings(_UNMEASURED_TB_FILTER)
@pytest.mark.parametrize("method", _METHODS)
def test_average_absolute_deviation(method):
    # over the rows inside the correlations' viscosity range; the two beyond it are held above
    dev = [
        abs(mt.liquid_diffusivity(a, b, T, method=method) / D - 1)
        for a, b, T, D, *_ in LIQUID_SYSTEMS
        if not _beyond_range(b, T)
    ]
    assert len(dev) >= 25
    assert np.mean(dev) < _AAD_LIMIT[method]


#: Per-set averages where the correlations are meant to work (organic solutes, no dissolved
#: gases): Poling et al. (2001) Section 11-9 report average errors of about 10-20 % for these
#: correlations on such systems (from memory).  Dissolved gases and the three-row viscous-solvent
#: set have no set limit: the row limits above hold them.  Wilke-Chang is at the top of that range
#: in organic solvents (20 %: 27-48 % high on five of the six chloroform rows of Benitez Table A.2).
_SET_AAD_LIMIT = {
    ("wilke-chang", "organic solutes in water"): 0.15,
    ("hayduk-minhas", "organic solutes in water"): 0.12,
    ("tyn-calus", "organic solutes in water"): 0.10,
    ("wilke-chang", "solutes in organic solvents"): 0.22,
    ("hayduk-minhas", "solutes in organic solvents"): 0.15,
    ("tyn-calus", "solutes in organic solvents"): 0.12,
}


@pytest.mark.filterwarnings("ignore:wilke-chang for .*carboxylic acid:masstransfer.errors.EnvelopeWarning")
@pytest.mark.filterwarnings(_UNMEASURED_TB_FILTER)
@pytest.mark.parametrize(
    ("method", "group"), list(_SET_AAD_LIMIT), ids=[f"{m}-{g}" for m, g in _SET_AAD_LIMIT]
)
def test_average_absolute_deviation_per_set(method, group):
    dev = [
        abs(mt.liquid_diffusivity(a, b, T, method=method) / D - 1)
        for a, b, T, D, g, _ in LIQUID_SYSTEMS
        if g == group
    ]
    assert len(dev) >= 10
    assert np.mean(dev) < _SET_AAD_LIMIT[(method, group)]


def test_viscous_solvent_set_is_present():
    # the set the README reports on: a solvent of at least 2.5 mPa s at the row's temperature,
    # both within the correlations' range (below 20 mPa s) and beyond it
    rows = [(b, T) for _, b, T, _, g, _ in LIQUID_SYSTEMS if g == "viscous solvents"]
    assert len(rows) >= 3
    for solvent, T in rows:
        assert mt.liquid_model(solvent).viscosity(T) > 2.5e-3
    assert any(_beyond_range(b, T) for b, T in rows)
    assert not all(_beyond_range(b, T) for b, T in rows)
    # no row outside this set reaches the viscous range
    assert not any(_beyond_range(b, T) for _, b, T, _, g, _ in LIQUID_SYSTEMS if g != "viscous solvents")


def test_special_cases_are_applied_and_reported():
    # Wilke-Chang, water as solute: the value divided by 2.3 (Olander 1961, as recommended in
    # Reid, Prausnitz & Poling 4th ed. Section 11-9, from memory); not the 37.4 cm^3/mol rule
    wc = mt.diffusivity.liquid_diffusivity_inputs("water", "ethanol", "wilke-chang")
    assert wc.V_solute == pytest.approx(18.9e-6)  # Treybal 3rd ed. Table 2.3 (from memory)
    assert any("2.3" in n for n in wc.notes)
    mu = mt.liquid_model("ethanol").viscosity(298.15)
    by_hand = mt.diffusivity.wilke_chang(298.15, mu, 0.04607, 18.9e-6, 1.5) / 2.3
    assert mt.liquid_diffusivity("water", "ethanol", 298.15, method="wilke-chang") == pytest.approx(
        by_hand, rel=1e-3
    )
    tc = mt.diffusivity.liquid_diffusivity_inputs("water", "ethanol", "tyn-calus")
    assert tc.V_solute == pytest.approx(2 * 18.9e-6)
    acid = mt.diffusivity.liquid_diffusivity_inputs("acetic acid", "benzene", "tyn-calus")
    assert any("organic acid" in n for n in acid.notes)
    acid_in_water = mt.diffusivity.liquid_diffusivity_inputs("acetic acid", "water", "tyn-calus")
    assert not any("dimer" in n for n in acid_in_water.notes)
    forms = {
        solvent: mt.diffusivity.liquid_diffusivity_inputs("benzene", solvent, "hayduk-minhas").form
        for solvent in ("water", "n-hexane", "toluene")
    }
    assert forms == {"water": "aqueous", "n-hexane": "n-paraffin", "toluene": "general"}


def test_alcohol_solvent_rule_raises_the_estimate():
    # non-polar solute in a monohydroxy alcohol: V_B and P_B scaled by 8*eta_B (Poling et al. 11-9)
    with_rule = mt.liquid_diffusivity("toluene", "ethanol", 298.15, method="tyn-calus")
    inp = mt.diffusivity.liquid_diffusivity_inputs("toluene", "ethanol", "tyn-calus")
    assert any("8 eta_B" in n for n in inp.notes)
    mu = mt.liquid_model("ethanol").viscosity(298.15)
    without = mt.diffusivity.tyn_calus(
        298.15, mu, inp.V_solute, inp.V_solvent, inp.parachor_solute, inp.parachor_solvent
    )
    f = 8 * mu * 1000
    assert with_rule == pytest.approx(without * f ** (-1 / 3) * f**0.6, rel=1e-10)


def test_caller_viscosity_overrides_property_layer():
    a = mt.liquid_diffusivity("benzene", "water", 298.15, "wilke-chang", mu_solvent=1.0e-3)
    b = mt.liquid_diffusivity("benzene", "water", 298.15, "wilke-chang", mu_solvent=2.0e-3)
    assert a == pytest.approx(2 * b)


def test_viscous_solvent_warns():
    with pytest.warns(mt.errors.EnvelopeWarning, match="viscous"):
        mt.liquid_diffusivity("benzene", "water", 298.15, "wilke-chang", mu_solvent=0.05)


_liquid_cases = st.sampled_from(
    [
        ("benzene", "water"),
        ("ethanol", "water"),
        ("toluene", "n-hexane"),
        ("acetone", "benzene"),
        ("oxygen", "water"),
    ]
)


@given(
    case=_liquid_cases, method=st.sampled_from(_METHODS), T=st.floats(280.0, 320.0), dT=st.floats(1.0, 20.0)
)
def test_liquid_diffusivity_rises_with_temperature(case, method, T, dT):
    assert mt.liquid_diffusivity(*case, T + dT, method) > mt.liquid_diffusivity(*case, T, method)


@given(
    case=_liquid_cases,
    method=st.sampled_from(_METHODS),
    T=st.lists(st.floats(280.0, 320.0), min_size=1, max_size=6),
)
def test_liquid_scalar_and_array_agree(case, method, T):
    arr = mt.liquid_diffusivity(*case, np.array(T), method)
    for t, d in zip(T, arr, strict=True):
        assert mt.liquid_diffusivity(*case, t, method) == pytest.approx(d, rel=1e-12)


def test_hayduk_minhas_general_and_paraffin_by_hand():
    # Hayduk & Minhas (1982) non-aqueous and n-paraffin forms (Poling et al. 5th ed. 11-9), by hand
    p_a, p_b = 161.6, 206.0
    general = 1.55e-8 * 298.0**1.29 * p_b**0.5 * p_a**-0.42 / (0.6**0.92 * 96.0**0.23)
    got = mt.diffusivity.hayduk_minhas(298.0, 0.6e-3, 96e-6, p_a / 5.623413e6, p_b / 5.623413e6)
    assert got == pytest.approx(general * 1e-4, rel=1e-6)
    eps = 10.2 / 96.0 - 0.791
    paraffin = 13.3e-8 * 298.0**1.47 * 0.3**eps / 96.0**0.71
    assert mt.diffusivity.hayduk_minhas_paraffin(298.0, 0.3e-3, 96e-6) == pytest.approx(paraffin * 1e-4)


# --- the aqueous Hayduk-Minhas form beyond its validated solutes ------------------------------


def test_large_solute_in_water_warns_and_is_low():
    # sucrose in water at 25 C, measured 5.2e-10 m^2/s (Cussler 3rd ed. Table 5.2-1, from
    # memory); its Le Bas volume, 325 cm^3/mol, lies beyond the 150 cm^3/mol the aqueous form is
    # validated on here, and the estimate is about 35 % low: the warning says so
    with pytest.warns(mt.errors.EnvelopeWarning, match="beyond the solutes this library has checked"):
        D = mt.liquid_diffusivity("sucrose", "water", 298.15)
    assert 0.55 * 5.2e-10 < D < 0.75 * 5.2e-10
    ethylbenzene = mt.diffusivity.liquid_diffusivity_inputs("ethylbenzene", "water", "hayduk-minhas")
    assert ethylbenzene.V_solute < mt.diffusivity._liquid.HM_AQUEOUS_VALIDATED_V_MAX


def test_volume_at_an_unmeasured_boiling_point_warns():
    # urea decomposes before it boils; its Vb (103 cm^3/mol) comes from a liquid model at a
    # boiling point of 626 K that only estimates hold: the user is warned and given the fix.
    # With its Le Bas volume (58 cm^3/mol) the aqueous form gives 1.37e-9 against the measured
    # 1.38e-9 m^2/s (Geankoplis 4th ed. Table 6.3-1, from memory)
    with pytest.warns(mt.errors.EnvelopeWarning, match=r"no evaluated table measures.*replace\(Vb="):
        mt.liquid_diffusivity("urea", "water", 298.15)
    urea = mt.species("urea")
    fixed = urea.replace(Vb=mt.substances.le_bas_volume(dict(urea.atoms), urea.smiles))
    assert mt.liquid_diffusivity(fixed, "water", 298.15) == pytest.approx(1.38e-9, rel=0.05)
    # a measured boiling point (glycerol, CRC) gives no such warning
    mt.liquid_diffusivity("glycerol", "water", 298.15)
