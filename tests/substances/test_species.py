from __future__ import annotations

import dataclasses

import pytest

import masstransfer as mt
from masstransfer.substances import le_bas_volume


def test_resolves_name_cas_and_formula_to_the_same_species():
    by_name = mt.species("toluene")
    assert mt.species("108-88-3") == by_name
    assert mt.species("C7H8").CAS == "108-88-3"


def test_constants_are_si():
    tol = mt.species("toluene")
    assert tol.molar_mass == pytest.approx(0.09214, rel=1e-3)  # chemicals' MW, 92.14 g/mol
    assert tol.Tb == pytest.approx(383.75, abs=0.5)  # CRC Handbook, 110.6 C (from memory)
    assert tol.Tc == pytest.approx(591.75, abs=0.5)  # Poling et al. 5th ed. App. A (from memory)
    assert 5e-10 < tol.sigma < 7e-10
    assert tol.atoms == {"C": 7, "H": 8}
    assert tol.Vb == pytest.approx(118.3e-6, rel=0.03)  # Le Bas 118.2 cm^3/mol, Treybal Table 2.3 rules


def test_lennard_jones_from_svehla_table_where_tabulated():
    water = mt.species("water")
    # Svehla (1962) via Poling et al. 5th ed. Appendix B: sigma 2.641 A, eps/k 809.1 K (from memory)
    assert water.sigma == pytest.approx(2.641e-10)
    assert water.epsilon_k == pytest.approx(809.1)
    assert "Poling" in water.sources["sigma"]


def test_air_pseudo_species():
    air = mt.species("air")
    assert air.molar_mass == pytest.approx(0.0289586)  # Lemmon et al. (2000)
    assert air.fuller_volume == 19.7  # Fuller et al. (1969) via Poling et al. Table 11-1 (from memory)
    assert mt.species("Air") is air


def test_second_lookup_is_cached():
    from masstransfer.substances._species import _resolve

    first = mt.species("ethyl acetate")
    hits = _resolve.cache_info().hits
    # a cache hit returns the very same frozen record without querying the database again
    assert mt.species("ethyl acetate") is first
    assert _resolve.cache_info().hits == hits + 1


def test_hand_built_species_and_replace():
    s = mt.Species(name="resin monomer (invented)", molar_mass=0.2, Tb=500.0, Vb=2.0e-4)
    assert s.require("Tb", "test") == 500.0
    with pytest.raises(mt.errors.MissingConstantError, match="sigma"):
        s.require("sigma", "Chapman-Enskog")
    t = mt.species("toluene").replace(Vb=1.2e-4)
    assert t.Vb == 1.2e-4
    assert t.sources["Vb"] == "user"
    assert dataclasses.is_dataclass(t)


@pytest.mark.parametrize(
    ("atoms", "smiles", "expected_cm3"),
    [
        # Le Bas increments, Reid, Prausnitz & Sherwood 3rd ed. Table 3-8 (from memory), summed by hand
        ({"C": 7, "H": 8}, "CC1=CC=CC=C1", 7 * 14.8 + 8 * 3.7 - 15.0),
        ({"C": 2, "H": 4, "O": 2}, "CC(=O)O", 2 * 14.8 + 4 * 3.7 + 2 * 12.0),
        ({"C": 2, "H": 6, "O": 1}, "CCO", 2 * 14.8 + 6 * 3.7 + 7.4),
        ({"C": 4, "H": 10, "O": 1}, "CCOCC", 4 * 14.8 + 10 * 3.7 + 9.9),
        ({"C": 10, "H": 8}, "C1=CC=C2C=CC=CC2=C1", 10 * 14.8 + 8 * 3.7 - 30.0),
        ({"C": 6, "H": 12}, "C1CCCCC1", 6 * 14.8 + 12 * 3.7 - 15.0),
    ],
    ids=["toluene", "acetic-acid", "ethanol", "diethyl-ether", "naphthalene", "cyclohexane"],
)
def test_le_bas_volume(atoms, smiles, expected_cm3):
    assert le_bas_volume(atoms, smiles) == pytest.approx(expected_cm3 * 1e-6)


def test_unknown_species_message_says_how_to_build_one():
    with pytest.raises(mt.errors.UnknownSpeciesError, match="Species\\(name=") as info:
        mt.species("not-a-chemical-xyz")
    assert isinstance(info.value, ValueError)
    assert isinstance(info.value, LookupError)


@pytest.mark.parametrize(
    ("field", "value", "hint"),
    [
        ("molar_mass", 92.14, "kg/mol"),
        ("Vb", 118.0, "m\\^3/mol"),
        ("sigma", 5.0, "metres"),
        ("Tb", -3.0, "positive"),
        ("Tc", float("nan"), "finite"),
    ],
)
def test_hand_built_species_rejects_wrong_units(field, value, hint):
    kwargs = {"name": "x", "molar_mass": 0.1, field: value}
    with pytest.raises(mt.errors.InputValueError, match=hint):
        mt.Species(**kwargs)


def test_import_does_not_load_databases():
    import subprocess
    import sys

    code = "import sys, masstransfer; print('thermo' in sys.modules, 'chemicals' in sys.modules)"
    out = subprocess.run([sys.executable, "-c", code], capture_output=True, text=True, check=True)
    assert out.stdout.split() == ["False", "False"]
