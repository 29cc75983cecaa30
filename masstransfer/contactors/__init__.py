"""Gas-liquid contactors: packed and bubble columns, stirred tanks, reaction, transfer units.

Packed columns (Onda; Billet & Schultes; Bravo, Rocha & Fair) with a packing table of
:class:`Packing` records; bubble columns (Akita & Yoshida) and aerated stirred tanks
(van't Riet); bubble and particle k_L; enhancement of absorption by reaction (Hatta number,
DeCoursey); transfer units, column height and a column integrator::

    from masstransfer import contactors
    r = contactors.rate_packing("ammonia", "air", "water", "pall-ring-metal-50",
                                T=298.15, u_V=1.5, u_L=0.005)
    contactors.transfer_units(y_in=0.02, y_out=0.001, x_in=0.0, m=1.2, A=1.5)

Imported on first use of ``masstransfer.contactors`` (the integrators load scipy).  Results are
estimates with the accuracy their sources state: for toxic or flammable gases check designs
against measured data for the actual packing and system, local codes and licensed engineering
practice.
"""

from __future__ import annotations

from ._bubble import (
    akita_yoshida_holdup,
    akita_yoshida_kla,
    calderbank_bubble_k_L,
    sano_particle_k_L,
    vant_riet_kla,
)
from ._packed import (
    billet_schultes_area,
    billet_schultes_holdup,
    billet_schultes_k_G,
    billet_schultes_k_L,
    billet_schultes_loading_velocity,
    bravo_rocha_fair_k_G,
    bravo_rocha_fair_k_L,
    onda_k_G,
    onda_k_L,
    onda_wetted_area,
)
from ._packing import PACKINGS, Packing, packing
from ._rating import (
    PACKED_METHODS,
    BubbleColumnResult,
    PackedColumnResult,
    packed_column,
    rate_bubble_column,
    rate_packing,
)
from ._reaction import (
    EnhancementResult,
    absorption_enhancement,
    enhancement_factor,
    enhancement_film,
    enhancement_instantaneous,
    enhancement_penetration,
    enhancement_surface_renewal,
    hatta_number,
)
from ._transfer_units import (
    ColumnProfile,
    column_profile,
    film_transfer_units,
    numerical_transfer_units,
    overall_gas_htu,
    overall_liquid_htu,
    stripping_transfer_units,
    transfer_unit_height,
    transfer_units,
)

__all__ = [
    "PACKED_METHODS",
    "PACKINGS",
    "BubbleColumnResult",
    "ColumnProfile",
    "EnhancementResult",
    "PackedColumnResult",
    "Packing",
    "absorption_enhancement",
    "akita_yoshida_holdup",
    "akita_yoshida_kla",
    "billet_schultes_area",
    "billet_schultes_holdup",
    "billet_schultes_k_G",
    "billet_schultes_k_L",
    "billet_schultes_loading_velocity",
    "bravo_rocha_fair_k_G",
    "bravo_rocha_fair_k_L",
    "calderbank_bubble_k_L",
    "column_profile",
    "enhancement_factor",
    "enhancement_film",
    "enhancement_instantaneous",
    "enhancement_penetration",
    "enhancement_surface_renewal",
    "film_transfer_units",
    "hatta_number",
    "numerical_transfer_units",
    "onda_k_G",
    "onda_k_L",
    "onda_wetted_area",
    "overall_gas_htu",
    "overall_liquid_htu",
    "packed_column",
    "packing",
    "rate_bubble_column",
    "rate_packing",
    "sano_particle_k_L",
    "stripping_transfer_units",
    "transfer_unit_height",
    "transfer_units",
    "vant_riet_kla",
]


def __dir__() -> list[str]:
    return sorted([*__all__, "__all__"])  # documentation tools look for __all__ in dir()
