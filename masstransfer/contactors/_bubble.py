"""Bubble columns and stirred tanks: gas hold-up, k_L a, bubble and particle k_L.

Numbers in, numbers out, SI, vectorised.
"""

from __future__ import annotations

import numpy as np

from .._typing import ArrayLike, FloatArray, FloatOrArray
from .._validation import check_positive, check_shapes, finish, guard
from ..constants import GRAVITY
from ..errors import InputTypeError, InputValueError
from ..surface import archimedes, correlation
from ._common import envelope
from ._common import float_array as _arr

__all__ = [
    "akita_yoshida_holdup",
    "akita_yoshida_kla",
    "calderbank_bubble_k_L",
    "sano_particle_k_L",
    "vant_riet_kla",
]

_AY = "Akita & Yoshida (1973) data range (from memory)"
_VR = "van't Riet (1979) data range"


def _solve_holdup(rhs: FloatArray) -> FloatArray:
    """Solve eps/(1-eps)^4 = rhs for eps in (0, 1) by bisection on the whole array at once."""
    lo = np.zeros_like(rhs)
    hi = np.ones_like(rhs)
    for _ in range(60):  # 60 halvings: below 1e-18, the resolution of a double near 1
        mid = 0.5 * (lo + hi)
        high = mid / (1.0 - mid) ** 4 > rhs
        hi = np.where(high, mid, hi)
        lo = np.where(high, lo, mid)
    return np.asarray(0.5 * (lo + hi), dtype=float)


def _ay_groups(
    d_c: FloatArray,
    rho: FloatArray,
    mu: FloatArray,
    sigma: FloatArray,
) -> tuple[FloatArray, FloatArray]:
    nu = mu / rho
    Bo = GRAVITY * d_c * d_c * rho / sigma
    Ga = GRAVITY * d_c**3 / (nu * nu)
    return Bo, Ga


def _check_bool(name: str, value: object) -> bool:
    if not isinstance(value, bool | np.bool_):
        raise InputTypeError(f"{name}={value!r} is a {type(value).__name__}, not True or False")
    return bool(value)


@guard
def akita_yoshida_holdup(
    u_G: ArrayLike,
    diameter: ArrayLike,
    rho_L: ArrayLike,
    mu_L: ArrayLike,
    sigma: ArrayLike,
    electrolyte: bool = False,
) -> FloatOrArray:
    r"""Gas hold-up of a bubble column by Akita & Yoshida (1973).

    .. math::
        \frac{\varepsilon_G}{(1-\varepsilon_G)^4} = C\,Bo^{1/8}\,Ga^{1/12}\,\frac{u_G}{\sqrt{g d_c}},
        \quad Bo = \frac{g d_c^2\rho_L}{\sigma},\ Ga = \frac{g d_c^3}{\nu_L^2}

    with C = 0.20 for pure liquids and non-electrolyte solutions and 0.25 for
    electrolyte solutions; solved for the hold-up by bisection.

    Parameters
    ----------
    u_G : float or array_like
        Superficial gas velocity [m/s].
    diameter : float or array_like
        Column diameter d_c [m].
    rho_L : float or array_like
        Liquid density [kg/m^3].
    mu_L : float or array_like
        Liquid viscosity [Pa s].
    sigma : float or array_like
        Surface tension [N/m].
    electrolyte : bool
        True for electrolyte solutions (non-coalescing).

    Returns
    -------
    float or numpy.ndarray
        Gas hold-up epsilon_G [-].

    Notes
    -----
    Envelope: column diameter 0.15-0.6 m, u_G 0.003-0.4 m/s (from memory);
    an EnvelopeWarning is issued outside it.  For larger columns the
    authors advise the value at 0.6 m.  Accuracy about 20 % (from memory).

    References
    ----------
    Akita, K. & Yoshida, F. (1973). Gas holdup and volumetric mass transfer
    coefficient in bubble columns. *Ind. Eng. Chem. Process Des. Dev.* 12,
    76-80.

    Examples
    --------
    >>> round(akita_yoshida_holdup(0.05, 0.3, 998.0, 1.0e-3, 0.072), 4)
    0.1074

    """
    uG = check_positive("u_G", u_G)
    Dc = check_positive("diameter", diameter)
    rho = check_positive("rho_L", rho_L)
    mu = check_positive("mu_L", mu_L)
    s = check_positive("sigma", sigma)
    ionic = _check_bool("electrolyte", electrolyte)
    check_shapes(u_G=uG, diameter=Dc, rho_L=rho, mu_L=mu, sigma=s)
    envelope("akita_yoshida_holdup", "diameter", Dc, 0.15, 0.6, _AY)
    envelope("akita_yoshida_holdup", "u_G", uG, 0.003, 0.4, _AY)
    D = _arr(Dc)
    Bo, Ga = _ay_groups(D, _arr(rho), _arr(mu), _arr(s))
    rhs = (0.25 if ionic else 0.20) * Bo**0.125 * Ga ** (1.0 / 12.0) * _arr(uG) / np.sqrt(GRAVITY * D)
    return finish(_solve_holdup(np.asarray(rhs, dtype=float)))


@guard
def akita_yoshida_kla(
    u_G: ArrayLike,
    diameter: ArrayLike,
    rho_L: ArrayLike,
    mu_L: ArrayLike,
    sigma: ArrayLike,
    D_L: ArrayLike,
    holdup: ArrayLike | None = None,
) -> FloatOrArray:
    r"""Volumetric liquid-side coefficient of a bubble column by Akita & Yoshida (1973).

    .. math::
        \frac{k_L a\,d_c^2}{D_L} = 0.6\,Sc_L^{0.5}\,Bo^{0.62}\,Ga^{0.31}\,\varepsilon_G^{1.1}

    Parameters
    ----------
    u_G : float or array_like
        Superficial gas velocity [m/s].
    diameter : float or array_like
        Column diameter d_c [m].
    rho_L : float or array_like
        Liquid density [kg/m^3].
    mu_L : float or array_like
        Liquid viscosity [Pa s].
    sigma : float or array_like
        Surface tension [N/m].
    D_L : float or array_like
        Diffusivity of the solute in the liquid [m^2/s].
    holdup : float or array_like, optional
        Measured gas hold-up [-]; by default :func:`akita_yoshida_holdup`
        for a non-electrolyte.

    Returns
    -------
    float or numpy.ndarray
        k_L a [1/s], per unit volume of aerated liquid.

    Notes
    -----
    Envelope as for :func:`akita_yoshida_holdup`.  Fitted on
    sieve-plate and single-nozzle spargers; accuracy about 20-30 % (from memory).

    References
    ----------
    Akita, K. & Yoshida, F. (1973). *Ind. Eng. Chem. Process Des. Dev.* 12,
    76-80.

    Examples
    --------
    >>> round(akita_yoshida_kla(0.05, 0.3, 998.0, 1.0e-3, 0.072, 2.0e-9), 4)
    0.0305

    """
    uG = check_positive("u_G", u_G)
    Dc = check_positive("diameter", diameter)
    rho = check_positive("rho_L", rho_L)
    mu = check_positive("mu_L", mu_L)
    s = check_positive("sigma", sigma)
    D = check_positive("D_L", D_L)
    check_shapes(u_G=uG, diameter=Dc, rho_L=rho, mu_L=mu, sigma=s, D_L=D)
    if holdup is None:
        eps = _arr(akita_yoshida_holdup(uG, Dc, rho, mu, s))
    else:
        e = check_positive("holdup", holdup)
        if np.any(_arr(e) >= 1.0):
            raise InputValueError(f"holdup={float(np.max(e))!r} is not below 1; pass a gas volume fraction")
        check_shapes(u_G=uG, holdup=e)
        eps = _arr(e)
        envelope("akita_yoshida_kla", "diameter", Dc, 0.15, 0.6, _AY)
        envelope("akita_yoshida_kla", "u_G", uG, 0.003, 0.4, _AY)
    Dcv, R, M = _arr(Dc), _arr(rho), _arr(mu)
    Bo, Ga = _ay_groups(Dcv, R, M, _arr(s))
    Sc = M / (R * _arr(D))
    return finish(0.6 * Sc**0.5 * Bo**0.62 * Ga**0.31 * eps**1.1 * _arr(D) / (Dcv * Dcv))


@guard
def vant_riet_kla(power_per_volume: ArrayLike, u_G: ArrayLike, coalescing: bool = True) -> FloatOrArray:
    r"""Volumetric coefficient of an aerated stirred tank by van't Riet (1979).

    .. math::
        k_L a = 0.026\,(P/V)^{0.4} u_G^{0.5}\ \text{(coalescing, pure water)},\qquad
        k_L a = 0.002\,(P/V)^{0.7} u_G^{0.2}\ \text{(non-coalescing, electrolytes)}

    Parameters
    ----------
    power_per_volume : float or array_like
        Gassed power input per unit liquid volume P/V [W/m^3].
    u_G : float or array_like
        Superficial gas velocity [m/s].
    coalescing : bool
        True for coalescing media (water), False for ionic solutions.

    Returns
    -------
    float or numpy.ndarray
        k_L a [1/s] for oxygen-like solutes near 20 C.

    Notes
    -----
    Valid for 500 < P/V < 10000 W/m^3 and volumes of 0.002-2.6 m^3
    (coalescing) or 0.002-4.4 m^3 (non-coalescing); accuracy within
    20-40 % whatever the impeller.  An EnvelopeWarning is issued outside the
    P/V range.

    References
    ----------
    van't Riet, K. (1979). Review of measuring methods and results in
    nonviscous gas-liquid mass transfer in stirred vessels. *Ind. Eng. Chem.
    Process Des. Dev.* 18, 357-364.

    Examples
    --------
    >>> round(vant_riet_kla(1000.0, 0.01), 4)
    0.0412

    """
    pv = check_positive("power_per_volume", power_per_volume)
    uG = check_positive("u_G", u_G)
    coal = _check_bool("coalescing", coalescing)
    check_shapes(power_per_volume=pv, u_G=uG)
    envelope("vant_riet_kla", "power_per_volume", pv, 500.0, 10000.0, _VR)
    if coal:
        return finish(0.026 * _arr(pv) ** 0.4 * np.sqrt(_arr(uG)))
    return finish(0.002 * _arr(pv) ** 0.7 * _arr(uG) ** 0.2)


@guard
def calderbank_bubble_k_L(
    bubble_diameter: ArrayLike, D_L: ArrayLike, rho_L: ArrayLike, mu_L: ArrayLike, rho_G: ArrayLike
) -> FloatOrArray:
    r"""Liquid-side coefficient of a swarm of bubbles by Calderbank & Moo-Young (1961).

    .. math::
        Sh = 0.31\,Ar^{1/3} Sc^{1/3}\ (d_b < 2.5\,\mathrm{mm}),\qquad
        Sh = 0.42\,Ar^{1/3} Sc^{1/2}\ (d_b \ge 2.5\,\mathrm{mm})

    evaluated through the catalogue records
    ``stirred-vessel-calderbank-small-bubbles`` and ``-large-bubbles``
    (:func:`masstransfer.surface.correlation`), with :math:`k_L = Sh\,D_L/d_b`.

    Parameters
    ----------
    bubble_diameter : float or array_like
        Bubble (Sauter mean) diameter [m].
    D_L : float or array_like
        Diffusivity of the solute in the liquid [m^2/s].
    rho_L : float or array_like
        Liquid density [kg/m^3].
    mu_L : float or array_like
        Liquid viscosity [Pa s].
    rho_G : float or array_like
        Gas density [kg/m^3].

    Returns
    -------
    float or numpy.ndarray
        k_L [m/s].

    Notes
    -----
    The records' envelopes apply (Sc >= 100); accuracy about 20-30 %.  The
    step at 2.5 mm is the authors' own: rigid small bubbles, mobile large
    ones.

    References
    ----------
    Calderbank, P. H. & Moo-Young, M. B. (1961). The continuous phase heat
    and mass-transfer properties of dispersions. *Chem. Eng. Sci.* 16, 39-54.

    Examples
    --------
    >>> round(calderbank_bubble_k_L(0.004, 2.0e-9, 998.0, 1.0e-3, 1.2) * 1e4, 3)
    4.017

    """
    d = check_positive("bubble_diameter", bubble_diameter)
    D = check_positive("D_L", D_L)
    rhoL = check_positive("rho_L", rho_L)
    mu = check_positive("mu_L", mu_L)
    rhoG = check_positive("rho_G", rho_G)
    check_shapes(bubble_diameter=d, D_L=D, rho_L=rhoL, mu_L=mu, rho_G=rhoG)
    if np.any(_arr(rhoG) >= _arr(rhoL)):
        raise InputValueError("rho_G is not below rho_L; a bubble rises only in a denser liquid")
    Ar = archimedes(d, rhoL, rhoG, mu)
    Sc = finish(_arr(mu) / (_arr(rhoL) * _arr(D)))
    small = correlation("stirred-vessel-calderbank-small-bubbles").sherwood(Ar=Ar, Sc=Sc)
    large = correlation("stirred-vessel-calderbank-large-bubbles").sherwood(Ar=Ar, Sc=Sc)
    Sh = np.where(_arr(d) < 2.5e-3, _arr(small), _arr(large))
    return finish(Sh * _arr(D) / _arr(d))


@guard
def sano_particle_k_L(
    epsilon: ArrayLike, particle_diameter: ArrayLike, nu_L: ArrayLike, D_L: ArrayLike
) -> FloatOrArray:
    r"""Solid-liquid coefficient of suspended particles in a stirred tank by Sano et al. (1974).

    .. math::
        Sh = \frac{k_L d_p}{D_L} = 2 + 0.4\left(\frac{\varepsilon d_p^4}{\nu_L^3}\right)^{1/4} Sc^{1/3}

    Parameters
    ----------
    epsilon : float or array_like
        Mean specific power input (energy dissipation rate) [W/kg].
    particle_diameter : float or array_like
        Particle diameter d_p [m].
    nu_L : float or array_like
        Kinematic viscosity of the liquid [m^2/s].
    D_L : float or array_like
        Diffusivity of the solute in the liquid [m^2/s].

    Returns
    -------
    float or numpy.ndarray
        k_L [m/s] between particle surface and liquid.

    Notes
    -----
    Kolmogorov-scale form for spheres in fully suspended, turbulent
    agitation (from memory); a shape factor below 1 applies to irregular
    particles.  An EnvelopeWarning is issued for Sc below 100 (gases).
    Accuracy about 20 % (from memory).

    References
    ----------
    Sano, Y., Yamaguchi, N. & Adachi, T. (1974). Mass transfer coefficients
    for suspended particles in agitated vessels and bubble columns. *J. Chem.
    Eng. Japan* 7, 255-261.

    Examples
    --------
    >>> round(sano_particle_k_L(0.5, 2.0e-4, 1.0e-6, 1.0e-9) * 1e5, 3)
    11.637

    """
    e = check_positive("epsilon", epsilon)
    d = check_positive("particle_diameter", particle_diameter)
    nu = check_positive("nu_L", nu_L)
    D = check_positive("D_L", D_L)
    check_shapes(epsilon=e, particle_diameter=d, nu_L=nu, D_L=D)
    Sc = finish(_arr(nu) / _arr(D))
    envelope("sano_particle_k_L", "Sc", Sc, 100.0, np.inf, "Sano et al. (1974), liquids (from memory)")
    dp, n = _arr(d), _arr(nu)
    Re_e = _arr(e) * dp**4 / n**3
    return finish((2.0 + 0.4 * Re_e**0.25 * np.cbrt(_arr(Sc))) * _arr(D) / dp)
