"""A diffusivity with the statement behind it: method, accuracy, constants and their sources."""

from __future__ import annotations

import warnings
from collections.abc import Mapping
from dataclasses import dataclass
from typing import Literal

from .._frozen import FrozenMapping, FrozenResult
from .._typing import ArrayLike, FloatOrArray
from .._uncertainty import stated_uncertainty
from .._validation import check_positive, guard
from ..errors import InputValueError
from ..substances._species import Species, species
from ._common import normalise_method
from ._gas import GAS_METHODS, fuller_volume, gas_diffusivity
from ._liquid import LIQUID_METHODS, liquid_diffusivity, liquid_diffusivity_inputs

__all__ = ["DiffusivityReport", "diffusivity_report"]

_GAS_CONSTANTS = {
    "fuller": ("molar_mass", "fuller_volume"),
    "chapman-enskog": ("molar_mass", "sigma", "epsilon_k"),
    "wilke-lee": ("molar_mass", "sigma", "epsilon_k", "Tb", "Vb"),
    "brokaw": ("molar_mass", "Tb", "Vb", "dipole"),
}


@dataclass(frozen=True, eq=False)
class DiffusivityReport(FrozenResult):
    """A diffusivity and what it rests on.

    Attributes
    ----------
    value : float or numpy.ndarray
        Diffusivity [m^2/s].
    solute, medium, phase, method : str
        What was computed, and how.
    T : float or numpy.ndarray
        Temperature [K].
    P : float or numpy.ndarray or None
        Pressure [Pa] (gas phase).
    accuracy : str
        The typical error the method's sources report.
    constants : mapping
        For each species, the constants the method used, as (value, source).
    notes : tuple of str
        Special-case rules applied (liquids).
    warnings : tuple of str
        Envelope warnings raised by the computation.
    solute_identity, medium_identity : str
        The resolved substances: name, CAS number, formula and molar mass.
    relative_uncertainty : float or None
        Relative standard uncertainty of ``value`` [-] (one standard deviation,
        as a fraction), from the method's stated accuracy: an average absolute
        deviation times sqrt(pi/2), about 1.25 (normal errors); None where the
        method states no number.

    """

    value: FloatOrArray
    solute: str
    medium: str
    phase: str
    method: str
    T: FloatOrArray
    P: FloatOrArray | None
    accuracy: str
    constants: Mapping[str, Mapping[str, tuple[float | None, str]]]
    notes: tuple[str, ...]
    warnings: tuple[str, ...]
    solute_identity: str = ""
    medium_identity: str = ""
    relative_uncertainty: float | None = None

    def summary(self) -> str:
        """Render a short plain-text statement for a calculation note.

        Returns
        -------
        str
            Several lines: value, method and accuracy, constants with sources,
            notes and warnings, and the standing caution.

        References
        ----------
        See the method's entry in ``GAS_METHODS`` or ``LIQUID_METHODS``.

        Examples
        --------
        >>> "Fuller" in diffusivity_report("water", "air", 300.0).summary()
        True

        """
        import numpy as np

        v = np.atleast_1d(np.asarray(self.value, dtype=float))
        shown = f"{v[0]:.4g} m^2/s" if v.size == 1 else f"{v.min():.4g} to {v.max():.4g} m^2/s"
        lines = [
            f"D({self.solute} in {self.medium}, {self.phase}) = {shown}",
            f"method: {self.accuracy}",
            *(
                f"{who}: {ident}"
                for who, ident in (("solute", self.solute_identity), ("medium", self.medium_identity))
                if ident
            ),
            *(
                []
                if self.relative_uncertainty is None
                else [f"relative standard uncertainty: ±{100 * self.relative_uncertainty:.1f} % (1 sigma)"]
            ),
            "constants used (SI units) and their sources:",
        ]
        for who, consts in self.constants.items():
            for name, (val, src) in consts.items():
                lines.append(f"  {who}.{name} = {val!r} ({src})")
        lines += [f"note: {n}" for n in self.notes]
        lines += [f"warning: {w}" for w in self.warnings]
        lines.append("An estimate: check safety-relevant designs against measured data.")
        return "\n".join(lines)


def _constants(sp: Species, names: tuple[str, ...]) -> dict[str, tuple[float | None, str]]:
    out: dict[str, tuple[float | None, str]] = {}
    for n in names:
        if n == "fuller_volume":
            src = sp.sources.get("fuller_volume", "Fuller et al. (1969) atomic and ring increments")
            out[n] = (fuller_volume(sp), src)
        else:
            v = getattr(sp, n)
            out[n] = (
                None if v is None else float(v),
                sp.sources.get(n, "user" if v is not None else "absent"),
            )
    return out


@guard
def diffusivity_report(
    solute: str | Species,
    medium: str | Species,
    T: ArrayLike,
    P: ArrayLike = 101325.0,
    *,
    phase: Literal["gas", "liquid"] = "gas",
    method: str | None = None,
) -> DiffusivityReport:
    """Compute a diffusivity and record the method, accuracy, constants and warnings behind it.

    Parameters
    ----------
    solute : str or Species
        Diffusing species.
    medium : str or Species
        Carrier gas or solvent.
    T : float or array_like
        Temperature [K].
    P : float or array_like
        Pressure [Pa] (gas phase only).
    phase : {'gas', 'liquid'}
        Phase of the medium.
    method : str, optional
        Method name; ``'fuller'`` or ``'wilke-chang'`` by default.

    Returns
    -------
    DiffusivityReport
        The value with its method, stated accuracy, the constants used with
        their sources, special-case notes and warnings.

    Notes
    -----
    Same numbers as :func:`gas_diffusivity` and :func:`liquid_diffusivity`;
    the report is what a calculation note needs to defend them.  Its
    ``relative_uncertainty`` is the method's stated average absolute
    deviation taken as a standard uncertainty (times sqrt(pi/2), normal
    errors; Geary 1935); a stated bound would be divided by sqrt(3) (uniform;
    JCGM 100:2008, 4.3.7).

    References
    ----------
    Poling, B. E., Prausnitz, J. M., & O'Connell, J. P. (2001). *The
    Properties of Gases and Liquids*, 5th ed., Chapter 11.

    Examples
    --------
    >>> r = diffusivity_report("toluene", "air", 350.0)
    >>> r.method, round(r.value * 1e6, 2)
    ('fuller', 10.67)

    """
    if phase not in ("gas", "liquid"):
        raise InputValueError(f"phase={phase!r} must be 'gas' or 'liquid'")
    a, b = species(solute), species(medium)
    Tv = check_positive("T", T)
    Pv = check_positive("P", P)
    notes: tuple[str, ...]
    P_used: FloatOrArray | None
    with warnings.catch_warnings(record=True) as caught:
        warnings.simplefilter("always")
        if phase == "gas":
            m = normalise_method(method or "fuller", GAS_METHODS)
            value = gas_diffusivity(a, b, Tv, Pv, m)
            names = _GAS_CONSTANTS[m]
            consts = {"solute": _constants(a, names), "medium": _constants(b, names)}
            accuracy, notes, P_used = GAS_METHODS[m], (), Pv
        else:
            m = normalise_method(method or "wilke-chang", LIQUID_METHODS)
            value = liquid_diffusivity(a, b, Tv, m)
            inp = liquid_diffusivity_inputs(a, b, m)
            consts = {
                "solute": {"Vb (as used)": (inp.V_solute, a.sources.get("Vb", "user"))},
                "medium": {
                    "molar_mass": (b.molar_mass, b.sources.get("molar_mass", "user")),
                    "viscosity": (None, "thermo model via masstransfer.substances"),
                },
            }
            if m == "wilke-chang":
                consts["medium"]["association factor"] = (inp.phi, "Wilke & Chang (1955)")
            accuracy, notes, P_used = LIQUID_METHODS[m], tuple(inp.notes), None
    return DiffusivityReport(
        value=value,
        solute=a.name,
        medium=b.name,
        phase=phase,
        method=m,
        T=Tv,
        P=P_used,
        accuracy=accuracy,
        constants=FrozenMapping(consts),
        notes=tuple(notes),
        warnings=tuple(str(w.message) for w in caught),
        solute_identity=a.identity,
        medium_identity=b.identity,
        relative_uncertainty=stated_uncertainty(accuracy),
    )
