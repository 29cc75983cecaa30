"""Temperature of a wet surface evaporating into a gas, and the wet-bulb temperature.

At steady state, with no radiation or conduction from supports, the
sensible heat reaching a wet surface pays for the evaporation from it:

.. math::

    h^\\bullet (T - T_s) = N_A M_A \\lambda(T_s), \\qquad
    N_A = F \\ln\\frac{1 - y_{A,\\infty}}{1 - y_{A,s}}, \\qquad
    y_{A,s} = \\frac{p^{sat}(T_s)}{P}

with F = k_c c from the Chilton-Colburn analogy (so h itself cancels) and
h* the Ackermann-corrected h.  Gas properties are taken at the film
temperature (T + T_s)/2; vapour pressure and latent heat at T_s.
"""

from __future__ import annotations

from typing import overload

import numpy as np

from .._typing import ArrayLike, FloatArray, FloatOrArray
from .._validation import check_nonnegative, check_positive, check_shapes, finish, guard, in_range
from ..constants import R_GAS
from ..errors import OutOfRangeError
from ..substances._species import Species, species

__all__ = ["wet_bulb_temperature", "wet_surface_temperature"]

_ITERATIONS = 48  # bisection halvings: a 300 K bracket resolved to about 1e-12 K


@guard
def wet_surface_temperature(
    liquid: str | Species,
    gas: str | Species,
    T: ArrayLike,
    y_bulk: ArrayLike,
    P: ArrayLike = 101325.0,
    *,
    exponent: float = 2.0 / 3.0,
) -> FloatOrArray:
    """Steady temperature of a surface wetted by ``liquid`` evaporating into ``gas``.

    Parameters
    ----------
    liquid : str or Species
        The evaporating liquid, e.g. ``"water"``, ``"ethanol"``.
    gas : str or Species
        The gas, e.g. ``"air"``, ``"nitrogen"``.
    T : float or array_like
        Bulk gas temperature [K].
    y_bulk : float or array_like
        Mole fraction of the vapour in the bulk gas, 0 <= y < 1 [-].
    P : float or array_like
        Total pressure [Pa].
    exponent : float
        Chilton-Colburn exponent on the Lewis number [-].

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
    once.

    References
    ----------
    Bird, R. B., Stewart, W. E., & Lightfoot, E. N. (2002). *Transport
    Phenomena*, 2nd ed., Example 22.3-2 (wet- and dry-bulb psychrometry).

    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Section 7.

    Examples
    --------
    >>> round(wet_surface_temperature("ethanol", "air", 298.15, 0.0) - 273.15, 1)
    3.7

    """
    from ..diffusivity._gas import gas_diffusivity
    from ..substances._properties import gas_model, liquid_model

    Tv = check_positive("T", T)
    y = check_nonnegative("y_bulk", y_bulk)
    Pv = check_positive("P", P)
    n = check_positive("exponent", exponent)
    check_shapes(T=Tv, y_bulk=y, P=Pv)
    in_range("y_bulk", y, 0.0, 0.999999, "pass a vapour mole fraction from 0 to below 1")
    a, b = species(liquid), species(gas)
    lq = liquid_model(a)
    gm = gas_model(b)
    vap = gas_model(a)
    if lq.psat is None or lq.hvap is None:
        raise OutOfRangeError(f"thermo has no vapour pressure or latent heat for {a.name!r}")
    Tb, yb, Pb = np.broadcast_arrays(np.asarray(Tv, float), np.asarray(y, float), np.asarray(Pv, float))
    lo_liq = max(lq.psat.T_min, lq.hvap.T_min, vap.cp_molar.T_min, gm.T_min)
    hi_liq = min(lq.psat.T_max, lq.hvap.T_max)
    if (Tb > gm.T_max).any() or (Tb < gm.T_min).any():
        raise OutOfRangeError(
            f"T outside {gm.T_min:.1f}-{gm.T_max:.1f} K, the range of the {b.name} property models"
        )

    def residual(Ts: FloatArray) -> FloatArray:
        Tf = 0.5 * (Tb + Ts)
        rho = np.asarray(gm.density(Tf, Pb))
        cp = np.asarray(gm.heat_capacity(Tf))
        k = np.asarray(gm.thermal_conductivity(Tf))
        D = np.asarray(gas_diffusivity(a, b, Tf, Pb))
        Le = k / (rho * cp * D)
        # F/h = k_c c / h with k_c/h = 1/(rho cp Le^n) and c = P/(R Tf)
        F_over_h = Pb / (R_GAS * Tf) / (rho * cp * Le**n)
        ys = np.minimum(np.asarray(lq.vapor_pressure(np.clip(Ts, lo_liq, hi_liq))) / Pb, 0.999999)
        N_over_h = F_over_h * np.log((1.0 - yb) / (1.0 - ys))
        phi = N_over_h * np.asarray(vap.cp_molar(Tf))
        small = np.abs(phi) < 1e-9
        ack = np.where(small, 1.0 - phi / 2, phi / np.expm1(np.where(small, 1.0, phi)))
        latent = np.asarray(lq.enthalpy_vaporization(np.clip(Ts, lo_liq, hi_liq))) * a.molar_mass
        return np.asarray(ack * (Tb - Ts) - N_over_h * latent)

    hi = np.minimum(Tb, hi_liq)
    lo = np.full_like(Tb, lo_liq)
    f_hi = residual(hi)
    saturated = f_hi >= 0  # bulk at saturation at T: no evaporation, the surface is at T
    y_sat = np.minimum(np.asarray(lq.vapor_pressure(np.clip(Tb, lo_liq, hi_liq))) / Pb, 1.0)
    supersaturated = saturated & (Tb <= hi_liq) & (yb > y_sat * (1 + 1e-6))
    if supersaturated.any():
        i = int(np.argmax(supersaturated))
        raise OutOfRangeError(
            f"the gas is supersaturated: y_bulk={yb.flat[i]:.4g} exceeds the saturation mole "
            f"fraction {y_sat.flat[i]:.4g} of {a.name!r} at T={Tb.flat[i]:.2f} K and P={Pb.flat[i]:.6g} Pa; "
            "vapour would condense (fog or dew) rather than evaporate: check y_bulk, T and P"
        )
    if (saturated & (hi < Tb)).any():
        raise OutOfRangeError("the wet surface would be hotter than the liquid's modelled range")
    f_lo = residual(lo)
    if ((f_lo < 0) & ~saturated).any():
        raise OutOfRangeError(
            f"the surface temperature lies below {lo_liq:.2f} K, the lower end of the liquid "
            f"models of {a.name!r} (it would freeze); no liquid wet-surface temperature exists"
        )
    for _ in range(_ITERATIONS):
        mid = 0.5 * (lo + hi)
        f_mid = residual(mid)
        up = f_mid > 0
        lo = np.where(up, mid, lo)
        hi = np.where(up, hi, mid)
    out = np.where(saturated, Tb, 0.5 * (lo + hi))
    return finish(out)


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
    y = np.asarray(rh) * np.asarray(w.vapor_pressure(Tv)) / np.asarray(Pv)
    if (y >= 1).any():
        raise OutOfRangeError("the water vapour pressure at T exceeds P; lower T or raise P")
    return wet_surface_temperature("water", "air", Tv, finish(y), Pv)
