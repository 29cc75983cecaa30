"""The packing record and the packing table."""

from __future__ import annotations

from collections.abc import Mapping
from dataclasses import dataclass
from types import MappingProxyType
from typing import Any, Final

from .._tables import PACKING_DATA
from .._validation import guard
from ..errors import InputTypeError, MissingConstantError, UnknownMethodError

__all__ = ["PACKINGS", "Packing", "packing"]


@dataclass(frozen=True)
class Packing:
    """A column packing: geometry, material and the constants each model needs.

    Attributes
    ----------
    name : str
        Table key, e.g. ``"pall-ring-metal-50"``.
    kind : str
        ``"random"`` (dumped) or ``"structured"``.
    nominal_size : float
        Nominal size [m] (ring diameter; crimp height for structured packings).
    material : str
        Material of the packing surface.
    a : float
        Specific (geometric) surface area [m^2/m^3].
    void_fraction : float
        Void fraction of the bed [-].
    sigma_c : float
        Critical surface tension of the material for Onda's wetted area [N/m].
    C_L, C_V, C_h, C_S : float or None
        Billet & Schultes constants for k_L, k_G, hydraulic area and the loading
        point (None where the table has none).
    S, B, h : float or None
        Corrugation side, base and crimp height of a structured packing [m].
    theta : float or None
        Flow-channel angle from the horizontal [deg].
    source : str
        Where every number of the row comes from.

    """

    name: str
    kind: str
    nominal_size: float
    material: str
    a: float
    void_fraction: float
    sigma_c: float
    source: str
    C_L: float | None = None
    C_V: float | None = None
    C_h: float | None = None
    C_S: float | None = None
    S: float | None = None
    B: float | None = None
    h: float | None = None
    theta: float | None = None

    @property
    def hydraulic_diameter(self) -> float:
        """Hydraulic diameter of the bed, 4 void_fraction / a [m]."""
        return 4.0 * self.void_fraction / self.a

    def need(self, constant: str, model: str) -> float:
        """Return a per-model constant, or raise naming what is missing and how to supply it."""
        value = getattr(self, constant)
        if value is None:
            raise MissingConstantError(
                f"packing {self.name!r} has no {constant} for {model}; build your own record with "
                f"dataclasses.replace(contactors.packing({self.name!r}), {constant}=...) from the "
                "manufacturer's or the authors' table"
            )
        return float(value)


def _build(name: str, row: Any) -> Packing:
    return Packing(name=name, **row)


#: Every packing of the table, keyed by name.
PACKINGS: Final[Mapping[str, Packing]] = MappingProxyType(
    {name: _build(name, row) for name, row in PACKING_DATA.items()}
)


@guard(check_output=False)
def packing(name: str) -> Packing:
    """Look up a packing of the table by name.

    Parameters
    ----------
    name : str
        Table key, e.g. ``"pall-ring-metal-50"`` (see :data:`PACKINGS`).

    Returns
    -------
    Packing
        The frozen record, with the source of every number.

    Notes
    -----
    The rows were transcribed without the tables at hand and say so in
    their ``source``; check them against the manufacturer's data sheet for
    the packing actually installed.

    References
    ----------
    Billet, R. & Schultes, M. (1999). Prediction of mass transfer columns with
    dumped and arranged packings. *Chem. Eng. Technol.* 22, 1-21.

    Examples
    --------
    >>> packing("pall-ring-metal-50").a
    112.6

    """
    if not isinstance(name, str):
        raise InputTypeError(f"name={name!r} is a {type(name).__name__}, not a packing name; pass a string")
    try:
        return PACKINGS[name]
    except KeyError:
        raise UnknownMethodError(
            f"name={name!r} is not a packing of the table; accepted: {', '.join(PACKINGS)}; "
            "or build a contactors.Packing yourself"
        ) from None
