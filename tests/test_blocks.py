"""Long arrays in cache-sized blocks: the same numbers as one whole-array evaluation, warnings once."""

from __future__ import annotations

import dataclasses
import warnings

import numpy as np
import pytest

import masstransfer as mt
from masstransfer import _blocks


def _unblocked(h, T, P=101325.0):
    # one call per slice, each below the blocking threshold: the plain whole-array arithmetic
    n = np.size(T)
    step = _blocks.BLOCK
    parts = [
        mt.mass_transfer_from_heat(h[i : i + step], "water", "air", T[i : i + step], P)
        for i in range(0, n, step)
    ]
    return {
        f: np.concatenate([getattr(p, f) for p in parts]) for f in ("k_c", "k_G", "k_y", "rho", "D", "Le")
    }


def test_blocked_equals_plain_arithmetic_state_by_state():
    n = 2 * _blocks.BLOCK + 1234
    T = np.linspace(290.0, 390.0, n)
    h = np.linspace(5.0, 150.0, n)
    r = mt.mass_transfer_from_heat(h, "water", "air", T)
    want = _unblocked(h, T)
    for field, values in want.items():
        np.testing.assert_array_equal(getattr(r, field), values, err_msg=field)
    # the inputs as given, kept as read-only copies (results never alias the caller's arrays)
    np.testing.assert_array_equal(r.T, T)
    np.testing.assert_array_equal(r.h, h)
    assert r.T is not T
    assert not r.T.flags.writeable
    assert r.k_x is None
    assert r.method.startswith("Chilton-Colburn")


def test_blocked_broadcasts_without_copies_and_keeps_the_shape():
    T = np.linspace(290.0, 390.0, 401)[:, None]
    h = np.linspace(5.0, 150.0, 400)[None, :]
    r = mt.mass_transfer_from_heat(h, "water", "air", T, 2e5)
    assert np.shape(r.k_c) == (401, 400)
    assert np.shape(r.rho) == (401, 400)
    row = mt.mass_transfer_from_heat(h[0], "water", "air", float(T[7, 0]), 2e5)
    np.testing.assert_array_equal(r.k_c[7], row.k_c)
    assert r.P == 2e5


def test_blocked_warns_once_per_message():
    n = 3 * _blocks.BLOCK
    T = np.full(n, 300.0)
    with warnings.catch_warnings(record=True) as caught:
        warnings.simplefilter("always")
        r = mt.mass_transfer_from_heat(np.full(n, 20.0), "water", "air", T, 3e6)  # high pressure: warns
    ours = [w for w in caught if issubclass(w.category, mt.MassTransferWarning)]
    assert ours
    assert len({str(w.message) for w in ours}) == len(ours)
    assert len(r.warnings) == len(set(r.warnings)) >= 1


def test_blocked_errors_are_the_same():
    n = 3 * _blocks.BLOCK
    T = np.full(n, 300.0)
    T[-5] = -1.0
    with pytest.raises(mt.errors.InputValueError, match=r"T=-1\.0"):
        mt.mass_transfer_from_heat(np.full(n, 20.0), "water", "air", T)


def test_result_is_a_frozen_dataclass_of_arrays():
    n = 2 * _blocks.BLOCK + 1
    r = mt.mass_transfer_from_heat(np.full(n, 20.0), "water", "air", np.full(n, 320.0))
    arrays = [f.name for f in dataclasses.fields(r) if isinstance(getattr(r, f.name), np.ndarray)]
    assert {"k_c", "k_G", "k_y", "rho", "cp", "k", "mu", "D", "Pr", "Sc", "Le", "h", "T"} <= set(arrays)
    assert not any(getattr(r, a).flags.writeable for a in ("k_c", "D"))  # frozen, like every result


def test_blocked_outputs_are_frozen_and_inputs_are_copied():
    # that the outputs are taken without a copy is shown by test_adopting_leaves_other_arrays_copied
    n = 2 * _blocks.BLOCK + 7
    h, T = np.full(n, 20.0), np.linspace(300.0, 340.0, n)
    r = mt.mass_transfer_from_heat(h, "water", "air", T)
    assert r.k_c.base is None  # owns its data: not a view into a larger work buffer
    assert not r.k_c.flags.writeable
    with pytest.raises(ValueError, match="read-only"):
        r.k_c[0] = 1.0
    before = r.T.copy()
    T[:] = 400.0  # the caller's later edits do not reach the result
    np.testing.assert_array_equal(r.T, before)


def test_adopting_leaves_other_arrays_copied():
    from masstransfer._frozen import adopting, freeze

    mine, theirs = np.arange(3.0), np.arange(3.0)
    with adopting(mine):
        assert freeze(mine) is mine
        assert freeze(theirs) is not theirs
        assert freeze(mine[1:]) is not mine  # a view is copied
    assert not mine.flags.writeable
    assert theirs.flags.writeable
    fresh = np.arange(2.0)
    assert freeze(fresh) is not fresh  # outside the block, every array is copied


def test_transient_results_take_arrays_read_only_without_copies():
    from masstransfer._frozen import freeze, transient

    a = np.arange(4.0)
    with transient():
        assert freeze(a) is a  # a block's result: read here, dropped before the block ends
        assert freeze(a[1:]).base is a
    assert not a.flags.writeable  # read-only in place: a later in-place change fails loudly
    with pytest.raises(ValueError, match="read-only"):
        a[0] = 1.0
    b = np.arange(2.0)
    assert freeze(b) is not b  # outside the block, every array is copied again


def test_blocked_result_shares_nothing_with_its_block_results():
    n = 2 * _blocks.BLOCK + 5
    h, T = np.full(n, 25.0), np.linspace(300.0, 330.0, n)
    r = mt.mass_transfer_from_heat(h, "water", "air", T)
    owned = [getattr(r, f) for f in ("k_c", "rho", "cp", "k", "mu", "D", "Pr", "Sc", "Le", "h", "T")]
    for i, x in enumerate(owned):
        assert x.base is None
        assert not x.flags.writeable
        assert not any(np.shares_memory(x, y) for y in owned[i + 1 :])
        assert not np.shares_memory(x, h)
        assert not np.shares_memory(x, T)


def test_first_block_builds_caches_with_copies(monkeypatch):
    # what a block builds and caches must not be frozen in place: only blocks after the first,
    # whose caches are warm, run under transient()
    from masstransfer import _frozen

    seen = []
    real = _blocks.blockwise

    def spy(call, arrays, shape):
        def traced(**kw):
            seen.append(_frozen._TRANSIENT.get())
            return call(**kw)

        return real(traced, arrays, shape)

    monkeypatch.setattr("masstransfer.surface._analogy.blockwise", spy)
    n = 3 * _blocks.BLOCK + 3
    mt.mass_transfer_from_heat(np.full(n, 20.0), "water", "air", np.linspace(300.0, 320.0, n))
    assert seen == [False, True, True, True]
