"""Packed columns: wetted and effective areas, k_L and k_G for random and structured packings.

Numbers in, numbers out, SI, vectorised.  Gas-side coefficients are returned on the
partial-pressure basis k_G [mol/(m^2 s Pa)]; multiply by R T for k_c [m/s].
"""

from __future__ import annotations

import math

import numpy as np

from .._typing import ArrayLike, FloatArray, FloatOrArray
from .._validation import finish, guard
from ..constants import GRAVITY, R_GAS
from ..errors import InputValueError
from ._common import envelope, positives
from ._common import float_array as _arr

__all__ = [
    "billet_schultes_area",
    "billet_schultes_holdup",
    "billet_schultes_k_G",
    "billet_schultes_k_L",
    "billet_schultes_loading_velocity",
    "bravo_rocha_fair_k_G",
    "bravo_rocha_fair_k_L",
    "onda_k_G",
    "onda_k_L",
    "onda_wetted_area",
]

_ONDA = "Onda, Takeuchi & Okumoto (1968)"
_ONDA_ENVELOPE = "Onda et al. (1968) data range (from memory)"
_BS = "Billet & Schultes (1999)"
_BRF = "Bravo, Rocha & Fair (1985)"


@guard
def onda_wetted_area(
    a: ArrayLike,
    sigma_c: ArrayLike,
    sigma: ArrayLike,
    L_mass: ArrayLike,
    mu_L: ArrayLike,
    rho_L: ArrayLike,
) -> FloatOrArray:
    r"""Wetted area of a random packing by Onda, Takeuchi & Okumoto (1968).

    .. math::
        \frac{a_w}{a} = 1 - \exp\left[-1.45\left(\frac{\sigma_c}{\sigma}\right)^{0.75}
        Re_L^{0.1} Fr_L^{-0.05} We_L^{0.2}\right],\quad
        Re_L = \frac{L}{a\mu_L},\ Fr_L = \frac{L^2 a}{\rho_L^2 g},\ We_L = \frac{L^2}{\rho_L\sigma a}

    Parameters
    ----------
    a : float or array_like
        Specific surface area of the packing [m^2/m^3].
    sigma_c : float or array_like
        Critical surface tension of the packing material [N/m].
    sigma : float or array_like
        Surface tension of the liquid [N/m].
    L_mass : float or array_like
        Superficial liquid mass velocity [kg/(m^2 s)].
    mu_L : float or array_like
        Liquid viscosity [Pa s].
    rho_L : float or array_like
        Liquid density [kg/m^3].

    Returns
    -------
    float or numpy.ndarray
        Wetted area a_w [m^2/m^3], taken as the interfacial area.

    Notes
    -----
    Fitted on rings, saddles, spheres and rods of 4-50 mm; envelope
    0.04 < Re_L < 500, 1.2e-8 < We_L < 0.27, 2.5e-9 < Fr_L < 1.8e-2 and
    0.3 < sigma_c/sigma < 2 (from memory); outside it an EnvelopeWarning is
    issued.  Stated accuracy about 20 % (from memory).

    References
    ----------
    Onda, K., Takeuchi, H. & Okumoto, Y. (1968). Mass transfer coefficients
    between gas and liquid phases in packed columns. *J. Chem. Eng. Japan* 1,
    56-62, Eq. (1).

    Examples
    --------
    >>> round(onda_wetted_area(112.6, 0.075, 0.072, 5.0, 1.0e-3, 998.0), 1)
    72.6

    """
    av, sc, s, Lm, mu, rho = positives(
        a=a, sigma_c=sigma_c, sigma=sigma, L_mass=L_mass, mu_L=mu_L, rho_L=rho_L
    )
    A, L, M, R = _arr(av), _arr(Lm), _arr(mu), _arr(rho)
    Re = L / (A * M)
    Fr = L * L * A / (R * R * GRAVITY)
    We = L * L / (R * _arr(s) * A)
    ratio = _arr(sc) / _arr(s)
    method = "onda_wetted_area"
    envelope(method, "Re_L", finish(Re), 0.04, 500.0, _ONDA_ENVELOPE)
    envelope(method, "We_L", finish(We), 1.2e-8, 0.27, _ONDA_ENVELOPE)
    envelope(method, "Fr_L", finish(Fr), 2.5e-9, 1.8e-2, _ONDA_ENVELOPE)
    envelope(method, "sigma_c/sigma", finish(ratio), 0.3, 2.0, _ONDA_ENVELOPE)
    return finish(A * -np.expm1(-1.45 * ratio**0.75 * Re**0.1 * Fr**-0.05 * We**0.2))


@guard
def onda_k_L(
    L_mass: ArrayLike,
    a_w: ArrayLike,
    mu_L: ArrayLike,
    rho_L: ArrayLike,
    D_L: ArrayLike,
    a: ArrayLike,
    nominal_size: ArrayLike,
) -> FloatOrArray:
    r"""Liquid-side coefficient of a random packing by Onda, Takeuchi & Okumoto (1968).

    .. math::
        k_L\left(\frac{\rho_L}{\mu_L g}\right)^{1/3} = 0.0051
        \left(\frac{L}{a_w\mu_L}\right)^{2/3} Sc_L^{-1/2} (a\,d_p)^{0.4}

    Parameters
    ----------
    L_mass : float or array_like
        Superficial liquid mass velocity [kg/(m^2 s)].
    a_w : float or array_like
        Wetted area from :func:`onda_wetted_area` [m^2/m^3].
    mu_L : float or array_like
        Liquid viscosity [Pa s].
    rho_L : float or array_like
        Liquid density [kg/m^3].
    D_L : float or array_like
        Diffusivity of the solute in the liquid [m^2/s].
    a : float or array_like
        Specific surface area of the packing [m^2/m^3].
    nominal_size : float or array_like
        Nominal packing size d_p [m].

    Returns
    -------
    float or numpy.ndarray
        k_L [m/s], based on the wetted area.

    Notes
    -----
    Stated accuracy about 20 % (from memory); envelope as for
    :func:`onda_wetted_area`.

    References
    ----------
    Onda, K., Takeuchi, H. & Okumoto, Y. (1968). *J. Chem. Eng. Japan* 1,
    56-62, Eq. (2).

    Examples
    --------
    >>> round(onda_k_L(5.0, 59.8, 1.0e-3, 998.0, 1.9e-9, 112.6, 0.05) * 1e4, 3)
    1.816

    """
    Lm, aw, mu, rho, D, av, dp = positives(
        L_mass=L_mass, a_w=a_w, mu_L=mu_L, rho_L=rho_L, D_L=D_L, a=a, nominal_size=nominal_size
    )
    M, R = _arr(mu), _arr(rho)
    Sc = M / (R * _arr(D))
    return finish(
        0.0051
        * (_arr(Lm) / (_arr(aw) * M)) ** (2.0 / 3.0)
        * Sc**-0.5
        * (_arr(av) * _arr(dp)) ** 0.4
        * np.cbrt(M * GRAVITY / R)
    )


@guard
def onda_k_G(
    G_mass: ArrayLike,
    a: ArrayLike,
    mu_G: ArrayLike,
    rho_G: ArrayLike,
    D_G: ArrayLike,
    nominal_size: ArrayLike,
    T: ArrayLike,
) -> FloatOrArray:
    r"""Gas-side coefficient of a random packing by Onda, Takeuchi & Okumoto (1968).

    .. math::
        \frac{k_G R T}{a D_G} = C \left(\frac{G}{a\mu_G}\right)^{0.7} Sc_G^{1/3} (a\,d_p)^{-2.0},
        \quad C = 5.23\ (d_p \ge 15\,\mathrm{mm}),\ 2.0\ (d_p < 15\,\mathrm{mm})

    Parameters
    ----------
    G_mass : float or array_like
        Superficial gas mass velocity [kg/(m^2 s)].
    a : float or array_like
        Specific surface area of the packing [m^2/m^3].
    mu_G : float or array_like
        Gas viscosity [Pa s].
    rho_G : float or array_like
        Gas density [kg/m^3].
    D_G : float or array_like
        Diffusivity of the solute in the gas [m^2/s].
    nominal_size : float or array_like
        Nominal packing size d_p [m].
    T : float or array_like
        Gas temperature [K].

    Returns
    -------
    float or numpy.ndarray
        k_G [mol/(m^2 s Pa)], based on the wetted area.

    Notes
    -----
    Stated accuracy about 20 % (from memory).  The constant 2.0 for small
    packings is the one Onda et al. give for sizes below 15 mm.

    References
    ----------
    Onda, K., Takeuchi, H. & Okumoto, Y. (1968). *J. Chem. Eng. Japan* 1,
    56-62, Eq. (3).

    Examples
    --------
    >>> round(onda_k_G(1.8, 112.6, 1.8e-5, 1.2, 1.6e-5, 0.05, 298.15) * 1e5, 3)
    1.36

    """
    Gm, av, mu, rho, D, dp, Tv = positives(
        G_mass=G_mass, a=a, mu_G=mu_G, rho_G=rho_G, D_G=D_G, nominal_size=nominal_size, T=T
    )
    A, M, Dv, d = _arr(av), _arr(mu), _arr(D), _arr(dp)
    C = np.where(d >= 0.015, 5.23, 2.0)
    Sc = M / (_arr(rho) * Dv)
    group = C * (_arr(Gm) / (A * M)) ** 0.7 * np.cbrt(Sc) * (A * d) ** -2.0
    return finish(group * A * Dv / (R_GAS * _arr(Tv)))


@guard
def billet_schultes_k_L(
    u_L: ArrayLike,
    a: ArrayLike,
    void_fraction: ArrayLike,
    C_L: ArrayLike,
    rho_L: ArrayLike,
    mu_L: ArrayLike,
    D_L: ArrayLike,
) -> FloatOrArray:
    r"""Liquid-side coefficient below the loading point by Billet & Schultes (1999).

    .. math::
        k_L = C_L \left(\frac{g\rho_L}{\mu_L}\right)^{1/6}
        \left(\frac{D_L}{d_h}\right)^{1/2}\left(\frac{u_L}{a}\right)^{1/3},
        \quad d_h = \frac{4\varepsilon}{a}

    Parameters
    ----------
    u_L : float or array_like
        Superficial liquid velocity [m/s].
    a : float or array_like
        Specific surface area of the packing [m^2/m^3].
    void_fraction : float or array_like
        Void fraction of the bed [-].
    C_L : float or array_like
        Packing-specific constant (:class:`Packing` ``C_L``) [-].
    rho_L : float or array_like
        Liquid density [kg/m^3].
    mu_L : float or array_like
        Liquid viscosity [Pa s].
    D_L : float or array_like
        Diffusivity of the solute in the liquid [m^2/s].

    Returns
    -------
    float or numpy.ndarray
        k_L [m/s], based on the effective area.

    Notes
    -----
    The form with the hold-up below the loading point substituted.  Billet
    & Schultes report a mean deviation of about 10-15 % on their data base
    of some 30 packings (from memory).

    References
    ----------
    Billet, R. & Schultes, M. (1999). Prediction of mass transfer columns
    with dumped and arranged packings. *Chem. Eng. Technol.* 22, 1-21.

    Examples
    --------
    >>> round(billet_schultes_k_L(0.005, 112.6, 0.951, 1.192, 998.0, 1.0e-3, 1.9e-9) * 1e4, 3)
    1.464

    """
    uL, av, eps, cl, rho, mu, D = positives(
        u_L=u_L, a=a, void_fraction=void_fraction, C_L=C_L, rho_L=rho_L, mu_L=mu_L, D_L=D_L
    )
    _void(eps)
    A = _arr(av)
    d_h = 4.0 * _arr(eps) / A
    return finish(
        _arr(cl)
        * (GRAVITY * _arr(rho) / _arr(mu)) ** (1.0 / 6.0)
        * np.sqrt(_arr(D) / d_h)
        * np.cbrt(_arr(uL) / A)
    )


def _void(eps: FloatOrArray) -> None:
    if np.any(_arr(eps) >= 1.0):
        raise InputValueError(
            f"void_fraction={float(np.max(eps))!r} is not below 1; pass the bed's void fraction (0 to 1)"
        )


def _holdup(uL: FloatArray, A: FloatArray, Ch: FloatArray, rho: FloatArray, mu: FloatArray) -> FloatArray:
    Re = uL * rho / (A * mu)
    Fr = uL * uL * A / GRAVITY
    ah = np.where(Re < 5.0, Ch * Re**0.15 * Fr**0.1, 0.85 * Ch * Re**0.25 * Fr**0.1)
    return np.asarray(np.cbrt(12.0 * mu * A * A * uL / (GRAVITY * rho)) * ah ** (2.0 / 3.0))


@guard
def billet_schultes_holdup(
    u_L: ArrayLike, a: ArrayLike, C_h: ArrayLike, rho_L: ArrayLike, mu_L: ArrayLike
) -> FloatOrArray:
    r"""Liquid hold-up below the loading point by Billet & Schultes (1999).

    .. math::
        h_L = \left(12\frac{\mu_L a^2 u_L}{g\rho_L}\right)^{1/3}\left(\frac{a_h}{a}\right)^{2/3},
        \quad \frac{a_h}{a} = C_h Re_L^{0.15} Fr_L^{0.1}\ (Re_L < 5),\
        0.85\,C_h Re_L^{0.25} Fr_L^{0.1}\ (Re_L \ge 5)

    with :math:`Re_L = u_L\rho_L/(a\mu_L)` and :math:`Fr_L = u_L^2 a/g`.

    Parameters
    ----------
    u_L : float or array_like
        Superficial liquid velocity [m/s].
    a : float or array_like
        Specific surface area of the packing [m^2/m^3].
    C_h : float or array_like
        Packing-specific constant (:class:`Packing` ``C_h``) [-].
    rho_L : float or array_like
        Liquid density [kg/m^3].
    mu_L : float or array_like
        Liquid viscosity [Pa s].

    Returns
    -------
    float or numpy.ndarray
        Liquid hold-up h_L [m^3/m^3].

    Notes
    -----
    Holds below the loading point only; above it the hold-up rises with
    the gas load.

    References
    ----------
    Billet, R. & Schultes, M. (1999). *Chem. Eng. Technol.* 22, 1-21.

    Examples
    --------
    >>> round(billet_schultes_holdup(0.005, 112.6, 0.784, 998.0, 1.0e-3), 4)
    0.0356

    """
    uL, av, ch, rho, mu = positives(u_L=u_L, a=a, C_h=C_h, rho_L=rho_L, mu_L=mu_L)
    return finish(_holdup(_arr(uL), _arr(av), _arr(ch), _arr(rho), _arr(mu)))


@guard
def billet_schultes_k_G(
    u_V: ArrayLike,
    u_L: ArrayLike,
    a: ArrayLike,
    void_fraction: ArrayLike,
    C_V: ArrayLike,
    C_h: ArrayLike,
    rho_V: ArrayLike,
    mu_V: ArrayLike,
    D_V: ArrayLike,
    rho_L: ArrayLike,
    mu_L: ArrayLike,
    T: ArrayLike,
) -> FloatOrArray:
    r"""Gas-side coefficient below the loading point by Billet & Schultes (1999).

    .. math::
        k_G R T = C_V \frac{1}{\sqrt{\varepsilon - h_L}}\sqrt{\frac{a}{d_h}}\,D_V
        \left(\frac{u_V\rho_V}{a\mu_V}\right)^{3/4} Sc_V^{1/3}

    with the hold-up :math:`h_L` of :func:`billet_schultes_holdup`.

    Parameters
    ----------
    u_V : float or array_like
        Superficial gas velocity [m/s].
    u_L : float or array_like
        Superficial liquid velocity [m/s].
    a : float or array_like
        Specific surface area of the packing [m^2/m^3].
    void_fraction : float or array_like
        Void fraction of the bed [-].
    C_V : float or array_like
        Packing-specific constant (:class:`Packing` ``C_V``) [-].
    C_h : float or array_like
        Packing-specific hydraulic constant (:class:`Packing` ``C_h``) [-].
    rho_V : float or array_like
        Gas density [kg/m^3].
    mu_V : float or array_like
        Gas viscosity [Pa s].
    D_V : float or array_like
        Diffusivity of the solute in the gas [m^2/s].
    rho_L : float or array_like
        Liquid density [kg/m^3].
    mu_L : float or array_like
        Liquid viscosity [Pa s].
    T : float or array_like
        Gas temperature [K].

    Returns
    -------
    float or numpy.ndarray
        k_G [mol/(m^2 s Pa)], based on the effective area.

    Notes
    -----
    Mean deviation about 10-15 % on the authors' data base (from memory).

    References
    ----------
    Billet, R. & Schultes, M. (1999). *Chem. Eng. Technol.* 22, 1-21.

    Examples
    --------
    >>> kG = billet_schultes_k_G(1.5, 0.005, 112.6, 0.951, 0.41, 0.784, 1.2, 1.8e-5, 1.6e-5,
    ...                          998.0, 1.0e-3, 298.15)
    >>> round(kG * 1e5, 3)
    2.542

    """
    uV, uL, av, eps, cv, ch, rhoV, muV, D, rhoL, muL, Tv = positives(
        u_V=u_V, u_L=u_L, a=a, void_fraction=void_fraction, C_V=C_V, C_h=C_h, rho_V=rho_V, mu_V=mu_V,
        D_V=D_V, rho_L=rho_L, mu_L=mu_L, T=T,
    )  # fmt: skip
    _void(eps)
    A, E = _arr(av), _arr(eps)
    hL = _holdup(_arr(uL), A, _arr(ch), _arr(rhoL), _arr(muL))
    free = E - hL
    if np.any(free <= 0.0):
        raise InputValueError(
            f"u_L={float(np.max(uL))!r} fills the voids with liquid (hold-up >= void fraction); "
            "the column is flooded: lower the liquid load or choose a more open packing"
        )
    d_h = 4.0 * E / A
    M, R, Dv = _arr(muV), _arr(rhoV), _arr(D)
    Re = _arr(uV) * R / (A * M)
    Sc = M / (R * Dv)
    kc = _arr(cv) / np.sqrt(free) * np.sqrt(A / d_h) * Dv * Re**0.75 * np.cbrt(Sc)
    return finish(kc / (R_GAS * _arr(Tv)))


@guard
def billet_schultes_area(
    u_L: ArrayLike,
    a: ArrayLike,
    void_fraction: ArrayLike,
    rho_L: ArrayLike,
    mu_L: ArrayLike,
    sigma: ArrayLike,
) -> FloatOrArray:
    r"""Effective interfacial area of a packing by Billet & Schultes (1999).

    .. math::
        \frac{a_e}{a} = 1.5\,(a d_h)^{-0.5}\left(\frac{u_L d_h\rho_L}{\mu_L}\right)^{-0.2}
        \left(\frac{u_L^2\rho_L d_h}{\sigma}\right)^{0.75}\left(\frac{u_L^2}{g d_h}\right)^{-0.45}

    Parameters
    ----------
    u_L : float or array_like
        Superficial liquid velocity [m/s].
    a : float or array_like
        Specific surface area of the packing [m^2/m^3].
    void_fraction : float or array_like
        Void fraction of the bed [-].
    rho_L : float or array_like
        Liquid density [kg/m^3].
    mu_L : float or array_like
        Liquid viscosity [Pa s].
    sigma : float or array_like
        Surface tension of the liquid [N/m].

    Returns
    -------
    float or numpy.ndarray
        Effective area a_e [m^2/m^3].  Values above ``a`` are possible at
        high liquid loads (drops and jets); the result is not capped.

    Notes
    -----
    Packing-independent form; stated accuracy about 20 % (from memory).

    References
    ----------
    Billet, R. & Schultes, M. (1999). *Chem. Eng. Technol.* 22, 1-21.

    Examples
    --------
    >>> round(billet_schultes_area(0.005, 112.6, 0.951, 998.0, 1.0e-3, 0.072), 1)
    79.2

    """
    uL, av, eps, rho, mu, s = positives(
        u_L=u_L, a=a, void_fraction=void_fraction, rho_L=rho_L, mu_L=mu_L, sigma=sigma
    )
    _void(eps)
    A, U, R = _arr(av), _arr(uL), _arr(rho)
    d_h = 4.0 * _arr(eps) / A
    Re = U * d_h * R / _arr(mu)
    We = U * U * R * d_h / _arr(s)
    Fr = U * U / (GRAVITY * d_h)
    return finish(A * 1.5 * (A * d_h) ** -0.5 * Re**-0.2 * We**0.75 * Fr**-0.45)


@guard
def billet_schultes_loading_velocity(
    u_L: ArrayLike,
    u_V: ArrayLike,
    a: ArrayLike,
    void_fraction: ArrayLike,
    C_S: ArrayLike,
    rho_L: ArrayLike,
    rho_V: ArrayLike,
    mu_L: ArrayLike,
    mu_V: ArrayLike,
) -> FloatOrArray:
    r"""Gas velocity at the loading point by Billet & Schultes (1999), at the given flow ratio.

    .. math::
        u_{V,S} = C_S\,\Psi^{n_S}
        \left[\frac{\varepsilon}{a^{1/6}}
        - a^{1/2}\left(\frac{12\mu_L u_L}{g\rho_L}\right)^{1/3}\right]
        \left(\frac{12\mu_L u_L}{g\rho_L}\right)^{1/6}\sqrt{\frac{\rho_L}{\rho_V}},\quad
        \Psi = \frac{L}{V}\sqrt{\frac{\rho_V}{\rho_L}}\left(\frac{\mu_L}{\mu_V}\right)^{0.4}

    with :math:`n_S = -0.326` and :math:`C_S` of the packing where the flow
    parameter :math:`(L/V)\sqrt{\rho_V/\rho_L} \le 0.4`, else
    :math:`n_S = -0.723` and :math:`0.695\,C_S(\mu_L/\mu_V)^{0.1588}`; L/V is
    the mass-flow ratio.

    Parameters
    ----------
    u_L : float or array_like
        Superficial liquid velocity [m/s].
    u_V : float or array_like
        Superficial gas velocity, which fixes the flow ratio [m/s].
    a : float or array_like
        Specific surface area of the packing [m^2/m^3].
    void_fraction : float or array_like
        Void fraction of the bed [-].
    C_S : float or array_like
        Packing-specific loading constant (:class:`Packing` ``C_S``) [m^0.5/s].
    rho_L : float or array_like
        Liquid density [kg/m^3].
    rho_V : float or array_like
        Gas density [kg/m^3].
    mu_L : float or array_like
        Liquid viscosity [Pa s].
    mu_V : float or array_like
        Gas viscosity [Pa s].

    Returns
    -------
    float or numpy.ndarray
        Superficial gas velocity at the loading point u_V,S [m/s].

    Notes
    -----
    Evaluated with the operating liquid load and flow ratio.  The mass
    transfer correlations of Billet & Schultes hold below this point; the
    column ratings warn from 80 % of it ("near loading"), common practice.

    References
    ----------
    Billet, R. & Schultes, M. (1999). *Chem. Eng. Technol.* 22, 1-21
    (loading-point equation, from memory).

    Examples
    --------
    >>> uS = billet_schultes_loading_velocity(0.005, 2.5, 112.6, 0.951, 2.725, 998.0, 1.2, 1.0e-3, 1.8e-5)
    >>> round(uS, 2)
    2.09

    """
    uL, uV, av, eps, cs, rhoL, rhoV, muL, muV = positives(
        u_L=u_L, u_V=u_V, a=a, void_fraction=void_fraction, C_S=C_S, rho_L=rho_L, rho_V=rho_V, mu_L=mu_L,
        mu_V=mu_V,
    )  # fmt: skip
    _void(eps)
    A, RL, RV, ML, MV = _arr(av), _arr(rhoL), _arr(rhoV), _arr(muL), _arr(muV)
    film = 12.0 * ML * _arr(uL) / (GRAVITY * RL)
    bracket = _arr(eps) / A ** (1.0 / 6.0) - np.sqrt(A) * np.cbrt(film)
    if np.any(bracket <= 0.0):
        raise InputValueError(
            f"u_L={float(np.max(uL))!r} exceeds the liquid load this packing can carry at any gas "
            "rate (Billet & Schultes loading equation); lower the liquid load or choose a larger packing"
        )
    flow = _arr(uL) * RL / (_arr(uV) * RV) * np.sqrt(RV / RL)
    low = flow <= 0.4
    n = np.where(low, -0.326, -0.723)
    C = np.where(low, _arr(cs), 0.695 * _arr(cs) * (ML / MV) ** 0.1588)
    psi = flow * (ML / MV) ** 0.4
    return finish(C * psi**n * bracket * film ** (1.0 / 6.0) * np.sqrt(RL / RV))


def _brf_velocities(
    uV: FloatArray,
    uL: FloatArray,
    eps: FloatArray,
    S: FloatArray,
    B: FloatArray,
    h: FloatArray,
    theta: FloatArray,
    rhoL: FloatArray,
    muL: FloatArray,
) -> tuple[FloatArray, FloatArray]:
    perimeter = (4.0 * S + 2.0 * B) / (B * h)
    gamma = rhoL * uL / perimeter
    U_Le = 1.5 * gamma / rhoL * np.cbrt(rhoL * rhoL * GRAVITY / (3.0 * muL * gamma))
    U_Ve = uV / (eps * np.sin(np.radians(theta)))
    return U_Ve, U_Le


def _brf_check(S: FloatOrArray, B: FloatOrArray, h: FloatOrArray, theta: FloatOrArray) -> None:
    if np.any(_arr(theta) >= 90.0):
        raise InputValueError(
            f"theta={float(np.max(theta))!r} is not below 90 degrees; pass the flow-channel angle "
            "from the horizontal (45 for 'Y', 60 for 'X' packings)"
        )


@guard
def bravo_rocha_fair_k_L(
    u_L: ArrayLike,
    void_fraction: ArrayLike,
    S: ArrayLike,
    B: ArrayLike,
    h: ArrayLike,
    theta: ArrayLike,
    rho_L: ArrayLike,
    mu_L: ArrayLike,
    D_L: ArrayLike,
) -> FloatOrArray:
    r"""Liquid-side coefficient of a corrugated structured packing by Bravo, Rocha & Fair (1985).

    .. math::
        k_L = 2\sqrt{\frac{D_L U_{Le}}{\pi S}},\quad
        U_{Le} = \frac{3\Gamma}{2\rho_L}\left(\frac{\rho_L^2 g}{3\mu_L\Gamma}\right)^{1/3},\quad
        \Gamma = \frac{\rho_L u_L}{P},\ P = \frac{4S + 2B}{B h}

    Parameters
    ----------
    u_L : float or array_like
        Superficial liquid velocity [m/s].
    void_fraction : float or array_like
        Void fraction of the packing [-].
    S : float or array_like
        Corrugation side [m].
    B : float or array_like
        Corrugation base [m].
    h : float or array_like
        Crimp height [m].
    theta : float or array_like
        Flow-channel angle from the horizontal [deg].
    rho_L : float or array_like
        Liquid density [kg/m^3].
    mu_L : float or array_like
        Liquid viscosity [Pa s].
    D_L : float or array_like
        Diffusivity of the solute in the liquid [m^2/s].

    Returns
    -------
    float or numpy.ndarray
        k_L [m/s]; the model takes the whole packing area as interfacial area.

    Notes
    -----
    Penetration theory with the contact time S/U_Le of a Nusselt film.
    Developed on gauze packings, where the surface is fully wetted; for
    sheet-metal packings it overstates the area (Rocha, Bravo & Fair 1996).
    ``void_fraction`` and ``theta`` are checked for consistency with the gas
    side; they do not enter k_L.

    References
    ----------
    Bravo, J. L., Rocha, J. A. & Fair, J. R. (1985). Mass transfer in gauze
    packings. *Hydrocarbon Processing* 64(1), 91-95.

    Examples
    --------
    >>> round(bravo_rocha_fair_k_L(0.003, 0.9, 0.0089, 0.0127, 0.0064, 60.0, 998.0, 1.0e-3, 1.9e-9) * 1e4, 3)
    1.234

    """
    uL, eps, Sv, Bv, hv, th, rho, mu, D = positives(
        u_L=u_L, void_fraction=void_fraction, S=S, B=B, h=h, theta=theta, rho_L=rho_L, mu_L=mu_L, D_L=D_L
    )
    _void(eps)
    _brf_check(Sv, Bv, hv, th)
    _, U_Le = _brf_velocities(
        _arr(uL), _arr(uL), _arr(eps), _arr(Sv), _arr(Bv), _arr(hv), _arr(th), _arr(rho), _arr(mu)
    )
    return finish(2.0 * np.sqrt(_arr(D) * U_Le / (math.pi * _arr(Sv))))


@guard
def bravo_rocha_fair_k_G(
    u_V: ArrayLike,
    u_L: ArrayLike,
    void_fraction: ArrayLike,
    S: ArrayLike,
    B: ArrayLike,
    h: ArrayLike,
    theta: ArrayLike,
    rho_V: ArrayLike,
    mu_V: ArrayLike,
    D_V: ArrayLike,
    rho_L: ArrayLike,
    mu_L: ArrayLike,
    T: ArrayLike,
) -> FloatOrArray:
    r"""Gas-side coefficient of a corrugated structured packing by Bravo, Rocha & Fair (1985).

    .. math::
        \frac{k_G R T\, S}{D_V} = 0.0338\,Re_V^{0.8} Sc_V^{0.333},\quad
        Re_V = \frac{S\rho_V (U_{Ve} + U_{Le})}{\mu_V},\ U_{Ve} = \frac{u_V}{\varepsilon\sin\theta}

    with the liquid film velocity :math:`U_{Le}` of :func:`bravo_rocha_fair_k_L`.

    Parameters
    ----------
    u_V : float or array_like
        Superficial gas velocity [m/s].
    u_L : float or array_like
        Superficial liquid velocity [m/s].
    void_fraction : float or array_like
        Void fraction of the packing [-].
    S : float or array_like
        Corrugation side [m].
    B : float or array_like
        Corrugation base [m].
    h : float or array_like
        Crimp height [m].
    theta : float or array_like
        Flow-channel angle from the horizontal [deg].
    rho_V : float or array_like
        Gas density [kg/m^3].
    mu_V : float or array_like
        Gas viscosity [Pa s].
    D_V : float or array_like
        Diffusivity of the solute in the gas [m^2/s].
    rho_L : float or array_like
        Liquid density [kg/m^3].
    mu_L : float or array_like
        Liquid viscosity [Pa s].
    T : float or array_like
        Gas temperature [K].

    Returns
    -------
    float or numpy.ndarray
        k_G [mol/(m^2 s Pa)].

    Notes
    -----
    The wetted-wall form of Johnstone & Pigford refitted to gauze-packing
    data; an EnvelopeWarning is issued for F-factors u_V sqrt(rho_V)
    outside 0.5-3.5 Pa^0.5 (the range of the distillation tests, from memory).

    References
    ----------
    Bravo, J. L., Rocha, J. A. & Fair, J. R. (1985). *Hydrocarbon
    Processing* 64(1), 91-95.

    Examples
    --------
    >>> kG = bravo_rocha_fair_k_G(1.5, 0.003, 0.9, 0.0089, 0.0127, 0.0064, 60.0, 1.2, 1.8e-5,
    ...                           1.6e-5, 998.0, 1.0e-3, 298.15)
    >>> round(kG * 1e5, 3)
    0.686

    """
    uV, uL, eps, Sv, Bv, hv, th, rhoV, muV, D, rhoL, muL, Tv = positives(
        u_V=u_V, u_L=u_L, void_fraction=void_fraction, S=S, B=B, h=h, theta=theta, rho_V=rho_V, mu_V=mu_V,
        D_V=D_V, rho_L=rho_L, mu_L=mu_L, T=T,
    )  # fmt: skip
    _void(eps)
    _brf_check(Sv, Bv, hv, th)
    U_Ve, U_Le = _brf_velocities(
        _arr(uV), _arr(uL), _arr(eps), _arr(Sv), _arr(Bv), _arr(hv), _arr(th), _arr(rhoL), _arr(muL)
    )
    R, M, Dv = _arr(rhoV), _arr(muV), _arr(D)
    envelope(
        "bravo_rocha_fair_k_G", "F-factor", finish(_arr(uV) * np.sqrt(R)), 0.5, 3.5, f"{_BRF} (from memory)"
    )
    Re = _arr(Sv) * R * (U_Ve + U_Le) / M
    Sc = M / (R * Dv)
    return finish(0.0338 * Re**0.8 * Sc**0.333 * Dv / _arr(Sv) / (R_GAS * _arr(Tv)))
