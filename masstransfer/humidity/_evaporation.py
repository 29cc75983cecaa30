"""Evaporation from a wet surface into a gas, in one call.

The chain a dryer designer would otherwise assemble by hand: the gas state from one humidity
measure, the wet-surface temperature from the energy balance (with radiant and conducted heat
if given), the film properties, h to k_c by the analogy (or h and k_c from a catalogue
correlation), the surface vapour fraction, the high-flux (stagnant-gas) rate and the units.
"""

from __future__ import annotations

import math
from collections.abc import Mapping
from dataclasses import dataclass
from typing import Any

import numpy as np

from .._typing import ArrayLike, FloatArray, FloatOrArray
from .._validation import (
    check_nonnegative,
    check_positive,
    check_shapes,
    collect_warnings,
    finish,
    guard,
    in_range,
    warn_caller,
)
from ..constants import R_GAS
from ..errors import InputTypeError, InputValueError, OutOfRangeError
from ..substances._species import Species
from ..surface._analogy import mass_transfer_coefficient_from_heat
from ..surface._conventions import kG_from_kc, ky_from_kc
from ..surface._flux import ackermann_correction, high_flux_rate
from ..surface._medium import Override
from ..surface._wet_surface import solve_surface_temperature
from ._state import Pair, make_pair, resolve_humidity

__all__ = ["EvaporationResult", "evaporation_rate"]

#: Stefan-Boltzmann constant [W/(m^2 K^4)] (CODATA 2018, exact in the 2019 SI).
_SIGMA = 5.670374419e-8

#: Printed before the usual caution with every evaporation result: the vapour may be flammable.
FLAMMABLE_VAPOUR = (
    "Many solvent vapours are flammable: keep the vapour concentration in the dryer gas well "
    "below the lower flammability limit, or inert the dryer."
)


@dataclass(frozen=True)
class EvaporationResult:
    """Evaporation from a wet surface, with everything used to get it.

    Attributes
    ----------
    liquid, gas : str
        The evaporating liquid and the gas (name or composition), as resolved.
    liquid_identity, gas_identity : str
        Resolved identities: name, CAS number, formula and molar mass.
    T, P : float or numpy.ndarray
        Gas temperature [K] and total pressure [Pa].
    y_bulk, humidity_ratio : float or numpy.ndarray
        Vapour mole fraction [-] and humidity ratio [kg/kg dry gas] of the bulk gas.
    T_surface : float or numpy.ndarray
        Temperature of the wet surface [K].
    T_film : float or numpy.ndarray
        Film temperature (T + T_surface)/2 at which gas properties are taken [K].
    y_surface, humidity_ratio_surface : float or numpy.ndarray
        Vapour mole fraction [-] and humidity ratio [kg/kg] in the gas at the surface.
    h : float or numpy.ndarray
        Heat-transfer coefficient used [W/(m^2 K)] (given, or from the correlation).
    h_effective : float or numpy.ndarray
        The Ackermann-corrected h that carries convected heat against the vapour flow [W/(m^2 K)].
    k_c, k_G, k_y, k_Y : float or numpy.ndarray
        Low-flux coefficients: [m/s], [mol/(m^2 s Pa)], [mol/(m^2 s)] and, per unit
        humidity-ratio difference, [kg/(m^2 s)].
    D, Pr, Sc, Le : float or numpy.ndarray
        Diffusivity of the vapour [m^2/s] and the groups [-] at the film temperature.
    molar_flux : float or numpy.ndarray
        Evaporation flux [mol/(m^2 s)] (stagnant gas, high-flux film theory).
    mass_flux : float or numpy.ndarray
        Evaporation flux [kg/(m^2 s)].
    mass_flux_per_hour : float or numpy.ndarray
        The same in [kg/(m^2 h)].
    q_convective, q_radiant, q_conducted : float or numpy.ndarray
        Heat reaching the surface by convection from the gas, by radiation and by conduction
        through the support [W/m^2].
    q_latent : float or numpy.ndarray
        Heat carried away as latent heat [W/m^2]; equals the sum of the three above.
    method : str
        The analogy or correlation and the diffusivity method.
    correlation : str or None
        Slug of the correlation record used, if any.
    user_supplied : tuple of str
        Properties the user supplied instead of the databases.
    warnings : tuple of str
        Every caution raised on the way.

    """

    liquid: str
    gas: str
    liquid_identity: str
    gas_identity: str
    T: FloatOrArray
    P: FloatOrArray
    y_bulk: FloatOrArray
    humidity_ratio: FloatOrArray
    T_surface: FloatOrArray
    T_film: FloatOrArray
    y_surface: FloatOrArray
    humidity_ratio_surface: FloatOrArray
    h: FloatOrArray
    h_effective: FloatOrArray
    k_c: FloatOrArray
    k_G: FloatOrArray
    k_y: FloatOrArray
    k_Y: FloatOrArray
    D: FloatOrArray
    Pr: FloatOrArray
    Sc: FloatOrArray
    Le: FloatOrArray
    molar_flux: FloatOrArray
    mass_flux: FloatOrArray
    mass_flux_per_hour: FloatOrArray
    q_convective: FloatOrArray
    q_radiant: FloatOrArray
    q_conducted: FloatOrArray
    q_latent: FloatOrArray
    method: str
    correlation: str | None
    user_supplied: tuple[str, ...]
    warnings: tuple[str, ...]


def _identity(sp: Species) -> str:
    parts = [f"CAS {sp.CAS}"] if sp.CAS else []
    if sp.formula:
        parts.append(sp.formula)
    if not parts:
        parts.append("a mixture or hand-built species, no CAS number")
    return f"{sp.name} ({', '.join(parts)}, M = {sp.molar_mass * 1000.0:.3f} g/mol)"


def _gas_identity(pair: Pair, gas: Any) -> str:
    from ..substances._species import species

    if isinstance(gas, Mapping):
        return "; ".join(_identity(species(key)) for key in gas)
    return _identity(species(gas))


class _CorrelationTransfer:
    """h and F at the film temperature from a catalogue record (Nu and Sh at the same Re)."""

    def __init__(
        self, slug: str, velocity: FloatOrArray, L: FloatOrArray, params: Mapping[str, Any], pair: Pair
    ) -> None:
        from ..surface._lookup import correlation

        if not isinstance(slug, str):
            raise InputTypeError(f"correlation={slug!r} must be a record slug (a string)")
        self.record = correlation(slug)
        extra = set(self.record.inputs) - {"Re", "Pr"}
        if extra:
            raise InputValueError(
                f"correlation {slug!r} needs {', '.join(sorted(extra))}, which evaporation_rate does "
                "not form (it forms Re and Pr from velocity and L); pass h instead, or a forced-"
                "convection record"
            )
        self.velocity = np.asarray(velocity, dtype=float)
        self.L = np.asarray(L, dtype=float)
        self.params = dict(params)
        self.pair = pair

    def groups(self, Tf: FloatArray, P: FloatArray) -> tuple[FloatArray, FloatArray, FloatArray]:
        gas = self.pair.gas
        rho, mu = gas.density(Tf, P), gas.viscosity(Tf)
        Re = rho * self.velocity * self.L / mu
        Pr = gas.heat_capacity(Tf) * mu / gas.thermal_conductivity(Tf)
        Sc = mu / (rho * gas.diffusivity(Tf, P))
        return Re, Pr, Sc

    def __call__(
        self, Tf: FloatArray, P: FloatArray, rho: FloatArray, cp: FloatArray, k: FloatArray, D: FloatArray
    ) -> tuple[FloatArray, FloatArray]:
        Re, Pr, Sc = self.groups(Tf, P)
        Nu = np.asarray(self.record.nusselt(Re=Re, Pr=Pr, **self.params))
        Sh = np.asarray(self.record.sherwood(Re=Re, Sc=Sc, **self.params))
        h = Nu * k / self.L
        k_c = Sh * D / self.L
        return h, k_c * P / (R_GAS * Tf)


class _AnalogyTransfer:
    """A given h, and F from it by the Chilton-Colburn analogy at the film temperature."""

    def __init__(self, h: FloatOrArray, exponent: float, pair: Pair) -> None:
        self.h = np.asarray(h, dtype=float)
        self.exponent = exponent
        self.pair = pair

    def k_c(self, Tf: FloatArray, P: FloatArray) -> FloatArray:
        gas = self.pair.gas
        rho, cp, k, mu = (
            gas.density(Tf, P),
            gas.heat_capacity(Tf),
            gas.thermal_conductivity(Tf),
            gas.viscosity(Tf),
        )
        D = gas.diffusivity(Tf, P)
        return np.asarray(
            mass_transfer_coefficient_from_heat(
                self.h * np.ones_like(Tf),
                rho=rho,
                cp=cp,
                Pr=cp * mu / k,
                Sc=mu / (rho * D),
                exponent=self.exponent,
            )
        )

    def __call__(
        self, Tf: FloatArray, P: FloatArray, rho: FloatArray, cp: FloatArray, k: FloatArray, D: FloatArray
    ) -> tuple[FloatArray, FloatArray]:
        return self.h, self.k_c(Tf, P) * P / (R_GAS * Tf)


@guard
def evaporation_rate(
    liquid: str | Species,
    gas: str | Species | Mapping[str, float],
    T: ArrayLike,
    h: ArrayLike | None = None,
    P: ArrayLike = 101325.0,
    *,
    relative_humidity: ArrayLike | None = None,
    y: ArrayLike | None = None,
    humidity_ratio: ArrayLike | None = None,
    dew_point: ArrayLike | None = None,
    correlation: str | None = None,
    velocity: ArrayLike | None = None,
    L: ArrayLike | None = None,
    correlation_parameters: Mapping[str, float] | None = None,
    radiant_temperature: ArrayLike | None = None,
    emissivity: ArrayLike = 0.9,
    conduction_coefficient: ArrayLike = 0.0,
    support_temperature: ArrayLike | None = None,
    exponent: float = 2.0 / 3.0,
    diffusivity_method: str | None = None,
    vapour_pressure: Override = None,
    latent_heat: Override = None,
    cp_vapour: Override = None,
    rho: Override = None,
    cp: Override = None,
    k: Override = None,
    mu: Override = None,
    D: Override = None,
) -> EvaporationResult:
    r"""Evaporation rate of a liquid from a wet surface into a gas, in one call.

    The surface temperature :math:`T_s` solves the steady energy balance

    .. math::

        h^\bullet (T - T_s) + \varepsilon\sigma(T_R^4 - T_s^4) + U_k (T_k - T_s)
        = N_A M_A \lambda(T_s),
        \qquad N_A = F \ln\frac{1 - y_{A,\infty}}{1 - y_{A,s}},
        \qquad y_{A,s} = \frac{p^{sat}(T_s)}{P}

    with :math:`F = k_c P/(R T_f)`, k_c from h by the Chilton-Colburn analogy (or h and k_c
    from a correlation record's Nu and Sh at the same Re), gas properties at the film
    temperature :math:`T_f = (T + T_s)/2` and h* the Ackermann-corrected h.

    Parameters
    ----------
    liquid : str or Species
        The evaporating liquid, e.g. ``"water"``, ``"ethanol"``, ``"toluene"``.
    gas : str or Species or mapping
        The dry gas, e.g. ``"air"``, ``"nitrogen"``, or a composition by mole fraction such
        as ``{"nitrogen": 0.79, "oxygen": 0.21}`` (mixing rules of ``chemicals``, Blanc's law).
    T : float or array_like
        Gas temperature [K].
    h : float or array_like, optional
        Heat-transfer coefficient between gas and surface [W/(m^2 K)]; or pass
        ``correlation``, ``velocity`` and ``L`` instead.
    P : float or array_like
        Total pressure [Pa].
    relative_humidity : float or array_like, optional
        Relative humidity of the gas, 0 to 1 [-] (give exactly one humidity measure).
    y : float or array_like, optional
        Mole fraction of the vapour in the gas [-].
    humidity_ratio : float or array_like, optional
        kg vapour per kg dry gas [kg/kg].
    dew_point : float or array_like, optional
        Dew point of the gas [K].
    correlation : str, optional
        Slug of a forced-convection record of :func:`masstransfer.surface.correlation`
        (inputs Re and Pr), e.g. ``"flat-plate-laminar-average"``.
    velocity : float or array_like, optional
        Gas velocity defining Re with ``L`` [m/s] (with ``correlation``).
    L : float or array_like, optional
        The record's characteristic length [m] (with ``correlation``).
    correlation_parameters : mapping, optional
        Further named parameters of the record [-] (e.g. ``{"L_over_d": 20.0}``).
    radiant_temperature : float or array_like, optional
        Temperature of surroundings radiating to the surface [K] (None: no radiation).
    emissivity : float or array_like
        Emissivity of the wet surface, 0 to 1 [-] (0.9 is common practice for wet solids).
    conduction_coefficient : float or array_like
        Overall coefficient from a heated support or tray to the surface, U_k [W/(m^2 K)].
    support_temperature : float or array_like, optional
        Temperature of that support [K] (default: the gas temperature).
    exponent : float
        Chilton-Colburn exponent on the Lewis number [-].
    diffusivity_method : str, optional
        Gas diffusivity method (default ``"fuller"``).
    vapour_pressure : float or callable, optional
        The user's vapour pressure of the liquid [Pa]: a function of T [K] accepting numpy
        arrays (or a number, used at every T).  Replaces the database value.
    latent_heat : float or callable, optional
        The user's specific enthalpy of vaporisation [J/kg], a number or a function of T [K].
    cp_vapour : float or callable, optional
        The user's vapour heat capacity [J/(kg K)].
    rho : float or callable, optional
        The user's gas density [kg/m^3] (a number, or a function of T [K] at the given P).
    cp : float or callable, optional
        The user's gas heat capacity [J/(kg K)].
    k : float or callable, optional
        The user's gas thermal conductivity [W/(m K)].
    mu : float or callable, optional
        The user's gas viscosity [Pa s].
    D : float or callable, optional
        The user's diffusivity of the vapour in the gas [m^2/s].

    Returns
    -------
    EvaporationResult
        ``T_surface`` [K], ``mass_flux`` [kg/(m^2 s)], ``molar_flux`` [mol/(m^2 s)],
        ``mass_flux_per_hour`` [kg/(m^2 h)], k in each convention, the heat split, the
        resolved identities, the user-supplied properties and the warnings.

    Raises
    ------
    InputTypeError
        If not exactly one humidity measure, or neither h nor a correlation, is given.
    OutOfRangeError
        If the surface would freeze, or the heat input would boil the liquid.

    Notes
    -----
    The constant-rate (surface-wet) period of drying.  The gas is stagnant at the surface
    (only the vapour crosses it), properties are those of the dry gas at the film temperature
    (dilute vapour) and the analogy holds for the geometry (Chilton & Colburn 1934); the rate
    inherits the error of h (often 10-25 %) and of the diffusivity (k_c scales as D^(2/3)).
    With a correlation, Nu and Sh are taken from the same record at the same Re.  Many solvent
    vapours are flammable: keep the dryer gas well below the lower flammability limit (or
    inert it) and rely on measured data, local codes and licensed engineering practice.

    References
    ----------
    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Section 12.2 (the
    constant-rate period, with radiation and conduction through the tray, Eq. 12.15).

    Bird, R. B., Stewart, W. E., & Lightfoot, E. N. (2002). *Transport Phenomena*, 2nd ed.,
    Section 22.8 (high mass-transfer rates, Ackermann correction).

    Examples
    --------
    >>> r = evaporation_rate("water", "air", T=333.15, h=28.0, humidity_ratio=0.005)
    >>> round(r.T_surface - 273.15, 1), round(r.mass_flux_per_hour, 2)
    (23.8, 1.47)

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
        rho=rho,
        cp=cp,
        k=k,
        mu=mu,
        D=D,
        diffusivity_method=diffusivity_method,
    )
    shape = np.broadcast_shapes(np.shape(Tv), np.shape(Pv))
    given = {
        "relative_humidity": relative_humidity,
        "y": y,
        "humidity_ratio": humidity_ratio,
        "dew_point": dew_point,
    }
    T0 = np.broadcast_to(np.asarray(Tv, dtype=float), shape)
    P0 = np.broadcast_to(np.asarray(Pv, dtype=float), shape)
    yv, _ = resolve_humidity(pair, T0, P0, given)

    transfer: _AnalogyTransfer | _CorrelationTransfer
    if h is not None and correlation is not None:
        raise InputTypeError("pass either h or a correlation (with velocity and L), not both")
    if h is not None:
        hv = check_positive("h", h, "pass a heat-transfer coefficient above zero [W/(m^2 K)]")
        transfer = _AnalogyTransfer(hv, float(n), pair)
        arrays: dict[str, FloatOrArray] = {"h": hv}
    elif correlation is not None:
        if velocity is None or L is None:
            raise InputTypeError(f"correlation={correlation!r} needs velocity=... [m/s] and L=... [m]")
        V = check_positive("velocity", velocity)
        Lv = check_positive("L", L)
        params = {} if correlation_parameters is None else correlation_parameters
        if not isinstance(params, Mapping):
            raise InputTypeError(f"correlation_parameters={params!r} must be a mapping of names to numbers")
        transfer = _CorrelationTransfer(correlation, V, Lv, params, pair)
        arrays = {"velocity": V, "L": Lv}
    else:
        raise InputTypeError(
            "pass h=... [W/(m^2 K)], or correlation=..., velocity=... and L=... to compute it"
        )
    eps = check_nonnegative("emissivity", emissivity)
    in_range("emissivity", eps, 0.0, 1.0, "pass an emissivity from 0 to 1")
    U = check_nonnegative(
        "conduction_coefficient", conduction_coefficient, "pass U_k of zero or more [W/(m^2 K)]"
    )
    arrays.update(emissivity=eps, conduction_coefficient=U)
    radiant = radiant_temperature is not None
    if radiant:
        Tr = check_positive("radiant_temperature", radiant_temperature)
        arrays["radiant_temperature"] = Tr
    support = support_temperature is not None
    if support:
        Tk = check_positive("support_temperature", support_temperature)
        arrays["support_temperature"] = Tk
    check_shapes(T=Tv, P=Pv, **arrays)
    full = np.broadcast_shapes(shape, np.shape(yv), *(np.shape(v) for v in arrays.values()))
    Tb, Pb, yb = (np.broadcast_to(np.asarray(v, dtype=float), full) for v in (Tv, Pv, yv))
    Tr_a = np.asarray(Tr, dtype=float) if radiant else np.zeros(())
    Tk_a = np.asarray(Tk, dtype=float) if support else Tb
    eps_a, U_a = np.asarray(eps, dtype=float), np.asarray(U, dtype=float)
    has_extra = radiant or bool(np.any(U_a > 0))
    if isinstance(transfer, _AnalogyTransfer):
        transfer.h = np.broadcast_to(transfer.h, full)

    def q_radiant(Ts: FloatArray) -> FloatArray:
        if not radiant:
            return np.zeros_like(Ts)
        return np.asarray(eps_a * _SIGMA * (Tr_a**4 - Ts**4))

    def q_conducted(Ts: FloatArray) -> FloatArray:
        return np.asarray(U_a * (Tk_a - Ts))

    def extra(Ts: FloatArray) -> FloatArray:
        return q_radiant(Ts) + q_conducted(Ts)

    if math.isfinite(pair.gas.T_max) and ((Tb > pair.gas.T_max).any() or (Tb < pair.gas.T_min).any()):
        raise OutOfRangeError(
            f"T outside {pair.gas.T_min:.1f}-{pair.gas.T_max:.1f} K, the range of the {pair.gas.label} models"
        )
    # the bisection visits trial temperatures: cautions from those are not the result's
    with collect_warnings():
        Ts = solve_surface_temperature(
            pair.liq,
            pair.gas,
            np.array(Tb),
            np.array(yb),
            np.array(Pb),
            exponent=float(n),
            transfer=transfer,
            extra_heat=extra if has_extra else None,
        )
    with collect_warnings() as caught:
        Tf = 0.5 * (Tb + Ts)
        gas_side = pair.gas
        rho_f, cp_f = gas_side.density(Tf, Pb), gas_side.heat_capacity(Tf)
        k_f, mu_f, D_f = (
            gas_side.thermal_conductivity(Tf),
            gas_side.viscosity(Tf),
            gas_side.diffusivity(Tf, Pb),
        )
        h_used, F = transfer(Tf, Pb, rho_f, cp_f, k_f, D_f)
        h_used = np.broadcast_to(np.asarray(h_used, dtype=float), full)
        k_c = np.asarray(F) * R_GAS * Tf / Pb
        ys = np.minimum(pair.liq.vapour_pressure(Ts) / Pb, 0.999999)
        N = np.asarray(high_flux_rate(np.asarray(F), ys, yb))
        M = pair.liq.species.molar_mass
        cpv_molar = pair.liq.vapour_heat_capacity(Tf) * M
        ack = np.asarray(ackermann_correction(N, cpv_molar, h_used))
        k_y = np.asarray(ky_from_kc(k_c, Tf, Pb))
        k_G = np.asarray(kG_from_kc(k_c, Tf))
    for message, category in dict.fromkeys(caught):
        warn_caller(message, category)
    Pr = cp_f * mu_f / k_f
    Sc = mu_f / (rho_f * D_f)
    q_conv = ack * h_used * (Tb - Ts)
    q_rad = q_radiant(Ts) * np.ones_like(Ts)
    q_cond = q_conducted(Ts) * np.ones_like(Ts)
    q_lat = N * M * pair.liq.latent_heat(Ts)
    m_flux = N * M
    if isinstance(transfer, _CorrelationTransfer):
        method = (
            f"{transfer.record.slug}: Nu and Sh at the same Re; diffusivity by "
            f"{pair.gas.diffusivity_method}; high-flux film theory, Ackermann correction"
        )
        slug: str | None = transfer.record.slug
    else:
        n_text = "2/3" if math.isclose(float(n), 2.0 / 3.0) else f"{float(n):g}"
        method = (
            f"Chilton-Colburn analogy (exponent {n_text}); diffusivity by {pair.gas.diffusivity_method}; "
            "high-flux film theory, Ackermann correction"
        )
        slug = None
    return EvaporationResult(
        liquid=pair.liq.species.name,
        gas=pair.gas.label,
        liquid_identity=_identity(pair.liq.species),
        gas_identity=_gas_identity(pair, gas),
        T=finish(Tb),
        P=finish(Pb),
        y_bulk=finish(yb),
        humidity_ratio=finish(pair.Y_from_y(yb)),
        T_surface=finish(Ts),
        T_film=finish(Tf),
        y_surface=finish(ys),
        humidity_ratio_surface=finish(pair.Y_from_y(ys)),
        h=finish(h_used),
        h_effective=finish(ack * h_used),
        k_c=finish(k_c),
        k_G=finish(k_G),
        k_y=finish(k_y),
        k_Y=finish(k_y * pair.gas.molar_mass),
        D=finish(D_f),
        Pr=finish(Pr),
        Sc=finish(Sc),
        Le=finish(Sc / Pr),
        molar_flux=finish(N),
        mass_flux=finish(m_flux),
        mass_flux_per_hour=finish(m_flux * 3600.0),
        q_convective=finish(q_conv),
        q_radiant=finish(q_rad),
        q_conducted=finish(q_cond),
        q_latent=finish(q_lat),
        method=method,
        correlation=slug,
        user_supplied=tuple(dict.fromkeys((*pair.liq.user_supplied, *pair.gas.user_supplied))),
        warnings=tuple(dict.fromkeys(message for message, _ in caught)),
    )
