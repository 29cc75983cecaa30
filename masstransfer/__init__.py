"""masstransfer: diffusivities, heat-mass transfer analogies and correlations.

Numbers in, numbers out (``fuller``, ``wilke_chang``, ...) for tight loops;
names in (``gas_diffusivity("toluene", "air", T=...)``) for scripts.  SI
units throughout.  The property databases of ``chemicals`` and ``thermo``
are loaded on first use, not on import.
"""

from __future__ import annotations

from . import (
    analogy,
    barriers,
    coefficients,
    correlations,
    data,
    diffusivity,
    dimensionless,
    errors,
    flux,
    properties,
    wet_surface,
)
from .analogy import (
    TransferCoefficients,
    heat_transfer_coefficient_from_mass,
    mass_transfer_coefficient_from_heat,
    mass_transfer_from_heat,
    nusselt_from_sherwood,
    sherwood_from_nusselt,
)
from .diffusivity import (
    DiffusivityReport,
    arrhenius_diffusivity,
    blanc,
    bosanquet,
    brokaw,
    chapman_enskog,
    diffusivity_report,
    effective_diffusivity,
    fuller,
    fuller_volume,
    gas_diffusivity,
    gas_diffusivity_in_mixture,
    hayduk_minhas,
    hayduk_minhas_aqueous,
    knudsen_diffusivity,
    liquid_diffusivity,
    rescale_gas_diffusivity,
    stokes_einstein,
    tyn_calus,
    wilke_chang,
    wilke_lee,
)
from .errors import (
    EnvelopeError,
    EnvelopeWarning,
    InputShapeError,
    InputValueError,
    MassTransferError,
    MassTransferWarning,
    MissingConstantError,
    OutOfRangeError,
    UnknownMethodError,
    UnknownSpeciesError,
)
from .properties import gas_model, liquid_model
from .species import Species, species
from .wet_surface import wet_bulb_temperature, wet_surface_temperature

__version__ = "0.1.0"


def __getattr__(name: str) -> object:
    """Import the scipy-backed ``transient`` module on first use (keeps ``import masstransfer`` light)."""
    if name == "transient":
        import importlib

        return importlib.import_module(".transient", __name__)
    raise AttributeError(f"module {__name__!r} has no attribute {name!r}")


__all__ = [
    "DiffusivityReport",
    "EnvelopeError",
    "EnvelopeWarning",
    "InputShapeError",
    "InputValueError",
    "MassTransferError",
    "MassTransferWarning",
    "MissingConstantError",
    "OutOfRangeError",
    "Species",
    "TransferCoefficients",
    "UnknownMethodError",
    "UnknownSpeciesError",
    "__version__",
    "analogy",
    "arrhenius_diffusivity",
    "barriers",
    "blanc",
    "bosanquet",
    "brokaw",
    "chapman_enskog",
    "coefficients",
    "correlations",
    "data",
    "diffusivity",
    "diffusivity_report",
    "dimensionless",
    "effective_diffusivity",
    "errors",
    "flux",
    "fuller",
    "fuller_volume",
    "gas_diffusivity",
    "gas_diffusivity_in_mixture",
    "gas_model",
    "hayduk_minhas",
    "hayduk_minhas_aqueous",
    "heat_transfer_coefficient_from_mass",
    "knudsen_diffusivity",
    "liquid_diffusivity",
    "liquid_model",
    "mass_transfer_coefficient_from_heat",
    "mass_transfer_from_heat",
    "nusselt_from_sherwood",
    "properties",
    "rescale_gas_diffusivity",
    "sherwood_from_nusselt",
    "species",
    "stokes_einstein",
    "transient",
    "tyn_calus",
    "wet_bulb_temperature",
    "wet_surface",
    "wet_surface_temperature",
    "wilke_chang",
    "wilke_lee",
]
