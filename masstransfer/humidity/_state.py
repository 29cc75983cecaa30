"""Psychrometrics for any condensable vapour in any gas: the state of a humid gas.

The vapour and the dry gas are ideal gases; the liquid's vapour pressure, latent heat and heat
capacities come from the library's property layer (or the user).  Enthalpies are per kilogram
of dry gas, referred to dry gas and pure liquid at the reference temperature.
"""

from __future__ import annotations

import functools
import math
from collections.abc import Callable, Mapping
from dataclasses import dataclass, field
from typing import Any

import numpy as np

from .._typing import ArrayLike, FloatArray, FloatOrArray
from .._validation import check_nonnegative, check_positive, check_shapes, finish, guard, in_range, scalar
from ..constants import R_GAS
from ..errors import InputTypeError, InputValueError, OutOfRangeError
from ..substances._species import Species
from ..surface._medium import GasSide, LiquidSide, Override, gas_side, liquid_side
from ..surface._wet_surface import _below_models, vapour_above_pressure

__all__ = ["HumidGasState", "humid_gas_state", "humidity_ratio_from_y", "y_from_humidity_ratio"]

#: Reference temperature of the enthalpies: dry gas and liquid at 0 C (the humid-air convention).
T_REFERENCE = 273.15
#: Bisection halvings for the implicit temperatures (a 400 K bracket to about 1e-12 K).
_ITERATIONS = 50
#: Gauss-Legendre nodes and weights on [-1, 1] for the heat-capacity integrals.
_GL_X, _GL_W = np.polynomial.legendre.leggauss(8)

HUMIDITY_KEYWORDS = ("relative_humidity", "y", "humidity_ratio", "dew_point")


@guard
def humidity_ratio_from_y(y: ArrayLike, M_vapour: ArrayLike, M_gas: ArrayLike) -> FloatOrArray:
    r"""Humidity ratio (kg vapour per kg dry gas) from the vapour mole fraction.

    .. math:: Y = \frac{y}{1 - y}\,\frac{M_v}{M_g}

    Parameters
    ----------
    y : float or array_like
        Mole fraction of the vapour, 0 <= y < 1 [-].
    M_vapour : float or array_like
        Molar mass of the vapour [kg/mol].
    M_gas : float or array_like
        Molar mass of the dry gas [kg/mol].

    Returns
    -------
    float or numpy.ndarray
        Humidity ratio Y [kg/kg dry gas].

    Notes
    -----
    Exact for any mixture (a mass ratio); for water in air M_v/M_g = 0.622.

    References
    ----------
    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Eq. (7.8).

    Examples
    --------
    >>> round(humidity_ratio_from_y(0.02, 0.018015, 0.028965), 5)
    0.01269

    """
    yv = check_nonnegative("y", y)
    in_range("y", yv, 0.0, 0.999999, "pass a vapour mole fraction from 0 to below 1")
    Mv = check_positive("M_vapour", M_vapour)
    Mg = check_positive("M_gas", M_gas)
    check_shapes(y=yv, M_vapour=Mv, M_gas=Mg)
    return finish(np.asarray(yv) / (1.0 - np.asarray(yv)) * (np.asarray(Mv) / Mg))


@guard
def y_from_humidity_ratio(humidity_ratio: ArrayLike, M_vapour: ArrayLike, M_gas: ArrayLike) -> FloatOrArray:
    r"""Vapour mole fraction from the humidity ratio (kg vapour per kg dry gas).

    .. math:: y = \frac{Y M_g / M_v}{1 + Y M_g / M_v}

    Parameters
    ----------
    humidity_ratio : float or array_like
        Humidity ratio Y, zero or more [kg/kg dry gas].
    M_vapour : float or array_like
        Molar mass of the vapour [kg/mol].
    M_gas : float or array_like
        Molar mass of the dry gas [kg/mol].

    Returns
    -------
    float or numpy.ndarray
        Mole fraction of the vapour [-].

    Notes
    -----
    The inverse of :func:`humidity_ratio_from_y`.

    References
    ----------
    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Eq. (7.8).

    Examples
    --------
    >>> round(y_from_humidity_ratio(0.01269, 0.018015, 0.028965), 4)
    0.02

    """
    Y = check_nonnegative("humidity_ratio", humidity_ratio, "pass a humidity ratio of zero or more [kg/kg]")
    Mv = check_positive("M_vapour", M_vapour)
    Mg = check_positive("M_gas", M_gas)
    check_shapes(humidity_ratio=Y, M_vapour=Mv, M_gas=Mg)
    n = np.asarray(Y) * (np.asarray(Mg) / Mv)
    return finish(n / (1.0 + n))


# --------------------------------------------------------------------------
# shared machinery (used by evaporation, towers and drying)
# --------------------------------------------------------------------------


def whole_number(name: str, value: Any, low: int, high: int) -> int:
    """Require a single whole number from low to high (wrong types are type errors)."""
    v = scalar(name, value)
    if not (math.isfinite(v) and v == int(v) and low <= v <= high):
        raise InputValueError(f"{name}={value!r} must be a whole number from {low} to {high}")
    return int(v)


def bisect(
    f: Callable[[FloatArray], FloatArray], lo: FloatArray, hi: FloatArray, iterations: int = _ITERATIONS
) -> FloatArray:
    """Root of f between lo and hi, elementwise, for f(lo) > 0 > f(hi) (or the reverse, same sign)."""
    f_lo_positive = f(lo) > 0
    for _ in range(iterations):
        mid = 0.5 * (lo + hi)
        same = (f(mid) > 0) == f_lo_positive
        lo = np.where(same, mid, lo)
        hi = np.where(same, hi, mid)
    return np.asarray(0.5 * (lo + hi))


def integral(fn: Callable[[FloatArray], FloatArray], a: FloatArray | float, b: FloatArray) -> FloatArray:
    """Integral of a smooth fn(T) from a to b, elementwise (8-point Gauss-Legendre)."""
    a_arr = np.asarray(a, dtype=float)
    b_arr = np.asarray(b, dtype=float)
    half = 0.5 * (b_arr - a_arr)
    mid = 0.5 * (b_arr + a_arr)
    nodes = mid[..., None] + half[..., None] * _GL_X
    values = np.asarray(fn(nodes), dtype=float)
    return np.asarray(half * (values * _GL_W).sum(axis=-1))


@dataclass(frozen=True, eq=False)
class Pair:
    """A liquid and a dry gas with everything the psychrometric balances need."""

    liq: LiquidSide
    gas: GasSide
    T_ref: float

    @property
    def ratio(self) -> float:
        """M_vapour / M_gas [-]."""
        return self.liq.species.molar_mass / self.gas.molar_mass

    def Y_from_y(self, y: FloatArray) -> FloatArray:
        return np.asarray(y / (1.0 - y) * self.ratio)

    def y_from_Y(self, Y: FloatArray) -> FloatArray:
        n = Y / self.ratio
        return np.asarray(n / (1.0 + n))

    def saturation_Y(self, T: FloatArray, P: FloatArray) -> FloatArray:
        """Humidity ratio at saturation [kg/kg]; raises where the liquid boils at P."""
        ps = self.liq.vapour_pressure(T)
        if (ps >= P).any():
            raise OutOfRangeError(
                f"the vapour pressure of {self.liq.species.name!r} reaches the total pressure at "
                f"{float(np.asarray(T)[ps >= P].ravel()[0]) if np.ndim(T) else float(T):.2f} K: "
                "the liquid boils there; lower T or raise P"
            )
        return np.asarray(ps / (P - ps) * self.ratio)

    def vapour_enthalpy(self, T: FloatArray) -> FloatArray:
        """Enthalpy of the vapour at T referred to the liquid at T_ref [J/kg vapour]."""
        lam = self.liq.latent_heat(np.asarray(self.T_ref))
        return np.asarray(lam + integral(self.liq.vapour_heat_capacity, self.T_ref, T))

    def liquid_enthalpy(self, T: FloatArray) -> FloatArray:
        """Enthalpy of the liquid at T referred to the liquid at T_ref [J/kg]."""
        return integral(self.liq.liquid_heat_capacity, self.T_ref, T)

    def enthalpy(self, T: FloatArray, Y: FloatArray) -> FloatArray:
        """Enthalpy of humid gas [J/kg dry gas]."""
        dry = integral(self.gas.heat_capacity, self.T_ref, T)
        return np.asarray(dry + Y * self.vapour_enthalpy(T))

    def humid_heat(self, T: FloatArray, Y: FloatArray) -> FloatArray:
        """Humid heat c_s [J/(kg dry gas K)]."""
        return np.asarray(self.gas.heat_capacity(T) + Y * self.liq.vapour_heat_capacity(T))

    def temperature_from_enthalpy(self, H: FloatArray, Y: FloatArray, guess: FloatArray) -> FloatArray:
        """Gas temperature with enthalpy H at humidity ratio Y (Newton from ``guess``)."""
        T = np.asarray(guess, dtype=float)
        for _ in range(2):  # from a guess within a few kelvin, two steps reach about 1e-8 K
            T = T + (H - self.enthalpy(T, Y)) / self.humid_heat(T, Y)
        return T

    def dew_point(self, y: FloatArray, P: FloatArray, T: FloatArray) -> FloatArray:
        """Temperature at which the vapour pressure equals y P [K]."""
        p = y * P
        if (p <= 0).any():
            raise OutOfRangeError("a gas holding no vapour has no dew point; it exists only for y > 0")
        lo = np.full_like(p, self.liq.T_min if self.liq.T_min > 0 else 1.0)
        below = self.liq.vapour_pressure(lo) > p
        if below.any():
            raise OutOfRangeError(
                f"the dew point lies below {float(lo.ravel()[0]):.2f} K, the lowest temperature of the "
                f"liquid models of {self.liq.species.name!r} (it would deposit as a solid, or the "
                "vapour-pressure model does not reach); no liquid dew point exists"
            )
        hi = np.maximum(T, lo)
        return bisect(lambda t: self.liq.vapour_pressure(t) - p, lo, hi)

    def adiabatic_saturation(self, T: FloatArray, Y: FloatArray, P: FloatArray) -> FloatArray:
        """Adiabatic-saturation temperature [K] (energy balance on a saturator)."""
        H_in = self.enthalpy(T, Y)
        lo = np.full_like(T, self.liq.T_min if self.liq.T_min > 0 else 0.5 * float(np.min(T)))

        def balance(Ts: FloatArray) -> FloatArray:
            Ys = self.saturation_Y(Ts, P)
            return np.asarray(H_in + (Ys - Y) * self.liquid_enthalpy(Ts) - self.enthalpy(Ts, Ys))

        hi = np.asarray(T, dtype=float)
        if (balance(lo) <= 0).any():
            raise OutOfRangeError(
                _below_models(self.liq.species, float(lo.ravel()[0]), "adiabatic-saturation temperature")
            )
        return bisect(balance, lo, hi)


def make_pair(
    liquid: str | Species,
    gas: str | Species | Mapping[str, float],
    *,
    vapour_pressure: Override = None,
    latent_heat: Override = None,
    cp_vapour: Override = None,
    cp_liquid: Override = None,
    rho: Override = None,
    cp: Override = None,
    k: Override = None,
    mu: Override = None,
    D: Override = None,
    diffusivity_method: str | None = None,
) -> Pair:
    """Resolve a liquid and a dry gas once, with the user's overrides."""
    liq = liquid_side(
        liquid,
        vapour_pressure=vapour_pressure,
        latent_heat=latent_heat,
        cp_vapour=cp_vapour,
        cp_liquid=cp_liquid,
    )
    side = gas_side(
        liq.species, gas, name="gas", diffusivity_method=diffusivity_method, rho=rho, cp=cp, k=k, mu=mu, D=D
    )
    if any(sp == liq.species for sp in _components(gas)):
        raise InputValueError(
            f"gas={gas!r} contains {liq.species.name!r}, the evaporating liquid itself; pass the dry "
            "gas and give the vapour content by one humidity keyword"
        )
    T_ref = T_REFERENCE
    if not (liq.T_min <= T_REFERENCE <= liq.T_max):
        T_ref = liq.T_min  # the liquid models do not reach 0 C: refer enthalpies to their lowest T
    return Pair(liq=liq, gas=side, T_ref=T_ref)


def _components(gas: Any) -> list[Species]:
    from ..substances._species import species

    if isinstance(gas, Mapping):
        return [species(key) for key in gas]
    return [species(gas)]


def resolve_humidity(
    pair: Pair,
    T: FloatArray,
    P: FloatArray,
    given: Mapping[str, Any],
) -> tuple[FloatArray, str]:
    """Vapour mole fraction from exactly one humidity keyword; returns (y, the keyword used)."""
    passed = {k: v for k, v in given.items() if v is not None}
    if len(passed) != 1:
        named = ", ".join(HUMIDITY_KEYWORDS)
        got = ", ".join(passed) or "none"
        raise InputTypeError(
            f"give exactly one humidity measure of the gas ({named}); got {got}. For a dry gas pass y=0.0"
        )
    ((key, value),) = passed.items()
    ps = pair.liq.vapour_pressure(T)
    if key == "relative_humidity":
        rh = check_nonnegative("relative_humidity", value)
        in_range("relative_humidity", rh, 0.0, 1.0, "pass a fraction from 0 to 1 (not per cent)")
        check_shapes(T=T, relative_humidity=rh)
        y = np.asarray(rh) * ps / P
    elif key == "y":
        yv = check_nonnegative("y", value)
        in_range("y", yv, 0.0, 0.999999, "pass a vapour mole fraction from 0 to below 1")
        check_shapes(T=T, y=yv)
        y = np.asarray(yv, dtype=float) * np.ones_like(T)
    elif key == "humidity_ratio":
        Y = check_nonnegative(
            "humidity_ratio", value, "pass a humidity ratio of zero or more [kg/kg dry gas]"
        )
        check_shapes(T=T, humidity_ratio=Y)
        y = pair.y_from_Y(np.asarray(Y, dtype=float)) * np.ones_like(T)
    else:
        Td = check_positive("dew_point", value, "pass a dew point in K, at or below T")
        check_shapes(T=T, dew_point=Td)
        Tda = np.asarray(Td, dtype=float) * np.ones_like(T)
        if (Tda > T * (1 + 1e-12)).any():
            raise InputValueError(
                "dew_point lies above T; the gas would be supersaturated: pass a dew point <= T"
            )
        y = pair.liq.vapour_pressure(Tda) / P
    y = np.asarray(y, dtype=float) * np.ones(np.broadcast_shapes(np.shape(T), np.shape(P)))
    if (y > ps / P * (1.0 + 1e-9)).any():
        raise InputValueError(
            f"the {key} given puts more vapour in the gas than it holds at saturation at T "
            "(relative humidity above 1); pass a lower humidity or a higher T"
        )
    if (y >= 1.0).any():
        i = int(np.argmax(np.ravel(y >= 1.0)))
        Ti, psi, Pi = (float(np.ravel(np.broadcast_to(v, y.shape))[i]) for v in (T, ps, P))
        raise OutOfRangeError(
            vapour_above_pressure(pair.liq.species.name, Ti, y.ravel()[i] * Pi / psi, psi, Pi)
        )
    return y, key


@dataclass(frozen=True, eq=False)
class HumidGasState:
    """The state of a gas holding a condensable vapour.

    Attributes
    ----------
    liquid, gas : str
        The condensable species and the dry gas (a name or a composition), as resolved.
    T, P : float or numpy.ndarray
        Temperature [K] and total pressure [Pa].
    y : float or numpy.ndarray
        Mole fraction of the vapour [-].
    humidity_ratio : float or numpy.ndarray
        kg vapour per kg dry gas [kg/kg].
    relative_humidity : float or numpy.ndarray
        Partial pressure over the saturation pressure at T [-].
    partial_pressure, saturation_pressure : float or numpy.ndarray
        Of the vapour at T [Pa].
    enthalpy : float or numpy.ndarray
        Of the humid gas per kg dry gas [J/kg], referred to dry gas and liquid at ``T_ref``.
    humid_heat : float or numpy.ndarray
        c_s [J/(kg dry gas K)].
    humid_volume : float or numpy.ndarray
        Volume per kg dry gas [m^3/kg].
    T_ref : float
        Reference temperature of the enthalpy [K].
    dew_point, wet_bulb, adiabatic_saturation : float or numpy.ndarray
        Computed on first access [K]: the dew point, the psychrometric (wetted-surface) wet
        bulb from the heat-mass analogy, and the adiabatic-saturation temperature.

    """

    liquid: str
    gas: str
    T: FloatOrArray
    P: FloatOrArray
    y: FloatOrArray
    humidity_ratio: FloatOrArray
    relative_humidity: FloatOrArray
    partial_pressure: FloatOrArray
    saturation_pressure: FloatOrArray
    enthalpy: FloatOrArray
    humid_heat: FloatOrArray
    humid_volume: FloatOrArray
    T_ref: float
    user_supplied: tuple[str, ...]
    _pair: Pair = field(repr=False)
    _exponent: float = field(repr=False, default=2.0 / 3.0)

    @functools.cached_property
    def dew_point(self) -> FloatOrArray:
        """Dew point [K] (raises OutOfRangeError where none exists in the liquid range)."""
        T, P, y = (np.asarray(v, dtype=float) for v in (self.T, self.P, self.y))
        return finish(self._pair.dew_point(y, P, T))

    @functools.cached_property
    def wet_bulb(self) -> FloatOrArray:
        """Psychrometric wet-bulb temperature [K], from the heat-mass analogy."""
        from ..surface._wet_surface import solve_surface_temperature

        T, P, y = (np.asarray(v, dtype=float) for v in (self.T, self.P, self.y))
        Tb, yb, Pb = np.broadcast_arrays(T, y, P)
        return finish(
            solve_surface_temperature(self._pair.liq, self._pair.gas, Tb, yb, Pb, exponent=self._exponent)
        )

    @functools.cached_property
    def adiabatic_saturation(self) -> FloatOrArray:
        """Adiabatic-saturation temperature [K]."""
        T, P, Y = (np.asarray(v, dtype=float) for v in (self.T, self.P, self.humidity_ratio))
        Tb, Yb, Pb = np.broadcast_arrays(T, Y, P)
        return finish(self._pair.adiabatic_saturation(Tb, Yb, Pb))


def state_from_y(pair: Pair, T: FloatArray, P: FloatArray, y: FloatArray, exponent: float) -> HumidGasState:
    """Build a state from arrays already checked."""
    ps = pair.liq.vapour_pressure(T)
    Y = pair.Y_from_y(y)
    Mv, Mg = pair.liq.species.molar_mass, pair.gas.molar_mass
    return HumidGasState(
        liquid=pair.liq.species.name,
        gas=pair.gas.label,
        T=finish(T),
        P=finish(P),
        y=finish(y),
        humidity_ratio=finish(Y),
        relative_humidity=finish(y * P / ps),
        partial_pressure=finish(y * P),
        saturation_pressure=finish(ps * np.ones_like(y)),
        enthalpy=finish(pair.enthalpy(T, Y)),
        humid_heat=finish(pair.humid_heat(T, Y)),
        humid_volume=finish((1.0 / Mg + Y / Mv) * R_GAS * T / P),
        T_ref=pair.T_ref,
        user_supplied=tuple(dict.fromkeys((*pair.liq.user_supplied, *pair.gas.user_supplied))),
        _pair=pair,
        _exponent=exponent,
    )


@guard
def humid_gas_state(
    liquid: str | Species,
    gas: str | Species | Mapping[str, float],
    T: ArrayLike,
    P: ArrayLike = 101325.0,
    *,
    relative_humidity: ArrayLike | None = None,
    y: ArrayLike | None = None,
    humidity_ratio: ArrayLike | None = None,
    dew_point: ArrayLike | None = None,
    exponent: float = 2.0 / 3.0,
    vapour_pressure: Override = None,
    latent_heat: Override = None,
    cp_vapour: Override = None,
    cp_liquid: Override = None,
    cp: Override = None,
) -> HumidGasState:
    r"""Psychrometric state of a gas holding the vapour of ``liquid``, from one humidity measure.

    .. math::

        Y = \frac{y}{1-y}\frac{M_v}{M_g}, \qquad
        H = \int_{T_0}^{T} c_{p,g}\,dT + Y\left[\lambda(T_0) + \int_{T_0}^{T} c_{p,v}\,dT\right]

    and the adiabatic-saturation temperature :math:`T_{as}` from
    :math:`H(T, Y) + (Y_{as} - Y)\,h_L(T_{as}) = H(T_{as}, Y_{as})`.

    Parameters
    ----------
    liquid : str or Species
        The condensable species, e.g. ``"water"``, ``"toluene"``.
    gas : str or Species or mapping
        The dry gas, e.g. ``"air"``, ``"nitrogen"``, or a composition by mole fraction.
    T : float or array_like
        Temperature [K].
    P : float or array_like
        Total pressure [Pa].
    relative_humidity : float or array_like, optional
        Relative humidity, 0 to 1 [-] (not per cent).
    y : float or array_like, optional
        Mole fraction of the vapour [-].
    humidity_ratio : float or array_like, optional
        kg vapour per kg dry gas [kg/kg].
    dew_point : float or array_like, optional
        Dew point [K].
    exponent : float
        Chilton-Colburn exponent on the Lewis number for the wet bulb [-].
    vapour_pressure : float or callable, optional
        The user's vapour pressure [Pa], a function of T [K] accepting arrays (or a number).
    latent_heat : float or callable, optional
        The user's enthalpy of vaporisation [J/kg], a number or a function of T [K].
    cp_vapour : float or callable, optional
        The user's vapour heat capacity [J/(kg K)].
    cp_liquid : float or callable, optional
        The user's liquid heat capacity [J/(kg K)] (adiabatic saturation).
    cp : float or callable, optional
        The user's dry-gas heat capacity [J/(kg K)].

    Returns
    -------
    HumidGasState
        ``humidity_ratio`` [kg/kg dry gas], ``relative_humidity``, ``dew_point`` [K],
        ``enthalpy`` [J/kg dry gas], ``wet_bulb`` [K], ``adiabatic_saturation`` [K] and more.

    Raises
    ------
    InputValueError
        If not exactly one humidity measure is given, or the gas would be supersaturated.

    Notes
    -----
    Ideal gas and ideal mixing (no enhancement factor): for water in air at 1 atm the
    humidity ratio is about 0.4 % below that of real humid air, the enthalpy within about
    0.5 %.  The wet bulb is the steady temperature of a wetted surface (convection pays for
    evaporation, Chilton-Colburn analogy); the adiabatic-saturation temperature is a
    thermodynamic property.  They nearly coincide for water in air (psychrometric ratio near
    1) and differ by several kelvin for organic vapours (ratio near 2).  Enthalpies refer to
    dry gas and liquid at 273.15 K, or, for a liquid whose models do not reach it, at the
    lowest temperature they cover (``T_ref``).  Organic vapours in air or nitrogen are often
    flammable: compare concentrations with the lower flammability limit and rely on measured
    data, local codes and licensed engineering practice.

    References
    ----------
    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Chapter 7 (Eqs. 7.8, 7.13,
    7.21 and the adiabatic-saturation balance).

    Examples
    --------
    >>> s = humid_gas_state("water", "air", T=303.15, relative_humidity=0.5)
    >>> round(s.humidity_ratio, 4), round(s.dew_point - 273.15, 1)
    (0.0133, 18.4)

    """
    Tv = check_positive("T", T)
    Pv = check_positive("P", P)
    n = check_positive("exponent", exponent)
    check_shapes(T=Tv, P=Pv)
    pair = make_pair(
        liquid,
        gas,
        vapour_pressure=vapour_pressure,
        latent_heat=latent_heat,
        cp_vapour=cp_vapour,
        cp_liquid=cp_liquid,
        cp=cp,
    )
    Ta, Pa = np.broadcast_arrays(np.asarray(Tv, dtype=float), np.asarray(Pv, dtype=float))
    given = {
        "relative_humidity": relative_humidity,
        "y": y,
        "humidity_ratio": humidity_ratio,
        "dew_point": dew_point,
    }
    yv, _ = resolve_humidity(pair, Ta, Pa, given)
    Tb, Pb, yb = np.broadcast_arrays(Ta, Pa, yv)
    if math.isfinite(pair.gas.T_max) and ((Tb > pair.gas.T_max).any() or (Tb < pair.gas.T_min).any()):
        raise OutOfRangeError(
            f"T outside {pair.gas.T_min:.1f}-{pair.gas.T_max:.1f} K, the range of the {pair.gas.label} models"
        )
    return state_from_y(pair, Tb, Pb, yb, float(n))
