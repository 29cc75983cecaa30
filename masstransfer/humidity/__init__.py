"""Humid gases, evaporation, drying and cooling towers.

Psychrometrics for any condensable vapour in any gas (:func:`humid_gas_state`), the evaporation
rate from a wet surface in one call (:func:`evaporation_rate`), drying time through the
constant-rate and falling-rate periods (:func:`drying_time`), and counter-flow cooling towers and
humidifiers (:func:`merkel_ntu`, :func:`counterflow_tower`).

Imported on first use of ``masstransfer.humidity`` (the drying time uses :mod:`scipy.special`).
"""

from __future__ import annotations

from ._drying import DryingResult, drying_time
from ._evaporation import EvaporationResult, evaporation_rate
from ._state import HumidGasState, humid_gas_state, humidity_ratio_from_y, y_from_humidity_ratio
from ._tower import TowerProfile, counterflow_tower, merkel_ntu

__all__ = [
    "DryingResult",
    "EvaporationResult",
    "HumidGasState",
    "TowerProfile",
    "counterflow_tower",
    "drying_time",
    "evaporation_rate",
    "humid_gas_state",
    "humidity_ratio_from_y",
    "merkel_ntu",
    "y_from_humidity_ratio",
]


def __dir__() -> list[str]:
    return sorted([*__all__, "__all__"])  # documentation tools look for __all__ in dir()
