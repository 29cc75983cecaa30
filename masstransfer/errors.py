"""One exception family and one warning family for the whole library.

Every error the library raises derives from :class:`MassTransferError` and
also from the built-in exception it resembles, so callers may catch either
``masstransfer.MassTransferError`` or, for example, ``ValueError``.
Messages name the argument, the offending value and how to fix it.
"""

from __future__ import annotations

__all__ = [
    "AmbiguousSpeciesWarning",
    "EnvelopeError",
    "EnvelopeWarning",
    "InputShapeError",
    "InputTypeError",
    "InputValueError",
    "MassTransferError",
    "MassTransferWarning",
    "MissingConstantError",
    "MissingDependencyError",
    "OutOfRangeError",
    "UnitError",
    "UnknownMethodError",
    "UnknownSpeciesError",
]


class MassTransferError(Exception):
    """Base class of every error raised by ``masstransfer``."""


class InputValueError(MassTransferError, ValueError):
    """An argument has a value the method cannot accept (NaN, inf, <= 0, ...)."""


class InputTypeError(MassTransferError, TypeError):
    """An argument has the wrong type (a string, None, a complex number, ... where a number belongs)."""


class InputShapeError(InputValueError):
    """Array arguments do not broadcast against each other."""


class UnknownMethodError(InputValueError):
    """A ``method=`` (or similar choice) is not one of the accepted names."""


class UnknownSpeciesError(MassTransferError, LookupError, ValueError):
    """A species name, CAS number or formula could not be resolved."""


class MissingConstantError(MassTransferError, ValueError):
    """A resolved species lacks a constant that the chosen method needs."""


class MissingDependencyError(MassTransferError, ImportError):
    """An optional dependency (for example hypothesis) is not installed."""


class OutOfRangeError(InputValueError):
    """A state lies outside the range a property model or method covers.

    Raised, for instance, when a solvent is asked for liquid properties at a
    temperature at which it is not a liquid.
    """


class EnvelopeError(InputValueError):
    """An input lies outside a correlation's envelope and strict checking was asked for."""


class MassTransferWarning(UserWarning):
    """Base class of every warning issued by ``masstransfer``."""


class EnvelopeWarning(MassTransferWarning):
    """An input lies outside the range over which a method was validated."""


class AmbiguousSpeciesWarning(MassTransferWarning):
    """A species name or formula fits several substances; the message names the one chosen."""


class UnitError(InputTypeError):
    """A physical quantity (pint) has a unit that cannot be converted to the one the argument takes.

    Also raised for a quantity passed where the argument takes no unit.  Both a
    :class:`MassTransferError` and a ``TypeError`` (as pint's own dimensionality error is).
    """


def __dir__() -> list[str]:
    return sorted([*__all__, "__all__"])  # documentation tools look for __all__ in dir()
