"""Immutable result types: frozen all the way down, comparable, hashable, picklable.

Every result the library returns derives from :class:`FrozenResult`, a mixin for
``@dataclass(frozen=True, eq=False)`` classes.  On construction (and on unpickling) each field
is frozen:

- numpy arrays are copied and made read-only, so neither the caller's later edits to an input
  array nor edits to a returned array can change a result;
- mappings become :class:`FrozenMapping` (immutable, hashable, picklable, unlike
  ``types.MappingProxyType``), lists become tuples, recursively.

Equality compares every field (arrays element by element, NaN equal to NaN, shapes included)
and hashing covers every field, so two results are equal exactly when nothing in them differs.
"""

from __future__ import annotations

import contextlib
import contextvars
import dataclasses
from collections.abc import Iterator, Mapping
from typing import Any, TypeVar

import numpy as np

__all__ = ["FrozenMapping", "FrozenResult", "adopting", "freeze"]

#: Ids of arrays that :func:`freeze` may take without copying (see :func:`adopting`).
_ADOPTED: contextvars.ContextVar[frozenset[int]] = contextvars.ContextVar("_ADOPTED", default=frozenset())

K = TypeVar("K")
V = TypeVar("V")


class FrozenMapping(Mapping[K, V]):
    """An immutable, hashable, picklable mapping (insertion order kept)."""

    __slots__ = ("_data", "_hash")
    _data: dict[Any, Any]
    _hash: int | None

    def __init__(self, data: Mapping[K, V] | None = None, /) -> None:
        items = {} if data is None else {k: freeze(v) for k, v in dict(data).items()}
        object.__setattr__(self, "_data", items)
        object.__setattr__(self, "_hash", None)

    def __getitem__(self, key: K) -> V:
        return self._data[key]  # type: ignore[no-any-return]

    def __iter__(self) -> Iterator[K]:
        return iter(self._data)

    def __len__(self) -> int:
        return len(self._data)

    def __setattr__(self, name: str, value: Any) -> None:
        raise AttributeError(f"{type(self).__name__} is immutable")

    def __repr__(self) -> str:
        return f"{type(self).__name__}({self._data!r})"

    def __eq__(self, other: object) -> bool:
        if not isinstance(other, Mapping):
            return NotImplemented
        if len(other) != len(self) or set(other) != set(self._data):
            return False
        return all(_equal(v, other[k]) for k, v in self._data.items())

    def __hash__(self) -> int:
        h = self._hash
        if h is None:
            h = hash(tuple((k, _hashable(v)) for k, v in self._data.items()))
            object.__setattr__(self, "_hash", h)
        return h

    def __reduce__(self) -> tuple[Any, ...]:
        return (type(self), (dict(self._data),))


@contextlib.contextmanager
def adopting(*arrays: np.ndarray[Any, Any]) -> Iterator[None]:
    """Within the block, :func:`freeze` makes ``arrays`` read-only in place instead of copying them.

    For arrays the library has just allocated and hands to a result without keeping any other
    reference (the full-size outputs of a blockwise evaluation): copying them would only
    double the memory and the time.  Every other array is still copied.
    """
    token = _ADOPTED.set(_ADOPTED.get() | {id(a) for a in arrays})
    try:
        yield
    finally:
        _ADOPTED.reset(token)


def freeze(value: Any) -> Any:
    """Return an immutable equivalent of ``value`` (arrays copied read-only, mappings frozen)."""
    if isinstance(value, np.ndarray):
        if id(value) in _ADOPTED.get() and value.base is None:
            value.setflags(write=False)
            return value
        out = np.array(value, copy=True)
        out.setflags(write=False)
        return out
    if isinstance(value, FrozenMapping):
        return value
    if isinstance(value, Mapping):
        return FrozenMapping(value)
    if isinstance(value, list):
        return tuple(freeze(v) for v in value)
    if isinstance(value, tuple) and not hasattr(value, "_fields"):
        return tuple(freeze(v) for v in value)
    return value


def _equal(a: Any, b: Any) -> bool:
    if isinstance(a, np.ndarray) or isinstance(b, np.ndarray):
        aa, bb = np.asarray(a), np.asarray(b)
        if aa.shape != bb.shape or aa.dtype.kind != bb.dtype.kind:
            return False
        if aa.dtype.kind in "fc":
            return bool(np.array_equal(aa, bb, equal_nan=True))
        return bool(np.array_equal(aa, bb))
    if isinstance(a, tuple) and isinstance(b, tuple):
        return len(a) == len(b) and all(_equal(x, y) for x, y in zip(a, b, strict=True))
    if isinstance(a, float) and isinstance(b, float) and a != a and b != b:
        return True
    return bool(a == b)


def _hashable(value: Any) -> Any:
    if isinstance(value, np.ndarray):
        return (value.shape, value.dtype.str, np.ascontiguousarray(value).tobytes())
    if isinstance(value, tuple):
        return tuple(_hashable(v) for v in value)
    return value


class FrozenResult:
    """Mixin for ``@dataclass(frozen=True, eq=False)`` result types (see the module docstring)."""

    __slots__ = ()

    def __post_init__(self) -> None:
        for f in dataclasses.fields(self):  # type: ignore[arg-type]
            object.__setattr__(self, f.name, freeze(getattr(self, f.name)))

    def __setstate__(self, state: Any) -> None:
        if isinstance(state, tuple):  # (dict state, slots state) for slotted classes
            state = {**(state[0] or {}), **(state[1] or {})}
        for name, value in state.items():
            object.__setattr__(self, name, freeze(value))

    def __eq__(self, other: object) -> bool:
        if type(other) is not type(self):
            return NotImplemented
        return all(
            _equal(getattr(self, f.name), getattr(other, f.name))
            for f in dataclasses.fields(self)  # type: ignore[arg-type]
            if f.compare
        )

    def __hash__(self) -> int:
        return hash(
            (
                type(self).__qualname__,
                *(
                    _hashable(getattr(self, f.name))
                    for f in dataclasses.fields(self)  # type: ignore[arg-type]
                    if f.compare
                ),
            )
        )
