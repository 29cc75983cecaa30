"""Method records, defaults, class rules, special-rule notes, phase checks and domains."""

from __future__ import annotations

import json
import subprocess
import sys
import textwrap

import numpy as np
import pytest
from hypothesis import given
from hypothesis import strategies as st

import masstransfer as mt
from masstransfer.diffusivity import GAS_METHODS, LIQUID_METHODS, DiffusivityMethod, SpeciesClass, classify
from masstransfer.errors import EnvelopeWarning, InputValueError, OutOfRangeError

ATM = 101325.0
#: envelope warnings (T* outside the Neufeld fit, viscous solvents) are not the subject here
_quiet = pytest.mark.filterwarnings("ignore::masstransfer.errors.EnvelopeWarning")

# --- the records -------------------------------------------------------------------


@pytest.mark.parametrize("rec", [*GAS_METHODS.values(), *LIQUID_METHODS.values()], ids=lambda r: r.name)
def test_every_record_is_complete(rec: DiffusivityMethod):
    assert callable(rec.function)
    assert rec.function.__doc__
    assert "References" in rec.function.__doc__
    assert rec.constants
    assert 0 < rec.accuracy_pct < 100
    assert rec.accuracy
    assert rec.reference
    assert rec.T_range[0] < rec.T_range[1]
    registry = GAS_METHODS if rec.phase == "gas" else LIQUID_METHODS
    assert registry[rec.name] is rec


def test_available_methods_lists_every_method_with_reasons():
    h2 = {m.method: m for m in mt.diffusivity.available_methods("hydrogen", "air")}
    assert set(h2) == set(GAS_METHODS)
    assert h2["fuller"].default
    assert h2["fuller"].applies
    assert not h2["brokaw"].applies
    assert any("quantum gas" in r for r in h2["brokaw"].reasons)
    water = {m.method: m for m in mt.diffusivity.available_methods("water", "air")}
    assert water["brokaw"].applies
    assert any("polar" in r for r in water["chapman-enskog"].reasons)
    liquid = {m.method: m for m in mt.diffusivity.available_methods("benzene", "water", phase="liquid")}
    assert liquid["hayduk-minhas"].default
    assert any("1 nm" in r for r in liquid["stokes-einstein"].reasons)


def test_a_missing_constant_makes_a_method_inapplicable():
    bare = mt.Species(name="bare vapour (invented)", molar_mass=0.1, fuller_volume=100.0)
    avail = {m.method: m for m in mt.diffusivity.available_methods(bare, "air")}
    assert avail["fuller"].applies
    assert not avail["chapman-enskog"].applies
    assert any("sigma" in r for r in avail["chapman-enskog"].reasons)


def test_defaults_follow_the_published_recommendations():
    # Poling et al. 5th ed. Sections 11-4 and 11-10 (from memory): Fuller for gases; Hayduk-Minhas
    # for water and n-paraffins; Tyn-Calus for other organic solvents
    assert mt.diffusivity_report("toluene", "air", 300.0).method == "fuller"
    assert mt.diffusivity_report("benzene", "water", 298.15).method == "hayduk-minhas"
    assert mt.diffusivity_report("toluene", "n-hexane", 298.15).method == "hayduk-minhas"
    assert mt.diffusivity_report("toluene", "ethanol", 298.15).method == "tyn-calus"
    assert mt.liquid_diffusivity("benzene", "water", 298.15) == mt.liquid_diffusivity(
        "benzene", "water", 298.15, method="hayduk-minhas"
    )


def test_default_falls_back_when_fuller_has_no_volume():
    silane = mt.species("silane")  # silicon has no Fuller increment
    r = mt.diffusivity_report(silane, "nitrogen", 300.0)
    assert r.method != "fuller"
    assert any("default method 'fuller' not used" in n for n in r.notes)


# --- classes and the cautions they carry --------------------------------------------


def test_classes_from_typed_data():
    assert SpeciesClass.POLAR in classify(mt.species("water"))
    assert SpeciesClass.ASSOCIATING in classify(mt.species("ethanol"))
    assert SpeciesClass.ALCOHOL in classify(mt.species("1-butanol"))
    assert SpeciesClass.ACID in classify(mt.species("acetic acid"))
    assert SpeciesClass.QUANTUM in classify(mt.species("helium"))
    assert SpeciesClass.N_PARAFFIN in classify(mt.species("n-heptane"))
    assert SpeciesClass.NONPOLAR in classify(mt.species("nitrogen"))  # a zero dipole stays zero
    unknown = mt.Species(name="solvent X (invented)", molar_mass=0.1, formula="C5H10O2")
    assert SpeciesClass.DIPOLE_UNKNOWN in classify(unknown)
    assert SpeciesClass.NONPOLAR in classify(
        mt.Species(name="alkane (invented)", molar_mass=0.1, formula="C7H16")
    )


def test_chapman_enskog_warns_for_a_polar_pair():
    with pytest.warns(EnvelopeWarning, match="polar member"):
        mt.gas_diffusivity("water", "air", 300.0, method="chapman-enskog")


def test_brokaw_never_runs_on_a_quantum_gas():
    with pytest.raises(InputValueError, match="quantum gas"):
        mt.gas_diffusivity("helium", "water", 400.0, 1e4, method="brokaw")


def test_brokaw_outside_its_class_warns():
    with pytest.warns(EnvelopeWarning, match="outside its class"):
        mt.gas_diffusivity("toluene", "nitrogen", 350.0, method="brokaw")


def test_brokaw_needs_known_dipoles():
    vapour = mt.Species(name="vapour X (invented)", molar_mass=0.1, Tb=380.0, Vb=1.2e-4, formula="C5H10O2")
    with pytest.raises(InputValueError, match="unknown is not zero"):
        mt.gas_diffusivity(vapour, "water", 450.0, 1e4, method="brokaw")


# --- special rules recorded with the value they changed -----------------------------


def test_fuller_ring_increment_only_for_aromatic_rings():
    # Fuller et al. (1969) increments via Poling et al. 5th ed. Table 11-1 (from memory), by hand
    assert mt.diffusivity.fuller_volume("tetrahydrofuran") == pytest.approx(4 * 15.9 + 8 * 2.31 + 6.11)
    assert mt.diffusivity.fuller_volume("1,4-dioxane") == pytest.approx(4 * 15.9 + 8 * 2.31 + 2 * 6.11)
    assert mt.diffusivity.fuller_volume("pyridine") == pytest.approx(5 * 15.9 + 5 * 2.31 + 4.54 - 18.3)
    r = mt.diffusivity_report("tetrahydrofuran", "air", 300.0)
    assert any("no Fuller ring increment" in n and "saturated heterocyclic" in n for n in r.notes)
    b = mt.diffusivity_report("benzene", "air", 300.0)
    assert any("ring increment -18.3" in n for n in b.notes)


def test_small_gas_uses_its_tabulated_molar_volume():
    # Treybal 3rd ed. Table 2.3 (from memory): O2 25.6, H2 14.3 cm^3/mol
    inp = mt.diffusivity.liquid_diffusivity_inputs("oxygen", "water", "wilke-chang")
    assert inp.V_solute == pytest.approx(25.6e-6)
    h2 = mt.diffusivity.liquid_diffusivity_inputs("hydrogen", "water", "wilke-chang")
    assert h2.V_solute == pytest.approx(14.3e-6)
    assert any("14.3" in n and "tabulated" in n for n in h2.notes)


def test_estimated_lennard_jones_constants_are_noted():
    # n-butyl acetate has no tabulated Lennard-Jones constants; ethyl acetate has (Svehla 1962)
    assert mt.species("n-butyl acetate").origins["sigma"] is mt.substances.Origin.ESTIMATED
    r = mt.diffusivity_report("n-butyl acetate", "air", 350.0, method="chapman-enskog")
    assert any("estimated from the critical point" in n for n in r.notes)
    assert mt.species("ethyl acetate").origins["sigma"] is mt.substances.Origin.TABULATED
    t = mt.diffusivity_report("ethyl acetate", "air", 350.0, method="chapman-enskog")
    assert not any("estimated from the critical point" in n for n in t.notes)


def test_unknown_dipole_is_not_taken_as_non_polar():
    solute = mt.species("chlorobenzene").replace(dipole=None)
    inp = mt.diffusivity.liquid_diffusivity_inputs(solute, "ethanol", "tyn-calus")
    assert any("dipole moment unknown" in n for n in inp.notes)
    assert not any("8 eta_B [cP]" in n for n in inp.notes)
    # a hydrocarbon with no dipole on record is non-polar by structure (common practice)
    bare = mt.species("toluene").replace(dipole=None)
    assert any(
        "8 eta_B" in n for n in mt.diffusivity.liquid_diffusivity_inputs(bare, "ethanol", "tyn-calus").notes
    )
    known = mt.diffusivity.liquid_diffusivity_inputs("toluene", "ethanol", "tyn-calus")
    assert any("8 eta_B" in n for n in known.notes)


def test_report_carries_accuracy_reference_and_the_rule_values():
    r = mt.diffusivity_report("toluene", "ethanol", 298.15, phase="liquid", method="tyn-calus")
    assert r.accuracy_pct == LIQUID_METHODS["tyn-calus"].accuracy_pct
    assert "Tyn" in r.reference
    assert any(n.startswith("alcohol-solvent factor 8 eta_B =") for n in r.notes)
    assert "stated accuracy 10 %" in r.summary()


# --- phase of the medium --------------------------------------------------------------


def test_gas_call_with_a_liquid_medium_is_an_error():
    # benzene in water at 25 C: water is a liquid at 1 atm (its vapour pressure is 3.2 kPa,
    # common practice); the gas methods would return a value about 10^4 times too high
    with pytest.raises(OutOfRangeError, match="liquid_diffusivity"):
        mt.gas_diffusivity("benzene", "water", 298.15)
    with pytest.raises(OutOfRangeError, match="not a vapour"):
        mt.gas_diffusivity("benzene", "water", np.array([298.15, 400.0]))
    # steam at 400 K and 1 atm, or water vapour at 1 kPa and 298 K, are vapours
    assert mt.gas_diffusivity("benzene", "water", 400.0) > 0
    assert mt.gas_diffusivity("benzene", "water", 298.15, 1000.0) > 0


def test_liquid_call_checks_the_solvent_is_liquid():
    assert mt.liquid_diffusivity("benzene", "water", 298.15) > 0
    with pytest.raises(OutOfRangeError, match="boils"):
        mt.liquid_diffusivity("benzene", "water", 420.0)
    with pytest.raises(OutOfRangeError, match="frozen"):
        mt.liquid_diffusivity("benzene", "water", 250.0, mu_solvent=2e-3)
    with pytest.warns(EnvelopeWarning, match="range the method is stated for"):
        assert mt.liquid_diffusivity("benzene", "water", 420.0, P=5e5) > 0  # pressurised water


def test_report_infers_and_records_the_phase():
    liq = mt.diffusivity_report("benzene", "water", 298.15)
    assert liq.phase == "liquid"
    assert any("phase inferred" in n for n in liq.notes)
    assert mt.diffusivity_report("benzene", "air", 298.15).phase == "gas"
    with pytest.raises(InputValueError, match="state it with phase"):
        mt.diffusivity_report("benzene", "water", 373.0)


def test_cli_infers_the_phase_and_prints_the_accuracy(capsys):
    from masstransfer.cli import main

    assert main(["diffusivity", "benzene", "water", "-T", "298.15"]) == 0
    out = capsys.readouterr().out
    assert "phase: liquid (inferred" in out
    assert "stated accuracy" in out
    assert main(["diffusivity", "benzene", "water", "-T", "298.15", "--phase", "gas"]) == 2
    assert "--phase liquid" in capsys.readouterr().err
    assert main(["diffusivity", "benzene", "water", "-T", "298.15", "--json"]) == 0
    data = json.loads(capsys.readouterr().out)
    assert data["phase"] == "liquid"
    assert data["phase_inferred"] is True
    assert data["accuracy_pct"] == LIQUID_METHODS["hayduk-minhas"].accuracy_pct


# --- domains of the numbers-in functions ---------------------------------------------


def test_wilke_lee_leading_factor_domain():
    # 3.03 - 0.98/M_AB^0.5 changes sign at M_AB = (0.98/3.03)^2 = 0.105 g/mol (by hand)
    with pytest.raises(InputValueError, match="leading factor"):
        mt.diffusivity.wilke_lee(300.0, ATM, 5e-5, 5e-5, 3e-10, 100.0)
    assert mt.diffusivity.wilke_lee(300.0, ATM, 2e-4, 2e-4, 3e-10, 100.0) > 0


def test_hayduk_minhas_aqueous_domain():
    # V^-0.19 - 0.292 changes sign at V = 0.292^(-1/0.19) = 651 cm^3/mol (by hand)
    with pytest.raises(InputValueError, match="changes sign"):
        mt.diffusivity.hayduk_minhas_aqueous(298.0, 0.89e-3, 700e-6)
    assert mt.diffusivity.hayduk_minhas_aqueous(298.0, 0.89e-3, 600e-6) > 0


# --- species practitioners use -------------------------------------------------------

_PLANT = [
    "methanol", "ethanol", "isopropanol", "1-butanol",
    "acetone", "methyl ethyl ketone",
    "ethyl acetate", "n-butyl acetate",
    "dichloromethane", "chloroform", "trichloroethylene",
    "benzene", "toluene", "o-xylene", "styrene",
    "triethylamine", "diethylamine",
    "ethylene glycol", "propylene glycol",
    "acetic acid", "formic acid",
]  # fmt: skip


@pytest.mark.parametrize("solute", _PLANT)
def test_plant_solvents_in_air_and_water(solute):
    D = mt.gas_diffusivity(solute, "air", 350.0)
    assert 3e-6 < D < 3e-5  # common practice: organic vapours in air are 0.03-0.3 cm^2/s
    r = mt.diffusivity_report(solute, "water", 298.15)
    assert r.phase == "liquid"
    assert 3e-10 < r.value < 3e-9  # common practice: small organic solutes in water, 0.3-3e-9 m^2/s


# --- caches keyed on everything that changes a result ---------------------------------

_ORDER_SCRIPT = textwrap.dedent(
    """
    import sys
    import masstransfer as mt
    direct = mt.Species(name="vapour (invented)", molar_mass=0.1, Tb=380.0, Vb=1.2e-4,
                        sigma=5.5e-10, epsilon_k=400.0)
    via_replace = mt.Species(name="vapour (invented)", molar_mass=0.1, Tb=380.0,
                             Vb=1.2e-4).replace(sigma=5.5e-10, epsilon_k=400.0)
    first, second = (direct, via_replace) if sys.argv[1] == "direct-first" else (via_replace, direct)
    a = mt.gas_diffusivity(first, "air", 300.0, method="wilke-lee")
    b = mt.gas_diffusivity(second, "air", 300.0, method="wilke-lee")
    print(repr(a), repr(b), direct == via_replace)
    """
)


def test_equal_descriptions_give_equal_results_in_either_order():
    outs = [
        subprocess.run(
            [sys.executable, "-c", _ORDER_SCRIPT, order], capture_output=True, text=True, check=True
        ).stdout.split()
        for order in ("direct-first", "replace-first")
    ]
    (a1, b1, eq1), (a2, b2, eq2) = outs
    assert eq1 == eq2 == "True"
    assert a1 == b1 == a2 == b2


def test_origin_is_part_of_equality():
    s = mt.species("toluene")
    user = s.replace(sigma=s.sigma)
    assert user.sigma == s.sigma
    assert user.origins["sigma"] is mt.substances.Origin.USER
    assert user != s  # a user-given constant is not the tabulated one, though equal in value


# --- positivity and finiteness over each numbers-in function's declared domain ----------

_T = st.floats(150.0, 3000.0)
_P = st.floats(1e2, 1e6)
_M = st.floats(2e-3, 0.5)  # kg/mol: H2 to heavy vapours; M_AB then stays above Wilke-Lee's 0.105 g/mol


@_quiet
@given(T=_T, P=_P, Ma=_M, Mb=_M, va=st.floats(2.0, 500.0), vb=st.floats(2.0, 500.0))
def test_fuller_positive_and_finite(T, P, Ma, Mb, va, vb):
    D = mt.diffusivity.fuller(T, P, Ma, Mb, va, vb)
    assert np.isfinite(D)
    assert D > 0


@_quiet
@given(T=_T, P=_P, Ma=_M, Mb=_M, s=st.floats(2e-10, 9e-10), e=st.floats(5.0, 1500.0))
def test_kinetic_methods_positive_and_finite(T, P, Ma, Mb, s, e):
    for fn in (mt.diffusivity.chapman_enskog, mt.diffusivity.wilke_lee):
        D = fn(T, P, Ma, Mb, s, e)
        assert np.isfinite(D)
        assert D > 0


@_quiet
@given(
    T=st.floats(250.0, 450.0),
    mu=st.floats(2e-4, 5e-2),
    V=st.floats(5e-6, 640e-6),
    P_a=st.floats(1e-6, 1e-4),
    P_b=st.floats(1e-6, 1e-4),
)
def test_liquid_methods_positive_and_finite(T, mu, V, P_a, P_b):
    values = [
        mt.diffusivity.wilke_chang(T, mu, 0.05, V, 1.0),
        mt.diffusivity.hayduk_minhas_aqueous(T, mu, V),
        mt.diffusivity.hayduk_minhas_paraffin(T, mu, V),
        mt.diffusivity.hayduk_minhas(T, mu, V, P_a, P_b),
        mt.diffusivity.tyn_calus(T, mu, V, V, P_a, P_b),
    ]
    assert all(np.isfinite(v) and v > 0 for v in values)


def test_class_caution_reaches_a_python_dash_c_caller():
    code = (
        "import masstransfer as mt; print(mt.gas_diffusivity('water', 'air', 300.0, method='chapman-enskog'))"
    )
    out = subprocess.run([sys.executable, "-c", code], capture_output=True, text=True, check=True)
    assert float(out.stdout) > 0
    assert "EnvelopeWarning" in out.stderr
    assert "polar member" in out.stderr


def test_available_methods_infers_a_liquid_solvent():
    # water is a liquid at 25 C and 1 atm (common practice): its methods are the liquid ones
    names = [m.method for m in mt.diffusivity.available_methods("ethylbenzene", "water")]
    assert names == list(mt.diffusivity.LIQUID_METHODS)
    assert [m.method for m in mt.diffusivity.available_methods("toluene", "air")] == list(
        mt.diffusivity.GAS_METHODS
    )


def test_report_text_shows_constants_to_six_significant_digits():
    import re

    text = mt.diffusivity_report("acetone", "water", 298.15).summary()
    constants = [line for line in text.splitlines() if line.startswith("  ") and " = " in line]
    assert constants
    for line in constants:
        value = line.split(" = ", 1)[1].split(" (", 1)[0]
        digits = re.sub(r"[eE][-+]?\d+$", "", value).replace(".", "").replace("-", "").lstrip("0")
        assert len(digits) <= 6, line
