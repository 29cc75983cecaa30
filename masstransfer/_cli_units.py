"""Command line: values with units in, columns in the units asked for out, and ± values.

Installed on the parser by one call in :mod:`masstransfer.cli`.  A plain number is read in the
option's SI unit, as before; a number with a unit (``-T "60 degC"``, ``-P "2 bar"``,
``--h "0.035 kW/(m^2 K)"``) is converted by pint (needed only then).  ``--units
"T=degC,D=cm^2/s"`` shows those table columns in those units; with ``--json`` the SI fields
stay as they are and a ``"converted"`` object is added.
"""

from __future__ import annotations

import argparse
import contextvars
import json
import math
import re
from collections.abc import Callable, Sequence
from typing import Any

from ._cli_text import value_spread
from .errors import MissingDependencyError, UnitError

__all__ = ["begin", "convert_json", "convert_table", "install", "plus_minus"]

#: Options that take a physical value: option dest -> SI unit read for a plain number.
_VALUE_OPTIONS = {
    "temperature": "K",
    "pressure": "Pa",
    "h": "W/(m^2 K)",
    "kc": "m/s",
    "rh": "dimensionless",
    "dew_point": "K",
    "radiant_temperature": "K",
    "velocity": "m/s",
    "length": "m",
    "conduction_coefficient": "W/(m^2 K)",
}
#: An example of a value with a unit, per SI unit, for the options' help.
_EXAMPLES = {
    "K": "'60 degC'",
    "Pa": "'2 bar'",
    "W/(m^2 K)": "'5 Btu/(h ft^2 degF)'",
    "m/s": "'12 mm/s'",
    "dimensionless": "'45 %%'",  # '%%' is one '%' in argparse help
    "m": "'50 mm'",
}
#: JSON fields with their quantity name and SI unit, for ``"converted"``.
_JSON_FIELDS = {
    "T_K": ("T", "K"),
    "P_Pa": ("P", "Pa"),
    "D_m2_per_s": ("D", "m^2/s"),
    "h_W_per_m2K": ("h", "W/(m^2 K)"),
    "k_c_m_per_s": ("k_c", "m/s"),
    "k_G_mol_per_m2sPa": ("k_G", "mol/(m^2 s Pa)"),
    "k_y_mol_per_m2s": ("k_y", "mol/(m^2 s)"),
    "k_x_mol_per_m2s": ("k_x", "mol/(m^2 s)"),
    "rho_kg_per_m3": ("rho", "kg/m^3"),
    "cp_J_per_kgK": ("cp", "J/(kg K)"),
    "wet_bulb_K": ("T_wb", "K"),
    "adiabatic_saturation_K": ("T_as", "K"),
}
_NUMBER = re.compile(r"^\s*[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?")
_HEADER = re.compile(r"^(\S+) \[(.+)\]$")
_REQUESTED: contextvars.ContextVar[dict[str, str] | None] = contextvars.ContextVar(
    "masstransfer_cli_units", default=None
)
#: Below this, a temperature given without a unit is more likely degrees Celsius than kelvin [K].
_LOW_KELVIN = 200.0
_BARE_LOW_T: contextvars.ContextVar[tuple[tuple[str, float], ...]] = contextvars.ContextVar(
    "masstransfer_cli_bare_low_T", default=()
)
_INSTALL = (
    "values with units need pint: pip install pint (or install the package with its units extra: "
    "pip install 'masstransfer[units]')"
)
#: Unit spellings that mean a temperature to a reader but something else to pint:
#: spelling -> (what pint reads, the spelling meant).
_TEMPERATURE_SLIPS = {
    "C": ("the coulomb", "degC"),
    "F": ("the farad", "degF"),
    "deg C": ("degree times coulomb", "degC"),
    "deg F": ("degree times farad", "degF"),
}


def _registry() -> Any:
    try:
        import pint
    except ImportError:
        raise argparse.ArgumentTypeError(_INSTALL) from None
    return pint.get_application_registry()  # type: ignore[no-untyped-call]


def _reader(si_unit: str, option: str = "") -> Callable[[str], float]:
    """Build an argparse ``type``: a plain number in ``si_unit``, or a number with any compatible unit."""

    def read(text: str) -> float:
        try:
            value = float(text)
        except ValueError:
            pass
        else:
            if si_unit == "K" and value < _LOW_KELVIN:  # kept for the hint if the input is refused
                _BARE_LOW_T.set((*_BARE_LOW_T.get(), (option, value)))
            return value
        m = _NUMBER.match(text)
        if m is None:
            raise argparse.ArgumentTypeError(
                f"{text!r} is not a number or a number with a unit (e.g. '60 degC', '2 bar')"
            )
        reg = _registry()
        unit = text[m.end() :].strip().replace("%", "percent")
        if si_unit == "K" and unit in _TEMPERATURE_SLIPS:
            meaning, right = _TEMPERATURE_SLIPS[unit]
            raise argparse.ArgumentTypeError(
                f"{text!r}: the unit {unit!r} means {meaning}, not a temperature; "
                f"write '{m.group(0).strip()} {right}'"
            )
        try:
            q = reg.Quantity(float(m.group(0)), reg.parse_units(unit))
            return float(q.to(si_unit).magnitude)
        except Exception as exc:  # pint's parse and dimensionality errors have no common base
            raise argparse.ArgumentTypeError(
                f"{text!r} cannot be read as a value in a unit of {si_unit} ({exc})"
            ) from None

    read.__name__ = f"value in {si_unit}"
    return read


def _requested(text: str) -> dict[str, str]:
    out: dict[str, str] = {}
    for part in text.split(","):
        name, sep, unit = part.partition("=")
        if not sep or not name.strip() or not unit.strip():
            raise argparse.ArgumentTypeError(f"{part!r} is not NAME=UNIT (e.g. T=degC,D=cm^2/s)")
        out[name.strip()] = unit.strip()
    return out


def _subparsers(parser: argparse.ArgumentParser) -> list[argparse.ArgumentParser]:
    found: list[argparse.ArgumentParser] = []
    for action in parser._actions:
        if isinstance(action, argparse._SubParsersAction):
            found.extend(action.choices.values())
    return found


def install(parser: argparse.ArgumentParser) -> None:
    """Let value options take units; add ``--units`` and, for coefficients, ``--uncertainty``."""
    for sub in _subparsers(parser):
        takes_values = False
        for action in sub._actions:
            unit = _VALUE_OPTIONS.get(action.dest)
            if unit is not None and action.type is float:
                option = action.option_strings[0] if action.option_strings else action.dest
                action.type = _reader(unit, option)
                takes_values = True
                if action.help:
                    action.help += f" (or with a unit, e.g. {_EXAMPLES[unit]})"
        if takes_values:
            sub.add_argument(
                "--units",
                type=_requested,
                default={},
                metavar="NAME=UNIT,...",
                help="show these columns in these units, e.g. 'T=degC,D=cm^2/s,k_c=mm/s' (needs pint)",
            )
        if any(a.dest == "kc" for a in sub._actions):
            sub.add_argument(
                "--uncertainty",
                type=float,
                default=0.0,
                metavar="FRACTION",
                help="relative standard uncertainty of the given h or k_c (0.1 for 10 %%)",
            )


def start() -> None:
    """Forget the values read by an earlier run in this thread (call before parsing)."""
    _BARE_LOW_T.set(())


def kelvin_hint() -> str:
    """Return a hint for a refused input when a temperature was given as a bare number below 200 K.

    The hint leads the error message: the likelier mistake is the unit, not what was refused.
    """
    low = _BARE_LOW_T.get()
    if not low:
        return ""
    option, t = low[0]
    return f"{_kelvin_words(option, t)}. Read as {t:g} K, the input is refused: "


def kelvin_caution() -> str:
    """Return a caution for an accepted run in which a temperature was a bare number below 200 K."""
    return "; ".join(_kelvin_words(option, t) for option, t in _BARE_LOW_T.get())


def _kelvin_words(option: str, t: float) -> str:
    return (
        f"{option} {t:g} without a unit is read as {t:g} K; for {t:g} degrees Celsius write "
        f"{option} '{t:g} degC' or {option} {t + 273.15:g}"
    )


def begin(args: argparse.Namespace) -> None:
    """Record the output units asked for in this run (none by default)."""
    _REQUESTED.set(getattr(args, "units", None) or {})


def _output_registry() -> Any:
    try:
        import pint
    except ImportError:
        raise MissingDependencyError(f"--units: {_INSTALL}") from None
    return pint.get_application_registry()  # type: ignore[no-untyped-call]


def _convert(values: Sequence[float], unit: str, target: str) -> list[float]:
    reg = _output_registry()
    try:
        q = reg.Quantity(list(values), reg.parse_units(unit)).to(target)
    except Exception as exc:  # pint's parse and dimensionality errors have no common base
        raise UnitError(f"--units: cannot show {unit} in {target} ({exc})") from None
    return [float(v) for v in q.magnitude]


def convert_table(header: list[str], rows: list[list[str]]) -> tuple[list[str], list[list[str]]]:
    """Show each requested column (header ``NAME [unit]``) in the unit asked for."""
    requested = dict(_REQUESTED.get() or {})
    if not requested:
        return header, rows
    header, rows = list(header), [list(r) for r in rows]
    done: set[str] = set()
    drop: list[int] = []
    for i, title in enumerate(header):
        m = _HEADER.match(title)
        if m is not None and m.group(1) in done:  # the same quantity in another unit: shown once
            drop.append(i)
            continue
        if m is None or m.group(1) not in requested:
            continue
        name, unit = m.groups()
        target = requested.pop(name)
        done.add(name)
        cells = [r[i].split(" ± ") for r in rows]
        values = _convert([float(c[0]) for c in cells], unit, target)
        spreads = [float(c[1]) if len(c) > 1 else None for c in cells]
        conv_spreads = _convert([s or 0.0 for s in spreads], _delta(unit), _delta(target))
        for r, v, s, cs in zip(rows, values, spreads, conv_spreads, strict=True):
            r[i] = f"{v:.4g}" if s is None else value_spread(v, cs)
        header[i] = f"{name} [{target}]"
    header = [h for i, h in enumerate(header) if i not in drop]
    rows = [[c for i, c in enumerate(r) if i not in drop] for r in rows]
    if requested:
        names = ", ".join(sorted(requested))
        raise UnitError(f"--units: no column named {names} in this output; name one shown in its header")
    return header, rows


def _delta(unit: str) -> str:
    """Name the difference unit of an offset unit: a ± of 1 degC is 1 K, not 274 K."""
    return {"degC": "delta_degC", "degF": "delta_degF"}.get(unit, unit)


def convert_json(text: str) -> str:
    """Add a ``"converted"`` object with the requested fields in the requested units."""
    requested = _REQUESTED.get() or {}
    if not requested:
        return text
    data = json.loads(text)
    if not isinstance(data, dict):
        return text
    converted: dict[str, Any] = {}
    for key, (name, unit) in _JSON_FIELDS.items():
        if name in requested and data.get(key) is not None:
            value = data[key]
            values = value if isinstance(value, list) else [value]
            got = _convert([float(v) for v in values], unit, requested[name])
            converted[name] = {"unit": requested[name], "values": got}
    missing = sorted(set(requested) - set(converted))
    if missing:
        raise UnitError(f"--units: no field named {', '.join(missing)} in this output; name one it shows")
    data["converted"] = converted
    return json.dumps(data, indent=2)


def plus_minus(value: float, relative: float | None, digits: str = ".4e") -> str:
    """``value ± one standard deviation`` (the value alone, in ``digits``, when it is unknown).

    The spread has two significant figures and the value is shown to the same decimal place.
    """
    if relative is None or not math.isfinite(relative) or relative == 0.0:
        return format(value, digits)
    return value_spread(value, abs(value) * relative)
