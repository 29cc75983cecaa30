r"""Permeation through films, walls and laminates: steady fluxes, units, time lag, packaging.

A layer is given by its thickness and either its diffusivity D and
solubility S (Henry-type, :math:`c = S\,p`) or its permeability
:math:`\mathcal{P} = D S`.  Layers in series add resistances like thermal
resistances: :math:`R_i = L_i/\mathcal{P}_i` per unit area, and a fluid film
with coefficient k_c adds :math:`RT/k_c` on a partial-pressure basis.

SI internally: permeability in mol/(m s Pa), permeance (thickness
included) in mol/(m^2 s Pa).  :func:`convert_permeability`,
:func:`convert_permeance` and :func:`convert_flux` read the trade's units
from one table each.
"""

from __future__ import annotations

import math
from collections.abc import Sequence
from dataclasses import dataclass, field
from types import MappingProxyType
from typing import Final, overload

import numpy as np

from .._frozen import FrozenResult
from .._typing import ArrayLike, FloatArray, FloatOrArray
from .._validation import (
    MAGNITUDE_LIMIT,
    as_float,
    check_nonnegative,
    check_positive,
    check_shapes,
    finish,
    guard,
    scalar,
)
from ..constants import ATM, R_GAS, T_ICE
from ..errors import InputTypeError, InputValueError, UnknownMethodError

__all__ = [
    "FLUX_UNITS",
    "PERMEABILITY_UNITS",
    "PERMEANCE_UNITS",
    "BarrierResult",
    "IngressResult",
    "Layer",
    "TimeLagFit",
    "convert_flux",
    "convert_permeability",
    "convert_permeance",
    "diffusivity_from_time_lag",
    "fit_time_lag",
    "oxygen_ingress",
    "permeability",
    "permeation_curve",
    "steady_flux",
    "time_lag",
]

# --- units ------------------------------------------------------------------------------
#: Moles in one cm^3 of ideal gas at STP (273.15 K, 101325 Pa) [mol] (IUPAC older STP; the
#: convention of the permeation trade's cm^3(STP)).
_CM3_STP: Final = 1e-6 * ATM / (R_GAS * T_ICE)
_DAY: Final = 86400.0
_CMHG: Final = ATM / 76.0
_MIL: Final = 25.4e-6
_IN2_100: Final = 100 * 0.0254**2
_M_WATER: Final = 0.01801528  # kg/mol
_M_O2_MG: Final = 31998.8  # mg/mol of O2 (IUPAC standard atomic weights)

#: Permeability units -> factor to SI mol/(m s Pa).
PERMEABILITY_UNITS: Final = MappingProxyType(
    {
        "mol/(m s Pa)": 1.0,
        "barrer": 1e-10 * _CM3_STP * 1e-2 / (1e-4 * _CMHG),
        "cm3(STP) cm/(cm2 s cmHg)": _CM3_STP * 1e-2 / (1e-4 * _CMHG),
        "cm3(STP) mm/(m2 day atm)": _CM3_STP * 1e-3 / (_DAY * ATM),
        "cm3(STP) um/(m2 day atm)": _CM3_STP * 1e-6 / (_DAY * ATM),
        "cm3(STP) mil/(m2 day atm)": _CM3_STP * _MIL / (_DAY * ATM),
        "cm3(STP) mil/(100 in2 day atm)": _CM3_STP * _MIL / (_IN2_100 * _DAY * ATM),
        "g(H2O) mm/(m2 day kPa)": 1e-3 / _M_WATER * 1e-3 / (_DAY * 1000.0),
        "g(H2O) mil/(100 in2 day mmHg)": 1e-3 / _M_WATER * _MIL / (_IN2_100 * _DAY * _CMHG / 10.0),
    }
)
#: Permeance (transmission rate per unit partial-pressure difference) -> SI mol/(m^2 s Pa).
PERMEANCE_UNITS: Final = MappingProxyType(
    {
        "mol/(m2 s Pa)": 1.0,
        "cm3(STP)/(m2 day atm)": _CM3_STP / (_DAY * ATM),
        "cm3(STP)/(100 in2 day atm)": _CM3_STP / (_IN2_100 * _DAY * ATM),
        "GPU": 1e-6 * _CM3_STP / (1e-4 * _CMHG),  # gas permeation unit, 1e-6 cm3(STP)/(cm2 s cmHg)
    }
)
#: Transmission rates (fluxes) -> SI mol/(m^2 s); the (H2O) forms are for water vapour.
FLUX_UNITS: Final = MappingProxyType(
    {
        "mol/(m2 s)": 1.0,
        "cm3(STP)/(m2 day)": _CM3_STP / _DAY,
        "cm3(STP)/(100 in2 day)": _CM3_STP / (_IN2_100 * _DAY),
        "g(H2O)/(m2 day)": 1e-3 / _M_WATER / _DAY,
        "g(H2O)/(100 in2 day)": 1e-3 / _M_WATER / (_IN2_100 * _DAY),
    }
)


def _convert(
    value: ArrayLike, from_unit: str, to_unit: str, table: MappingProxyType[str, float], kind: str
) -> FloatOrArray:
    for arg, unit in (("from_unit", from_unit), ("to_unit", to_unit)):
        if not isinstance(unit, str):
            raise InputTypeError(f"{arg}={unit!r} is a {type(unit).__name__}, not a {kind} unit name")
        if unit not in table:
            raise UnknownMethodError(
                f"{arg}={unit!r} is not a {kind} unit; accepted: {', '.join(repr(u) for u in table)}"
            )
    v = as_float("value", value)
    if not np.all(np.isfinite(v)):
        raise InputValueError("value is not finite; pass finite values")
    return finish(np.asarray(v) * (table[from_unit] / table[to_unit]))


@guard
def convert_permeability(value: ArrayLike, from_unit: str, to_unit: str = "mol/(m s Pa)") -> FloatOrArray:
    """Convert a permeability between the trade's units.

    Parameters
    ----------
    value : float or array_like
        Permeability in ``from_unit`` [from_unit].
    from_unit : str
        A key of :data:`PERMEABILITY_UNITS`.
    to_unit : str
        A key of :data:`PERMEABILITY_UNITS`; SI by default.

    Returns
    -------
    float or numpy.ndarray
        Permeability in ``to_unit`` [to_unit].

    Notes
    -----
    cm^3(STP) is taken at 273.15 K and 101325 Pa; one barrer is
    1e-10 cm^3(STP) cm/(cm^2 s cmHg) = 3.35e-16 mol/(m s Pa).  The (H2O)
    units are mass-based and hold for water vapour only.

    References
    ----------
    Koros, W. J. et al. (1996). Terminology for membranes and membrane
    processes (IUPAC Recommendations 1996). *Pure Appl. Chem.* 68, 1479.

    Examples
    --------
    >>> round(convert_permeability(1.0, "barrer") * 1e16, 4)
    3.3464

    """
    return _convert(value, from_unit, to_unit, PERMEABILITY_UNITS, "permeability")


@guard
def convert_permeance(value: ArrayLike, from_unit: str, to_unit: str = "mol/(m2 s Pa)") -> FloatOrArray:
    """Convert a permeance (transmission rate per unit pressure difference).

    Parameters
    ----------
    value : float or array_like
        Permeance in ``from_unit`` [from_unit].
    from_unit : str
        A key of :data:`PERMEANCE_UNITS`.
    to_unit : str
        A key of :data:`PERMEANCE_UNITS`; SI by default.

    Returns
    -------
    float or numpy.ndarray
        Permeance in ``to_unit`` [to_unit].

    Notes
    -----
    An oxygen transmission rate quoted "per atm" is a permeance.

    References
    ----------
    ASTM D3985-17, Standard Test Method for Oxygen Gas Transmission Rate
    Through Plastic Film and Sheeting Using a Coulometric Sensor.

    Examples
    --------
    >>> round(convert_permeance(1.0, "cm3(STP)/(100 in2 day atm)", "cm3(STP)/(m2 day atm)"), 3)
    15.5

    """
    return _convert(value, from_unit, to_unit, PERMEANCE_UNITS, "permeance")


@guard
def convert_flux(value: ArrayLike, from_unit: str, to_unit: str = "mol/(m2 s)") -> FloatOrArray:
    """Convert a transmission rate (flux) between the trade's units.

    Parameters
    ----------
    value : float or array_like
        Flux in ``from_unit`` [from_unit].
    from_unit : str
        A key of :data:`FLUX_UNITS`.
    to_unit : str
        A key of :data:`FLUX_UNITS`; SI by default.

    Returns
    -------
    float or numpy.ndarray
        Flux in ``to_unit`` [to_unit].

    Notes
    -----
    A water-vapour transmission rate in g/(m^2 day) holds only at its test
    conditions (temperature and humidity on each side); divide by the
    vapour-pressure difference to get a permeance.

    References
    ----------
    ASTM E96/E96M-16, Standard Test Methods for Water Vapor Transmission of
    Materials.

    Examples
    --------
    >>> round(convert_flux(10.0, "g(H2O)/(m2 day)") * 1e6, 3)
    6.425

    """
    return _convert(value, from_unit, to_unit, FLUX_UNITS, "flux")


# --- layers ---------------------------------------------------------------------------------


@guard
def permeability(D: ArrayLike, S: ArrayLike) -> FloatOrArray:
    r"""Permeability from diffusivity and solubility, :math:`\mathcal{P} = D S`.

    Parameters
    ----------
    D : float or array_like
        Diffusivity in the material [m^2/s].
    S : float or array_like
        Solubility coefficient, c = S p [mol/(m^3 Pa)].

    Returns
    -------
    float or numpy.ndarray
        Permeability [mol/(m s Pa)].

    Notes
    -----
    Solution-diffusion model: holds for gases in dense (non-porous)
    polymers below their saturation; not for porous media or pinholes.

    References
    ----------
    Crank, J. (1975). *The Mathematics of Diffusion*, 2nd ed., Section 4.3.

    Examples
    --------
    >>> permeability(1e-12, 2e-4)
    2e-16

    """
    Dv = check_positive("D", D)
    Sv = check_positive("S", S)
    check_shapes(D=Dv, S=Sv)
    return finish(Dv * Sv)


@dataclass(frozen=True)
class Layer:
    """One layer of a barrier.

    Parameters
    ----------
    thickness : float
        Layer thickness [m].
    D : float, optional
        Diffusivity in the layer [m^2/s].
    S : float, optional
        Solubility coefficient c = S p [mol/(m^3 Pa)].
    permeability : float, optional
        D S [mol/(m s Pa)]; give it instead of D and S when only it is
        known (interface concentrations are then not available).
    name : str
        Label for reports.

    """

    thickness: float
    D: float | None = None
    S: float | None = None
    permeability: float | None = None
    name: str = ""
    _P: float = field(init=False, repr=False)

    def __post_init__(self) -> None:
        for name in ("thickness", "D", "S", "permeability"):
            v = getattr(self, name)
            if v is None and name != "thickness":
                continue
            if isinstance(v, bool) or not isinstance(v, int | float):
                raise InputTypeError(
                    f"Layer {self.name!r}: {name}={v!r} is a {type(v).__name__}, not a number; "
                    "pass a finite positive float in SI units"
                )
            if not math.isfinite(v) or v <= 0 or v > MAGNITUDE_LIMIT or v < 1 / MAGNITUDE_LIMIT:
                raise InputValueError(
                    f"Layer {self.name!r}: {name}={v!r} must be a finite positive number (SI)"
                )
        if self.permeability is not None:
            P = float(self.permeability)
        elif self.D is not None and self.S is not None:
            P = float(self.D) * float(self.S)
        else:
            raise InputValueError(f"Layer {self.name!r}: give permeability, or both D and S")
        if (
            self.permeability is not None
            and self.D is not None
            and self.S is not None
            and not math.isclose(self.permeability, self.D * self.S, rel_tol=1e-6)
        ):
            raise InputValueError(
                f"Layer {self.name!r}: permeability differs from D*S; give one or the other"
            )
        object.__setattr__(self, "_P", float(P))

    @property
    def permeance(self) -> float:
        """Permeance P/L [mol/(m^2 s Pa)]."""
        return self._P / self.thickness

    @property
    def resistance(self) -> float:
        """Resistance L/P per unit area [m^2 s Pa/mol]."""
        return self.thickness / self._P


@dataclass(frozen=True, eq=False)
class BarrierResult(FrozenResult):
    """Steady permeation through layers in series.

    Attributes
    ----------
    flux : float or numpy.ndarray
        Molar flux from the high side to the low side [mol/(m^2 s)].
    permeance : float
        Overall permeance including fluid films [mol/(m^2 s Pa)].
    interface_pressures : numpy.ndarray
        Equivalent partial pressure at each boundary, outside to inside
        (after the outer film, between layers, before the inner film) [Pa].
    interface_concentrations : tuple of (float, float) or None
        Concentration just inside each layer at its two faces [mol/m^3]
        (None for layers given by permeability only).
    resistances : numpy.ndarray
        Per-unit-area resistances in order: outer film, layers, inner film
        [m^2 s Pa/mol].

    """

    flux: FloatOrArray
    permeance: float
    interface_pressures: FloatArray
    interface_concentrations: tuple[tuple[float, float] | None, ...]
    resistances: FloatArray


@guard
def steady_flux(
    layers: Sequence[Layer],
    p_high: float,
    p_low: float = 0.0,
    *,
    k_high: float | None = None,
    k_low: float | None = None,
    T: float = 298.15,
) -> BarrierResult:
    r"""Steady flux through layers in series, with optional fluid films on either side.

    .. math::

        N = \frac{p_{high} - p_{low}}{\frac{RT}{k_{high}} + \sum_i \frac{L_i}{\mathcal{P}_i}
            + \frac{RT}{k_{low}}}

    Parameters
    ----------
    layers : sequence of Layer
        Layers from the high-pressure side to the low-pressure side.
    p_high : float
        Partial pressure of the permeant in the fluid on the high side [Pa].
    p_low : float
        Partial pressure on the low side [Pa].
    k_high : float, optional
        Fluid-film mass-transfer coefficient on the high side [m/s]
        (gas phase); None for no film resistance.
    k_low : float, optional
        Fluid-film coefficient on the low side [m/s].
    T : float
        Temperature, for the film resistances RT/k [K].

    Returns
    -------
    BarrierResult
        Flux, overall permeance, interface pressures and concentrations.

    Notes
    -----
    The analogue of thermal resistances in series; each interface is at
    sorption equilibrium (c = S p on both sides).  Steady state only: a new
    barrier needs about three time lags to approach it.

    References
    ----------
    Crank, J. (1975). *The Mathematics of Diffusion*, 2nd ed., Section 12.4
    (composite membranes).

    Examples
    --------
    >>> pe = Layer(50e-6, permeability=2.9 * 3.3464e-16, name="LDPE")
    >>> round(steady_flux([pe], 21278.0).flux * 1e6, 3)
    0.413

    """
    if isinstance(layers, Layer) or not isinstance(layers, Sequence) or isinstance(layers, str):
        raise InputTypeError(
            f"layers={layers!r} is a {type(layers).__name__}; pass a list of masstransfer.bodies.Layer"
        )
    if not layers:
        raise InputValueError("layers is empty; pass at least one Layer")
    for i, lay in enumerate(layers):
        if not isinstance(lay, Layer):
            raise InputTypeError(
                f"layers[{i}] is {type(lay).__name__}, not a Layer; build masstransfer.bodies.Layer(...)"
            )
    ph = float(check_nonnegative("p_high", scalar("p_high", p_high)))
    pl = float(check_nonnegative("p_low", scalar("p_low", p_low)))
    Tv = float(check_positive("T", scalar("T", T)))
    r_out = (
        R_GAS * Tv / float(check_positive("k_high", scalar("k_high", k_high))) if k_high is not None else 0.0
    )
    r_in = R_GAS * Tv / float(check_positive("k_low", scalar("k_low", k_low))) if k_low is not None else 0.0
    res = np.array([r_out, *[lay.resistance for lay in layers], r_in])
    total = float(res.sum())
    N = (ph - pl) / total
    drops = N * res
    # partial pressure after the outer film, then after each layer (len = layers + 1)
    p_nodes = ph - np.cumsum(drops)[:-1]
    conc: list[tuple[float, float] | None] = [
        None if lay.S is None else (lay.S * float(p_nodes[i]), lay.S * float(p_nodes[i + 1]))
        for i, lay in enumerate(layers)
    ]
    return BarrierResult(
        flux=float(N),
        permeance=1.0 / total,
        interface_pressures=np.asarray(p_nodes),
        interface_concentrations=tuple(conc),
        resistances=res,
    )


@overload
def time_lag(thickness: float, D: float) -> float: ...
@overload
def time_lag(thickness: FloatArray, D: ArrayLike) -> FloatArray: ...
@overload
def time_lag(thickness: ArrayLike, D: ArrayLike) -> FloatOrArray: ...
@guard
def time_lag(thickness: ArrayLike, D: ArrayLike) -> FloatOrArray:
    r"""Time lag of a membrane, :math:`\theta = L^2/(6D)`.

    Parameters
    ----------
    thickness : float or array_like
        Membrane thickness L [m].
    D : float or array_like
        Diffusivity in the membrane [m^2/s].

    Returns
    -------
    float or numpy.ndarray
        Time lag [s]: the intercept on the time axis of the steady-state
        asymptote of the cumulative amount permeated.

    Notes
    -----
    For a membrane initially free of permeant, with constant upstream and
    zero downstream concentration.

    References
    ----------
    Daynes, H. A. (1920). *Proc. R. Soc. Lond. A* 97, 286-307.
    Barrer, R. M. (1939). *Trans. Faraday Soc.* 35, 628-643.

    Examples
    --------
    >>> round(time_lag(50e-6, 1e-12) / 3600, 3)
    0.116

    """
    L = check_positive("thickness", thickness)
    Dv = check_positive("D", D)
    check_shapes(thickness=L, D=Dv)
    return finish(L * L / (6.0 * Dv))


@guard
def diffusivity_from_time_lag(thickness: float, lag: float, lag_stderr: float = 0.0) -> tuple[float, float]:
    r"""Diffusivity from a measured time lag, :math:`D = L^2/(6\theta)`, with its standard error.

    Parameters
    ----------
    thickness : float
        Membrane thickness [m].
    lag : float
        Measured time lag [s].
    lag_stderr : float
        Standard error of the time lag [s].

    Returns
    -------
    tuple of float
        (D, standard error of D) [m^2/s].

    References
    ----------
    Crank, J. (1975). *The Mathematics of Diffusion*, 2nd ed., Section 4.3.3.

    Examples
    --------
    >>> D, se = diffusivity_from_time_lag(50e-6, 416.67, 20.0)
    >>> round(D * 1e12, 3), round(se * 1e14, 2)
    (1.0, 4.8)

    """
    L = float(check_positive("thickness", scalar("thickness", thickness)))
    th = float(check_positive("lag", scalar("lag", lag)))
    se = float(check_nonnegative("lag_stderr", scalar("lag_stderr", lag_stderr)))
    D = L * L / (6 * th)
    return D, D * se / th


@guard
def permeation_curve(t: ArrayLike, thickness: float, D: float, c_upstream: float = 1.0) -> FloatOrArray:
    r"""Cumulative amount permeated per unit area through an initially empty membrane.

    .. math::

        \frac{Q_t}{L c_1} = \frac{Dt}{L^2} - \frac{1}{6}
        - \frac{2}{\pi^2}\sum_{n\ge1}\frac{(-1)^n}{n^2}e^{-Dn^2\pi^2t/L^2}

    with the short-time form
    :math:`4\sqrt{\tau}\sum_{m\ge0}\operatorname{ierfc}\frac{2m+1}{2\sqrt\tau}`
    (:math:`\tau = Dt/L^2`) below :math:`\tau` = 0.1.

    Parameters
    ----------
    t : float or array_like
        Time since the upstream step [s].
    thickness : float
        Membrane thickness L [m].
    D : float
        Diffusivity [m^2/s].
    c_upstream : float
        Concentration just inside the upstream face (S p_1) [mol/m^3].

    Returns
    -------
    float or numpy.ndarray
        Q_t [mol/m^2].

    Notes
    -----
    Downstream kept at zero concentration.  Both forms are summed to
    :data:`masstransfer.bodies.SERIES_TOLERANCE`.

    References
    ----------
    Crank, J. (1975). *The Mathematics of Diffusion*, 2nd ed., Eq. (4.24a).

    Examples
    --------
    >>> round(permeation_curve(1e5, 50e-6, 1e-12, 10.0) * 1e3, 3)
    19.917

    """
    from scipy import special

    from ._transient import SERIES_TOLERANCE

    tv = check_nonnegative("t", t)
    L = float(check_positive("thickness", scalar("thickness", thickness)))
    Dv = float(check_positive("D", scalar("D", D)))
    c1 = float(check_nonnegative("c_upstream", scalar("c_upstream", c_upstream)))
    tau = np.atleast_1d(np.asarray(tv, dtype=float) * Dv / L**2)
    out = np.zeros_like(tau)
    short = (tau > 0) & (tau < 0.1)
    if short.any():
        ts = tau[short]
        rt = np.sqrt(ts)
        acc = np.zeros_like(ts)
        for m in range(0, 10):
            x = (2 * m + 1) / (2 * rt)
            acc += np.exp(-x * x) / math.sqrt(math.pi) - x * special.erfc(x)
        out[short] = 4 * rt * acc
    long_ = tau >= 0.1
    if long_.any():
        tl = tau[long_]
        N = math.ceil(math.sqrt(math.log(1 / SERIES_TOLERANCE) / (math.pi**2 * tl.min()))) + 2
        n = np.arange(1, N + 1)[:, None].astype(float)
        out[long_] = (
            tl - 1 / 6 - 2 / math.pi**2 * np.sum((-1) ** n / n**2 * np.exp(-(n**2) * math.pi**2 * tl), axis=0)
        )
    return finish((L * c1 * out).reshape(np.shape(tv)))


@guard
def fit_time_lag(t: ArrayLike, Q: ArrayLike, t_min: float | None = None) -> TimeLagFit:
    """Fit the steady-state asymptote of a permeation curve: slope and time lag.

    Parameters
    ----------
    t : array_like
        Times [s].
    Q : array_like
        Cumulative amount permeated per unit area [mol/m^2].
    t_min : float, optional
        Use only points after this time [s] (by default the last half of
        the record; the asymptote is reached after about three time lags).

    Returns
    -------
    TimeLagFit
        Steady flux [mol/(m^2 s)], time lag [s] and their standard errors.

    Notes
    -----
    Ordinary least squares on Q = J (t - theta); the time-lag error comes
    from the covariance of slope and intercept.

    References
    ----------
    Crank, J. (1975). *The Mathematics of Diffusion*, 2nd ed., Section 4.3.3.

    Examples
    --------
    >>> t = np.linspace(0, 5000, 200)
    >>> fit = fit_time_lag(t, permeation_curve(t, 50e-6, 1e-12, 10.0))
    >>> round(fit.lag, 1)
    416.7

    """
    tv = np.asarray(check_nonnegative("t", t), dtype=float).ravel()
    qv = np.asarray(as_float("Q", Q), dtype=float).ravel()
    if tv.shape != qv.shape or tv.size < 3:
        raise InputValueError("t and Q must be 1-D arrays of equal length with at least three points")
    cut = float(np.median(tv)) if t_min is None else float(check_nonnegative("t_min", scalar("t_min", t_min)))
    sel = tv >= cut
    if sel.sum() < 3:
        raise InputValueError("fewer than three points after t_min; lower t_min or record longer")
    x, y = tv[sel], qv[sel]
    A = np.vstack([x, np.ones_like(x)]).T
    coef, *_ = np.linalg.lstsq(A, y, rcond=None)
    slope, icpt = float(coef[0]), float(coef[1])
    if slope <= 0:
        raise InputValueError(
            "the fitted slope is not positive; the record has not reached steady permeation"
        )
    r = y - A @ coef
    dof = max(x.size - 2, 1)
    s2 = float(r @ r) / dof
    cov = s2 * np.linalg.inv(A.T @ A)
    lag = -icpt / slope
    # theta = -b/a: var = (b^2 var_a + a^2 var_b - 2ab cov_ab)/a^4
    var_lag = (icpt**2 * cov[0, 0] + slope**2 * cov[1, 1] - 2 * slope * icpt * cov[0, 1]) / slope**4
    return TimeLagFit(
        flux=slope, flux_stderr=math.sqrt(cov[0, 0]), lag=lag, lag_stderr=math.sqrt(max(var_lag, 0.0))
    )


@dataclass(frozen=True, eq=False)
class TimeLagFit(FrozenResult):
    """Result of :func:`fit_time_lag`.

    Attributes
    ----------
    flux : float
        Steady permeation flux, the asymptote's slope [mol/(m^2 s)].
    flux_stderr : float
        Its standard error [mol/(m^2 s)].
    lag : float
        Time lag, the asymptote's intercept on the time axis [s].
    lag_stderr : float
        Its standard error [s].

    """

    flux: float
    flux_stderr: float
    lag: float
    lag_stderr: float


# --- packaging ------------------------------------------------------------------------------


@dataclass(frozen=True, eq=False)
class IngressResult(FrozenResult):
    """Oxygen (or other permeant) reaching a sealed pack through its walls.

    Attributes
    ----------
    rate : float
        Steady ingress rate [mol/s].
    permeance : float
        Overall wall permeance [mol/(m^2 s Pa)].
    time : numpy.ndarray
        Times evaluated [s].
    cumulative : numpy.ndarray
        Amount that has entered by each time [mol].
    cumulative_mg : numpy.ndarray
        The same in milligrams of O2 [mg] (molar mass 31.998 g/mol).
    cumulative_ml_stp : numpy.ndarray
        The same in cm^3(STP) [cm^3].
    time_to_limit : float or None
        Time at which the cumulative ingress reaches the limit [s], if a
        limit was given.
    assumption : str
        What the estimate assumes.

    """

    rate: float
    permeance: float
    time: FloatArray
    cumulative: FloatArray
    cumulative_mg: FloatArray
    cumulative_ml_stp: FloatArray
    time_to_limit: float | None
    assumption: str


@guard
def oxygen_ingress(
    area: float,
    layers: Sequence[Layer],
    t: ArrayLike,
    *,
    p_outside: float = 0.2095 * 101325.0,
    p_inside: float = 0.0,
    T: float = 296.15,
    limit_mg: float | None = None,
) -> IngressResult:
    """Oxygen entering a sealed pack through its walls over time (conservative estimate).

    Parameters
    ----------
    area : float
        Permeable wall area [m^2].
    layers : sequence of Layer
        The laminate, outside to inside, with oxygen permeabilities at T.
    t : float or array_like
        Times since sealing [s].
    p_outside : float
        Oxygen partial pressure outside [Pa] (air at sea level by default).
    p_inside : float
        Oxygen partial pressure inside, held constant [Pa] (near 0 for a
        pack with an oxygen scavenger or a product that consumes oxygen).
    T : float
        Storage temperature [K] (used for film resistances and reports;
        give permeabilities at this temperature, see
        :func:`masstransfer.diffusivity.arrhenius_diffusivity` with ``T_ref``).
    limit_mg : float, optional
        Ingress limit for the pack [mg O2]; the time to reach it is returned.

    Returns
    -------
    IngressResult
        Rate, cumulative ingress in mol, mg and cm^3(STP), and the time to
        the limit.

    Notes
    -----
    The steady rate is applied from the moment of sealing, ignoring the
    laminate's time lag (which only delays ingress), and the inside
    partial pressure is held constant: both make the estimate conservative
    (it overstates ingress) for a product that consumes oxygen, but not for
    a headspace that fills.  Seals, folds, pinholes and flex cracking are
    not modelled.  Food-safety and shelf-life decisions must rest on
    measured transmission rates of the actual pack, storage trials, and the
    applicable regulations, not on this estimate.

    References
    ----------
    Robertson, G. L. (2013). *Food Packaging: Principles and Practice*,
    3rd ed., CRC Press, Chapter 4 (permeability and shelf life).

    Examples
    --------
    >>> pet = Layer(12e-6, permeability=0.03 * 3.3464e-16, name="PET (invented values)")
    >>> pe = Layer(60e-6, permeability=2.9 * 3.3464e-16, name="PE (invented values)")
    >>> r = oxygen_ingress(0.05, [pet, pe], 90 * 86400.0, limit_mg=5.0)
    >>> round(float(r.cumulative_mg[0])), round(r.time_to_limit / 86400, 2)
    (210, 2.14)

    """
    A = float(check_positive("area", scalar("area", area)))
    po = float(check_nonnegative("p_outside", scalar("p_outside", p_outside)))
    pi = float(check_nonnegative("p_inside", scalar("p_inside", p_inside)))
    if pi > po:
        raise InputValueError("p_inside exceeds p_outside: oxygen would leave the pack; check the pressures")
    tv = np.atleast_1d(np.asarray(check_nonnegative("t", t), dtype=float))
    res = steady_flux(layers, po, pi, T=T)
    rate = float(res.flux) * A
    cum = rate * tv
    mg = cum * _M_O2_MG
    ml = cum / _CM3_STP
    t_lim = None
    if limit_mg is not None:
        lim = float(check_positive("limit_mg", scalar("limit_mg", limit_mg)))
        t_lim = lim / (rate * _M_O2_MG) if rate > 0 else math.inf
    return IngressResult(
        rate=rate,
        permeance=res.permeance,
        time=tv,
        cumulative=cum,
        cumulative_mg=mg,
        cumulative_ml_stp=ml,
        time_to_limit=t_lim,
        assumption="steady permeation from sealing (time lag ignored), constant inside partial pressure",
    )
