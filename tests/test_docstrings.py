"""Every public function documents each parameter, with units, and cites its sources."""

from __future__ import annotations

import importlib
import inspect
import pkgutil
import re

import pytest

import masstransfer as mt

# every public module of the package (names without a leading underscore), found, not listed
_MODULES = [mt] + [
    importlib.import_module(info.name)
    for info in pkgutil.walk_packages(mt.__path__, prefix="masstransfer.")
    if not any(part.startswith("_") for part in info.name.split("."))
]
_UNIT = re.compile(r"\[[^\]]+\]")


def _public_functions():
    seen = {}
    for mod in _MODULES:
        for name in getattr(mod, "__all__", []):
            obj = getattr(mod, name)
            if inspect.isfunction(obj) and obj.__module__.startswith("masstransfer"):
                seen[f"{obj.__module__}.{obj.__name__}"] = obj
    return sorted(seen.items())


_FUNCS = _public_functions()


def _documented_params(doc: str) -> dict[str, str]:
    text = inspect.cleandoc(doc)
    lines = text.splitlines()
    params: dict[str, str] = {}
    try:
        start = lines.index("Parameters") + 2
    except ValueError:
        return params
    current = None
    for line in lines[start:]:
        if line and not line.startswith(" "):
            if set(line) == {"-"}:
                break
            m = re.match(r"^\*{0,2}(\w+)(?: : (.*))?$", line)
            if m is None:
                break
            current = m.group(1)
            params[current] = m.group(2) or ""
        elif current is not None:
            params[current] += "\n" + line.strip()  # first line: the type; then the description
    # the next section header was captured as a parameter name; drop it
    for header in ("Returns", "Raises", "Notes", "References", "Examples", "Yields", "Attributes"):
        params.pop(header, None)
    return params


def test_there_are_public_functions():
    assert len(_FUNCS) >= 25


@pytest.mark.parametrize(("qualname", "func"), _FUNCS, ids=[q for q, _ in _FUNCS])
def test_docstring_matches_signature_and_has_units(qualname, func):
    doc = inspect.getdoc(func)
    assert doc, f"{qualname} has no docstring"
    sig = inspect.signature(func)
    names = [p for p in sig.parameters if p not in ("self", "cls")]
    documented = _documented_params(doc)
    assert set(documented) == set(names), f"{qualname}: documented {sorted(documented)} vs {names}"
    for name, text in documented.items():
        type_line = text.split("\n", 1)[0]
        numeric = bool(re.search(r"\b(float|int|array_like)\b", type_line))
        if numeric:
            assert _UNIT.search(text), f"{qualname}: parameter {name} has no [unit]"
    assert "\nReferences\n----------" in doc, f"{qualname} has no References section"
    assert "\nExamples\n--------" in doc, f"{qualname} has no Examples section"
    assert "\nReturns\n-------" in doc, f"{qualname} has no Returns section"
