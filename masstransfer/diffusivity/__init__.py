"""Diffusivity estimation: gases, liquids, porous solids and solids.

The names-in entry points :func:`masstransfer.gas_diffusivity`,
:func:`masstransfer.liquid_diffusivity` and :func:`masstransfer.diffusivity_report` live at the
top level; the numbers-in methods, the mixture rule and the porous and solid media are here.
"""

from __future__ import annotations

from ._gas import (
    GAS_METHODS,
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
    liquid_diffusivity_inputs,
    stokes_einstein,
    tyn_calus,
    wilke_chang,
)
from ._porous import bosanquet, effective_diffusivity, knudsen_diffusivity
from ._solid import ArrheniusFit, arrhenius_diffusivity, arrhenius_parameters

__all__ = [
    "GAS_METHODS",
    "LIQUID_METHODS",
    "ArrheniusFit",
    "LiquidDiffusivityInputs",
    "arrhenius_diffusivity",
    "arrhenius_parameters",
    "blanc",
    "bosanquet",
    "brokaw",
    "chapman_enskog",
    "effective_diffusivity",
    "fuller",
    "fuller_volume",
    "gas_diffusivity_in_mixture",
    "hayduk_minhas",
    "hayduk_minhas_aqueous",
    "hayduk_minhas_paraffin",
    "knudsen_diffusivity",
    "liquid_diffusivity_inputs",
    "neufeld_collision_integral",
    "rescale_gas_diffusivity",
    "stokes_einstein",
    "tyn_calus",
    "wilke_chang",
    "wilke_lee",
]
