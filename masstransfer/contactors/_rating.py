"""Rating a packing or a bubble column: one call from a packing record, or from species names."""

from __future__ import annotations

from collections.abc import Mapping
from dataclasses import dataclass
from types import MappingProxyType
from typing import Any

import numpy as np

from .._typing import ArrayLike, FloatOrArray
from .._validation import check_positive, collect_warnings, finish, guard, warn_caller
from ..errors import EnvelopeWarning, InputTypeError, UnknownMethodError
from ..substances._species import Species
from ._bubble import akita_yoshida_holdup, akita_yoshida_kla
from ._common import positives
from ._packed import (
    billet_schultes_area,
    billet_schultes_k_G,
    billet_schultes_k_L,
    billet_schultes_loading_velocity,
    bravo_rocha_fair_k_G,
    bravo_rocha_fair_k_L,
    onda_k_G,
    onda_k_L,
    onda_wetted_area,
)
from ._packing import Packing, packing

__all__ = [
    "PACKED_METHODS",
    "BubbleColumnResult",
    "PackedColumnResult",
    "packed_column",
    "rate_bubble_column",
    "rate_packing",
]

#: Packed-column methods with the accuracy their sources state (from memory).
PACKED_METHODS: Mapping[str, str] = MappingProxyType(
    {
        "onda": "Onda, Takeuchi & Okumoto (1968); about 20 % on k_L, k_G and a_w (from memory)",
        "billet-schultes": "Billet & Schultes (1999); mean deviation about 10-15 % (from memory)",
        "bravo-rocha-fair": "Bravo, Rocha & Fair (1985), structured packings; about 20 % (from memory)",
    }
)

#: Fraction of the loading-point gas velocity from which a rating warns (common practice).
NEAR_LOADING = 0.8


@dataclass(frozen=True)
class PackedColumnResult:
    """Film coefficients and interfacial area of a packing at one operating point.

    Attributes
    ----------
    packing : str
        Name of the packing record.
    method : str
        ``"onda"``, ``"billet-schultes"`` or ``"bravo-rocha-fair"``.
    a_e : float or numpy.ndarray
        Effective (wetted) interfacial area [m^2/m^3].
    k_L : float or numpy.ndarray
        Liquid-side coefficient [m/s].
    k_G : float or numpy.ndarray
        Gas-side coefficient [mol/(m^2 s Pa)].
    k_L_a : float or numpy.ndarray
        Volumetric liquid-side coefficient [1/s].
    k_G_a : float or numpy.ndarray
        Volumetric gas-side coefficient [mol/(m^3 s Pa)].
    loading_fraction : float or numpy.ndarray or None
        u_V over the Billet & Schultes loading velocity (None without C_S) [-].
    accuracy : str
        The accuracy the source states.
    warnings : tuple of str
        Envelope and loading cautions.
    inputs : mapping
        The properties used (fetched or given), SI.

    """

    packing: str
    method: str
    a_e: FloatOrArray
    k_L: FloatOrArray
    k_G: FloatOrArray
    k_L_a: FloatOrArray
    k_G_a: FloatOrArray
    loading_fraction: FloatOrArray | None
    accuracy: str
    warnings: tuple[str, ...]
    inputs: Mapping[str, Any]


def _packing_arg(value: object) -> Packing:
    if isinstance(value, Packing):
        return value
    if isinstance(value, str):
        return packing(value)
    raise InputTypeError(f"packing={value!r} is a {type(value).__name__}; pass a Packing or a packing name")


def _method_arg(method: object) -> str:
    if not isinstance(method, str):
        raise InputTypeError(
            f"method={method!r} is a {type(method).__name__}; pass one of {', '.join(PACKED_METHODS)}"
        )
    if method not in PACKED_METHODS:
        raise UnknownMethodError(f"method={method!r} is not known; accepted: {', '.join(PACKED_METHODS)}")
    return method


@guard
def packed_column(
    packing: Packing | str,
    u_V: ArrayLike,
    u_L: ArrayLike,
    T: ArrayLike,
    rho_V: ArrayLike,
    mu_V: ArrayLike,
    D_V: ArrayLike,
    rho_L: ArrayLike,
    mu_L: ArrayLike,
    D_L: ArrayLike,
    sigma: ArrayLike,
    method: str = "billet-schultes",
) -> PackedColumnResult:
    r"""Film coefficients, interfacial area and loading of a packing, numbers in.

    .. math:: k_L a = k_L a_e,\qquad k_G a = k_G a_e

    with a_e, k_L and k_G from the chosen method and the packing's constants.

    Parameters
    ----------
    packing : Packing or str
        A packing record or a name of :data:`PACKINGS`.
    u_V : float or array_like
        Superficial gas velocity [m/s].
    u_L : float or array_like
        Superficial liquid velocity [m/s].
    T : float or array_like
        Temperature [K].
    rho_V : float or array_like
        Gas density [kg/m^3].
    mu_V : float or array_like
        Gas viscosity [Pa s].
    D_V : float or array_like
        Diffusivity of the solute in the gas [m^2/s].
    rho_L : float or array_like
        Liquid density [kg/m^3].
    mu_L : float or array_like
        Liquid viscosity [Pa s].
    D_L : float or array_like
        Diffusivity of the solute in the liquid [m^2/s].
    sigma : float or array_like
        Surface tension of the liquid [N/m].
    method : str
        ``"billet-schultes"`` (default), ``"onda"`` (random packings) or
        ``"bravo-rocha-fair"`` (structured packings).

    Returns
    -------
    PackedColumnResult
        a_e, k_L, k_G, the volumetric coefficients, the loading fraction and
        cautions.

    Notes
    -----
    An EnvelopeWarning is issued from 80 % of the Billet & Schultes loading
    velocity (when the packing has C_S): the correlations hold below the
    loading point.  Estimates: check designs for toxic or flammable gases
    against measured data for the actual packing and system, local codes
    and licensed engineering practice.

    References
    ----------
    Billet, R. & Schultes, M. (1999). *Chem. Eng. Technol.* 22, 1-21.
    Onda, K., Takeuchi, H. & Okumoto, Y. (1968). *J. Chem. Eng. Japan* 1, 56-62.
    Bravo, J. L., Rocha, J. A. & Fair, J. R. (1985). *Hydrocarbon Processing* 64(1), 91-95.

    Examples
    --------
    >>> r = packed_column("pall-ring-metal-50", 1.2, 0.005, 298.15, 1.2, 1.8e-5, 1.6e-5,
    ...                   998.0, 1.0e-3, 1.9e-9, 0.072)
    >>> round(r.k_L_a, 4), round(r.loading_fraction, 2)
    (0.0116, 0.73)

    """
    pk = _packing_arg(packing)
    how = _method_arg(method)
    uV, uL, Tv, rhoV, muV, DV, rhoL, muL, DL, s = positives(
        u_V=u_V, u_L=u_L, T=T, rho_V=rho_V, mu_V=mu_V, D_V=D_V, rho_L=rho_L, mu_L=mu_L, D_L=D_L, sigma=sigma
    )
    with collect_warnings() as caught:
        if how == "onda":
            L_mass = finish(np.asarray(uL) * np.asarray(rhoL))
            G_mass = finish(np.asarray(uV) * np.asarray(rhoV))
            a_e = onda_wetted_area(pk.a, pk.sigma_c, s, L_mass, muL, rhoL)
            k_L = onda_k_L(L_mass, a_e, muL, rhoL, DL, pk.a, pk.nominal_size)
            k_G = onda_k_G(G_mass, pk.a, muV, rhoV, DV, pk.nominal_size, Tv)
        elif how == "billet-schultes":
            C_L, C_V, C_h = (pk.need(c, "Billet & Schultes") for c in ("C_L", "C_V", "C_h"))
            a_e = billet_schultes_area(uL, pk.a, pk.void_fraction, rhoL, muL, s)
            k_L = billet_schultes_k_L(uL, pk.a, pk.void_fraction, C_L, rhoL, muL, DL)
            k_G = billet_schultes_k_G(uV, uL, pk.a, pk.void_fraction, C_V, C_h, rhoV, muV, DV, rhoL, muL, Tv)
        else:
            S, B, h, th = (pk.need(c, "Bravo, Rocha & Fair") for c in ("S", "B", "h", "theta"))
            a_e = pk.a
            k_L = bravo_rocha_fair_k_L(uL, pk.void_fraction, S, B, h, th, rhoL, muL, DL)
            k_G = bravo_rocha_fair_k_G(uV, uL, pk.void_fraction, S, B, h, th, rhoV, muV, DV, rhoL, muL, Tv)
        loading: FloatOrArray | None = None
        if pk.C_S is not None:
            u_S = billet_schultes_loading_velocity(
                uL, uV, pk.a, pk.void_fraction, pk.C_S, rhoL, rhoV, muL, muV
            )
            loading = finish(np.asarray(uV) / np.asarray(u_S))
            worst = float(np.max(loading, initial=0.0))  # an empty input has no load to report
            if worst >= NEAR_LOADING:
                caught.append(
                    (
                        f"packed_column: the gas load is {100 * worst:.0f} % of the Billet & Schultes "
                        f"loading point of {pk.name!r}; the mass-transfer correlations hold below it "
                        "and capacity is near its limit",
                        EnvelopeWarning,
                    )
                )
    for message, category in caught:
        warn_caller(message, category)
    ae = np.asarray(a_e, dtype=float)
    return PackedColumnResult(
        packing=pk.name,
        method=how,
        a_e=finish(ae * np.ones_like(np.asarray(k_L))),
        k_L=k_L,
        k_G=k_G,
        k_L_a=finish(np.asarray(k_L) * ae),
        k_G_a=finish(np.asarray(k_G) * ae),
        loading_fraction=loading,
        accuracy=PACKED_METHODS[how],
        warnings=tuple(dict.fromkeys(m for m, _ in caught)),
        inputs=MappingProxyType(
            {"u_V": uV, "u_L": uL, "T": Tv, "rho_V": rhoV, "mu_V": muV, "D_V": DV}
            | {"rho_L": rhoL, "mu_L": muL, "D_L": DL, "sigma": s}
        ),
    )


def _liquid_props(liquid: str | Species, T: FloatOrArray) -> tuple[FloatOrArray, FloatOrArray, FloatOrArray]:
    from ..substances._properties import liquid_model

    lm = liquid_model(liquid)
    return lm.density(T), lm.viscosity(T), lm.surface_tension(T)


@guard
def rate_packing(
    solute: str | Species,
    gas: str | Species,
    liquid: str | Species,
    packing: Packing | str,
    T: ArrayLike,
    u_V: ArrayLike,
    u_L: ArrayLike,
    P: ArrayLike = 101325.0,
    method: str = "billet-schultes",
) -> PackedColumnResult:
    r"""Rate a packing for a solute between a named gas and a named liquid.

    .. math:: k_L a = k_L a_e,\qquad k_G a = k_G a_e

    Fetches the gas density and viscosity, the liquid density, viscosity and
    surface tension (the liquid as pure solvent) and both diffusivities
    (Fuller in the gas, Wilke-Chang in the liquid), then calls
    :func:`packed_column`.

    Parameters
    ----------
    solute : str or Species
        The transferring species, e.g. ``"ammonia"``.
    gas : str or Species
        Carrier gas, e.g. ``"air"``.
    liquid : str or Species
        Solvent, e.g. ``"water"``.
    packing : Packing or str
        A packing record or a name of :data:`PACKINGS`.
    T : float or array_like
        Temperature of both phases [K].
    u_V : float or array_like
        Superficial gas velocity [m/s].
    u_L : float or array_like
        Superficial liquid velocity [m/s].
    P : float or array_like
        Pressure [Pa].
    method : str
        As for :func:`packed_column`.

    Returns
    -------
    PackedColumnResult
        Coefficients, area, loading and the properties used (``inputs``).

    Notes
    -----
    Property estimates add their own error (diffusivities about 5-10 %);
    results are estimates.  For toxic or flammable gases check against
    measured data for the actual packing and system, local codes and
    licensed engineering practice.

    References
    ----------
    Billet, R. & Schultes, M. (1999). *Chem. Eng. Technol.* 22, 1-21.

    Examples
    --------
    >>> r = rate_packing("ammonia", "air", "water", "pall-ring-metal-50", 298.15, 1.2, 0.005)
    >>> round(r.k_G_a * 101325.0, 2)
    204.89

    """
    from ..diffusivity._gas import gas_diffusivity
    from ..diffusivity._liquid import liquid_diffusivity
    from ..substances._properties import gas_model

    pk = _packing_arg(packing)
    how = _method_arg(method)
    Tv = check_positive("T", T)
    Pv = check_positive("P", P)
    gm = gas_model(gas)
    rho_V, mu_V = gm.density(Tv, Pv), gm.viscosity(Tv)
    rho_L, mu_L, sigma = _liquid_props(liquid, Tv)
    D_V = gas_diffusivity(solute, gas, Tv, Pv)
    D_L = liquid_diffusivity(solute, liquid, Tv)
    return packed_column(pk, u_V, u_L, Tv, rho_V, mu_V, D_V, rho_L, mu_L, D_L, sigma, how)


@dataclass(frozen=True)
class BubbleColumnResult:
    """Gas hold-up and k_L a of a bubble column (Akita & Yoshida), with the properties used.

    Attributes
    ----------
    holdup : float or numpy.ndarray
        Gas hold-up [-].
    k_L_a : float or numpy.ndarray
        Volumetric liquid-side coefficient [1/s].
    warnings : tuple of str
        Envelope cautions.
    inputs : mapping
        The properties used, SI.

    """

    holdup: FloatOrArray
    k_L_a: FloatOrArray
    warnings: tuple[str, ...]
    inputs: Mapping[str, Any]


@guard
def rate_bubble_column(
    solute: str | Species,
    liquid: str | Species,
    T: ArrayLike,
    u_G: ArrayLike,
    diameter: ArrayLike,
    electrolyte: bool = False,
) -> BubbleColumnResult:
    r"""Gas hold-up and k_L a of a bubble column for a named solute and liquid (Akita & Yoshida).

    .. math::
        \frac{k_L a\,d_c^2}{D_L} = 0.6\,Sc_L^{0.5}\,Bo^{0.62}\,Ga^{0.31}\,\varepsilon_G^{1.1}

    Parameters
    ----------
    solute : str or Species
        The transferring gas, e.g. ``"oxygen"``.
    liquid : str or Species
        The liquid, e.g. ``"water"``.
    T : float or array_like
        Temperature [K].
    u_G : float or array_like
        Superficial gas velocity [m/s].
    diameter : float or array_like
        Column diameter [m].
    electrolyte : bool
        True for electrolyte solutions.

    Returns
    -------
    BubbleColumnResult
        Hold-up, k_L a, cautions and properties.

    Notes
    -----
    Properties of the pure liquid; the diffusivity by Wilke-Chang.  See
    :func:`akita_yoshida_holdup` for the envelope.

    References
    ----------
    Akita, K. & Yoshida, F. (1973). *Ind. Eng. Chem. Process Des. Dev.* 12, 76-80.

    Examples
    --------
    >>> r = rate_bubble_column("oxygen", "water", 298.15, 0.05, 0.3)
    >>> round(r.holdup, 3)
    0.109

    """
    from ..diffusivity._liquid import liquid_diffusivity

    Tv = check_positive("T", T)
    rho, mu, sigma = _liquid_props(liquid, Tv)
    D_L = liquid_diffusivity(solute, liquid, Tv)
    with collect_warnings() as caught:
        eps = akita_yoshida_holdup(u_G, diameter, rho, mu, sigma, electrolyte)
        kla = akita_yoshida_kla(u_G, diameter, rho, mu, sigma, D_L, eps)
    for message, category in caught:
        warn_caller(message, category)
    return BubbleColumnResult(
        holdup=eps,
        k_L_a=kla,
        warnings=tuple(dict.fromkeys(m for m, _ in caught)),
        inputs=MappingProxyType({"T": Tv, "rho_L": rho, "mu_L": mu, "sigma": sigma, "D_L": D_L}),
    )
