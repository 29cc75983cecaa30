"""Hypothesis strategies and invariant checks for downstream property-based tests.

``hypothesis`` is optional: importing this subpackage without it raises
:class:`~masstransfer.errors.MissingDependencyError` saying what to install.
"""

from __future__ import annotations

from ._strategies import (
    GAS_CARRIERS,
    GAS_SOLUTES,
    LIQUID_SOLUTES,
    SOLVENTS,
    GasState,
    LiquidState,
    check_analogy_round_trip,
    check_gas_pressure_scaling,
    check_gas_symmetry,
    check_nusselt_equals_sherwood,
    correlation_inputs,
    gas_states,
    liquid_states,
)

__all__ = [
    "GAS_CARRIERS",
    "GAS_SOLUTES",
    "LIQUID_SOLUTES",
    "SOLVENTS",
    "GasState",
    "LiquidState",
    "check_analogy_round_trip",
    "check_gas_pressure_scaling",
    "check_gas_symmetry",
    "check_nusselt_equals_sherwood",
    "correlation_inputs",
    "gas_states",
    "liquid_states",
]


def __dir__() -> list[str]:
    return sorted([*__all__, "__all__"])  # documentation tools look for __all__ in dir()
