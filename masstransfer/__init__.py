"""masstransfer: diffusivities, heat-mass transfer analogies and mass-transfer correlations.

The top level holds the names-in entry points (species names and a state in, a number you can
defend out), their result types and the two bases of the error and warning families.  Everything
else lives in one subpackage each, with one public path per function:

``substances``   species constants beyond :class:`Species`; Henry's constants; parachors
``diffusivity``  numbers-in gas, liquid, porous and solid methods (``fuller``, ``wilke_chang``, ...)
``surface``      dimensionless groups, the correlation catalogue, analogies, conventions, fluxes
``bodies``       transient uptake and release, barriers, permeability units
``contactors``   packed and bubble columns, stirred tanks, absorption with reaction, transfer units
``humidity``     psychrometrics for any vapour-gas pair, evaporation in one call, drying, towers
``testing``      hypothesis strategies and invariant checks for downstream tests
``units``        pint quantities: accepted by every function; result objects as quantities
``constants``    the physical constants the library uses
``errors``       the whole error and warning family

SI units throughout.  The property databases of ``chemicals`` and ``thermo`` are loaded on first
use, not on import; ``bodies``, ``contactors`` and ``humidity`` (scipy) and ``testing``
(hypothesis) are imported on first use.
"""

from __future__ import annotations

import importlib
from typing import TYPE_CHECKING

from . import constants, diffusivity, errors, substances, surface
from ._version import __version__
from .diffusivity._gas import gas_diffusivity
from .diffusivity._liquid import liquid_diffusivity
from .diffusivity._report import DiffusivityReport, diffusivity_report
from .errors import MassTransferError, MassTransferWarning
from .substances._properties import GasModel, LiquidModel, gas_model, liquid_model
from .substances._species import Species, species
from .surface._analogy import TransferCoefficients, mass_transfer_from_heat
from .surface._wet_surface import wet_bulb_temperature, wet_surface_temperature

if TYPE_CHECKING:
    from . import bodies, contactors, humidity, testing, units

_LAZY = frozenset({"bodies", "contactors", "humidity", "testing", "units"})


def __getattr__(name: str) -> object:
    """Import ``bodies``, ``contactors``, ``humidity`` (scipy) and ``testing`` (hypothesis) on first use."""
    if name in _LAZY:
        return importlib.import_module(f".{name}", __name__)
    raise AttributeError(f"module {__name__!r} has no attribute {name!r}")


def __dir__() -> list[str]:
    return sorted(__all__)


__all__ = [
    "DiffusivityReport",
    "GasModel",
    "LiquidModel",
    "MassTransferError",
    "MassTransferWarning",
    "Species",
    "TransferCoefficients",
    "__version__",
    "bodies",
    "constants",
    "contactors",
    "diffusivity",
    "diffusivity_report",
    "errors",
    "gas_diffusivity",
    "gas_model",
    "humidity",
    "liquid_diffusivity",
    "liquid_model",
    "mass_transfer_from_heat",
    "species",
    "substances",
    "surface",
    "testing",
    "units",
    "wet_bulb_temperature",
    "wet_surface_temperature",
]
