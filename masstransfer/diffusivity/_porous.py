"""Diffusion in porous solids: Knudsen, transition (Bosanquet) and effective values."""

from __future__ import annotations

import math

from .._typing import ArrayLike, FloatOrArray
from .._validation import check_positive, check_shapes, finish, guard, in_range
from ..constants import R_GAS

__all__ = ["bosanquet", "effective_diffusivity", "knudsen_diffusivity"]


@guard
def knudsen_diffusivity(T: ArrayLike, pore_diameter: ArrayLike, M: float) -> FloatOrArray:
    r"""Knudsen diffusivity of a gas in a straight cylindrical pore.

    .. math:: D_K = \frac{d_p}{3}\sqrt{\frac{8RT}{\pi M}}

    Parameters
    ----------
    T : float or array_like
        Temperature [K].
    pore_diameter : float or array_like
        Pore diameter [m].
    M : float
        Molar mass of the gas [kg/mol].

    Returns
    -------
    float or numpy.ndarray
        Knudsen diffusivity [m^2/s].

    Notes
    -----
    Holds when the mean free path is much larger than the pore diameter
    (Knudsen number above about 10); combine with the molecular diffusivity
    by :func:`bosanquet` in the transition range.

    References
    ----------
    Knudsen, M. (1909). *Ann. Phys.* 28, 75-130.
    https://doi.org/10.1002/andp.19093330106

    Cussler, E. L. (2009). *Diffusion: Mass Transfer in Fluid Systems*,
    3rd ed., Section 6.4.

    Examples
    --------
    Oxygen in 10 nm pores at 300 K:

    >>> round(knudsen_diffusivity(300.0, 10e-9, 0.032) * 1e6, 3)
    1.485

    """
    Tv = check_positive("T", T)
    d = check_positive("pore_diameter", pore_diameter)
    Mv = check_positive("M", M)
    check_shapes(T=Tv, pore_diameter=d)
    return finish(d / 3.0 * (8.0 * R_GAS * Tv / (math.pi * Mv)) ** 0.5)


@guard
def bosanquet(D_molecular: ArrayLike, D_knudsen: ArrayLike) -> FloatOrArray:
    r"""Combine molecular and Knudsen diffusivities in the transition regime (Bosanquet).

    .. math:: \frac{1}{D} = \frac{1}{D_{AB}} + \frac{1}{D_K}

    Parameters
    ----------
    D_molecular : float or array_like
        Molecular (bulk) diffusivity [m^2/s].
    D_knudsen : float or array_like
        Knudsen diffusivity [m^2/s].

    Returns
    -------
    float or numpy.ndarray
        Pore diffusivity [m^2/s].

    Notes
    -----
    Exact for equimolar counter-diffusion; an approximation otherwise.

    References
    ----------
    Pollard, W. G., & Present, R. D. (1948). On gaseous self-diffusion in
    long capillary tubes. *Phys. Rev.* 73, 762-774.
    https://doi.org/10.1103/PhysRev.73.762

    Examples
    --------
    >>> round(bosanquet(2.0e-5, 2.0e-6) * 1e6, 4)
    1.8182

    """
    Dm = check_positive("D_molecular", D_molecular)
    Dk = check_positive("D_knudsen", D_knudsen)
    check_shapes(D_molecular=Dm, D_knudsen=Dk)
    return finish(1.0 / (1.0 / Dm + 1.0 / Dk))


@guard
def effective_diffusivity(
    D: ArrayLike, porosity: ArrayLike, tortuosity: ArrayLike, constriction: ArrayLike = 1.0
) -> FloatOrArray:
    r"""Effective diffusivity in a porous solid from porosity and tortuosity.

    .. math:: D_e = \frac{\varepsilon\,\delta}{\tau}\,D

    Parameters
    ----------
    D : float or array_like
        Pore diffusivity (molecular, Knudsen or combined) [m^2/s].
    porosity : float or array_like
        Void fraction of the solid, 0 < ε <= 1 [-].
    tortuosity : float or array_like
        Tortuosity factor, τ >= 1 [-] (typically 2-6 for catalyst pellets).
    constriction : float or array_like
        Constriction factor, 0 < δ <= 1 [-].

    Returns
    -------
    float or numpy.ndarray
        Effective diffusivity based on the total cross-section [m^2/s].

    Notes
    -----
    Tortuosity is an empirical factor; measured values for the actual solid
    should be preferred (Satterfield 1970 gives 2-7 for most catalysts).

    References
    ----------
    Satterfield, C. N. (1970). *Mass Transfer in Heterogeneous Catalysis*.
    MIT Press, Chapter 1.

    Examples
    --------
    >>> round(effective_diffusivity(1.0e-6, 0.4, 4.0) * 1e7, 3)
    1.0

    """
    Dv = check_positive("D", D)
    eps = check_positive("porosity", porosity)
    tau = check_positive("tortuosity", tortuosity)
    dl = check_positive("constriction", constriction)
    check_shapes(D=Dv, porosity=eps, tortuosity=tau, constriction=dl)
    in_range("porosity", eps, 0.0, 1.0, "pass a void fraction between 0 and 1")
    in_range("tortuosity", tau, 1.0, math.inf, "pass a tortuosity factor of 1 or more")
    in_range("constriction", dl, 0.0, 1.0, "pass a constriction factor between 0 and 1")
    return finish(eps * dl * Dv / tau)
