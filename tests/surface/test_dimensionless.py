from __future__ import annotations

import numpy as np
import pytest

import masstransfer as mt
from masstransfer import surface as dl


def test_groups_by_hand():
    # definitions as in Incropera & DeWitt 6th ed., Table 6.2 (dimensionless groups)
    assert dl.reynolds(2.0, 0.05, 1.5e-5) == pytest.approx(2.0 * 0.05 / 1.5e-5)
    assert dl.prandtl(1007.0, 0.0263, 1.846e-5) == pytest.approx(1007.0 * 1.846e-5 / 0.0263)
    assert dl.schmidt(2.6e-5, 1.57e-5) == pytest.approx(1.57e-5 / 2.6e-5)
    assert dl.lewis(2.2e-5, 2.6e-5) == pytest.approx(2.2e-5 / 2.6e-5)
    assert dl.nusselt(25.0, 0.1, 0.026) == pytest.approx(25.0 * 0.1 / 0.026)
    assert dl.sherwood(0.02, 0.1, 2.6e-5) == pytest.approx(0.02 * 0.1 / 2.6e-5)
    assert dl.stanton_heat(25.0, 5.0, 1.2, 1007.0) == pytest.approx(25.0 / (1.2 * 1007.0 * 5.0))
    assert dl.stanton_mass(0.02, 5.0) == pytest.approx(0.004)
    assert dl.colburn_j_heat(0.004, 0.71) == pytest.approx(0.004 * 0.71 ** (2 / 3))
    assert dl.colburn_j_mass(0.004, 0.6) == pytest.approx(0.004 * 0.6 ** (2 / 3))
    assert dl.peclet_heat(1.0, 0.01, 2.2e-5) == pytest.approx(0.01 / 2.2e-5)
    assert dl.peclet_mass(1.0, 0.01, 2.6e-5) == pytest.approx(0.01 / 2.6e-5)
    assert dl.grashof_thermal(0.5, 1 / 300, -20.0, 1.6e-5) == pytest.approx(
        9.80665 / 300 * 20.0 * 0.125 / 1.6e-5**2
    )
    assert dl.rayleigh(1e8, 0.7) == pytest.approx(7e7)
    assert dl.biot_heat(50.0, 0.01, 1.0) == pytest.approx(0.5)
    assert dl.biot_mass(1e-4, 0.002, 1e-10, partition=2.0) == pytest.approx(1000.0)
    assert dl.fourier_heat(100.0, 0.01, 1e-7) == pytest.approx(0.1)
    assert dl.fourier_mass(3600.0, 0.001, 1e-11) == pytest.approx(0.036)
    assert dl.graetz(1000.0, 5.0, 0.01, 1.0) == pytest.approx(50.0)
    assert dl.graetz(Re=1000.0, Pr=5.0, diameter=0.01, x=1.0) == pytest.approx(50.0)  # d, not D
    assert dl.archimedes(0.002, 998.0, 1.2, 1e-3) == pytest.approx(
        9.80665 * 0.002**3 * 998.0 * (998.0 - 1.2) / 1e-6
    )


def test_solutal_grashof_combines_buoyancy():
    # the density difference carries thermal and solutal buoyancy together (BSL 2nd ed. Table 22.2-1)
    gr = dl.grashof_solutal(0.1, 1.15, 1.18, 1.6e-5)
    assert gr == pytest.approx(9.80665 * 0.03 / 1.165 * 1e-3 / 1.6e-5**2)
    assert dl.grashof_solutal(0.1, 1.18, 1.15, 1.6e-5) == pytest.approx(gr)


def test_lewis_is_sc_over_pr():
    nu, alpha, D = 1.6e-5, 2.2e-5, 2.6e-5
    assert dl.lewis(alpha, D) == pytest.approx(dl.schmidt(D, nu) / (nu / alpha))


def test_arrays_and_errors():
    out = dl.reynolds(np.array([1.0, 2.0]), 0.1, 1e-5)
    assert isinstance(out, np.ndarray)
    assert out == pytest.approx([1e4, 2e4])
    assert isinstance(dl.reynolds(1.0, 0.1, 1e-5), float)
    with pytest.raises(mt.errors.InputValueError, match=r"^nu="):
        dl.reynolds(1.0, 0.1, -1e-5)
    with pytest.raises(mt.errors.InputValueError, match=r"^dT="):
        dl.grashof_thermal(0.5, 1 / 300, 0.0, 1.6e-5)
    with pytest.raises(mt.errors.InputShapeError):
        dl.reynolds(np.ones(2), np.ones(3), 1e-5)
