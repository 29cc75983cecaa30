"""Transfer at a surface: groups, correlations, analogies, conventions, fluxes, wet surfaces.

The dimensionless groups, the correlation catalogue, the heat-mass analogies, coefficient
conventions, film and high-flux fluxes, and the wet-surface energy balance.

The names-in entry points :func:`masstransfer.mass_transfer_from_heat`,
:func:`masstransfer.wet_surface_temperature` and :func:`masstransfer.wet_bulb_temperature` live
at the top level.  The catalogue::

    from masstransfer import surface
    rec = surface.correlation("sphere-ranz-marshall")
    rec.sherwood(Re=120.0, Sc=0.6)
    surface.find_correlations("sphere", Re=120.0, Sc=0.6)  # best-suited first
"""

from __future__ import annotations

from ._analogy import (
    colburn_j_from_friction,
    heat_transfer_coefficient_from_mass,
    lewis_relation,
    mass_transfer_coefficient_from_heat,
    nusselt_from_sherwood,
    psychrometric_ratio,
    sherwood_from_nusselt,
    stanton_prandtl_taylor,
    stanton_reynolds,
    stanton_von_karman,
)
from ._conventions import (
    F_from_k,
    k_from_F,
    kc_from_kG,
    kc_from_ky,
    kG_from_kc,
    kL_from_kx,
    kx_from_kL,
    ky_from_kc,
    log_mean,
    mass_basis_from_molar,
    molar_basis_from_mass,
    overall_gas_coefficient,
    overall_liquid_coefficient,
)
from ._flux import (
    ackermann_correction,
    equimolar_flux,
    fick_flux,
    fick_profile,
    high_flux_correction,
    high_flux_rate,
    stagnant_film_flux,
)
from ._groups import (
    archimedes,
    biot_heat,
    biot_mass,
    colburn_j_heat,
    colburn_j_mass,
    fourier_heat,
    fourier_mass,
    graetz,
    grashof_solutal,
    grashof_thermal,
    lewis,
    nusselt,
    peclet_heat,
    peclet_mass,
    prandtl,
    rayleigh,
    reynolds,
    schmidt,
    sherwood,
    stanton_heat,
    stanton_mass,
)
from ._lookup import (
    all_correlations,
    correlation,
    darcy_friction_smooth,
    find_correlations,
    geometries,
)
from ._record import (
    Correlation,
    CorrelationResult,
)

__all__ = [
    "Correlation",
    "CorrelationResult",
    "F_from_k",
    "ackermann_correction",
    "all_correlations",
    "archimedes",
    "biot_heat",
    "biot_mass",
    "colburn_j_from_friction",
    "colburn_j_heat",
    "colburn_j_mass",
    "correlation",
    "darcy_friction_smooth",
    "equimolar_flux",
    "fick_flux",
    "fick_profile",
    "find_correlations",
    "fourier_heat",
    "fourier_mass",
    "geometries",
    "graetz",
    "grashof_solutal",
    "grashof_thermal",
    "heat_transfer_coefficient_from_mass",
    "high_flux_correction",
    "high_flux_rate",
    "kG_from_kc",
    "kL_from_kx",
    "k_from_F",
    "kc_from_kG",
    "kc_from_ky",
    "kx_from_kL",
    "ky_from_kc",
    "lewis",
    "lewis_relation",
    "log_mean",
    "mass_basis_from_molar",
    "mass_transfer_coefficient_from_heat",
    "molar_basis_from_mass",
    "nusselt",
    "nusselt_from_sherwood",
    "overall_gas_coefficient",
    "overall_liquid_coefficient",
    "peclet_heat",
    "peclet_mass",
    "prandtl",
    "psychrometric_ratio",
    "rayleigh",
    "reynolds",
    "schmidt",
    "sherwood",
    "sherwood_from_nusselt",
    "stagnant_film_flux",
    "stanton_heat",
    "stanton_mass",
    "stanton_prandtl_taylor",
    "stanton_reynolds",
    "stanton_von_karman",
]


def __dir__() -> list[str]:
    return sorted([*__all__, "__all__"])  # documentation tools look for __all__ in dir()
