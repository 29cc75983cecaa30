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


def test_diffusivity_json(capsys):
    assert main(["diffusivity", "toluene", "air", "-T", "300", "350", "--json"]) == 0
    data = json.loads(capsys.readouterr().out)
    assert data["method"] == "fuller"
    assert len(data["D_m2_per_s"]) == 2
    assert data["D_m2_per_s"][1] > data["D_m2_per_s"][0]


def test_liquid_table(capsys):
    assert main(["diffusivity", "benzene", "water", "-T", "298.15", "--phase", "liquid"]) == 0
    assert "m^2/s" in capsys.readouterr().out


def test_bad_input_exits_2_with_message(capsys):
    assert main(["diffusivity", "nonexistent-thing-z", "air", "-T", "300"]) == 2
    assert "error" in capsys.readouterr().err
    with pytest.raises(SystemExit):
        main(["no-such-command"])


def test_python_dash_m():
    out = subprocess.run(
        [sys.executable, "-m", "masstransfer", "demo"], capture_output=True, text=True, check=True
    )
    assert "Fuller" in out.stdout
