"""Diffusivity estimation: gases, liquids, porous solids and solids.

The names-in entry points :func:`masstransfer.gas_diffusivity`,
:func:`masstransfer.liquid_diffusivity` and :func:`masstransfer.diffusivity_report` live at the
top level; the numbers-in methods, the method records (``GAS_METHODS``, ``LIQUID_METHODS``: one
:class:`DiffusivityMethod` each), :func:`available_methods`, the mixture rule and the porous and
solid media are here.
"""

from __future__ import annotations

from ._gas import (
    GAS_DEFAULT,
    GAS_METHODS,
    available_methods,
    blanc,
    brokaw,
    chapman_enskog,
    fuller,
    fuller_volume,
    gas_diffusivity_in_mixture,
    neufeld_collision_integral,
    rescale_gas_diffusivity,
    wilke_lee,
)
from ._liquid import (
    LIQUID_METHODS,
    LiquidDiffusivityInputs,
    hayduk_minhas,
    hayduk_minhas_aqueous,
    hayduk_minhas_paraffin,
    liquid_default,
    liquid_diffusivity_inputs,
    nernst_haskell,
    stokes_einstein,
    tyn_calus,
    wilke_chang,
)
from ._porous import bosanquet, effective_diffusivity, knudsen_diffusivity
from ._records import (
    ClassRule,
    ConstantUsed,
    DiffusivityMethod,
    MethodAvailability,
    Prepared,
    SpeciesClass,
    classify,
)
from ._solid import ArrheniusFit, arrhenius_diffusivity, arrhenius_parameters

__all__ = [
    "GAS_DEFAULT",
    "GAS_METHODS",
    "LIQUID_METHODS",
    "ArrheniusFit",
    "ClassRule",
    "ConstantUsed",
    "DiffusivityMethod",
    "LiquidDiffusivityInputs",
    "MethodAvailability",
    "Prepared",
    "SpeciesClass",
    "arrhenius_diffusivity",
    "arrhenius_parameters",
    "available_methods",
    "blanc",
    "bosanquet",
    "brokaw",
    "chapman_enskog",
    "classify",
    "effective_diffusivity",
    "fuller",
    "fuller_volume",
    "gas_diffusivity_in_mixture",
    "hayduk_minhas",
    "hayduk_minhas_aqueous",
    "hayduk_minhas_paraffin",
    "knudsen_diffusivity",
    "liquid_default",
    "liquid_diffusivity_inputs",
    "nernst_haskell",
    "neufeld_collision_integral",
    "rescale_gas_diffusivity",
    "stokes_einstein",
    "tyn_calus",
    "wilke_chang",
    "wilke_lee",
]


def __dir__() -> list[str]:
    return sorted([*__all__, "__all__"])  # documentation tools look for __all__ in dir()
