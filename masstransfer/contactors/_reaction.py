"""Gas absorption with chemical reaction: Hatta number, enhancement factors, regimes.

For a reaction A(gas) + nu B(liquid) -> products with rate k2 c_A c_B [mol/(m^3 s)].
"""

from __future__ import annotations

import math
from dataclasses import dataclass
from typing import overload

import numpy as np

from .._typing import ArrayLike, FloatArray, FloatOrArray
from .._validation import check_nonnegative, check_positive, check_shapes, finish, guard, warn_caller
from ..errors import EnvelopeWarning, InputValueError, UnknownMethodError
from ._common import float_array as _arr

__all__ = [
    "EnhancementResult",
    "absorption_enhancement",
    "enhancement_factor",
    "enhancement_film",
    "enhancement_instantaneous",
    "enhancement_penetration",
    "enhancement_surface_renewal",
    "hatta_number",
]

#: Regime limits on the Hatta number (common practice; Levenspiel, Chemical Reaction
#: Engineering, 3rd ed. (1999), Ch. 23; Danckwerts, Gas-Liquid Reactions (1970), Ch. 5).
SLOW_BELOW = 0.3
FAST_ABOVE = 3.0
#: Ha / E_inf ratios bounding the fast pseudo-first-order and instantaneous regimes (common practice).
PSEUDO_FIRST_ORDER_BELOW = 0.5
INSTANTANEOUS_ABOVE = 10.0


@overload
def hatta_number(k2: float, c_B: float, D_A: float, k_L: float) -> float: ...
@overload
def hatta_number(k2: FloatArray, c_B: ArrayLike, D_A: ArrayLike, k_L: ArrayLike) -> FloatArray: ...
@overload
def hatta_number(k2: ArrayLike, c_B: ArrayLike, D_A: ArrayLike, k_L: ArrayLike) -> FloatOrArray: ...
@guard
def hatta_number(k2: ArrayLike, c_B: ArrayLike, D_A: ArrayLike, k_L: ArrayLike) -> FloatOrArray:
    r"""Hatta number of a reaction first order in the gas A and the liquid reactant B.

    .. math:: Ha = \frac{\sqrt{k_2 c_B D_A}}{k_L}

    Parameters
    ----------
    k2 : float or array_like
        Second-order rate constant [m^3/(mol s)]; zero for no reaction.
    c_B : float or array_like
        Concentration of B in the bulk liquid [mol/m^3].
    D_A : float or array_like
        Diffusivity of A in the liquid [m^2/s].
    k_L : float or array_like
        Physical liquid-side coefficient [m/s].

    Returns
    -------
    float or numpy.ndarray
        Ha [-], the ratio of the maximum rate in the film to the maximum
        physical transfer rate, squared under the root.

    Notes
    -----
    Ha < 0.3: slow reaction (no enhancement); Ha > 3: fast reaction in the
    film (common practice).

    References
    ----------
    Hatta, S. (1932). Technol. Rep. Tohoku Imp. Univ. 10, 119.
    Danckwerts, P. V. (1970). *Gas-Liquid Reactions*. McGraw-Hill, Ch. 5.

    Examples
    --------
    >>> round(hatta_number(10.0, 500.0, 1.8e-9, 1.0e-4), 3)
    30.0

    """
    k = check_nonnegative("k2", k2)
    c = check_nonnegative("c_B", c_B)
    D = check_positive("D_A", D_A)
    kL = check_positive("k_L", k_L)
    check_shapes(k2=k, c_B=c, D_A=D, k_L=kL)
    return finish(np.sqrt(_arr(k) * _arr(c) * _arr(D)) / _arr(kL))


def _ha(hatta: ArrayLike) -> FloatOrArray:
    """Hatta numbers: finite and >= 0."""
    return check_nonnegative("hatta", hatta)


def _einf(E_inf: ArrayLike) -> FloatOrArray:
    e = check_positive("E_inf", E_inf)
    if np.any(_arr(e) < 1.0):
        raise InputValueError(
            f"E_inf={float(np.min(e))!r} is below 1; the instantaneous enhancement factor is at least 1 "
            "(pass the value from enhancement_instantaneous)"
        )
    return e


@guard
def enhancement_film(hatta: ArrayLike) -> FloatOrArray:
    r"""Enhancement factor of a pseudo-first-order reaction, film theory (Hatta 1932).

    .. math:: E = \frac{Ha}{\tanh Ha}

    Parameters
    ----------
    hatta : float or array_like
        Hatta number [-].

    Returns
    -------
    float or numpy.ndarray
        E [-]; 1 at Ha = 0, Ha for Ha > 3.

    Notes
    -----
    Assumes B is not depleted near the interface (Ha well below E_inf) and
    no A reaches the bulk unreacted beyond what the film form allows.

    References
    ----------
    Hatta, S. (1932). Technol. Rep. Tohoku Imp. Univ. 10, 119.
    Danckwerts, P. V. (1970). *Gas-Liquid Reactions*, Eq. (5.2.11) (from memory).

    Examples
    --------
    >>> round(enhancement_film(2.0), 4)
    2.0746

    """
    Ha = _arr(_ha(hatta))
    small = Ha < 1e-4
    safe = np.where(small, 1.0, Ha)
    return finish(np.where(small, 1.0 + Ha * Ha / 3.0, safe / np.tanh(safe)))


@guard
def enhancement_penetration(hatta: ArrayLike) -> FloatOrArray:
    r"""Enhancement factor of a pseudo-first-order reaction, Higbie penetration theory.

    .. math::
        E = Ha\left(1 + \frac{\pi}{8 Ha^2}\right)
        \operatorname{erf}\left(\frac{2 Ha}{\sqrt\pi}\right)
        + \frac{1}{2}\exp\left(-\frac{4 Ha^2}{\pi}\right)

    Parameters
    ----------
    hatta : float or array_like
        Hatta number [-] with k_L from the penetration model.

    Returns
    -------
    float or numpy.ndarray
        E [-]; 1 at Ha = 0, Ha + pi/(8 Ha) for large Ha.

    Notes
    -----
    Within a few per cent of the film and surface-renewal forms at every Ha.

    References
    ----------
    Danckwerts, P. V. (1970). *Gas-Liquid Reactions*. McGraw-Hill, Ch. 5
    (penetration-theory result for a first-order reaction, from memory).

    Examples
    --------
    >>> round(enhancement_penetration(2.0), 4)
    2.1963

    """
    from scipy.special import erf

    Ha = _arr(_ha(hatta))
    small = Ha < 1e-3
    safe = np.where(small, 1.0, Ha)
    exact = safe * (1.0 + math.pi / (8.0 * safe * safe)) * erf(
        2.0 * safe / math.sqrt(math.pi)
    ) + 0.5 * np.exp(-4.0 * safe * safe / math.pi)
    # series about Ha = 0: 1 + Ha^2/3 - ... (the exact form loses digits to cancellation there)
    series = 1.0 + Ha * Ha / 3.0
    return finish(np.where(small, series, exact))


@guard
def enhancement_surface_renewal(hatta: ArrayLike) -> FloatOrArray:
    r"""Enhancement factor of a pseudo-first-order reaction, Danckwerts surface renewal.

    .. math:: E = \sqrt{1 + Ha^2}

    Parameters
    ----------
    hatta : float or array_like
        Hatta number [-].

    Returns
    -------
    float or numpy.ndarray
        E [-].

    Notes
    -----
    The limit of :func:`enhancement_factor` for an unlimited supply of B.

    References
    ----------
    Danckwerts, P. V. (1951). Significance of liquid-film coefficients in
    gas absorption. *Ind. Eng. Chem.* 43, 1460-1467.

    Examples
    --------
    >>> round(enhancement_surface_renewal(2.0), 4)
    2.2361

    """
    Ha = _arr(_ha(hatta))
    return finish(np.hypot(1.0, Ha))


@guard
def enhancement_instantaneous(
    D_A: ArrayLike,
    D_B: ArrayLike,
    c_B: ArrayLike,
    c_Ai: ArrayLike,
    nu: ArrayLike = 1.0,
    theory: str = "film",
) -> FloatOrArray:
    r"""Enhancement factor of an instantaneous reaction (the upper limit E_inf).

    .. math::
        E_\infty = 1 + \frac{D_B c_B}{\nu D_A c_{Ai}}\ \text{(film)},\qquad
        E_\infty = \sqrt{\frac{D_A}{D_B}} + \sqrt{\frac{D_B}{D_A}}\frac{c_B}{\nu c_{Ai}}\
        \text{(penetration)}

    Parameters
    ----------
    D_A : float or array_like
        Diffusivity of the dissolved gas A [m^2/s].
    D_B : float or array_like
        Diffusivity of the liquid reactant B [m^2/s].
    c_B : float or array_like
        Bulk concentration of B [mol/m^3].
    c_Ai : float or array_like
        Interfacial concentration of A (solubility at the interface) [mol/m^3].
    nu : float or array_like
        Moles of B consumed per mole of A [-].
    theory : {'film', 'penetration'}
        Mass-transfer model.

    Returns
    -------
    float or numpy.ndarray
        E_inf [-].

    Notes
    -----
    The penetration form is Danckwerts' approximation, accurate when it is
    well above 1.

    References
    ----------
    Danckwerts, P. V. (1970). *Gas-Liquid Reactions*. McGraw-Hill, Ch. 3
    (from memory).

    Examples
    --------
    >>> round(enhancement_instantaneous(1.8e-9, 1.2e-9, 500.0, 30.0, nu=2.0), 3)
    6.556

    """
    if not isinstance(theory, str):
        raise UnknownMethodError(f"theory={theory!r} must be 'film' or 'penetration'")
    if theory not in ("film", "penetration"):
        raise UnknownMethodError(f"theory={theory!r} is not known; pass 'film' or 'penetration'")
    Da = check_positive("D_A", D_A)
    Db = check_positive("D_B", D_B)
    cB = check_nonnegative("c_B", c_B)
    cA = check_positive("c_Ai", c_Ai)
    n = check_positive("nu", nu)
    check_shapes(D_A=Da, D_B=Db, c_B=cB, c_Ai=cA, nu=n)
    ratio = _arr(cB) / (_arr(n) * _arr(cA))
    if theory == "film":
        return finish(1.0 + _arr(Db) / _arr(Da) * ratio)
    r = np.sqrt(_arr(Da) / _arr(Db))
    return finish(np.maximum(r + ratio / r, 1.0))


@overload
def enhancement_factor(hatta: float, E_inf: float) -> float: ...
@overload
def enhancement_factor(hatta: FloatArray, E_inf: ArrayLike) -> FloatArray: ...
@overload
def enhancement_factor(hatta: ArrayLike, E_inf: ArrayLike) -> FloatOrArray: ...
@guard
def enhancement_factor(hatta: ArrayLike, E_inf: ArrayLike) -> FloatOrArray:
    r"""Enhancement factor of a second-order reaction, DeCoursey's explicit approximation.

    .. math::
        E = -\frac{Ha^2}{2(E_\infty - 1)}
        + \sqrt{\frac{Ha^4}{4(E_\infty - 1)^2} + \frac{E_\infty Ha^2}{E_\infty - 1} + 1}

    evaluated as :math:`(2 E_\infty u + 1)/(\sqrt{u^2 + 2E_\infty u + 1} + u)` with
    :math:`u = Ha^2/(2(E_\infty - 1))`, which is free of cancellation at large Ha.

    Parameters
    ----------
    hatta : float or array_like
        Hatta number [-] (:func:`hatta_number`).
    E_inf : float or array_like
        Instantaneous enhancement factor [-], at least 1
        (:func:`enhancement_instantaneous`).

    Returns
    -------
    float or numpy.ndarray
        E [-], between 1 and min(E_inf, sqrt(1 + Ha^2)).

    Notes
    -----
    Derived from Danckwerts' surface-renewal model; it tends to
    sqrt(1 + Ha^2) when E_inf is large, to E_inf when Ha >> E_inf and to 1
    when Ha -> 0.  DeCoursey compares it with numerical solutions and finds
    it within a few per cent, the largest departures near Ha ~ E_inf
    (from memory); :func:`absorption_enhancement` warns there.

    References
    ----------
    DeCoursey, W. J. (1974). Absorption with chemical reaction: development
    of a new relation for the Danckwerts model. *Chem. Eng. Sci.* 29,
    1867-1872.

    Examples
    --------
    >>> round(enhancement_factor(5.0, 10.0), 4)
    4.1525

    """
    Ha = _arr(_ha(hatta))
    Ei = _arr(_einf(E_inf))
    check_shapes(hatta=Ha, E_inf=Ei)
    excess = Ei - 1.0
    none = excess <= 0.0
    u = Ha * Ha / (2.0 * np.where(none, 1.0, excess))
    E = (2.0 * Ei * u + 1.0) / (np.sqrt(u * u + 2.0 * Ei * u + 1.0) + u)
    return finish(np.where(none, 1.0, E))


@dataclass(frozen=True)
class EnhancementResult:
    """Enhancement of absorption by reaction, with the regime and the numbers behind it.

    Attributes
    ----------
    E : float or numpy.ndarray
        Enhancement factor (DeCoursey) [-].
    hatta : float or numpy.ndarray
        Hatta number [-].
    E_inf : float or numpy.ndarray
        Instantaneous enhancement factor [-].
    regime : str or tuple of str
        ``"slow"``, ``"intermediate"``, ``"fast"`` (pseudo-first order),
        ``"fast-depleting"`` (B depleted near the surface) or
        ``"instantaneous"``; a tuple for array input.
    warnings : tuple of str
        Where the approximation is weak, said so.
    method : str
        The equations used.

    """

    E: FloatOrArray
    hatta: FloatOrArray
    E_inf: FloatOrArray
    regime: str | tuple[str, ...]
    warnings: tuple[str, ...]
    method: str


def _regimes(Ha: FloatArray, Ei: FloatArray) -> FloatArray:
    ratio = Ha / Ei
    return np.select(
        [Ha < SLOW_BELOW, ratio > INSTANTANEOUS_ABOVE, Ha <= FAST_ABOVE, ratio < PSEUDO_FIRST_ORDER_BELOW],
        ["slow", "instantaneous", "intermediate", "fast"],
        default="fast-depleting",
    )


@guard
def absorption_enhancement(
    k2: ArrayLike,
    c_B: ArrayLike,
    D_A: ArrayLike,
    D_B: ArrayLike,
    k_L: ArrayLike,
    c_Ai: ArrayLike,
    nu: ArrayLike = 1.0,
) -> EnhancementResult:
    r"""Enhancement of absorption by a second-order reaction, with the regime named.

    .. math::
        Ha = \frac{\sqrt{k_2 c_B D_A}}{k_L},\quad
        E_\infty = \sqrt{\frac{D_A}{D_B}} + \sqrt{\frac{D_B}{D_A}}\frac{c_B}{\nu c_{Ai}},\quad
        E = E_{\mathrm{DeCoursey}}(Ha, E_\infty)

    Parameters
    ----------
    k2 : float or array_like
        Second-order rate constant [m^3/(mol s)].
    c_B : float or array_like
        Bulk concentration of the liquid reactant B [mol/m^3].
    D_A : float or array_like
        Diffusivity of the dissolved gas A [m^2/s].
    D_B : float or array_like
        Diffusivity of B [m^2/s].
    k_L : float or array_like
        Physical liquid-side coefficient [m/s].
    c_Ai : float or array_like
        Interfacial concentration of A [mol/m^3].
    nu : float or array_like
        Moles of B consumed per mole of A [-].

    Returns
    -------
    EnhancementResult
        E, Ha, E_inf, the regime and cautions.

    Notes
    -----
    Regimes (common practice; Levenspiel 1999, Ch. 23): slow Ha < 0.3;
    intermediate 0.3-3; fast Ha > 3 with Ha < E_inf/2; fast-depleting
    between E_inf/2 and 10 E_inf; instantaneous Ha > 10 E_inf.  An
    EnvelopeWarning is issued in the intermediate regime (part of A may
    react in the bulk; the film-based E ignores it) and in the
    fast-depleting regime (the explicit approximation departs most from
    numerical solutions there).  In the slow regime E = 1 and the rate is
    set by the bulk reaction and the liquid hold-up, which this function
    does not model.

    References
    ----------
    DeCoursey, W. J. (1974). *Chem. Eng. Sci.* 29, 1867-1872.
    Levenspiel, O. (1999). *Chemical Reaction Engineering*, 3rd ed. Wiley,
    Ch. 23.

    Examples
    --------
    >>> r = absorption_enhancement(5.0, 1000.0, 1.8e-9, 1.2e-9, 1.0e-4, 3.0)
    >>> r.regime, round(r.E, 3)
    ('fast', 28.465)

    """
    Ha = _arr(hatta_number(k2, c_B, D_A, k_L))
    Ei = _arr(enhancement_instantaneous(D_A, D_B, c_B, c_Ai, nu, "penetration"))
    E = _arr(enhancement_factor(Ha, Ei))
    names = _regimes(Ha, Ei)
    warned = []
    if np.any(names == "intermediate"):
        warned.append(
            "absorption_enhancement: 0.3 <= Ha <= 3 (intermediate regime): part of the gas may "
            "react in the bulk liquid, which E does not count; check the liquid hold-up and the bulk rate"
        )
    if np.any(names == "fast-depleting"):
        warned.append(
            "absorption_enhancement: Ha is between E_inf/2 and 10 E_inf: B is depleted near the "
            "surface and DeCoursey's explicit approximation is at its least accurate (DeCoursey 1974)"
        )
    for msg in warned:
        warn_caller(msg, EnvelopeWarning)
    regime: str | tuple[str, ...] = str(names) if names.ndim == 0 else tuple(str(n) for n in names.ravel())
    return EnhancementResult(
        E=finish(E),
        hatta=finish(Ha),
        E_inf=finish(Ei),
        regime=regime,
        warnings=tuple(warned),
        method="Hatta number; E_inf by penetration theory (Danckwerts); E by DeCoursey (1974)",
    )
