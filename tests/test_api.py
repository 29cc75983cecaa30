"""The public surface: a small top level, one public path per function, light imports."""

from __future__ import annotations

import importlib
import inspect
import subprocess
import sys

import pytest

import masstransfer as mt

SUBPACKAGES = (
    "substances",
    "diffusivity",
    "surface",
    "bodies",
    "contactors",
    "humidity",
    "sweep",
    "testing",
    "constants",
    "errors",
)


def _public_paths() -> dict[int, list[str]]:
    paths: dict[int, list[str]] = {}
    for modname in ("", *SUBPACKAGES):
        mod = importlib.import_module("masstransfer" + (f".{modname}" if modname else ""))
        for name in mod.__all__:
            obj = getattr(mod, name)
            if inspect.isfunction(obj) or inspect.isclass(obj):
                paths.setdefault(id(obj), []).append(f"{mod.__name__}.{name}")
    return paths


def test_top_level_is_small():
    assert len(mt.__all__) <= 30
    assert set(mt.__all__) == {n for n in dir(mt) if not n.startswith("_")} | {"__version__"}


def test_every_public_function_and_class_has_one_public_path():
    # the two bases are at the top by design and in errors, which lists the whole family
    bases = {"MassTransferError", "MassTransferWarning"}
    doubles = [p for p in _public_paths().values() if len(p) > 1 and p[0].split(".")[-1] not in bases]
    assert doubles == []


def test_everything_listed_exists_and_nothing_private_leaks():
    for modname in SUBPACKAGES:
        mod = importlib.import_module(f"masstransfer.{modname}")
        assert all(not n.startswith("_") for n in mod.__all__), modname
        for name in mod.__all__:
            getattr(mod, name)


@pytest.mark.parametrize("modname", [*SUBPACKAGES, "units"])
def test_each_subpackage_shows_only_its_listed_names(modname):
    # dir() (and tab completion) shows what __all__ lists: no "annotations" from the __future__
    # import, no imported helpers, no private submodules
    mod = importlib.import_module(f"masstransfer.{modname}")
    shown = {n for n in dir(mod) if not n.startswith("_")}
    assert shown == set(mod.__all__)
    assert "annotations" not in shown


def test_import_loads_no_database_scipy_or_hypothesis():
    code = (
        "import sys, masstransfer\n"
        "heavy = [m for m in ('thermo', 'chemicals', 'scipy', 'hypothesis') if m in sys.modules]\n"
        "print(','.join(heavy))"
    )
    out = subprocess.run([sys.executable, "-c", code], capture_output=True, text=True, check=True)
    assert out.stdout.strip() == ""


def test_version_is_defined_once():
    from importlib.metadata import version

    assert mt.__version__ == version("masstransfer")
