"""Substances: species identity and constants, and their property models over temperature.

This subpackage is the only door to ``thermo`` and ``chemicals``; both are imported inside
functions, on first use.  The entry points :func:`masstransfer.species`,
:class:`masstransfer.Species`, :func:`masstransfer.gas_model` and
:func:`masstransfer.liquid_model` live at the top level; the rest is here.
"""

from __future__ import annotations

from ._properties import (
    INTERPOLATION_RTOL,
    JOIN_RTOL,
    JOIN_WINDOW,
    KINK_RTOL,
    LIQUID_TR_MAX,
    PARACHOR_CGS_PER_SI,
    PropertyCurve,
    henry_constant,
    parachor,
    quayle_parachor,
)
from ._species import Origin, le_bas_volume

__all__ = [
    "INTERPOLATION_RTOL",
    "JOIN_RTOL",
    "JOIN_WINDOW",
    "KINK_RTOL",
    "LIQUID_TR_MAX",
    "PARACHOR_CGS_PER_SI",
    "Origin",
    "PropertyCurve",
    "henry_constant",
    "le_bas_volume",
    "parachor",
    "quayle_parachor",
]


def __dir__() -> list[str]:
    return sorted([*__all__, "__all__"])  # documentation tools look for __all__ in dir()
