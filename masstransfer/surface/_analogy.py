"""Heat-mass transfer analogies: from a known h to k_c (and back), in every convention.

Numbers in: :func:`mass_transfer_coefficient_from_heat` and its inverse
(Chilton-Colburn, :math:`j_H = j_D`), :func:`sherwood_from_nusselt`, the
j-factor from a friction factor, the Reynolds, Prandtl-Taylor and
von Karman analogies, the Lewis relation and the psychrometric ratio.

Names in: :func:`mass_transfer_from_heat` fetches the carrier's properties
and the diffusivity for a species at a state and returns a frozen
:class:`TransferCoefficients` with k_c in each convention, the properties and
groups used, and the warnings raised.
"""

from __future__ import annotations

import functools
import inspect
import math
from collections.abc import Callable, Mapping
from dataclasses import dataclass
from typing import Any, Literal, overload

import numpy as np

from .._blocks import blocked_shape, blockwise
from .._frozen import FrozenResult
from .._typing import ArrayLike, FloatArray, FloatOrArray
from .._uncertainty import combine, relative_input, stated_uncertainty
from .._validation import (
    check_nonnegative,
    check_positive,
    check_shapes,
    collect_warnings,
    finish,
    guard,
    warn_caller,
)
from ..constants import R_GAS
from ..errors import EnvelopeWarning, InputValueError
from ..substances._species import Species, species
from ._medium import Override, gas_side, is_composition, property_override

__all__ = [
    "TransferCoefficients",
    "colburn_j_from_friction",
    "heat_transfer_coefficient_from_mass",
    "lewis_relation",
    "mass_transfer_coefficient_from_heat",
    "mass_transfer_from_heat",
    "nusselt_from_sherwood",
    "psychrometric_ratio",
    "sherwood_from_nusselt",
    "stanton_prandtl_taylor",
    "stanton_reynolds",
    "stanton_von_karman",
]

_TWO_THIRDS = 2.0 / 3.0

#: The ranges over which j_H = f/2 and j_D = f/2 were established, the usual statement of the
#: Chilton-Colburn analogy's validity (Incropera & DeWitt 6th ed., Eqs. (6.70)-(6.71), from memory).
_COLBURN_RANGES = (("Pr", 0.6, 60.0), ("Sc", 0.6, 3000.0))


def _colburn_envelope(Pr: FloatOrArray, Sc: FloatOrArray) -> None:
    """Warn where Pr or Sc leaves the range over which the analogy was established."""
    for (name, lo, hi), v in zip(_COLBURN_RANGES, (Pr, Sc), strict=True):
        if isinstance(v, float):
            vmin = vmax = v
        elif v.size:
            vmin, vmax = float(v.min()), float(v.max())
        else:
            continue
        if vmin < lo or vmax > hi:
            bad = vmin if vmin < lo else vmax
            warn_caller(
                f"Chilton-Colburn analogy: {name}={bad!r} is outside {lo:g} to {hi:g}, the range over "
                "which j_H = j_D was established (Incropera & DeWitt 6th ed., Eqs. 6.70-6.71); the "
                "result is an extrapolation",
                EnvelopeWarning,
            )


def _require_positive_denominator(
    analogy: str, den: np.ndarray[Any, np.dtype[np.float64]], a: dict[str, FloatOrArray]
) -> None:
    """Refuse inputs for which an analogy's denominator is not positive (a negative Stanton number)."""
    bad = den <= 0.0
    if not bad.any():
        return
    f = float(np.broadcast_to(a["f_darcy"], den.shape)[bad].ravel()[0])
    p = float(np.broadcast_to(a["Pr"], den.shape)[bad].ravel()[0])
    raise InputValueError(
        f"f_darcy={f!r} with Pr={p!r} makes the denominator of the {analogy} analogy zero or negative "
        "(a negative Stanton number): the analogy holds for turbulent-flow friction factors (f_darcy "
        "below about 0.1) and Pr (Sc) near 1; pass f_darcy and Pr in that range"
    )


def _checked(**kw: ArrayLike) -> dict[str, FloatOrArray]:
    out = {k: check_positive(k, v) for k, v in kw.items()}
    check_shapes(**out)
    return out


@overload
def mass_transfer_coefficient_from_heat(
    h: float, *, rho: float, cp: float, Pr: float, Sc: float, exponent: float = ...
) -> float: ...
@overload
def mass_transfer_coefficient_from_heat(
    h: FloatArray, *, rho: ArrayLike, cp: ArrayLike, Pr: ArrayLike, Sc: ArrayLike, exponent: float = ...
) -> FloatArray: ...
@overload
def mass_transfer_coefficient_from_heat(
    h: ArrayLike, *, rho: ArrayLike, cp: ArrayLike, Pr: ArrayLike, Sc: ArrayLike, exponent: float = ...
) -> FloatOrArray: ...
@guard(check_output=False)
def mass_transfer_coefficient_from_heat(
    h: ArrayLike,
    *,
    rho: ArrayLike,
    cp: ArrayLike,
    Pr: ArrayLike,
    Sc: ArrayLike,
    exponent: float = _TWO_THIRDS,
) -> FloatOrArray:
    r"""Mass-transfer coefficient from a heat-transfer coefficient (Chilton-Colburn).

    .. math:: k_c = \frac{h}{\rho c_p}\left(\frac{Pr}{Sc}\right)^{n} = \frac{h}{\rho c_p Le^{n}}

    from :math:`j_H = St\,Pr^{2/3} = j_D = St_m Sc^{2/3}` (n = 2/3).  For a
    correlation whose Pr (Sc) exponent is m, the consistent choice is
    n = 1 - m (e.g. n = 0.6 for Pr^0.4).

    Parameters
    ----------
    h : float or array_like
        Heat-transfer coefficient [W/(m^2 K)] (zero or more).
    rho : float or array_like
        Fluid density [kg/m^3].
    cp : float or array_like
        Fluid specific heat capacity [J/(kg K)].
    Pr : float or array_like
        Prandtl number of the fluid [-].
    Sc : float or array_like
        Schmidt number of the transferring species in the fluid [-].
    exponent : float
        Exponent n [-] (2/3 for Chilton-Colburn).

    Returns
    -------
    float or numpy.ndarray
        k_c [m/s] (molar flux = k_c times a concentration difference).

    Notes
    -----
    Holds for geometries and flows where heat and mass transfer follow the
    same correlation with the same boundary conditions, at low mass-transfer
    rates, for 0.6 < Pr < 60 and 0.6 < Sc < 3000 (the ranges over which
    :math:`j_H = f/2` and :math:`j_D = f/2` were established, Incropera &
    DeWitt Eqs. (6.70)-(6.71)), and without form drag dominating (Chilton &
    Colburn 1934).  Outside those ranges it warns with
    :class:`~masstransfer.errors.EnvelopeWarning`.  The result is an
    estimate of the same quality as the h it starts from.

    References
    ----------
    Chilton, T. H., & Colburn, A. P. (1934). Mass transfer (absorption)
    coefficients. *Ind. Eng. Chem.* 26, 1183-1187.
    https://doi.org/10.1021/ie50299a012

    Incropera, F. P., DeWitt, D. P. et al. (2007). *Fundamentals of Heat and
    Mass Transfer*, 6th ed., Eq. (6.92).

    Examples
    --------
    >>> round(mass_transfer_coefficient_from_heat(40.0, rho=1.16, cp=1007.0, Pr=0.707, Sc=0.61), 5)
    0.03778

    """
    hv = check_nonnegative("h", h, "pass a heat-transfer coefficient of zero or more [W/(m^2 K)]")
    a = _checked(rho=rho, cp=cp, Pr=Pr, Sc=Sc)
    n = check_positive("exponent", exponent)
    check_shapes(h=hv, **a)
    _colburn_envelope(a["Pr"], a["Sc"])
    # the property factor first, so an array of h costs one multiplication
    return finish(hv * ((a["Pr"] / a["Sc"]) ** n / (a["rho"] * a["cp"])))


@overload
def heat_transfer_coefficient_from_mass(
    k_c: float, *, rho: float, cp: float, Pr: float, Sc: float, exponent: float = ...
) -> float: ...
@overload
def heat_transfer_coefficient_from_mass(
    k_c: FloatArray, *, rho: ArrayLike, cp: ArrayLike, Pr: ArrayLike, Sc: ArrayLike, exponent: float = ...
) -> FloatArray: ...
@overload
def heat_transfer_coefficient_from_mass(
    k_c: ArrayLike, *, rho: ArrayLike, cp: ArrayLike, Pr: ArrayLike, Sc: ArrayLike, exponent: float = ...
) -> FloatOrArray: ...
@guard(check_output=False)
def heat_transfer_coefficient_from_mass(
    k_c: ArrayLike,
    *,
    rho: ArrayLike,
    cp: ArrayLike,
    Pr: ArrayLike,
    Sc: ArrayLike,
    exponent: float = _TWO_THIRDS,
) -> FloatOrArray:
    r"""Heat-transfer coefficient from a mass-transfer coefficient (Chilton-Colburn).

    .. math:: h = k_c\,\rho c_p\left(\frac{Sc}{Pr}\right)^{n}

    Parameters
    ----------
    k_c : float or array_like
        Mass-transfer coefficient [m/s] (zero or more).
    rho : float or array_like
        Fluid density [kg/m^3].
    cp : float or array_like
        Fluid specific heat capacity [J/(kg K)].
    Pr : float or array_like
        Prandtl number [-].
    Sc : float or array_like
        Schmidt number [-].
    exponent : float
        Exponent n [-] (2/3 for Chilton-Colburn).

    Returns
    -------
    float or numpy.ndarray
        h [W/(m^2 K)].

    Notes
    -----
    The inverse of :func:`mass_transfer_coefficient_from_heat`, with the same
    validity; used, for instance, to get h from naphthalene-sublimation data.

    References
    ----------
    Chilton, T. H., & Colburn, A. P. (1934). *Ind. Eng. Chem.* 26, 1183-1187.
    https://doi.org/10.1021/ie50299a012

    Examples
    --------
    >>> round(heat_transfer_coefficient_from_mass(0.03778, rho=1.16, cp=1007.0, Pr=0.707, Sc=0.61), 2)
    40.0

    """
    kv = check_nonnegative("k_c", k_c, "pass a mass-transfer coefficient of zero or more [m/s]")
    a = _checked(rho=rho, cp=cp, Pr=Pr, Sc=Sc)
    n = check_positive("exponent", exponent)
    check_shapes(k_c=kv, **a)
    _colburn_envelope(a["Pr"], a["Sc"])
    return finish(kv * (a["rho"] * a["cp"] * (a["Sc"] / a["Pr"]) ** n))


@guard
def sherwood_from_nusselt(
    Nu: ArrayLike, *, Pr: ArrayLike, Sc: ArrayLike, exponent: float = 1.0 / 3.0
) -> FloatOrArray:
    r"""Sherwood number from a Nusselt number at the same Reynolds number.

    .. math:: Sh = Nu\left(\frac{Sc}{Pr}\right)^{m}

    Parameters
    ----------
    Nu : float or array_like
        Nusselt number [-].
    Pr : float or array_like
        Prandtl number [-].
    Sc : float or array_like
        Schmidt number [-].
    exponent : float
        The Pr exponent m of the correlation behind Nu [-] (1/3 for most
        laminar and Colburn-type forms; 0.4 for Dittus-Boelter heating).

    Returns
    -------
    float or numpy.ndarray
        Sh [-].

    Notes
    -----
    Exact only for correlations of the pure power form C Re^a Pr^m; for
    forms with an additive constant (2 + ... for spheres) evaluate the
    correlation with Sc instead (``surface.correlation(...).sherwood``).

    References
    ----------
    Incropera, F. P., DeWitt, D. P. et al. (2007). *Fundamentals of Heat and
    Mass Transfer*, 6th ed., Section 6.7.1.

    Examples
    --------
    >>> round(sherwood_from_nusselt(100.0, Pr=0.7, Sc=0.6), 3)
    95.0

    """
    a = _checked(Nu=Nu, Pr=Pr, Sc=Sc)
    m = check_positive("exponent", exponent)
    return finish(a["Nu"] * (a["Sc"] / a["Pr"]) ** m)


@guard
def nusselt_from_sherwood(
    Sh: ArrayLike, *, Pr: ArrayLike, Sc: ArrayLike, exponent: float = 1.0 / 3.0
) -> FloatOrArray:
    r"""Nusselt number from a Sherwood number at the same Reynolds number.

    .. math:: Nu = Sh\left(\frac{Pr}{Sc}\right)^{m}

    Parameters
    ----------
    Sh : float or array_like
        Sherwood number [-].
    Pr : float or array_like
        Prandtl number [-].
    Sc : float or array_like
        Schmidt number [-].
    exponent : float
        The Sc exponent m of the correlation behind Sh [-].

    Returns
    -------
    float or numpy.ndarray
        Nu [-].

    Notes
    -----
    The inverse of :func:`sherwood_from_nusselt`.

    References
    ----------
    Incropera, F. P., DeWitt, D. P. et al. (2007). *Fundamentals of Heat and
    Mass Transfer*, 6th ed., Section 6.7.1.

    Examples
    --------
    >>> round(nusselt_from_sherwood(95.0, Pr=0.7, Sc=0.6), 2)
    100.0

    """
    a = _checked(Sh=Sh, Pr=Pr, Sc=Sc)
    m = check_positive("exponent", exponent)
    return finish(a["Sh"] * (a["Pr"] / a["Sc"]) ** m)


@guard
def colburn_j_from_friction(f_darcy: ArrayLike) -> FloatOrArray:
    """Colburn j-factor from a friction factor: :math:`j_H = j_D = f_{Fanning}/2 = f_{Darcy}/8`.

    Parameters
    ----------
    f_darcy : float or array_like
        Darcy friction factor [-] (e.g. from ``fluids.friction``;
        :func:`masstransfer.surface.darcy_friction_smooth`).

    Returns
    -------
    float or numpy.ndarray
        j [-].

    Notes
    -----
    Holds for skin friction only (flat plates, pipes); not where form drag
    dominates (bluff bodies, packed beds).

    References
    ----------
    Colburn, A. P. (1933). *Trans. AIChE* 29, 174-210.

    Examples
    --------
    >>> colburn_j_from_friction(0.02)
    0.0025

    """
    f = check_positive("f_darcy", f_darcy)
    return finish(f / 8.0)


@guard
def stanton_reynolds(f_darcy: ArrayLike) -> FloatOrArray:
    """Reynolds analogy for turbulent duct flow, :math:`St = f/8` (Pr = Sc = 1).

    Parameters
    ----------
    f_darcy : float or array_like
        Darcy friction factor [-].

    Returns
    -------
    float or numpy.ndarray
        Stanton number (heat or mass) [-].

    Notes
    -----
    Exact only for Pr = 1 (or Sc = 1); see :func:`stanton_prandtl_taylor`
    and :func:`stanton_von_karman` otherwise.

    References
    ----------
    Reynolds, O. (1874). *Proc. Lit. Phil. Soc. Manchester* 14, 7-12.

    Examples
    --------
    >>> stanton_reynolds(0.02)
    0.0025

    """
    f = check_positive("f_darcy", f_darcy)
    return finish(f / 8.0)


@guard
def stanton_prandtl_taylor(f_darcy: ArrayLike, Pr: ArrayLike) -> FloatOrArray:
    r"""Prandtl-Taylor analogy for turbulent duct flow.

    .. math:: St = \frac{f/8}{1 + 5\sqrt{f/8}\,(Pr - 1)}

    Parameters
    ----------
    f_darcy : float or array_like
        Darcy friction factor [-].
    Pr : float or array_like
        Prandtl number (Schmidt number for mass transfer) [-].

    Returns
    -------
    float or numpy.ndarray
        Stanton number [-].

    Notes
    -----
    Two-layer model (laminar sublayer u+ = 5); reasonable for 0.5 < Pr < 2.

    References
    ----------
    Bird, R. B., Stewart, W. E., & Lightfoot, E. N. (2002). *Transport
    Phenomena*, 2nd ed., Section 13.4 and Problem 13D.

    Examples
    --------
    >>> round(stanton_prandtl_taylor(0.02, 0.7), 6)
    0.002703

    """
    a = _checked(f_darcy=f_darcy, Pr=Pr)
    g = np.asarray(a["f_darcy"]) / 8.0
    den = 1.0 + 5.0 * np.sqrt(g) * (np.asarray(a["Pr"]) - 1.0)
    _require_positive_denominator("Prandtl-Taylor", den, a)
    return finish(g / den)


@guard
def stanton_von_karman(f_darcy: ArrayLike, Pr: ArrayLike) -> FloatOrArray:
    r"""Von Karman analogy for turbulent duct flow (three-layer model).

    .. math::

        St = \frac{f/8}{1 + 5\sqrt{f/8}
        \left[Pr - 1 + \ln\left(1 + \tfrac{5}{6}(Pr-1)\right)\right]}

    Parameters
    ----------
    f_darcy : float or array_like
        Darcy friction factor [-].
    Pr : float or array_like
        Prandtl number (Schmidt number for mass transfer) [-], above 0.2.

    Returns
    -------
    float or numpy.ndarray
        Stanton number [-].

    Notes
    -----
    Better than Prandtl-Taylor for Pr up to about 10-30; at very high Sc
    use a mass-transfer correlation instead.

    References
    ----------
    von Karman, T. (1939). The analogy between fluid friction and heat
    transfer. *Trans. ASME* 61, 705-710.

    Examples
    --------
    >>> round(stanton_von_karman(0.02, 0.7), 6)
    0.002931

    """
    a = _checked(f_darcy=f_darcy, Pr=Pr)
    g = np.asarray(a["f_darcy"]) / 8.0
    P = np.asarray(a["Pr"])
    if (1.0 + 5.0 / 6.0 * (P - 1.0) <= 0).any():
        bad = float(P[P <= 0.2].ravel()[0])
        raise InputValueError(f"Pr={bad!r} must exceed 0.2 for the von Karman analogy; pass Pr > 0.2")
    den = 1.0 + 5.0 * np.sqrt(g) * (P - 1.0 + np.log(1.0 + 5.0 / 6.0 * (P - 1.0)))
    _require_positive_denominator("von Karman", den, a)
    return finish(g / den)


@guard
def lewis_relation(Pr: ArrayLike, Sc: ArrayLike, exponent: float = _TWO_THIRDS) -> FloatOrArray:
    r"""Ratio :math:`h/(\rho c_p k_c) = Le^{n}` that the analogy predicts.

    Parameters
    ----------
    Pr : float or array_like
        Prandtl number [-].
    Sc : float or array_like
        Schmidt number [-].
    exponent : float
        Exponent n [-] (2/3 for Chilton-Colburn).

    Returns
    -------
    float or numpy.ndarray
        :math:`(Sc/Pr)^n` [-]; 1 where Le = 1 (the Lewis relation).

    Notes
    -----
    For water vapour in air Le is about 0.85 and the ratio about 0.9; the
    Lewis relation (ratio taken as 1) is the basis of cooling-tower and
    humidifier design by enthalpy driving force.

    References
    ----------
    Lewis, W. K. (1922). The evaporation of a liquid into a gas.
    *Trans. ASME* 44, 325-340.

    Examples
    --------
    >>> round(lewis_relation(0.707, 0.61), 3)
    0.906

    """
    a = _checked(Pr=Pr, Sc=Sc)
    n = check_positive("exponent", exponent)
    return finish((a["Sc"] / a["Pr"]) ** n)


@guard
def psychrometric_ratio(h: ArrayLike, k_Y: ArrayLike, c_s: ArrayLike) -> FloatOrArray:
    """Psychrometric ratio :math:`h/(k_Y c_s)`.

    Parameters
    ----------
    h : float or array_like
        Heat-transfer coefficient [W/(m^2 K)].
    k_Y : float or array_like
        Mass-transfer coefficient on a humidity-ratio basis [kg/(m^2 s)] per
        unit difference in kg vapour / kg dry gas.
    c_s : float or array_like
        Humid heat of the gas [J/(kg dry gas K)].

    Returns
    -------
    float or numpy.ndarray
        The ratio [-]; close to 1 for air-water, about 2 for air and organic
        solvents, which is why their wet-bulb and adiabatic-saturation
        temperatures differ.

    References
    ----------
    Treybal, R. E. (1980). *Mass-Transfer Operations*, 3rd ed., Eq. (7.28).

    Examples
    --------
    >>> round(psychrometric_ratio(40.0, 0.039, 1020.0), 3)
    1.006

    """
    a = _checked(h=h, k_Y=k_Y, c_s=c_s)
    return finish(a["h"] / (a["k_Y"] * a["c_s"]))


# --------------------------------------------------------------------------
# names in
# --------------------------------------------------------------------------


@dataclass(frozen=True, eq=False)
class TransferCoefficients(FrozenResult):
    """Mass-transfer coefficients from a known h, with everything used to get them.

    Attributes
    ----------
    h : float or numpy.ndarray
        The heat-transfer coefficient given [W/(m^2 K)].
    k_c : float or numpy.ndarray
        Concentration-basis coefficient [m/s].
    k_G : float or numpy.ndarray or None
        Partial-pressure basis [mol/(m^2 s Pa)] (gas carrier).
    k_y : float or numpy.ndarray or None
        Mole-fraction basis [mol/(m^2 s)] (gas carrier); equal to the
        low-flux F-type coefficient.
    k_x : float or numpy.ndarray or None
        Mole-fraction basis [mol/(m^2 s)] (liquid carrier).
    solute, carrier, phase : str
        What was computed.
    T, P : float or numpy.ndarray
        State [K], [Pa].
    rho, cp, k, mu, D : float or numpy.ndarray
        Carrier density [kg/m^3], heat capacity [J/(kg K)], conductivity
        [W/(m K)], viscosity [Pa s] and the diffusivity [m^2/s].
    Pr, Sc, Le : float or numpy.ndarray
        Dimensionless groups [-].
    method : str
        The analogy and the diffusivity method used.
    warnings : tuple of str
        Every warning raised on the way.
    solute_identity, carrier_identity : str
        The resolved substances: name, CAS number, formula and molar mass.
    user_supplied : tuple of str
        Names of the properties the user supplied (``"rho"``, ``"D"``, ...); the
        others came from the databases.
    relative_uncertainty : float or numpy.ndarray or None
        Relative standard uncertainty of k_c [-] (one standard deviation, as a
        fraction; the same for k_G, k_y and k_x): the diffusivity method's
        stated accuracy and the ``h_uncertainty`` given, combined by
        linearisation; None where neither is known.

    """

    h: FloatOrArray
    k_c: FloatOrArray
    k_G: FloatOrArray | None
    k_y: FloatOrArray | None
    k_x: FloatOrArray | None
    solute: str
    carrier: str
    phase: str
    T: FloatOrArray
    P: FloatOrArray
    rho: FloatOrArray
    cp: FloatOrArray
    k: FloatOrArray
    mu: FloatOrArray
    D: FloatOrArray
    Pr: FloatOrArray
    Sc: FloatOrArray
    Le: FloatOrArray
    method: str
    warnings: tuple[str, ...]
    solute_identity: str = ""
    carrier_identity: str = ""
    user_supplied: tuple[str, ...] = ()
    relative_uncertainty: FloatOrArray | None = None


def _carrier_identity(carrier: Any) -> str:
    """Describe the resolved carrier: one species, or each component of a composition with its fraction."""
    if is_composition(carrier):
        return "; ".join(f"{species(n).identity}: {float(y):g}" for n, y in carrier.items())
    return species(carrier).identity


@guard
def mass_transfer_from_heat(
    h: ArrayLike,
    solute: str | Species,
    carrier: str | Species | Mapping[str, float],
    T: ArrayLike,
    P: ArrayLike = 101325.0,
    *,
    phase: Literal["gas", "liquid"] = "gas",
    diffusivity_method: str | None = None,
    exponent: float = _TWO_THIRDS,
    rho: Override = None,
    cp: Override = None,
    k: Override = None,
    mu: Override = None,
    D: Override = None,
    h_uncertainty: ArrayLike = 0.0,
    D_uncertainty: ArrayLike | None = None,
) -> TransferCoefficients:
    r"""Mass-transfer coefficients for a species from a known h, resolving properties.

    Parameters
    ----------
    h : float or array_like
        Heat-transfer coefficient for the same geometry and flow [W/(m^2 K)].
    solute : str or Species
        Transferring species.
    carrier : str or Species or mapping
        Carrier fluid (gas, e.g. ``"air"``, or solvent, e.g. ``"water"``), or a gas
        given as a composition by mole fraction, e.g. ``{"nitrogen": 0.79, "oxygen": 0.21}``
        or humid air ``{"air": 0.97, "water": 0.03}`` (mixture properties by the mixing
        rules of ``chemicals``, the diffusivity by Blanc's law).
    T : float or array_like
        Film temperature [K].
    P : float or array_like
        Pressure [Pa] (gas carrier; ignored for liquids).
    phase : {'gas', 'liquid'}
        Phase of the carrier.
    diffusivity_method : str, optional
        Method for the diffusivity (default: the pair's published recommendation, see
        :func:`masstransfer.diffusivity.available_methods`); the result's ``method`` names it
        with its stated accuracy.
    exponent : float
        Analogy exponent n [-] (2/3 for Chilton-Colburn).
    rho : float or callable, optional
        The user's carrier density [kg/m^3]: a number (or array broadcasting with T), or a
        function of T [K] accepting numpy arrays.  Replaces the database value.
    cp : float or callable, optional
        The user's carrier specific heat capacity [J/(kg K)], as for ``rho``.
    k : float or callable, optional
        The user's carrier thermal conductivity [W/(m K)], as for ``rho``.
    mu : float or callable, optional
        The user's carrier viscosity [Pa s], as for ``rho``.
    D : float or callable, optional
        The user's diffusivity of the solute in the carrier [m^2/s], as for ``rho``.
    h_uncertainty : float or array_like
        Relative standard uncertainty of ``h`` [-] (0.10 for 10 %, one
        standard deviation); 0 by default.
    D_uncertainty : float or array_like, optional
        Relative standard uncertainty of the diffusivity [-]; by default the
        diffusivity method's stated accuracy, and none for a ``D`` you supply.

    Returns
    -------
    TransferCoefficients
        k_c and its other conventions, with the properties, groups, method,
        warnings and the relative standard uncertainty of k_c.

    Notes
    -----
    Properties are the carrier's (dilute solute).  Values the user supplies replace the
    database's and are listed in ``user_supplied``; a carrier or solute the databases lack
    works once every property it needs is given.  The error is that of h
    combined with that of the diffusivity: with the properties fixed,
    :math:`k_c = h\,\rho^{n-1} c_p^{n-1} k^{-n} D^{n}` (the viscosity cancels),
    so by linearisation
    :math:`u(k_c)^2 = u(h)^2 + (n\,u(D))^2`, with u(D) the diffusivity
    method's stated average absolute deviation times sqrt(pi/2) (normal
    errors).  The property models' own errors (a few per cent at most) are
    not included.  Where the
    result bears on safety (toxic or flammable vapour release, oxygen
    ingress into food, pressure equipment), check it against measured data,
    local codes and licensed engineering practice.

    References
    ----------
    Chilton, T. H., & Colburn, A. P. (1934). *Ind. Eng. Chem.* 26, 1183-1187.
    https://doi.org/10.1021/ie50299a012

    Examples
    --------
    >>> r = mass_transfer_from_heat(35.0, "water", "air", 320.0)
    >>> round(r.k_c, 4), round(r.Le, 3)
    (0.0345, 0.873)
    >>> r = mass_transfer_from_heat(35.0, "ethanol", {"air": 0.97, "water": 0.03}, 320.0)
    >>> r.carrier
    'mixture(air 0.97, water 0.03)'

    """
    from ..diffusivity._liquid import liquid_diffusivity, ready_liquid
    from ..substances._properties import liquid_model

    if phase not in ("gas", "liquid"):
        raise InputValueError(f"phase={phase!r} must be 'gas' or 'liquid'")
    hv = check_nonnegative("h", h, "pass a heat-transfer coefficient of zero or more [W/(m^2 K)]")
    Tv = check_positive("T", T)
    Pv = check_positive("P", P)
    u_h = relative_input("h_uncertainty", h_uncertainty)
    u_D_given = None if D_uncertainty is None else relative_input("D_uncertainty", D_uncertainty)
    check_shapes(
        h=hv, T=Tv, P=Pv, h_uncertainty=u_h, **({} if u_D_given is None else {"D_uncertainty": u_D_given})
    )
    a = species(solute)
    if phase == "liquid" and is_composition(carrier):
        raise InputValueError(
            f"carrier={dict(carrier)!r}: a composition is accepted for a gas carrier only; for a "  # type: ignore[arg-type]
            "liquid pass one solvent (and its mixture properties as rho=, cp=, k=, mu=, D=)"
        )
    shape = blocked_shape(hv, Tv, Pv)
    overrides: dict[str, Any] = {"rho": rho, "cp": cp, "k": k, "mu": mu, "D": D}
    if (
        shape is not None
        and np.ndim(u_h) == 0
        and (u_D_given is None or not isinstance(u_D_given, np.ndarray) or u_D_given.ndim == 0)
        and all(v is None or callable(v) or np.ndim(v) == 0 for v in overrides.values())
    ):  # long arrays: the same chain over cache-sized blocks (flat cost per state)
        chain = functools.partial(
            inspect.unwrap(mass_transfer_from_heat),  # guarded once, here, not per block
            solute=a,
            carrier=carrier,
            phase=phase,
            diffusivity_method=diffusivity_method,
            exponent=exponent,
            h_uncertainty=u_h,
            D_uncertainty=D_uncertainty,
            **overrides,
        )
        blocked: TransferCoefficients = blockwise(chain, {"h": hv, "T": Tv, "P": Pv}, shape)
        return blocked
    rho_v: FloatOrArray
    cp_v: FloatOrArray
    k_v: FloatOrArray
    mu_v: FloatOrArray
    D_v: FloatOrArray
    u_D: FloatOrArray | None
    with collect_warnings() as caught:
        if phase == "gas":
            side = gas_side(
                a,
                carrier,
                name="carrier",
                diffusivity_method=diffusivity_method,
                rho=rho,
                cp=cp,
                k=k,
                mu=mu,
                D=D,
            )
            carrier_name, supplied = side.label, side.user_supplied
            rho_v, cp_v, k_v, mu_v = (
                side.density(Tv, Pv),
                side.heat_capacity(Tv),
                side.thermal_conductivity(Tv),
                side.viscosity(Tv),
            )
            method, u_D = side.diffusivity_method, side.diffusivity_uncertainty
            D_v = side.diffusivity(Tv, Pv)
            M_carrier = side.molar_mass
        else:
            b = species(carrier)  # type: ignore[arg-type]
            carrier_name, M_carrier = b.name, b.molar_mass
            over = {
                "rho": property_override("rho", rho, "kg/m^3"),
                "cp": property_override("cp", cp, "J/(kg K)"),
                "k": property_override("k", k, "W/(m K)"),
                "mu": property_override("mu", mu, "Pa s"),
                "D": property_override("D", D, "m^2/s"),
            }
            supplied = tuple(key for key, fn in over.items() if fn is not None)

            def value(key: str, model: Callable[[], Callable[[FloatOrArray], FloatOrArray]]) -> FloatOrArray:
                fn = over[key]
                return model()(Tv) if fn is None else fn(Tv)

            rho_v = value("rho", lambda: liquid_model(b).density)
            cp_v = value("cp", lambda: liquid_model(b).heat_capacity)
            k_v = value("k", lambda: liquid_model(b).thermal_conductivity)
            mu_v = value("mu", lambda: liquid_model(b).viscosity)
            if over["D"] is None:
                record = ready_liquid(a, b, diffusivity_method).record  # the solvent's default when None
                method = f"{record.name} (stated accuracy about {record.accuracy_pct:g} %)"
                D_v = liquid_diffusivity(a, b, Tv, method=record.name, P=Pv)
                u_D = stated_uncertainty(record)
            else:
                D_v = over["D"](Tv)
                method, u_D = "user-supplied", None
    for message, category in caught:
        warn_caller(message, category)
    r, c, kk, m, d = (np.asarray(x, dtype=float) for x in (rho_v, cp_v, k_v, mu_v, D_v))
    Pr = c * m / kk
    Sc = m / (r * d)
    Le = Sc / Pr
    k_c = np.asarray(mass_transfer_coefficient_from_heat(hv, rho=r, cp=c, Pr=Pr, Sc=Sc, exponent=exponent))
    k_G: FloatOrArray | None
    k_y: FloatOrArray | None
    k_x: FloatOrArray | None
    if phase == "gas":
        k_G = finish(k_c / (R_GAS * np.asarray(Tv)))
        k_y = finish(k_c * np.asarray(Pv) / (R_GAS * np.asarray(Tv)))
        k_x = None
    else:
        k_G = k_y = None
        k_x = finish(k_c * r / M_carrier)
    if u_D_given is not None:  # the user's D_uncertainty replaces the method's stated accuracy
        u_D = u_D_given
    n_text = "2/3" if math.isclose(exponent, _TWO_THIRDS) else f"{exponent:g}"
    return TransferCoefficients(
        h=finish(np.asarray(hv, dtype=float)),
        k_c=finish(k_c),
        k_G=k_G,
        k_y=k_y,
        k_x=k_x,
        solute=a.name,
        carrier=carrier_name,
        phase=phase,
        T=Tv,
        P=Pv,
        rho=finish(r),
        cp=finish(c),
        k=finish(kk),
        mu=finish(m),
        D=finish(d),
        Pr=finish(Pr),
        Sc=finish(Sc),
        Le=finish(Le),
        method=f"Chilton-Colburn analogy (exponent {n_text}); diffusivity by {method}",
        warnings=tuple(dict.fromkeys(message for message, _ in caught)),
        solute_identity=a.identity,
        carrier_identity=_carrier_identity(carrier),
        user_supplied=supplied,
        relative_uncertainty=combine((1.0, u_h if np.any(u_h) else None), (exponent, u_D)),
    )
