"""One catalogue of Nusselt and Sherwood correlations that knows where each one holds.

Every record carries its geometry, regime, characteristic length, boundary
condition, envelope and source, and gives Nu from (Re, Pr) or Sh from
(Re, Sc) with the same equation::

    from masstransfer import surface
    rec = surface.correlation("sphere-ranz-marshall")
    rec.sherwood(Re=120.0, Sc=0.6)
    surface.find_correlations(geometry="sphere", Re=120.0, Sc=0.6)   # best-suited first

Leaving a record's envelope issues an
:class:`~masstransfer.errors.EnvelopeWarning`; ``strict=True`` raises
:class:`~masstransfer.errors.EnvelopeError` instead.
"""

from __future__ import annotations

import difflib
from typing import Any

import numpy as np

from .._validation import check_finite, guard
from ..errors import InputTypeError, InputValueError, UnknownMethodError
from ._catalogue import RECORDS, darcy_friction_smooth
from ._record import Correlation

__all__ = [
    "all_correlations",
    "correlation",
    "darcy_friction_smooth",
    "find_correlations",
    "geometries",
]

_BY_SLUG = {r.slug: r for r in RECORDS}
if len(_BY_SLUG) != len(RECORDS):  # pragma: no cover - guards the table
    raise RuntimeError("duplicate correlation slugs")


def _inside_conditions(rec: Correlation, wanted: dict[str, Any]) -> bool:
    """Check the record's conditions on products of inputs and its branch envelopes."""
    for names, (lo, hi) in rec.products.values():
        if all(n in wanted for n in names):
            p = np.ones(())
            for n in names:
                p = p * wanted[n]
            if not bool(np.all((p >= lo) & (p <= hi))):
                return False
    for switch, blo, bhi, env in rec.branches:
        if switch not in wanted:
            continue
        on = (wanted[switch] >= blo) & (wanted[switch] < bhi)
        for key, (lo, hi) in env.items():
            if key in wanted and bool(np.any(on & ((wanted[key] < lo) | (wanted[key] > hi)))):
                return False
    return True


@guard(check_output=False)  # records, not numbers
def all_correlations() -> tuple[Correlation, ...]:
    """Every record of the catalogue.

    Returns
    -------
    tuple of Correlation
        All records, in catalogue order (grouped by geometry).

    References
    ----------
    See each record's ``reference``.

    Examples
    --------
    >>> len(all_correlations()) >= 30
    True

    """
    return RECORDS


@guard
def geometries() -> tuple[str, ...]:
    """List the geometries the catalogue covers.

    Returns
    -------
    tuple of str
        Distinct geometry names, in catalogue order.

    References
    ----------
    See each record's ``reference``.

    Examples
    --------
    >>> "sphere" in geometries() and "tube bank" in geometries()
    True

    """
    return tuple(dict.fromkeys(r.geometry for r in RECORDS))


@guard(check_output=False)  # records, not numbers
def correlation(slug: str) -> Correlation:
    """Look a record up by its slug.

    Parameters
    ----------
    slug : str
        Stable identifier such as ``"duct-gnielinski"``.

    Returns
    -------
    Correlation
        The record.

    Raises
    ------
    UnknownMethodError
        If no record has that slug; the message lists close matches.

    References
    ----------
    See the record's ``reference``.

    Examples
    --------
    >>> correlation("sphere-ranz-marshall").sherwood(Re=0.0, Sc=1.0)
    2.0

    """
    if not isinstance(slug, str):
        raise InputTypeError(
            f"slug={slug!r} is a {type(slug).__name__}; pass a record's slug such as 'duct-gnielinski'"
        )
    try:
        return _BY_SLUG[slug]
    except KeyError:
        close = difflib.get_close_matches(str(slug), list(_BY_SLUG), n=5, cutoff=0.4)
        hint = f"; close matches: {', '.join(close)}" if close else ""
        raise UnknownMethodError(
            f"no correlation {slug!r}{hint}; masstransfer.surface.all_correlations() lists every record"
        ) from None


@guard(check_output=False)  # records, not numbers
def find_correlations(
    geometry: str | None = None, *, transport: str | None = None, **conditions: Any
) -> list[Correlation]:
    """Find the records whose envelopes cover the given conditions, best-suited first.

    Parameters
    ----------
    geometry : str, optional
        Geometry to match (see :func:`geometries`); all when omitted.
    transport : {'heat', 'mass'}, optional
        The transfer you will compute.  Inferred from the conditions when
        omitted: ``Sc`` means mass, ``Pr`` heat.
    **conditions : float or array_like
        Values of the inputs (``Re=1e4, Sc=0.6``, ``Ra=1e8``, ...) [-].

    Returns
    -------
    list of Correlation
        Records that accept every given input and whose envelopes contain
        every given value, ranked by: no required input missing, fitted on
        the requested transport, stated accuracy.

    Notes
    -----
    An envelope is where the source validated the equation; being inside
    it is necessary, not sufficient, for the stated accuracy.

    References
    ----------
    See each record's ``reference``.

    Examples
    --------
    >>> [r.slug for r in find_correlations("duct", Re=5e4, Pr=3.0)][:2]
    ['duct-gnielinski', 'duct-dittus-boelter']

    """
    if geometry is not None and not isinstance(geometry, str):
        raise InputTypeError(f"geometry={geometry!r} is a {type(geometry).__name__}; pass a geometry name")
    if transport is not None and not isinstance(transport, str):
        raise InputTypeError(
            f"transport={transport!r} is a {type(transport).__name__}; pass 'heat' or 'mass'"
        )
    checked = {k: check_finite(k, v) for k, v in conditions.items()}
    if transport is None:
        transport = "mass" if "Sc" in conditions else "heat"
    if transport not in ("heat", "mass"):
        raise InputValueError(f"transport={transport!r} must be 'heat' or 'mass'")
    if "Sc" in conditions and "Pr" in conditions:
        raise InputValueError("pass Sc (mass transfer) or Pr (heat transfer), not both")
    wanted = {("Pr" if k == "Sc" else k): np.asarray(v, dtype=float) for k, v in checked.items()}
    if geometry is not None and geometry not in geometries():
        close = difflib.get_close_matches(geometry, list(geometries()), n=3, cutoff=0.3)
        raise UnknownMethodError(
            f"geometry={geometry!r} is not in the catalogue"
            + (f" (did you mean {', '.join(repr(c) for c in close)}?)" if close else "")
            + f"; choose one of {', '.join(geometries())}"
        )
    hits: list[tuple[tuple[int, int, float, str], Correlation]] = []
    for rec in RECORDS:
        if geometry is not None and rec.geometry != geometry:
            continue
        names = set(rec.inputs) | set(rec.parameters)
        if not set(wanted) <= names:
            continue
        inside = True
        for key, v in wanted.items():
            lo, hi = rec.envelope.get(key, rec.domain.get(key, (0.0, float("inf"))))
            if not bool(np.all((v >= lo) & (v <= hi))):
                inside = False
                break
        if inside:
            inside = _inside_conditions(rec, wanted)
        if not inside:
            continue
        missing = sum(1 for k in rec.inputs if k not in wanted) + sum(
            1 for k, d in rec.parameters.items() if d is None and k not in wanted
        )
        matches = 0 if rec.fitted_on in ("both", transport) else 1
        acc = rec.accuracy_pct if rec.accuracy_pct is not None else 100.0
        hits.append(((missing, matches, acc, rec.slug), rec))
    hits.sort(key=lambda h: h[0])
    return [rec for _, rec in hits]
