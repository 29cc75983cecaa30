"""Helpers shared by the contactor modules: envelope checks and argument bundles."""

from __future__ import annotations

import numpy as np

from .._typing import FloatArray, FloatOrArray
from .._validation import check_positive, check_shapes, warn_caller
from ..errors import EnvelopeError, EnvelopeWarning, InputValueError

__all__ = ["envelope", "float_array", "positives", "require_domain"]


def float_array(x: FloatOrArray) -> FloatArray:
    """Return the value as a float numpy array (0-d for a scalar)."""
    return np.asarray(x, dtype=float)


def _extremes(value: FloatOrArray) -> tuple[float, float] | None:
    if isinstance(value, float):
        return value, value
    arr = np.asarray(value)
    if arr.size == 0:
        return None
    return float(arr.min()), float(arr.max())


def envelope(
    method: str, name: str, value: FloatOrArray, low: float, high: float, source: str, strict: bool = False
) -> str | None:
    """Warn (or raise with ``strict``) when ``value`` leaves ``[low, high]``; return the message."""
    ext = _extremes(value)
    if ext is None or (low <= ext[0] and ext[1] <= high):
        return None
    bad = ext[0] if ext[0] < low else ext[1]
    msg = f"{method}: {name}={bad:.4g} is outside its envelope {low:g} to {high:g} ({source})"
    if strict:
        raise EnvelopeError(msg)
    warn_caller(msg, EnvelopeWarning)
    return msg


def require_domain(name: str, value: FloatOrArray, low: float, high: float, fix: str) -> None:
    """Raise when ``value`` leaves the open interval ``(low, high)`` where an equation is defined."""
    ext = _extremes(value)
    if ext is None or (low < ext[0] and ext[1] < high):
        return
    bad = ext[0] if not ext[0] > low else ext[1]
    raise InputValueError(
        f"{name}={bad!r} is outside ({low:g}, {high:g}), where the equation is defined; {fix}"
    )


def positives(**values: object) -> tuple[FloatOrArray, ...]:
    """Check each argument finite and positive, in the order given, and that they broadcast together.

    Returns the converted values in the same order; the first bad one raises, naming itself.
    """
    checked = {name: check_positive(name, value) for name, value in values.items()}
    check_shapes(**checked)
    return tuple(checked.values())
