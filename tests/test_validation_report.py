"""The README's accuracy tables are the ones tests/validation_report.py prints from the data."""

from __future__ import annotations

from pathlib import Path

import validation_report
from validation_data import GAS_PAIRS, LIQUID_SYSTEMS

README = Path(__file__).parent.parent / "README.md"


def test_readme_tables_match_the_validation_data():
    text = README.read_text(encoding="utf-8")
    assert f"Gas pairs: {len(GAS_PAIRS)} measured values" in text
    assert f"Liquid systems: {len(LIQUID_SYSTEMS)} measured" in text
    for results in (validation_report.gas_results(), validation_report.liquid_results()):
        for line in validation_report._table(results):
            assert line in text, f"README out of date; rerun tests/validation_report.py: {line}"
