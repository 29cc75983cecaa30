"""Diffusion in solids and polymers: Arrhenius temperature dependence."""

from __future__ import annotations

import numpy as np

from .._typing import ArrayLike, FloatOrArray
from .._validation import check_nonnegative, check_positive, check_shapes, finish, guard
from ..constants import R_GAS
from ..errors import InputValueError

__all__ = ["arrhenius_diffusivity", "arrhenius_parameters"]


@guard
def arrhenius_diffusivity(T: ArrayLike, D0: ArrayLike, Ea: ArrayLike) -> FloatOrArray:
    """Diffusivity in a solid or polymer from an Arrhenius law.

    .. math:: D = D_0 \\exp\\!\\left(-\\frac{E_a}{RT}\\right)

    Parameters
    ----------
    T : float or array_like
        Temperature [K].
    D0 : float or array_like
        Pre-exponential factor [m^2/s].
    Ea : float or array_like
        Activation energy [J/mol] (zero or more).

    Returns
    -------
    float or numpy.ndarray
        Diffusivity [m^2/s].

    Notes
    -----
    D0 and Ea must come from measurements on the material in question; the
    law holds only within the temperature range of those measurements and
    not across a glass transition or phase change.

    References
    ----------
    Crank, J. (1975). *The Mathematics of Diffusion*, 2nd ed., Oxford,
    Chapter 9.

    Examples
    --------
    Carbon in gamma-iron, D0 = 2.3e-5 m^2/s, Ea = 148 kJ/mol, at 1173 K:

    >>> round(arrhenius_diffusivity(1173.0, 2.3e-5, 148e3) * 1e11, 3)
    0.591

    """
    Tv = check_positive("T", T)
    D0v = check_positive("D0", D0)
    Eav = check_nonnegative("Ea", Ea)
    check_shapes(T=Tv, D0=D0v, Ea=Eav)
    return finish(D0v * np.exp(-Eav / (R_GAS * np.asarray(Tv))))


@guard
def arrhenius_parameters(T: ArrayLike, D: ArrayLike) -> tuple[float, float]:
    """Fit D0 and Ea of an Arrhenius law to measured diffusivities.

    Least squares on :math:`\\ln D = \\ln D_0 - E_a/(RT)`.

    Parameters
    ----------
    T : array_like
        Temperatures of the measurements [K] (at least two distinct).
    D : array_like
        Measured diffusivities [m^2/s].

    Returns
    -------
    tuple of float
        ``(D0, Ea)``: pre-exponential factor [m^2/s] and activation energy
        [J/mol].

    Notes
    -----
    A fit in log space weights every point by its relative error.

    References
    ----------
    Crank, J. (1975). *The Mathematics of Diffusion*, 2nd ed., Oxford,
    Chapter 9.

    Examples
    --------
    >>> D0, Ea = arrhenius_parameters([1000.0, 1200.0], [3.9e-12, 8.7e-11])
    >>> round(Ea / 1e3, 1)
    155.0

    """
    Tv = np.atleast_1d(np.asarray(check_positive("T", T), dtype=float))
    Dv = np.atleast_1d(np.asarray(check_positive("D", D), dtype=float))
    if Tv.shape != Dv.shape or Tv.ndim != 1:
        raise InputValueError(
            f"T and D must be 1-D arrays of equal length (got shapes {Tv.shape} and {Dv.shape})"
        )
    if np.unique(Tv).size < 2:
        raise InputValueError("T needs at least two distinct temperatures to fit Ea")
    slope, intercept = np.polyfit(1.0 / Tv, np.log(Dv), 1)
    return float(np.exp(intercept)), float(-slope * R_GAS)
