"""The ``evaporate`` command: the table, the JSON and the flammability caution."""

from __future__ import annotations

import json

import pytest

from masstransfer import humidity
from masstransfer.cli import main


def test_table_has_units_identities_and_the_caution(capsys):
    assert main(["evaporate", "toluene", "nitrogen", "-T", "330", "350", "--y", "0.01", "--h", "25"]) == 0
    out = capsys.readouterr().out
    assert "flux [kg/(m^2 h)]" in out
    assert "CAS 108-88-3" in out
    assert "lower flammability limit" in out
    assert "licensed engineering practice" in out


def test_json_matches_the_library(capsys):
    argv = ["evaporate", "water", "air", "-T", "333.15", "--humidity-ratio", "0.005", "--h", "28", "--json"]
    assert main(argv) == 0
    data = json.loads(capsys.readouterr().out)
    r = humidity.evaporation_rate("water", "air", T=333.15, h=28.0, humidity_ratio=0.005)
    assert data["mass_flux_kg_per_m2h"][0] == pytest.approx(r.mass_flux_per_hour)
    assert data["T_surface_K"][0] == pytest.approx(r.T_surface)
    assert "flammability" in data["caution"]
    assert data["liquid"].startswith("water (CAS 7732-18-5")


def test_correlation_and_heat_inputs(capsys):
    argv = [
        "evaporate", "water", "air", "-T", "340", "--rh", "0.1", "--correlation",
        "flat-plate-laminar-average", "--velocity", "3", "--length", "0.5",
        "--radiant-temperature", "380", "--conduction-coefficient", "5", "--json",
    ]  # fmt: skip
    assert main(argv) == 0
    data = json.loads(capsys.readouterr().out)
    assert data["q_radiant_W_per_m2"][0] > 0
    assert data["method"].startswith("flat-plate-laminar-average")


def test_errors_are_reported_not_raised(capsys):
    assert main(["evaporate", "water", "air", "-T", "-5", "--rh", "0.5", "--h", "20", "--json"]) == 2
    assert json.loads(capsys.readouterr().out)["error"]["type"] == "InputValueError"
    assert main(["evaporate", "water", "air", "-T", "340", "--rh", "0.5", "--correlation", "x"]) == 2
    assert "--velocity" in capsys.readouterr().err
