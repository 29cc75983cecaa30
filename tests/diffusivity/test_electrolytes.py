"""Strong electrolytes and ions in water (Nernst-Haskell), and wrong-phase or misplaced method names."""

from __future__ import annotations

import pytest

import masstransfer as mt
from masstransfer.diffusivity import LIQUID_METHODS, SpeciesClass, classify
from masstransfer.diffusivity._ions import ionic_kind, salt_ions
from masstransfer.errors import (
    EnvelopeWarning,
    InputTypeError,
    InputValueError,
    MissingConstantError,
    UnknownMethodError,
)

_DILUTE = pytest.warns(EnvelopeWarning, match="infinite-dilution limit")

# --- the numbers-in equation ----------------------------------------------------------------


def test_nernst_haskell_by_hand():
    # (|z+| + |z-|) D+ D- / (|z+| D+ + |z-| D-), by hand; at 25 C and the reference viscosity
    # the scaling factor is one
    assert mt.diffusivity.nernst_haskell(298.15, 0.89e-3, 1.0e-9, 2.0e-9, mu_ref=0.89e-3) == pytest.approx(
        2 * 1.0 * 2.0 / 3.0 * 1e-9
    )
    # a 2:1 salt: 3 * 0.792 * 2.032 / (2 * 0.792 + 2.032) = 1.3352 (by hand)
    cacl2 = mt.diffusivity.nernst_haskell(298.15, 0.89e-3, 0.792e-9, 2.032e-9, 2, 1, mu_ref=0.89e-3)
    assert cacl2 == pytest.approx(3 * 0.792 * 2.032 / (2 * 0.792 + 2.032) * 1e-9)
    # Stokes-Einstein scaling: D proportional to T / viscosity
    hot = mt.diffusivity.nernst_haskell(323.15, 0.5e-3, 1.0e-9, 2.0e-9, mu_ref=0.89e-3)
    assert hot == pytest.approx(4.0 / 3.0 * 1e-9 * (323.15 / 298.15) * (0.89 / 0.5))


def test_nernst_haskell_rejects_a_zero_charge():
    with pytest.raises(InputValueError, match="z_anion"):
        mt.diffusivity.nernst_haskell(298.15, 0.89e-3, 1.0e-9, 2.0e-9, 1, 0)


# --- measured limiting salt diffusivities at 25 C -------------------------------------------

#: Diffusivities of salts, acids and bases in water at infinite dilution, 25 C [m^2/s].
_MEASURED = [
    # Robinson & Stokes, Electrolyte Solutions, 2nd ed. (1959); as quoted in Cussler,
    # Diffusion, 3rd ed. (2009), Chapter 6 (from memory)
    ("sodium chloride", 1.610e-9),
    ("potassium chloride", 1.993e-9),
    ("hydrochloric acid", 3.336e-9),
    # CRC Handbook of Chemistry and Physics, limiting value (from memory)
    ("sodium hydroxide", 2.13e-9),
    # Robinson & Stokes (1959), limiting value (from memory)
    ("calcium chloride", 1.335e-9),
]


@pytest.mark.parametrize(("solute", "measured"), _MEASURED, ids=[m[0] for m in _MEASURED])
def test_electrolytes_in_water_against_measured(solute, measured):
    with _DILUTE:
        D = mt.liquid_diffusivity(solute, "water", 298.15)
    # the ion table and these limits come from the same conductance data: they agree closely
    assert pytest.approx(measured, rel=0.005) == D


def test_user_reported_values_are_now_the_nernst_haskell_limits():
    # the molecular estimate for NaOH was 1.24e-9 (Hayduk-Minhas); the ionic limit is 2.13e-9
    # (CRC Handbook, from memory) and HCl 3.34e-9 (Robinson & Stokes 1959, from memory)
    with _DILUTE:
        assert mt.liquid_diffusivity("NaOH", "water", 298.15) == pytest.approx(2.13e-9, rel=0.005)
    with _DILUTE:
        assert mt.liquid_diffusivity("HCl", "water", 298.15) == pytest.approx(3.34e-9, rel=0.005)


def test_temperature_scaling_uses_the_water_viscosity():
    mu = mt.liquid_model("water").viscosity
    with _DILUTE:
        d25 = mt.liquid_diffusivity("sodium chloride", "water", 298.15)
    with _DILUTE:
        d50 = mt.liquid_diffusivity("sodium chloride", "water", 323.15)
    assert d50 / d25 == pytest.approx((323.15 / 298.15) * mu(298.15) / mu(323.15), rel=1e-9)
    # water's viscosity 0.8900 mPa s at 25 C and 0.5465 at 50 C (IAPWS 2008, from memory)
    assert d50 / d25 == pytest.approx((323.15 / 298.15) * 0.8900 / 0.5465, rel=0.01)


# --- detection -------------------------------------------------------------------------------


@pytest.mark.parametrize(
    "name",
    ["sodium chloride", "NaOH", "potassium hydroxide", "HCl", "nitric acid", "sulfuric acid",
     "ammonium sulfate", "calcium chloride", "magnesium sulfate", "sodium acetate"],
)  # fmt: skip
def test_strong_electrolytes_are_recognised(name):
    sp = mt.species(name)
    assert ionic_kind(sp) == "electrolyte", sp.smiles
    assert SpeciesClass.ELECTROLYTE in classify(sp)
    assert salt_ions(sp) is not None


@pytest.mark.parametrize(
    "name",
    ["acetic acid", "formic acid", "propionic acid", "ammonia", "methylamine", "ethanol", "urea",
     "carbon dioxide", "sulfur dioxide", "hydrogen sulfide", "chlorine", "MEA", "MDEA", "phenol"],
)  # fmt: skip
def test_weak_acids_bases_and_molecules_stay_molecular(name):
    sp = mt.species(name)
    assert ionic_kind(sp) is None
    avail = {m.method: m for m in mt.diffusivity.available_methods(sp, "water", "liquid")}
    assert avail["hayduk-minhas"].default
    assert not avail["nernst-haskell"].applies


def test_a_hand_built_salt_is_recognised_from_its_formula():
    salt = mt.Species(name="table salt (hand-built)", molar_mass=0.05844, formula="NaCl")
    assert ionic_kind(salt) == "electrolyte"
    with _DILUTE:
        assert mt.liquid_diffusivity(salt, "water", 298.15) == pytest.approx(1.610e-9, rel=0.03)


def test_split_into_ions():
    s = salt_ions(mt.species("ammonium sulfate"))
    assert s is not None
    assert (s.cation, s.anion, s.z_cation, s.z_anion) == ("NH4+", "SO4 2-", 1, 2)
    h = salt_ions(mt.species("sulfuric acid"))
    assert h is not None
    assert (h.cation, h.anion) == ("H+", "SO4 2-")
    assert salt_ions(mt.species("acetic acid")) is None  # H+ pairs with strong-acid anions only


# --- dispatch, refusals and warnings ----------------------------------------------------------


def test_nernst_haskell_is_the_default_and_is_registered():
    assert "nernst-haskell" in LIQUID_METHODS
    avail = {m.method: m for m in mt.diffusivity.available_methods("sodium chloride", "water", "liquid")}
    assert avail["nernst-haskell"].default
    assert avail["nernst-haskell"].applies
    assert not avail["hayduk-minhas"].applies
    assert any("strong electrolyte" in r for r in avail["hayduk-minhas"].reasons)
    benzene = {m.method: m for m in mt.diffusivity.available_methods("benzene", "water", "liquid")}
    assert not benzene["nernst-haskell"].applies


@pytest.mark.parametrize("method", ["wilke-chang", "hayduk-minhas", "tyn-calus", "stokes-einstein"])
def test_molecular_methods_refuse_a_strong_electrolyte(method):
    with pytest.raises(
        InputValueError, match=r"sodium hydroxide.*strong electrolyte.*method='nernst-haskell'"
    ):
        mt.liquid_diffusivity("sodium hydroxide", "water", 298.15, method=method)


def test_nernst_haskell_refuses_a_molecular_solute():
    with pytest.raises(MissingConstantError, match="is not one"):
        mt.liquid_diffusivity("benzene", "water", 298.15, method="nernst-haskell")


def test_an_electrolyte_in_another_solvent_is_refused():
    with pytest.raises(MissingConstantError, match=r"sodium chloride.*in water only.*D="):
        mt.liquid_diffusivity("sodium chloride", "ethanol", 298.15)


def test_an_electrolyte_without_tabulated_ions_is_refused():
    with pytest.raises(MissingConstantError, match="tabulated ions"):
        mt.liquid_diffusivity("copper(II) sulfate", "water", 298.15)


def test_a_single_ion_is_refused():
    with pytest.raises(InputValueError, match=r"single ion.*counter-ions.*sodium sulfate"):
        mt.liquid_diffusivity("sulfate", "water", 298.15)


def test_report_and_inputs_for_an_electrolyte():
    r = mt.diffusivity_report("sodium chloride", "water", 298.15)
    assert r.method == "nernst-haskell"
    assert any("infinite-dilution limit" in w for w in r.warnings)
    assert r.constants["solute"]["D of Na+ at 298.15 K"][0] == pytest.approx(1.334e-9)
    assert any("Stokes-Einstein" in n for n in r.notes)
    assert not any("alcohol" in n for n in r.notes)
    with pytest.raises(InputValueError, match="no molar volumes"):
        mt.diffusivity.liquid_diffusivity_inputs("sodium chloride", "water")


def test_cli_uses_nernst_haskell_for_sodium_hydroxide(capsys):
    from masstransfer.cli import main

    assert main(["diffusivity", "NaOH", "water", "-T", "298.15"]) == 0
    out = capsys.readouterr().out
    assert "method: nernst-haskell" in out
    assert "infinite-dilution limit" in out
    assert main(["diffusivity", "NaOH", "water", "-T", "298.15", "--method", "hayduk-minhas"]) == 2
    assert "--method nernst-haskell" in capsys.readouterr().err


# --- method names of the other phase, and a pressure passed as the method -------------------


def test_a_gas_method_for_a_liquid_names_the_right_function():
    with pytest.raises(UnknownMethodError, match=r"'fuller' is a gas method.*masstransfer\.gas_diffusivity"):
        mt.liquid_diffusivity("ethanol", "water", 298.15, method="fuller")


def test_a_liquid_method_for_a_gas_names_the_right_function():
    with pytest.raises(UnknownMethodError, match=r"is a liquid method.*masstransfer\.liquid_diffusivity"):
        mt.gas_diffusivity("ethanol", "air", 298.15, method="wilke-chang")


def test_cli_names_the_phase_option_for_a_method_of_the_other_phase(capsys):
    from masstransfer.cli import main

    assert main(["diffusivity", "ethanol", "water", "-T", "298.15", "--method", "fuller"]) == 2
    assert "--phase gas" in capsys.readouterr().err


def test_a_pressure_in_the_method_position_gets_a_hint():
    with pytest.raises(InputTypeError, match=r"by keyword, as P=101325"):
        mt.liquid_diffusivity("ethanol", "water", 300.0, 101325)  # type: ignore[arg-type]


def test_an_element_is_not_taken_for_a_salt():
    # elemental mercury (Hg0) dissolves as atoms: not an electrolyte, whatever it lacks otherwise
    assert ionic_kind(mt.species("mercury")) is None


def test_ammonium_hydroxide_is_sent_to_ammonia():
    with pytest.raises(InputValueError, match="pass 'ammonia'"):
        mt.liquid_diffusivity("ammonium hydroxide", "water", 298.15)


def test_an_electrolyte_without_tabulated_ions_gets_one_reason():
    with pytest.raises(MissingConstantError) as info:
        mt.liquid_diffusivity("copper(II) sulfate", "water", 298.15)
    assert "wilke-chang" not in str(info.value)


def test_available_methods_lists_every_method_for_an_electrolyte_none_can_estimate():
    avail = mt.diffusivity.available_methods("copper(II) sulfate", "water", "liquid")
    assert {m.method for m in avail} >= {"wilke-chang", "hayduk-minhas", "nernst-haskell"}
    assert not any(m.applies or m.default for m in avail)
    assert any("tabulated ions" in r for m in avail for r in m.reasons)
