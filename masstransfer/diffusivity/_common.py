"""Small helpers shared by the diffusivity modules."""

from __future__ import annotations

import difflib
from collections.abc import Iterable

from ..errors import InputTypeError, UnknownMethodError

__all__ = ["normalise_method"]


def normalise_method(method: str, accepted: Iterable[str], argument: str = "method") -> str:
    """Map ``method`` to its canonical name (case, '_' and ' ' are ignored)."""
    names = list(accepted)
    if not isinstance(method, str):
        raise InputTypeError(
            f"{argument}={method!r} is a {type(method).__name__}, not a method name; "
            f"choose one of {', '.join(names)}"
        )
    key = method.strip().lower().replace("_", "-").replace(" ", "-")
    if key in names:
        return key
    close = difflib.get_close_matches(key, names, n=3)
    hint = f" (did you mean {' or '.join(repr(c) for c in close)}?)" if close else ""
    raise UnknownMethodError(
        f"{argument}={method!r} is not a known method{hint}; choose one of {', '.join(names)}"
    )
