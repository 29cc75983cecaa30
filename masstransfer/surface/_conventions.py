r"""Mass-transfer coefficient conventions and overall (two-film) coefficients.

One flux, many conventions.  For a species A crossing a film,

.. math::

    N_A = k_c\,\Delta c_A = k_G\,\Delta p_A = k_y\,\Delta y_A \quad \text{(gas)}, \qquad
    N_A = k_L\,\Delta c_A = k_x\,\Delta x_A \quad \text{(liquid)}

so :math:`k_G = k_c/(RT)`, :math:`k_y = k_c\,c = k_c P/(RT)` and
:math:`k_x = k_L\,c`.  Coefficients for diffusion through a stagnant film
(``k``) and the equimolar, F-type coefficient (``F``) are related by the
log-mean of the non-diffusing component, :math:`F = k\,y_{B,M}`.  All
functions are numbers in, numbers out, in SI (molar fluxes in mol/(m^2 s)).
"""

from __future__ import annotations

import numpy as np

from .._typing import ArrayLike, FloatOrArray
from .._validation import check_positive, check_shapes, finish, guard, in_range
from ..constants import R_GAS

__all__ = [
    "F_from_k",
    "kG_from_kc",
    "kL_from_kx",
    "k_from_F",
    "kc_from_kG",
    "kc_from_ky",
    "kx_from_kL",
    "ky_from_kc",
    "log_mean",
    "mass_basis_from_molar",
    "molar_basis_from_mass",
    "overall_gas_coefficient",
    "overall_liquid_coefficient",
]


@guard
def log_mean(a: ArrayLike, b: ArrayLike) -> FloatOrArray:
    r"""Logarithmic mean :math:`(a-b)/\ln(a/b)`, equal to a where a = b.

    Parameters
    ----------
    a : float or array_like
        First value (positive) [any unit].
    b : float or array_like
        Second value (positive, same unit) [any unit].

    Returns
    -------
    float or numpy.ndarray
        The log mean, in the unit of the inputs.

    Notes
    -----
    Near a = b the ratio form loses precision; a series in
    :math:`\ln(a/b)` is used there.

    References
    ----------
    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., McGraw-Hill,
    Eq. (2.23).

    Examples
    --------
    >>> round(log_mean(0.935, 0.87), 5)
    0.90211

    """
    av = check_positive("a", a)
    bv = check_positive("b", b)
    check_shapes(a=av, b=bv)
    A, B = np.asarray(av), np.asarray(bv)
    u = np.log(A / B)
    small = np.abs(u) < 1e-6
    safe = np.where(small, 1.0, u)
    # (a - b)/ln(a/b) = b (e^u - 1)/u ; series b (1 + u/2 + u^2/6) near u = 0
    out = np.where(small, B * (1 + u / 2 + u * u / 6), (A - B) / safe)
    return finish(out)


@guard
def kG_from_kc(k_c: ArrayLike, T: ArrayLike) -> FloatOrArray:
    """Gas-side coefficient on a partial-pressure basis, :math:`k_G = k_c/(RT)`.

    Parameters
    ----------
    k_c : float or array_like
        Coefficient on a concentration basis [m/s].
    T : float or array_like
        Temperature of the gas film [K].

    Returns
    -------
    float or numpy.ndarray
        k_G [mol/(m^2 s Pa)].

    References
    ----------
    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Table 3.1.

    Examples
    --------
    >>> round(kG_from_kc(0.02, 300.0) * 1e6, 3)
    8.018

    """
    k = check_positive("k_c", k_c)
    Tv = check_positive("T", T)
    check_shapes(k_c=k, T=Tv)
    return finish(k / (R_GAS * Tv))


@guard
def kc_from_kG(k_G: ArrayLike, T: ArrayLike) -> FloatOrArray:
    """Concentration-basis coefficient from k_G, :math:`k_c = k_G RT`.

    Parameters
    ----------
    k_G : float or array_like
        Coefficient on a partial-pressure basis [mol/(m^2 s Pa)].
    T : float or array_like
        Temperature of the gas film [K].

    Returns
    -------
    float or numpy.ndarray
        k_c [m/s].

    References
    ----------
    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Table 3.1.

    Examples
    --------
    >>> round(kc_from_kG(8.018e-6, 300.0), 4)
    0.02

    """
    k = check_positive("k_G", k_G)
    Tv = check_positive("T", T)
    check_shapes(k_G=k, T=Tv)
    return finish(k * R_GAS * Tv)


@guard
def ky_from_kc(k_c: ArrayLike, T: ArrayLike, P: ArrayLike) -> FloatOrArray:
    """Gas-side coefficient on a mole-fraction basis, :math:`k_y = k_c P/(RT)`.

    Parameters
    ----------
    k_c : float or array_like
        Coefficient on a concentration basis [m/s].
    T : float or array_like
        Temperature of the gas film [K].
    P : float or array_like
        Total pressure [Pa].

    Returns
    -------
    float or numpy.ndarray
        k_y [mol/(m^2 s)] per unit mole-fraction difference.

    References
    ----------
    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Table 3.1.

    Examples
    --------
    >>> round(ky_from_kc(0.02, 300.0, 101325.0), 4)
    0.8124

    """
    k = check_positive("k_c", k_c)
    Tv = check_positive("T", T)
    Pv = check_positive("P", P)
    check_shapes(k_c=k, T=Tv, P=Pv)
    return finish(k * Pv / (R_GAS * Tv))


@guard
def kc_from_ky(k_y: ArrayLike, T: ArrayLike, P: ArrayLike) -> FloatOrArray:
    """Concentration-basis coefficient from k_y, :math:`k_c = k_y RT/P`.

    Parameters
    ----------
    k_y : float or array_like
        Coefficient on a mole-fraction basis [mol/(m^2 s)].
    T : float or array_like
        Temperature of the gas film [K].
    P : float or array_like
        Total pressure [Pa].

    Returns
    -------
    float or numpy.ndarray
        k_c [m/s].

    References
    ----------
    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Table 3.1.

    Examples
    --------
    >>> round(kc_from_ky(0.8124, 300.0, 101325.0), 4)
    0.02

    """
    k = check_positive("k_y", k_y)
    Tv = check_positive("T", T)
    Pv = check_positive("P", P)
    check_shapes(k_y=k, T=Tv, P=Pv)
    return finish(k * R_GAS * Tv / Pv)


@guard
def kx_from_kL(k_L: ArrayLike, c_total: ArrayLike) -> FloatOrArray:
    r"""Liquid-side coefficient on a mole-fraction basis, :math:`k_x = k_L c`.

    Parameters
    ----------
    k_L : float or array_like
        Coefficient on a concentration basis [m/s].
    c_total : float or array_like
        Total molar concentration of the liquid, :math:`\rho/M` [mol/m^3].

    Returns
    -------
    float or numpy.ndarray
        k_x [mol/(m^2 s)] per unit mole-fraction difference.

    References
    ----------
    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Table 3.1.

    Examples
    --------
    >>> round(kx_from_kL(2e-5, 55345.0), 4)
    1.1069

    """
    k = check_positive("k_L", k_L)
    c = check_positive("c_total", c_total)
    check_shapes(k_L=k, c_total=c)
    return finish(k * c)


@guard
def kL_from_kx(k_x: ArrayLike, c_total: ArrayLike) -> FloatOrArray:
    """Concentration-basis liquid coefficient from k_x, :math:`k_L = k_x/c`.

    Parameters
    ----------
    k_x : float or array_like
        Coefficient on a mole-fraction basis [mol/(m^2 s)].
    c_total : float or array_like
        Total molar concentration of the liquid [mol/m^3].

    Returns
    -------
    float or numpy.ndarray
        k_L [m/s].

    References
    ----------
    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Table 3.1.

    Examples
    --------
    >>> kL_from_kx(1.1069, 55345.0) * 1e5
    2.0

    """
    k = check_positive("k_x", k_x)
    c = check_positive("c_total", c_total)
    check_shapes(k_x=k, c_total=c)
    return finish(k / c)


@guard
def F_from_k(k: ArrayLike, y_BM: ArrayLike) -> FloatOrArray:
    r"""F-type (equimolar) coefficient from a stagnant-film coefficient, :math:`F = k\,y_{B,M}`.

    Parameters
    ----------
    k : float or array_like
        Coefficient for diffusion through a stagnant film, any basis
        (k_y [mol/(m^2 s)], or k_c [m/s]) [mol/(m^2 s)].
    y_BM : float or array_like
        Log-mean mole fraction of the non-diffusing component across the
        film, 0 < y_BM <= 1 [-] (see :func:`log_mean`).

    Returns
    -------
    float or numpy.ndarray
        F in the basis of ``k`` [mol/(m^2 s)].

    References
    ----------
    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Eq. (3.8)
    and Table 3.1.

    Examples
    --------
    >>> F_from_k(0.5, 0.9)
    0.45

    """
    kv = check_positive("k", k)
    y = check_positive("y_BM", y_BM)
    in_range("y_BM", y, 0.0, 1.0, "pass a mole fraction between 0 and 1")
    check_shapes(k=kv, y_BM=y)
    return finish(kv * y)


@guard
def k_from_F(F: ArrayLike, y_BM: ArrayLike) -> FloatOrArray:
    """Stagnant-film coefficient from an F-type coefficient, :math:`k = F/y_{B,M}`.

    Parameters
    ----------
    F : float or array_like
        F-type coefficient [mol/(m^2 s)].
    y_BM : float or array_like
        Log-mean mole fraction of the non-diffusing component [-].

    Returns
    -------
    float or numpy.ndarray
        k in the basis of ``F`` [mol/(m^2 s)].

    References
    ----------
    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Eq. (3.8).

    Examples
    --------
    >>> k_from_F(0.45, 0.9)
    0.5

    """
    Fv = check_positive("F", F)
    y = check_positive("y_BM", y_BM)
    in_range("y_BM", y, 0.0, 1.0, "pass a mole fraction between 0 and 1")
    check_shapes(F=Fv, y_BM=y)
    return finish(Fv / y)


@guard
def mass_basis_from_molar(k_y: ArrayLike, M_mix: ArrayLike) -> FloatOrArray:
    r"""Mass-fraction-basis coefficient from a mole-fraction-basis one (dilute A).

    .. math:: k_\omega = k_y\,M_{mix}

    so that the mass flux is :math:`n_A = k_\omega\,\Delta\omega_A`
    (exact in the dilute limit, where :math:`\Delta\omega_A = \Delta y_A M_A/M_{mix}`).

    Parameters
    ----------
    k_y : float or array_like
        Coefficient on a mole-fraction basis [mol/(m^2 s)].
    M_mix : float or array_like
        Molar mass of the mixture [kg/mol].

    Returns
    -------
    float or numpy.ndarray
        k_omega [kg/(m^2 s)] per unit mass-fraction difference.

    References
    ----------
    Bird, R. B., Stewart, W. E., & Lightfoot, E. N. (2002). *Transport
    Phenomena*, 2nd ed., Table 22.2-1.

    Examples
    --------
    >>> round(mass_basis_from_molar(0.8124, 0.02897), 5)
    0.02354

    """
    k = check_positive("k_y", k_y)
    M = check_positive("M_mix", M_mix)
    check_shapes(k_y=k, M_mix=M)
    return finish(k * M)


@guard
def molar_basis_from_mass(k_omega: ArrayLike, M_mix: ArrayLike) -> FloatOrArray:
    """Mole-fraction-basis coefficient from a mass-fraction-basis one (dilute A).

    Parameters
    ----------
    k_omega : float or array_like
        Coefficient on a mass-fraction basis [kg/(m^2 s)].
    M_mix : float or array_like
        Molar mass of the mixture [kg/mol].

    Returns
    -------
    float or numpy.ndarray
        k_y [mol/(m^2 s)].

    References
    ----------
    Bird, R. B., Stewart, W. E., & Lightfoot, E. N. (2002). *Transport
    Phenomena*, 2nd ed., Table 22.2-1.

    Examples
    --------
    >>> round(molar_basis_from_mass(0.02354, 0.02897), 4)
    0.8126

    """
    k = check_positive("k_omega", k_omega)
    M = check_positive("M_mix", M_mix)
    check_shapes(k_omega=k, M_mix=M)
    return finish(k / M)


@guard
def overall_gas_coefficient(k_y: ArrayLike, k_x: ArrayLike, m: ArrayLike) -> FloatOrArray:
    r"""Overall gas-phase coefficient of two films in series.

    .. math:: \frac{1}{K_y} = \frac{1}{k_y} + \frac{m}{k_x}

    Parameters
    ----------
    k_y : float or array_like
        Gas-film coefficient [mol/(m^2 s)].
    k_x : float or array_like
        Liquid-film coefficient [mol/(m^2 s)].
    m : float or array_like
        Slope of the equilibrium line, y* = m x [-]; for Henry's law
        :math:`p = H x`, m = H/P (see
        :func:`masstransfer.substances.henry_constant`).

    Returns
    -------
    float or numpy.ndarray
        K_y [mol/(m^2 s)], based on y - y*.

    Notes
    -----
    Holds where the equilibrium line is straight over the range of
    compositions involved (dilute solutions).

    References
    ----------
    Whitman, W. G. (1923). *Chem. Metall. Eng.* 29, 146.
    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Eq. (5.11).

    Examples
    --------
    >>> round(overall_gas_coefficient(1.0, 2.0, 40.0), 5)
    0.04762

    """
    ky = check_positive("k_y", k_y)
    kx = check_positive("k_x", k_x)
    mv = check_positive("m", m)
    check_shapes(k_y=ky, k_x=kx, m=mv)
    return finish(1.0 / (1.0 / ky + mv / kx))


@guard
def overall_liquid_coefficient(k_y: ArrayLike, k_x: ArrayLike, m: ArrayLike) -> FloatOrArray:
    r"""Overall liquid-phase coefficient of two films in series.

    .. math:: \frac{1}{K_x} = \frac{1}{m\,k_y} + \frac{1}{k_x}

    Parameters
    ----------
    k_y : float or array_like
        Gas-film coefficient [mol/(m^2 s)].
    k_x : float or array_like
        Liquid-film coefficient [mol/(m^2 s)].
    m : float or array_like
        Slope of the equilibrium line, y* = m x [-].

    Returns
    -------
    float or numpy.ndarray
        K_x [mol/(m^2 s)], based on x* - x.

    Notes
    -----
    For a sparingly soluble gas (large m) the liquid film controls and
    K_x tends to k_x.

    References
    ----------
    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Eq. (5.12).

    Examples
    --------
    >>> round(overall_liquid_coefficient(1.0, 2.0, 40.0), 4)
    1.9048

    """
    ky = check_positive("k_y", k_y)
    kx = check_positive("k_x", k_x)
    mv = check_positive("m", m)
    check_shapes(k_y=ky, k_x=kx, m=mv)
    return finish(1.0 / (1.0 / (mv * ky) + 1.0 / kx))
