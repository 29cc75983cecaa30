"""The reliability contract: immutable results, thread and process safety, no silent wrong number.

What a caller may rely on (DEVELOPERS.md, "Reliability contract"):
- a returned result never changes, whatever the caller later does to its inputs or to it;
- two results are equal exactly when every field is equal, and every result hashes, pickles
  and deep-copies (so it can cross process boundaries);
- the first use of the databases from many threads at once gives the serial answers;
- bad input is an error of the library's own family, never a bare built-in exception.
"""

from __future__ import annotations

import copy
import multiprocessing
import pickle
import subprocess
import sys
import textwrap

import numpy as np
import pytest

import masstransfer as mt
from masstransfer import bodies, surface


def _results() -> list[object]:
    T = np.array([300.0, 320.0])
    return [
        mt.mass_transfer_from_heat(35.0, "water", "air", T=T),
        mt.mass_transfer_from_heat(35.0, "ethanol", "air", T=310.0),
        mt.diffusivity_report("toluene", "air", 300.0),
        mt.diffusivity_report("ethanol", "water", 298.15, phase="liquid"),
        surface.correlation("sphere-ranz-marshall").evaluate("mass", Re=np.array([10.0, 100.0]), Sc=0.6),
        surface.correlation("sphere-ranz-marshall"),
        bodies.steady_flux([bodies.Layer(12e-6, permeability=1e-17)], p_high=2e4),
    ]


@pytest.mark.parametrize("index", range(7))
def test_results_pickle_deepcopy_compare_and_hash(index):
    r = _results()[index]
    assert pickle.loads(pickle.dumps(r)) == r
    assert copy.deepcopy(r) == r
    assert hash(pickle.loads(pickle.dumps(r))) == hash(r)


def test_results_keep_copies_of_the_callers_arrays_and_are_read_only():
    T = np.array([300.0, 320.0])
    r = mt.mass_transfer_from_heat(35.0, "water", "air", T=T)
    T[0] = 999.0
    assert r.T[0] == 300.0
    assert isinstance(r.k_c, np.ndarray)
    with pytest.raises(ValueError, match="read-only"):
        r.k_c[0] = 1.0
    unpickled = pickle.loads(pickle.dumps(r))
    with pytest.raises(ValueError, match="read-only"):
        unpickled.k_c[0] = 1.0


def test_equality_covers_every_field():
    a = mt.mass_transfer_from_heat(35.0, "water", "air", T=300.0)
    b = mt.mass_transfer_from_heat(35.0, "water", "air", T=300.0)
    c = mt.mass_transfer_from_heat(35.0, "water", "air", T=300.0, P=2e5)
    assert a == b
    assert hash(a) == hash(b)
    assert a != c


def test_mappings_inside_results_are_immutable():
    rep = mt.diffusivity_report("toluene", "air", 300.0)
    with pytest.raises(TypeError):
        rep.constants["toluene"] = {}  # type: ignore[index]
    rec = surface.correlation("sphere-ranz-marshall")
    with pytest.raises(TypeError):
        rec.envelope["Re"] = (0.0, 1e9)  # type: ignore[index]


def _evaluate_in_child(result: object) -> object:
    return pickle.loads(pickle.dumps(result))


def test_results_cross_a_spawned_process_pool():
    results = _results()
    ctx = multiprocessing.get_context("spawn")
    with ctx.Pool(2) as pool:
        back = pool.map(_evaluate_in_child, results)
    assert back == results


_THREADS = textwrap.dedent(
    """
    import concurrent.futures as cf, json, warnings
    warnings.simplefilter("error")
    import masstransfer as mt
    pairs = [("water", "air"), ("ethanol", "air"), ("toluene", "nitrogen"), ("acetone", "air"),
             ("methanol", "air"), ("benzene", "air"), ("ammonia", "air"), ("carbon dioxide", "nitrogen")]
    def job(i):
        a, b = pairs[i % len(pairs)]
        r = mt.mass_transfer_from_heat(35.0, a, b, T=320.0)
        solute = "ethanol" if a == "water" else a
        mu = mt.liquid_model(solute).viscosity(298.15)
        return [r.k_c, mt.liquid_diffusivity(solute, "water", 298.15), mu]
    def run(i):
        try:
            return job(i)
        except Exception as exc:
            return repr(exc)
    with cf.ThreadPoolExecutor(16) as ex:
        threaded = list(ex.map(run, range(48)))
    serial = [run(i) for i in range(48)]
    print(json.dumps({"threaded": threaded, "serial": serial}))
    """
)


def test_sixteen_threads_on_a_cold_cache_give_the_serial_answers():
    import json

    out = subprocess.run(
        [sys.executable, "-c", _THREADS], capture_output=True, text=True, timeout=900, check=True
    )
    data = json.loads(out.stdout)
    assert all(isinstance(row, list) for row in data["serial"]), data["serial"]
    assert data["threaded"] == data["serial"]


def test_huge_python_integer_is_a_library_error():
    with pytest.raises(mt.errors.InputValueError, match="T is an integer"):
        mt.diffusivity.fuller(10**400, 1e5, 0.018, 0.029, 13.1, 19.7)


@pytest.mark.parametrize("thickness", [None, "12e-6", True])
def test_layer_rejects_a_missing_or_non_numeric_thickness(thickness):
    with pytest.raises(mt.errors.InputTypeError, match="thickness"):
        bodies.Layer(thickness, permeability=1e-17)  # type: ignore[arg-type]


def test_supersaturated_gas_has_no_wet_surface_temperature():
    # water at 300 K: p_sat about 3.5 kPa, y_sat about 0.035 at 1 atm (common practice)
    with pytest.raises(mt.errors.OutOfRangeError, match="supersaturated"):
        mt.wet_surface_temperature("water", "air", 300.0, y_bulk=0.05)
    assert mt.wet_surface_temperature("water", "air", 300.0, y_bulk=0.0) < 300.0


@pytest.mark.parametrize(
    ("changes", "error", "match"),
    [
        ({"dipole": 1.9}, mt.errors.InputValueError, "debye"),  # a dipole in debye, not C m
        ({"dipole": float("nan")}, mt.errors.InputValueError, "dipole"),
        ({"molar_mass": None}, mt.errors.InputTypeError, "molar_mass"),
        ({"Tb": "373"}, mt.errors.InputTypeError, "Tb"),
        ({"omega": 7.0}, mt.errors.InputValueError, "acentric"),
    ],
)
def test_hand_built_species_with_impossible_constants_are_rejected(changes, error, match):
    with pytest.raises(error, match=match):
        mt.species("water").replace(**changes)


def test_henry_constant_only_where_the_solvent_is_liquid():
    with pytest.raises(mt.errors.OutOfRangeError, match="liquid range"):
        mt.substances.henry_constant("oxygen", "water", 1.0)
    with pytest.warns(mt.errors.EnvelopeWarning, match="extrapolated"):
        mt.substances.henry_constant("oxygen", "water", 400.0)


def test_a_warning_reaches_code_without_a_source_file():
    # python -c has no loader that can give source lines; the caution must still arrive
    code = (
        "import warnings, masstransfer as mt\n"
        "with warnings.catch_warnings(record=True) as w:\n"
        "    warnings.simplefilter('always')\n"
        "    mt.substances.henry_constant('oxygen', 'water', 400.0)\n"
        "print(w[0].category.__name__)"
    )
    out = subprocess.run(
        [sys.executable, "-W", "error", "-c", code], capture_output=True, text=True, check=True
    )
    assert out.stdout.strip() == "EnvelopeWarning"
