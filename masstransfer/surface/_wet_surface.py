r"""Temperature of a wet surface evaporating into a gas, and the wet-bulb temperature.

At steady state, with no radiation or conduction from supports, the
sensible heat reaching a wet surface pays for the evaporation from it:

.. math::

    h^\bullet (T - T_s) = N_A M_A \lambda(T_s), \qquad
    N_A = F \ln\frac{1 - y_{A,\infty}}{1 - y_{A,s}}, \qquad
    y_{A,s} = \frac{p^{sat}(T_s)}{P}

with F = k_c c from the Chilton-Colburn analogy (so h itself cancels) and
h* the Ackermann-corrected h.  Gas properties are taken at the film
temperature (T + T_s)/2; vapour pressure and latent heat at T_s.
"""

from __future__ import annotations

import functools
import math
from collections.abc import Callable, Mapping
from typing import Any, overload

import numpy as np

from .._typing import ArrayLike, FloatArray, FloatOrArray
from .._validation import check_nonnegative, check_positive, check_shapes, finish, guard, in_range
from ..constants import R_GAS
from ..errors import OutOfRangeError
from ..substances._species import Species
from ._medium import GasSide, LiquidSide, Override, gas_side, liquid_side

__all__ = ["solve_surface_temperature", "wet_bulb_temperature", "wet_surface_temperature"]

_ITERATIONS = 48  # bisection halvings: a 300 K bracket resolved to about 1e-12 K
_FILM_PASSES = 8  # film-property updates; two or three reach the tolerance
_TOLERANCE = 1e-10  # K, on the surface temperature (arrays and scalars agree to it)


#: A function of the film temperature's properties giving (h [W/(m^2 K)], F [mol/(m^2 s)]).
Transfer = Callable[[FloatArray, FloatArray, FloatArray, FloatArray, FloatArray, FloatArray], tuple[Any, Any]]


def _below_models(sp: Any, T_low: float, what: str) -> str:
    """Say why no answer exists below ``T_low``: the liquid freezes, or its property models stop."""
    Tm = getattr(sp, "Tm", None)
    if isinstance(Tm, float) and Tm >= T_low - 0.5:
        return (
            f"the {what} lies below {T_low:.2f} K, where {sp.name!r} freezes (melting point "
            f"{Tm:.2f} K); no liquid-surface value exists"
        )
    melt = f" (it melts at {Tm:.2f} K)" if isinstance(Tm, float) else ""
    return (
        f"the {what} lies below {T_low:.2f} K, where the property models of liquid {sp.name!r} "
        f"stop{melt}; pass your own vapour_pressure= and latent_heat= (functions of T [K]) valid "
        "lower down"
    )


def vapour_above_pressure(liquid: str, T: float, rh: float, p_sat: float, P: float) -> str:
    """Say that the vapour's partial pressure reaches the total pressure, with the numbers and the fix."""
    return (
        f"at T={T:g} K the vapour pressure of {liquid} is {p_sat:.6g} Pa, so relative_humidity={rh:g} "
        f"means a partial pressure of {rh * p_sat:.6g} Pa, at or above P={P:.6g} Pa: no such humid gas "
        f"exists (the liquid boils); raise P above {rh * p_sat:.6g} Pa, or lower T or the humidity"
    )


def solve_surface_temperature(
    liq: LiquidSide,
    gas: GasSide,
    Tb: FloatArray,
    yb: FloatArray,
    Pb: FloatArray,
    *,
    exponent: float,
    transfer: Transfer | None = None,
    extra_heat: Callable[[FloatArray], FloatArray] | None = None,
) -> FloatArray:
    r"""Solve the wet-surface energy balance for T_s, every element at once.

    .. math:: h^\bullet (T - T_s) + q_{extra}(T_s) = N_A M_A \lambda(T_s)

    ``transfer(Tf, P, rho, cp, k, D)`` gives h and the low-flux F at the film temperature;
    by default h = 1 and F from the Chilton-Colburn analogy (h cancels when there is no
    extra heat).  ``extra_heat(T_s)`` is heat reaching the surface other than by convection
    from the gas [W/m^2] (radiation, conduction through a support).
    """
    n = exponent
    M = liq.species.molar_mass
    lo_liq, hi_liq = liq.T_min, liq.T_max
    if math.isfinite(gas.T_max) and ((Tb > gas.T_max).any() or (Tb < gas.T_min).any()):
        raise OutOfRangeError(
            f"T outside {gas.T_min:.1f}-{gas.T_max:.1f} K, the range of the {gas.label} property models"
        )

    def clip(Ts: FloatArray) -> FloatArray:
        return np.clip(Ts, lo_liq, hi_liq) if lo_liq > 0 or math.isfinite(hi_liq) else Ts

    def film(Ts: FloatArray) -> tuple[Any, Any, FloatArray]:
        """h, F and the vapour's molar heat capacity at the film temperature of ``Ts``."""
        Tf = 0.5 * (Tb + Ts)
        rho = gas.density(Tf, Pb)
        cp = gas.heat_capacity(Tf)
        D = gas.diffusivity(Tf, Pb)
        if transfer is None:
            k = gas.thermal_conductivity(Tf)
            Le = k / (rho * cp * D)
            # F/h = k_c c / h with k_c/h = 1/(rho cp Le^n) and c = P/(R Tf)
            h: Any = 1.0
            F: Any = Pb / (R_GAS * Tf) / (rho * cp * Le**n)
        else:
            h, F = transfer(Tf, Pb, rho, cp, gas.thermal_conductivity(Tf), D)
        return h, F, liq.vapour_heat_capacity(Tf) * M

    def residual(Ts: FloatArray, props: tuple[Any, Any, FloatArray]) -> FloatArray:
        h, F, cpv = props
        ys = np.minimum(liq.vapour_pressure(clip(Ts)) / Pb, 0.999999)
        N = F * np.log((1.0 - yb) / (1.0 - ys))
        phi = N * cpv / h
        small = np.abs(phi) < 1e-9
        ack = np.where(small, 1.0 - phi / 2, phi / np.expm1(np.where(small, 1.0, phi)))
        q = ack * h * (Tb - Ts) - N * M * liq.latent_heat(clip(Ts))
        if extra_heat is not None:
            q = q + extra_heat(Ts)
        return np.asarray(q)

    lo = np.full_like(Tb, lo_liq) if lo_liq > 0 else 0.5 * Tb
    if extra_heat is None:
        hi = np.minimum(Tb, hi_liq)
    else:
        hi = _boiling_point(
            liq, Pb, lo, np.full_like(Tb, hi_liq if math.isfinite(hi_liq) else 2.0 * Tb.max())
        )
    props = film(Tb)  # first pass: film properties at the bulk temperature
    f_hi = residual(hi, props)
    saturated = f_hi >= 0  # bulk at saturation at T: no evaporation, the surface is at T
    y_sat = np.minimum(liq.vapour_pressure(clip(Tb)) / Pb, 1.0)
    supersaturated = saturated & (Tb <= hi_liq) & (yb > y_sat * (1 + 1e-6))
    if supersaturated.any():
        i = int(np.argmax(supersaturated))
        raise OutOfRangeError(
            f"the gas is supersaturated: y_bulk={yb.flat[i]:.4g} exceeds the saturation mole "
            f"fraction {y_sat.flat[i]:.4g} of {liq.species.name!r} at T={Tb.flat[i]:.2f} K and "
            f"P={Pb.flat[i]:.6g} Pa; vapour would condense (fog or dew) rather than evaporate: "
            "check the humidity, T and P"
        )
    if extra_heat is not None and saturated.any():
        raise OutOfRangeError(
            "the heat reaching the surface would bring the liquid to its boiling point; this is "
            "boiling, not evaporation into the gas: lower the radiant or conducted heat input"
        )
    if (saturated & (hi < Tb)).any():
        raise OutOfRangeError("the wet surface would be hotter than the liquid's modelled range")
    f_lo = residual(lo, props)
    if ((f_lo < 0) & ~saturated).any():
        raise OutOfRangeError(_below_models(liq.species, float(np.min(lo)), "surface temperature"))
    hi = np.where(saturated, lo, hi)  # nothing to solve there
    # The film properties change slowly with T_s: solve with them frozen, update, repeat; each
    # pass searches a narrow bracket around the last answer (widened where it misses the root).
    Ts = _illinois(functools.partial(residual, props=props), lo, hi, 1e-4)
    width = np.full_like(Ts, 1.0)
    for _ in range(_FILM_PASSES):
        props = film(np.where(saturated, Tb, Ts))
        a = np.maximum(Ts - width, lo)
        b = np.minimum(Ts + width, hi)
        fa = residual(a, props)
        fb = residual(b, props)
        miss = (fa < 0) | (fb > 0)
        a, b = np.where(miss, lo, a), np.where(miss, hi, b)
        Ts_new = _illinois(functools.partial(residual, props=props), a, b, _TOLERANCE)
        change = np.abs(Ts_new - Ts)
        Ts = Ts_new
        if float(np.max(change, initial=0.0)) < _TOLERANCE:
            break
        width = np.maximum(10.0 * change, 1e-6)
    return np.asarray(np.where(saturated, Tb, Ts))


def _illinois(
    f: Callable[[FloatArray], FloatArray], lo: FloatArray, hi: FloatArray, tolerance: float
) -> FloatArray:
    """Root of a decreasing f in [lo, hi] (f(lo) >= 0 >= f(hi)), elementwise: the Illinois method.

    Regula falsi with the retained end's value halved when one end is kept twice: every step
    stays inside the bracket (so it cannot diverge) and converges superlinearly.
    """
    a, b = np.array(lo, dtype=float), np.array(hi, dtype=float)
    fa, fb = f(a), f(b)
    side = np.zeros(a.shape, dtype=np.int8)
    c = 0.5 * (a + b)
    for _ in range(_ITERATIONS):
        span = fa - fb
        ok = (span > 0) & (b > a)
        c_new = np.clip(np.where(ok, (a * fb - b * fa) / np.where(ok, -span, -1.0), 0.5 * (a + b)), a, b)
        step = float(np.max(np.abs(c_new - c), initial=0.0))
        c = c_new
        if not ok.any() or step < 0.1 * tolerance or float(np.max(b - a, initial=0.0)) < tolerance:
            break
        fc = f(c)
        pos = fc > 0  # c replaces the low end
        fb = np.where(pos & (side == 1), 0.5 * fb, fb)
        fa = np.where(~pos & (side == -1), 0.5 * fa, fa)
        a, fa = np.where(pos, c, a), np.where(pos, fc, fa)
        b, fb = np.where(pos, b, c), np.where(pos, fb, fc)
        side = np.where(pos, 1, -1).astype(np.int8)
        exact = fc == 0
        a, b = np.where(exact, c, a), np.where(exact, c, b)
    return np.asarray(c)


def _boiling_point(liq: LiquidSide, P: FloatArray, lo: FloatArray, hi: FloatArray) -> FloatArray:
    """Temperature at which the vapour pressure reaches P (capped at ``hi``), by bisection."""
    top = liq.vapour_pressure(hi) <= P
    for _ in range(_ITERATIONS):
        mid = 0.5 * (lo + hi)
        below = liq.vapour_pressure(mid) < P
        lo = np.where(below, mid, lo)
        hi = np.where(below, hi, mid)
    return np.asarray(np.where(top, hi, 0.5 * (lo + hi)))


@guard
def wet_surface_temperature(
    liquid: str | Species,
    gas: str | Species | Mapping[str, float],
    T: ArrayLike,
    y_bulk: ArrayLike,
    P: ArrayLike = 101325.0,
    *,
    exponent: float = 2.0 / 3.0,
    vapour_pressure: Override = None,
    latent_heat: Override = None,
    cp_vapour: Override = None,
    rho: Override = None,
    cp: Override = None,
    k: Override = None,
    mu: Override = None,
    D: Override = None,
) -> FloatOrArray:
    """Steady temperature of a surface wetted by ``liquid`` evaporating into ``gas``.

    Parameters
    ----------
    liquid : str or Species
        The evaporating liquid, e.g. ``"water"``, ``"ethanol"``.
    gas : str or Species or mapping
        The gas, e.g. ``"air"``, ``"nitrogen"``, or a composition by mole fraction such as
        ``{"nitrogen": 0.79, "oxygen": 0.21}`` (mixture properties by the mixing rules of
        ``chemicals``, the diffusivity by Blanc's law).
    T : float or array_like
        Bulk gas temperature [K].
    y_bulk : float or array_like
        Mole fraction of the vapour in the bulk gas, 0 <= y < 1 [-].
    P : float or array_like
        Total pressure [Pa].
    exponent : float
        Chilton-Colburn exponent on the Lewis number [-].
    vapour_pressure : float or callable, optional
        The user's vapour pressure of the liquid [Pa]: a function of T [K] (it must accept
        numpy arrays), or a number used at every temperature.  Replaces the database value.
    latent_heat : float or callable, optional
        The user's specific enthalpy of vaporisation [J/kg], a number or a function of T [K].
    cp_vapour : float or callable, optional
        The user's specific heat capacity of the vapour [J/(kg K)] (Ackermann correction).
    rho : float or callable, optional
        The user's gas density [kg/m^3] (a function of T [K] at the given P, or a number).
    cp : float or callable, optional
        The user's gas specific heat capacity [J/(kg K)].
    k : float or callable, optional
        The user's gas thermal conductivity [W/(m K)].
    mu : float or callable, optional
        The user's gas viscosity [Pa s] (not needed for this balance; accepted for symmetry).
    D : float or callable, optional
        The user's diffusivity of the vapour in the gas [m^2/s].

    Returns
    -------
    float or numpy.ndarray
        Surface temperature T_s [K] (the wet-bulb temperature for water in
        air).

    Raises
    ------
    OutOfRangeError
        If the surface temperature falls outside the liquid range of the
        property models (for example below the freezing point), or if the
        gas is supersaturated at T (its vapour would condense).  A gas
        exactly at saturation gives T itself.

    Notes
    -----
    Uses the carrier-gas properties (dilute vapour) and Fuller
    diffusivities; the result inherits their errors, typically a few tenths
    of a kelvin for water in air.  Solved by bisection for every element at
    once.  A property passed by the user replaces the database's everywhere it
    is used; a liquid or gas the databases lack works once every property it
    needs is supplied.

    References
    ----------
    Bird, R. B., Stewart, W. E., & Lightfoot, E. N. (2002). *Transport
    Phenomena*, 2nd ed., Example 22.3-2 (wet- and dry-bulb psychrometry).

    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Section 7.

    Examples
    --------
    >>> round(wet_surface_temperature("ethanol", "air", 298.15, 0.0) - 273.15, 1)
    3.7
    >>> air = {"nitrogen": 0.7808, "oxygen": 0.2095, "argon": 0.0097}
    >>> round(wet_surface_temperature("ethanol", air, 298.15, 0.0) - 273.15, 1)
    3.5

    """
    Tv = check_positive("T", T)
    y = check_nonnegative("y_bulk", y_bulk)
    Pv = check_positive("P", P)
    n = check_positive("exponent", exponent)
    check_shapes(T=Tv, y_bulk=y, P=Pv)
    in_range("y_bulk", y, 0.0, 0.999999, "pass a vapour mole fraction from 0 to below 1")
    liq = liquid_side(liquid, vapour_pressure=vapour_pressure, latent_heat=latent_heat, cp_vapour=cp_vapour)
    side = gas_side(liq.species, gas, name="gas", rho=rho, cp=cp, k=k, mu=mu, D=D)
    Tb, yb, Pb = np.broadcast_arrays(np.asarray(Tv, float), np.asarray(y, float), np.asarray(Pv, float))
    return finish(solve_surface_temperature(liq, side, Tb, yb, Pb, exponent=float(n)))


@overload
def wet_bulb_temperature(T: float, relative_humidity: float, P: float = ...) -> float: ...
@overload
def wet_bulb_temperature(T: FloatArray, relative_humidity: ArrayLike, P: ArrayLike = ...) -> FloatArray: ...
@overload
def wet_bulb_temperature(T: ArrayLike, relative_humidity: ArrayLike, P: ArrayLike = ...) -> FloatOrArray: ...
@guard
def wet_bulb_temperature(T: ArrayLike, relative_humidity: ArrayLike, P: ArrayLike = 101325.0) -> FloatOrArray:
    """Psychrometric wet-bulb temperature of humid air, from the heat-mass analogy.

    Parameters
    ----------
    T : float or array_like
        Dry-bulb temperature [K].
    relative_humidity : float or array_like
        Relative humidity, 0 to 1 [-] (not per cent).
    P : float or array_like
        Total pressure [Pa].

    Returns
    -------
    float or numpy.ndarray
        Wet-bulb temperature [K].

    Notes
    -----
    This is the temperature of a wetted, well-ventilated thermometer
    (convective heat in = latent heat out), not the adiabatic-saturation
    ("thermodynamic") wet bulb.  For air-water the two nearly coincide
    because the psychrometric ratio is close to one; the analogy gives a
    ratio :math:`Le^{2/3}` of about 0.9, which puts this value below the
    adiabatic-saturation temperature by up to about 6 % of the wet-bulb
    depression (0.7 K at 50 C and 10 % relative humidity).  Below the
    freezing point of water it raises rather than return an ice-bulb value.

    References
    ----------
    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Section 7.1
    (wet-bulb temperature), Eq. (7.26).

    Examples
    --------
    >>> round(wet_bulb_temperature(303.15, 0.5) - 273.15, 1)
    21.8

    """
    from ..substances._properties import liquid_model

    Tv = check_positive("T", T)
    rh = check_nonnegative("relative_humidity", relative_humidity)
    in_range("relative_humidity", rh, 0.0, 1.0, "pass a fraction from 0 to 1 (not per cent)")
    Pv = check_positive("P", P)
    check_shapes(T=Tv, relative_humidity=rh, P=Pv)
    w = liquid_model("water")
    ps = np.asarray(w.vapor_pressure(Tv), dtype=float)
    y = np.asarray(rh) * ps / np.asarray(Pv)
    if (y >= 1).any():
        i = int(np.argmax(np.ravel(y >= 1)))
        pick = [float(np.ravel(np.broadcast_to(v, np.shape(y)))[i]) for v in (Tv, rh, ps, Pv)]
        raise OutOfRangeError(vapour_above_pressure("water", *pick))
    return wet_surface_temperature("water", "air", Tv, finish(y), Pv)
