"""The ``column`` command: spec in, tables or JSON out, cautions always shown."""

from __future__ import annotations

import json

import pytest

from masstransfer import contactors as c
from masstransfer._cli_column import EXAMPLE_SPEC
from masstransfer.cli import main


@pytest.fixture
def spec(tmp_path):
    path = tmp_path / "scrubber.toml"
    path.write_text(EXAMPLE_SPEC, encoding="utf-8")
    return path


def test_example_spec_prints_and_parses(capsys, spec):
    assert main(["column", "--example"]) == 0
    assert "[column]" in capsys.readouterr().out


def test_sizing_json_agrees_with_the_library(capsys, spec):
    assert main(["column", str(spec), "--json"]) == 0
    out = json.loads(capsys.readouterr().out)
    assert "licensed engineering practice" in out["caution"]
    # the same column by hand from the library's numbers-in functions
    G, L, m = out["G_mol_per_m2s"], out["L_mol_per_m2s"], out["m"]
    N = c.transfer_units(0.02, 0.0005, 0.0, m, L / (m * G))
    assert out["N_OG_analytic"] == pytest.approx(N, rel=1e-12)
    assert out["height_m"] == pytest.approx(N * G / out["K_y_a_mol_per_m3s"], rel=1e-6)
    film = c.rate_packing(
        "ammonia", "air", "water", "pall-ring-metal-50", 298.15, out["u_V_m_per_s"], out["u_L_m_per_s"]
    )
    assert out["k_G_a_mol_per_m3sPa"] == pytest.approx(film.k_G_a, rel=1e-12)
    assert len(out["profile"]["z_m"]) == 11


def test_rating_table_shows_profile_and_caution(capsys, tmp_path):
    text = EXAMPLE_SPEC.replace('mode = "size"', 'mode = "rate"').replace(
        "# height_m = 3.0", "height_m = 2.0"
    )
    path = tmp_path / "rate.toml"
    path.write_text(text, encoding="utf-8")
    assert main(["column", str(path), "--points", "5"]) == 0
    out = capsys.readouterr().out
    assert "Profile along the height" in out
    assert "Caution:" in out
    assert "packed height" in out


@pytest.mark.parametrize(
    ("change", "message"),
    [
        (("diameter_m = 0.6", "diameter = 0.6"), "diameter"),
        (('mode = "size"', 'mode = "guess"'), "mode"),
        (("y_in = 0.02", 'y_in = "high"'), "must be a number"),
        (("[liquid]", "[liquids]"), "not known"),
    ],
)
def test_bad_specs_are_one_line_errors(capsys, tmp_path, change, message):
    path = tmp_path / "bad.toml"
    path.write_text(EXAMPLE_SPEC.replace(*change), encoding="utf-8")
    assert main(["column", str(path)]) == 2
    err = capsys.readouterr().err
    assert err.startswith("masstransfer: error: ")
    assert message in err


def test_missing_and_broken_files(capsys, tmp_path):
    assert main(["column", str(tmp_path / "none.toml"), "--json"]) == 2
    assert json.loads(capsys.readouterr().out)["error"]["type"] == "InputValueError"
    broken = tmp_path / "broken.toml"
    broken.write_text("[column\n", encoding="utf-8")
    assert main(["column", str(broken)]) == 2
    assert "not a valid UTF-8 TOML file" in capsys.readouterr().err
    binary = tmp_path / "binary.toml"
    binary.write_bytes(b"\x00\xff")
    assert main(["column", str(binary)]) == 2
    assert "not a valid UTF-8 TOML file" in capsys.readouterr().err


def test_a_flooded_column_is_refused(capsys, tmp_path):
    assert main(["column", "--example"]) == 0
    spec = capsys.readouterr().out.replace("diameter_m = 0.6", "diameter_m = 0.05")
    assert "diameter_m = 0.05" in spec
    path = tmp_path / "narrow.toml"
    path.write_text(spec, encoding="utf-8")
    assert main(["column", str(path)]) == 2
    assert "floods" in capsys.readouterr().err


def test_table_keeps_warnings_and_design_notes_in_the_report(capsys, tmp_path):
    # near loading: the caution must reach a saved report (stdout), not only the terminal (stderr)
    path = tmp_path / "busy.toml"
    path.write_text(EXAMPLE_SPEC.replace("flow_mol_per_s = 12.0", "flow_mol_per_s = 17.5"), encoding="utf-8")
    assert main(["column", str(path)]) == 0
    out = capsys.readouterr().out
    assert "Warnings:\n  packed_column: the gas load is 81 %" in out
    assert "not the pressure drop or the flooding point" in out
    assert "design margin" in out
    assert "isothermal liquid" in out  # the example gives no heat of absorption
    hot = tmp_path / "hot.toml"
    heat = ("heat_of_absorption_J_per_mol = 0.0", "heat_of_absorption_J_per_mol = 3.5e4")
    hot.write_text(EXAMPLE_SPEC.replace(*heat), encoding="utf-8")
    assert main(["column", str(hot), "--json"]) == 0
    notes = json.loads(capsys.readouterr().out)["notes"]
    assert not any("isothermal" in n for n in notes)
    assert any("pressure drop" in n for n in notes)
