"""Argument checking shared by every numeric function.

Plain Python numbers take a fast path with no numpy call, so a scalar call
costs microseconds; everything else is converted once with
``np.asarray(x, dtype=float)`` and checked with whole-array operations.
"""

from __future__ import annotations

import math
from typing import Any

import numpy as np

from ._typing import FloatArray, FloatOrArray
from .errors import InputShapeError, InputValueError

__all__ = ["as_float", "check_nonnegative", "check_positive", "check_shapes", "finish", "in_range"]


def _describe(value: Any) -> str:
    arr = np.asarray(value)
    if arr.ndim == 0:
        return repr(arr.item())
    return f"array of shape {arr.shape}"


def as_float(name: str, value: Any) -> FloatOrArray:
    """Return ``value`` as a float (for Python scalars) or a float64 array."""
    if type(value) is float or type(value) is int:
        return float(value)
    if isinstance(value, bool | str | bytes) or value is None:
        raise InputValueError(f"{name}={value!r} is not a number; pass a float or an array of floats")
    try:
        arr = np.asarray(value, dtype=float)
    except (TypeError, ValueError) as exc:
        raise InputValueError(
            f"{name}={value!r} cannot be read as numbers ({exc}); pass a float or an array of floats"
        ) from None
    if arr.ndim == 0:
        return float(arr)
    return arr


def _bad(name: str, value: FloatOrArray, mask: Any, what: str, fix: str) -> InputValueError:
    if isinstance(value, float):
        shown = repr(value)
    else:
        bad = np.asarray(value)[mask]
        shown = f"{bad.ravel()[0]!r} (first of {bad.size} bad entries in an array of shape {np.shape(value)})"
    return InputValueError(f"{name}={shown} {what}; {fix}")


def check_positive(name: str, value: Any, fix: str = "") -> FloatOrArray:
    """Convert ``value`` and require every entry to be finite and > 0."""
    x = as_float(name, value)
    fix = fix or f"pass a finite, positive {name}"
    if isinstance(x, float):
        if not (math.isfinite(x) and x > 0.0):
            what = "is not finite" if not math.isfinite(x) else "is not positive"
            raise _bad(name, x, None, what, fix)
        return x
    # fast path: two reductions, no temporary arrays (NaN fails the min test)
    if x.size == 0 or (x.min() > 0.0 and x.max() < math.inf):
        return x
    ok = np.isfinite(x)
    if not ok.all():
        raise _bad(name, x, ~ok, "is not finite", fix)
    raise _bad(name, x, ~(x > 0.0), "is not positive", fix)


def check_nonnegative(name: str, value: Any, fix: str = "") -> FloatOrArray:
    """Convert ``value`` and require every entry to be finite and >= 0."""
    x = as_float(name, value)
    fix = fix or f"pass a finite {name} of zero or more"
    if isinstance(x, float):
        if not (math.isfinite(x) and x >= 0.0):
            what = "is not finite" if not math.isfinite(x) else "is negative"
            raise _bad(name, x, None, what, fix)
        return x
    if x.size == 0 or (x.min() >= 0.0 and x.max() < math.inf):
        return x
    ok = np.isfinite(x)
    if not ok.all():
        raise _bad(name, x, ~ok, "is not finite", fix)
    raise _bad(name, x, ~(x >= 0.0), "is negative", fix)


def in_range(name: str, value: FloatOrArray, low: float, high: float, fix: str) -> None:
    """Require ``low <= value <= high`` everywhere (value already checked finite)."""
    if isinstance(value, float):
        if not (low <= value <= high):
            raise _bad(name, value, None, f"is outside [{low:g}, {high:g}]", fix)
        return
    ok = (value >= low) & (value <= high)
    if not ok.all():
        raise _bad(name, value, ~ok, f"is outside [{low:g}, {high:g}]", fix)


def check_shapes(**arrays: FloatOrArray) -> None:
    """Require the given arguments to broadcast together."""
    shapes = {k: np.shape(v) for k, v in arrays.items() if not isinstance(v, float)}
    if len(shapes) < 2:
        return
    try:
        np.broadcast_shapes(*shapes.values())
    except ValueError:
        listed = ", ".join(f"{k} {s}" for k, s in shapes.items())
        raise InputShapeError(
            f"array arguments do not broadcast together: {listed}; pass arrays of one shape, or scalars"
        ) from None


def finish(value: FloatOrArray | FloatArray) -> FloatOrArray:
    """Return a Python float for 0-d results, else the float64 array."""
    if isinstance(value, float):
        return float(value)  # also turns numpy float64 scalars into Python floats
    arr = np.asarray(value, dtype=float)
    if arr.ndim == 0:
        return float(arr)
    return arr
