"""The @overload pairs are visible to mypy: float -> float, array -> ndarray."""

from __future__ import annotations

import subprocess
import sys
from pathlib import Path

import pytest

CASES = Path(__file__).parent / "typing_cases" / "overloads.py"


def test_overloads_type_check():
    pytest.importorskip("mypy")
    out = subprocess.run(
        [sys.executable, "-m", "mypy", "--strict", "--no-incremental", "--cache-dir=/dev/null", str(CASES)],
        capture_output=True,
        text=True,
        cwd=Path(__file__).parent.parent,
    )
    assert out.returncode == 0, out.stdout + out.stderr


def test_py_typed_is_shipped():
    from importlib import metadata

    files = [str(f) for f in (metadata.files("masstransfer") or [])]
    installed_sources = [f for f in files if f.startswith("masstransfer/") and f.endswith(".py")]
    if installed_sources:  # a regular (wheel) install: the marker must be in it
        assert "masstransfer/py.typed" in files
    import masstransfer

    assert (Path(masstransfer.__file__).parent / "py.typed").exists()
