"""The example scripts run and print what they promise."""

from __future__ import annotations

import subprocess
import sys
from pathlib import Path

import pytest

EXAMPLES = sorted((Path(__file__).parent.parent / "examples").glob("*.py"))


def test_there_are_examples():
    assert len(EXAMPLES) >= 2


@pytest.mark.parametrize("script", EXAMPLES, ids=[p.stem for p in EXAMPLES])
def test_example_runs(script):
    out = subprocess.run([sys.executable, str(script)], capture_output=True, text=True, check=True)
    assert "invented" in out.stdout
