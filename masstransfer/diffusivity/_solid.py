"""Diffusion in solids and polymers: Arrhenius temperature dependence."""

from __future__ import annotations

import math
from dataclasses import dataclass

import numpy as np

from .._frozen import FrozenResult
from .._typing import ArrayLike, FloatOrArray
from .._validation import check_finite, check_nonnegative, check_positive, check_shapes, finish, guard, scalar
from ..constants import R_GAS
from ..errors import InputValueError

__all__ = ["ArrheniusFit", "arrhenius_diffusivity", "arrhenius_parameters"]


@dataclass(frozen=True, eq=False)
class ArrheniusFit(FrozenResult):
    """Result of :func:`arrhenius_parameters`.

    Attributes
    ----------
    D0 : float
        Pre-exponential factor [m^2/s].
    Ea : float
        Activation energy [J/mol].
    Ea_stderr : float or None
        Standard error of Ea [J/mol]; None with only two temperatures.
    ln_D0_stderr : float or None
        Standard error of ln D0 [-]; None with only two temperatures.
    n_points : int
        Number of measurements fitted.

    """

    D0: float
    Ea: float
    Ea_stderr: float | None
    ln_D0_stderr: float | None
    n_points: int


@guard
def arrhenius_diffusivity(
    T: ArrayLike, D0: ArrayLike, Ea: ArrayLike, T_ref: float | None = None
) -> FloatOrArray:
    r"""Diffusivity (or solubility, or permeability) from an Arrhenius law.

    .. math::

        D = D_0 \exp\!\left(-\frac{E_a}{RT}\right)
        \quad\text{or, with } T_{ref}:\quad
        D = D_0 \exp\!\left[-\frac{E_a}{R}\left(\frac{1}{T}-\frac{1}{T_{ref}}\right)\right]

    Parameters
    ----------
    T : float or array_like
        Temperature [K].
    D0 : float or array_like
        Pre-exponential factor [m^2/s]; with ``T_ref``, the value at T_ref
        [its unit: m^2/s for D, mol/(m^3 Pa) for a solubility coefficient,
        mol/(m s Pa) for a permeability].
    Ea : float or array_like
        Activation energy [J/mol]: zero or more for a diffusivity; with
        ``T_ref`` any sign (a heat of solution is often negative; for a
        permeability E_P = E_D + Delta H_S).
    T_ref : float, optional
        Reference temperature [K] at which the value is ``D0``.

    Returns
    -------
    float or numpy.ndarray
        The value at T [m^2/s, or the unit of D0].

    Notes
    -----
    D0 and Ea must come from measurements on the material in question; the
    law holds only within the temperature range of those measurements and
    not across a glass transition or phase change.  This is the library's
    one Arrhenius implementation (barriers use it for S and permeability).

    References
    ----------
    Crank, J. (1975). *The Mathematics of Diffusion*, 2nd ed., Oxford,
    Chapter 9 and Section 9.1.

    Examples
    --------
    Carbon in gamma-iron, D0 = 2.3e-5 m^2/s, Ea = 148 kJ/mol, at 1173 K:

    >>> round(arrhenius_diffusivity(1173.0, 2.3e-5, 148e3) * 1e11, 3)
    0.591

    A permeability known at 25 C, E_P = 40 kJ/mol, at 40 C:

    >>> round(arrhenius_diffusivity(313.15, 1.0, 40e3, T_ref=298.15), 3)
    2.167

    """
    Tv = check_positive("T", T)
    D0v = check_positive("D0", D0)
    if T_ref is None:
        Eav = check_nonnegative("Ea", Ea)
        check_shapes(T=Tv, D0=D0v, Ea=Eav)
        return finish(D0v * np.exp(-Eav / (R_GAS * np.asarray(Tv))))
    T0 = float(check_positive("T_ref", scalar("T_ref", T_ref)))
    Eav = check_finite("Ea", Ea)
    check_shapes(T=Tv, D0=D0v, Ea=Eav)
    return finish(D0v * np.exp(-np.asarray(Eav) / R_GAS * (1.0 / np.asarray(Tv) - 1.0 / T0)))


@guard
def arrhenius_parameters(T: ArrayLike, D: ArrayLike) -> ArrheniusFit:
    r"""Fit D0 and Ea of an Arrhenius law to measured diffusivities.

    Least squares on :math:`\ln D = \ln D_0 - E_a/(RT)`.

    Parameters
    ----------
    T : array_like
        Temperatures of the measurements [K] (at least two distinct).
    D : array_like
        Measured diffusivities [m^2/s].

    Returns
    -------
    ArrheniusFit
        D0 [m^2/s], Ea [J/mol] and, from three points on, their standard
        errors.

    Notes
    -----
    A fit in log space weights every point by its relative error.

    References
    ----------
    Crank, J. (1975). *The Mathematics of Diffusion*, 2nd ed., Oxford,
    Chapter 9.

    Examples
    --------
    >>> fit = arrhenius_parameters([1000.0, 1200.0], [3.9e-12, 8.7e-11])
    >>> round(fit.Ea / 1e3, 1)
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
    x, y = 1.0 / Tv, np.log(Dv)
    A = np.vstack([x, np.ones_like(x)]).T
    coef, *_ = np.linalg.lstsq(A, y, rcond=None)
    slope, intercept = float(coef[0]), float(coef[1])
    n = int(Tv.size)
    Ea_se: float | None = None
    lnD0_se: float | None = None
    if n > 2:
        resid = y - A @ coef
        s2 = float(resid @ resid) / (n - 2)
        cov = s2 * np.linalg.inv(A.T @ A)
        Ea_se = math.sqrt(max(float(cov[0, 0]), 0.0)) * R_GAS
        lnD0_se = math.sqrt(max(float(cov[1, 1]), 0.0))
    return ArrheniusFit(
        D0=math.exp(intercept), Ea=-slope * R_GAS, Ea_stderr=Ea_se, ln_D0_stderr=lnD0_se, n_points=n
    )
