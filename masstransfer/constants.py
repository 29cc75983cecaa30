"""Physical constants: the one place the library defines them.

Every value here is exact in the SI (2019 redefinition) or by the definition of the unit, so
they are written out in full rather than imported: ``import masstransfer`` stays free of the
250 ms that loading :mod:`scipy.constants` costs.  ``tests/test_constants.py`` checks each one
against :mod:`scipy.constants` to the last digit.  Unit factors that belong to a single published
table stay next to that table.
"""

from __future__ import annotations

from typing import Final

__all__ = ["ATM", "AVOGADRO", "BOLTZMANN", "DEBYE", "GRAVITY", "R_GAS", "SPEED_OF_LIGHT", "T_ICE"]

#: Boltzmann constant [J/K] (exact; scipy.constants.k).
BOLTZMANN: Final[float] = 1.380649e-23
#: Avogadro constant [1/mol] (exact; scipy.constants.N_A).
AVOGADRO: Final[float] = 6.02214076e23
#: Molar gas constant [J/(mol K)], k N_A (exact; scipy.constants.R).
R_GAS: Final[float] = 8.31446261815324
#: Speed of light in vacuum [m/s] (exact; scipy.constants.c).
SPEED_OF_LIGHT: Final[float] = 299792458.0
#: Standard atmosphere [Pa] (exact by definition; scipy.constants.atm).
ATM: Final[float] = 101325.0
#: Ice point, 0 degC [K] (exact by definition; scipy.constants.zero_Celsius).
T_ICE: Final[float] = 273.15
#: Standard acceleration of gravity [m/s^2] (exact by definition; scipy.constants.g).
GRAVITY: Final[float] = 9.80665
#: One debye [C m]: 1e-21 / c (exact by definition of the unit).
DEBYE: Final[float] = 1e-21 / SPEED_OF_LIGHT


def __dir__() -> list[str]:
    return sorted([*__all__, "__all__"])  # documentation tools look for __all__ in dir()
