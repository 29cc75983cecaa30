"""Physical quantities (pint) at the boundary of every guarded function.

Imported only when a call actually passes a quantity: :func:`masstransfer._validation.guard`
spots one by duck typing (a class carrying pint's ``_REGISTRY``, ``to`` and ``magnitude``)
without importing pint, and hands the call here.  Each function's units are read once, from
its numpydoc docstring, where every parameter already states its unit in brackets
(``T : float or array_like`` / ``Temperature [K].``) and the Returns section states the
result's.  Quantities are converted to those units (SI, or a method's stated nominal unit),
the function runs on plain numbers, and the result is wrapped in the Returns unit.  Plain
numbers passed alongside quantities keep their documented unit.
"""

from __future__ import annotations

import inspect
import re
import threading
from collections.abc import Callable
from dataclasses import dataclass
from typing import Any

from .errors import UnitError

__all__ = ["call_with_units", "field_units", "parse_unit"]

_NUMERIC = re.compile(r"\b(float|int|array_like)\b")
_BRACKET = re.compile(r"\[([^\]]+)\]")
#: Words that qualify a unit without being one ("J/(kg dry gas K)", "mg O2").
_QUALIFIERS = re.compile(r"\b(dry gas|dry air|O2|STP)\b")
#: Bracket texts that mean "whatever unit the caller uses" (shared between such arguments).
_FREE = re.compile(r"^(any unit|same unit|its unit|unit of (the inputs|\w+))$")
_SECTIONS = ("Parameters", "Returns", "Raises", "Notes", "References", "Examples", "Yields", "Attributes")


@dataclass(frozen=True)
class _Unit:
    """How one argument or result is read: a unit string, 'free', a named argument, or nothing."""

    kind: str  # "unit", "free", "named", "attr", "none"
    text: str = ""
    difference: bool = False  # "temperature difference [K]": an offset unit (degC) is refused


@dataclass(frozen=True)
class _Spec:
    """The units of one function: per parameter, for extra keywords, and for the result."""

    signature: inspect.Signature
    params: dict[str, _Unit]
    var_keyword: _Unit | None
    returns: tuple[_Unit, ...]
    returns_tuple: bool
    name: str


_SPECS: dict[Callable[..., Any], _Spec] = {}
_LOCK = threading.Lock()


def _section(doc: str, title: str) -> list[str]:
    lines = inspect.cleandoc(doc).splitlines()
    for i, line in enumerate(lines[:-1]):
        if line == title and set(lines[i + 1]) == {"-"}:
            out = []
            for body in lines[i + 2 :]:
                if body in _SECTIONS or (body and set(body) == {"-"}):
                    break
                out.append(body)
            while out and out[-1] in _SECTIONS:
                out.pop()
            return out
    return []


def _entries(lines: list[str]) -> list[tuple[str, str, str]]:
    """(names, type line, description) for each entry of a numpydoc list section."""
    out: list[tuple[str, str, str]] = []
    for line in lines:
        if line and not line.startswith(" "):
            names, _, kind = line.partition(" : ")
            out.append((names.strip(), kind.strip(), ""))
        elif out and line.strip():
            n, k, d = out[-1]
            out[-1] = (n, k, f"{d} {line.strip()}")
    return out


def _unit_of(text: str, names: set[str]) -> _Unit:
    """Classify the first bracketed unit of a description."""
    found = _BRACKET.findall(text)
    if not found:
        if "unit of the inputs" in text:
            return _Unit("free")
        if ":attr:`unit`" in text:
            return _Unit("attr", "unit")
        return _Unit("none")
    return _classify(found[0], names)


def _classify(raw: str, names: set[str]) -> _Unit:
    raw = raw.strip()
    if _FREE.match(raw):
        return _Unit("free")
    if raw in names:
        return _Unit("named", raw)
    return _Unit("unit", raw)


def _build(fn: Callable[..., Any]) -> _Spec:
    doc = inspect.getdoc(fn) or ""
    sig = inspect.signature(fn)
    names = set(sig.parameters)
    params: dict[str, _Unit] = {}
    var_kw: _Unit | None = None
    kinds = {p.name: p.kind for p in sig.parameters.values()}
    for raw_names, type_line, desc in _entries(_section(doc, "Parameters")):
        unit = _unit_of(desc, names) if _NUMERIC.search(type_line) else _Unit("none")
        if unit.kind == "unit" and "difference" in desc.split("[", 1)[0]:
            unit = _Unit("unit", unit.text, difference=True)
        for name in (n.strip().lstrip("*") for n in raw_names.split(",")):
            if kinds.get(name) is inspect.Parameter.VAR_KEYWORD:
                var_kw = unit
            elif name in names:
                params[name] = unit
    if not params:  # one-line docstrings: "Dynamic viscosity [Pa s] at ``T`` [K]."
        for name, raw in re.findall(r"``(\w+)`` \[([^\]]+)\]", doc):
            if name in names:
                params[name] = _classify(raw, names)
    returns: tuple[_Unit, ...]
    ret_lines = _section(doc, "Returns")
    entries = _entries(ret_lines)
    is_tuple = bool(entries) and entries[0][0].startswith("tuple")
    if entries:
        desc = entries[0][2]
        if is_tuple:
            found = _BRACKET.findall(desc)
            returns = tuple(_classify(u, names) for u in found) or (_Unit("none"),)
        else:
            returns = (_unit_of(desc, names),)
    else:  # one-line docstrings: the first bracket not attached to an argument
        summary = doc.split("\n\n", 1)[0]
        bare = re.sub(r"``\w+`` \[[^\]]+\]", "", summary)
        returns = (_unit_of(bare, names),)
    name = getattr(fn, "__qualname__", getattr(fn, "__name__", "function"))
    return _Spec(sig, params, var_kw, returns, is_tuple, name)


def _spec(fn: Callable[..., Any]) -> _Spec:
    spec = _SPECS.get(fn)
    if spec is None:
        spec = _build(fn)
        with _LOCK:
            _SPECS[fn] = spec
    return spec


def _is_quantity(value: Any) -> bool:
    t = type(value)
    return hasattr(t, "_REGISTRY") and hasattr(t, "to") and hasattr(t, "magnitude")


_PARSED: dict[tuple[int, str], Any] = {}


def parse_unit(registry: Any, text: str) -> Any:
    """Parse a docstring unit (``"W/(m^2 K)"``, ``"-"``, ``"mg O2"``) in ``registry`` (cached)."""
    key = (id(registry), text)
    unit = _PARSED.get(key)
    if unit is None or unit._REGISTRY is not registry:
        unit = _parse_unit(registry, text)
        if len(_PARSED) > 4096:
            _PARSED.clear()
        _PARSED[key] = unit
    return unit


def _parse_unit(registry: Any, text: str) -> Any:
    text = text.strip()
    if text == "-":
        return registry.dimensionless
    first = text.split(",", 1)[0].strip()
    tries = (first, _QUALIFIERS.sub("", first).strip(), first.split(" ", 1)[0])
    for candidate in tries:
        try:
            return registry.parse_units(candidate)
        except Exception:  # pint raises several unrelated classes for an unreadable unit
            continue
    raise UnitError(f"the documented unit [{text}] cannot be read by pint")


def _convert(spec: _Spec, name: str, unit: _Unit, q: Any, free: list[Any]) -> Any:
    """Return the magnitude of quantity ``q`` in the unit the function expects for ``name``."""
    reg = type(q)._REGISTRY
    given = _Given(q)
    if unit.kind == "unit":
        target = parse_unit(reg, unit.text)
        if q.dimensionality != target.dimensionality:
            raise UnitError(
                f"{spec.name}: {name} was given in {given} ({q.dimensionality}), which cannot be "
                f"converted to the expected unit {unit.text} ({target.dimensionality}); pass {name} "
                f"as a quantity with the dimension of {unit.text}"
            )
        if unit.difference and not getattr(q, "_is_multiplicative", True):
            raise UnitError(
                f"{spec.name}: {name} is a difference, but was given in {given}, a point on an offset "
                f"scale; pass it as a difference (e.g. delta_degC) or in {unit.text}"
            )
        return q.to(target).magnitude
    if unit.kind == "free":
        if not free:
            # the first such argument sets the unit; an offset unit (degC) is taken absolute
            free.append(q.units if getattr(q, "_is_multiplicative", True) else q.to_root_units().units)
        if q.dimensionality != free[0].dimensionality:
            raise UnitError(
                f"{spec.name}: {name} was given in {given}, which cannot be converted to "
                f"{free[0]:~}, the unit of the other arguments that share it; pass them in "
                "compatible units"
            )
        return q.to(free[0]).magnitude
    if unit.kind == "named":
        raise UnitError(
            f"{spec.name}: {name} was given as a quantity in {given}, but its unit is named by the "
            f"argument {unit.text}; pass {name} as a plain number in that unit"
        )
    raise UnitError(
        f"{spec.name}: {name} was given as a quantity in {given}, but it takes no unit; pass a plain value"
    )


class _Given:
    """The unit of a quantity as shown in a message, formatted only if a message is written."""

    def __init__(self, q: Any) -> None:
        self.q = q

    def __str__(self) -> str:
        return f"{self.q.units:~}" or "dimensionless"


def _wrap(value: Any, unit: _Unit, registry: Any, free: list[Any], owner: Any) -> Any:
    if value is None or isinstance(value, bool | str):
        return value
    if unit.kind == "unit":
        return registry.Quantity(value, parse_unit(registry, unit.text))
    if unit.kind == "free" and free:
        return registry.Quantity(value, free[0])
    if unit.kind == "attr" and owner is not None:
        return registry.Quantity(value, parse_unit(registry, str(getattr(owner, unit.text))))
    return value


def call_with_units(call: Callable[..., Any], fn: Callable[..., Any], args: Any, kwargs: Any) -> Any:
    """Run ``call`` (the guarded ``fn``) on magnitudes; wrap the result in the documented unit.

    Called by the guard only when at least one argument is a pint quantity.
    """
    spec = _spec(fn)
    try:
        bound = spec.signature.bind(*args, **kwargs)
    except TypeError:
        # let the function itself report the bad call
        return call(*[_strip(a) for a in args], **{k: _strip(v) for k, v in kwargs.items()})
    registry: Any = None
    free: list[Any] = []
    for name, value in list(bound.arguments.items()):
        param = spec.signature.parameters[name]
        if param.kind is inspect.Parameter.VAR_KEYWORD:
            extra = dict(value)
            for key, v in extra.items():
                if _is_quantity(v):
                    registry = registry or type(v)._REGISTRY
                    extra[key] = _convert(spec, key, spec.var_keyword or _Unit("none"), v, free)
            bound.arguments[name] = extra
        elif _is_quantity(value):
            registry = registry or type(value)._REGISTRY
            bound.arguments[name] = _convert(spec, name, spec.params.get(name, _Unit("none")), value, free)
    out = call(*bound.args, **bound.kwargs)
    if registry is None:
        return out
    owner = bound.arguments.get("self")
    if spec.returns_tuple and isinstance(out, tuple):
        units = spec.returns if len(spec.returns) == len(out) else (spec.returns[0],) * len(out)
        return tuple(_wrap(v, u, registry, free, owner) for v, u in zip(out, units, strict=True))
    if _is_plain_number(out):
        return _wrap(out, spec.returns[0], registry, free, owner)
    return out


def _strip(value: Any) -> Any:
    return value.magnitude if _is_quantity(value) else value


def _is_plain_number(value: Any) -> bool:
    import numpy as np

    return isinstance(value, float | int | np.ndarray | np.generic) and not isinstance(value, bool)


def field_units(cls: type) -> dict[str, str]:
    """Units of a result class's fields, read from its numpydoc Attributes section.

    An entry naming several fields (``T, P : ...  State [K], [Pa].``) gives them the bracketed
    units in order, or the single unit to all; with fewer units than fields the last unit
    covers the rest ("the groups [-]"); fields without a bracketed unit are left out.
    """
    doc = inspect.getdoc(cls) or ""
    out: dict[str, str] = {}
    for raw_names, _type_line, desc in _entries(_section(doc, "Attributes")):
        names = [n.strip() for n in raw_names.split(",")]
        found = [u for u in _BRACKET.findall(desc) if not _FREE.match(u.strip())]
        if len(found) == len(names):
            out.update(zip(names, found, strict=True))
        elif len(found) >= 1 and len(names) == 1:
            out[names[0]] = found[0]
        elif len(found) == 1:
            out.update(dict.fromkeys(names, found[0]))
        elif 1 < len(found) < len(names):  # "D, Pr, Sc : diffusivity [m^2/s] and the groups [-]"
            out.update(zip(names, found[:-1], strict=False))
            out.update(dict.fromkeys(names[len(found) - 1 :], found[-1]))
    return out
