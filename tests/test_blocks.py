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


def test_blocked_result_arrays_share_nothing():
    n = 2 * _blocks.BLOCK + 5
    h, T = np.full(n, 25.0), np.linspace(300.0, 330.0, n)
    r = mt.mass_transfer_from_heat(h, "water", "air", T)
    owned = [v for v in vars(r).values() if isinstance(v, np.ndarray)]
    assert len(owned) == 13  # h, T, k_c, k_G, k_y, the five properties, Pr, Sc, Le
    for i, x in enumerate(owned):
        assert x.base is None
        assert not x.flags.writeable
        assert not any(np.shares_memory(x, y) for y in owned[i + 1 :])
        assert not np.shares_memory(x, h)
        assert not np.shares_memory(x, T)


def test_blocked_accepts_a_property_callable_that_reuses_its_buffer():
    # a user's cp(T) that writes into one work array per block length: every block must leave
    # that array writeable, and the result must hold copies, not the work array
    work: dict[tuple[int, ...], np.ndarray] = {}

    def cp(T):
        b = work.setdefault(np.shape(T), np.empty(np.shape(T)))
        np.multiply(T, 0.1, out=b)
        b += 975.0
        return b

    n = 4 * _blocks.BLOCK
    T = np.linspace(300.0, 320.0, n)
    r = mt.mass_transfer_from_heat(np.full(n, 20.0), "water", "air", T, cp=cp)
    np.testing.assert_allclose(r.cp, 0.1 * T + 975.0, rtol=1e-15)
    assert all(b.flags.writeable for b in work.values())
    assert not any(np.shares_memory(r.cp, b) for b in work.values())
