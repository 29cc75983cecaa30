"""Small helpers shared by the diffusivity modules."""

from __future__ import annotations

import difflib
from collections.abc import Iterable

from ..errors import InputTypeError, UnknownMethodError

__all__ = ["normalise_method"]

_OTHER = {"gas": "liquid", "liquid": "gas"}


def _other_phase_names(phase: str) -> tuple[str, ...]:
    """Return the method names of the other phase (read from the records, imported on demand)."""
    if phase == "gas":
        from ._liquid import LIQUID_METHODS

        return tuple(LIQUID_METHODS)
    from ._gas import GAS_METHODS

    return tuple(GAS_METHODS)


def normalise_method(
    method: str, accepted: Iterable[str], argument: str = "method", phase: str | None = None
) -> str:
    """Map ``method`` to its canonical name (case, '_' and ' ' are ignored).

    ``phase`` ('gas' or 'liquid'), when given, lets the error name a method of the other phase
    as such, with the function (and command-line option) that takes it.
    """
    names = list(accepted)
    if not isinstance(method, str):
        hint = ""
        if phase == "liquid" and isinstance(method, int | float) and not isinstance(method, bool):
            hint = (
                "; a number here is usually a pressure: liquid_diffusivity takes P only by "
                f"keyword, as P={method!r}"
            )
        raise InputTypeError(
            f"{argument}={method!r} is a {type(method).__name__}, not a method name{hint}; "
            f"choose one of {', '.join(names)}"
        )
    key = method.strip().lower().replace("_", "-").replace(" ", "-")
    if key in names:
        return key
    if phase in _OTHER and key in _other_phase_names(phase):
        other = _OTHER[phase]
        raise UnknownMethodError(
            f"{argument}={method!r} is a {other} method, not a {phase} one; for a {other} medium "
            f"use masstransfer.{other}_diffusivity; the {phase} methods are {', '.join(names)}"
        )
    close = difflib.get_close_matches(key, names, n=3)
    hint = f" (did you mean {' or '.join(repr(c) for c in close)}?)" if close else ""
    raise UnknownMethodError(
        f"{argument}={method!r} is not a known method{hint}; choose one of {', '.join(names)}"
    )
