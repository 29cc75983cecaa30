"""Counter-flow cooling towers, humidifiers and evaporative coolers.

Two models of the same packing: Merkel's integral, which drives heat by the enthalpy difference
between saturated gas at the liquid temperature and the bulk gas (unit Lewis factor, no
evaporation loss, humidity not tracked), and a stepwise integration along the packing of the
liquid temperature, gas enthalpy, humidity and liquid flow with the Lewis factor from the
heat-mass analogy.  Both give the number of transfer units on the liquid-inlet basis,
:math:`NTU = k_Y a V / L_{in}` (the Merkel number).
"""

from __future__ import annotations

from collections.abc import Mapping
from dataclasses import dataclass

import numpy as np

from .._typing import ArrayLike, FloatArray, FloatOrArray
from .._validation import check_positive, check_shapes, finish, guard, warn_caller
from ..errors import InputValueError, MassTransferWarning, OutOfRangeError
from ..substances._species import Species
from ._state import Pair, make_pair, resolve_humidity, whole_number

__all__ = ["TowerProfile", "counterflow_tower", "merkel_ntu"]

#: Gauss-Legendre nodes for the Merkel integral (the integrand is smooth where it is finite).
_MERKEL_X, _MERKEL_W = np.polynomial.legendre.leggauss(48)


def _inlet(
    liquid: str | Species,
    gas: str | Species | Mapping[str, float],
    T_liquid_in: ArrayLike,
    T_liquid_out: ArrayLike,
    L_over_G: ArrayLike,
    T_gas: ArrayLike,
    P: ArrayLike,
    given: Mapping[str, ArrayLike | None],
) -> tuple[Pair, FloatArray, FloatArray, FloatArray, FloatArray, FloatArray, FloatArray]:
    Tin = check_positive("T_liquid_in", T_liquid_in)
    Tout = check_positive("T_liquid_out", T_liquid_out)
    r = check_positive("L_over_G", L_over_G, "pass the liquid-to-dry-gas mass flow ratio above zero [-]")
    Tg = check_positive("T_gas", T_gas)
    Pv = check_positive("P", P)
    check_shapes(T_liquid_in=Tin, T_liquid_out=Tout, L_over_G=r, T_gas=Tg, P=Pv)
    pair = make_pair(liquid, gas)
    Tin_a, Tout_a, r_a, Tg_a, P_a = np.broadcast_arrays(
        *(np.asarray(v, dtype=float) for v in (Tin, Tout, r, Tg, Pv))
    )
    if (Tin_a <= Tout_a).any():
        raise InputValueError(
            "T_liquid_in must exceed T_liquid_out for a cooling tower (the liquid is cooled); "
            "swap them, or check the temperatures"
        )
    y, _ = resolve_humidity(pair, Tg_a, P_a, given)
    Tin_a, Tout_a, r_a, Tg_a, P_a, y = (
        np.array(v) for v in np.broadcast_arrays(Tin_a, Tout_a, r_a, Tg_a, P_a, y)
    )
    return pair, Tin_a, Tout_a, r_a, Tg_a, P_a, np.asarray(pair.Y_from_y(y))


@guard
def merkel_ntu(
    T_liquid_in: ArrayLike,
    T_liquid_out: ArrayLike,
    L_over_G: ArrayLike,
    T_gas: ArrayLike,
    P: ArrayLike = 101325.0,
    *,
    relative_humidity: ArrayLike | None = None,
    y: ArrayLike | None = None,
    humidity_ratio: ArrayLike | None = None,
    dew_point: ArrayLike | None = None,
    liquid: str | Species = "water",
    gas: str | Species | Mapping[str, float] = "air",
) -> FloatOrArray:
    r"""Merkel number of transfer units of a counter-flow cooling tower.

    .. math::

        NTU = \frac{k_Y a V}{L} = \int_{T_{L,out}}^{T_{L,in}}
        \frac{c_{p,L}\,dT_L}{H_s(T_L) - H}, \qquad
        H = H_{in} + \frac{L}{G}\left[h_L(T_L) - h_L(T_{L,out})\right]

    Parameters
    ----------
    T_liquid_in : float or array_like
        Liquid (hot water) temperature at the top, entering [K].
    T_liquid_out : float or array_like
        Liquid temperature at the bottom, leaving [K].
    L_over_G : float or array_like
        Ratio of the liquid to the dry-gas mass flow [-].
    T_gas : float or array_like
        Temperature of the gas entering at the bottom [K].
    P : float or array_like
        Total pressure [Pa].
    relative_humidity : float or array_like, optional
        Relative humidity of the entering gas [-] (give exactly one humidity measure).
    y : float or array_like, optional
        Vapour mole fraction of the entering gas [-].
    humidity_ratio : float or array_like, optional
        Humidity ratio of the entering gas [kg/kg dry gas].
    dew_point : float or array_like, optional
        Dew point of the entering gas [K].
    liquid : str or Species
        The liquid (``"water"`` for a cooling tower).
    gas : str or Species or mapping
        The dry gas (``"air"``), or a composition.

    Returns
    -------
    float or numpy.ndarray
        The Merkel number :math:`k_Y a V / L` [-].

    Raises
    ------
    OutOfRangeError
        If the gas operating line touches the saturation curve (no finite tower reaches the
        duty at this L/G).

    Notes
    -----
    Merkel's assumptions: Lewis factor of one, evaporation loss neglected in the liquid
    balance, the gas leaving saturated with respect to its enthalpy only.  The integral is
    evaluated with 48-point Gauss-Legendre quadrature of the library's humid-gas enthalpies
    (ideal gas, no enhancement factor).  Merkel numbers are typically 4 to 8 % below those
    of the stepwise integration of :func:`counterflow_tower` (Merkel neglects the
    evaporation loss and the enthalpy the evaporated liquid carries, and takes Le_f = 1).

    References
    ----------
    Merkel, F. (1925). Verdunstungskuehlung. *VDI-Forschungsarbeiten* 275.

    Kloppers, J. C., & Kroeger, D. G. (2005). A critical investigation into the heat and mass
    transfer analysis of counterflow wet-cooling towers. *Int. J. Heat Mass Transfer* 48,
    765-777. https://doi.org/10.1016/j.ijheatmasstransfer.2004.09.004

    Examples
    --------
    >>> round(merkel_ntu(313.15, 298.15, 0.8, 298.15, relative_humidity=0.4), 3)
    1.452

    """
    given = {
        "relative_humidity": relative_humidity,
        "y": y,
        "humidity_ratio": humidity_ratio,
        "dew_point": dew_point,
    }
    pair, Tin, Tout, r, Tg, P_a, Y_in = _inlet(
        liquid, gas, T_liquid_in, T_liquid_out, L_over_G, T_gas, P, given
    )
    H_in = pair.enthalpy(Tg, Y_in)
    half = 0.5 * (Tin - Tout)
    TL = (0.5 * (Tin + Tout))[..., None] + half[..., None] * _MERKEL_X
    hL_out = pair.liquid_enthalpy(Tout)
    H = H_in[..., None] + r[..., None] * (pair.liquid_enthalpy(TL) - hL_out[..., None])
    Hs = pair.enthalpy(TL, pair.saturation_Y(TL, P_a[..., None]))
    drive = Hs - H
    _check_drive(drive, Tout, pair.enthalpy(Tout, pair.saturation_Y(Tout, P_a)) - H_in)
    integrand = pair.liq.liquid_heat_capacity(TL) / drive
    return finish(half * (integrand * _MERKEL_W).sum(axis=-1))


def _check_drive(drive: FloatArray, Tout: FloatArray, bottom: FloatArray) -> None:
    if (bottom <= 0).any():
        raise OutOfRangeError(
            "the entering gas is at or above saturation enthalpy at the leaving liquid temperature: "
            "the liquid cannot be cooled to T_liquid_out (it lies at or below the gas's wet bulb); "
            "raise T_liquid_out or use drier gas"
        )
    if (drive <= 0).any():
        raise OutOfRangeError(
            "the gas operating line touches the saturation curve inside the tower: no finite "
            "packing achieves this duty at this L/G; lower L_over_G (more gas)"
        )


@dataclass(frozen=True)
class TowerProfile:
    """Stepwise solution of a counter-flow tower from the bottom (gas inlet) to the top.

    Attributes
    ----------
    ntu : float or numpy.ndarray
        Transfer units on the liquid-inlet basis, :math:`k_Y a V / L_{in}` [-].
    T_liquid : numpy.ndarray
        Liquid temperature along the packing [K] (last axis: bottom to top).
    T_gas : numpy.ndarray
        Gas temperature along the packing [K].
    humidity_ratio : numpy.ndarray
        Gas humidity ratio along the packing [kg/kg dry gas].
    enthalpy : numpy.ndarray
        Gas enthalpy along the packing [J/kg dry gas].
    transfer_units : numpy.ndarray
        Transfer units from the bottom to each point [-].
    T_gas_out, humidity_ratio_out, enthalpy_out : float or numpy.ndarray
        Gas leaving at the top [K], [kg/kg], [J/kg dry gas].
    evaporated_fraction : float or numpy.ndarray
        Liquid evaporated, as a fraction of the liquid entering [-].
    lewis_factor : float or numpy.ndarray
        Mean Lewis factor :math:`h/(k_Y c_s)` used [-].
    supersaturated : bool
        Whether the gas passed saturation somewhere (fog; not modelled, warned).

    """

    ntu: FloatOrArray
    T_liquid: FloatArray
    T_gas: FloatArray
    humidity_ratio: FloatArray
    enthalpy: FloatArray
    transfer_units: FloatArray
    T_gas_out: FloatOrArray
    humidity_ratio_out: FloatOrArray
    enthalpy_out: FloatOrArray
    evaporated_fraction: FloatOrArray
    lewis_factor: FloatOrArray
    supersaturated: bool


@guard
def counterflow_tower(
    T_liquid_in: ArrayLike,
    T_liquid_out: ArrayLike,
    L_over_G: ArrayLike,
    T_gas: ArrayLike,
    P: ArrayLike = 101325.0,
    *,
    relative_humidity: ArrayLike | None = None,
    y: ArrayLike | None = None,
    humidity_ratio: ArrayLike | None = None,
    dew_point: ArrayLike | None = None,
    liquid: str | Species = "water",
    gas: str | Species | Mapping[str, float] = "air",
    lewis_factor: float | None = None,
    steps: int = 20,
) -> TowerProfile:
    r"""Stepwise integration of a counter-flow cooling tower or humidifier along its packing.

    With :math:`\tau = k_Y a z / L_{in}` the transfer units from the bottom, :math:`r = L_{in}/G`
    and :math:`\ell = L/L_{in}`:

    .. math::

        \frac{dY}{d\tau} = r\,(Y_s - Y), \qquad
        \frac{dH}{d\tau} = r\left[Le_f\,c_s (T_L - T_G) + (Y_s - Y)\,h_v(T_L)\right],

        \ell\,c_{p,L}\frac{dT_L}{d\tau} = Le_f\,c_s (T_L - T_G)
        + (Y_s - Y)\left[h_v(T_L) - h_L(T_L)\right]

    integrated in :math:`T_L` from the bottom (gas inlet, liquid outlet) to the top by
    fourth-order Runge-Kutta steps, the leaving liquid flow found by iteration so that
    :math:`\ell = 1` at the top.

    Parameters
    ----------
    T_liquid_in : float or array_like
        Liquid temperature entering at the top [K].
    T_liquid_out : float or array_like
        Liquid temperature leaving at the bottom [K].
    L_over_G : float or array_like
        Liquid (inlet) to dry-gas mass-flow ratio [-].
    T_gas : float or array_like
        Temperature of the gas entering at the bottom [K].
    P : float or array_like
        Total pressure [Pa].
    relative_humidity : float or array_like, optional
        Relative humidity of the entering gas [-] (give exactly one humidity measure).
    y : float or array_like, optional
        Vapour mole fraction of the entering gas [-].
    humidity_ratio : float or array_like, optional
        Humidity ratio of the entering gas [kg/kg dry gas].
    dew_point : float or array_like, optional
        Dew point of the entering gas [K].
    liquid : str or Species
        The liquid (``"water"``).
    gas : str or Species or mapping
        The dry gas (``"air"``), or a composition.
    lewis_factor : float, optional
        Lewis factor :math:`h/(k_Y c_s)` [-]; None (default) takes it at each step from the
        analogy, :math:`Le^{2/3} c_p / c_s` with the gas properties at the film temperature.
    steps : int
        Number of Runge-Kutta steps in the liquid temperature [-].

    Returns
    -------
    TowerProfile
        The NTU, the profiles along the packing and the leaving gas.

    Notes
    -----
    Holds while the gas stays unsaturated; where it would pass saturation (fog) the result
    is flagged and a warning issued, and the figures are those of a gas carrying the excess
    as vapour.  The transfer coefficient and the area are lumped in the NTU, as in Merkel's
    method; a fill's NTU-versus-L/G data from the maker then sizes the packing.  With
    ``lewis_factor=1`` and no evaporation loss this reduces to Merkel's equation.

    References
    ----------
    Poppe, M., & Roegener, H. (1991). Berechnung von Rueckkuehlwerken. *VDI-Waermeatlas*,
    Mi 1-Mi 15.

    Kloppers, J. C., & Kroeger, D. G. (2005). *Int. J. Heat Mass Transfer* 48, 765-777.
    https://doi.org/10.1016/j.ijheatmasstransfer.2004.09.004

    Examples
    --------
    >>> t = counterflow_tower(313.15, 298.15, 0.8, 298.15, relative_humidity=0.4)
    >>> round(t.ntu, 3), round(t.T_gas_out - 273.15, 1)
    (1.543, 30.4)

    """
    n = whole_number("steps", steps, 4, 10_000)
    fixed_le = None if lewis_factor is None else check_positive("lewis_factor", lewis_factor)
    if fixed_le is not None and np.ndim(fixed_le) != 0:
        raise InputValueError("lewis_factor must be a single number; pass one value or None")
    given = {
        "relative_humidity": relative_humidity,
        "y": y,
        "humidity_ratio": humidity_ratio,
        "dew_point": dew_point,
    }
    pair, Tin, Tout, r, Tg, P_a, Y_in = _inlet(
        liquid, gas, T_liquid_in, T_liquid_out, L_over_G, T_gas, P, given
    )
    H_in = pair.enthalpy(Tg, Y_in)
    _check_drive(np.ones(1), Tout, pair.enthalpy(Tout, pair.saturation_Y(Tout, P_a)) - H_in)
    dT = (Tin - Tout) / n

    def lewis(TL: FloatArray, TG: FloatArray, Y: FloatArray) -> FloatArray:
        if fixed_le is not None:
            return np.full_like(TL, float(fixed_le))
        Tf = 0.5 * (TL + TG)
        g = pair.gas
        rho, cp, k, D = (
            g.density(Tf, P_a),
            g.heat_capacity(Tf),
            g.thermal_conductivity(Tf),
            g.diffusivity(Tf, P_a),
        )
        Le = k / (rho * cp * D)
        return np.asarray(Le ** (2.0 / 3.0) * cp / pair.humid_heat(Tf, Y))

    def rates(
        TL: FloatArray, Y: FloatArray, H: FloatArray, ell: FloatArray, TG: FloatArray
    ) -> tuple[FloatArray, ...]:
        """d(Y, H, tau)/dT_L and the gas temperature."""
        TG = pair.temperature_from_enthalpy(H, Y, TG)
        Ys = pair.saturation_Y(TL, P_a)
        cs = pair.humid_heat(TG, Y)
        le = lewis(TL, TG, Y)
        hv = pair.vapour_enthalpy(TL)
        hL = pair.liquid_enthalpy(TL)
        sensible = le * cs * (TL - TG)
        dTL_dtau = (sensible + (Ys - Y) * (hv - hL)) / (ell * pair.liq.liquid_heat_capacity(TL))
        if (dTL_dtau <= 0).any():
            raise OutOfRangeError(
                "the liquid stops cooling inside the tower (the gas reaches the liquid's "
                "temperature and humidity): no finite packing achieves this duty; lower L_over_G"
            )
        dY = r * (Ys - Y) / dTL_dtau
        dH = r * (sensible + (Ys - Y) * hv) / dTL_dtau
        return dY, dH, 1.0 / dTL_dtau, TG, le

    ell_out = np.ones_like(Tin)
    for _ in range(8):  # the leaving liquid flow: ell = 1 at the top (converges in 3 or 4)
        TL, Y, H, tau, TG = Tout.copy(), Y_in.copy(), H_in.copy(), np.zeros_like(Tin), Tg.copy()
        path = [(TL, Y, H, tau, TG, np.ones_like(TL))]  # the last entry (Le_f) is unused here
        for _step in range(n):
            ell = ell_out + (Y - Y_in) / r
            k1 = rates(TL, Y, H, ell, TG)
            TG = k1[3]
            ell2 = ell_out + (Y + 0.5 * dT * k1[0] - Y_in) / r
            k2 = rates(TL + 0.5 * dT, Y + 0.5 * dT * k1[0], H + 0.5 * dT * k1[1], ell2, TG)
            ell3 = ell_out + (Y + 0.5 * dT * k2[0] - Y_in) / r
            k3 = rates(TL + 0.5 * dT, Y + 0.5 * dT * k2[0], H + 0.5 * dT * k2[1], ell3, TG)
            ell4 = ell_out + (Y + dT * k3[0] - Y_in) / r
            k4 = rates(TL + dT, Y + dT * k3[0], H + dT * k3[1], ell4, TG)
            Y = Y + dT / 6.0 * (k1[0] + 2 * k2[0] + 2 * k3[0] + k4[0])
            H = H + dT / 6.0 * (k1[1] + 2 * k2[1] + 2 * k3[1] + k4[1])
            tau = tau + dT / 6.0 * (k1[2] + 2 * k2[2] + 2 * k3[2] + k4[2])
            TL = TL + dT
            path.append((TL, Y, H, tau, TG, k1[4]))
        new_out = 1.0 - (Y - Y_in) / r
        done = bool(np.all(np.abs(new_out - ell_out) < 1e-7))
        ell_out = new_out
        if done:
            break
    TG_top = pair.temperature_from_enthalpy(H, Y, path[-1][4])
    profile = [np.stack(np.broadcast_arrays(*(p[i] for p in path)), axis=-1) for i in range(4)]
    TG_path = np.stack([pair.temperature_from_enthalpy(p[2], p[1], p[4]) for p in path], axis=-1)
    le_mean = np.stack([p[5] for p in path[1:]], axis=-1).mean(axis=-1)
    Ys_gas = pair.saturation_Y(TG_path, P_a[..., None])
    foggy = bool((profile[1] > Ys_gas * (1.0 + 1e-9)).any())
    if foggy:
        warn_caller(
            "the gas passes saturation inside the tower (fog): the excess is carried as vapour "
            "here, which overstates the leaving humidity; treat the profile as an estimate",
            MassTransferWarning,
        )
    return TowerProfile(
        ntu=finish(tau),
        T_liquid=profile[0],
        T_gas=TG_path,
        humidity_ratio=profile[1],
        enthalpy=profile[2],
        transfer_units=profile[3],
        T_gas_out=finish(TG_top),
        humidity_ratio_out=finish(Y),
        enthalpy_out=finish(H),
        evaporated_fraction=finish((Y - Y_in) / r),
        lewis_factor=finish(le_mean),
        supersaturated=foggy,
    )
