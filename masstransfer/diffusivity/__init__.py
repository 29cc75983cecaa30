"""Diffusivity estimation: gases, liquids, porous solids and solids."""

from __future__ import annotations

from .gas import (
    GAS_METHODS,
    blanc,
    brokaw,
    chapman_enskog,
    fuller,
    fuller_volume,
    gas_diffusivity,
    gas_diffusivity_in_mixture,
    neufeld_collision_integral,
    rescale_gas_diffusivity,
    wilke_lee,
)
from .liquid import (
    LIQUID_METHODS,
    LiquidDiffusivityInputs,
    hayduk_minhas,
    hayduk_minhas_aqueous,
    hayduk_minhas_paraffin,
    liquid_diffusivity,
    liquid_diffusivity_inputs,
    stokes_einstein,
    tyn_calus,
    wilke_chang,
)
from .porous import bosanquet, effective_diffusivity, knudsen_diffusivity
from .report import DiffusivityReport, diffusivity_report
from .solid import arrhenius_diffusivity, arrhenius_parameters

__all__ = [
    "GAS_METHODS",
    "LIQUID_METHODS",
    "DiffusivityReport",
    "LiquidDiffusivityInputs",
    "arrhenius_diffusivity",
    "arrhenius_parameters",
    "blanc",
    "bosanquet",
    "brokaw",
    "chapman_enskog",
    "diffusivity_report",
    "effective_diffusivity",
    "fuller",
    "fuller_volume",
    "gas_diffusivity",
    "gas_diffusivity_in_mixture",
    "hayduk_minhas",
    "hayduk_minhas_aqueous",
    "hayduk_minhas_paraffin",
    "knudsen_diffusivity",
    "liquid_diffusivity",
    "liquid_diffusivity_inputs",
    "neufeld_collision_integral",
    "rescale_gas_diffusivity",
    "stokes_einstein",
    "tyn_calus",
    "wilke_chang",
    "wilke_lee",
]
