r"""Binary diffusion coefficients in gases at low pressure.

Two layers, as everywhere in the library:

* numbers in, numbers out: :func:`fuller`, :func:`chapman_enskog`,
  :func:`wilke_lee`, :func:`brokaw`, :func:`blanc`, plus
  :func:`neufeld_collision_integral` and :func:`fuller_volume`;
* names in: :func:`gas_diffusivity` and :func:`gas_diffusivity_in_mixture`
  resolve the species once (cached) and call the numeric layer.

All low-pressure methods give :math:`D_{AB} \propto 1/P`; above about
1 MPa the product :math:`PD_{AB}` starts to fall and the methods warn.
Estimates only: check designs that affect safety against measured data.
"""

from __future__ import annotations

import math
from collections.abc import Callable, Mapping
from dataclasses import dataclass
from types import MappingProxyType
from typing import Any, Final, Literal, overload

import numpy as np

from .. import _tables as data
from .._typing import ArrayLike, FloatArray, FloatOrArray
from .._validation import (
    call_with_quantities,
    check_nonnegative,
    check_positive,
    check_shapes,
    dask_blocks,
    finish,
    guard,
    has_quantity,
    scalar,
    warn_caller,
)
from ..constants import DEBYE
from ..errors import EnvelopeWarning, InputValueError, MissingConstantError
from ..substances._species import Origin, Species, ambiguity_warnings, rewarn_ambiguity, species
from ._common import normalise_method
from ._phase import PhaseLimits, check_vapour, medium_state, phase_limits
from ._records import (
    ClassRule,
    ConstantUsed,
    DiffusivityMethod,
    MethodAvailability,
    Prepared,
    Role,
    SpeciesClass,
    classify,
)

__all__ = [
    "GAS_DEFAULT",
    "GAS_METHODS",
    "available_methods",
    "blanc",
    "brokaw",
    "chapman_enskog",
    "fuller",
    "fuller_volume",
    "gas_diffusivity",
    "gas_diffusivity_in_mixture",
    "neufeld_collision_integral",
    "rescale_gas_diffusivity",
    "wilke_lee",
]

#: Pressure above which the low-pressure methods warn [Pa] (common practice:
#: the ideal-gas kinetic theory behind them holds to roughly 10 bar).
LOW_PRESSURE_LIMIT: Final = 1.0e6
#: Below this pressure [Pa] a gas diffusivity call warns: a pressure given in bar or atm instead of
#: Pa, or a rarefied gas where the continuum methods no longer describe transport in equipment.
VACUUM_LIMIT: Final = 100.0

_BAR = 1.0e5


def _check_M(name: str, M: FloatOrArray) -> None:
    big = M > 1.0 if isinstance(M, float) else bool(np.any(M > 1.0))
    if big:
        raise InputValueError(
            f"{name} has a value above 1 kg/mol, implausible for a gas; molar masses are in "
            "kg/mol (divide g/mol by 1000)"
        )


def _warn_pressure(P: FloatOrArray, method: str) -> None:
    low = P < VACUUM_LIMIT if isinstance(P, float) else bool(np.any(P < VACUUM_LIMIT))
    if low:
        warn_caller(
            f"{method}: P below {VACUUM_LIMIT:g} Pa: P is in pascals (1 bar = 1e5 Pa), and at such "
            "pressures the mean free path approaches the size of pores and channels (Knudsen "
            "regime, see masstransfer.diffusivity.bosanquet); check the pressure",
            EnvelopeWarning,
        )
    high = P > LOW_PRESSURE_LIMIT if isinstance(P, float) else bool(np.any(P > LOW_PRESSURE_LIMIT))
    if high:
        warn_caller(
            f"{method}: P above {LOW_PRESSURE_LIMIT:g} Pa lies outside the low-pressure range "
            "of the method (about 10 bar); D*P falls at high pressure, so the estimate is high",
            EnvelopeWarning,
        )


@overload
def fuller(T: float, P: float, M_a: float, M_b: float, v_a: float, v_b: float) -> float: ...
@overload
def fuller(T: FloatArray, P: ArrayLike, M_a: float, M_b: float, v_a: float, v_b: float) -> FloatArray: ...
@overload
def fuller(T: ArrayLike, P: ArrayLike, M_a: float, M_b: float, v_a: float, v_b: float) -> FloatOrArray: ...
@guard(check_output=False)
def fuller(
    T: ArrayLike,
    P: ArrayLike,
    M_a: float,
    M_b: float,
    v_a: float,
    v_b: float,
) -> FloatOrArray:
    r"""Binary gas diffusivity by the method of Fuller, Schettler and Giddings.

    .. math::

        D_{AB} = \frac{0.00143\,T^{1.75}}
        {P\,M_{AB}^{1/2}\,\left[(\Sigma_v)_A^{1/3} + (\Sigma_v)_B^{1/3}\right]^2},
        \qquad M_{AB} = \frac{2}{1/M_A + 1/M_B}

    with :math:`D_{AB}` in cm^2/s, P in bar and M in g/mol in the source;
    this function takes and returns SI units.

    Parameters
    ----------
    T : float or array_like
        Temperature [K].
    P : float or array_like
        Pressure [Pa].
    M_a : float
        Molar mass of species A [kg/mol].
    M_b : float
        Molar mass of species B [kg/mol].
    v_a : float
        Diffusion volume of A [cm^3/mol, the method's nominal unit]
        (see :func:`fuller_volume`).
    v_b : float
        Diffusion volume of B [cm^3/mol, the method's nominal unit].

    Returns
    -------
    float or numpy.ndarray
        Binary diffusion coefficient [m^2/s].

    Notes
    -----
    Poling, Prausnitz & O'Connell (2001, Table 11-2) report an average
    absolute error of about 5 % for this method on non-polar and weakly
    polar pairs at low pressure; errors of 10-20 % occur for strongly polar
    or associating species.  An estimate, not a measurement.

    References
    ----------
    Fuller, E. N., Schettler, P. D., & Giddings, J. C. (1966). A new method
    for prediction of binary gas-phase diffusion coefficients. *Ind. Eng.
    Chem.* 58(5), 18-27. https://doi.org/10.1021/ie50677a007

    Fuller, E. N., Ensley, K., & Giddings, J. C. (1969). *J. Phys. Chem.*
    73, 3679-3685. https://doi.org/10.1021/j100845a020

    Poling, B. E., Prausnitz, J. M., & O'Connell, J. P. (2001). *The
    Properties of Gases and Liquids*, 5th ed., Eq. (11-4.4).

    Examples
    --------
    Methanol (v = 31.25) in air (v = 19.7) at 298 K and 1 atm:

    >>> round(fuller(298.0, 101325.0, 0.03204, 0.02896, 31.25, 19.7) * 1e6, 2)
    15.97

    """
    Tv = check_positive("T", T)
    Pv = check_positive("P", P)
    check_shapes(T=Tv, P=Pv)
    Ma = check_positive("M_a", M_a)
    Mb = check_positive("M_b", M_b)
    va = check_positive("v_a", v_a)
    vb = check_positive("v_b", v_b)
    _check_M("M_a", Ma)
    _check_M("M_b", Mb)
    _warn_pressure(Pv, "fuller")
    c = _fuller_constant(Ma, Mb, va, vb)
    return finish(c * Tv**1.75 / Pv)


def _fuller_constant(Ma: FloatOrArray, Mb: FloatOrArray, va: FloatOrArray, vb: FloatOrArray) -> FloatOrArray:
    """Everything in Fuller's equation but T^1.75/P, in SI (m^2/s * Pa / K^1.75)."""
    M_ab = 2.0 / (1.0 / (Ma * 1000.0) + 1.0 / (Mb * 1000.0))
    # 0.00143 cm^2/s bar -> 1e-4 m^2/cm^2 * 1e5 Pa/bar
    return finish(0.00143 * 1e-4 * _BAR / (M_ab**0.5 * (va ** (1.0 / 3.0) + vb ** (1.0 / 3.0)) ** 2))


@guard
def fuller_volume(sp: str | Species) -> float:
    r"""Fuller diffusion volume of a species, from its formula and structure.

    .. math:: \Sigma_v = \sum_i n_i v_i + n_{\mathrm{rings}}\,\Delta v_{\mathrm{ring}}

    The special-molecule volume is used where the source tabulates one
    (H2, N2, O2, air, CO2, H2O, NH3, ...).  Otherwise atomic increments for
    C, H, O, N, F, Cl, Br, I and S are summed and -18.3 is added for each
    aromatic ring (heteroaromatic included) found in the species' SMILES; none for
    saturated rings, heterocyclic or not (the increment was fitted on aromatic rings and
    over-predicts D by about 20 % for tetrahydrofuran or dioxane).

    Parameters
    ----------
    sp : str or Species
        The species (name, CAS number, formula or :class:`Species`).

    Returns
    -------
    float
        Diffusion volume [cm^3/mol, the method's nominal unit].

    Raises
    ------
    MissingConstantError
        If the species holds an element with no published increment.

    Notes
    -----
    Volumes: Fuller, Ensley & Giddings (1969) as tabulated in Poling,
    Prausnitz & O'Connell (2001), Table 11-1 (see :mod:`masstransfer._tables`).
    A user-supplied ``Species.fuller_volume`` takes precedence.

    References
    ----------
    Fuller, E. N., Ensley, K., & Giddings, J. C. (1969). *J. Phys. Chem.*
    73, 3679-3685. https://doi.org/10.1021/j100845a020

    Examples
    --------
    >>> round(fuller_volume("toluene"), 2)
    111.48

    """
    return _fuller_volume_parts(species(sp))[0]


def _fuller_volume_parts(s: Species) -> tuple[float, tuple[str, ...]]:
    """Fuller volume of ``s`` and the notes on the rules that set it."""
    if s.fuller_volume is not None:
        return s.fuller_volume, ()
    if not s.atoms:
        raise MissingConstantError(
            f"species {s.name!r} has no formula, so its Fuller volume cannot be summed; "
            "supply it: Species(..., fuller_volume=...)"
        )
    total = 0.0
    for el, n in s.atoms.items():
        inc = data.FULLER_ATOMIC_VOLUMES.get(el)
        if inc is None:
            raise MissingConstantError(
                f"the Fuller method has no diffusion volume for element {el!r} in {s.name!r}; "
                "use method='chapman-enskog', or supply Species(..., fuller_volume=...)"
            )
        total += n * inc
    notes: list[str] = []
    mol = s.molecule
    if mol is not None:
        aromatic = sum(1 for ring in mol.rings if ring.aromatic)
        saturated_hetero = sum(1 for ring in mol.rings if ring.hetero and not ring.aromatic)
        if aromatic:
            total += aromatic * data.FULLER_RING_INCREMENT
            notes.append(
                f"{s.name}: Fuller ring increment {data.FULLER_RING_INCREMENT:g} applied to "
                f"{aromatic} aromatic ring(s): volume {total:.2f} (atomic sum "
                f"{total - aromatic * data.FULLER_RING_INCREMENT:.2f})"
            )
        if saturated_hetero:
            notes.append(
                f"{s.name}: no Fuller ring increment for its {saturated_hetero} saturated "
                "heterocyclic ring(s) (the increment is for aromatic rings; applying it would "
                f"lower the volume to {total + saturated_hetero * data.FULLER_RING_INCREMENT:.2f})"
            )
    return total, tuple(notes)


# Neufeld, Janzen & Aziz (1972) constants, as in Poling et al. 5th ed. Eq. (11-3.6).
_NEUFELD: Final = (1.06036, 0.15610, 0.19300, 0.47635, 1.03587, 1.52996, 1.76474, 3.89411)
_TSTAR_RANGE: Final = (0.3, 100.0)


@guard
def neufeld_collision_integral(T_star: ArrayLike) -> FloatOrArray:
    r"""Diffusion collision integral of the Lennard-Jones 12-6 potential.

    .. math::

        \Omega_D = \frac{A}{T^{*B}} + \frac{C}{e^{DT^*}} + \frac{E}{e^{FT^*}}
        + \frac{G}{e^{HT^*}}

    Parameters
    ----------
    T_star : float or array_like
        Reduced temperature :math:`kT/\varepsilon_{AB}` [-].

    Returns
    -------
    float or numpy.ndarray
        Collision integral :math:`\Omega_D` [-].

    Notes
    -----
    Fitted for :math:`0.3 \le T^* \le 100`; a warning is issued outside.

    References
    ----------
    Neufeld, P. D., Janzen, A. R., & Aziz, R. A. (1972). Empirical equations
    to calculate 16 of the transport collision integrals Omega(l,s)* for the
    Lennard-Jones (12-6) potential. *J. Chem. Phys.* 57, 1100-1102.
    https://doi.org/10.1063/1.1678363

    Examples
    --------
    >>> round(neufeld_collision_integral(1.0), 4)
    1.4405

    """
    Ts = check_positive("T_star", T_star)
    return _omega_d(Ts)


def _omega_d(Ts: FloatOrArray) -> FloatOrArray:
    """Neufeld collision integral without argument checks (T* already positive)."""
    lo, hi = _TSTAR_RANGE
    out_of = (Ts < lo or Ts > hi) if isinstance(Ts, float) else bool(np.any((Ts < lo) | (Ts > hi)))
    if out_of:
        warn_caller(
            f"Neufeld collision integral: T* = kT/epsilon outside {lo}-{hi}, the range of the fit",
            EnvelopeWarning,
        )
    A, B, C, D, E, F, G, H = _NEUFELD
    if isinstance(Ts, float):  # scalar fast path: math.exp avoids numpy's per-call overhead
        return float(A / Ts**B + C * math.exp(-D * Ts) + E * math.exp(-F * Ts) + G * math.exp(-H * Ts))
    return finish(A / Ts**B + C * np.exp(-D * Ts) + E * np.exp(-F * Ts) + G * np.exp(-H * Ts))


def _kinetic(
    Tv: FloatOrArray,
    Pv: FloatOrArray,
    constant: float,
    M_ab: float,
    sigma_a: float,
    eps: float,
    delta2: float,
) -> FloatOrArray:
    r"""Chapman-Enskog form shared by three methods (inputs already checked).

    ``constant`` is 0.00266 (Chapman-Enskog, Brokaw) or Wilke-Lee's
    :math:`(3.03 - 0.98/M_{AB}^{1/2})10^{-3}`; ``sigma_a`` in angstrom;
    ``delta2`` is Brokaw's polar term :math:`\delta_{AB}^2` (0 otherwise).
    """
    Ts = Tv / eps
    omega = _omega_d(Ts)
    if delta2:
        omega = omega + 0.19 * delta2 / Ts
    return finish(constant * 1e-4 * _BAR * Tv**1.5 / (Pv * M_ab**0.5 * sigma_a**2 * omega))


def _m_ab(Ma: float, Mb: float) -> float:
    """Reduced-mass form used by Poling et al.: 2/(1/M_A + 1/M_B) in g/mol."""
    return 2.0 / (1.0 / (Ma * 1000.0) + 1.0 / (Mb * 1000.0))


def _brokaw_pair(
    Vb_a: float, Vb_b: float, Tb_a: float, Tb_b: float, dipole_a: float, dipole_b: float
) -> tuple[float, float, float]:
    """Brokaw's Stockmayer parameters for a pair: (sigma_AB [angstrom], eps_AB/k [K], delta_AB^2)."""

    def params(Vb: float, Tb: float, mu: float) -> tuple[float, float, float]:
        V = Vb * 1e6
        delta = 1.94e3 * (mu / DEBYE) ** 2 / (V * Tb)
        eps = 1.18 * (1.0 + 1.3 * delta**2) * Tb
        sig = (1.585 * V / (1.0 + 1.3 * delta**2)) ** (1.0 / 3.0)
        return delta, eps, sig

    da, ea, sa = params(Vb_a, Tb_a, dipole_a)
    db, eb, sb = params(Vb_b, Tb_b, dipole_b)
    return math.sqrt(sa * sb), math.sqrt(ea * eb), da * db


@guard
def chapman_enskog(
    T: ArrayLike,
    P: ArrayLike,
    M_a: float,
    M_b: float,
    sigma_ab: float,
    epsilon_ab_k: float,
) -> FloatOrArray:
    r"""Binary gas diffusivity from Chapman-Enskog kinetic theory.

    .. math::

        D_{AB} = \frac{0.00266\,T^{3/2}}{P\,M_{AB}^{1/2}\,\sigma_{AB}^2\,\Omega_D}

    (cm^2/s, bar, angstrom, g/mol in the source; SI here), with
    :math:`\Omega_D` from :func:`neufeld_collision_integral` at
    :math:`T^* = T/(\varepsilon_{AB}/k)`.

    Parameters
    ----------
    T : float or array_like
        Temperature [K].
    P : float or array_like
        Pressure [Pa].
    M_a : float
        Molar mass of A [kg/mol].
    M_b : float
        Molar mass of B [kg/mol].
    sigma_ab : float
        Pair collision diameter [m], usually :math:`(\sigma_A+\sigma_B)/2`.
    epsilon_ab_k : float
        Pair well depth over Boltzmann's constant [K], usually
        :math:`\sqrt{\varepsilon_A\varepsilon_B}/k`.

    Returns
    -------
    float or numpy.ndarray
        Binary diffusion coefficient [m^2/s].

    Notes
    -----
    With Lennard-Jones parameters from viscosity data, Poling et al.
    (2001, Table 11-2) report an average absolute error of about 7 % for
    non-polar pairs.  First approximation of the theory (the correction
    factor :math:`f_D`, within about 3 % of unity, is taken as 1).

    References
    ----------
    Hirschfelder, J. O., Curtiss, C. F., & Bird, R. B. (1954). *Molecular
    Theory of Gases and Liquids*. Wiley.

    Poling, B. E., Prausnitz, J. M., & O'Connell, J. P. (2001). *The
    Properties of Gases and Liquids*, 5th ed., Eq. (11-3.2).

    Examples
    --------
    >>> round(chapman_enskog(298.15, 101325.0, 0.028, 0.032, 3.6e-10, 90.0) * 1e6, 2)
    20.61

    """
    Tv = check_positive("T", T)
    Pv = check_positive("P", P)
    check_shapes(T=Tv, P=Pv)
    Ma = check_positive("M_a", M_a)
    Mb = check_positive("M_b", M_b)
    s = check_positive("sigma_ab", scalar("sigma_ab", sigma_ab))
    e = check_positive("epsilon_ab_k", scalar("epsilon_ab_k", epsilon_ab_k))
    Ma = check_positive("M_a", scalar("M_a", Ma))
    Mb = check_positive("M_b", scalar("M_b", Mb))
    _check_M("M_a", Ma)
    _check_M("M_b", Mb)
    _warn_pressure(Pv, "chapman_enskog")
    return _kinetic(Tv, Pv, 0.00266, _m_ab(float(Ma), float(Mb)), float(s) * 1e10, float(e), 0.0)


@guard
def wilke_lee(
    T: ArrayLike,
    P: ArrayLike,
    M_a: float,
    M_b: float,
    sigma_ab: float,
    epsilon_ab_k: float,
) -> FloatOrArray:
    r"""Binary gas diffusivity by the Wilke-Lee modification of Chapman-Enskog.

    .. math::

        D_{AB} = \frac{\left[3.03 - 0.98/M_{AB}^{1/2}\right]10^{-3}\,T^{3/2}}
        {P\,M_{AB}^{1/2}\,\sigma_{AB}^2\,\Omega_D}

    (cm^2/s, bar, angstrom, g/mol in the source; SI here).

    Parameters
    ----------
    T : float or array_like
        Temperature [K].
    P : float or array_like
        Pressure [Pa].
    M_a : float
        Molar mass of A [kg/mol].
    M_b : float
        Molar mass of B [kg/mol].
    sigma_ab : float
        Pair collision diameter [m].
    epsilon_ab_k : float
        Pair well depth over Boltzmann's constant [K].

    Returns
    -------
    float or numpy.ndarray
        Binary diffusion coefficient [m^2/s].

    Notes
    -----
    Wilke and Lee fitted the constant to measured data for pairs involving
    larger vapours; for a species without tabulated Lennard-Jones values
    :func:`gas_diffusivity` uses their estimates
    :math:`\sigma = 1.18\,V_b^{1/3}` (angstrom, cm^3/mol) and
    :math:`\varepsilon/k = 1.15\,T_b`.  Average absolute error about
    5-7 % (Poling et al. 2001, Table 11-2).

    References
    ----------
    Wilke, C. R., & Lee, C. Y. (1955). Estimation of diffusion coefficients
    for gases and vapors. *Ind. Eng. Chem.* 47, 1253-1257.
    https://doi.org/10.1021/ie50546a056

    Poling, B. E., Prausnitz, J. M., & O'Connell, J. P. (2001). *The
    Properties of Gases and Liquids*, 5th ed., Eq. (11-4.1).

    Examples
    --------
    >>> round(wilke_lee(298.15, 101325.0, 0.028, 0.032, 3.6e-10, 90.0) * 1e6, 2)
    22.09

    """
    Tv = check_positive("T", T)
    Pv = check_positive("P", P)
    check_shapes(T=Tv, P=Pv)
    Ma = check_positive("M_a", scalar("M_a", M_a))
    Mb = check_positive("M_b", scalar("M_b", M_b))
    s = check_positive("sigma_ab", scalar("sigma_ab", sigma_ab))
    e = check_positive("epsilon_ab_k", scalar("epsilon_ab_k", epsilon_ab_k))
    _check_M("M_a", Ma)
    _check_M("M_b", Mb)
    _warn_pressure(Pv, "wilke_lee")
    M_ab = _m_ab(float(Ma), float(Mb))
    if M_ab <= _WILKE_LEE_M_MIN:
        raise InputValueError(
            f"M_a={float(Ma):g} and M_b={float(Mb):g} kg/mol give a pair molar mass M_AB = "
            f"{M_ab:.4g} g/mol, where Wilke-Lee's leading factor 3.03 - 0.98/M_AB^0.5 is not positive "
            f"(it changes sign at {_WILKE_LEE_M_MIN:.4f} g/mol); check the units (kg/mol) or use "
            "chapman_enskog"
        )
    return _kinetic(Tv, Pv, _wilke_lee_constant(M_ab), M_ab, float(s) * 1e10, float(e), 0.0)


#: Pair molar mass [g/mol] at which Wilke-Lee's factor 3.03 - 0.98/M_AB^0.5 is zero.
_WILKE_LEE_M_MIN: Final = (0.98 / 3.03) ** 2


def _wilke_lee_constant(M_ab: float) -> float:
    """Wilke and Lee's replacement for the constant 0.00266 (M_AB in g/mol)."""
    return (3.03 - 0.98 / math.sqrt(M_ab)) * 1e-3


@guard
def brokaw(
    T: ArrayLike,
    P: ArrayLike,
    M_a: float,
    M_b: float,
    Vb_a: float,
    Vb_b: float,
    Tb_a: float,
    Tb_b: float,
    dipole_a: float,
    dipole_b: float,
) -> FloatOrArray:
    r"""Binary gas diffusivity for polar pairs by Brokaw's method.

    Stockmayer-potential collision integral and parameters:

    .. math::

        \Omega_D = \Omega_D^{\mathrm{Neufeld}} + \frac{0.19\,\delta_{AB}^2}{T^*},
        \quad \delta = \frac{1.94\times10^3\,\mu_p^2}{V_b T_b},
        \quad \varepsilon/k = 1.18(1 + 1.3\delta^2)T_b,
        \quad \sigma = \left(\frac{1.585\,V_b}{1 + 1.3\delta^2}\right)^{1/3}

    with geometric-mean combining rules for :math:`\delta`,
    :math:`\varepsilon` and :math:`\sigma`, then the Chapman-Enskog
    equation (:math:`\mu_p` in debye, :math:`V_b` in cm^3/mol, σ in
    angstrom in the source; SI here).

    Parameters
    ----------
    T : float or array_like
        Temperature [K].
    P : float or array_like
        Pressure [Pa].
    M_a : float
        Molar mass of A [kg/mol].
    M_b : float
        Molar mass of B [kg/mol].
    Vb_a : float
        Liquid molar volume of A at its normal boiling point [m^3/mol].
    Vb_b : float
        Liquid molar volume of B at its normal boiling point [m^3/mol].
    Tb_a : float
        Normal boiling point of A [K].
    Tb_b : float
        Normal boiling point of B [K].
    dipole_a : float
        Dipole moment of A [C m] (zero for a non-polar species).
    dipole_b : float
        Dipole moment of B [C m].

    Returns
    -------
    float or numpy.ndarray
        Binary diffusion coefficient [m^2/s].

    Notes
    -----
    Poling et al. (2001, Table 11-2) find errors comparable to the
    non-polar methods (about 7-10 %) for polar pairs.

    References
    ----------
    Brokaw, R. S. (1969). Predicting transport properties of dilute gases.
    *Ind. Eng. Chem. Process Des. Dev.* 8, 240-253.
    https://doi.org/10.1021/i260030a015

    Poling, B. E., Prausnitz, J. M., & O'Connell, J. P. (2001). *The
    Properties of Gases and Liquids*, 5th ed., Eq. (11-3.8).

    Examples
    --------
    Methyl chloride and sulfur dioxide at 323 K and 1 bar:

    >>> D = brokaw(323.0, 1e5, 0.05049, 0.06406, 50.6e-6, 43.8e-6, 249.1, 263.2,
    ...            1.9 * 3.33564e-30, 1.6 * 3.33564e-30)
    >>> round(D * 1e4, 3)
    0.084

    """
    Tv = check_positive("T", T)
    Pv = check_positive("P", P)
    check_shapes(T=Tv, P=Pv)
    Ma = check_positive("M_a", scalar("M_a", M_a))
    Mb = check_positive("M_b", scalar("M_b", M_b))
    for name, v in (("Vb_a", Vb_a), ("Vb_b", Vb_b), ("Tb_a", Tb_a), ("Tb_b", Tb_b)):
        check_positive(name, scalar(name, v))
    for name, v in (("dipole_a", dipole_a), ("dipole_b", dipole_b)):
        check_nonnegative(name, scalar(name, v), f"pass a finite dipole moment >= 0 [C m] for {name}")
    _check_M("M_a", Ma)
    _check_M("M_b", Mb)
    _warn_pressure(Pv, "brokaw")
    s_ab, e_ab, d2 = _brokaw_pair(
        float(Vb_a), float(Vb_b), float(Tb_a), float(Tb_b), float(dipole_a), float(dipole_b)
    )
    return _kinetic(Tv, Pv, 0.00266, _m_ab(float(Ma), float(Mb)), s_ab, e_ab, d2)


@guard(elementwise=False)  # sums over the components (last axis)
def blanc(D_binary: ArrayLike, mole_fractions: ArrayLike) -> FloatOrArray:
    r"""Diffusivity of a dilute solute in a gas mixture by Blanc's law.

    .. math:: \frac{1}{D_{1m}} = \sum_{j\ne 1} \frac{y_j'}{D_{1j}},
        \qquad y_j' = y_j / \textstyle\sum_{k\ne1} y_k

    Parameters
    ----------
    D_binary : array_like
        Binary diffusivities of the solute in each carrier component
        [m^2/s]; the last axis runs over components.
    mole_fractions : array_like
        Mole fractions of the carrier components [-] (solute-free basis;
        renormalised to sum to one), same last axis.

    Returns
    -------
    float or numpy.ndarray
        Effective diffusivity of the solute in the mixture [m^2/s].

    Notes
    -----
    Exact for a solute at trace level in a mixture of gases; for
    non-dilute solutes use the Maxwell-Stefan equations.

    References
    ----------
    Blanc, A. (1908). Recherches sur les mobilités des ions dans les gaz.
    *J. Phys. Theor. Appl.* 7, 825-839.

    Poling, B. E., Prausnitz, J. M., & O'Connell, J. P. (2001). *The
    Properties of Gases and Liquids*, 5th ed., Eq. (11-7.2).

    Examples
    --------
    >>> round(blanc([2.0e-5, 1.0e-5], [0.5, 0.5]) * 1e5, 4)
    1.3333

    """
    D = np.asarray(check_positive("D_binary", D_binary), dtype=float)
    y = np.asarray(check_positive("mole_fractions", mole_fractions), dtype=float)
    if D.ndim == 0 or y.ndim == 0 or D.shape[-1] != y.shape[-1]:
        raise InputValueError(
            "D_binary and mole_fractions need one entry per carrier component along their last "
            f"axis (got shapes {D.shape} and {y.shape}); pass matching lists"
        )
    yn = y / y.sum(axis=-1, keepdims=True)
    return finish(1.0 / np.sum(yn / D, axis=-1))


@guard
def rescale_gas_diffusivity(
    D_ref: ArrayLike,
    T_ref: float,
    P_ref: float,
    T: ArrayLike,
    P: ArrayLike = 101325.0,
    exponent: float = 1.75,
) -> FloatOrArray:
    r"""Carry a measured gas diffusivity to another temperature and pressure.

    .. math:: D(T, P) = D_{ref}\,\left(\frac{T}{T_{ref}}\right)^{n}\,\frac{P_{ref}}{P}

    Parameters
    ----------
    D_ref : float or array_like
        Diffusivity measured at (T_ref, P_ref) [m^2/s].
    T_ref : float
        Temperature of the measurement [K].
    P_ref : float
        Pressure of the measurement [Pa].
    T : float or array_like
        Target temperature [K].
    P : float or array_like
        Target pressure [Pa].
    exponent : float
        Temperature exponent n [-]: 1.75 (Fuller's; the default) or 1.5
        (Chapman-Enskog without the change of the collision integral).

    Returns
    -------
    float or numpy.ndarray
        Diffusivity at (T, P) [m^2/s].

    Notes
    -----
    The exponent 1.75 reproduces most measured pairs within a few per cent
    over a few hundred kelvin (Poling et al. 2001, Section 11-4).

    References
    ----------
    Poling, B. E., Prausnitz, J. M., & O'Connell, J. P. (2001). *The
    Properties of Gases and Liquids*, 5th ed., Section 11-4.

    Examples
    --------
    >>> round(rescale_gas_diffusivity(2.6e-5, 298.15, 101325.0, 353.15) * 1e5, 3)
    3.497

    """
    D0 = check_positive("D_ref", D_ref)
    T0 = check_positive("T_ref", T_ref)
    P0 = check_positive("P_ref", P_ref)
    Tv = check_positive("T", T)
    Pv = check_positive("P", P)
    n = check_positive("exponent", exponent)
    check_shapes(D_ref=D0, T=Tv, P=Pv)
    return finish(D0 * (Tv / T0) ** n * (P0 / Pv))


# --------------------------------------------------------------------------
# names in: constant preparation per method, the records, the dispatcher
# --------------------------------------------------------------------------


def _used(sp: Species, name: str, value: float | None = None) -> ConstantUsed:
    """Return a constant as used, with its source (the origin, when no text source was given)."""
    v = getattr(sp, name) if value is None else value
    if v is None:
        return ConstantUsed(None, "absent")
    text, origin = sp._source_of(name)
    src = text or (origin.value if origin is not None else "user")
    return ConstantUsed(float(v), src)


def _prepare_fuller(a: Species, b: Species) -> Prepared:
    va, notes_a = _fuller_volume_parts(a)
    vb, notes_b = _fuller_volume_parts(b)
    c = float(_fuller_constant(a.molar_mass, b.molar_mass, va, vb))
    consts = {
        role: {"molar_mass": _used(sp, "molar_mass"), "fuller_volume": ConstantUsed(v, _fuller_source(sp))}
        for role, sp, v in (("solute", a, va), ("medium", b, vb))
    }
    return Prepared((c,), consts, (*notes_a, *notes_b))


def _fuller_source(sp: Species) -> str:
    if sp.fuller_volume is not None:
        text, origin = sp._source_of("fuller_volume")
        return text or (origin.value if origin is not None else "user")
    return "Fuller et al. (1969) atomic and ring increments"


def _lj_constants(sp: Species, method: str) -> tuple[float, float, tuple[str, ...]]:
    """(sigma [m], epsilon/k [K], notes) for Chapman-Enskog; estimated values are noted."""
    s, e = sp.require("sigma", method), sp.require("epsilon_k", method)
    notes: tuple[str, ...] = ()
    if sp.origins.get("sigma") is Origin.ESTIMATED or sp.origins.get("epsilon_k") is Origin.ESTIMATED:
        notes = (
            f"{sp.name}: Lennard-Jones constants estimated from the critical point (no tabulated "
            f"values): sigma = {s * 1e10:.3f} angstrom, epsilon/k = {e:.1f} K",
        )
    return s, e, notes


def _prepare_chapman_enskog(a: Species, b: Species) -> Prepared:
    sa, ea, na = _lj_constants(a, "Chapman-Enskog")
    sb, eb, nb = _lj_constants(b, "Chapman-Enskog")
    consts = {
        role: {n: _used(sp, n) for n in ("molar_mass", "sigma", "epsilon_k")}
        for role, sp in (("solute", a), ("medium", b))
    }
    args = (0.00266, _m_ab(a.molar_mass, b.molar_mass), 0.5 * (sa + sb) * 1e10, math.sqrt(ea * eb), 0.0)
    return Prepared(args, consts, (*na, *nb))


def _vb_for_gas_methods(sp: Species) -> tuple[float | None, tuple[str, ...]]:
    """Molar volume at Tb, taking the tabulated value for small gases (noted when it changes Vb)."""
    tab = data.SMALL_MOLECULE_VB.get(sp.CAS or "")
    if tab is None or sp.origins.get("Vb") is Origin.USER:
        return sp.Vb, ()
    if sp.Vb is not None and abs(sp.Vb - tab) <= 0.01 * tab:
        return tab, ()
    was = "none" if sp.Vb is None else f"{sp.Vb * 1e6:.1f}"
    return tab, (
        f"{sp.name}: tabulated molar volume at the boiling point {tab * 1e6:.1f} cm^3/mol used "
        f"(the value the correlations were fitted with) instead of {was} cm^3/mol",
    )


def _wilke_lee_params(sp: Species) -> tuple[float, float, tuple[str, ...]]:
    """Tabulated or user Lennard-Jones values, else Wilke & Lee's estimates from Tb and Vb."""
    if (
        sp.sigma is not None
        and sp.epsilon_k is not None
        and sp.origins.get("sigma") in (Origin.TABULATED, Origin.USER)
        and sp.origins.get("epsilon_k") in (Origin.TABULATED, Origin.USER)
    ):
        return sp.sigma, sp.epsilon_k, ()
    Vb, notes = _vb_for_gas_methods(sp)
    if Vb is not None and sp.Tb is not None:
        s, e = 1.18e-10 * (Vb * 1e6) ** (1.0 / 3.0), 1.15 * sp.Tb
        return (
            s,
            e,
            (
                *notes,
                f"{sp.name}: no tabulated Lennard-Jones constants; Wilke-Lee estimates used: "
                f"sigma = 1.18 Vb^(1/3) = {s * 1e10:.3f} angstrom, epsilon/k = 1.15 Tb = {e:.1f} K",
            ),
        )
    return sp.require("sigma", "Wilke-Lee"), sp.require("epsilon_k", "Wilke-Lee"), ()


def _prepare_wilke_lee(a: Species, b: Species) -> Prepared:
    sa, ea, na = _wilke_lee_params(a)
    sb, eb, nb = _wilke_lee_params(b)
    M_ab = _m_ab(a.molar_mass, b.molar_mass)
    consts = {
        role: {
            "molar_mass": _used(sp, "molar_mass"),
            "sigma (as used)": ConstantUsed(s, _lj_source(sp, n)),
            "epsilon_k (as used)": ConstantUsed(e, _lj_source(sp, n)),
        }
        for role, sp, s, e, n in (("solute", a, sa, ea, na), ("medium", b, sb, eb, nb))
    }
    args = (_wilke_lee_constant(M_ab), M_ab, 0.5 * (sa + sb) * 1e10, math.sqrt(ea * eb), 0.0)
    return Prepared(args, consts, (*na, *nb))


def _lj_source(sp: Species, notes: tuple[str, ...]) -> str:
    if notes:
        return "Wilke & Lee (1955) estimate from Tb and Vb"
    return sp.sources.get("sigma") or sp.origins["sigma"].value


def _prepare_brokaw(a: Species, b: Species) -> Prepared:
    Va, na = _vb_for_gas_methods(a)
    Vb, nb = _vb_for_gas_methods(b)
    for sp, V in ((a, Va), (b, Vb)):
        if V is None:
            sp.require("Vb", "Brokaw")
        if sp.dipole is None:
            raise MissingConstantError(
                f"species {sp.name!r} has no known dipole moment, which the Brokaw method needs "
                "(unknown is not zero); supply it: masstransfer.species(...).replace(dipole=... [C m])"
            )
    assert Va is not None
    assert Vb is not None
    assert a.dipole is not None
    assert b.dipole is not None
    s_ab, e_ab, d2 = _brokaw_pair(
        Va, Vb, a.require("Tb", "Brokaw"), b.require("Tb", "Brokaw"), a.dipole, b.dipole
    )
    consts = {
        role: {
            "molar_mass": _used(sp, "molar_mass"),
            "Tb": _used(sp, "Tb"),
            "Vb (as used)": ConstantUsed(
                V, "tabulated small-molecule volume" if n else _used(sp, "Vb").source
            ),
            "dipole": _used(sp, "dipole"),
        }
        for role, sp, V, n in (("solute", a, Va, na), ("medium", b, Vb, nb))
    }
    return Prepared((0.00266, _m_ab(a.molar_mass, b.molar_mass), s_ab, e_ab, d2), consts, (*na, *nb))


def _evaluate_fuller(prep: Prepared, T: FloatOrArray, P: FloatOrArray) -> FloatOrArray:
    return finish(prep.args[0] * T**1.75 / P)


def _evaluate_kinetic(prep: Prepared, T: FloatOrArray, P: FloatOrArray) -> FloatOrArray:
    return _kinetic(T, P, *prep.args)


_POLAR_EITHER = ClassRule(
    SpeciesClass.POLAR,
    Role.EITHER,
    "a polar member: the Lennard-Jones potential ignores dipole forces (errors of 10-20 % on polar "
    "pairs; Poling et al. 2001, Section 11-3); use Brokaw or Fuller",
)

#: The gas-phase methods, in the order they are tried when the default does not apply.
GAS_METHODS: Final[Mapping[str, DiffusivityMethod]] = MappingProxyType(
    {
        r.name: r
        for r in (
            DiffusivityMethod(
                name="fuller",
                phase="gas",
                title="Fuller, Schettler & Giddings (1966), volumes of Fuller, Ensley & Giddings (1969)",
                function=fuller,
                constants=("molar_mass", "fuller_volume"),
                accuracy_pct=5.0,
                accuracy="about 5 % average absolute error at low pressure, larger for strongly polar "
                "pairs (Poling et al. 2001, Section 11-4 and Table 11-2, from memory)",
                reference="Fuller, Schettler & Giddings (1966), Ind. Eng. Chem. 58(5), 18; "
                "https://doi.org/10.1021/ie50677a007",
                scope="any low-pressure pair whose atoms have published increments (C H O N S F Cl "
                "Br I) or that has a special-molecule volume",
                T_range=(200.0, 2000.0),
                P_max=LOW_PRESSURE_LIMIT,
                prepare=_prepare_fuller,
                evaluate=_evaluate_fuller,
            ),
            DiffusivityMethod(
                name="chapman-enskog",
                phase="gas",
                title="Chapman-Enskog kinetic theory with the Neufeld et al. (1972) collision integral",
                function=chapman_enskog,
                constants=("molar_mass", "sigma", "epsilon_k"),
                accuracy_pct=8.0,
                accuracy="about 7-8 % average absolute error for non-polar pairs with tabulated "
                "Lennard-Jones constants (Poling et al. 2001, Table 11-2, from memory)",
                reference="Poling, Prausnitz & O'Connell (2001), The Properties of Gases and Liquids, "
                "5th ed., Eq. (11-3.2)",
                scope="non-polar pairs with Lennard-Jones constants (tabulated preferred)",
                T_range=(100.0, 3000.0),
                P_max=LOW_PRESSURE_LIMIT,
                prepare=_prepare_chapman_enskog,
                evaluate=_evaluate_kinetic,
                cautions=(_POLAR_EITHER,),
            ),
            DiffusivityMethod(
                name="wilke-lee",
                phase="gas",
                title="Wilke & Lee (1955)",
                function=wilke_lee,
                constants=("molar_mass", "sigma", "epsilon_k", "Tb", "Vb"),
                accuracy_pct=7.0,
                accuracy="about 5-7 % average absolute error (Poling et al. 2001, Table 11-2, from memory)",
                reference="Wilke & Lee (1955), Ind. Eng. Chem. 47, 1253; https://doi.org/10.1021/ie50546a056",
                scope="non-polar pairs, vapours of higher molar mass in particular",
                T_range=(100.0, 2000.0),
                P_max=LOW_PRESSURE_LIMIT,
                prepare=_prepare_wilke_lee,
                evaluate=_evaluate_kinetic,
            ),
            DiffusivityMethod(
                name="brokaw",
                phase="gas",
                title="Brokaw (1969), Stockmayer potential",
                function=brokaw,
                constants=("molar_mass", "Tb", "Vb", "dipole"),
                accuracy_pct=9.0,
                accuracy="about 7-10 % average absolute error on polar pairs (Poling et al. 2001, "
                "Section 11-3, from memory)",
                reference="Brokaw (1969), Ind. Eng. Chem. Process Des. Dev. 8, 240; "
                "https://doi.org/10.1021/i260030a015",
                scope="pairs with a polar member; both dipole moments known; no quantum gas",
                T_range=(200.0, 1500.0),
                P_max=LOW_PRESSURE_LIMIT,
                prepare=_prepare_brokaw,
                evaluate=_evaluate_kinetic,
                requires=(ClassRule(SpeciesClass.POLAR, Role.EITHER, ""),),
                excludes=(
                    ClassRule(
                        SpeciesClass.QUANTUM,
                        Role.EITHER,
                        "a quantum gas (He, H2, D2, Ne): Brokaw's boiling-point estimates of sigma and "
                        "epsilon fail for it (18-25 % low); use Fuller or Chapman-Enskog",
                    ),
                    ClassRule(
                        SpeciesClass.DIPOLE_UNKNOWN,
                        Role.EITHER,
                        "a dipole moment is unknown (unknown is not zero); supply it with "
                        "Species.replace(dipole=...)",
                    ),
                ),
            ),
        )
    }
)

#: Default gas method (Poling, Prausnitz & O'Connell 2001, Section 11-4 recommendations, from
#: memory: Fuller et al. for low-pressure pairs, polar ones included; Reid, Prausnitz & Poling
#: 1987, 4th ed., Section 11-4, the same).  When its constants are missing, the next record in
#: GAS_METHODS that applies is used and the choice is noted.
GAS_DEFAULT: Final = "fuller"


@dataclass(frozen=True, slots=True)
class _Ready:
    """Everything a names-in call needs after the first: record, constants, phase limits."""

    record: DiffusivityMethod
    prepared: Prepared
    fast: float  # Fuller's constant, or 0.0 when the general path is needed
    Tc: float  # the medium is a vapour above this without further checks
    limits: PhaseLimits
    solute: str
    T_lo: float
    T_hi: float
    cautions: tuple[str, ...]
    notes: tuple[str, ...]
    ambiguous: tuple[str, ...] = ()  # ambiguity warnings, issued again on every cached call


_READY: dict[tuple[object, object, object], _Ready] = {}


def _check_record(
    rec: DiffusivityMethod, a: Species, b: Species, explicit: bool
) -> tuple[tuple[str, ...], tuple[str, ...]]:
    if not (rec.requires or rec.excludes or rec.cautions):
        return (), ()  # no class rules: the classes (and the dipole moments) are not read
    blocked, cautions = rec.class_verdict(classify(a), classify(b))
    if blocked and explicit:
        raise InputValueError(
            f"method={rec.name!r} does not apply to {a.name!r} in {b.name!r}: {'; '.join(blocked)}"
        )
    return blocked, cautions


def prepare_pair(
    records: Mapping[str, DiffusivityMethod], default: str, method: str | None, a: Species, b: Species
) -> tuple[DiffusivityMethod, Prepared, tuple[str, ...], tuple[str, ...]]:
    """Resolve ``method`` (None: the default, else the next that applies) and prepare its constants.

    Returns the record, its prepared constants, the cautions to issue on every call, and notes
    on the choice of method.
    """
    if method is not None:
        phase = next(iter(records.values())).phase
        rec = records[normalise_method(method, records, phase=phase)]
        _, cautions = _check_record(rec, a, b, explicit=True)
        prep = rec.prepare(a, b)
        return rec, prep, (*cautions, *prep.cautions), ()
    tried: list[str] = []
    for name in (default, *(n for n in records if n != default)):
        rec = records[name]
        blocked, cautions = _check_record(rec, a, b, explicit=False)
        if blocked:
            tried.append(f"{name}: {'; '.join(blocked)}")
            continue
        try:
            prep = rec.prepare(a, b)
        except MissingConstantError as exc:
            tried.append(f"{name}: {exc}")
            continue
        notes = (
            ()
            if name == default
            else (f"default method {default!r} not used ({'; '.join(tried)}); {name!r} used",)
        )
        return rec, prep, (*cautions, *prep.cautions), notes
    raise MissingConstantError(f"no method applies to {a.name!r} in {b.name!r}: " + " | ".join(tried))


def _ready(method: object, solute: object, medium: object) -> _Ready:
    a, b = species(solute), species(medium)  # type: ignore[arg-type]
    if method is not None and not isinstance(method, str):
        normalise_method(method, GAS_METHODS, phase="gas")  # type: ignore[arg-type]
    rec, prep, cautions, notes = prepare_pair(GAS_METHODS, GAS_DEFAULT, method, a, b)  # type: ignore[arg-type]
    limits = phase_limits(b)
    ready = _Ready(
        record=rec,
        prepared=prep,
        fast=prep.args[0] if rec.name == "fuller" else 0.0,
        Tc=(limits.Tc if limits.known and limits.Tc is not None else -math.inf),
        limits=limits,
        solute=a.name,
        T_lo=rec.T_range[0],
        T_hi=rec.T_range[1],
        cautions=tuple(f"{rec.name} for {a.name} in {b.name}: {c}" for c in cautions),
        notes=(*notes, *prep.notes),
        ambiguous=ambiguity_warnings(solute, medium),
    )
    try:
        key = (method, solute, medium)
        if len(_READY) > 4096:
            _READY.clear()
        _READY[key] = ready
    except TypeError:  # pragma: no cover - species() has already rejected unhashable input
        pass
    return ready


def _slow_checks(r: _Ready, Tv: FloatOrArray, Pv: FloatOrArray, fraction: float = 1.0) -> None:
    """Phase check, range and class warnings (the fast path calls this only when needed).

    ``fraction`` is the medium's mole fraction when it is one component of a gas mixture: its
    partial pressure, not the total, must stay below its vapour pressure.
    """
    if (Tv < r.Tc) if isinstance(Tv, float) else bool(np.any(Tv < r.Tc)):
        check_vapour(r.limits, Tv, Pv * fraction if fraction != 1.0 else Pv, r.solute)
    _warn_pressure(Pv, f"gas_diffusivity(method={r.record.name!r})")
    lo = Tv < r.T_lo if isinstance(Tv, float) else bool(np.any(Tv < r.T_lo))
    hi = Tv > r.T_hi if isinstance(Tv, float) else bool(np.any(Tv > r.T_hi))
    if lo or hi:
        warn_caller(
            f"{r.record.name}: T outside {r.T_lo:g}-{r.T_hi:g} K, the range the method is stated for",
            EnvelopeWarning,
        )
    for c in r.cautions:
        warn_caller(c, EnvelopeWarning)


def binary_in_mixture(
    solute: Species, component: Species, T: FloatOrArray, P: FloatOrArray, fraction: float, method: str | None
) -> FloatOrArray:
    """Binary diffusivity of ``solute`` in one ``component`` of a gas mixture (for Blanc's law).

    As :func:`gas_diffusivity`, except that the component must be a vapour at its partial
    pressure ``fraction * P`` (water at 3 % in humid air), not at the total pressure.
    """
    r = ready_gas(solute, component, method)
    _slow_checks(r, T, P, fraction)
    return r.record.evaluate(r.prepared, T, P)  # type: ignore[no-any-return]


def ready_gas(solute: str | Species, medium: str | Species, method: str | None) -> _Ready:
    """Return the cached preparation :func:`gas_diffusivity` uses (for the report and the CLI)."""
    try:
        r = _READY[(method, solute, medium)]
    except (KeyError, TypeError):
        return _ready(method, solute, medium)
    if r.ambiguous:
        rewarn_ambiguity(r.ambiguous)
    return r


@overload
def gas_diffusivity(
    solute: str | Species, medium: str | Species, T: float, P: float = ..., method: str | None = ...
) -> float: ...
@overload
def gas_diffusivity(
    solute: str | Species, medium: str | Species, T: FloatArray, P: ArrayLike = ..., method: str | None = ...
) -> FloatArray: ...
@overload
def gas_diffusivity(
    solute: str | Species, medium: str | Species, T: ArrayLike, P: ArrayLike = ..., method: str | None = ...
) -> FloatOrArray: ...
def gas_diffusivity(
    solute: str | Species,
    medium: str | Species,
    T: ArrayLike,
    P: ArrayLike = 101325.0,
    method: str | None = None,
) -> FloatOrArray:
    """Binary diffusivity of ``solute`` in the gas ``medium``, from species names.

    Parameters
    ----------
    solute : str or Species
        Diffusing species: name, CAS number, formula, or :class:`Species`.
    medium : str or Species
        The gas it diffuses in, e.g. ``"air"``, ``"nitrogen"``; it must be a vapour at T and P.
    T : float or array_like
        Temperature [K].
    P : float or array_like
        Pressure [Pa].
    method : {None, 'fuller', 'chapman-enskog', 'wilke-lee', 'brokaw'}
        Estimation method (see :data:`masstransfer.diffusivity.GAS_METHODS`); None picks the
        published recommendation (Fuller), or the next method that applies when Fuller's
        constants are missing.

    Returns
    -------
    float or numpy.ndarray
        Binary diffusion coefficient [m^2/s]; a float for scalar T and P.

    Raises
    ------
    UnknownSpeciesError
        If a species cannot be resolved.
    MissingConstantError
        If a species lacks a constant the method needs.
    OutOfRangeError
        If the medium is not a vapour at T and P (use :func:`masstransfer.liquid_diffusivity`).
    InputValueError
        For non-finite or non-positive T or P, mismatched shapes, or a method that does not
        apply to the pair (Brokaw with a quantum gas or an unknown dipole moment).

    Notes
    -----
    Species are resolved and the method's constants prepared once per (method, solute,
    medium); later calls cost about a microsecond.  Stated accuracy (each record's
    ``accuracy``): Fuller about 5 %, Chapman-Enskog about 8 %, Wilke-Lee 5-7 %, Brokaw 7-10 %
    (Poling et al. 2001, Table 11-2).  A method used outside its class (a polar pair in
    Chapman-Enskog or Wilke-Lee, a non-polar pair in Brokaw) warns with
    :class:`~masstransfer.errors.EnvelopeWarning`; :func:`masstransfer.diffusivity_report`
    shows every special rule applied and :func:`masstransfer.diffusivity.available_methods`
    which methods apply and why.  Results are estimates: designs that affect safety (toxic or
    flammable vapour, oxygen ingress into food, pressure equipment) must be checked against
    measured data, local codes and licensed engineering practice.

    References
    ----------
    Poling, B. E., Prausnitz, J. M., & O'Connell, J. P. (2001). *The
    Properties of Gases and Liquids*, 5th ed., Chapter 11.

    Examples
    --------
    >>> round(gas_diffusivity("water", "air", 298.15) * 1e6, 1)
    25.0
    >>> round(gas_diffusivity("hydrogen", "nitrogen", 294.0, 2 * 101325.0,
    ...                       method="chapman-enskog") * 1e4, 3)
    0.361

    """
    scalar = type(T) is float and type(P) is float
    if not scalar and has_quantity((T, P), {}):  # pint: units
        return call_with_quantities(gas_diffusivity, (solute, medium, T, P, method), {})
    try:
        r = _READY[(method, solute, medium)]
    except (KeyError, TypeError):
        r = _ready(method, solute, medium)
    else:
        if r.ambiguous:
            rewarn_ambiguity(r.ambiguous)
    if scalar:  # fast path: plain floats inside every range, nothing to warn
        t: float = T  # type: ignore[assignment]
        p: float = P  # type: ignore[assignment]
        if (
            r.fast
            and r.Tc <= t <= r.T_hi
            and r.T_lo <= t
            and VACUUM_LIMIT <= p <= LOW_PRESSURE_LIMIT
            and not r.cautions
        ):
            return r.fast * t**1.75 / p  # type: ignore[no-any-return]  # bounds exclude NaN, inf
    Tv = check_positive("T", T)
    Pv = check_positive("P", P)
    if not isinstance(Tv, float | np.ndarray) or not isinstance(Pv, float | np.ndarray):
        return dask_blocks(gas_diffusivity, solute, medium, T, P, method)  # lazy, block by block
    if isinstance(Tv, float) and isinstance(Pv, float):  # scalar fast path: checks only when needed
        if (
            Tv < r.Tc
            or not VACUUM_LIMIT <= Pv <= LOW_PRESSURE_LIMIT
            or not r.T_lo <= Tv <= r.T_hi
            or r.cautions
        ):
            _slow_checks(r, Tv, Pv)
        if r.fast:
            return float(r.fast * Tv**1.75 / Pv)
        return r.record.evaluate(r.prepared, Tv, Pv)  # type: ignore[no-any-return]
    check_shapes(T=Tv, P=Pv)
    _slow_checks(r, Tv, Pv)
    return r.record.evaluate(r.prepared, Tv, Pv)  # type: ignore[no-any-return]


@guard(check_output=False)
def available_methods(
    solute: str | Species,
    medium: str | Species,
    phase: Literal["gas", "liquid"] | None = None,
) -> tuple[MethodAvailability, ...]:
    """Which diffusivity methods apply to a pair, which is the default, and why the others do not.

    Parameters
    ----------
    solute : str or Species
        Diffusing species.
    medium : str or Species
        The gas or solvent it diffuses in.
    phase : {'gas', 'liquid'}, optional
        Phase of the medium; by default the medium's state at 298.15 K and 101325 Pa (a
        liquid solvent such as water gives the liquid methods), gas when that is unclear.

    Returns
    -------
    tuple of MethodAvailability
        One entry per method of that phase, in registry order: whether it applies, whether
        it is the default, its stated accuracy [%] and the reasons (why not, or its cautions).

    Notes
    -----
    A method does not apply when a constant it needs is missing or when a class of species
    excludes it (Brokaw with a quantum gas); it applies with cautions when the pair lies
    outside its class (a polar pair in Chapman-Enskog).  Defaults follow the published
    recommendations quoted on ``GAS_DEFAULT`` and ``liquid_default``.

    References
    ----------
    Poling, B. E., Prausnitz, J. M., & O'Connell, J. P. (2001). *The Properties of Gases and
    Liquids*, 5th ed., Sections 11-4 and 11-10.

    Examples
    --------
    >>> [m.method for m in available_methods("helium", "air", "gas") if m.applies]
    ['fuller', 'chapman-enskog', 'wilke-lee']

    """
    a, b = species(solute), species(medium)
    if phase is None:
        phase = "liquid" if medium_state(phase_limits(b), 298.15, 101325.0) == "liquid" else "gas"
    records: Mapping[str, DiffusivityMethod]
    ready: Callable[[Species, Species, None], Any]
    if phase == "gas":
        records, ready = GAS_METHODS, ready_gas
    elif phase == "liquid":
        from ._liquid import LIQUID_METHODS, ready_liquid

        records, ready = LIQUID_METHODS, ready_liquid
    else:
        raise InputValueError(f"phase={phase!r} must be 'gas' or 'liquid'")
    try:
        default = ready(a, b, None).record.name
    except MissingConstantError:  # no method applies: list each with its reason, none as default
        default = ""
    out = []
    for name, rec in records.items():
        blocked, cautions = rec.class_verdict(classify(a), classify(b))
        reasons = list(blocked)
        if not blocked:
            try:
                prep = rec.prepare(a, b)
            except MissingConstantError as exc:
                blocked = (str(exc),)
                reasons.append(str(exc))
            else:
                reasons += [*cautions, *prep.cautions]
        applies = not blocked
        out.append(MethodAvailability(name, applies, name == default, rec.accuracy_pct, tuple(reasons)))
    return tuple(out)


@guard
def gas_diffusivity_in_mixture(
    solute: str | Species,
    carrier: Mapping[str, float] | Mapping[str | Species, float],
    T: ArrayLike,
    P: ArrayLike = 101325.0,
    method: str | None = None,
) -> FloatOrArray:
    """Diffusivity of a dilute ``solute`` in a gas mixture (Blanc's law).

    Parameters
    ----------
    solute : str or Species
        Diffusing species at trace level.
    carrier : mapping
        Carrier components and their mole fractions [-], e.g.
        ``{"nitrogen": 0.79, "CO2": 0.21}``; renormalised to sum to one.
    T : float or array_like
        Temperature [K].
    P : float or array_like
        Pressure [Pa].
    method : str, optional
        Binary method, as in :func:`gas_diffusivity` (None: each pair's default).

    Returns
    -------
    float or numpy.ndarray
        Effective diffusivity of the solute [m^2/s].

    Notes
    -----
    Blanc's law holds for a solute at trace level; its error is that of the
    binary method used.

    References
    ----------
    Blanc, A. (1908). *J. Phys. Theor. Appl.* 7, 825-839.

    Examples
    --------
    >>> D = gas_diffusivity_in_mixture("water", {"nitrogen": 0.79, "oxygen": 0.21}, 300.0)
    >>> round(D * 1e6, 1)
    26.2

    """
    if not isinstance(carrier, Mapping) or not carrier:
        raise InputValueError(
            f"carrier={carrier!r} must be a non-empty mapping of species to mole fraction, "
            "e.g. {'nitrogen': 0.79, 'oxygen': 0.21}"
        )
    names = list(carrier)
    y = [float(carrier[n]) for n in names]  # type: ignore[index]
    a = species(solute)
    Tv, Pv = check_positive("T", T), check_positive("P", P)
    check_shapes(T=Tv, P=Pv)
    total = sum(y)
    # each component a vapour at its own partial pressure (fractions as given, renormalised)
    Ds = [
        np.asarray(
            binary_in_mixture(a, species(n), Tv, Pv, max(yi / total, 1e-300) if total > 0 else 1.0, method)
        )
        for n, yi in zip(names, y, strict=True)
    ]
    stacked = np.stack(np.broadcast_arrays(*Ds), axis=-1)
    return blanc(stacked, y)
