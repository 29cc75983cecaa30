"""A diffusivity with the statement behind it: method, accuracy, constants and their sources."""

from __future__ import annotations

from collections.abc import Mapping
from dataclasses import dataclass
from typing import Literal

import numpy as np

from .._frozen import FrozenMapping, FrozenResult
from .._typing import ArrayLike, FloatOrArray
from .._uncertainty import stated_uncertainty
from .._validation import check_positive, collect_warnings, guard
from ..errors import InputValueError
from ..substances._species import Species, species
from ._gas import gas_diffusivity, ready_gas
from ._liquid import liquid_diffusivity, ready_liquid
from ._phase import check_liquid, medium_state, phase_limits

__all__ = ["DiffusivityReport", "diffusivity_report", "infer_phase"]


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
        The typical error the method's sources report, with the source.
    accuracy_pct : float
        That average absolute deviation as a number [%], for a calculation note.
    reference : str
        The method's primary reference.
    constants : mapping
        For each species, the constants the method used, as (value, source).
    notes : tuple of str
        Every special rule applied, with the value it changed, and how the method and phase
        were chosen.
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
    accuracy_pct: float
    reference: str
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
        The method's record in ``GAS_METHODS`` or ``LIQUID_METHODS`` (its ``reference``).

        Examples
        --------
        >>> "Fuller" in diffusivity_report("water", "air", 300.0).summary()
        True

        """
        v = np.atleast_1d(np.asarray(self.value, dtype=float))
        shown = f"{v[0]:.4g} m^2/s" if v.size == 1 else f"{v.min():.4g} to {v.max():.4g} m^2/s"
        lines = [
            f"D({self.solute} in {self.medium}, {self.phase}) = {shown}",
            f"method: {self.method} (stated accuracy {self.accuracy_pct:g} %: {self.accuracy})",
            f"reference: {self.reference}",
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
                shown_val = f"{val:.6g}" if isinstance(val, float) else repr(val)
                lines.append(f"  {who}.{name} = {shown_val} ({src})")
        lines += [f"note: {n}" for n in self.notes]
        lines += [f"warning: {w}" for w in self.warnings]
        lines.append("An estimate: check safety-relevant designs against measured data.")
        return "\n".join(lines)


def infer_phase(medium: str | Species, T: ArrayLike, P: ArrayLike = 101325.0) -> str:
    """'gas' or 'liquid': the state of ``medium`` at every (T, P), or raise if it is mixed or unknown."""
    b = species(medium)
    lim = phase_limits(b)
    Tv, Pv = check_positive("T", T), check_positive("P", P)
    state = medium_state(lim, Tv, Pv)
    if state in ("gas", "liquid"):
        return state
    if state == "either" and lim.Tm is not None and bool(np.any(np.asarray(Tv) < lim.Tm)):
        check_liquid(lim, Tv, Pv, b.name)  # below its melting point: say it is frozen
    why = (
        "lacks a boiling point or critical point"
        if state == "unknown"
        else "is near its saturation line, or changes phase over the temperatures given"
    )
    raise InputValueError(
        f"the phase of {b.name!r} at the given T and P cannot be inferred: it {why}; "
        "state it with phase='gas' or phase='liquid'"
    )


@guard
def diffusivity_report(
    solute: str | Species,
    medium: str | Species,
    T: ArrayLike,
    P: ArrayLike = 101325.0,
    *,
    phase: Literal["gas", "liquid"] | None = None,
    method: str | None = None,
) -> DiffusivityReport:
    """Compute a diffusivity and record the method, accuracy, constants, rules and warnings behind it.

    Parameters
    ----------
    solute : str or Species
        Diffusing species.
    medium : str or Species
        The gas or solvent it diffuses in.
    T : float or array_like
        Temperature [K].
    P : float or array_like
        Pressure [Pa].
    phase : {None, 'gas', 'liquid'}
        Phase of the medium; None infers it from the medium's state at T and P (noted).
    method : str, optional
        Method name; by default the published recommendation for the pair (see
        :func:`masstransfer.diffusivity.available_methods`).

    Returns
    -------
    DiffusivityReport
        The value with its method, stated accuracy and reference, the constants used with
        their sources, every special rule applied (with the value it changed) and warnings.

    Notes
    -----
    Same numbers as :func:`gas_diffusivity` and :func:`liquid_diffusivity`, read from the same
    method records; the report is what a calculation note needs to defend them.  Its
    ``relative_uncertainty`` is the method's stated average absolute deviation taken as a
    standard uncertainty (times sqrt(pi/2), normal errors; Geary 1935); a stated bound would be
    divided by sqrt(3) (uniform; JCGM 100:2008, 4.3.7).

    References
    ----------
    Poling, B. E., Prausnitz, J. M., & O'Connell, J. P. (2001). *The
    Properties of Gases and Liquids*, 5th ed., Chapter 11.

    Examples
    --------
    >>> r = diffusivity_report("toluene", "air", 350.0)
    >>> r.method, round(r.value * 1e6, 2), r.accuracy_pct
    ('fuller', 10.67, 5.0)

    """
    a, b = species(solute), species(medium)
    Tv = check_positive("T", T)
    Pv = check_positive("P", P)
    notes: list[str] = []
    viscosity: dict[str, tuple[float | None, str]] = {}
    if phase is None:
        phase = infer_phase(b, Tv, Pv)  # type: ignore[assignment]
        above_critical = b.Tc is not None and bool(np.all(np.asarray(Tv) > b.Tc))
        kind = "liquid" if phase == "liquid" else ("gas" if above_critical else "vapour")
        notes.append(f"phase inferred: {b.name} is a {kind} at the given T and P")
    if phase not in ("gas", "liquid"):
        raise InputValueError(f"phase={phase!r} must be 'gas' or 'liquid' (or None to infer it)")
    with collect_warnings() as caught:
        if phase == "gas":
            r = ready_gas(a, b, method)
            value = gas_diffusivity(a, b, Tv, Pv, method)
            rec, prep, rule_notes, P_used = r.record, r.prepared, r.notes, Pv
        else:
            rl = ready_liquid(a, b, method)
            value = liquid_diffusivity(a, b, Tv, method, P=Pv)
            rec, prep, rule_notes, P_used = rl.record, rl.prepared, rl.notes, None
            from ..substances._properties import liquid_model

            mu = np.atleast_1d(np.asarray(liquid_model(b).viscosity(Tv), dtype=float))
            viscosity = {"viscosity at the first T": (float(mu[0]), "masstransfer.liquid_model (thermo)")}
            if prep.form in ("tyn-calus", "general") and prep.args[4]:
                f = 8.0 * mu * 1000.0
                shown = f"{f[0]:.3g}" if f.size == 1 else f"{f.min():.3g} to {f.max():.3g}"
                rule_notes = (*rule_notes, f"alcohol-solvent factor 8 eta_B = {shown} at the given T")
    consts = {
        role: FrozenMapping(
            {
                **{k: (c.value, c.source) for k, c in cs.items()},
                **(viscosity if role == "medium" and phase == "liquid" else {}),
            }
        )
        for role, cs in prep.constants.items()
    }
    return DiffusivityReport(
        value=value,
        solute=a.name,
        medium=b.name,
        phase=phase,
        method=rec.name,
        T=Tv,
        P=P_used,
        accuracy=rec.accuracy,
        accuracy_pct=rec.accuracy_pct,
        reference=rec.reference,
        constants=FrozenMapping(consts),
        notes=(*notes, *rule_notes),
        warnings=tuple(dict.fromkeys(msg for msg, _ in caught)),
        relative_uncertainty=stated_uncertainty(rec),
        solute_identity=a.identity,
        medium_identity=b.identity,
    )
