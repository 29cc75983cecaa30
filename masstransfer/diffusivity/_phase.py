r"""Phase checks: is the medium a vapour (gas methods) or a liquid (liquid methods) at T and P.

The check needs only the medium's normal boiling point, critical point and melting point, so it
costs no property model: the vapour pressure is taken from the Clausius-Clapeyron equation
integrated through the normal boiling point and the critical point,

.. math:: \ln p^{sat} = \ln P_c - B\left(\frac{1}{T} - \frac{1}{T_c}\right),
    \qquad B = \frac{\ln(P_c / P_{atm})}{1/T_b - 1/T_c}

(Poling, Prausnitz & O'Connell 2001, Section 7-2, from memory), exact at both points and within
about 30 % between the triple point and the boiling point; a state within :data:`MARGIN` of the
estimated saturation line is accepted in either phase.
"""

from __future__ import annotations

import math
from dataclasses import dataclass
from typing import Final, Literal

import numpy as np

from .._typing import FloatOrArray
from ..constants import ATM
from ..errors import OutOfRangeError
from ..substances._species import Species

__all__ = ["MARGIN", "PhaseLimits", "medium_state", "phase_limits"]

#: Relative band around the estimated vapour pressure in which either phase is accepted [-].
MARGIN: Final = 0.3


@dataclass(frozen=True)
class PhaseLimits:
    """What the phase check knows of a medium: Tb, Tc, Pc, Tm (K, Pa; None if unknown)."""

    name: str
    Tb: float | None
    Tc: float | None
    Pc: float | None
    Tm: float | None

    @property
    def known(self) -> bool:
        """Whether the vapour pressure can be estimated (Tb, Tc and Pc known, Tb < Tc)."""
        return self.Tb is not None and self.Tc is not None and self.Pc is not None and self.Tb < self.Tc

    def vapour_pressure(self, T: FloatOrArray) -> FloatOrArray:
        """Estimated vapour pressure [Pa] below Tc (see the module notes)."""
        assert self.Tb is not None
        assert self.Tc is not None
        assert self.Pc is not None
        B = math.log(self.Pc / ATM) / (1.0 / self.Tb - 1.0 / self.Tc)
        if isinstance(T, float):
            return self.Pc * math.exp(-B * (1.0 / T - 1.0 / self.Tc))
        return self.Pc * np.exp(-B * (1.0 / np.asarray(T) - 1.0 / self.Tc))


def phase_limits(sp: Species) -> PhaseLimits:
    """Return the constants of ``sp`` the phase check reads."""
    return PhaseLimits(sp.name, sp.Tb, sp.Tc, sp.Pc, sp.Tm)


def medium_state(
    lim: PhaseLimits, T: FloatOrArray, P: FloatOrArray
) -> Literal["gas", "liquid", "either", "unknown"]:
    """Phase of the medium at every (T, P): 'gas', 'liquid', 'either' (near saturation or mixed).

    'unknown' when the medium's Tb, Tc or Pc is missing.
    """
    if not lim.known:
        return "unknown"
    assert lim.Tc is not None
    Ta = np.asarray(T, dtype=float)
    Pa = np.asarray(P, dtype=float)
    Ta, Pa = np.broadcast_arrays(Ta, Pa)
    below = Ta < lim.Tc
    psat = np.where(below, lim.vapour_pressure(np.where(below, Ta, lim.Tc)), np.inf)
    gas = psat >= Pa * (1.0 + MARGIN)
    liquid = below & (psat <= Pa / (1.0 + MARGIN))
    if lim.Tm is not None:
        liquid &= Ta > lim.Tm
    if bool(np.all(gas)):
        return "gas"
    if bool(np.all(liquid)):
        return "liquid"
    return "either"


def check_vapour(lim: PhaseLimits, T: FloatOrArray, P: FloatOrArray, solute: str) -> None:
    """Raise :class:`OutOfRangeError` where the medium is clearly not a vapour at (T, P)."""
    if not lim.known:
        return
    assert lim.Tc is not None
    Ta, Pa = np.broadcast_arrays(np.asarray(T, dtype=float), np.asarray(P, dtype=float))
    below = Ta < lim.Tc
    if not bool(np.any(below)):
        return
    psat = np.asarray(lim.vapour_pressure(np.where(below, Ta, lim.Tc)))
    condensed = below & (psat * (1.0 + MARGIN) < Pa)
    if bool(np.any(condensed)):
        i = int(np.argmax(condensed.ravel()))
        t, p, ps = float(Ta.ravel()[i]), float(Pa.ravel()[i]), float(psat.ravel()[i])
        raise OutOfRangeError(
            f"medium {lim.name!r} is not a vapour at T={t:g} K and P={p:g} Pa (its vapour pressure, "
            f"estimated from its boiling and critical points, is roughly {ps:.2g} Pa there, below P), "
            "so a gas-phase diffusivity does not apply; for "
            f"{solute!r} dissolved in liquid {lim.name!r} use masstransfer.liquid_diffusivity, or "
            "raise T or lower P for the vapour"
        )


def check_liquid(lim: PhaseLimits, T: FloatOrArray, P: FloatOrArray, solute: str) -> None:
    """Raise :class:`OutOfRangeError` where the solvent is clearly not a liquid at (T, P)."""
    Ta, Pa = np.broadcast_arrays(np.asarray(T, dtype=float), np.asarray(P, dtype=float))
    if lim.Tm is not None and bool(np.any(Ta <= lim.Tm * (1.0 - 0.01))):
        t = float(Ta.min())
        raise OutOfRangeError(
            f"solvent {lim.name!r} is frozen at T={t:g} K (melting point {lim.Tm:g} K), so a liquid "
            "diffusivity does not apply; raise T above the melting point"
        )
    if not lim.known:
        return
    assert lim.Tc is not None
    if bool(np.any(Ta >= lim.Tc)):
        raise OutOfRangeError(
            f"solvent {lim.name!r} is supercritical at T={float(Ta.max()):g} K (critical temperature "
            f"{lim.Tc:g} K), so a liquid diffusivity does not apply; for {solute!r} in "
            f"{lim.name!r} vapour use masstransfer.gas_diffusivity"
        )
    psat = np.asarray(lim.vapour_pressure(Ta))
    boiling = psat > Pa * (1.0 + MARGIN)
    if bool(np.any(boiling)):
        i = int(np.argmax(boiling.ravel()))
        t, p, ps = float(Ta.ravel()[i]), float(Pa.ravel()[i]), float(psat.ravel()[i])
        raise OutOfRangeError(
            f"solvent {lim.name!r} boils at T={t:g} K and P={p:g} Pa (its vapour pressure, estimated "
            f"from its boiling and critical points, is roughly {ps:.2g} Pa there), so a liquid "
            "diffusivity does not apply; pass the system pressure "
            f"P= if the liquid is held under pressure, or use masstransfer.gas_diffusivity for "
            f"{solute!r} in {lim.name!r} vapour"
        )
