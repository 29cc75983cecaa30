"""A Fuller gas value reads only the identity of its species; the same numbers either way."""

from __future__ import annotations

import subprocess
import sys

_FIRST = """
import masstransfer as mt
D = mt.gas_diffusivity('toluene', 'air', 298.15)
read = sorted(n for n in ('Tb', 'Tm', 'Tc', 'Pc', 'omega', 'dipole', 'sources', 'origins')
              if n in vars(mt.species('toluene')))
print(repr(D), read)
"""

_REPORT = """
import masstransfer as mt
%s
r = mt.diffusivity_report('toluene', 'air', 298.15)
print(repr(r.value), repr(r.constants), r.notes)
"""


def _run(code: str) -> str:
    out = subprocess.run([sys.executable, "-c", code], capture_output=True, text=True, check=True)
    return out.stdout.strip()


def test_fuller_reads_no_critical_constants_dipole_or_origins():
    D, read = _run(_FIRST).split(" ", 1)
    assert read == "[]"
    assert float(D) > 0.0


def test_results_and_stated_sources_do_not_depend_on_what_was_read_first():
    lazy = _run(_REPORT % "")
    eager = _run(_REPORT % "mt.species('toluene').Vb; mt.species('toluene').origins")
    assert lazy == eager
    assert "chemicals" in lazy  # the molar mass states its source in both
