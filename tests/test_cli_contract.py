"""The command line's contract: JSON errors with --json, quiet closed pipes, no tracebacks."""

from __future__ import annotations

import json
import subprocess
import sys

from masstransfer.cli import main


def test_json_error_is_json_with_nonzero_exit(capsys):
    assert main(["diffusivity", "water", "air", "-T", "-5", "--json"]) == 2
    out = capsys.readouterr()
    data = json.loads(out.out)
    assert data["error"]["type"] == "InputValueError"
    assert "T=-5.0" in data["error"]["message"]
    assert out.err == ""


def test_plain_error_is_one_line_on_stderr(capsys):
    assert main(["diffusivity", "water", "air", "-T", "-5"]) == 2
    out = capsys.readouterr()
    assert out.out == ""
    assert out.err.startswith("masstransfer: error: ")
    assert out.err.count("\n") == 1


def test_warnings_go_into_the_json(capsys, monkeypatch):
    import warnings

    from masstransfer import cli
    from masstransfer.errors import EnvelopeWarning

    def cautious(args: object) -> str:
        warnings.warn("Re=1.0 is outside [3.5, 7.6e4]", EnvelopeWarning, stacklevel=1)
        return json.dumps({"value": 1.0})

    monkeypatch.setattr(cli, "_wet_bulb", cautious)
    assert main(["wet-bulb", "-T", "303.15", "--rh", "0.5", "--json"]) == 0
    out = capsys.readouterr()
    assert json.loads(out.out)["warnings"] == ["EnvelopeWarning: Re=1.0 is outside [3.5, 7.6e4]"]
    assert out.err == ""
    assert main(["wet-bulb", "-T", "303.15", "--rh", "0.5"]) == 0  # plain: the caution on stderr
    assert "masstransfer: caution: EnvelopeWarning: Re=1.0" in capsys.readouterr().err


def _run(*args: str) -> subprocess.CompletedProcess[str]:
    cmd = [sys.executable, *args]
    return subprocess.run(cmd, capture_output=True, text=True, check=False)


def test_warning_as_error_filter_gives_no_traceback():
    out = _run("-W", "error", "-m", "masstransfer", "wet-bulb", "-T", "303.15", "--rh", "0.5")
    assert out.returncode == 0, out.stderr
    assert "Traceback" not in out.stderr


def test_closed_pipe_ends_quietly():
    prog = subprocess.Popen(
        [sys.executable, "-m", "masstransfer", "correlations"],
        stdout=subprocess.PIPE,
        stderr=subprocess.PIPE,
        text=True,
    )
    assert prog.stdout is not None
    prog.stdout.readline()  # read one line, then close as `head -1` would
    prog.stdout.close()
    _, err = prog.communicate(timeout=120)
    assert "Traceback" not in err
    assert "BrokenPipeError" not in err


def test_usage_mistake_with_json_is_json_too(capsys):
    assert main(["diffusivity", "water", "air", "--json"]) == 2  # -T missing
    data = json.loads(capsys.readouterr().out)
    assert data["error"]["type"] == "UsageError"
    assert "-T/--temperature" in data["error"]["message"]


def test_usage_mistake_without_json_prints_usage_and_the_option(capsys):
    assert main(["diffusivity", "water", "air"]) == 2
    err = capsys.readouterr().err
    assert err.startswith("usage: masstransfer diffusivity")
    assert "-T/--temperature" in err
