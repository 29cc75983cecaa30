"""Transfer units and column height: analytic (Colburn) forms, numerical NTU, a column integrator.

Mole fractions y (gas) and x (liquid); the equilibrium line y* = m x or a curve.  Absorption
factor A = L/(m G), stripping factor S = m G/L.  Gas enters at the bottom, liquid at the top.
"""

from __future__ import annotations

import math
from collections.abc import Callable
from dataclasses import dataclass
from typing import Any, overload

import numpy as np

from .._typing import ArrayLike, FloatArray, FloatOrArray
from .._validation import check_nonnegative, check_positive, check_shapes, finish, guard, scalar, warn_caller
from ..errors import EnvelopeWarning, InputTypeError, InputValueError, UnknownMethodError
from ._common import float_array as _arr

__all__ = [
    "ColumnProfile",
    "column_profile",
    "film_transfer_units",
    "numerical_transfer_units",
    "overall_gas_htu",
    "overall_liquid_htu",
    "stripping_transfer_units",
    "transfer_unit_height",
    "transfer_units",
]


def _fraction(name: str, value: ArrayLike) -> FloatOrArray:
    v = check_nonnegative(name, value)
    if np.any(_arr(v) >= 1.0):
        raise InputValueError(f"{name}={float(np.max(v))!r} is not below 1; pass a mole fraction (0 to 1)")
    return v


def _colburn(ratio: FloatArray, r: FloatArray) -> FloatArray:
    """ln(1 + r (ratio - 1)) / r, continuous through r = 0."""
    excess = ratio - 1.0
    z = np.asarray(r * excess, dtype=float)
    if z.size and z.min() <= -1.0:
        raise InputValueError(
            "the specified separation is beyond the pinch: the absorption (or stripping) factor is too "
            "small for it; raise the liquid (or gas) rate, or ask for less"
        )
    if z.size == 0 or np.abs(z).min() >= 1e-6:  # the common case: no factor within 1e-6 of 1
        out = np.log1p(z)
        out /= z
        out *= excess
        return np.asarray(out, dtype=float)
    near = np.abs(z) < 1e-6
    safe = np.where(near, 1.0, z)
    exact = np.log1p(safe) / safe
    series = 1.0 - z / 2.0 + z * z / 3.0
    return np.asarray(excess * np.where(near, series, exact), dtype=float)


@overload
def transfer_units(y_in: float, y_out: float, x_in: float, m: float, A: float) -> float: ...
@overload
def transfer_units(
    y_in: ArrayLike, y_out: ArrayLike, x_in: ArrayLike, m: ArrayLike, A: FloatArray
) -> FloatArray: ...
@overload
def transfer_units(
    y_in: ArrayLike, y_out: ArrayLike, x_in: ArrayLike, m: ArrayLike, A: ArrayLike
) -> FloatOrArray: ...
@guard
def transfer_units(
    y_in: ArrayLike, y_out: ArrayLike, x_in: ArrayLike, m: ArrayLike, A: ArrayLike
) -> FloatOrArray:
    r"""Overall gas-phase transfer units of a dilute absorber with straight lines (Colburn).

    .. math::
        N_{OG} = \frac{\ln\left[\left(1 - \frac{1}{A}\right)
        \frac{y_{in} - m x_{in}}{y_{out} - m x_{in}} + \frac{1}{A}\right]}{1 - 1/A},
        \qquad N_{OG} = \frac{y_{in} - y_{out}}{y_{out} - m x_{in}}\ (A = 1)

    Parameters
    ----------
    y_in : float or array_like
        Mole fraction of solute in the entering gas (bottom) [-].
    y_out : float or array_like
        Mole fraction of solute in the leaving gas (top) [-].
    x_in : float or array_like
        Mole fraction of solute in the entering liquid (top) [-].
    m : float or array_like
        Slope of the equilibrium line y* = m x [-].
    A : float or array_like
        Absorption factor L/(m G) [-].

    Returns
    -------
    float or numpy.ndarray
        N_OG [-].

    Raises
    ------
    InputValueError
        If y_out is not above m x_in and below y_in, or the separation
        lies beyond the pinch (A < 1 and too high a recovery).

    Notes
    -----
    Exact for dilute gases with constant flows, a straight equilibrium line
    and a constant H_OG; continuous through A = 1 (a series is used near it).

    References
    ----------
    Colburn, A. P. (1939). The simplified calculation of diffusional
    processes. *Trans. AIChE* 35, 211-236.
    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Eq. (8.50).

    Examples
    --------
    >>> round(transfer_units(0.02, 0.001, 0.0, 1.2, 1.5), 3)
    5.977

    """
    yi = _fraction("y_in", y_in)
    yo = _fraction("y_out", y_out)
    xi = _fraction("x_in", x_in)
    mv = check_positive("m", m)
    Av = check_positive("A", A)
    check_shapes(y_in=yi, y_out=yo, x_in=xi, m=mv, A=Av)
    top = _arr(yo) - _arr(mv) * _arr(xi)
    if np.any(top <= 0.0):
        raise InputValueError(
            "y_out is not above m x_in, the gas in equilibrium with the entering liquid; "
            "no column height reaches it: ask for a higher y_out or a cleaner liquid"
        )
    if np.any(_arr(yi) <= _arr(yo)):
        raise InputValueError("y_in is not above y_out; an absorber lowers the gas mole fraction")
    ratio = (_arr(yi) - _arr(mv) * _arr(xi)) / top
    return finish(_colburn(ratio, 1.0 - 1.0 / _arr(Av)))


@guard
def stripping_transfer_units(
    x_in: ArrayLike, x_out: ArrayLike, y_in: ArrayLike, m: ArrayLike, S: ArrayLike
) -> FloatOrArray:
    r"""Overall liquid-phase transfer units of a dilute stripper with straight lines (Colburn).

    .. math::
        N_{OL} = \frac{\ln\left[\left(1 - \frac{1}{S}\right)
        \frac{x_{in} - y_{in}/m}{x_{out} - y_{in}/m} + \frac{1}{S}\right]}{1 - 1/S}

    Parameters
    ----------
    x_in : float or array_like
        Mole fraction of solute in the entering liquid (top) [-].
    x_out : float or array_like
        Mole fraction of solute in the leaving liquid (bottom) [-].
    y_in : float or array_like
        Mole fraction of solute in the entering stripping gas (bottom) [-].
    m : float or array_like
        Slope of the equilibrium line y* = m x [-].
    S : float or array_like
        Stripping factor m G/L [-].

    Returns
    -------
    float or numpy.ndarray
        N_OL [-].

    Notes
    -----
    The mirror image of :func:`transfer_units`; exact under the same
    assumptions.

    References
    ----------
    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Eq. (8.51).

    Examples
    --------
    >>> round(stripping_transfer_units(0.01, 0.0005, 0.0, 30.0, 2.0), 3)
    4.703

    """
    xi = _fraction("x_in", x_in)
    xo = _fraction("x_out", x_out)
    yi = _fraction("y_in", y_in)
    mv = check_positive("m", m)
    Sv = check_positive("S", S)
    check_shapes(x_in=xi, x_out=xo, y_in=yi, m=mv, S=Sv)
    bottom = _arr(xo) - _arr(yi) / _arr(mv)
    if np.any(bottom <= 0.0):
        raise InputValueError(
            "x_out is not above y_in/m, the liquid in equilibrium with the entering gas; "
            "ask for a higher x_out or a cleaner stripping gas"
        )
    if np.any(_arr(xi) <= _arr(xo)):
        raise InputValueError("x_in is not above x_out; a stripper lowers the liquid mole fraction")
    ratio = (_arr(xi) - _arr(yi) / _arr(mv)) / bottom
    return finish(_colburn(ratio, 1.0 - 1.0 / _arr(Sv)))


@guard
def transfer_unit_height(flow: ArrayLike, Ka: ArrayLike) -> FloatOrArray:
    r"""Height of a transfer unit, H = flow / (K a).

    .. math:: H_{OG} = \frac{G}{K_y a},\quad H_{OL} = \frac{L}{K_x a},\quad
        H_G = \frac{G}{k_y a},\quad H_L = \frac{L}{k_x a}

    Parameters
    ----------
    flow : float or array_like
        Molar flux of the phase, G or L [mol/(m^2 s)].
    Ka : float or array_like
        Volumetric coefficient on the mole-fraction basis of that phase,
        k_y a, k_x a, K_y a or K_x a [mol/(m^3 s)].

    Returns
    -------
    float or numpy.ndarray
        HTU [m].

    Notes
    -----
    For k_G a [mol/(m^3 s Pa)] pass k_G a P; for k_L a [1/s] pass k_L a c_total.

    References
    ----------
    Chilton, T. H. & Colburn, A. P. (1935). Distillation and absorption in
    packed columns. *Ind. Eng. Chem.* 27, 255-260.

    Examples
    --------
    >>> transfer_unit_height(20.0, 40.0)
    0.5

    """
    f = check_positive("flow", flow)
    k = check_positive("Ka", Ka)
    check_shapes(flow=f, Ka=k)
    return finish(_arr(f) / _arr(k))


@guard
def overall_gas_htu(H_G: ArrayLike, H_L: ArrayLike, A: ArrayLike) -> FloatOrArray:
    r"""Overall gas-phase HTU from the film HTUs, straight equilibrium line.

    .. math:: H_{OG} = H_G + \frac{H_L}{A}

    Parameters
    ----------
    H_G : float or array_like
        Gas-film HTU [m].
    H_L : float or array_like
        Liquid-film HTU [m].
    A : float or array_like
        Absorption factor L/(m G) [-].

    Returns
    -------
    float or numpy.ndarray
        H_OG [m].

    Notes
    -----
    Follows from adding film resistances with a straight equilibrium line.

    References
    ----------
    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Eq. (8.24)
    (from memory).

    Examples
    --------
    >>> overall_gas_htu(0.4, 0.3, 1.5)
    0.6

    """
    hg = check_positive("H_G", H_G)
    hl = check_positive("H_L", H_L)
    Av = check_positive("A", A)
    check_shapes(H_G=hg, H_L=hl, A=Av)
    return finish(_arr(hg) + _arr(hl) / _arr(Av))


@guard
def overall_liquid_htu(H_G: ArrayLike, H_L: ArrayLike, A: ArrayLike) -> FloatOrArray:
    r"""Overall liquid-phase HTU from the film HTUs, straight equilibrium line.

    .. math:: H_{OL} = H_L + A\,H_G

    Parameters
    ----------
    H_G : float or array_like
        Gas-film HTU [m].
    H_L : float or array_like
        Liquid-film HTU [m].
    A : float or array_like
        Absorption factor L/(m G) [-].

    Returns
    -------
    float or numpy.ndarray
        H_OL [m].

    Notes
    -----
    H_OL = A H_OG, so that N_OL H_OL = N_OG H_OG.

    References
    ----------
    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Eq. (8.25)
    (from memory).

    Examples
    --------
    >>> round(overall_liquid_htu(0.4, 0.3, 1.5), 12)
    0.9

    """
    hg = check_positive("H_G", H_G)
    hl = check_positive("H_L", H_L)
    Av = check_positive("A", A)
    check_shapes(H_G=hg, H_L=hl, A=Av)
    return finish(_arr(hl) + _arr(Av) * _arr(hg))


# --- numerical forms ---------------------------------------------------------------------


def _equilibrium(equilibrium: Any) -> Callable[..., float]:
    """Return a checked scalar function y*(x) or y*(x, T) from a slope or a user callable."""
    if callable(equilibrium) and not isinstance(equilibrium, np.ndarray):
        fn = equilibrium

        def checked(*args: float) -> float:
            out = fn(*args)
            try:
                v = float(out)
            except (TypeError, ValueError) as exc:
                raise InputTypeError(
                    f"equilibrium returned {out!r}, not a number; it must return y* as a float"
                ) from exc
            if not (math.isfinite(v) and 0.0 <= v < 1.0):
                raise InputValueError(
                    f"equilibrium returned y*={v!r} at x={args[0]!r}; "
                    "it must return a mole fraction in [0, 1)"
                )
            return v

        return checked
    slope = scalar("equilibrium", equilibrium)
    slope = float(check_positive("equilibrium", slope, "pass the slope m of y* = m x, or a function"))

    def line(x: float, *_: float) -> float:
        return slope * x

    return line


def _inert_log_mean(y: float, ystar: float) -> float:
    """Log mean of 1 - y* and 1 - y, accurate however close the two are.

    With b = 1 - y and r = (y - y*)/b the log mean is b r / ln(1 + r); the difference y - y* is
    taken directly (never as (1 - y*) - (1 - y), which loses it below y ~ 1e-16), and for
    |r| < 1e-4 the series b (1 + r/2 - r^2/12 + r^3/24) replaces the quotient.
    """
    b = 1.0 - y
    r = (y - ystar) / b
    if abs(r) < 1e-4:
        return b * (1.0 + r * (0.5 + r * (-1.0 / 12.0 + r / 24.0)))
    return b * r / math.log1p(r)


#: Below this driving force at the top a double has lost its full precision (the smallest normal).
_TINY = float(np.finfo(float).tiny)
#: Smallest driving force at the top, relative to y_out, that double precision resolves to
#: about eight digits (y_out - y* loses the digits y_out and y* share).
_RESOLVED = 1e-8


def _top_force(driving: Callable[[float], float], yo: float, yi: float) -> float:
    """Check y - y* > 0 from the top to the bottom and return its value at the top, y_out - y*(x_in).

    The check samples a linear grid and a grid logarithmic in the distance from the top, so a pinch
    close to a very small y_out is seen as well as one in the body of the column.
    """
    d0 = driving(yo)
    if d0 <= 0.0:
        raise InputValueError(
            f"y_out={yo!r} is not above y*={yo - d0!r}, the gas in equilibrium with the entering "
            "liquid: the column would need an infinite height; ask for a higher y_out or feed a "
            "cleaner liquid"
        )
    if d0 < _RESOLVED * yo:
        raise InputValueError(
            f"y_out={yo!r} lies within a relative {d0 / yo:.2g} of y*={yo - d0!r}, the gas in "
            "equilibrium with the entering liquid, so the driving force at the top cannot be "
            f"resolved in double precision; ask for y_out at least {_RESOLVED:g} (relative) above y*"
        )
    span = yi - yo
    near_top = yo + np.geomspace(max(d0, _TINY), span + max(d0, _TINY), 201) - max(d0, _TINY)
    grid = np.unique(np.concatenate([np.linspace(yo, yi, 201), np.clip(near_top, yo, yi)]))
    forces = np.array([driving(float(y)) for y in grid])
    if np.any(forces <= 0.0):
        at = float(grid[int(np.argmax(forces <= 0.0))])
        raise InputValueError(
            f"the driving force y - y* is not positive at y={at:.6g}: the operating line touches or "
            "crosses the equilibrium curve (a pinch); raise L_over_G or ask for a higher y_out"
        )
    if d0 < _TINY:
        raise InputValueError(
            f"y_out={yo!r} leaves a driving force y_out - y* of {d0!r} at the top, below the smallest "
            f"normal double ({_TINY:.3g}), where the transfer units cannot be counted to full precision; "
            "ask for y_out at least 1e-300 above the gas in equilibrium with the entering liquid"
        )
    return d0


def _quad_from_top(integrand: Callable[[float], float], yo: float, yi: float, d0: float) -> float:
    """Integrate integrand(y) dy from y_out to y_in in u = ln(y - y_out + d0).

    d0 is the driving force at the top.  With w = y - y_out + d0, dy = w du and the integrand
    w/(y - y*) stays between fixed bounds however small y_out is, so the quadrature resolves
    the ln(1/y_out) tail that a linear variable cannot reach below y_out ~ 1e-50.
    """
    from scipy.integrate import quad

    def in_log(u: float) -> float:
        w = math.exp(u)
        return w * integrand(yo + (w - d0))

    out = quad(
        in_log, math.log(d0), math.log(yi - yo + d0), epsabs=0.0, epsrel=1e-11, limit=200, full_output=1
    )
    if len(out) > 3:  # quad's own warning, returned instead of issued: say it in the library's words
        warn_caller(
            f"transfer units by quadrature reached a relative error of about "
            f"{abs(out[1] / out[0]) if out[0] else math.inf:.2g}, not 1e-11 ({out[3].splitlines()[0]})",
            EnvelopeWarning,
        )
    return float(out[0])


@guard(check_output=False)
def numerical_transfer_units(
    y_in: float,
    y_out: float,
    x_in: float,
    L_over_G: float,
    equilibrium: float | Callable[[float], float],
    concentrated: bool = False,
) -> float:
    r"""Overall gas-phase transfer units by quadrature, for curved equilibrium or concentrated gas.

    .. math::
        N_{OG} = \int_{y_{out}}^{y_{in}} \frac{dy}{y - y^*}\ \text{(dilute)},\qquad
        N_{OG} = \int_{y_{out}}^{y_{in}} \frac{(1-y)^*_{lm}\,dy}{(1-y)(y - y^*)}\ \text{(concentrated)}

    with the operating line :math:`x = x_{in} + (y - y_{out})/(L/G)` (dilute) or
    :math:`X = X_{in} + (Y - Y_{out})/(L'/G')` in solute-free mole ratios
    :math:`Y = y/(1-y)` (concentrated), and :math:`(1-y)^*_{lm}` the log mean of
    :math:`1-y` and :math:`1-y^*`.

    Parameters
    ----------
    y_in : float
        Mole fraction of solute in the entering gas (bottom) [-].
    y_out : float
        Mole fraction of solute in the leaving gas (top) [-].
    x_in : float
        Mole fraction of solute in the entering liquid (top) [-].
    L_over_G : float
        Liquid-to-gas molar flow ratio; of the solute-free flows L'/G' when
        ``concentrated`` [-].
    equilibrium : float or callable
        The slope m of y* = m x [-], or a function y*(x) returning a mole
        fraction (for a curved line, or a Henry constant that changes with
        the temperature along the column).
    concentrated : bool
        Use the concentrated-gas form with the log-mean inert factor.

    Returns
    -------
    float
        N_OG [-].

    Raises
    ------
    InputValueError
        If the driving force y - y* is not positive everywhere between the
        ends (a pinch or a crossing of the equilibrium curve).

    Notes
    -----
    Adaptive Gauss-Kronrod quadrature (:func:`scipy.integrate.quad`) to a
    relative tolerance of 1e-11, in the variable ln(y - y_out + d0) with d0
    the driving force at the top, so the ln(1/y_out) tail is resolved for any
    y_out; with a straight line and a dilute gas it reproduces
    :func:`transfer_units` to 1e-6 (tested for y_out from 1e-3 down to
    1e-300).  A driving force at the top below the smallest normal double
    (2.2e-308) is refused, naming ``y_out``.

    References
    ----------
    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Eqs. (8.36)
    and (8.48) (from memory).

    Examples
    --------
    >>> round(numerical_transfer_units(0.02, 0.001, 0.0, 1.8, 1.2), 3)
    5.977

    """
    yi = float(_fraction("y_in", scalar("y_in", y_in)))
    yo = float(_fraction("y_out", scalar("y_out", y_out)))
    xi = float(_fraction("x_in", scalar("x_in", x_in)))
    LG = float(check_positive("L_over_G", scalar("L_over_G", L_over_G)))
    conc = _bool("concentrated", concentrated)
    f = _equilibrium(equilibrium)
    if not yi > yo:
        raise InputValueError(
            f"y_in={yi!r} is not above y_out={yo!r}; an absorber lowers the gas mole fraction"
        )

    def x_of(y: float) -> float:
        if not conc:
            return xi + (y - yo) / LG
        X = xi / (1.0 - xi) + (y / (1.0 - y) - yo / (1.0 - yo)) / LG
        return X / (1.0 + X)

    x_bottom = x_of(yi)
    if not (0.0 <= x_bottom < 1.0):
        raise InputValueError(
            f"the leaving liquid would have x={x_bottom!r}; raise L_over_G={LG!r} so that it stays below 1"
        )

    def driving(y: float) -> float:
        return y - f(x_of(y))

    d0 = _top_force(driving, yo, yi)

    def integrand(y: float) -> float:
        ystar = f(x_of(y))
        if not conc:
            return 1.0 / (y - ystar)
        return _inert_log_mean(y, ystar) / ((1.0 - y) * (y - ystar))

    return _quad_from_top(integrand, yo, yi, d0)


@guard(check_output=False)
def film_transfer_units(
    y_in: float,
    y_out: float,
    x_in: float,
    L_over_G: float,
    equilibrium: float | Callable[[float], float],
    kxa_over_kya: float,
    phase: str = "gas",
) -> float:
    r"""Gas-film or liquid-film transfer units of a dilute absorber, through the interface compositions.

    .. math::
        N_G = \int_{y_{out}}^{y_{in}} \frac{dy}{y - y_i},\qquad
        N_L = \int_{x_{in}}^{x_{out}} \frac{dx}{x_i - x},\qquad
        \frac{y - y_i}{x_i - x} = \frac{k_x a}{k_y a},\ y_i = y^*(x_i)

    along the operating line :math:`x = x_{in} + (y - y_{out})/(L/G)`.

    Parameters
    ----------
    y_in : float
        Mole fraction of solute in the entering gas (bottom) [-].
    y_out : float
        Mole fraction of solute in the leaving gas (top) [-].
    x_in : float
        Mole fraction of solute in the entering liquid (top) [-].
    L_over_G : float
        Liquid-to-gas molar flow ratio [-].
    equilibrium : float or callable
        The slope m of y* = m x [-], or an increasing function y*(x).
    kxa_over_kya : float
        Ratio of the liquid-film to the gas-film volumetric coefficient,
        k_x a / k_y a [-].
    phase : {'gas', 'liquid'}
        Which film's transfer units to return.

    Returns
    -------
    float
        N_G or N_L [-]; the height is N_G H_G = N_L H_L, with
        H_G = G/(k_y a) and H_L = L/(k_x a).

    Notes
    -----
    Closed-form interface for a straight line, :func:`scipy.optimize.brentq`
    for a curve; quadrature as in :func:`numerical_transfer_units`.  With a
    straight line N_G H_G equals N_OG H_OG (tested).

    References
    ----------
    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Ch. 8,
    Eqs. (8.22)-(8.23) (from memory).

    Examples
    --------
    >>> round(film_transfer_units(0.02, 0.001, 0.0, 1.8, 1.2, 40.0), 3)
    6.157

    """
    from scipy.optimize import brentq

    yi = float(_fraction("y_in", scalar("y_in", y_in)))
    yo = float(_fraction("y_out", scalar("y_out", y_out)))
    xi = float(_fraction("x_in", scalar("x_in", x_in)))
    LG = float(check_positive("L_over_G", scalar("L_over_G", L_over_G)))
    R = float(check_positive("kxa_over_kya", scalar("kxa_over_kya", kxa_over_kya)))
    if not isinstance(phase, str):
        raise InputTypeError(f"phase={phase!r} is a {type(phase).__name__}; pass 'gas' or 'liquid'")
    if phase not in ("gas", "liquid"):
        raise UnknownMethodError(f"phase={phase!r} is not known; pass 'gas' or 'liquid'")
    f = _equilibrium(equilibrium)
    slope = None if callable(equilibrium) else float(equilibrium)
    if not yi > yo:
        raise InputValueError(
            f"y_in={yi!r} is not above y_out={yo!r}; an absorber lowers the gas mole fraction"
        )

    def x_of(y: float) -> float:
        return xi + (y - yo) / LG

    if not x_of(yi) < 1.0:
        raise InputValueError(f"the leaving liquid would have x={x_of(yi)!r}; raise L_over_G={LG!r}")
    d0 = _top_force(lambda y: y - f(x_of(y)), yo, yi)

    def interface(y: float) -> tuple[float, float]:
        x = x_of(y)
        if slope is not None:
            x_i = (y + R * x) / (slope + R)
            return slope * x_i, x_i
        top = x + (y - f(x)) / R
        width = min(top, 1.0 - 1e-12) - x

        def balance(t: float) -> float:
            # the film balance on the interval [x, top] scaled to [0, 1], so the root is found to
            # the same relative precision at y ~ 1e-300 as at y ~ 0.01
            return (f(x + t * width) - y) / (R * width) + t

        if width <= 0.0 or balance(1.0) <= 0.0:  # x and its bound round together: no room to search
            return f(x + width), x + width
        x_i = x + float(brentq(balance, 0.0, 1.0, xtol=1e-15)) * width
        return f(x_i), x_i

    def integrand(y: float) -> float:
        y_i, x_i = interface(y)
        if phase == "gas":
            return 1.0 / (y - y_i)
        return 1.0 / (LG * (x_i - x_of(y)))

    return _quad_from_top(integrand, yo, yi, d0)


def _bool(name: str, value: object) -> bool:
    if not isinstance(value, bool | np.bool_):
        raise InputTypeError(f"{name}={value!r} is a {type(value).__name__}, not True or False")
    return bool(value)


@dataclass(frozen=True)
class ColumnProfile:
    """Profiles along a counter-current column from the column integrator.

    Attributes
    ----------
    z : numpy.ndarray
        Height above the bottom of the packing [m].
    y : numpy.ndarray
        Gas mole fraction of the solute [-].
    x : numpy.ndarray
        Liquid mole fraction of the solute [-].
    T : numpy.ndarray
        Liquid temperature [K].
    y_star : numpy.ndarray
        Gas mole fraction in equilibrium with the liquid [-].
    height : float
        Packed height [m].
    y_out : float
        Leaving-gas mole fraction (top) [-].
    x_out : float
        Leaving-liquid mole fraction (bottom) [-].
    recovery : float
        Fraction of the entering solute absorbed [-].
    H_OG : float
        G / (K_y a) at the gas inlet [m].
    N_OG : float
        height / H_OG [-] (the exact N_OG for a dilute gas).
    method : str
        What was integrated and how.

    """

    z: FloatArray
    y: FloatArray
    x: FloatArray
    T: FloatArray
    y_star: FloatArray
    height: float
    y_out: float
    x_out: float
    recovery: float
    H_OG: float
    N_OG: float
    method: str


@guard(check_output=False)
def column_profile(
    y_in: float,
    x_in: float,
    G: float,
    L: float,
    Kya: float,
    equilibrium: float | Callable[[float, float], float],
    y_out: float | None = None,
    height: float | None = None,
    T_in: float = 298.15,
    heat_of_absorption: float = 0.0,
    cp_liquid: float = 75.3,
    concentrated: bool = False,
    points: int = 51,
) -> ColumnProfile:
    r"""Integrate a counter-current absorber along its height: size it for y_out or rate a height.

    .. math::
        G\frac{dy}{ds} = L\frac{dx}{ds} = K_y a\,(y - y^*(x, T))\ \text{(dilute)},\qquad
        G'\frac{dY}{ds} = L'\frac{dX}{ds} = \frac{K_y a\,(y - y^*)}{(1-y)^*_{lm}}\
        \text{(concentrated)}

    with s the depth below the top, and the liquid temperature from an
    adiabatic balance :math:`T = T_{in} + \Delta H_{abs}(X - X_{in})/c_{p,L}`.

    Parameters
    ----------
    y_in : float
        Mole fraction of solute in the entering gas (bottom) [-].
    x_in : float
        Mole fraction of solute in the entering liquid (top) [-].
    G : float
        Entering gas molar flux per column cross-section [mol/(m^2 s)].
    L : float
        Entering liquid molar flux per column cross-section [mol/(m^2 s)].
    Kya : float
        Overall volumetric gas-side coefficient K_y a, on the dilute
        (stagnant-carrier-corrected) basis [mol/(m^3 s)].
    equilibrium : float or callable
        The slope m of y* = m x [-], or a function y*(x, T) returning a mole
        fraction (for a temperature-dependent Henry constant, m = H(T)/P).
    y_out : float, optional
        Leaving-gas mole fraction to size the column for [-].
    height : float, optional
        Packed height to rate [m]; give exactly one of ``y_out`` and ``height``.
    T_in : float
        Temperature of the entering liquid [K].
    heat_of_absorption : float
        Heat released per mole of solute absorbed, positive when exothermic
        [J/mol]; zero for an isothermal column.
    cp_liquid : float
        Molar heat capacity of the liquid (per mole of solvent) [J/(mol K)].
    concentrated : bool
        Track the solute-free flows and the log-mean inert factor instead of
        constant total flows.
    points : int
        Number of heights at which profiles are returned [-].

    Returns
    -------
    ColumnProfile
        Profiles of y, x, T and y* against height, and the end values.

    Raises
    ------
    InputValueError
        If y_out lies beyond the pinch, or the entering gas is not above
        equilibrium with the entering liquid.
    InputTypeError
        If neither or both of ``y_out`` and ``height`` are given (like a
        missing argument).

    Notes
    -----
    :func:`scipy.integrate.solve_ivp` (DOP853, relative tolerance 1e-10)
    from the top; sizing stops where y reaches y_in, rating shoots on y_out
    with :func:`scipy.optimize.brentq`.  The heat of absorption is taken up
    by the liquid alone and the gas is assumed at the liquid temperature
    (no solvent evaporation); for strongly exothermic absorption of
    concentrated gases use a rigorous rate-based model.  A dilute,
    isothermal, straight-line case reproduces :func:`transfer_units` times
    G/K_y a to 1e-6 (tested for y_out down to 1e-300: the absolute
    tolerances follow the driving force at the top, and rating searches
    ln(y_out - y*)).  A y_out within 2.2e-308 of y* at the top, or a height
    that brings it within 1e-301, is refused.

    References
    ----------
    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Ch. 8
    (from memory).
    Sherwood, T. K., Pigford, R. L. & Wilke, C. R. (1975). *Mass Transfer*.
    McGraw-Hill, Ch. 10 (non-isothermal absorbers, from memory).

    Examples
    --------
    >>> p = column_profile(0.02, 0.0, 20.0, 36.0, 40.0, 1.2, y_out=0.001)
    >>> round(p.height, 3)
    2.989

    """
    from scipy.integrate import solve_ivp
    from scipy.optimize import brentq

    yi = float(_fraction("y_in", scalar("y_in", y_in)))
    xi = float(_fraction("x_in", scalar("x_in", x_in)))
    Gv = float(check_positive("G", scalar("G", G)))
    Lv = float(check_positive("L", scalar("L", L)))
    K = float(check_positive("Kya", scalar("Kya", Kya)))
    T0 = float(check_positive("T_in", scalar("T_in", T_in)))
    dH = float(check_nonnegative("heat_of_absorption", scalar("heat_of_absorption", heat_of_absorption)))
    cp = float(check_positive("cp_liquid", scalar("cp_liquid", cp_liquid)))
    conc = _bool("concentrated", concentrated)
    if isinstance(points, bool) or not isinstance(points, int | np.integer):
        raise InputTypeError(f"points={points!r} is not an integer; pass the number of heights (>= 2)")
    if not 2 <= int(points) <= 100_000:
        raise InputValueError(
            f"points={points!r} is outside 2 to 100000; pass a number of heights in that range"
        )
    f = _equilibrium(equilibrium)
    if (y_out is None) == (height is None):
        raise InputTypeError("give exactly one of y_out (to size the column) and height (to rate it)")

    G_inert, L_inert = Gv * (1.0 - yi), Lv * (1.0 - xi)
    Xi = xi / (1.0 - xi)

    def temperature(x: float) -> float:
        X = x / (1.0 - x) if conc else x
        return T0 + dH * (X - (Xi if conc else xi)) / cp

    def rates(_s: float, state: FloatArray) -> list[float]:
        a, b = float(state[0]), float(state[1])
        if conc:
            y, x = a / (1.0 + a), b / (1.0 + b)
        else:
            y, x = a, b
        if not (0.0 <= x < 1.0 and 0.0 <= y < 1.0):
            raise InputValueError(
                f"the liquid mole fraction leaves [0, 1) inside the column (x={x!r}); raise L"
            )
        ystar = f(x, temperature(x))
        force = K * (y - ystar)
        if conc:
            force /= _inert_log_mean(y, ystar)
            return [force / G_inert, force / L_inert]
        return [force / Gv, force / Lv]

    def start(yo: float) -> list[float]:
        return [yo / (1.0 - yo), Xi] if conc else [yo, xi]

    ystar_top = f(xi, T0)
    if not yi > ystar_top:
        raise InputValueError(
            f"y_in={yi!r} is not above y*={ystar_top!r}, the gas in equilibrium with the entering liquid; "
            "nothing is absorbed (this is a stripping case)"
        )
    target = yi / (1.0 - yi) if conc else yi
    H_OG = Gv / K

    def options(force_top: float) -> dict[str, Any]:
        # absolute tolerances on the scale of the driving force at the top (y, then x), so a y_out
        # of 1e-300 is marched to the same relative precision as one of 1e-3
        atol = [1e-13 * force_top, 1e-13 * force_top * Gv / Lv]
        return {"method": "DOP853", "rtol": 1e-10, "atol": atol, "dense_output": True}

    def reached(_s: float, state: FloatArray) -> float:
        return float(state[0]) - target

    reached.terminal = True  # type: ignore[attr-defined]
    reached.direction = 1.0  # type: ignore[attr-defined]

    if y_out is not None:
        yo = float(_fraction("y_out", scalar("y_out", y_out)))
        if not ystar_top < yo < yi:
            raise InputValueError(
                f"y_out={yo!r} must lie between y*={ystar_top!r} (equilibrium with the entering "
                f"liquid) and y_in={yi!r}"
            )
        if yo - ystar_top < _TINY:
            raise InputValueError(
                f"y_out={yo!r} lies within {_TINY:.3g} (the smallest normal double) of y*={ystar_top!r}, "
                "the gas in equilibrium with the entering liquid, where the height cannot be computed "
                "to full precision; ask for y_out at least 1e-300 above it"
            )
        span = 1e4 * H_OG
        sol = solve_ivp(rates, (0.0, span), start(yo), events=reached, **options(yo - ystar_top))
        if sol.status != 1:
            raise InputValueError(
                f"y_out={yo!r} cannot be reached: the operating and equilibrium lines pinch, so no "
                f"height (searched to {span:.3g} m) brings the gas from y_in down to y_out; raise "
                "L/G (a larger absorption factor) or ask for a higher y_out"
            )
        assert sol.t_events is not None  # events were passed
        H = float(sol.t_events[0][0])
    else:
        H = float(check_positive("height", scalar("height", height)))

        def residual(u: float) -> float:
            # u = ln(y_out - y*_top).  Negative while the gas, marched down from the top, stays
            # below y_in over the whole height; positive (by the unused height) once it reaches
            # y_in early: continuous and monotone in u
            force_top = math.exp(u)
            s = solve_ivp(rates, (0.0, H), start(ystar_top + force_top), events=reached, **options(force_top))
            if s.status == 1:
                assert s.t_events is not None
                return (H - float(s.t_events[0][0])) / H
            return float(s.y[0, -1]) - target

        lowest = math.log(1e-301)
        if residual(lowest) >= 0.0:
            raise InputValueError(
                f"height={H!r} brings the leaving gas to within 1e-301 of y*={ystar_top!r}, the gas in "
                "equilibrium with the entering liquid: the column is far taller than any separation "
                "needs; pass a smaller height, or size the column for a y_out instead"
            )
        highest = math.log((yi - ystar_top) * (1.0 - 1e-9))  # just below y_in: the event is seen
        u = float(brentq(residual, lowest, highest, xtol=1e-13, rtol=1e-13, maxiter=200))
        yo = ystar_top + math.exp(u)
        sol = solve_ivp(rates, (0.0, H), start(yo), **options(yo - ystar_top))

    depth = np.linspace(0.0, H, int(points))
    assert sol.sol is not None  # dense output was asked for
    states = sol.sol(depth)
    a, b = states[0], states[1]
    y, x = (a / (1.0 + a), b / (1.0 + b)) if conc else (a, b)
    x = np.clip(x, 0.0, None)
    T = np.array([temperature(float(v)) for v in x])
    ystar = np.array([f(float(v), float(t)) for v, t in zip(x, T, strict=True)])
    x_out = float(x[-1])
    Y_in, Y_out = yi / (1.0 - yi), yo / (1.0 - yo)
    recovery = 1.0 - Y_out / Y_in if conc else 1.0 - yo / yi
    method = (
        ("concentrated (solute-free flows, log-mean inert factor)" if conc else "dilute (constant flows)")
        + ("; adiabatic liquid" if dH > 0.0 else "; isothermal")
        + ("; sized for y_out" if y_out is not None else "; rated at the given height")
        + "; scipy solve_ivp DOP853"
    )
    return ColumnProfile(
        z=np.asarray(H - depth[::-1], dtype=float),
        y=np.asarray(y[::-1], dtype=float),
        x=np.asarray(x[::-1], dtype=float),
        T=T[::-1].astype(float),
        y_star=ystar[::-1].astype(float),
        height=H,
        y_out=float(yo),
        x_out=x_out,
        recovery=float(recovery),
        H_OG=H_OG,
        N_OG=H / H_OG,
        method=method,
    )
