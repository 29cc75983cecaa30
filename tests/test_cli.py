from __future__ import annotations

import json
import subprocess
import sys

import pytest

from masstransfer.cli import main


def test_demo_runs_and_has_units(capsys):
    assert main(["demo"]) == 0
    out = capsys.readouterr().out
    assert "mm^2/s" in out
    assert "[K]" in out
    assert "invented" in out
    assert "Cautions" in out
    assert "kg of water per hour" in out


def test_diffusivity_json(capsys):
    assert main(["diffusivity", "toluene", "air", "-T", "300", "350", "--json"]) == 0
    data = json.loads(capsys.readouterr().out)
    assert data["method"] == "fuller"
    assert len(data["D_m2_per_s"]) == 2
    assert data["D_m2_per_s"][1] > data["D_m2_per_s"][0]


def test_explain_prints_sources(capsys):
    assert main(["diffusivity", "toluene", "air", "-T", "300", "--explain"]) == 0
    out = capsys.readouterr().out
    assert "fuller_volume" in out
    assert "chemicals" in out


def test_liquid_table(capsys):
    assert main(["diffusivity", "benzene", "water", "-T", "298.15", "--phase", "liquid"]) == 0
    assert "m^2/s" in capsys.readouterr().out


def test_bad_input_exits_2_with_message(capsys):
    assert main(["diffusivity", "nonexistent-thing-z", "air", "-T", "300"]) == 2
    assert "error" in capsys.readouterr().err
    assert main(["no-such-command"]) == 2
    assert "invalid choice: 'no-such-command'" in capsys.readouterr().err


def test_coefficient_both_directions(capsys):
    assert main(["coefficient", "water", "air", "--h", "35", "-T", "320", "--json"]) == 0
    first = json.loads(capsys.readouterr().out)
    k_c = first["k_c_m_per_s"][0]
    assert main(["coefficient", "water", "air", "--kc", str(k_c), "-T", "320", "--json"]) == 0
    back = json.loads(capsys.readouterr().out)
    assert back["h_W_per_m2K"][0] == pytest.approx(35.0, rel=1e-9)
    assert main(["coefficient", "oxygen", "water", "--h", "900", "-T", "300", "--phase", "liquid"]) == 0
    assert "k_x [mol/(m^2 s)]" in capsys.readouterr().out


def test_correlations_list_and_explain(capsys):
    assert main(["correlations"]) == 0
    assert "duct-gnielinski" in capsys.readouterr().out
    assert main(["correlations", "--geometry", "sphere", "--json"]) == 0
    assert {r["geometry"] for r in json.loads(capsys.readouterr().out)} == {"sphere"}
    assert main(["correlations", "duct-gnielinski"]) == 0
    out = capsys.readouterr().out
    assert "envelope" in out
    assert "Gnielinski" in out
    assert main(["correlations", "no-such-record"]) == 2


def test_wet_bulb_command(capsys):
    assert main(["wet-bulb", "-T", "303.15", "--rh", "0.5", "--json"]) == 0
    data = json.loads(capsys.readouterr().out)
    assert 294.0 < data["wet_bulb_K"][0] < 296.0
    assert main(["wet-bulb", "-T", "303.15", "--rh", "50"]) == 2


def test_python_dash_m():
    out = subprocess.run(
        [sys.executable, "-m", "masstransfer", "demo"], capture_output=True, text=True, check=True
    )
    assert "Fuller" in out.stdout


def test_a_bare_low_temperature_refused_gets_the_celsius_hint(capsys):
    # 25 read as kelvin: air is not a gas there; the message says how to give degrees Celsius
    assert main(["diffusivity", "toluene", "air", "-T", "25"]) == 2
    err = capsys.readouterr().err
    assert "read as 25 K" in err
    assert "-T '25 degC'" in err
    assert "-T 298.15" in err
    # the hint does not carry over to a later, unrelated refusal in the same process
    assert main(["diffusivity", "toluene", "air", "-T", "298.15", "-P", "-3"]) == 2
    assert "degC" not in capsys.readouterr().err


def test_phase_message_names_the_option_not_the_keyword(capsys):
    assert main(["diffusivity", "toluene", "air", "-T", "77", "--json"]) == 2
    message = json.loads(capsys.readouterr().out)["error"]["message"]
    assert "--phase gas or --phase liquid" in message
    assert "phase='gas'" not in message


def test_evaporate_reads_units_on_every_physical_option(capsys):
    plain = [
        "evaporate", "water", "air", "-T", "333.15", "--dew-point", "283.15",
        "--correlation", "flat-plate-laminar-average", "--velocity", "3", "--length", "0.3", "--json",
    ]  # fmt: skip
    assert main(plain) == 0
    si = json.loads(capsys.readouterr().out)
    units = [
        "evaporate", "water", "air", "-T", "60 degC", "--dew-point", "10 degC",
        "--correlation", "flat-plate-laminar-average", "--velocity", "300 cm/s", "--length", "300 mm",
        "--json",
    ]  # fmt: skip
    assert main(units) == 0
    assert json.loads(capsys.readouterr().out) == si


def test_the_kelvin_hint_names_the_option_that_was_bare(capsys):
    argv = ["evaporate", "water", "air", "-T", "298.15", "--dew-point", "10", "--h", "20"]
    assert main(argv) == 2
    err = capsys.readouterr().err
    assert "--dew-point 10 without a unit is read as 10 K" in err
    assert "-T 298.15 without" not in err


def test_an_accepted_bare_low_temperature_is_cautioned(capsys):
    # a radiant temperature of 20 K is possible, but 20 degrees Celsius is the likelier meaning
    argv = [
        "evaporate",
        "water",
        "air",
        "-T",
        "300",
        "--rh",
        "0.5",
        "--h",
        "20",
        "--radiant-temperature",
        "20",
    ]
    assert main(argv) == 0
    assert "--radiant-temperature '20 degC'" in capsys.readouterr().err
    assert main([*argv, "--json"]) == 0
    data = json.loads(capsys.readouterr().out)
    assert any("--radiant-temperature 20 without a unit" in w for w in data["warnings"])


def test_no_kelvin_hint_on_an_unknown_name(capsys):
    assert main(["diffusivity", "tolune", "air", "-T", "25"]) == 2
    assert "degC" not in capsys.readouterr().err
