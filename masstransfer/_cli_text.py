"""Words and number formats the command line's subcommands share.

The safety caution is defined here once, in the wording of the documentation's front page, and
every subcommand prints it (a ``Caution:`` line in text, a ``"caution"`` field in JSON).
"""

from __future__ import annotations

import math

__all__ = ["CAUTION", "caution", "caution_line", "pressure", "value_spread"]

#: The usual caution, as on the documentation's front page (docs/index.md).
CAUTION = (
    "Every number is an estimate from a published correlation. Designs that affect safety (toxic "
    "or flammable vapour, oxygen reaching food, pressure equipment) must be checked against "
    "measured data, local codes and licensed engineering practice."
)


def caution(*specific: str) -> str:
    """Return the caution of one output: its own sentences first, then the usual caution."""
    return " ".join((*specific, CAUTION))


def caution_line(*specific: str) -> str:
    """Return the caution as the last line of a text output."""
    return "Caution: " + caution(*specific)


def pressure(P: float) -> str:
    """Return a pressure in Pa, kPa or MPa, whichever reads best (``101.325 kPa``, ``5 MPa``)."""
    if abs(P) >= 1e6:
        return f"{P / 1e6:.6g} MPa"
    if abs(P) >= 1e3:
        return f"{P / 1e3:.6g} kPa"
    return f"{P:.6g} Pa"


def value_spread(value: float, spread: float) -> str:
    """Return ``value ± spread``: the spread to two significant figures, the value to its last place.

    Fixed-point notation for magnitudes from 1e-3 to 1e5, otherwise both in scientific notation
    (``1.599e-05 ± 9.6e-07``, ``0.478 ± 0.031``).
    """
    s = abs(spread)
    if not (math.isfinite(s) and s > 0.0 and math.isfinite(value)):
        return f"{value:.4e}"
    last = math.floor(math.log10(s)) - 1  # decimal exponent of the spread's second figure
    if round(s, -last) >= 10.0 ** (last + 2):  # 9.96 rounds to 10: one place coarser
        last += 1
    big = max(abs(value), s)
    if 1e-3 <= big < 1e5:
        places = max(0, -last)
        return f"{round(value, -last):.{places}f} ± {round(s, -last):.{places}f}"
    exponent = math.floor(math.log10(big))
    return f"{value:.{max(0, exponent - last)}e} ± {s:.1e}"
