"""The command line's outputs: the caution everywhere, the two wet bulbs, messages and formats."""

from __future__ import annotations

import json
import subprocess
import sys

import pytest

from masstransfer import __version__
from masstransfer._cli_text import CAUTION, value_spread
from masstransfer.cli import main

_RUNS = {
    "diffusivity": ["diffusivity", "toluene", "air", "-T", "300"],
    "coefficient-h": ["coefficient", "toluene", "air", "--h", "20", "-T", "300"],
    "coefficient-kc": ["coefficient", "toluene", "air", "--kc", "12 mm/s", "-T", "300"],
    "wet-bulb": ["wet-bulb", "-T", "303.15", "--rh", "0.5"],
    "evaporate": ["evaporate", "toluene", "nitrogen", "-T", "330", "--y", "0.01", "--h", "25"],
    "correlations": ["correlations", "--geometry", "sphere"],
    "correlation": ["correlations", "sphere-ranz-marshall"],
}


@pytest.mark.parametrize("name", sorted(_RUNS))
def test_every_subcommand_carries_the_caution_in_text_and_json(name, capsys):
    pytest.importorskip("pint")  # the k_c run gives a value with a unit
    assert main(_RUNS[name]) == 0
    assert CAUTION in capsys.readouterr().out.replace("\n", " ")
    if name == "correlations":  # the catalogue's JSON is a list of records, kept a list
        return
    assert main([*_RUNS[name], "--json"]) == 0
    assert CAUTION in json.loads(capsys.readouterr().out)["caution"]


def test_the_caution_names_the_hazards_and_defers_to_practice():
    for words in ("toxic", "flammable", "food", "pressure equipment", "measured data", "local codes"):
        assert words in CAUTION
    assert "licensed engineering practice" in CAUTION


def test_wet_bulb_reports_both_temperatures_against_coolprop(capsys):
    cp = pytest.importorskip("CoolProp.CoolProp")
    assert main(["wet-bulb", "-T", "303.15", "313.15", "--rh", "0.5", "--json"]) == 0
    data = json.loads(capsys.readouterr().out)
    assert data["resolved"]["liquid"]["CAS"] == "7732-18-5"
    assert data["resolved"]["gas"]["name"] == "air"
    for T, T_as, T_wb, diff in zip(
        data["T_K"],
        data["adiabatic_saturation_K"],
        data["wet_bulb_K"],
        data["adiabatic_saturation_minus_wet_bulb_K"],
        strict=True,
    ):
        # CoolProp HAPropsSI 'Twb' (real humid air, Hyland-Wexler with ASHRAE RP-1485): the
        # adiabatic-saturation wet bulb; the ideal-gas balance keeps within 0.05 K at 1 atm
        reference = cp.HAPropsSI("Twb", "T", T, "P", 101325.0, "R", 0.5)  # CoolProp HAPropsSI
        assert T_as == pytest.approx(reference, abs=0.05)
        assert 0.05 < diff < 0.5  # the wetted surface runs a little colder (Le^(2/3) about 0.9)
        assert diff == pytest.approx(T_as - T_wb, abs=1e-9)


def test_wet_bulb_text_says_which_temperature_is_which(capsys):
    assert main(["wet-bulb", "-T", "303.15", "--rh", "0.5"]) == 0
    out = capsys.readouterr().out
    assert "T_wb: psychrometric wet bulb" in out
    assert "T_as: adiabatic-saturation temperature, the thermodynamic wet bulb" in out
    assert "T_as - T_wb [K]" in out
    assert "101.325 kPa" in out
    assert out.startswith("liquid: water (CAS 7732-18-5")


def test_wet_bulb_above_boiling_gives_the_numbers_and_the_fix(capsys):
    assert main(["wet-bulb", "-T", "400", "--rh", "0.5"]) == 2
    err = capsys.readouterr().err
    assert "vapour pressure of water is" in err
    assert "P=101325 Pa" in err
    assert "raise P above" in err
    assert "--rh=0.5" in err


def test_a_negative_temperature_names_no_array(capsys):
    assert main(["diffusivity", "water", "air", "-T", "-5"]) == 2
    err = capsys.readouterr().err
    assert "T=-5.0" in err
    assert "array" not in err
    assert "shape" not in err


def test_celsius_written_c_suggests_degc(capsys):
    pytest.importorskip("pint")
    assert main(["diffusivity", "water", "air", "-T", "60 C"]) == 2
    err = capsys.readouterr().err
    assert "coulomb" in err
    assert "'60 degC'" in err


def test_the_kelvin_hint_leads_the_message(capsys):
    assert main(["diffusivity", "ethanol", "air", "-T", "60"]) == 2
    err = capsys.readouterr().err.removeprefix("masstransfer: error: ")
    assert err.startswith("-T 60 without a unit is read as 60 K")


def test_coefficient_points_to_the_phase_option(capsys):
    assert main(["coefficient", "ethanol", "water", "--h", "1000", "-T", "300"]) == 2
    err = capsys.readouterr().err
    assert "--phase liquid" in err
    assert "masstransfer.liquid_diffusivity" not in err


def test_a_frozen_solvent_is_called_frozen(capsys):
    assert main(["diffusivity", "ethanol", "water", "-T", "250"]) == 2
    err = capsys.readouterr().err
    assert "frozen" in err
    assert "melting point" in err
    assert "saturation line" not in err


@pytest.mark.parametrize(
    ("value", "spread", "shown"),
    [
        (1.5991e-05, 9.6e-07, "1.599e-05 ± 9.6e-07"),
        (0.4781, 0.0311, "0.478 ± 0.031"),
        (35.04, 3.5, "35.0 ± 3.5"),
        (3512.0, 351.0, "3510 ± 350"),
        (0.1599, 0.00996, "0.160 ± 0.010"),
    ],
)
def test_plus_minus_two_figures_and_the_value_to_the_same_place(value, spread, shown):
    assert value_spread(value, spread) == shown


def test_diffusivity_table_formats_and_one_column_per_quantity(capsys):
    pytest.importorskip("pint")
    assert main(["diffusivity", "water", "air", "-T", "300"]) == 0
    out = capsys.readouterr().out
    lines = out.splitlines()
    row = lines[1 + next(i for i, line in enumerate(lines) if line.startswith("---"))]
    assert "e-05 ± " in row  # the ± with two figures, in the same notation
    assert "e-06" in row
    assert main(["diffusivity", "water", "air", "-T", "300", "--units", "T=degC,D=cm^2/s"]) == 0
    out = capsys.readouterr().out
    assert out.count("D [cm^2/s]") == 1
    assert "D [m^2/s]" not in out
    assert main(["diffusivity", "water", "air", "-T", "300", "--units", "D=ft^2/h"]) == 0
    cells = next(line for line in capsys.readouterr().out.splitlines() if " ± " in line).split()
    value, spread = cells[1], cells[3]
    assert len(spread.replace("0.", "").lstrip("0")) == 2  # two significant figures
    assert len(value.split(".")[1]) == len(spread.split(".")[1])  # the same decimal place


def test_readable_pressure_in_the_header(capsys):
    assert main(["diffusivity", "toluene", "nitrogen", "-T", "400", "-P", "5e6"]) == 0
    out = capsys.readouterr().out
    assert "gas at 5 MPa" in out
    assert "5e+06" not in out


def test_version():
    out = subprocess.run(
        [sys.executable, "-m", "masstransfer", "--version"], capture_output=True, text=True, check=True
    )
    assert out.stdout.strip() == f"masstransfer {__version__}"


def test_wet_bulb_help_has_a_description():
    out = subprocess.run(
        [sys.executable, "-m", "masstransfer", "wet-bulb", "--help"],
        capture_output=True,
        text=True,
        check=True,
    )
    assert "adiabatic-saturation" in out.stdout
    assert "wetted" in out.stdout


def test_evaporate_prints_the_species_before_the_table(capsys):
    assert main(_RUNS["evaporate"]) == 0
    lines = capsys.readouterr().out.splitlines()
    assert lines[0].startswith("liquid: toluene (CAS 108-88-3")
    assert lines[1].startswith("gas: nitrogen")
    assert lines[2].startswith("Evaporation of toluene into nitrogen at 101.325 kPa")


def test_emissivity_without_radiant_temperature_is_flagged(capsys):
    assert main([*_RUNS["evaporate"], "--emissivity", "0.5", "--json"]) == 0
    data = json.loads(capsys.readouterr().out)
    assert any("--emissivity has no effect" in w for w in data["warnings"])
    assert main([*_RUNS["evaporate"], "--json"]) == 0
    assert not any("emissivity" in w for w in json.loads(capsys.readouterr().out)["warnings"])


def test_phase_stated_once_and_a_supercritical_medium_is_a_gas(capsys):
    assert main(["diffusivity", "toluene", "air", "-T", "300"]) == 0
    out = capsys.readouterr().out
    assert "phase: gas (inferred: air is a gas at the given T and P)" in out
    assert "note: phase inferred" not in out
    assert "vapour at the given" not in out
    assert main(["diffusivity", "benzene", "water", "-T", "298.15"]) == 0
    assert "water is a liquid" in capsys.readouterr().out


def test_column_profile_says_where_z_starts(capsys, tmp_path):
    from masstransfer._cli_column import EXAMPLE_SPEC

    path = tmp_path / "spec.toml"
    path.write_text(EXAMPLE_SPEC, encoding="utf-8")
    assert main(["column", str(path), "--points", "3"]) == 0
    out = capsys.readouterr().out
    assert "z above the bottom of the packing" in out
    assert CAUTION in out.replace("\n", " ")
    assert main(["column", str(path), "--points", "3", "--json"]) == 0
    data = json.loads(capsys.readouterr().out)
    assert CAUTION in data["caution"]
    assert data["profile"]["z_m"][0] == 0.0
    assert data["profile"]["y"][0] == pytest.approx(0.02)  # the entering gas, at the bottom
    assert "bottom" in data["profile_z"]
