"""Dask arrays through the numbers-in functions: lazy, the same values as numpy, our errors when computed."""

from __future__ import annotations

import warnings

import numpy as np
import pytest

da = pytest.importorskip("dask.array")
dask = pytest.importorskip("dask")

from test_robustness import CASES  # noqa: E402

from masstransfer import diffusivity, errors, surface  # noqa: E402
from masstransfer._validation import _returns_array, check_positive  # noqa: E402


def _no_compute(*args, **kwargs):
    raise AssertionError("a dask array was computed while the call was being set up")


def _elementwise_cases():
    out = []
    for name, fn, valid in CASES:
        if not _returns_array(fn) or fn is diffusivity.blanc:
            continue
        floats = [k for k, v in valid.items() if type(v) is float]
        for key in floats:  # the first argument that takes an array in numpy
            with warnings.catch_warnings():
                warnings.simplefilter("ignore")
                try:
                    expected = fn(**{**valid, key: np.full(5, valid[key])})
                except errors.MassTransferError:
                    continue
            if np.shape(expected) == (5,):
                out.append(pytest.param(fn, valid, key, id=f"{name}-{key}"))
                break
    return out


_ELEMENTWISE = _elementwise_cases()


def test_most_public_functions_are_covered():
    assert len(_ELEMENTWISE) >= 40


@pytest.mark.parametrize(("fn", "valid", "key"), _ELEMENTWISE)
def test_lazy_and_equal_to_numpy(fn, valid, key):
    values = valid[key] * np.linspace(1.0, 1.0 + 1e-6, 5)
    expected = fn(**{**valid, key: values})
    with dask.config.set(scheduler=_no_compute):
        lazy = fn(**{**valid, key: da.from_array(values, chunks=2)})
    assert isinstance(lazy, da.Array)
    assert lazy.chunks == ((2, 2, 1),)
    # the same arithmetic on shorter arrays: equal to the last bit or one rounding apart
    np.testing.assert_allclose(lazy.compute(scheduler="sync"), expected, rtol=1e-14, atol=0)


def test_broadcasts_dask_with_numpy_and_scalars():
    T = da.from_array(np.linspace(280.0, 400.0, 6).reshape(6, 1), chunks=(4, 1))
    P = np.array([1e5, 2e5, 3e5])
    lazy = diffusivity.fuller(T, P, 0.018, 0.029, 13.1, 19.7)
    assert lazy.shape == (6, 3)
    expected = diffusivity.fuller(np.asarray(T), P, 0.018, 0.029, 13.1, 19.7)
    np.testing.assert_array_equal(lazy.compute(scheduler="sync"), expected)


def test_bad_values_raise_our_error_when_computed_not_before():
    T = da.from_array(np.array([300.0, -5.0, 320.0]), chunks=2)
    with dask.config.set(scheduler=_no_compute):
        lazy = diffusivity.fuller(T, 1e5, 0.018, 0.029, 13.1, 19.7)
    with pytest.raises(errors.InputValueError, match=r"T=-5\.0"):
        lazy.compute(scheduler="sync")


def test_envelope_warnings_come_when_computed():
    rec = surface.correlation("sphere-ranz-marshall")
    Re = da.from_array(np.array([10.0, 1e9]), chunks=1)
    lazy = rec.nusselt(Re=Re, Pr=0.7)
    with pytest.warns(errors.EnvelopeWarning):
        lazy.compute(scheduler="sync")


def test_wrong_dtype_and_shape_are_our_errors_at_once():
    with pytest.raises(errors.InputTypeError, match="T is an array of bool"):
        diffusivity.fuller(da.from_array(np.array([True, False])), 1e5, 0.018, 0.029, 13.1, 19.7)
    with pytest.raises(errors.InputShapeError, match="do not broadcast"):
        diffusivity.fuller(da.ones(3), np.ones(4), 0.018, 0.029, 13.1, 19.7)


def test_whole_array_functions_refuse_dask():
    with pytest.raises(errors.InputTypeError, match="does not take dask arrays"):
        diffusivity.blanc(da.from_array(np.array([2e-5, 1e-5])), [0.5, 0.5])


def test_check_helpers_are_lazy_on_dask():
    x = da.from_array(np.array([1.0, 0.0]), chunks=1)
    with dask.config.set(scheduler=_no_compute):
        checked = check_positive("T", x)
    with pytest.raises(errors.InputValueError, match="not positive"):
        checked.compute(scheduler="sync")


def test_lazy_tasks_carry_their_blocks_not_the_whole_arrays():
    import pickle

    import dask.array as da

    import masstransfer as mt

    T = da.from_array(np.linspace(280.0, 350.0, 200_000), chunks=10_000)  # 1.6 MB of values
    lazy = mt.surface.reynolds(1.0, T * 1e-3, 1.5e-5)
    graph = dict(lazy.__dask_graph__())
    mapped = [v for k, v in graph.items() if k[0] == lazy.name]
    assert len(mapped) == 20
    assert max(len(pickle.dumps(v)) for v in mapped) < 50_000  # no task holds the 1.6 MB input
    np.testing.assert_allclose(lazy.compute(), 1.0 * np.linspace(280.0, 350.0, 200_000) * 1e-3 / 1.5e-5)
