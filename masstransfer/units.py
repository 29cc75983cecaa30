"""Physical quantities (pint): how they enter and leave the library, and result objects as quantities.

Every public function accepts pint quantities in any compatible unit wherever it takes a
number, and returns a quantity (in the unit its docstring states) when given one: the guard
at each function reads the bracketed units of its docstring and converts.  Plain numbers keep
their documented SI unit, so quantities and plain numbers may be mixed.  A quantity of the
wrong dimension raises :class:`~masstransfer.errors.UnitError` naming the argument, the unit
given and the unit expected.

Result objects (``TransferCoefficients``, ``DiffusivityReport``, ...) keep plain SI numbers in
their fields, so their methods and reprs stay as they are; :func:`quantities` gives their
numeric fields as quantities.  pint is optional (``pip install 'masstransfer[units]'``) and is
never imported by the library itself: a call with plain numbers costs one type look-up per
argument more than before.
"""

from __future__ import annotations

import dataclasses
from typing import Any

from ._validation import guard
from .errors import InputTypeError, MissingDependencyError

__all__ = ["quantities"]


@guard(check_output=False)
def quantities(result: Any, registry: Any = None) -> dict[str, Any]:
    """Return a result object's fields, the numeric ones as pint quantities in their stated units.

    Parameters
    ----------
    result : dataclass instance
        A result object of the library (``TransferCoefficients``,
        ``DiffusivityReport``, ...), whose docstring lists each field's unit in
        brackets.
    registry : pint.UnitRegistry, optional
        The registry the quantities belong to; pint's application registry by
        default.  Pass your own if your script uses one, since quantities of
        different registries do not mix.

    Returns
    -------
    dict
        Field name to value: numbers with a stated unit as quantities (``[-]``
        as dimensionless), everything else (names, notes, ``None``) as is.

    Raises
    ------
    MissingDependencyError
        If pint is not installed.

    Notes
    -----
    The fields themselves stay plain SI numbers so that every method of the
    result (``summary()``, ...) works unchanged; this helper is the one place
    where a whole result becomes quantities.

    References
    ----------
    Grecco, H. E. et al. *Pint: makes units easy*, https://pint.readthedocs.io
    (the quantity type used).

    Examples
    --------
    >>> import masstransfer as mt
    >>> r = mt.mass_transfer_from_heat(35.0, "water", "air", 320.0)
    >>> q = quantities(r)
    >>> print(f"{q['k_c'].to('mm/s'):.1f~P}")
    34.5 mm/s

    """
    try:
        import pint
    except ImportError as exc:
        raise MissingDependencyError(
            "quantities() needs pint; install it with pip install 'masstransfer[units]'"
        ) from exc
    from ._units import field_units, parse_unit

    if not dataclasses.is_dataclass(result) or isinstance(result, type):
        raise InputTypeError(
            f"result={result!r} is not a result object; pass what a names-in function returned "
            "(e.g. mass_transfer_from_heat(...))"
        )
    if registry is not None and not hasattr(registry, "Quantity"):
        raise InputTypeError(f"registry={registry!r} is not a pint UnitRegistry; pass one, or None")
    reg = registry if registry is not None else pint.get_application_registry()  # type: ignore[no-untyped-call]
    units = field_units(type(result))
    out: dict[str, Any] = {}
    for f in dataclasses.fields(result):
        value = getattr(result, f.name)
        unit = units.get(f.name)
        numeric = isinstance(value, float | int) and not isinstance(value, bool)
        if unit is not None and (numeric or hasattr(value, "dtype")):
            out[f.name] = reg.Quantity(value, parse_unit(reg, unit))
        else:
            out[f.name] = value
    return out


def __dir__() -> list[str]:
    return sorted([*__all__, "__all__"])  # documentation tools look for __all__ in dir()
