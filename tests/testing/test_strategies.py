"""The exported strategies draw valid states, and the library's own invariants hold on them."""

from __future__ import annotations

import subprocess
import sys

import numpy as np
import pytest
from hypothesis import given
from hypothesis import strategies as st

import masstransfer as mt
from masstransfer import surface
from masstransfer import testing as mts


@given(mts.gas_states())
def test_gas_states_are_valid_and_symmetric(state):
    mts.check_gas_symmetry(state)
    mts.check_gas_pressure_scaling(state, factor=0.5)
    D = mt.gas_diffusivity(state.solute, state.carrier, state.T, state.P)
    assert np.isfinite(D)
    assert D > 0


@given(mts.gas_states(arrays=True, max_size=8))
def test_gas_state_arrays_match_scalar_calls(state):
    arr = np.asarray(mt.gas_diffusivity(state.solute, state.carrier, state.T, state.P))
    assert arr.shape == np.shape(state.T)
    i = 0
    assert arr[i] == pytest.approx(
        mt.gas_diffusivity(state.solute, state.carrier, float(state.T[i]), float(state.P[i]))
    )


@given(mts.liquid_states())
def test_liquid_states_give_liquid_magnitudes(state):
    D = mt.liquid_diffusivity(state.solute, state.solvent, state.T)
    # common practice: liquids about 1e-9 m^2/s
    assert 1e-11 < D < 1e-7


@given(mts.liquid_states(arrays=True, max_size=6))
def test_liquid_state_arrays(state):
    D = np.asarray(mt.liquid_diffusivity(state.solute, state.solvent, state.T))
    assert D.shape == np.shape(state.T)
    assert np.all(np.isfinite(D))


@given(st.data())
def test_correlation_inputs_stay_inside_envelopes(data):
    rec = data.draw(st.sampled_from(list(surface.all_correlations())))
    inputs = data.draw(mts.correlation_inputs(rec))
    result = rec.evaluate("heat", strict=True, **inputs)  # strict: leaving the envelope would raise
    assert np.all(np.isfinite(result.value))
    mts.check_nusselt_equals_sherwood(rec, inputs)
    mass = data.draw(mts.correlation_inputs(rec, transport="mass", arrays=True, max_size=5))
    assert np.all(np.isfinite(rec.sherwood(strict=True, **mass)))


@given(h=st.floats(0.1, 1e4), Sc=st.floats(0.3, 3e3))
def test_exported_round_trip_check(h, Sc):
    mts.check_analogy_round_trip(h, 1.1, 1007.0, 0.71, Sc)


def test_checks_fail_when_the_invariant_fails(monkeypatch):
    from masstransfer.surface import _analogy as analogy

    real = analogy.heat_transfer_coefficient_from_mass
    monkeypatch.setattr(analogy, "heat_transfer_coefficient_from_mass", lambda k, **kw: 1.01 * real(k, **kw))
    with pytest.raises(AssertionError, match="did not return h"):
        mts.check_analogy_round_trip(30.0, 1.2, 1007.0, 0.71, 0.6)


def test_missing_hypothesis_gives_a_clear_error():
    code = (
        "import sys; sys.modules['hypothesis'] = None\n"
        "try:\n    import masstransfer.testing\nexcept Exception as e:\n"
        "    print(type(e).__name__, isinstance(e, ImportError), e)\n"
    )
    out = subprocess.run([sys.executable, "-c", code], capture_output=True, text=True, check=True).stdout
    assert out.startswith("MissingDependencyError True")
    assert "pip install hypothesis" in out
