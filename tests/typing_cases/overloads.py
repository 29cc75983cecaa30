"""Checked by mypy only (tests/test_typing.py): a float in gives a float out, an array an ndarray."""

from __future__ import annotations

from typing import TYPE_CHECKING

import numpy as np
import numpy.typing as npt

import masstransfer as mt
from masstransfer import bodies, contactors

if TYPE_CHECKING:
    from typing_extensions import assert_type


def cases() -> None:
    """Never run; only type-checked."""
    T = np.linspace(300.0, 400.0, 5)
    assert_type(contactors.hatta_number(10.0, 500.0, 1.8e-9, 1e-4), float)
    assert_type(contactors.hatta_number(T, 500.0, 1.8e-9, 1e-4), npt.NDArray[np.float64])
    assert_type(contactors.enhancement_factor(5.0, 10.0), float)
    assert_type(contactors.enhancement_factor(T, 10.0), npt.NDArray[np.float64])
    assert_type(contactors.transfer_units(0.02, 0.001, 0.0, 1.2, 1.5), float)
    assert_type(contactors.transfer_units(0.02, 0.001, 0.0, 1.2, T), npt.NDArray[np.float64])
    assert_type(mt.gas_diffusivity("water", "air", 300.0), float)
    assert_type(mt.gas_diffusivity("water", "air", 300.0, 2e5), float)
    assert_type(mt.gas_diffusivity("water", "air", T), npt.NDArray[np.float64])
    assert_type(mt.liquid_diffusivity("benzene", "water", 298.15), float)
    assert_type(mt.liquid_diffusivity("benzene", "water", T), npt.NDArray[np.float64])
    assert_type(mt.diffusivity.fuller(300.0, 1e5, 0.018, 0.029, 13.1, 19.7), float)
    assert_type(mt.diffusivity.fuller(T, 1e5, 0.018, 0.029, 13.1, 19.7), npt.NDArray[np.float64])
    assert_type(
        mt.surface.mass_transfer_coefficient_from_heat(30.0, rho=1.2, cp=1007.0, Pr=0.7, Sc=0.6), float
    )
    assert_type(
        mt.surface.mass_transfer_coefficient_from_heat(T, rho=1.2, cp=1007.0, Pr=0.7, Sc=0.6),
        npt.NDArray[np.float64],
    )
    assert_type(
        mt.surface.heat_transfer_coefficient_from_mass(0.03, rho=1.2, cp=1007.0, Pr=0.7, Sc=0.6), float
    )
    assert_type(mt.wet_bulb_temperature(303.15, 0.5), float)
    assert_type(mt.wet_bulb_temperature(T, 0.5), npt.NDArray[np.float64])
    assert_type(bodies.fractional_uptake("slab", 10.0, 1e-9, 1e-3), float)
    assert_type(bodies.fractional_uptake("slab", T, 1e-9, 1e-3), npt.NDArray[np.float64])
    assert_type(bodies.time_lag(5e-5, 1e-12), float)
    assert_type(bodies.time_lag(T * 1e-7, 1e-12), npt.NDArray[np.float64])
