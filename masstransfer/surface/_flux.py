"""Fluxes: Fick's law through a layer, films, stagnant films and high-flux corrections.

Numbers in, numbers out, SI: concentrations in mol/m^3, partial pressures
in Pa, molar fluxes in mol/(m^2 s).  A positive flux runs from side 1 to
side 2 (or from the surface into the bulk).
"""

from __future__ import annotations

import numpy as np

from .._typing import ArrayLike, FloatOrArray
from .._validation import (
    as_float,
    check_nonnegative,
    check_positive,
    check_shapes,
    finish,
    guard,
    in_range,
)
from ..constants import R_GAS
from ..errors import InputValueError

__all__ = [
    "ackermann_correction",
    "equimolar_flux",
    "fick_flux",
    "fick_profile",
    "high_flux_correction",
    "high_flux_rate",
    "stagnant_film_flux",
]


@guard
def fick_flux(D: ArrayLike, c1: ArrayLike, c2: ArrayLike, thickness: ArrayLike) -> FloatOrArray:
    r"""Steady diffusive flux through a layer by Fick's first law.

    .. math:: J = D\,\frac{c_1 - c_2}{L}

    Parameters
    ----------
    D : float or array_like
        Diffusivity in the layer [m^2/s].
    c1 : float or array_like
        Concentration at face 1 [mol/m^3] (or kg/m^3 for a mass flux).
    c2 : float or array_like
        Concentration at face 2 [mol/m^3].
    thickness : float or array_like
        Layer thickness L [m].

    Returns
    -------
    float or numpy.ndarray
        Flux from face 1 to face 2 [mol/(m^2 s)] (kg/(m^2 s) for mass
        concentrations).

    Notes
    -----
    Dilute solute, constant D, no bulk flow: the profile is then linear
    (:func:`fick_profile`).  Concentrations are those inside the layer at its
    faces; with a partition or solubility step at a face, convert first.

    References
    ----------
    Fick, A. (1855). Ueber Diffusion. *Ann. Phys.* 170, 59-86.
    https://doi.org/10.1002/andp.18551700105

    Examples
    --------
    >>> fick_flux(1e-9, 10.0, 2.0, 1e-3)
    8e-06

    """
    Dv = check_positive("D", D)
    a = check_nonnegative("c1", c1)
    b = check_nonnegative("c2", c2)
    L = check_positive("thickness", thickness)
    check_shapes(D=Dv, c1=a, c2=b, thickness=L)
    return finish(Dv * (a - b) / L)


@guard
def fick_profile(x: ArrayLike, c1: ArrayLike, c2: ArrayLike, thickness: ArrayLike) -> FloatOrArray:
    r"""Steady concentration profile across a layer: linear between the faces.

    .. math:: c(x) = c_1 + (c_2 - c_1)\,x/L

    Parameters
    ----------
    x : float or array_like
        Position from face 1, 0 <= x <= L [m].
    c1 : float or array_like
        Concentration at face 1 [mol/m^3].
    c2 : float or array_like
        Concentration at face 2 [mol/m^3].
    thickness : float or array_like
        Layer thickness L [m].

    Returns
    -------
    float or numpy.ndarray
        Concentration at x [mol/m^3].

    References
    ----------
    Crank, J. (1975). *The Mathematics of Diffusion*, 2nd ed., Section 4.2.

    Examples
    --------
    >>> fick_profile(0.25e-3, 10.0, 2.0, 1e-3)
    8.0

    """
    xv = check_nonnegative("x", x)
    a = check_nonnegative("c1", c1)
    b = check_nonnegative("c2", c2)
    L = check_positive("thickness", thickness)
    check_shapes(x=xv, c1=a, c2=b, thickness=L)
    if (np.asarray(xv) > np.asarray(L)).any():
        raise InputValueError("x lies beyond the layer; pass 0 <= x <= thickness")
    return finish(a + (b - a) * xv / L)


@guard
def equimolar_flux(
    D: ArrayLike, T: ArrayLike, p1: ArrayLike, p2: ArrayLike, thickness: ArrayLike
) -> FloatOrArray:
    r"""Flux of A in equimolar counter-diffusion through a gas film.

    .. math:: N_A = \frac{D_{AB}}{RTz}\,(p_{A1} - p_{A2})

    Parameters
    ----------
    D : float or array_like
        Binary diffusivity [m^2/s].
    T : float or array_like
        Temperature [K].
    p1 : float or array_like
        Partial pressure of A at plane 1 [Pa].
    p2 : float or array_like
        Partial pressure of A at plane 2 [Pa].
    thickness : float or array_like
        Film thickness z [m].

    Returns
    -------
    float or numpy.ndarray
        N_A [mol/(m^2 s)]; N_B = -N_A.

    References
    ----------
    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Eq. (2.30).

    Examples
    --------
    >>> round(equimolar_flux(1.87e-5, 273.15, 13000.0, 6500.0, 0.002) * 1e3, 3)
    26.76

    """
    Dv = check_positive("D", D)
    Tv = check_positive("T", T)
    a = check_nonnegative("p1", p1)
    b = check_nonnegative("p2", p2)
    z = check_positive("thickness", thickness)
    check_shapes(D=Dv, T=Tv, p1=a, p2=b, thickness=z)
    return finish(Dv * (a - b) / (R_GAS * Tv * z))


@guard
def stagnant_film_flux(
    D: ArrayLike, T: ArrayLike, P: ArrayLike, p1: ArrayLike, p2: ArrayLike, thickness: ArrayLike
) -> FloatOrArray:
    r"""Flux of A diffusing through a stagnant (non-diffusing) gas B.

    .. math::

        N_A = \frac{D_{AB} P}{RTz}\,\ln\frac{P - p_{A2}}{P - p_{A1}}
            = \frac{D_{AB} P}{RTz\,p_{B,M}}\,(p_{A1} - p_{A2})

    Parameters
    ----------
    D : float or array_like
        Binary diffusivity [m^2/s].
    T : float or array_like
        Temperature [K].
    P : float or array_like
        Total pressure [Pa].
    p1 : float or array_like
        Partial pressure of A at plane 1, below P [Pa].
    p2 : float or array_like
        Partial pressure of A at plane 2, below P [Pa].
    thickness : float or array_like
        Film thickness z [m].

    Returns
    -------
    float or numpy.ndarray
        N_A [mol/(m^2 s)] (N_B = 0).

    References
    ----------
    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Eqs. (2.21)
    and (2.25), Illustration 2.1.

    Examples
    --------
    Oxygen through stagnant carbon monoxide (Treybal, Illustration 2.1):

    >>> round(stagnant_film_flux(1.87e-5, 273.15, 1e5, 13000.0, 6500.0, 0.002), 5)
    0.02966

    """
    Dv = check_positive("D", D)
    Tv = check_positive("T", T)
    Pv = check_positive("P", P)
    a = check_nonnegative("p1", p1)
    b = check_nonnegative("p2", p2)
    z = check_positive("thickness", thickness)
    check_shapes(D=Dv, T=Tv, P=Pv, p1=a, p2=b, thickness=z)
    if (np.asarray(a) >= np.asarray(Pv)).any() or (np.asarray(b) >= np.asarray(Pv)).any():
        raise InputValueError(
            "p1 and p2 must stay below the total pressure P (the carrier cannot vanish); "
            "pass partial pressures < P"
        )
    return finish(Dv * Pv / (R_GAS * Tv * z) * np.log((Pv - b) / (Pv - a)))


@guard
def high_flux_correction(phi: ArrayLike) -> FloatOrArray:
    r"""Film-theory correction of a low-flux coefficient for a finite total flux.

    .. math:: \frac{k^\bullet}{k} = \frac{\phi}{e^{\phi} - 1},
        \qquad \phi = \frac{N_{total}}{k}

    Parameters
    ----------
    phi : float or array_like
        Rate factor: total molar flux through the film (positive away from
        the surface, i.e. blowing) over the low-flux molar coefficient [-].

    Returns
    -------
    float or numpy.ndarray
        Ratio of the high-flux to the low-flux coefficient [-]; 1 at phi = 0,
        below 1 for blowing (evaporation), above 1 for suction (condensation).

    Notes
    -----
    Film theory; the boundary-layer and penetration corrections differ by
    a few per cent (Bird, Stewart & Lightfoot, Section 22.8).  The same
    function gives the Ackermann correction of the heat-transfer
    coefficient with :math:`\phi_T = N c_p/h` (:func:`ackermann_correction`).

    References
    ----------
    Bird, R. B., Stewart, W. E., & Lightfoot, E. N. (2002). *Transport
    Phenomena*, 2nd ed., Eq. (22.8-23).

    Examples
    --------
    >>> round(high_flux_correction(0.5), 4)
    0.7707

    """
    p = as_float("phi", phi)
    arr = np.asarray(p, dtype=float)
    if not np.isfinite(arr).all():
        raise InputValueError("phi is not finite; pass a finite rate factor")
    small = np.abs(arr) < 1e-8
    safe = np.where(small, 1.0, arr)
    out = np.where(small, 1.0 - arr / 2.0, safe / np.expm1(safe))
    return finish(out)


@guard
def ackermann_correction(N: ArrayLike, cp_molar: ArrayLike, h: ArrayLike) -> FloatOrArray:
    r"""Ackermann correction of a heat-transfer coefficient for mass transfer through it.

    .. math:: \frac{h^\bullet}{h} = \frac{\phi_T}{e^{\phi_T} - 1},
        \qquad \phi_T = \frac{N\,\tilde c_{p}}{h}

    Parameters
    ----------
    N : float or array_like
        Molar flux of the transferring vapour, positive away from the
        surface [mol/(m^2 s)].
    cp_molar : float or array_like
        Molar heat capacity of the transferring vapour [J/(mol K)].
    h : float or array_like
        Low-flux heat-transfer coefficient [W/(m^2 K)].

    Returns
    -------
    float or numpy.ndarray
        Ratio h*/h of the sensible heat reaching the surface [-].

    References
    ----------
    Ackermann, G. (1937). Waermeuebergang und molekulare Stoffuebertragung
    im gleichen Feld bei grossen Temperatur- und Partialdruckdifferenzen.
    *VDI-Forschungsheft* 382.

    Examples
    --------
    >>> round(ackermann_correction(0.05, 34.0, 30.0), 4)
    0.9719

    """
    Nv = as_float("N", N)
    cp = check_positive("cp_molar", cp_molar)
    hv = check_positive("h", h)
    check_shapes(N=Nv, cp_molar=cp, h=hv)
    return high_flux_correction(np.asarray(Nv) * cp / hv)


@guard
def high_flux_rate(
    F: ArrayLike, y_surface: ArrayLike, y_bulk: ArrayLike, flux_ratio: ArrayLike = 1.0
) -> FloatOrArray:
    r"""Flux of A across a film at high transfer rates (film theory).

    .. math:: N_A = \frac{N_A}{\sum N}\,F\,\ln\frac{N_A/\sum N - y_{A,b}}{N_A/\sum N - y_{A,s}}

    With ``flux_ratio`` = 1 (only A crosses, the carrier is stagnant) this
    is :math:`N_A = F\ln[(1-y_{A,b})/(1-y_{A,s})]`.

    Parameters
    ----------
    F : float or array_like
        Low-flux (equimolar, F-type) coefficient, e.g. :math:`k_c c`
        [mol/(m^2 s)].
    y_surface : float or array_like
        Mole fraction of A at the surface [-].
    y_bulk : float or array_like
        Mole fraction of A in the bulk [-].
    flux_ratio : float or array_like
        :math:`N_A/(N_A + N_B)` [-]; 1 for a stagnant carrier.

    Returns
    -------
    float or numpy.ndarray
        N_A [mol/(m^2 s)], positive from the surface to the bulk.

    Notes
    -----
    As the mole fractions go to zero this tends to the low-flux
    :math:`F(y_s - y_b)`.  For a stagnant carrier (``flux_ratio`` = 1) the
    ratio of the two is

    .. math:: \frac{N_A}{F\,(y_{A,s} - y_{A,b})} = \frac{1}{y_{B,M}},
        \qquad y_{B,M} = \frac{y_{B,b} - y_{B,s}}{\ln(y_{B,b}/y_{B,s})}

    the log-mean carrier fraction: the bulk-flow correction is already in the
    result, so do not divide by :math:`y_{B,M}` again.  F must be the low-flux
    (F-type) coefficient; a coefficient already corrected for the bulk flow
    (a Sherwood number correlated as Sh p_BM/P, for example) would be
    corrected twice.  :func:`high_flux_correction` gives the same film theory
    as a ratio of coefficients in terms of the rate factor.

    References
    ----------
    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Eq. (3.1).

    Examples
    --------
    >>> round(high_flux_rate(1.0, 0.5, 0.0), 4)
    0.6931

    """
    Fv = check_positive("F", F)
    ys = check_nonnegative("y_surface", y_surface)
    yb = check_nonnegative("y_bulk", y_bulk)
    r = check_positive("flux_ratio", flux_ratio)
    check_shapes(F=Fv, y_surface=ys, y_bulk=yb, flux_ratio=r)
    in_range("y_surface", ys, 0.0, 1.0, "pass a mole fraction between 0 and 1")
    in_range("y_bulk", yb, 0.0, 1.0, "pass a mole fraction between 0 and 1")
    num = np.asarray(r) - yb
    den = np.asarray(r) - ys
    if (num <= 0).any() or (den <= 0).any():
        raise InputValueError(
            "flux_ratio must exceed both mole fractions (for a stagnant carrier, flux_ratio=1 and "
            "y < 1); check y_surface, y_bulk and flux_ratio"
        )
    return finish(r * Fv * np.log(num / den))
