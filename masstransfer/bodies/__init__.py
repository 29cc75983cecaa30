"""Diffusion inside bodies: transient uptake and release, barriers, permeation, permeability units.

Transient forms cover the slab, cylinder and sphere with or without surface resistance; barriers
are layers in series.

Imported on first use of ``masstransfer.bodies`` (it loads :mod:`scipy.special`).
"""

from __future__ import annotations

from ._barriers import (
    FLUX_UNITS,
    PERMEABILITY_UNITS,
    PERMEANCE_UNITS,
    BarrierResult,
    IngressResult,
    Layer,
    TimeLagFit,
    convert_flux,
    convert_permeability,
    convert_permeance,
    diffusivity_from_time_lag,
    fit_time_lag,
    oxygen_ingress,
    permeability,
    permeation_curve,
    steady_flux,
    time_lag,
)
from ._transient import (
    SERIES_TOLERANCE,
    SHAPES,
    DiffusivityFit,
    concentration_profile,
    fit_diffusivity,
    fractional_release,
    fractional_uptake,
    half_time,
    semi_infinite_concentration,
    semi_infinite_uptake,
)

__all__ = [
    "FLUX_UNITS",
    "PERMEABILITY_UNITS",
    "PERMEANCE_UNITS",
    "SERIES_TOLERANCE",
    "SHAPES",
    "BarrierResult",
    "DiffusivityFit",
    "IngressResult",
    "Layer",
    "TimeLagFit",
    "concentration_profile",
    "convert_flux",
    "convert_permeability",
    "convert_permeance",
    "diffusivity_from_time_lag",
    "fit_diffusivity",
    "fit_time_lag",
    "fractional_release",
    "fractional_uptake",
    "half_time",
    "oxygen_ingress",
    "permeability",
    "permeation_curve",
    "semi_infinite_concentration",
    "semi_infinite_uptake",
    "steady_flux",
    "time_lag",
]


def __dir__() -> list[str]:
    return sorted([*__all__, "__all__"])  # documentation tools look for __all__ in dir()
