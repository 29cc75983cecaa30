"""Argument checking shared by every numeric function.

Plain Python numbers take a fast path with no numpy call, so a scalar call
costs microseconds; everything else is converted once with
``np.asarray(x, dtype=float)`` and checked with whole-array operations.

Dask arrays are never converted: a guarded function given one returns a lazy dask array that
runs the same function, checks included, block by block when computed (see :func:`guard`), and
the ``check_*`` helpers given one return it with the same checks attached to every block.
"""

from __future__ import annotations

import contextlib
import contextvars
import dataclasses
import functools
import inspect
import math
import os
import sys
import threading
import types
import warnings
from collections.abc import Callable, Iterator
from typing import Any, ParamSpec, TypeVar, overload

import numpy as np

from ._typing import FloatArray, FloatOrArray
from .errors import InputShapeError, InputTypeError, InputValueError, UnitError

__all__ = [
    "MAGNITUDE_LIMIT",
    "as_float",
    "call_with_quantities",
    "check_finite",
    "check_nonnegative",
    "check_positive",
    "check_shapes",
    "collect_warnings",
    "dask_blocks",
    "finish",
    "guard",
    "has_quantity",
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
    if type(value) is float:
        return value
    if type(value) is int:
        try:
            return float(value)
        except OverflowError:
            raise InputValueError(
                f"{name} is an integer of {value.bit_length()} bits, beyond double precision; "
                f"pass a value within +-{MAGNITUDE_LIMIT:g} in SI units"
            ) from None
    if isinstance(value, bool | str | bytes | complex) or value is None:
        raise InputTypeError(
            f"{name}={value!r} is a {type(value).__name__}, not a number; pass a float or an array of floats"
        )
    if not isinstance(value, np.ndarray) and _is_dask(value):
        if value.dtype.kind not in "iuf":
            raise InputTypeError(f"{name} is a dask array of {value.dtype}, not real numbers; pass floats")
        return value  # type: ignore[no-any-return]  # checked block by block by the caller
    if isinstance(value, np.ndarray):
        if type(value) is not np.ndarray and hasattr(value, "mask"):
            raise InputTypeError(
                f"{name} is a masked array; the mask would be lost: pass the unmasked entries "
                "(value.compressed()) or fill them (value.filled(...))"
            )
        raw = value
    else:
        if _is_quantity_type(type(value)):  # never strip a unit silently
            raise UnitError(
                f"{name} is a physical quantity ({value!r}) where a plain number in SI units is "
                "expected here; pass the magnitude in the documented unit"
            )
        try:
            raw = np.asarray(value)
        except (TypeError, ValueError) as exc:
            raise InputShapeError(
                f"{name}={value!r} cannot be read as an array of numbers ({exc}); "
                "pass a float or a rectangular array of floats"
            ) from exc
    if raw.dtype.kind not in "iuf":
        what = {"b": "booleans", "c": "complex numbers", "U": "strings", "S": "bytes", "O": "objects"}
        raise InputTypeError(
            f"{name} holds {what.get(raw.dtype.kind, str(raw.dtype))}, not real numbers; "
            "pass a float or an array of floats"
        )
    arr = raw.astype(float, copy=False)
    if arr.ndim == 0:
        return float(arr)
    return arr


def _is_dask(value: object) -> bool:
    """Tell whether ``value`` is a dask array, without importing dask."""
    module = sys.modules.get("dask.array")
    return module is not None and isinstance(value, module.Array)


def _check_block(check: Callable[..., FloatOrArray], name: str, fix: str, block: FloatArray) -> FloatArray:
    return np.asarray(check(name, block, fix), dtype=float)


def _lazy_check(check: Callable[..., FloatOrArray], name: str, x: Any, fix: str) -> Any:
    """Attach ``check`` to every block of the dask array ``x``; nothing is computed now."""
    return x.map_blocks(functools.partial(_check_block, check, name, fix), dtype=float)


def _bad(name: str, value: FloatOrArray, mask: Any, what: str, fix: str) -> InputValueError:
    if isinstance(value, float):
        shown = repr(value)
    else:
        bad = np.asarray(value)[mask]
        first = float(bad.ravel()[0])
        shown = f"{first!r} (first of {bad.size} bad entries in an array of shape {np.shape(value)})"
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
    if not isinstance(x, np.ndarray):  # a dask array: the same check on every block, when computed
        return _lazy_check(check_positive, name, x, fix)
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
    if not isinstance(x, np.ndarray):  # a dask array: the same check on every block, when computed
        return _lazy_check(check_nonnegative, name, x, fix)
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
    if not isinstance(x, np.ndarray):  # a dask array: the same check on every block, when computed
        return _lazy_check(check_finite, name, x, fix)
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
    if not isinstance(value, np.ndarray) and _is_dask(value):
        return value  # stays lazy
    arr = np.asarray(value, dtype=float)
    if arr.ndim == 0:
        return float(arr)
    return arr


_P = ParamSpec("_P")
_R = TypeVar("_R")


_PACKAGE_DIR = os.path.dirname(os.path.abspath(__file__))


#: Warnings collected by :func:`collect_warnings` in the current thread or task (None: emit them).
_COLLECTOR: contextvars.ContextVar[list[tuple[str, type[Warning]]] | None] = contextvars.ContextVar(
    "masstransfer_warning_collector", default=None
)
#: The "already shown" registry of our warnings, per calling location.  Python keeps one per module
#: keyed on the full text, which grows without bound when the text names input values; this one
#: is bounded (cleared when full: at worst a caution is shown once more).
_REGISTRIES: dict[str, dict[Any, Any]] = {}
_REGISTRY_LIMIT = 1024  # entries per calling file
_REGISTRY_LOCK = threading.Lock()


@contextlib.contextmanager
def collect_warnings() -> Iterator[list[tuple[str, type[Warning]]]]:
    """Collect the library's own warnings issued inside the block instead of emitting them.

    Thread- and task-local (a :class:`contextvars.ContextVar`): unlike
    :class:`warnings.catch_warnings` it touches no process-wide filter, so concurrent callers
    neither lose nor receive each other's warnings.  The caller re-issues what it collected
    with :func:`warn_caller` once the block ends, so the user's filters decide as usual.
    """
    bucket: list[tuple[str, type[Warning]]] = []
    token = _COLLECTOR.set(bucket)
    try:
        yield bucket
    finally:
        _COLLECTOR.reset(token)


def warn_caller(message: str, category: type[Warning]) -> None:
    """Issue a warning attributed to the first frame outside this package (the user's code).

    Inside :func:`collect_warnings` the warning is collected instead.  The user's filters apply
    as for :func:`warnings.warn`; the de-duplication registry is the bounded one above.
    """
    bucket = _COLLECTOR.get()
    if bucket is not None:
        bucket.append((message, category))
        return
    frame: types.FrameType | None = sys._getframe(1)
    while frame is not None and os.path.abspath(frame.f_code.co_filename).startswith(_PACKAGE_DIR):
        frame = frame.f_back
    if frame is None:  # called from inside the package only (e.g. at import): attribute it here
        warnings.warn(message, category, stacklevel=2)
        return
    filename = frame.f_code.co_filename
    with _REGISTRY_LOCK:
        registry = _REGISTRIES.setdefault(filename, {})
        if len(registry) > _REGISTRY_LIMIT:
            registry.clear()
    warnings.warn_explicit(
        message,
        category,
        filename,
        frame.f_lineno,
        module=frame.f_globals.get("__name__"),
        registry=registry,
        # source lines come from the caller's module, except for code with no file behind it
        # (python -c, a REPL, exec), whose loader cannot give any
        module_globals=None if filename.startswith("<") else frame.f_globals,
    )


def _suspect(fn: Callable[..., Any], args: tuple[Any, ...], kwargs: dict[str, Any]) -> str:
    """Name the argument most likely at fault for an arithmetic failure: the most extreme magnitude."""
    try:
        bound = inspect.signature(fn).bind_partial(*args, **kwargs).arguments
    except TypeError:
        bound = dict(kwargs)
    worst_name, worst_score, worst_shown = "", -1.0, ""
    for name, v in bound.items():
        try:
            arr = np.asarray(v, dtype=float)
        except (TypeError, ValueError):
            continue
        if arr.size == 0:
            continue
        with np.errstate(all="ignore"):
            mag = np.abs(arr[np.isfinite(arr) & (arr != 0.0)])
            score = float(np.max(np.abs(np.log10(mag)))) if mag.size else 0.0
        if score > worst_score:
            shown = repr(float(arr)) if arr.ndim == 0 else f"an array of shape {arr.shape}"
            worst_name, worst_score, worst_shown = name, score, shown
    if not worst_name:
        return "check the magnitudes of the arguments"
    return f"{worst_name}={worst_shown} is the most extreme input; bring it closer to a physical value"


_NOT_NUMBERS = frozenset({str, bool, int})


def _finite_out(out: Any, depth: int = 0) -> bool:
    """Tell whether every float inside ``out`` is finite (floats, arrays, tuples, dataclass fields)."""
    if type(out) is float:
        return math.isfinite(out)
    if isinstance(out, np.ndarray):
        if out.dtype.kind == "f":  # two reductions (NaN propagates, inf is an extreme): no temporary array
            return out.size == 0 or (math.isfinite(out.min()) and math.isfinite(out.max()))
        return out.dtype.kind != "c" or bool(np.isfinite(out).all())
    if depth > 2 or out is None or type(out) in _NOT_NUMBERS:  # labels, flags and counts: nothing to check
        return True
    if type(out) is tuple and all(type(v) is str for v in out):  # e.g. the warnings of a result
        return True
    if isinstance(out, tuple | list):
        return all(_finite_out(v, depth + 1) for v in out)
    if dataclasses.is_dataclass(out) and not isinstance(out, type):
        return all(_finite_out(getattr(out, f.name), depth + 1) for f in dataclasses.fields(out))
    if isinstance(out, float):  # numpy float64 and other float subclasses
        return math.isfinite(out)
    return True


def _with_units(call: Callable[..., _R], fn: Callable[..., Any], args: Any, kwargs: Any) -> _R:
    from ._units import call_with_units

    return call_with_units(call, fn, args, kwargs)  # type: ignore[no-any-return]


def call_with_quantities(fn: Callable[..., _R], args: tuple[Any, ...], kwargs: dict[str, Any]) -> _R:
    """Run ``fn`` on quantities, as the guard does: for the few public functions without a guard."""
    from ._units import call_with_units

    return call_with_units(fn, fn, args, kwargs)  # type: ignore[no-any-return]


_ARITHMETIC = (FloatingPointError, OverflowError, ZeroDivisionError, RuntimeWarning)

#: Argument types that are never physical quantities: the quantity check stops at one set look-up.
_PLAIN_TYPES: frozenset[type] = frozenset(
    {float, int, str, bool, type(None), np.ndarray, np.float64, list, tuple, dict}
)
#: Other argument types seen, and whether they are quantities (pint's classes, found by duck typing).
_QUANTITY_TYPES: dict[type, bool] = {}


def _is_quantity_type(t: type) -> bool:
    known = _QUANTITY_TYPES.get(t)
    if known is None:
        known = hasattr(t, "_REGISTRY") and hasattr(t, "to") and hasattr(t, "magnitude")
        if len(_QUANTITY_TYPES) < 512:
            _QUANTITY_TYPES[t] = known
    return known


def has_quantity(args: tuple[Any, ...], kwargs: dict[str, Any]) -> bool:
    """Tell whether any argument is a physical quantity, without importing pint."""
    for a in args:
        if type(a) not in _PLAIN_TYPES and _is_quantity_type(type(a)):
            return True
    for a in kwargs.values():  # noqa: SIM110 - a plain loop: no generator object on every call
        if type(a) not in _PLAIN_TYPES and _is_quantity_type(type(a)):
            return True
    return False


def _has_dask(args: tuple[Any, ...], kwargs: dict[str, Any]) -> bool:
    cls = sys.modules["dask.array"].Array
    return any(isinstance(v, cls) for v in args) or any(isinstance(v, cls) for v in kwargs.values())


def _apply_block(
    fn: Callable[..., Any],
    args: tuple[Any, ...],
    kwargs: dict[str, Any],
    slots: tuple[int | str, ...],
    *blocks: FloatArray,
) -> FloatArray:
    """Call ``fn`` with one block in each array slot (positions or keywords), the rest as given."""
    a, kw = list(args), dict(kwargs)
    for slot, block in zip(slots, blocks, strict=True):
        if isinstance(slot, int):
            a[slot] = block
        else:
            kw[slot] = block
    out = np.asarray(fn(*a, **kw), dtype=float)
    return out if out.shape == blocks[0].shape else np.broadcast_to(out, blocks[0].shape)


def _lazy_call(
    fn: Callable[..., Any],
    target: Callable[..., Any],
    name: str,
    args: tuple[Any, ...],
    kwargs: dict[str, Any],
) -> Any:
    """Return ``fn(*args, **kwargs)`` as a lazy dask array evaluated block by block.

    The array arguments (dask or numpy) are broadcast together and cut into common blocks;
    each block is passed to ``fn`` itself, so its checks, envelope warnings and guard run on
    every block when, and only when, the result is computed.
    """
    da = sys.modules["dask.array"]

    def is_array(v: Any) -> bool:
        return isinstance(v, da.Array) or (isinstance(v, np.ndarray) and v.ndim > 0)

    try:
        names = list(inspect.signature(target).bind_partial(*args).arguments)
    except TypeError:
        names = []
    slots: tuple[int | str, ...] = (
        *(i for i, v in enumerate(args) if is_array(v)),
        *(k for k, v in kwargs.items() if is_array(v)),
    )
    values = [args[s] if isinstance(s, int) else kwargs[s] for s in slots]
    shown = [names[s] if isinstance(s, int) and s < len(names) else str(s) for s in slots]
    for label, v in zip(shown, values, strict=True):
        if v.dtype.kind not in "iuf":
            raise InputTypeError(f"{label} is an array of {v.dtype}, not real numbers; pass floats")
    try:
        arrays = da.broadcast_arrays(*(da.asarray(v) for v in values))
    except ValueError:
        listed = ", ".join(f"{label} {v.shape}" for label, v in zip(shown, values, strict=True))
        raise InputShapeError(
            f"{name}: array arguments do not broadcast together: {listed}; "
            "pass arrays of one shape, or scalars"
        ) from None
    # every task carries the partial: the array slots go in empty (each task gets its own
    # blocks), or each would carry the whole arrays and their graphs
    bare_args = tuple(None if i in slots else v for i, v in enumerate(args))
    bare_kwargs = {k: (None if k in slots else v) for k, v in kwargs.items()}
    block = functools.partial(_apply_block, fn, bare_args, bare_kwargs, slots)
    ndim = arrays[0].ndim
    return da.map_blocks(block, *arrays, dtype=float, meta=np.empty((0,) * ndim, dtype=float))


def dask_blocks(fn: Callable[..., Any], *args: Any, **kwargs: Any) -> Any:
    """``fn(*args, **kwargs)`` as a lazy dask array, block by block: for an unguarded fast path given dask."""
    name = getattr(fn, "__qualname__", "function")
    return _lazy_call(fn, fn, name, args, kwargs)


def _returns_array(f: Callable[..., Any]) -> bool:
    """Tell from its return annotation whether ``f`` returns a float or an array (state by state)."""
    annotation = inspect.unwrap(f).__annotations__.get("return")
    return annotation in ("FloatOrArray", FloatOrArray)


def _refuse_call(
    f: Callable[..., Any], name: str, args: tuple[Any, ...], kwargs: dict[str, Any], exc: TypeError
) -> None:
    """Raise :class:`InputTypeError` when ``exc`` came from the call's arguments not fitting ``f``.

    Only on the error path: an unknown keyword, a missing or a surplus argument is named with
    the parameters ``f`` takes.  A TypeError raised inside ``f`` (arguments that did bind) is
    left to the caller.
    """
    if isinstance(exc, InputTypeError):
        return
    try:
        sig = inspect.signature(f)
        sig.bind(*args, **kwargs)
    except TypeError as bad:
        params = ", ".join(sig.parameters)
        raise InputTypeError(f"{name}(): {bad}; it takes ({params})") from None
    except ValueError:  # no signature to read
        return


@overload
def guard(fn: Callable[_P, _R], /) -> Callable[_P, _R]: ...
@overload
def guard(
    *, check_output: bool = True, elementwise: bool | None = None, quantities: bool = True
) -> Callable[[Callable[_P, _R]], Callable[_P, _R]]: ...


def guard(
    fn: Callable[_P, _R] | None = None,
    /,
    *,
    check_output: bool = True,
    elementwise: bool | None = None,
    quantities: bool = True,
) -> Callable[_P, _R] | Callable[[Callable[_P, _R]], Callable[_P, _R]]:
    """Decorate a public function so that arithmetic failures become library errors, and only those.

    Written at each ``def`` (``@guard`` or ``@guard(check_output=False)``).  The numeric
    conditions the guard exists for (overflow, division by zero, invalid operations raised as
    ``FloatingPointError`` or as ``RuntimeWarning`` under ``-W error``, and, with
    ``check_output``, a non-finite float anywhere in the result, result objects included) raise
    :class:`~masstransfer.errors.InputValueError` naming the most extreme argument, chained with
    ``from exc``.  Every other exception, the library's own errors and internal bugs alike
    (``AttributeError``, ``KeyError``, ``IndexError``, a stray ``TypeError``), propagates as
    itself with its full traceback.  Argument domains are declared inside each function by the
    ``check_*`` helpers of this module, once, before any arithmetic.

    When an argument is a physical quantity (pint), the call goes through
    :func:`masstransfer._units.call_with_units`: quantities are converted to the units the
    docstring states for each parameter, and the result is returned as a quantity in the unit
    of the Returns section.  Plain calls pay one type look-up per argument and import nothing;
    ``quantities=False`` builds the guard without that look-out (the benchmarks' baseline).

    Dask arrays: a function that works state by state (``elementwise``; by default, one whose
    return annotation is ``FloatOrArray``) given any dask array returns a lazy dask array at
    once, with nothing computed: the array arguments are broadcast into common blocks and the
    function itself, checks and all, runs on each block when the result is computed, so bad
    input raises the library's error then.  Any other function (one that works across a whole
    array, or returns a result object, ``elementwise=False``) refuses dask arrays with
    :class:`~masstransfer.errors.InputTypeError`; ``masstransfer.sweep`` maps those over blocks.
    """

    def decorate(f: Callable[_P, _R]) -> Callable[_P, _R]:
        name = getattr(f, "__qualname__", getattr(f, "__name__", "function"))
        by_state = _returns_array(f) if elementwise is None else elementwise

        if not quantities:  # the guard as it was before units: the benchmarks' baseline

            @functools.wraps(f)
            def bare(*args: _P.args, **kwargs: _P.kwargs) -> _R:
                if "dask.array" in sys.modules and _has_dask(args, kwargs):
                    if not by_state:
                        raise InputTypeError(f"{name} does not take dask arrays")
                    return _lazy_call(bare, f, name, args, kwargs)  # type: ignore[no-any-return]
                try:
                    out = f(*args, **kwargs)
                except _ARITHMETIC as exc:
                    raise InputValueError(
                        f"{name}: the inputs overflow the equations ({exc}); {_suspect(f, args, kwargs)}"
                    ) from exc
                if check_output and not _finite_out(out):
                    raise InputValueError(
                        f"{name}: the result is not finite for these inputs; {_suspect(f, args, kwargs)}"
                    )
                return out

            return bare

        plain = _PLAIN_TYPES  # a closure cell: quicker to reach than the module global

        @functools.wraps(f)
        def wrapper(*args: _P.args, **kwargs: _P.kwargs) -> _R:
            # pint quantities, spotted without importing pint: converted by the docstring's units
            for a in args:
                if a.__class__ is not float and a.__class__ not in plain and _is_quantity_type(type(a)):
                    return _with_units(wrapper, f, args, kwargs)
            if kwargs:
                for a in kwargs.values():
                    if a.__class__ is not float and a.__class__ not in plain and _is_quantity_type(type(a)):
                        return _with_units(wrapper, f, args, kwargs)
            if "dask.array" in sys.modules and _has_dask(args, kwargs):
                if not by_state:
                    raise InputTypeError(
                        f"{name} does not take dask arrays (it works across whole arrays or returns a "
                        "result object); pass numpy arrays, or map it over blocks with "
                        "masstransfer.sweep.evaluate"
                    )
                return _lazy_call(wrapper, f, name, args, kwargs)  # type: ignore[no-any-return]
            try:
                out = f(*args, **kwargs)
            except _ARITHMETIC as exc:
                raise InputValueError(
                    f"{name}: the inputs overflow the equations ({exc}); {_suspect(f, args, kwargs)}"
                ) from exc
            except TypeError as exc:
                _refuse_call(f, name, args, kwargs, exc)
                raise
            if check_output and not _finite_out(out):
                raise InputValueError(
                    f"{name}: the result is not finite for these inputs; {_suspect(f, args, kwargs)}"
                )
            return out

        return wrapper

    if fn is not None:
        return decorate(fn)
    return decorate
