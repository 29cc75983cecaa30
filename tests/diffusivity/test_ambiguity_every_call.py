"""An ambiguous name or formula warns on every call that uses it, not only on the first."""

from __future__ import annotations

import json
import subprocess
import sys

import pytest

import masstransfer as mt
from masstransfer.errors import AmbiguousSpeciesWarning

CALLS = {
    "gas solute": lambda: mt.gas_diffusivity("xylene", "air", 300.0),
    "gas medium": lambda: mt.gas_diffusivity("toluene", "C2H6O", 400.0),
    "gas array": lambda: mt.gas_diffusivity("C2H6O", "air", [300.0, 350.0]),
    "liquid solute": lambda: mt.liquid_diffusivity("xylene", "ethanol", 300.0),
    "liquid solvent": lambda: mt.liquid_diffusivity("toluene", "butanol", 300.0),
    "report": lambda: mt.diffusivity_report("xylene", "air", 300.0),
}


@pytest.mark.parametrize("name", list(CALLS))
def test_two_successive_calls_each_warn(name):
    call = CALLS[name]
    results = []
    for _ in range(2):
        with pytest.warns(AmbiguousSpeciesWarning, match="names several substances") as rec:
            results.append(call())
        assert sum(issubclass(w.category, AmbiguousSpeciesWarning) for w in rec) == 1
    assert repr(results[0]) == repr(results[1])


def test_the_repeated_warning_names_the_choice_and_the_alternatives():
    with pytest.warns(AmbiguousSpeciesWarning):
        mt.gas_diffusivity("xylene", "air", 310.0)
    with pytest.warns(AmbiguousSpeciesWarning) as rec:
        mt.gas_diffusivity("xylene", "air", 310.0)
    message = str(rec[0].message)
    chosen = mt.species("o-xylene")
    assert chosen.CAS in message
    assert "m-xylene" in message
    assert "p-xylene" in message


def test_an_unambiguous_name_stays_quiet_on_repeat(recwarn):
    mt.gas_diffusivity("toluene", "air", 300.0)
    mt.gas_diffusivity("toluene", "air", 300.0)
    assert not [w for w in recwarn if issubclass(w.category, AmbiguousSpeciesWarning)]


_ORDER = """
import json, warnings
import masstransfer as mt
from masstransfer.errors import AmbiguousSpeciesWarning
steps = {
    "species": lambda: mt.species("xylene").CAS,
    "gas": lambda: mt.gas_diffusivity("xylene", "air", 300.0),
    "liquid": lambda: mt.liquid_diffusivity("xylene", "ethanol", 300.0),
}
out = {}
for name in %r:
    for i in range(2):
        with warnings.catch_warnings(record=True) as rec:
            warnings.simplefilter("always")
            value = steps[name]()
        n = sum(issubclass(w.category, AmbiguousSpeciesWarning) for w in rec)
        out[f"{name}{i}"] = [value, n]
print(json.dumps(out, sort_keys=True))
"""


def test_fresh_processes_in_both_orders_agree():
    runs = []
    for order in (["species", "gas", "liquid"], ["liquid", "gas", "species"]):
        out = subprocess.run(
            [sys.executable, "-c", _ORDER % (order,)], capture_output=True, text=True, check=True
        )
        runs.append(json.loads(out.stdout))
    assert runs[0] == runs[1]
    assert all(n == 1 for _, n in runs[0].values())
