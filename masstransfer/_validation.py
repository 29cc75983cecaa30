"""Argument checking shared by every numeric function.

Plain Python numbers take a fast path with no numpy call, so a scalar call
costs microseconds; everything else is converted once with
``np.asarray(x, dtype=float)`` and checked with whole-array operations.
"""

from __future__ import annotations

import functools
import inspect
import math
import os
import sys
import types
import warnings
from collections.abc import Callable
from typing import Any, ParamSpec, TypeVar

import numpy as np

from ._typing import FloatArray, FloatOrArray
from .errors import InputShapeError, InputValueError, MassTransferError

__all__ = [
    "MAGNITUDE_LIMIT",
    "as_float",
    "check_finite",
    "check_nonnegative",
    "check_positive",
    "check_shapes",
    "finish",
    "guard",
    "guard_module",
    "in_range",
    "scalar",
    "warn_caller",
]

#: Largest magnitude (and, for positive quantities, the reciprocal of the smallest) accepted
#: for any input in SI units.  Physical inputs lie far inside; the bound keeps every equation's
#: intermediate products inside double precision, so a valid input never yields inf or NaN.
MAGNITUDE_LIMIT = 1e60


def _describe(value: Any) -> str:
    arr = np.asarray(value)
    if arr.ndim == 0:
        return repr(arr.item())
    return f"array of shape {arr.shape}"


def as_float(name: str, value: Any) -> FloatOrArray:
    """Return ``value`` as a float (for Python scalars) or a float64 array."""
    if type(value) is float or type(value) is int:
        return float(value)
    if isinstance(value, bool | str | bytes | complex) or value is None:
        raise InputValueError(f"{name}={value!r} is not a number; pass a float or an array of floats")
    if isinstance(value, np.ndarray) and value.dtype.kind not in "biuf":
        raise InputValueError(
            f"{name} is an array of {value.dtype} values, not numbers; pass floats or an array of floats"
        )
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
    lo, hi = 1.0 / MAGNITUDE_LIMIT, MAGNITUDE_LIMIT
    if isinstance(x, float):
        if not (lo <= x <= hi):
            if not math.isfinite(x):
                raise _bad(name, x, None, "is not finite", fix)
            if x <= 0.0:
                raise _bad(name, x, None, "is not positive", fix)
            raise _bad(name, x, None, f"is outside {lo:g} to {hi:g}, the range accepted in SI units", fix)
        return x
    # fast path: two reductions, no temporary arrays (NaN fails the min test)
    if x.size == 0 or (x.min() >= lo and x.max() <= hi):
        return x
    ok = np.isfinite(x)
    if not ok.all():
        raise _bad(name, x, ~ok, "is not finite", fix)
    if not (x > 0.0).all():
        raise _bad(name, x, ~(x > 0.0), "is not positive", fix)
    raise _bad(
        name, x, (x < lo) | (x > hi), f"is outside {lo:g} to {hi:g}, the range accepted in SI units", fix
    )


def check_nonnegative(name: str, value: Any, fix: str = "") -> FloatOrArray:
    """Convert ``value`` and require every entry to be finite and >= 0."""
    x = as_float(name, value)
    fix = fix or f"pass a finite {name} of zero or more"
    hi = MAGNITUDE_LIMIT
    if isinstance(x, float):
        if not (0.0 <= x <= hi):
            if not math.isfinite(x):
                raise _bad(name, x, None, "is not finite", fix)
            if x < 0.0:
                raise _bad(name, x, None, "is negative", fix)
            raise _bad(name, x, None, f"exceeds {hi:g}, the range accepted in SI units", fix)
        return x
    if x.size == 0 or (x.min() >= 0.0 and x.max() <= hi):
        return x
    ok = np.isfinite(x)
    if not ok.all():
        raise _bad(name, x, ~ok, "is not finite", fix)
    if not (x >= 0.0).all():
        raise _bad(name, x, ~(x >= 0.0), "is negative", fix)
    raise _bad(name, x, x > hi, f"exceeds {hi:g}, the range accepted in SI units", fix)


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


def check_finite(name: str, value: Any, fix: str = "") -> FloatOrArray:
    """Convert ``value`` and require finite entries of magnitude at most :data:`MAGNITUDE_LIMIT`."""
    x = as_float(name, value)
    fix = fix or f"pass a finite {name}"
    if isinstance(x, float):
        if not math.isfinite(x):
            raise _bad(name, x, None, "is not finite", fix)
        if abs(x) > MAGNITUDE_LIMIT:
            raise _bad(name, x, None, f"exceeds {MAGNITUDE_LIMIT:g} in magnitude", fix)
        return x
    if x.size == 0 or (x.min() >= -MAGNITUDE_LIMIT and x.max() <= MAGNITUDE_LIMIT):
        return x
    ok = np.isfinite(x)
    if not ok.all():
        raise _bad(name, x, ~ok, "is not finite", fix)
    raise _bad(name, x, np.abs(x) > MAGNITUDE_LIMIT, f"exceeds {MAGNITUDE_LIMIT:g} in magnitude", fix)


def scalar(name: str, value: Any) -> float:
    """Require a single number (a Python or numpy scalar, or a 0-d/1-element array)."""
    x = as_float(name, value)
    if isinstance(x, float):
        return x
    if x.size == 1:
        return float(x.reshape(()))
    raise InputValueError(f"{name} must be a single number, not an array of shape {x.shape}; pass one value")


def finish(value: FloatOrArray | FloatArray) -> FloatOrArray:
    """Return a Python float for 0-d results, else the float64 array."""
    if isinstance(value, float):
        return float(value)  # also turns numpy float64 scalars into Python floats
    arr = np.asarray(value, dtype=float)
    if arr.ndim == 0:
        return float(arr)
    return arr


_P = ParamSpec("_P")
_R = TypeVar("_R")


_PACKAGE_DIR = os.path.dirname(os.path.abspath(__file__))


def warn_caller(message: str, category: type[Warning]) -> None:
    """Issue a warning attributed to the first frame outside this package (the user's code)."""
    level = 2  # stacklevel 2 is the caller of this helper
    frame: types.FrameType | None = sys._getframe(1)
    while frame is not None and os.path.abspath(frame.f_code.co_filename).startswith(_PACKAGE_DIR):
        frame = frame.f_back
        level += 1
    warnings.warn(message, category, stacklevel=level)


def _suspects(fn: Callable[..., Any], args: tuple[Any, ...], kwargs: dict[str, Any]) -> str:
    """Name the arguments most likely to be at fault (wrong type or extreme magnitude)."""
    try:
        bound = inspect.signature(fn).bind_partial(*args, **kwargs).arguments
    except TypeError:
        bound = dict(kwargs)
    worst: list[str] = []
    for name, v in bound.items():
        if isinstance(v, complex | dict | set) or v is None or type(v) is object:
            worst.append(f"{name}={v!r}")
            continue
        try:
            arr = np.asarray(v, dtype=float)
        except (TypeError, ValueError):
            if not isinstance(v, str):
                worst.append(f"{name}={v!r}")
            continue
        if arr.size and (not np.all(np.isfinite(arr)) or np.max(np.abs(arr)) > 1e30):
            worst.append(f"{name}={'array' if arr.ndim else repr(float(arr))}")
    return (
        ("check " + ", ".join(worst)) if worst else "check the types, shapes and magnitudes of the arguments"
    )


def _finite_out(out: Any) -> bool:
    if isinstance(out, float):
        return math.isfinite(out)
    if isinstance(out, np.ndarray) and out.dtype.kind == "f":
        return bool(np.isfinite(out).all())
    if isinstance(out, tuple) and all(isinstance(v, float) for v in out):
        return all(math.isfinite(v) for v in out)
    return True


def guard(fn: Callable[_P, _R], check_output: bool = True) -> Callable[_P, _R]:
    """Wrap a public function so that it only ever returns finite numbers or raises our errors.

    Arithmetic failures (overflow, division by zero, numpy warnings raised as errors) and stray
    type or value errors from deep inside numpy or the databases become
    :class:`~masstransfer.errors.InputValueError` naming the function and the suspect arguments.
    With ``check_output`` a non-finite float or float-array result raises as well.
    """
    name = getattr(fn, "__qualname__", getattr(fn, "__name__", "function"))

    @functools.wraps(fn)
    def wrapper(*args: _P.args, **kwargs: _P.kwargs) -> _R:
        try:
            out = fn(*args, **kwargs)
        except MassTransferError:
            raise
        except (RuntimeWarning, OverflowError, ZeroDivisionError, FloatingPointError) as exc:
            raise InputValueError(
                f"{name}: the inputs overflow the equations ({exc}); {_suspects(fn, args, kwargs)}"
            ) from None
        except (TypeError, ValueError, KeyError, IndexError, AttributeError) as exc:
            raise InputValueError(
                f"{name}: the inputs could not be used ({exc}); {_suspects(fn, args, kwargs)}"
            ) from None
        if check_output and not _finite_out(out):
            raise InputValueError(
                f"{name}: the result is not finite for these inputs; {_suspects(fn, args, kwargs)}"
            )
        return out

    return wrapper


def guard_module(
    namespace: dict[str, Any], names: Any, unchecked: tuple[str, ...] = (), unguarded: tuple[str, ...] = ()
) -> None:
    """Guard every public function of a module in place (see :func:`guard`).

    Functions in ``unchecked`` skip the output check: their results are finite by construction
    for inputs inside :data:`MAGNITUDE_LIMIT`, and they sit in hot loops.  Functions in
    ``unguarded`` validate everything themselves and are left unwrapped, to keep a scalar call
    at about a microsecond; the robustness sweep covers them like the rest.
    """
    for n in names:
        obj = namespace.get(n)
        if n in unguarded:
            continue
        if inspect.isfunction(obj) and obj.__module__ == namespace["__name__"]:
            namespace[n] = guard(obj, check_output=n not in unchecked)
